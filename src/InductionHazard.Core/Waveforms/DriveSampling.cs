using System;
using System.Collections.Generic;
using System.Linq;

namespace InductionHazard.Waveforms;

/// <summary>
/// Times at which to look at a set of drives to find their extremes: every breakpoint, and between breakpoints
/// steps no longer than each curved drive's <see cref="FieldWaveform.MaxStepSeconds"/>; one period of a drive
/// that runs on. Bounded in number, so a long capture is thinned rather than read point by point twice.
/// </summary>
public static class DriveSampling
{
    /// <summary>The most times returned before the uniform fill is thinned.</summary>
    public const int MaxTimes = 200_000;

    /// <summary>The sample times over the drives' active spans, sorted and distinct.</summary>
    public static double[] Times(IReadOnlyList<FieldWaveform> drives)
    {
        var times = new List<double>();
        double start = drives.Min(d => d.StartSeconds);
        double end = drives.Max(d => double.IsInfinity(d.EndSeconds) ? d.StartSeconds + Span(d) : d.EndSeconds);
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

        double step = drives.Min(d => d.MaxStepSeconds);
        double span = end - start;
        if (double.IsInfinity(step) || span / step > MaxTimes)
        {
            step = span / Math.Min(MaxTimes, Math.Max(1000, 4 * times.Count));
        }

        if (step > 0 && Quantities.Finite.Is(step))
        {
            for (double t = start; t < end; t += step)
            {
                times.Add(t);
            }
        }

        times.Add(end);
        times.Sort();
        return times.Distinct().ToArray();
    }

    /// <summary>How much of a drive that runs on is looked at: two periods, or its time scales.</summary>
    private static double Span(FieldWaveform d) =>
        d.IsPeriodic ? 2 * d.PeriodSeconds : Math.Max(d.TimeScales.Max(s => s.Seconds) * 10, 1e-6);
}
