using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// An infinitely long straight conductor: B = mu0 I / (2 pi rho), azimuthal about the axis (Ampere's law; any
/// electromagnetism text). Drive: the current in amperes, positive along the axis.
/// </summary>
public sealed class LineConductor : IFieldGeometry
{
    /// <summary>Points nearer the axis than this are on the conductor, m.</summary>
    public const double OnConductorMeters = 1e-6;

    /// <summary>Creates the conductor along an axis.</summary>
    public LineConductor(Axis axis)
    {
        Axis = axis;
    }

    /// <summary>The conductor's axis; positive current flows along its direction.</summary>
    public Axis Axis { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.Current;

    /// <summary>The field of a line current of 1 A along a direction through a point, at another point, T.</summary>
    /// <exception cref="FieldEvaluationException">The point is on the conductor.</exception>
    public static Vector3D Field(Axis axis, Vector3D point)
    {
        (_, Vector3D radial) = axis.Local(point);
        double rho2 = radial.Dot(radial);
        if (!(rho2 > OnConductorMeters * OnConductorMeters))
        {
            throw new FieldEvaluationException("the point " + point + " m is on the conductor " + axis.Describe() + ": the field there is not that of a line current");
        }

        return PhysicalConstants.VacuumPermeability / (2 * Math.PI * rho2) * axis.Direction.Cross(radial);
    }

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point) => Field(Axis, point);

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() => "straight conductor " + Axis.Describe();
}
