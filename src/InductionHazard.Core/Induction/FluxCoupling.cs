using System;
using System.Collections.Generic;
using System.Linq;
using System.Numerics;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Induction;

/// <summary>
/// The coupling of a flat loop to a source: the flux per unit drive of each term, M_k = integral of b_k . n dA
/// over the loop's disc, and the orientation of the loop that links the largest flux change when none is given.
/// </summary>
public static class FluxCoupling
{
    /// <summary>The flux through the loop per unit drive of each term (Wb per tesla or per ampere).</summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    /// <param name="source">The field source.</param>
    /// <param name="centre">The loop's centre, m.</param>
    /// <param name="normal">The loop's unit normal.</param>
    /// <param name="loop">The loop.</param>
    /// <param name="width">For a rectangular outline, the direction of its width in its plane; null for the usual one (<see cref="RectangularLoopGeometry.WidthDirection(Vector3D)"/>).</param>
    public static double[] PerUnitDrive(FieldSource source, Vector3D centre, Vector3D normal, LoopGeometry loop, Vector3D? width = null)
    {
        var coupling = new double[source.Terms.Count];
        for (int k = 0; k < coupling.Length; k++)
        {
            coupling[k] = Flux(source.Terms[k].Geometry, centre, normal, loop, width);
        }

        return coupling;
    }

    /// <summary>The flux per unit drive of one geometry through the loop's outline: a disc, or a rectangle whose width lies along <paramref name="width"/> (by default <see cref="RectangularLoopGeometry.WidthDirection(Vector3D)"/>).</summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static double Flux(IFieldGeometry geometry, Vector3D centre, Vector3D normal, LoopGeometry loop, Vector3D? width = null) => loop switch
    {
        RectangularLoopGeometry r when geometry is UniformField u => u.Direction.Dot(normal) * r.LoopAreaSquareMeters,
        RectangularLoopGeometry r => RectangleQuadrature.Flux(geometry.FieldPerUnitDrive, centre, normal, RectangularLoopGeometry.WidthDirection(normal, width), r.WidthMeters, r.HeightMeters),
        PrismBody p when geometry is UniformField u => u.Direction.Dot(normal) * p.LoopAreaSquareMeters,
        PrismBody p => RectangleQuadrature.Flux(geometry.FieldPerUnitDrive, centre, normal, RectangularLoopGeometry.WidthDirection(normal, width), p.WidthMeters, p.HeightMeters),
        _ => geometry.FluxThroughDisc(centre, normal, loop.HalfSpanMeters),
    };

    /// <summary>
    /// The unit normal that links the largest flux change (<see cref="WorstOrientation"/>, without a rectangle's turn
    /// within its plane).
    /// </summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static Vector3D WorstNormal(FieldSource source, Vector3D centre, LoopGeometry loop) =>
        WorstOrientation(source, centre, loop).Normal;

    /// <summary>
    /// The orientation that links the largest flux change. First the normal from the flux per unit drive of loops
    /// facing x, y and z (a vector per term): for sinusoids of one frequency, the principal direction of the summed
    /// complex flux vector; otherwise the direction of the largest flux change over the drive, or of the largest flux
    /// (which leaving the field removes), whichever is larger. That is exact where the loop's flux is linear in its
    /// normal (a uniform field); in a field that varies across the loop the outline turns with its normal and the flux
    /// is not, so the orientation of a loop or a flat body is then refined on its own flux (<see cref="Refined"/>),
    /// a rectangle's turn within its plane with it. The normal is oriented along the field at the centre where that is
    /// defined, so a positive drive gives a positive flux.
    /// </summary>
    /// <returns>The normal, and for a rectangular outline whose turn within its plane was searched, the direction of its width (null: the usual one, <see cref="RectangularLoopGeometry.WidthDirection(Vector3D)"/>).</returns>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static (Vector3D Normal, Vector3D? Width) WorstOrientation(FieldSource source, Vector3D centre, LoopGeometry loop) =>
        Refined(source, centre, loop, Worst(source, centre, FluxVectors(source, centre, loop)));

