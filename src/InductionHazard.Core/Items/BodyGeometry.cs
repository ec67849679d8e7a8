using System;
using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// A solid body of revolution (disc, cylinder, tube, sphere) with its axis along the placement's normal. Its
/// eddy currents flow around the axis in the coaxial filaments of its meridional section; its outline for the
/// emf reported is the circle of its outer radius.
/// </summary>
public abstract class BodyGeometry : LoopGeometry
{
    /// <summary>Creates the geometry with the meridional section it is described by.</summary>
    protected BodyGeometry(double outerRadiusMeters, BodySection section)
        : base(section)
    {
        OuterRadiusMeters = outerRadiusMeters;
    }

    /// <summary>The outer radius, m.</summary>
    public double OuterRadiusMeters { get; }

    /// <summary>The area of the outer circle, pi R^2, m^2: the outline whose emf is reported.</summary>
    public override double LoopAreaSquareMeters => Math.PI * OuterRadiusMeters * OuterRadiusMeters;

    /// <summary>The outer circumference, 2 pi R, m.</summary>
    public override double PathLengthMeters => 2 * Math.PI * OuterRadiusMeters;

    /// <summary>The outer radius: the disc over which flux is integrated for the outline.</summary>
    public override double HalfSpanMeters => OuterRadiusMeters;

    /// <summary>
    /// The second moments of the volume about the centroid, integral of x^2 dV across the axis and of z^2 dV
    /// along it, m^5: the low-frequency eddy loss bound for a field across the axis needs them.
    /// </summary>
    public abstract (double Across, double Along) SecondMoments { get; }
}

/// <summary>The meridional (r, z) section of a body of revolution, as the item tables describe it.</summary>
public sealed class BodySection : CrossSection
{
    private readonly string _description;

    /// <summary>Creates the section.</summary>
    public BodySection(double radialMeters, double axialMeters, double areaSquareMeters, string description)
    {
        RadialExtentMeters = radialMeters;
        AxialExtentMeters = axialMeters;
        AreaSquareMeters = areaSquareMeters;
        _description = description;
    }

    /// <summary>The section's extent along the axis, m.</summary>
    public double AxialExtentMeters { get; }

    /// <inheritdoc />
    public override double AreaSquareMeters { get; }

    /// <inheritdoc />
    public override double PerimeterMeters => 2 * (RadialExtentMeters + AxialExtentMeters);

    /// <inheritdoc />
    public override double GeometricMeanRadiusMeters => RectangularBand.GmdFactor * (RadialExtentMeters + AxialExtentMeters);

    /// <inheritdoc />
    public override double RadialExtentMeters { get; }

    /// <inheritdoc />
    public override double LargestDimensionMeters => Math.Max(RadialExtentMeters, AxialExtentMeters);

    /// <inheritdoc />
    public override double SmallestDimensionMeters => Math.Min(RadialExtentMeters, AxialExtentMeters);

    /// <inheritdoc />
    public override string Describe() => _description;
}

/// <summary>A solid cylinder of radius R and length l along its axis: a disc when short, a rod when long.</summary>
public sealed class CylinderBody : BodyGeometry
{
    private readonly string _word;

    /// <summary>Creates the body.</summary>
    /// <param name="diameterMeters">The diameter 2R.</param>
    /// <param name="lengthMeters">The length along the axis (a disc's thickness).</param>
    /// <param name="word">"disc" or "cylinder", for descriptions.</param>
    public CylinderBody(double diameterMeters, double lengthMeters, string word)
        : base(diameterMeters / 2, new BodySection(diameterMeters / 2, lengthMeters, diameterMeters / 2 * lengthMeters, "solid, " + SiFormat.Format(lengthMeters, "m") + (word == "disc" ? " thick" : " long")))
    {
        LengthMeters = lengthMeters;
        _word = word;
    }

    /// <summary>The length along the axis (a disc's thickness), m.</summary>
    public double LengthMeters { get; }

    /// <inheritdoc />
    public override double LargestDimensionMeters => Math.Sqrt((4 * OuterRadiusMeters * OuterRadiusMeters) + (LengthMeters * LengthMeters));

