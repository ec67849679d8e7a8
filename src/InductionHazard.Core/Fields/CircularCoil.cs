using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A flat circular coil of N turns of radius a, as one filament loop carrying N I. With k^2 = 4 a rho /
/// ((a + rho)^2 + z^2): Bz = (mu0 N I / 2 pi) [K + (a^2 - rho^2 - z^2) / ((a - rho)^2 + z^2) E] / sqrt((a + rho)^2 + z^2),
/// Brho = (mu0 N I / (2 pi rho)) z [-K + (a^2 + rho^2 + z^2) / ((a - rho)^2 + z^2) E] / sqrt((a + rho)^2 + z^2)
/// (Smythe, Static and Dynamic Electricity, 7.10; Jackson, Classical Electrodynamics, 5.5). On the axis
/// Bz = mu0 N I a^2 / (2 (a^2 + z^2)^1.5). Drive: the current in amperes, anticlockwise seen from +axis.
/// </summary>
public sealed class CircularCoil : IFieldGeometry
{
    /// <summary>Points nearer the winding than this fraction of the radius are on the conductor.</summary>
    public const double OnWindingFraction = 1e-6;

    /// <summary>Below this fraction of the radius from the axis, Brho is taken from its first-order expansion (error of order (rho/a)^2).</summary>
    private const double NearAxisFraction = 1e-4;

    /// <summary>Creates the coil.</summary>
    /// <exception cref="InvalidInputException">The radius or turns are out of range.</exception>
    public CircularCoil(Axis axis, double radiusMeters, double turns)
    {
        PhysicalRanges.ItemDimension.For("Radius").Check(radiusMeters);
        if (!(turns >= 1 && turns <= 1e6))
        {
            throw new InvalidInputException("Turns", "must be between 1 and 1e6; got " + SiFormat.Plain(turns));
        }

        Axis = axis;
        RadiusMeters = radiusMeters;
        Turns = turns;
    }

    /// <summary>The coil's axis through its centre.</summary>
    public Axis Axis { get; }

    /// <summary>The coil's radius a, m.</summary>
    public double RadiusMeters { get; }

    /// <summary>The number of turns N.</summary>
    public double Turns { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.Current;

    /// <summary>The field of one filament loop of radius a carrying 1 A, at local (rho, z): (Brho, Bz), T.</summary>
    /// <exception cref="FieldEvaluationException">The point is on the winding.</exception>
    public static (double Radial, double Axial) LoopField(double a, double rho, double z)
    {
        double mu0 = PhysicalConstants.VacuumPermeability;
        double near = ((a - rho) * (a - rho)) + (z * z);
        if (!(near > OnWindingFraction * OnWindingFraction * a * a))
        {
            throw new FieldEvaluationException("the point is on the coil's winding (radius " + SiFormat.Format(a, "m") + "): the field there is not that of a filament");
        }

        if (rho < NearAxisFraction * a)
        {
            double s = (a * a) + (z * z);
            double axial = mu0 * a * a / (2 * Math.Pow(s, 1.5));
            double radial = 3 * mu0 * a * a * z * rho / (4 * Math.Pow(s, 2.5));
            return (radial, axial);
        }

        double far = ((a + rho) * (a + rho)) + (z * z);
        double m = 4 * a * rho / far;
        (double k, double e) = EllipticIntegrals.Both(m);
        double root = Math.Sqrt(far);
        double bz = mu0 / (2 * Math.PI) * (k + ((((a * a) - (rho * rho) - (z * z)) / near) * e)) / root;
        double brho = mu0 / (2 * Math.PI * rho) * z * (-k + ((((a * a) + (rho * rho) + (z * z)) / near) * e)) / root;
        return (brho, bz);
    }

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point)
    {
        (double z, Vector3D radial) = Axis.Local(point);
        double rho = radial.Length;
        (double br, double bz) = LoopField(RadiusMeters, rho, z);
        Vector3D b = Turns * bz * Axis.Direction;
        return rho > 0 ? b + (Turns * br / rho * radial) : b;
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() =>
        "coil of " + SiFormat.Plain(Turns) + " turns, radius " + SiFormat.Format(RadiusMeters, "m") + ", " + Axis.Describe();
}