    /// <summary>The largest angle between orientations the refinement starts from, radians (8 degrees).</summary>
    private const double FirstTurn = 8 * Math.PI / 180;

    /// <summary>The smallest, radians (a quarter of a degree): near the largest, the flux falls with the square of the angle, here by some 1e-5.</summary>
    private const double LastTurn = 0.25 * Math.PI / 180;

    /// <summary>The most trial orientations the refinement takes.</summary>
    private const int MostTrials = 300;

    /// <summary>What a turn from the estimate may be predicted to add to its peak, at most, for the estimate to stand: a share of the peak.</summary>
    private const double GainTolerance = 1e-5;

    /// <summary>The turn each way about the estimate by which the gain is predicted, radians (2 degrees).</summary>
    private const double CheckTurn = 2 * Math.PI / 180;

    /// <summary>
    /// What turning from an orientation could add to its peak, by a parabola through the peak there and at a turn each
    /// way about each of its axes of turning (pairs in <paramref name="polled"/>): the sum over them of g^2 / 2|c|, with
    /// g the slope and c the curvature, and where each puts the top (-g / c). Nothing about an axis along which the
    /// peak is level both ways to 1e-9; infinite where a turn could not be integrated or a parabola does not open
    /// downward.
    /// </summary>
    private static (double Gain, double[] Top) Gain(double peak, double?[] polled, double turn)
    {
        double gain = 0;
        var top = new double[polled.Length / 2];
        for (int axis = 0; axis < top.Length; axis++)
        {
            if (polled[2 * axis] is not { } plus || polled[(2 * axis) + 1] is not { } minus)
            {
                return (double.PositiveInfinity, top);
            }

            if (Math.Abs(plus - peak) <= 1e-9 * peak && Math.Abs(minus - peak) <= 1e-9 * peak)
            {
                // Level both ways (a loop on a coil's axis turned within its plane): nothing to gain about this axis.
                continue;
            }

            double slope = (plus - minus) / (2 * turn), curvature = (plus + minus - (2 * peak)) / (turn * turn);
            if (!(curvature < 0))
            {
                return (double.PositiveInfinity, top);
            }

            gain += slope * slope / (-2 * curvature);
            top[axis] = -slope / curvature;
        }

        return (gain, top);
    }

    /// <summary>A normal turned by an angle toward a unit direction across it.</summary>
    private static Vector3D Turned(Vector3D normal, Vector3D toward, double angle) =>
        ((Math.Cos(angle) * normal) + (Math.Sin(angle) * toward)).Normalized();

    /// <summary>
    /// An orientation: a unit normal and, for a rectangle, the direction of its width in its plane. Turned about an axis
    /// across the normal, the width goes with it; turned about the normal, the width turns in the plane.
    /// </summary>
    private readonly record struct Facing(Vector3D Normal, Vector3D? Width)
    {
        /// <summary>Turned by an angle about one of its axes: 0 and 1 across the normal (toward e1 and e2 of <see cref="Across"/>), 2 the normal itself.</summary>
        public Facing Turn(int axis, double angle)
        {
            if (axis == 2)
            {
                Vector3D w = Width!.Value;
                return this with { Width = ((Math.Cos(angle) * w) + (Math.Sin(angle) * Normal.Cross(w))).Normalized() };
            }

            (Vector3D e1, Vector3D e2) = Across(Normal);
            Vector3D toward = axis == 0 ? e1 : e2;
            Vector3D n = Turned(Normal, angle < 0 ? -toward : toward, Math.Abs(angle));
            return new Facing(n, Width is { } v ? RectangularLoopGeometry.WidthDirection(n, v) : null);
        }
    }