    /// <inheritdoc />
    public override double VolumeCubicMeters => LoopAreaSquareMeters * LengthMeters;

    /// <inheritdoc />
    public override double SurfaceSquareMeters => (2 * LoopAreaSquareMeters) + (PathLengthMeters * LengthMeters);

    /// <summary>Across: pi R^4 l / 4; along: pi R^2 l^3 / 12.</summary>
    public override (double Across, double Along) SecondMoments =>
        (Math.PI * Math.Pow(OuterRadiusMeters, 4) * LengthMeters / 4, Math.PI * OuterRadiusMeters * OuterRadiusMeters * Math.Pow(LengthMeters, 3) / 12);

    /// <summary>Rectangular cells over [0, R] x [-l/2, l/2], graded toward the curved surface and both faces.</summary>
    public override IReadOnlyList<Filament> Filaments(double surfaceCellMeters, int refinement = 1) =>
        FilamentMesh.Rectangle(0, OuterRadiusMeters, -LengthMeters / 2, LengthMeters / 2, surfaceCellMeters, innerSurface: false, outerSurface: true, endSurfaces: true, minimumCells: 2 * refinement * FilamentMesh.MinimumCells);

    /// <inheritdoc />
    public override string Describe() => _word + " D " + SiFormat.Format(2 * OuterRadiusMeters, "m");
}

/// <summary>
/// A tube of outer radius R, wall t and length l, open at both ends or closed by end walls of the same thickness
/// inside its length (a gas cylinder's shell).
/// </summary>
public sealed class TubeBody : BodyGeometry
{
    /// <summary>Creates the body.</summary>
    public TubeBody(double outerDiameterMeters, double wallMeters, double lengthMeters, bool closedEnds = false)
        : base(outerDiameterMeters / 2, new BodySection(wallMeters, lengthMeters, wallMeters * lengthMeters, SiFormat.Format(wallMeters, "m") + " wall, " + SiFormat.Format(lengthMeters, "m") + " long" + (closedEnds ? ", closed ends" : string.Empty)))
    {
        WallMeters = wallMeters;
        LengthMeters = lengthMeters;
        ClosedEnds = closedEnds;
    }

    /// <summary>The wall thickness (and an end wall's), m.</summary>
    public double WallMeters { get; }

    /// <summary>The length along the axis, m.</summary>
    public double LengthMeters { get; }

    /// <summary>True when end walls close the tube.</summary>
    public bool ClosedEnds { get; }

    /// <summary>The inner radius, m.</summary>
    public double InnerRadiusMeters => OuterRadiusMeters - WallMeters;

    /// <inheritdoc />
    public override double LargestDimensionMeters => Math.Sqrt((4 * OuterRadiusMeters * OuterRadiusMeters) + (LengthMeters * LengthMeters));

    /// <summary>The volume of one end wall, pi Ri^2 t, m^3 (zero for an open tube).</summary>
    private double EndVolume => ClosedEnds ? Math.PI * InnerRadiusMeters * InnerRadiusMeters * WallMeters : 0;

    /// <inheritdoc />
    public override double VolumeCubicMeters =>
        (Math.PI * ((OuterRadiusMeters * OuterRadiusMeters) - (InnerRadiusMeters * InnerRadiusMeters)) * LengthMeters) + (2 * EndVolume);

    /// <summary>Open: inside and outside walls and the two rims. Closed: the outside only (the inside is sealed).</summary>
    public override double SurfaceSquareMeters => ClosedEnds
        ? (2 * Math.PI * OuterRadiusMeters * LengthMeters) + (2 * Math.PI * OuterRadiusMeters * OuterRadiusMeters)
        : (2 * Math.PI * (OuterRadiusMeters + InnerRadiusMeters) * LengthMeters) + (2 * Math.PI * ((OuterRadiusMeters * OuterRadiusMeters) - (InnerRadiusMeters * InnerRadiusMeters)));

