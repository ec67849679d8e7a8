using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Threading;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Assessment;

/// <summary>
/// The nearest distance along a ray from which an item is Clear at every point scanned out to a limit, found by a
/// scan of the ray, then by narrowing the last crossing into Clear: Brent's method (MathNet) on the log of the
/// smallest margin over the safety factor where both ends are judged, bisection on the verdict where one is
/// Indeterminate, to a bracket a thousandth of the distance wide. The distance returned is the bracket's Clear end,
/// checked Clear, and its other end is checked not Clear.
/// A ray on which the item is Clear, then not, then Clear again is reported: the distance returned is beyond the
/// last point that is not Clear, never the nearer window. Nothing Clear within the limit gives no distance.
/// </summary>
public static class SafeDistance
{
    /// <summary>How many equal steps the ray is scanned in.</summary>
    public const int ScanSteps = 64;

    /// <summary>How narrow the final bracket is, relative to the distance.</summary>
    public const double RelativeTolerance = 1e-3;

    /// <summary>Finds the safe distance.</summary>
    /// <param name="item">The item.</param>
    /// <param name="source">The field.</param>
    /// <param name="from">Where the ray starts, m.</param>
    /// <param name="direction">The ray's direction (normalised here).</param>
    /// <param name="maxDistanceMeters">How far along the ray to look, m.</param>
    /// <param name="policy">The limits and safety factor.</param>
    /// <param name="normal">The item's normal; null for the worst orientation at each point.</param>
    /// <param name="exposureSeconds">How long the item stays; null for the default.</param>
    /// <param name="environment">The surroundings.</param>
    /// <param name="velocity">The velocity at which the item is moved through the field at every point, m/s; null when it is placed, not moved.</param>
    /// <param name="leaveSeconds">How long carrying the item out of the field takes, s; null for the default.</param>
    /// <param name="tiltDegrees">Without a normal, how far the item is turned from the worst orientation at each point, degrees; null for the worst.</param>
    /// <param name="progress">Told the fraction of the scan done.</param>
    /// <param name="cancellation">Stops the search.</param>
    /// <exception cref="InvalidInputException">The direction is zero or not finite, or the distance out of range.</exception>
    public static SafeDistanceResult Find(
        ConductiveItem item, FieldSource source, Vector3D from, Vector3D direction, double maxDistanceMeters, HazardPolicy policy,
        Vector3D? normal = null, double? exposureSeconds = null, ThermalEnvironment? environment = null, Vector3D? velocity = null, double? leaveSeconds = null, double? tiltDegrees = null,
        Action<double>? progress = null, CancellationToken cancellation = default)
    {
        Require.Direction("Direction", direction);
        PhysicalRanges.Distance.For("MaxDistance").Check(maxDistanceMeters);
        Vector3D unit = direction.Normalized();
        var assessed = new SortedDictionary<double, InductionAssessment>();
        InductionAssessment At(double s)
        {
            cancellation.ThrowIfCancellationRequested();
            if (!assessed.TryGetValue(s, out InductionAssessment? a))
            {
                var scenario = new Scenario(item, source, new Placement(from + (s * unit), normal, velocity, tiltDegrees), exposureSeconds, environment, leaveSeconds);
                a = HazardAssessor.Assess(InductionEngine.Respond(scenario, cancellation), policy);
                assessed[s] = a;
            }

            return a;
        }

        double step = maxDistanceMeters / ScanSteps;
        var scan = new double[ScanSteps + 1];
        for (int k = 0; k <= ScanSteps; k++)
        {
            scan[k] = k * step;
            _ = At(scan[k]);
            progress?.Invoke((k + 1) / (double)(ScanSteps + 1));
        }

        var notes = new List<string>();
        int lastNotClear = Array.FindLastIndex(scan, s => At(s).Verdict != Verdict.Clear);
        if (lastNotClear == ScanSteps)
        {
            notes.Add("not Clear at " + SiFormat.Format(maxDistanceMeters, "m") + ", the farthest point looked at: no safe distance within it");
            return new SafeDistanceResult(item.Name, source.Name, from, unit, double.NaN, maxDistanceMeters, At(maxDistanceMeters), DipsAgain: false, notes, assessed.Count);
        }

        if (lastNotClear < 0)
        {
            notes.Add("Clear from the start of the ray");
            return new SafeDistanceResult(item.Name, source.Name, from, unit, 0.0, maxDistanceMeters, At(0.0), DipsAgain: false, notes, assessed.Count);
        }

        bool dips = Array.FindIndex(scan, 0, lastNotClear, s => At(s).Verdict == Verdict.Clear) >= 0;
        if (dips)
        {
            double firstClear = scan.First(s => At(s).Verdict == Verdict.Clear);
            notes.Add("Clear near " + SiFormat.Format(firstClear, "m") + " but not again until beyond " + SiFormat.Format(scan[lastNotClear], "m")
                + ": the margin dips again further out, so the safe distance is beyond the last point that is not Clear");
        }

        (double below, double above) = Narrow(scan[lastNotClear], scan[lastNotClear + 1], At, policy.SafetyFactor);
        InductionAssessment there = At(above);
        notes.Add("the crossing was narrowed to between " + SiFormat.Format(below, "m", 5) + " (" + At(below).Verdict + ") and " + SiFormat.Format(above, "m", 5) + " (Clear)");
        notes.Add("the ray was scanned at " + (ScanSteps + 1).ToString(CultureInfo.InvariantCulture) + " points " + SiFormat.Format(step, "m") + " apart; a dip narrower than that can be missed");
        return new SafeDistanceResult(item.Name, source.Name, from, unit, above, maxDistanceMeters, there, dips, notes, assessed.Count);
    }