    /// <summary>
    /// The orientation, from the axes' estimate of the normal, that links the largest peak flux change by the loop's
    /// own flux at each orientation tried (its disc or rectangle turned with it; a flat body's, a disc's or a plate's,
    /// as a loop's): a compass search, turning the best orientation so far by 8 degrees each way about two axes across
    /// its normal (and, for a rectangle, about the normal, turning it within its plane), moving wherever the peak
    /// grows and halving the turn where it does not, down to a quarter of a degree. In a uniform field the estimate is
    /// exact and is kept. Where a poll two degrees each way about the estimate shows a cap whose top a parabola each
    /// way puts within 1e-5 of the peak of it (<see cref="Gain"/>), the estimate is kept: a small loop where the field
    /// bends gently, whose search would move its peak by parts in a million. Otherwise, where the parabolas put the
    /// top within 32 degrees and it links more, the search starts there turning by two degrees. Then, since near a
    /// winding the peak may have more than one top, 24 normals spread over the half sphere (a rectangle at three turns
    /// in its plane each) are tried, and from each that links more than the top reached, best first and at most three,
    /// the search runs again; where some of them reach into the source, 240 as well, the same way. The search only ever moves to an orientation that links more: never less than the
    /// estimate. One at which the field cannot be integrated (the loop turned into a winding, or onto a conductor) is
    /// passed over while the search turns by more than a quarter of a degree; one at the last turn means the flux
    /// grows as the loop turns toward the source until it cannot be found, and the largest is not found: the search
    /// then refuses, naming the turn, rather than stand the estimate in for it.
    /// </summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated at an orientation tried.</exception>
    private static (Vector3D Normal, Vector3D? Width) Refined(FieldSource source, Vector3D centre, LoopGeometry loop, Vector3D estimate)
    {
        if (source.Terms.All(t => t.Geometry is UniformField))
        {
            // The flux is linear in the normal, and a rectangle's turn within its plane does not change it: the estimate is exact.
            return (estimate, null);
        }

        if (loop is BodyGeometry body && (body is SphereBody || body.Section is not BodySection section || section.AxialExtentMeters > 0.5 * body.HalfSpanMeters))
        {
            // A body longer along its axis than a quarter of its span (a rod, a tube, a bar, a sphere) couples through its
            // whole length, which a turn moves across the field, not through its middle section alone: its own flux is not
            // the measure to turn it by, and the estimate stands.
            return (estimate, null);
        }

        PeakFlux peak = new(source);
        (Vector3D Normal, string Reason)? failed = null;
        double? At(Facing facing)
        {
            try
            {
                return peak.Of(PerUnitDrive(source, centre, facing.Normal, loop, facing.Width));
            }
            catch (Errors.FieldEvaluationException ex)
            {
                failed = (facing.Normal, ex.Message);
                return null;
            }
        }

        bool rectangular = loop is RectangularLoopGeometry or PrismBody;
        var start = new Facing(estimate, rectangular ? RectangularLoopGeometry.WidthDirection(estimate) : null);
        int axes = rectangular ? 3 : 2;
        double atEstimate = At(start) ?? double.NaN;
        if (!Finite.Is(atEstimate))
        {
            // The estimate's own flux cannot be found: the engine finds it again there and says so.
            return (estimate, null);
        }

        // First whether a search could gain anything: a poll two degrees each way about the estimate.
        var polled = new double?[2 * axes];
        (Facing best, double bestPeak) = (start, atEstimate);
        for (int d = 0; d < polled.Length; d++)
        {
            Facing candidate = start.Turn(d / 2, d % 2 == 0 ? CheckTurn : -CheckTurn);
            polled[d] = At(candidate);
            if (polled[d] is { } value && value > bestPeak)
            {
                (best, bestPeak) = (candidate, value);
            }
        }

        (double gain, double[] top) = Gain(atEstimate, polled, CheckTurn);
        if (gain <= GainTolerance * atEstimate)
        {
            // The peak about the estimate is a cap whose top lies so near it that a turn there would raise the peak by
            // less than the tolerance: the estimate stands.
            return (estimate, null);
        }

        // Where the parabolas put the top, if it lies within a few turns: the search then starts from there by the
        // poll's turn, rather than from the best so far by eight degrees.
        double turn = FirstTurn, reach = Math.Sqrt(top.Sum(x => x * x));
        if (Finite.Is(gain) && reach > 0 && reach <= 4 * FirstTurn)
        {
            (Vector3D e1, Vector3D e2) = Across(estimate);
            Vector3D across = (top[0] * e1) + (top[1] * e2);
            Facing jump = across.Length > 0 ? new Facing(Turned(estimate, across.Normalized(), across.Length), null) : new Facing(estimate, null);
            jump = jump with { Width = start.Width is { } w ? RectangularLoopGeometry.WidthDirection(jump.Normal, w) : null };
            if (axes == 3 && top[2] != 0)
            {
                jump = jump.Turn(2, top[2]);
            }

            if (At(jump) is { } atTop && atTop > bestPeak)
            {
                (best, bestPeak, turn) = (jump, atTop, CheckTurn);
            }
        }

        // A compass search from there; then from those of a spread of orientations over the half sphere that link more
        // than the top it reached, best first, at most three (near a winding the peak may have more than one top).
        (best, bestPeak, (Vector3D Normal, string Reason)? last, bool settled) = Climb(best, bestPeak, turn);
        // Where some of the spread reach into the source (the field over the loop cannot be integrated there), its rim
        // passes close by a conductor near them, where the flux may rise to a top too narrow for 24 to land near (a 269
        // mm ring 23 mm above a coil's plane, its centre 86 mm outside the winding: 7.1E-08 Wb reached, 1.0E-07 beside
        // the orientations that reach the winding): a spread ten times as fine is tried as well, and climbed from the
        // same way; a top at the edge of what can be integrated then refuses, as below.
        if (ClimbFromSpread(Spread, FirstTurn))
        {
            ClimbFromSpread(FineSpread, FirstTurn / 4);
        }

        // Climbs from those of a spread of normals (a rectangle at three turns in its plane each) that link more than
        // the top reached, best first, at most three; whether any of them reaches into the source.
        bool ClimbFromSpread(Vector3D[] normals, double firstTurn)
        {
            var spread = new List<(Facing Facing, double Peak)>();
            bool intoSource = false;
            foreach (Vector3D n in normals)
            {
                for (int k = 0; k < (rectangular ? 3 : 1); k++)
                {
                    var other = new Facing(n, rectangular ? RectangularLoopGeometry.WidthDirection(n) : null);
                    other = k == 0 ? other : other.Turn(2, k * Math.PI / 3);
                    if (At(other) is { } value)
                    {
                        spread.Add((other, value));
                    }
                    else
                    {
                        intoSource = true;
                    }
                }
            }

            int climbs = 0;
            foreach ((Facing facing, double value) in spread.OrderByDescending(f => f.Peak))
            {
                if (!(value > bestPeak * (1 + 1e-9)) || ++climbs > 3)
                {
                    break;
                }

                (Facing reached, double reachedPeak, (Vector3D Normal, string Reason)? edge, bool reachedSettled) = Climb(facing, value, firstTurn);
                if (reachedPeak > bestPeak)
                {
                    (best, bestPeak, last, settled) = (reached, reachedPeak, edge, reachedSettled);
                }
            }

            return intoSource;
        }

        // A compass search from an orientation: the best reached, the orientation beside it that cannot be integrated if
        // the best lies at that edge, and whether the turn came down to the last before the trials ran out.
        (Facing Best, double Peak, (Vector3D Normal, string Reason)? Edge, bool Settled) Climb(Facing from, double fromPeak, double firstTurn)
        {
            double turn = firstTurn;
            bool edge = false;
            for (int trials = 1; turn >= LastTurn && trials < MostTrials;)
            {
                Facing moved = from;
                double movedPeak = fromPeak;
                failed = null;
                for (int d = 0; d < 2 * axes; d++)
                {
                    Facing candidate = from.Turn(d / 2, d % 2 == 0 ? turn : -turn);
                    double? value = At(candidate);
                    trials++;
                    if (value > movedPeak)
                    {
                        (moved, movedPeak) = (candidate, value.Value);
                    }
                }

                // An orientation that cannot be integrated this close to the best (at the last turn, once the loop ends):
                // the best lies at the edge of what can be.
                edge = failed is not null;
                if (movedPeak > fromPeak * (1 + 1e-9))
                {
                    (from, fromPeak) = (moved, movedPeak);
                }
                else
                {
                    turn /= 2;
                }
            }

            return (from, fromPeak, edge && turn < LastTurn ? failed : null, turn < LastTurn);
        }

        if (last is { } edgeOf)
        {
            // Near the source the flux grows as the loop turns toward it until the field can no longer be integrated: an
            // orientation a quarter of a degree from the best found cannot be, so the largest is not found, and no
            // orientation may stand in for it.
            double degrees = Math.Acos(Math.Max(-1, Math.Min(1, Math.Abs(edgeOf.Normal.Dot(estimate))))) * 180 / Math.PI;
            throw new Errors.FieldEvaluationException(
                "the orientation that links the largest flux change cannot be found this near the source: the flux grows as the loop turns toward it until, "
                + SiFormat.Plain(Math.Round(degrees, 1)) + " degrees from the estimate by the field's axes (normal " + estimate + "), it cannot be found (" + edgeOf.Reason
                + "); give how the item sits (-Normal or a Normal column), or assess it further from the source");
        }

        if (!settled)
        {
            // The trials ran out while the search still turned by more than its last turn (a 244 mm ring beside a
            // coil's winding, whose peak falls away sharply either way across a ridge as its rim nears the winding, ran
            // its 300 trials along the ridge and stopped 1 degree from a top it had not reached): the largest is not
            // found, and the orientation the search stopped at may not stand in for it.
            throw new Errors.FieldEvaluationException(
                "the orientation that links the largest flux change cannot be found this near the source: the search for it did not settle within "
                + MostTrials.ToString(System.Globalization.CultureInfo.InvariantCulture) + " orientations (it stopped at normal " + best.Normal
                + "); give how the item sits (-Normal or a Normal column), or assess it further from the source");
        }

        Vector3D b = source.Terms[0].Geometry.FieldPerUnitDrive(centre);
        return (b.Dot(best.Normal) < 0 ? -best.Normal : best.Normal, best.Width);
    }

