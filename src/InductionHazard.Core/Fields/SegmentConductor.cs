using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A straight conductor from A to B: B = mu0 I / (4 pi rho) (cos th1 - cos th2), azimuthal, with th1 and th2 the
/// angles at the point between the conductor's direction and the lines to its ends (Biot-Savart law integrated
/// along a segment; any electromagnetism text). Drive: the current in amperes, flowing from A to B.
/// </summary>
public sealed class SegmentConductor : IFieldGeometry
{
    /// <summary>Creates the segment.</summary>
    /// <exception cref="InvalidInputException">An end is not finite, or the ends coincide.</exception>
    public SegmentConductor(Vector3D start, Vector3D end)
    {
        if (!start.IsFinite || !end.IsFinite)
        {
            throw new InvalidInputException("Start", "the segment's ends must be finite; got " + start + " and " + end);
        }

        Start = start;
        End = end;
        Axis = new Axis(start, end - start);
        LengthMeters = (end - start).Length;
        PhysicalRanges.ItemDimension.For("End").Check(LengthMeters);
    }

    /// <summary>Where the current enters, m.</summary>
    public Vector3D Start { get; }

    /// <summary>Where the current leaves, m.</summary>
    public Vector3D End { get; }

    /// <summary>The segment's axis (from Start toward End).</summary>
    public Axis Axis { get; }

    /// <summary>The segment's length, m.</summary>
    public double LengthMeters { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.Current;

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point)
    {
        (double z, Vector3D radial) = Axis.Local(point);
        double rho = radial.Length;
        if (!(rho > LineConductor.OnConductorMeters))
        {
            if (z >= -LineConductor.OnConductorMeters && z <= LengthMeters + LineConductor.OnConductorMeters)
            {
                throw new FieldEvaluationException("the point " + point + " m is on the conductor from " + Start + " to " + End + " m");
            }

            return Vector3D.Zero;
        }

        double cos1 = z / Math.Sqrt((z * z) + (rho * rho));
        double zb = z - LengthMeters;
        double cos2 = zb / Math.Sqrt((zb * zb) + (rho * rho));
        double magnitude = PhysicalConstants.VacuumPermeability / (4 * Math.PI * rho) * (cos1 - cos2);
        return magnitude / rho * Axis.Direction.Cross(radial);
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() => "conductor from " + Start + " to " + End + " m";
}