    /// <summary>Narrows a bracket [not Clear, Clear] until it is <see cref="RelativeTolerance"/> of the distance wide.</summary>
    private static (double Below, double Above) Narrow(double below, double above, Func<double, InductionAssessment> at, double factor)
    {
        // g = log(smallest margin / factor): negative below the Clear line, zero on it, positive above; NaN where not judged.
        double G(double s) => at(s).MinimumMargin is var m && m > 0 && !double.IsNaN(m) ? Math.Log(m / factor) : double.NaN;
        double gBelow = G(below), gAbove = G(above);
        if (Finite.Is(gBelow) && Finite.Is(gAbove) && gBelow < 0 && gAbove >= 0
            && MathNet.Numerics.RootFinding.Brent.TryFindRoot(G, below, above, 1e-6, 100, out double root))
        {
            // Brent's root, then the two sides of it a tolerance apart, each checked by its verdict.
            double half = 0.5 * RelativeTolerance * Math.Max(root, 1e-6);
            double up = Math.Min(above, root + half), down = Math.Max(below, root - half);
            if (at(up).Verdict == Verdict.Clear && at(down).Verdict != Verdict.Clear)
            {
                return (down, up);
            }
        }

        // Where a side is not judged (Indeterminate) or the root did not hold: bisection on the verdict itself.
        for (int i = 0; i < 200 && above - below > RelativeTolerance * Math.Max(above, 1e-6); i++)
        {
            double mid = 0.5 * (below + above);
            if (at(mid).Verdict == Verdict.Clear)
            {
                above = mid;
            }
            else
            {
                below = mid;
            }
        }

        return (below, above);
    }
}

/// <summary>Where along a ray an item becomes Clear.</summary>
/// <param name="ItemName">The item.</param>
/// <param name="SourceName">The source.</param>
/// <param name="From">Where the ray starts, m.</param>
/// <param name="Direction">The ray's unit direction.</param>
/// <param name="DistanceMeters">The nearest distance from which every point scanned is Clear; NaN when none is within <paramref name="MaxDistanceMeters"/>.</param>
/// <param name="MaxDistanceMeters">How far along the ray was looked.</param>
/// <param name="Assessment">The assessment at the distance (at the farthest point when none was found).</param>
/// <param name="DipsAgain">True when the item is Clear somewhere nearer, then not Clear again further out.</param>
/// <param name="Notes">How the distance was found and what to know about it.</param>
/// <param name="Assessments">How many assessments the search took.</param>
public sealed record SafeDistanceResult(
    string ItemName, string SourceName, Vector3D From, Vector3D Direction, double DistanceMeters, double MaxDistanceMeters,
    InductionAssessment Assessment, bool DipsAgain, IReadOnlyList<string> Notes, int Assessments)
{
    /// <summary>True when a safe distance was found within the limit.</summary>
    public bool Found => !double.IsNaN(DistanceMeters);

    /// <summary>Where the safe distance puts the item; null when none was found.</summary>
    public Vector3D? Position => Found ? From + (DistanceMeters * Direction) : null;

    /// <summary>The verdict at the distance: Clear when found; otherwise the verdict at the farthest point.</summary>
    public Verdict Verdict => Assessment.Verdict;

    /// <summary>The mechanism with the smallest margin there (what would turn the verdict if the item came closer).</summary>
    public HazardMechanism? GoverningMechanism => Assessment.GoverningMechanism;

    /// <summary>The smallest margin there.</summary>
    public double MinimumMargin => Assessment.MinimumMargin;

    /// <summary>The cautions every result carries.</summary>
    public IReadOnlyList<string> Cautions => Assessment.Cautions;

    /// <summary>"Keyring: Clear from 1.42 m along (1, 0, 0)".</summary>
    public override string ToString() =>
        ItemName + ": " + (Found ? "Clear from " + SiFormat.Format(DistanceMeters, "m") : "not Clear within " + SiFormat.Format(MaxDistanceMeters, "m")) + " along " + Direction;
}