    /// <summary>The wall: across pi (R^4 - Ri^4) l / 4, along pi (R^2 - Ri^2) l^3 / 12; each end wall adds pi Ri^4 t / 4 across and its volume times (zc^2 + t^2 / 12) along, zc = l/2 - t/2.</summary>
    public override (double Across, double Along) SecondMoments
    {
        get
        {
            double across = Math.PI * (Math.Pow(OuterRadiusMeters, 4) - Math.Pow(InnerRadiusMeters, 4)) * LengthMeters / 4;
            double along = Math.PI * ((OuterRadiusMeters * OuterRadiusMeters) - (InnerRadiusMeters * InnerRadiusMeters)) * Math.Pow(LengthMeters, 3) / 12;
            if (ClosedEnds)
            {
                double zc = (LengthMeters / 2) - (WallMeters / 2);
                across += 2 * Math.PI * Math.Pow(InnerRadiusMeters, 4) * WallMeters / 4;
                along += 2 * EndVolume * ((zc * zc) + (WallMeters * WallMeters / 12));
            }

            return (across, along);
        }
    }

    /// <summary>Rectangular cells over the wall [Ri, R] x [-l/2, l/2], graded toward all four surfaces; and over each end wall [0, Ri] x [l/2 - t, l/2].</summary>
    public override IReadOnlyList<Filament> Filaments(double surfaceCellMeters, int refinement = 1)
    {
        double half = LengthMeters / 2;
        var cells = FilamentMesh.Rectangle(InnerRadiusMeters, OuterRadiusMeters, -half, half, surfaceCellMeters, innerSurface: true, outerSurface: true, endSurfaces: true, minimumCells: refinement * FilamentMesh.MinimumCells);
        if (ClosedEnds)
        {
            cells.AddRange(FilamentMesh.Rectangle(0, InnerRadiusMeters, half - WallMeters, half, surfaceCellMeters, innerSurface: false, outerSurface: true, endSurfaces: true, minimumCells: 2 * refinement * FilamentMesh.MinimumCells));
            cells.AddRange(FilamentMesh.Rectangle(0, InnerRadiusMeters, -half, -half + WallMeters, surfaceCellMeters, innerSurface: false, outerSurface: true, endSurfaces: true, minimumCells: 2 * refinement * FilamentMesh.MinimumCells));
        }

        return cells;
    }

    /// <inheritdoc />
    public override string Describe() => (ClosedEnds ? "closed tube D " : "tube D ") + SiFormat.Format(2 * OuterRadiusMeters, "m");
}

/// <summary>A solid sphere of radius R.</summary>
public sealed class SphereBody : BodyGeometry
{
    /// <summary>Creates the body.</summary>
    public SphereBody(double diameterMeters)
        : base(diameterMeters / 2, new BodySection(diameterMeters / 2, diameterMeters, Math.PI * diameterMeters * diameterMeters / 8, "solid"))
    {
    }

    /// <inheritdoc />
    public override double LargestDimensionMeters => 2 * OuterRadiusMeters;

    /// <inheritdoc />
    public override double VolumeCubicMeters => 4.0 / 3 * Math.PI * Math.Pow(OuterRadiusMeters, 3);

    /// <inheritdoc />
    public override double SurfaceSquareMeters => 4 * Math.PI * OuterRadiusMeters * OuterRadiusMeters;

    /// <summary>Both R^2 V / 5.</summary>
    public override (double Across, double Along) SecondMoments
    {
        get
        {
            double m = OuterRadiusMeters * OuterRadiusMeters * VolumeCubicMeters / 5;
            return (m, m);
        }
    }

    /// <summary>Polar cells over the meridional half-disc, graded toward the surface.</summary>
    public override IReadOnlyList<Filament> Filaments(double surfaceCellMeters, int refinement = 1) =>
        FilamentMesh.Polar(0, OuterRadiusMeters, -Math.PI / 2, Math.PI / 2, surfaceCellMeters, refinement * 2 * FilamentMesh.MinimumCells);

    /// <inheritdoc />
    public override string Describe() => "sphere D " + SiFormat.Format(2 * OuterRadiusMeters, "m");
}
