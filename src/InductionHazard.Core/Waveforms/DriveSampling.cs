using System;
using System.Collections.Generic;
using System.Linq;

namespace InductionHazard.Waveforms;

/// <summary>
/// Times at which to look at a set of drives to find their extremes: every breakpoint, and between breakpoints
/// steps no longer than each curved drive's <see cref="FieldWaveform.MaxStepSeconds"/> (the midpoints alone when
/// every drive is piecewise linear); two periods of a drive that runs on. Bounded in number, so a long capture is thinned rather than read point by point twice.
/// </summary>
public static class DriveSampling
{
    /// <summary>The most times returned before the uniform fill is thinned.</summary>
    public const int MaxTimes = 200_000;

    /// <summary>The sample times over the drives' active spans, sorted and distinct.</summary>
    public static double[] Times(IReadOnlyList<FieldWaveform> drives)
    {
        if (drives.Count == 0)
        {
            throw new ArgumentException("no drives to sample", nameof(drives));
        }

        var times = new List<double>();

        // The drives' earliest start, latest end and least step, by one loop (this runs for every transient assessment).
        double start = double.PositiveInfinity, end = double.NegativeInfinity, step = double.PositiveInfinity;
        for (int k = 0; k < drives.Count; k++)
        {
            FieldWaveform d = drives[k];
            start = Math.Min(start, d.StartSeconds);
            end = Math.Max(end, double.IsInfinity(d.EndSeconds) ? d.StartSeconds + Span(d) : d.EndSeconds);
            step = Math.Min(step, d.MaxStepSeconds);
        }

        foreach (FieldWaveform d in drives)
        {
            foreach (double b in d.Breakpoints)
            {
                if (b >= start && b <= end && times.Count < 4 * MaxTimes)
                {
                    times.Add(b);
                }
            }
        }

        double span = end - start;
        times.Add(start);
        times.Add(end);
        if (double.IsInfinity(step))
        {
            // Piecewise-linear drives: values are extreme at breakpoints and rates constant between them, so the
            // breakpoints and the midpoints between them are every time that matters.
            double[] corners = SortedDistinct(times);
            var all = new List<double>(2 * corners.Length);
            for (int k = 0; k < corners.Length; k++)
            {
                all.Add(corners[k]);
                if (k + 1 < corners.Length)
                {
                    all.Add(0.5 * (corners[k] + corners[k + 1]));
                }
            }

            return all.ToArray();
        }

        if (span / step > MaxTimes)
        {
            step = span / MaxTimes;
        }

        if (step > 0 && Quantities.Finite.Is(step))
        {
            for (double t = start; t < end; t += step)
            {
                times.Add(t);
            }
        }

        return SortedDistinct(times);
    }

    /// <summary>
    /// The values ascending, each once: what sorting and then Enumerable.Distinct give (NaN first, and once), by a
    /// loop over the sorted list in place of a hash set (this runs for every assessment).
    /// </summary>
    internal static double[] SortedDistinct(List<double> values)
    {
        values.Sort();
        int kept = 0;
        for (int i = 0; i < values.Count; i++)
        {
            if (kept == 0 || !values[i].Equals(values[kept - 1]))
            {
                values[kept++] = values[i];
            }
        }

        values.RemoveRange(kept, values.Count - kept);
        return values.ToArray();
    }

    /// <summary>How much of a drive that runs on is looked at: two periods, or its time scales.</summary>
    private static double Span(FieldWaveform d) =>
        d.IsPeriodic ? 2 * d.PeriodSeconds : Math.Max(d.TimeScales.Max(s => s.Seconds) * 10, 1e-6);
}