    /// <summary>Twenty-four normals spread evenly over the half sphere (a Fibonacci lattice): where the search looks for a top its compass search did not reach.</summary>
    private static readonly Vector3D[] Spread = SphereSearch.Spread(24, half: true);

    /// <summary>Two hundred and forty normals spread over the half sphere: where some of <see cref="Spread"/> reach into the source.</summary>
    private static readonly Vector3D[] FineSpread = SphereSearch.Spread(240, half: true);

    /// <summary>Two unit directions across a normal, square to it and to each other: a rectangle's usual width and height.</summary>
    private static (Vector3D E1, Vector3D E2) Across(Vector3D normal)
    {
        Vector3D e1 = RectangularLoopGeometry.WidthDirection(normal);
        return (e1, normal.Cross(e1).Normalized());
    }

    /// <summary>
    /// The loop's peak flux change from its flux per unit drive of each term: for sinusoids the summed phasor's
    /// magnitude; otherwise the largest change from the first of the drive's times or flux held at any, whichever is
    /// larger (the measure the axes' estimate takes).
    /// </summary>
    private sealed class PeakFlux
    {
        private readonly FieldSource _source;
        private double[,]? _drives;
        private double? _oneTermExtent;

        /// <summary>The largest of |d - d(first time)| and |d| over the drive's times.</summary>
        private static double OneTermExtent(FieldWaveform waveform, double[] times)
        {
            double first = 0, largest = 0;
            for (int i = 0; i < times.Length; i++)
            {
                double d = waveform.Value(times[i]);
                if (i == 0)
                {
                    first = d;
                }

                largest = Math.Max(largest, Math.Max(Math.Abs(d - first), Math.Abs(d)));
            }

            return largest;
        }

