using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A solenoid of radius a, length l and N turns, as a current sheet: on the axis
/// Bz = (mu0 N I / 2l) [(z + l/2) / sqrt((z + l/2)^2 + a^2) - (z - l/2) / sqrt((z - l/2)^2 + a^2)] (any
/// electromagnetism text); off the axis in closed form by Bulirsch's generalized complete elliptic integral C
/// (Derby and Olbert, Am. J. Phys. 78, 229, 2010): with B0 = mu0 (N / l) I / pi, z+- = z +- l/2,
/// alpha+- = a / sqrt(z+-^2 + (rho + a)^2), beta+- = z+- / sqrt(z+-^2 + (rho + a)^2), gamma = (a - rho) / (a + rho) and
/// k+-^2 = (z+-^2 + (a - rho)^2) / (z+-^2 + (rho + a)^2): Brho = B0 [alpha+ C(k+, 1, 1, -1) - alpha- C(k-, 1, 1, -1)],
/// Bz = B0 a / (a + rho) [beta+ C(k+, gamma^2, 1, gamma) - beta- C(k-, gamma^2, 1, gamma)]. Drive: the current in
/// amperes.
/// </summary>
public sealed class SolenoidField : IFieldGeometry
{
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

        (double br, double bz) = SheetField(RadiusMeters, LengthMeters / 2, rho, z);
        double b0 = PhysicalConstants.VacuumPermeability * Turns / LengthMeters / Math.PI;
        return (b0 * bz * Axis.Direction) + (b0 * br / rho * radial);
    }

    /// <summary>
    /// Derby and Olbert's brackets for a current sheet of radius a from -h to h along the axis, at (rho, z) off the axis:
    /// (Brho, Bz) over B0 = mu0 n I / pi.
    /// </summary>
    private static (double Radial, double Axial) SheetField(double a, double h, double rho, double z)
    {
        double zp = z + h, zm = z - h, sum = (a + rho) * (a + rho), difference = (a - rho) * (a - rho);
        double alphaPlus = a / Math.Sqrt((zp * zp) + sum), alphaMinus = a / Math.Sqrt((zm * zm) + sum);
        double kPlus = Math.Sqrt(((zp * zp) + difference) / ((zp * zp) + sum)), kMinus = Math.Sqrt(((zm * zm) + difference) / ((zm * zm) + sum));
        double gamma = (a - rho) / (a + rho);
        double radial = (alphaPlus * EllipticIntegrals.Cel(kPlus, 1, 1, -1)) - (alphaMinus * EllipticIntegrals.Cel(kMinus, 1, 1, -1));
        double axial = ((zp * alphaPlus * EllipticIntegrals.Cel(kPlus, gamma * gamma, 1, gamma)) - (zm * alphaMinus * EllipticIntegrals.Cel(kMinus, gamma * gamma, 1, gamma))) / (a + rho);
        return (radial, axial);
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() =>
        "solenoid of " + SiFormat.Plain(Turns) + " turns, radius " + SiFormat.Format(RadiusMeters, "m") + ", length "
        + SiFormat.Format(LengthMeters, "m") + ", " + Axis.Describe();
}
