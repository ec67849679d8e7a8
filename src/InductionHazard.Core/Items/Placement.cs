using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// Where an item is and how its loop faces: the loop's centre and the unit normal of its plane. Without a
/// normal the loop faces the field at its centre (the worst case for induction).
/// </summary>
public sealed class Placement
{
    /// <summary>Creates a placement.</summary>
    /// <exception cref="InvalidInputException">The normal is zero or not finite, or the centre is not finite.</exception>
    /// <exception cref="InvalidInputException">The velocity is not finite or beyond what a person moves an item at.</exception>
    public Placement(Vector3D centre, Vector3D? normal = null, Vector3D? velocity = null)
        : this(centre, normal, velocity, null)
    {
    }

    /// <summary>Creates a placement whose loop is turned by a tilt from the orientation that links the largest flux change.</summary>
    /// <param name="centre">The loop's centre, m.</param>
    /// <param name="normal">The loop's normal, or null for the worst orientation (turned by <paramref name="tiltDegrees"/> when given).</param>
    /// <param name="velocity">The velocity the item is moved at, m/s, or null.</param>
    /// <param name="tiltDegrees">How far the loop is turned from the worst orientation, 0 to 90 degrees; only without a normal.</param>
    /// <exception cref="InvalidInputException">A value is out of range, or both a normal and a tilt are given.</exception>
    public Placement(Vector3D centre, Vector3D? normal, Vector3D? velocity, double? tiltDegrees)
    {
        if (!centre.IsFinite)
        {
            throw new InvalidInputException("Position", "must be finite; got " + centre);
        }

        Centre = centre;
        Normal = normal is { } n ? Require.Direction("Normal", n) : null;
        if (velocity is { } v && (!v.IsFinite || PhysicalRanges.Speed.Problem(v.Length) is not null))
        {
            throw new InvalidInputException("Velocity", PhysicalRanges.Speed.Problem(v.Length) ?? "must be finite; got " + v);
        }

        Velocity = velocity is { } w && w.Length > 0 ? w : null;
        if (tiltDegrees is { } tilt)
        {
            PhysicalRanges.Tilt.Check(tilt);
            if (normal is not null)
            {
                throw new InvalidInputException("Tilt", "give a normal or a tilt from the worst orientation, not both");
            }

            TiltDegrees = tilt;
        }
    }

    /// <summary>
    /// The orientation that stands where a row, the run and a station may each give one: the row's normal or tilt,
    /// else the run's (-Normal or -Tilt), else the station's normal or tilt, else none (the worst orientation). A
    /// normal and a tilt given together at one level are refused when the placement is made.
    /// </summary>
    /// <param name="row">The row's normal and tilt.</param>
    /// <param name="run">The run's normal and tilt.</param>
    /// <param name="station">The station's normal and tilt.</param>
    public static (Vector3D? Normal, double? TiltDegrees) Orientation((Vector3D? Normal, double? TiltDegrees) row, (Vector3D? Normal, double? TiltDegrees) run, (Vector3D? Normal, double? TiltDegrees) station) =>
        row.Normal is not null || row.TiltDegrees is not null ? row
        : run.Normal is not null || run.TiltDegrees is not null ? run
        : station;

    /// <summary>The placement's own normal and tilt, as <see cref="Orientation"/> takes a station's.</summary>
    public (Vector3D? Normal, double? TiltDegrees) Facing => (Normal, TiltDegrees);

    /// <summary>How far the loop is turned from the orientation that links the largest flux change, degrees; null when it faces it (or a normal is given).</summary>
    public double? TiltDegrees { get; }

    /// <summary>
    /// A body's placement turned with its axis across the largest flux change, for judging beside the axis along it
    /// (<see cref="Assessment.InductionEngine"/>): the normal is the engine's choice, not the user's.
    /// </summary>
    /// <param name="given">The placement as given, without a normal or a tilt.</param>
    /// <param name="across">The axis across the largest flux change.</param>
    /// <param name="along">The axis along it, the orientation the engine found first.</param>
    internal static Placement AcrossAxis(Placement given, Vector3D across, Vector3D along) =>
        new(given.Centre, across, given.Velocity, null) { AxisAlong = along };

    /// <summary>
    /// A body's placement turned to the orientation where a search on a model of its heating put the most, for judging
    /// beside its axis along the largest flux change and across it (<see cref="Assessment.InductionEngine"/>): the
    /// normal is the engine's choice.
    /// </summary>
    /// <param name="given">The placement as given, without a normal or a tilt.</param>
    /// <param name="axis">The axis the search found.</param>
    /// <param name="along">The axis along the largest flux change.</param>
    internal static Placement TurnedBySearch(Placement given, Vector3D axis, Vector3D along) =>
        new(given.Centre, axis, given.Velocity, null) { AxisAlong = along, Searched = true };

    /// <summary>For a body turned by the engine (across the largest flux change, or by a search), the axis along it; null otherwise.</summary>
    internal Vector3D? AxisAlong { get; private init; }

    /// <summary>True for a body the engine turned to the orientation a search found (<see cref="TurnedBySearch"/>).</summary>
    internal bool Searched { get; private init; }

    /// <summary>The loop at the origin facing the field.</summary>
    public static Placement FacingField { get; } = new(Vector3D.Zero);

    /// <summary>The loop's centre, m.</summary>
    public Vector3D Centre { get; }

    /// <summary>The loop's unit normal, or null to face the field.</summary>
    public Vector3D? Normal { get; }

    /// <summary>The velocity at which the item is moved through the (static) field here, m/s; null when it is not moved.</summary>
    public Vector3D? Velocity { get; }

    /// <summary>"centred at (0, 0, 0.06), normal (0, 0, 1)" or "facing the field".</summary>
    public override string ToString() =>
        "centred at " + Centre + (Normal is { } n ? ", normal " + n : TiltDegrees is { } t ? ", tilted " + SiFormat.Plain(t) + " degrees from the largest flux change" : ", facing the largest flux change") + (Velocity is { } v ? ", moving at " + v + " m/s" : string.Empty);
}
