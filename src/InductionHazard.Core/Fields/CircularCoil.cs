using System;
using System.Collections.Generic;
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
public sealed class CircularCoil : IFieldGeometry, IClosedFormDiscFlux
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

    /// <summary>
    /// The flux through a disc on the coil's axis and square to it, clear of the winding (see <see cref="ClosedFormFluxes"/>),
    /// in closed form; through any other disc by quadrature (<see cref="DiscQuadrature"/>), which refuses a disc too
    /// near the winding to integrate.
    /// </summary>
    /// <exception cref="FieldEvaluationException">The quadrature does not converge (the disc is too close to the winding).</exception>
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        (Coaxial(centre, normal, out double z, out double sign) ? CoaxialFlux(radius, z, sign) : null)
            ?? DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <summary>
    /// Through discs whose plane is square to the coil's axis and centred on it (to a part in 1e9 of the radius and
    /// 1e-9 rad: the flux changes with the squares of offset and tilt), and whose edge stays at least half the coil's
    /// radius from the winding, the flux in closed form: N times Maxwell's mutual inductance of coaxial circles,
    /// signed by the normal. Null if any disc is not such a disc; nearer the winding the quadrature decides, as it
    /// does off the axis.
    /// </summary>
    public double[]? ClosedFormFluxes(Vector3D centre, Vector3D normal, IReadOnlyList<double> radii)
    {
        if (!Coaxial(centre, normal, out double z, out double sign))
        {
            return null;
        }

        var fluxes = new double[radii.Count];
        for (int k = 0; k < fluxes.Length; k++)
        {
            if (CoaxialFlux(radii[k], z, sign) is not { } flux)
            {
                return null;
            }

            fluxes[k] = flux;
        }

        return fluxes;
    }

    /// <summary>The flux through a disc on the axis, z along it, its normal's sign along it; null if the disc is not clear of the winding.</summary>
    private double? CoaxialFlux(double radius, double z, double sign) =>
        !ClearOfWinding(radius, z) ? null
        : radius == 0 ? 0
        : sign * Turns * CoaxialMutualInductance(RadiusMeters, radius, z);

    /// <summary>
    /// Around the rim of a disc that <see cref="ClosedFormFluxes"/> takes, the line integral of dl x b in closed form: by
    /// symmetry only the axial part remains, -2 pi r B_rho(r, z) along the axis (for a rim counter-clockwise about the
    /// axis), which is the axial gradient of the flux, d Phi / dz (no flux leaves a thin cylinder: d Phi / dz = -2 pi r
    /// B_rho). Null for any other disc.
    /// </summary>
    public Vector3D? ClosedFormRimForce(Vector3D centre, Vector3D normal, double radius)
    {
        if (!Coaxial(centre, normal, out double z, out double sign) || !ClearOfWinding(radius, z))
        {
            return null;
        }

        if (radius == 0)
        {
            return Vector3D.Zero;
        }

        (double radial, _) = LoopField(RadiusMeters, radius, z);
        return (-sign * 2 * Math.PI * radius * Turns * radial) * Axis.Direction;
    }

    /// <summary>
    /// The mutual inductance of two coaxial circles, radii a and b, planes d apart, H (Maxwell; Grover, Inductance
    /// Calculations, 1946): M = mu0 sqrt(ab) [(2/k - k) K(k) - (2/k) E(k)], k^2 = 4ab / ((a + b)^2 + d^2). Where k^2
    /// is below 0.05 (circles far apart or of very different size), where the bracket is the small difference of
    /// large terms, from its series instead, summed until its terms fall below 1e-18 of the sum: pi sum over j of
    /// c_j j / (2j + 2) k^(2j + 1), c_j the squares of (2j)! / (4^j j!^2) that K's series has (the j = 1 term,
    /// pi k^3 / 16, is the two circles as dipoles). The filament model's mutual inductances are these too.
    /// </summary>
    public static double CoaxialMutualInductance(double a, double b, double d)
    {
        double m = 4 * a * b / (((a + b) * (a + b)) + (d * d));
        double k = Math.Sqrt(m);
        double bracket;
        if (m < 0.05)
        {
            double c = 0.25, power = k * m, sum = 0;
            for (int j = 1; j < 60; j++)
            {
                double term = c * j / ((2 * j) + 2) * power;
                sum += term;
                if (term <= 1e-18 * sum)
                {
                    break;
                }

                c *= ((2 * j) + 1) / ((2.0 * j) + 2) * (((2 * j) + 1) / ((2.0 * j) + 2));
                power *= m;
            }

            bracket = Math.PI * sum;
        }
        else
        {
            // Coincident filaments (a = b, d = 0) have no finite mutual inductance: kept just short of k = 1.
            (double kk, double ee) = EllipticIntegrals.Both(Math.Min(m, 1 - 1e-16));
            bracket = (((2 / k) - k) * kk) - (2 / k * ee);
        }

        return PhysicalConstants.VacuumPermeability * Math.Sqrt(a * b) * bracket;
    }

    /// <summary>
    /// Whether a disc's plane is square to the axis and centred on it, to a part in 1e9; its offset along the axis, and
    /// the sign of its normal along the axis.
    /// </summary>
    private bool Coaxial(Vector3D centre, Vector3D normal, out double z, out double sign)
    {
        (z, Vector3D radial) = Axis.Local(centre);
        double length = normal.Length;
        double along = normal.Dot(Axis.Direction) / length;
        sign = along > 0 ? 1 : along < 0 ? -1 : 0;
        return radial.Length <= 1e-9 * RadiusMeters && normal.Cross(Axis.Direction).Length <= 1e-9 * length && Finite.Is(z) && sign != 0;
    }

    /// <summary>Whether a disc of this radius, this far along the axis, stays at least half the coil's radius from the winding.</summary>
    private bool ClearOfWinding(double radius, double z)
    {
        double a = RadiusMeters;
        double gap = radius >= a ? Math.Abs(z) : Math.Sqrt(((a - radius) * (a - radius)) + (z * z));
        return radius >= 0 && gap >= 0.5 * a;
    }

    /// <inheritdoc />
    public string Describe() =>
        "coil of " + SiFormat.Plain(Turns) + " turns, radius " + SiFormat.Format(RadiusMeters, "m") + ", " + Axis.Describe();
}