        public PeakFlux(FieldSource source) => _source = source;

        /// <summary>The peak for the couplings m_k.</summary>
        public double Of(double[] m)
        {
            IReadOnlyList<SourceTerm> terms = _source.Terms;
            if (_source.IsSinusoidal)
            {
                Complex sum = Complex.Zero;
                for (int k = 0; k < m.Length; k++)
                {
                    sum += m[k] * ((SineWaveform)terms[k].Waveform).Phasor;
                }

                return sum.Magnitude;
            }

            double[] times = _source.DriveTimes;
            if (m.Length == 1)
            {
                // One term: the flux is m d(t), so its largest change or value is |m| times the drive's own, found once
                // (a search asks for some hundreds of couplings, each a pass over thousands of the drive's times).
                _oneTermExtent ??= OneTermExtent(terms[0].Waveform, times);
                return Math.Abs(m[0]) * _oneTermExtent.Value;
            }

            if (_drives is null)
            {
                _drives = new double[times.Length, m.Length];
                for (int i = 0; i < times.Length; i++)
                {
                    for (int k = 0; k < m.Length; k++)
                    {
                        _drives[i, k] = terms[k].Waveform.Value(times[i]);
                    }
                }
            }

            double first = 0, largest = 0;
            for (int i = 0; i < times.Length; i++)
            {
                double phi = 0;
                for (int k = 0; k < m.Length; k++)
                {
                    phi += m[k] * _drives[i, k];
                }

                if (i == 0)
                {
                    first = phi;
                }

                largest = Math.Max(largest, Math.Max(Math.Abs(phi - first), Math.Abs(phi)));
            }

            return largest;
        }
    }

