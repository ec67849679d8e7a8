using System;
using System.Collections.Generic;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Mechanics;

/// <summary>
/// The pull and twist on a soft ferromagnetic item in a source's field: magnetisation mu0 M = min(chi B / (1 + N chi), Bs)
/// with the applied flux density B, the susceptibility chi = mu_r - 1, the demagnetising factor N and the saturation
/// Bs (a soft ellipsoid magnetised in a uniform field, common practice); the force F = V M grad|B| (mu0 M in tesla: F = V (mu0 M / mu0) grad|B|); the torque bounded
/// by |m x B| &lt;= V M |B| for an item with shape anisotropy, zero for a sphere of soft material.
/// </summary>
/// <param name="FieldTesla">The largest |B| at the item's centre over the drive, T.</param>
/// <param name="GradientTeslaPerMeter">|grad |B|| there, T/m.</param>
/// <param name="MagnetisationTesla">mu0 M, T.</param>
/// <param name="ForceNewtons">The pull along grad |B|, N.</param>
/// <param name="ForceDirection">Its direction (up the gradient, toward stronger field).</param>
/// <param name="TorqueNewtonMeters">The bound on the twist, N m.</param>
/// <param name="DemagnetisingFactor">The demagnetising factor used.</param>
public sealed record FerromagneticAttraction(
    double FieldTesla, double GradientTeslaPerMeter, double MagnetisationTesla, double ForceNewtons, Vector3D ForceDirection, double TorqueNewtonMeters, double DemagnetisingFactor)
{
    /// <summary>mu0 M of a soft ferromagnet in an applied flux density: min(chi B / (1 + N chi), Bs), T.</summary>
    public static double Magnetisation(double appliedTesla, double relativePermeability, double demagnetisingFactor, double saturationTesla)
    {
        double chi = relativePermeability - 1;
        return Math.Min(chi * appliedTesla / (1 + (demagnetisingFactor * chi)), saturationTesla);
    }

    /// <summary>
    /// The pull and twist on a ferromagnetic item at a point: the largest |B| at the centre over the drive (as
    /// <see cref="FieldStrength"/> finds it), and the gradient of |B| there at that moment by central differences
    /// over a thousandth of the item's size.
    /// </summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be evaluated at or near the point.</exception>
    public static FerromagneticAttraction At(FieldSource source, Vector3D centre, ConductiveItem item)
    {
        var drives = new FieldWaveform[source.Terms.Count];
        for (int k = 0; k < drives.Length; k++)
        {
            drives[k] = source.Terms[k].Waveform;
        }

        // The largest |B| at the centre over the drive and when, as Get-FieldStrength finds them.
        FieldStrength strength = FieldStrength.At(source, centre);
        double best = strength.PeakFluxDensityTesla, at = strength.PeakSeconds;

        double step = Math.Max(1e-3 * item.Loop.LargestDimensionMeters, 1e-6);
        double Magnitude(Vector3D p) => Field(source.FieldPerUnitDrive(p), drives, at).Length;
        var gradient = new Vector3D(
            (Magnitude(centre + (step * Vector3D.UnitX)) - Magnitude(centre - (step * Vector3D.UnitX))) / (2 * step),
            (Magnitude(centre + (step * Vector3D.UnitY)) - Magnitude(centre - (step * Vector3D.UnitY))) / (2 * step),
            (Magnitude(centre + (step * Vector3D.UnitZ)) - Magnitude(centre - (step * Vector3D.UnitZ))) / (2 * step));

        double n = Demagnetisation.Smallest(item.Loop);
        double mu0M = Magnetisation(best, item.Material.RelativePermeability, n, item.Material.SaturationTesla);
        double volume = item.Loop.VolumeCubicMeters;
        double force = volume * mu0M / PhysicalConstants.VacuumPermeability * gradient.Length;
        double torque = item.Loop is SphereBody ? 0 : volume * mu0M / PhysicalConstants.VacuumPermeability * best;
        return new FerromagneticAttraction(best, gradient.Length, mu0M, force, gradient.Length > 0 ? gradient.Normalized() : Vector3D.Zero, torque, n);
    }

    private static Vector3D Field(Vector3D[] perDrive, FieldWaveform[] drives, double t)
    {
        Vector3D b = Vector3D.Zero;
        for (int k = 0; k < drives.Length; k++)
        {
            b += drives[k].Value(t) * perDrive[k];
        }

        return b;
    }
}
