using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A solenoid of radius a, length l and N turns, as a current sheet: on the axis
/// Bz = (mu0 N I / 2l) [(z + l/2) / sqrt((z + l/2)^2 + a^2) - (z - l/2) / sqrt((z - l/2)^2 + a^2)] (any
/// electromagnetism text); off the axis, the filament-loop field (<see cref="CircularCoil.LoopField"/>) integrated
/// along the length with N / l turns per metre by composite Gauss-Legendre quadrature (8 points on panels no longer
/// than a quarter of the radius). Drive: the current in amperes.
/// </summary>
public sealed class SolenoidField : IFieldGeometry
{
    private const int MinPanels = 32;
    private const int MaxPanels = 4000;
    private const int Order = 8;

    /// <summary>Creates the solenoid.</summary>
    /// <exception cref="InvalidInputException">A size or the turns are out of range.</exception>
    public SolenoidField(Axis axis, double radiusMeters, double lengthMeters, double turns)
    {
        PhysicalRanges.ItemDimension.For("Radius").Check(radiusMeters);
        PhysicalRanges.ItemDimension.For("Length").Check(lengthMeters);
        if (!(turns >= 1 && turns <= 1e7))
        {
            throw new InvalidInputException("Turns", "must be between 1 and 1e7; got " + SiFormat.Plain(turns));
        }

        Axis = axis;
        RadiusMeters = radiusMeters;
        LengthMeters = lengthMeters;
        Turns = turns;
    }

    /// <summary>The axis through the solenoid's centre.</summary>
    public Axis Axis { get; }

    /// <summary>The radius a, m.</summary>
    public double RadiusMeters { get; }

    /// <summary>The length l, m.</summary>
    public double LengthMeters { get; }

    /// <summary>The number of turns N.</summary>
    public double Turns { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.Current;

    /// <summary>The field on the axis per ampere, closed form, T.</summary>
    public double AxialFieldPerAmpere(double z)
    {
        double a = RadiusMeters, h = LengthMeters / 2;
        return PhysicalConstants.VacuumPermeability * Turns / (2 * LengthMeters)
            * (((z + h) / Math.Sqrt(((z + h) * (z + h)) + (a * a))) - ((z - h) / Math.Sqrt(((z - h) * (z - h)) + (a * a))));
    }

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point)
    {
        (double z, Vector3D radial) = Axis.Local(point);
        double rho = radial.Length;
        if (rho < 1e-9 * RadiusMeters)
        {
            return AxialFieldPerAmpere(z) * Axis.Direction;
        }

        if (Math.Abs(rho - RadiusMeters) < CircularCoil.OnWindingFraction * RadiusMeters && Math.Abs(z) <= LengthMeters / 2)
        {
            throw new FieldEvaluationException("the point " + point + " m is on the solenoid's winding");
        }

        // A loop's field varies along the length over about the radius: panels no longer than a quarter of it.
        int panels = (int)Math.Min(MaxPanels, Math.Max(MinPanels, Math.Ceiling(4 * LengthMeters / RadiusMeters)));
        GaussLegendre.Rule rule = GaussLegendre.Of(Order);
        double panel = LengthMeters / panels, br = 0, bz = 0;
        for (int p = 0; p < panels; p++)
        {
            double mid = (-LengthMeters / 2) + ((p + 0.5) * panel);
            for (int i = 0; i < Order; i++)
            {
                double zp = mid + (0.5 * panel * rule.Nodes[i]);
                (double r, double a) = CircularCoil.LoopField(RadiusMeters, rho, z - zp);
                double w = rule.Weights[i] * 0.5 * panel;
                br += w * r;
                bz += w * a;
            }
        }

        double density = Turns / LengthMeters;
        return (density * bz * Axis.Direction) + (density * br / rho * radial);
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() =>
        "solenoid of " + SiFormat.Plain(Turns) + " turns, radius " + SiFormat.Format(RadiusMeters, "m") + ", length "
        + SiFormat.Format(LengthMeters, "m") + ", " + Axis.Describe();
}