    /// <summary>
    /// The normal turned by a tilt from the worst one (<see cref="WorstNormal"/>) toward the side that keeps the most
    /// flux change: n = cos(tilt) worst + sin(tilt) u, with u the one of 24 directions across the worst normal, 7.5
    /// degrees apart, for which the loop's peak flux by the same three axes' couplings (a sinusoid's phasor magnitude,
    /// or a transient's largest change or held flux over the drive's times) is largest. For a field of one direction
    /// over the loop every u gives the same flux, cos(tilt) of the worst; for a field that turns as it alternates, the
    /// side the field turns toward keeps more, and that side is taken.
    /// </summary>
    /// <param name="source">The field source.</param>
    /// <param name="centre">The loop's centre, m.</param>
    /// <param name="loop">The loop.</param>
    /// <param name="tiltDegrees">The tilt, degrees.</param>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static Vector3D TiltedNormal(FieldSource source, Vector3D centre, LoopGeometry loop, double tiltDegrees)
    {
        // Held, as each of 24 directions reads them again.
        List<Vector3D> vectors = FluxVectors(source, centre, loop).ToList();
        Vector3D worst = Refined(source, centre, loop, Worst(source, centre, vectors)).Normal;
        double tilt = tiltDegrees * Math.PI / 180;
        if (tilt == 0)
        {
            return worst;
        }

        double Peak(Vector3D normal)
        {
            if (source.IsSinusoidal)
            {
                return Math.Sqrt(Math.Pow(normal.Dot(vectors[0]), 2) + Math.Pow(normal.Dot(vectors[1]), 2));
            }

            double first = normal.Dot(vectors[0]), largest = 0;
            foreach (Vector3D v in vectors)
            {
                double phi = normal.Dot(v);
                largest = Math.Max(largest, Math.Max(Math.Abs(phi - first), Math.Abs(phi)));
            }

            return largest;
        }

        // Two directions across the worst normal, and the 24 between them on a half turn (u and -u give the same peak).
        (Vector3D e1, Vector3D e2) = Across(worst);
        Vector3D best = worst;
        double bestPeak = double.NegativeInfinity;
        for (int i = 0; i < 24; i++)
        {
            double alpha = i * Math.PI / 24;
            Vector3D u = (Math.Cos(alpha) * e1) + (Math.Sin(alpha) * e2);
            Vector3D candidate = ((Math.Cos(tilt) * worst) + (Math.Sin(tilt) * u)).Normalized();
            double peak = Peak(candidate);
            if (peak > bestPeak)
            {
                (best, bestPeak) = (candidate, peak);
            }
        }

        return best;
    }

