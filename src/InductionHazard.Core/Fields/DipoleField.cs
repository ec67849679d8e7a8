using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A magnetic dipole of moment m at a point: B = (mu0 / 4 pi) (3 (m . r^) r^ - m) / r^3 (Jackson, Classical
/// Electrodynamics, 5.56), the far field of any compact source. It holds beyond about 3 times the source's size;
/// nearer points are refused when the size is given. Drive: a bare factor on the moment (1 = the full moment).
/// </summary>
public sealed class DipoleField : IFieldGeometry
{
    /// <summary>The far field holds beyond this many source sizes (common practice).</summary>
    public const double FarFieldSizes = 3;

    /// <summary>Creates the dipole.</summary>
    /// <param name="centre">Where the dipole is, m.</param>
    /// <param name="moment">The moment at a drive of 1, A m^2.</param>
    /// <param name="sourceSizeMeters">The largest dimension of the real source, m; null when not known (then no point but the centre is refused).</param>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public DipoleField(Vector3D centre, Vector3D moment, double? sourceSizeMeters = null)
    {
        if (!centre.IsFinite)
        {
            throw new InvalidInputException("Center", "must be finite; got " + centre);
        }

        Require.Direction("Moment", moment);
        if (sourceSizeMeters is { } size)
        {
            PhysicalRanges.ItemDimension.For("SourceSize").Check(size);
        }

        Centre = centre;
        Moment = moment;
        SourceSizeMeters = sourceSizeMeters;
    }

    /// <summary>Where the dipole is, m.</summary>
    public Vector3D Centre { get; }

    /// <summary>The moment at a drive of 1, A m^2.</summary>
    public Vector3D Moment { get; }

    /// <summary>The real source's largest dimension, m, or null.</summary>
    public double? SourceSizeMeters { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.Unspecified;

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point)
    {
        Vector3D r = point - Centre;
        double distance = r.Length;
        double nearest = SourceSizeMeters is { } size ? FarFieldSizes * size : 1e-6;
        if (!(distance >= nearest))
        {
            throw new FieldEvaluationException("the point " + point + " m is within " + SiFormat.Format(nearest, "m") + " of the dipole at " + Centre
                + " m, where its far field does not hold (it holds beyond " + SiFormat.Plain(FarFieldSizes) + " times the source's size)");
        }

        Vector3D unit = (1.0 / distance) * r;
        double scale = PhysicalConstants.VacuumPermeability / (4 * Math.PI * distance * distance * distance);
        return scale * ((3 * Moment.Dot(unit) * unit) - Moment);
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() =>
        "dipole of moment " + SiFormat.Format(Moment.Length, "A·m²") + " along " + Directions.Describe(Moment.Normalized()) + " at " + Centre + " m";
}
