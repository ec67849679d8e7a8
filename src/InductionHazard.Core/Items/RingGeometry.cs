using System;
using System.Collections.Generic;

namespace InductionHazard.Items;

/// <summary>
/// A circular loop: its mean diameter D (the centre line of the wire or band) and cross-section. Rings are
/// sized by inner diameter, as jewellers do; the loop is computed on the centre line.
/// </summary>
public sealed class RingGeometry : LoopGeometry
{
    /// <summary>Creates the geometry.</summary>
    public RingGeometry(double meanDiameterMeters, CrossSection section)
        : base(section)
    {
        MeanDiameterMeters = meanDiameterMeters;
    }

    /// <summary>The mean (centre-line) diameter D, m.</summary>
    public double MeanDiameterMeters { get; }

    /// <summary>The loop radius R = D / 2, m.</summary>
    public double LoopRadiusMeters => MeanDiameterMeters / 2;

    /// <summary>The inner diameter D - radial extent, m.</summary>
    public double InnerDiameterMeters => MeanDiameterMeters - Section.RadialExtentMeters;

    /// <summary>The outer diameter D + radial extent, m.</summary>
    public double OuterDiameterMeters => MeanDiameterMeters + Section.RadialExtentMeters;

    /// <summary>The area the centre line encloses, pi (D/2)^2, m^2: the flux area of the loop.</summary>
    public override double LoopAreaSquareMeters => Math.PI * LoopRadiusMeters * LoopRadiusMeters;

    /// <summary>The length of the centre line, pi D, m: the current path.</summary>
    public override double PathLengthMeters => Math.PI * MeanDiameterMeters;

    /// <summary>The largest dimension of the item, m (the outer diameter).</summary>
    public override double LargestDimensionMeters => Math.Max(OuterDiameterMeters, Section.LargestDimensionMeters);

    /// <summary>The loop radius.</summary>
    public override double HalfSpanMeters => LoopRadiusMeters;

    /// <summary>
    /// The ring as coaxial filaments over its section: polar cells over a round wire's disc, rectangular cells over a
    /// band (width along the axis, thickness radial), graded toward every surface.
    /// </summary>
    public override IReadOnlyList<Filament> Filaments(double surfaceCellMeters, int refinement = 1) => Section switch
    {
        RoundWire wire => FilamentMesh.Polar(LoopRadiusMeters, wire.RadiusMeters, 0, 2 * Math.PI, surfaceCellMeters, refinement * FilamentMesh.MinimumCells),
        RectangularBand band => FilamentMesh.Rectangle(
            LoopRadiusMeters - (band.ThicknessMeters / 2), LoopRadiusMeters + (band.ThicknessMeters / 2), -band.WidthMeters / 2, band.WidthMeters / 2, surfaceCellMeters, innerSurface: true, outerSurface: true, endSurfaces: true, minimumCells: refinement * FilamentMesh.MinimumCells),
        _ => throw new InvalidOperationException("unknown section " + Section.GetType().Name),
    };

    /// <inheritdoc />
    public override string Describe() => "circle D " + Quantities.SiFormat.Format(MeanDiameterMeters, "m");
}