    /// <summary>
    /// The vectors whose projection on a normal is the loop's flux, from its couplings facing x, y and z: a sinusoid's
    /// summed complex flux as its real and imaginary parts (Phi(t) = Im(V e^(j omega t)), V = sum M_k A_k e^(j phi_k)),
    /// else the flux at each of the drive's times, made as they are read (a curved drive has thousands of times, and
    /// the worst normal reads each once).
    /// </summary>
    private static IEnumerable<Vector3D> FluxVectors(FieldSource source, Vector3D centre, LoopGeometry loop)
    {
        double[] mx = PerUnitDrive(source, centre, Vector3D.UnitX, loop);
        double[] my = PerUnitDrive(source, centre, Vector3D.UnitY, loop);
        double[] mz = PerUnitDrive(source, centre, Vector3D.UnitZ, loop);
        Vector3D M(int k) => new(mx[k], my[k], mz[k]);
        int n = mx.Length;
        if (source.IsSinusoidal)
        {
            Vector3D re = Vector3D.Zero, im = Vector3D.Zero;
            for (int k = 0; k < n; k++)
            {
                Complex a = ((SineWaveform)source.Terms[k].Waveform).Phasor;
                re += a.Real * M(k);
                im += a.Imaginary * M(k);
            }

            return new[] { re, im };
        }

        var drives = new FieldWaveform[n];
        for (int k = 0; k < n; k++)
        {
            drives[k] = source.Terms[k].Waveform;
        }

        var m = new Vector3D[n];
        for (int k = 0; k < n; k++)
        {
            m[k] = M(k);
        }

        return FluxAtTimes(drives, m, source.DriveTimes);
    }

    private static IEnumerable<Vector3D> FluxAtTimes(FieldWaveform[] drives, Vector3D[] m, double[] times)
    {
        foreach (double t in times)
        {
            Vector3D sum = Vector3D.Zero;
            for (int k = 0; k < m.Length; k++)
            {
                sum += drives[k].Value(t) * m[k];
            }

            yield return sum;
        }
    }

    /// <summary>The worst normal from the flux vectors (<see cref="WorstNormal"/>).</summary>
    private static Vector3D Worst(FieldSource source, Vector3D centre, IEnumerable<Vector3D> vectors)
    {
        Vector3D best;
        if (source.IsSinusoidal)
        {
            // The largest |n . Phi(t)| is along the principal axis of Re(V) Re(V)^T + Im(V) Im(V)^T.
            Vector3D[] phasor = vectors.ToArray();
            best = PrincipalAxis(phasor[0], phasor[1]);
        }
        else
        {
            Vector3D? first = null;
            Vector3D change = Vector3D.Zero, held = Vector3D.Zero;
            foreach (Vector3D phi in vectors)
            {
                first ??= phi;
                Vector3D d = phi - first.Value;
                change = d.Length > change.Length ? d : change;
                held = phi.Length > held.Length ? phi : held;
            }

            best = change.Length >= held.Length ? change : held;
        }

        if (!(best.Length > 0) || !best.IsFinite)
        {
            return Vector3D.UnitZ;
        }

        Vector3D unit = best.Normalized();
        Vector3D b = source.Terms[0].Geometry.FieldPerUnitDrive(centre);
        return b.Dot(unit) < 0 ? -unit : unit;
    }

    /// <summary>The unit eigenvector of the largest eigenvalue of a a^T + b b^T (power iteration from the larger of a and b).</summary>
    private static Vector3D PrincipalAxis(Vector3D a, Vector3D b)
    {
        Vector3D v = a.Length >= b.Length ? a : b;
        if (!(v.Length > 0))
        {
            return Vector3D.Zero;
        }

        v = v.Normalized();
        for (int i = 0; i < 100; i++)
        {
            Vector3D next = (a.Dot(v) * a) + (b.Dot(v) * b);
            if (!(next.Length > 0))
            {
                break;
            }

            next = next.Normalized();
            if ((next - v).Length < 1e-14)
            {
                return next;
            }

            v = next;
        }

        return v;
    }
}
