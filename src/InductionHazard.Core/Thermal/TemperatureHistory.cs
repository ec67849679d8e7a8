using System;
using System.Collections.Generic;

namespace InductionHazard.Thermal;

/// <summary>Questions asked of a temperature history taken as linear between its samples.</summary>
public static class TemperatureHistory
{
    /// <summary>The highest temperature in the history, °C.</summary>
    public static double Peak(IReadOnlyList<HeatingSample> history)
    {
        // By index: a foreach over the list's interface would box its enumerator on every call.
        double peak = double.NegativeInfinity;
        for (int k = 0; k < history.Count; k++)
        {
            double celsius = history[k].TemperatureCelsius;
            if (double.IsNaN(celsius))
            {
                return double.NaN;
            }

            peak = Math.Max(peak, celsius);
        }

        return peak;
    }

    /// <summary>The first time the history reaches a temperature, s; null if it never does.</summary>
    public static double? FirstReaching(IReadOnlyList<HeatingSample> history, double celsius)
    {
        for (int k = 0; k < history.Count; k++)
        {
            HeatingSample b = history[k];
            if (b.TemperatureCelsius >= celsius)
            {
                if (k == 0)
                {
                    return b.TimeSeconds;
                }

                HeatingSample a = history[k - 1];
                double f = (celsius - a.TemperatureCelsius) / (b.TemperatureCelsius - a.TemperatureCelsius);
                return a.TimeSeconds + (f * (b.TimeSeconds - a.TimeSeconds));
            }
        }

        return null;
    }

    /// <summary>
    /// The highest temperature held continuously for at least a duration: the largest level L such that the
    /// history stays at or above L over some interval of that length, °C. NaN when the history is shorter.
    /// A contact of that duration at that moment sees at least L throughout.
    /// </summary>
    /// <remarks>
    /// Exact for the piecewise-linear history, in one sweep: it is the largest, over window starts s, of the
    /// window's minimum min(T(s), T(s + d), the samples inside). Between the starts where s or s + d meets a
    /// sample, T(s) and T(s + d) are linear and the samples inside fixed, so the largest minimum lies at an end of
    /// that stretch or where the two lines cross; the samples inside are kept in a monotonic queue.
    /// </remarks>
    public static double SustainedFor(IReadOnlyList<HeatingSample> history, double seconds) =>
        SustainedFor(history, new[] { seconds })[0];

    /// <summary>The highest temperature held for each of several durations, °C (one copy of the history, one sweep each).</summary>
    public static double[] SustainedFor(IReadOnlyList<HeatingSample> history, IReadOnlyList<double> durations)
    {
        var levels = new SustainedLevels(history);
        var result = new double[durations.Count];
        for (int k = 0; k < result.Length; k++)
        {
            result[k] = levels.For(durations[k]);
        }

        return result;
    }

    /// <summary>A history made ready to be asked <see cref="SustainedFor(IReadOnlyList{HeatingSample}, double)"/> for one duration at a time, as a search needs.</summary>
    public sealed class SustainedLevels
    {
        private readonly double[] _times;
        private readonly double[] _temps;
        private double[]? _slopes;
        private int[]? _queue;

        /// <summary>Copies the history once.</summary>
        public SustainedLevels(IReadOnlyList<HeatingSample> history)
        {
            int n = history.Count;
            _times = new double[n];
            _temps = new double[n];
            for (int k = 0; k < n; k++)
            {
                _times[k] = history[k].TimeSeconds;
                _temps[k] = history[k].TemperatureCelsius;
            }
        }

        /// <summary>The highest temperature held for a duration, °C; NaN when the history is shorter.</summary>
        public double For(double seconds)
        {
            // The pieces' slopes and the window's queue, made on the first sweep (the sweep through the levels needs neither).
            if (_slopes is null || _queue is null)
            {
                int n = _times.Length;
                var slopes = new double[n];
                for (int k = 0; k + 1 < n; k++)
                {
                    double span = _times[k + 1] - _times[k];
                    slopes[k] = span > 0 ? (_temps[k + 1] - _temps[k]) / span : 0;
                }

                (_slopes, _queue) = (slopes, new int[n]);
            }

            return Sustained(_times, _temps, _slopes, seconds, _queue);
        }

        /// <summary>
        /// The highest temperature held for each of several durations (ascending), in one sweep down through the
        /// history's levels; null when the history has a NaN or more than <see cref="MostPeaks"/> separate stretches
        /// above some level, where asking <see cref="For"/> for each is the cheaper way.
        /// </summary>
        public double[]? ForAll(IReadOnlyList<double> ascending) => ByLevels(_times, _temps, ascending);
    }

    /// <summary>The most separate stretches above a level that the sweep through the levels keeps before it gives up.</summary>
    public const int MostPeaks = 32;

    /// <summary>
    /// What is held for each duration, by sweeping the level L down from the peak: the history at or above L is a set
    /// of stretches (runs of samples at or above L, each reaching out along the pieces on either side to where they
    /// cross L), and what is held for d is the highest L at which some stretch is at least d long. Between two sample
    /// levels the stretches keep their samples, and each one's length is linear in L, so the level for d is found by
    /// interpolation; where stretches join at a sample level, the length jumps and the level is that sample's.
    /// </summary>
    private static double[]? ByLevels(double[] times, double[] temps, IReadOnlyList<double> durations)
    {
        int n = times.Length;

        // Read as an array (the burn check's is one), not through the list's interface in the loops below.
        double[] ascending = durations as double[] ?? new List<double>(durations).ToArray();
        var held = new double[ascending.Length];
        if (n < 2)
        {
            return null;
        }

        var order = new int[n];
        for (int k = 0; k < n; k++)
        {
            if (double.IsNaN(temps[k]))
            {
                return null;
            }
        }

        if (!ByRuns(temps, order))
        {
            for (int k = 0; k < n; k++)
            {
                order[k] = k;
            }

            Array.Sort((double[])temps.Clone(), order);
        }

        // For the first sample of a stretch, its last (runEnd, the first n); for the last, its first (runStart, the next
        // n); -1 while a sample is below the level. One array for both.
        var runs = new int[2 * n];
        runs.AsSpan().Fill(-1);
        Span<int> runEnd = runs.AsSpan(0, n), runStart = runs.AsSpan(n, n);

        var starts = new List<int>(MostPeaks);
        int pending = 0;
        Span<double> tops = stackalloc double[MostPeaks + 1], bottoms = stackalloc double[MostPeaks + 1];
        int next = n - 1;
        while (next >= 0 && pending < held.Length)
        {
            // Every sample at this level joins the stretches beside it.
            double level = temps[order[next]];
            while (next >= 0 && temps[order[next]] == level)
            {
                int k = order[next--];
                int first = k, last = k;
                if (k > 0 && runStart[k - 1] >= 0)
                {
                    first = runStart[k - 1];
                    starts.Remove(first);
                    runStart[k - 1] = -1;
                }

                if (k < n - 1 && runEnd[k + 1] >= 0)
                {
                    last = runEnd[k + 1];
                    starts.Remove(k + 1);
                    runEnd[k + 1] = -1;
                }

                if (first != k)
                {
                    runEnd[k] = -1;
                }

                runEnd[first] = last;
                runStart[last] = first;
                starts.Add(first);
            }

            if (starts.Count > MostPeaks)
            {
                return null;
            }

            // Each stretch's length at this level and at the next (kept for the contact times between them).
            double longest = 0;
            for (int s = 0; s < starts.Count; s++)
            {
                tops[s] = StretchLength(times, temps, starts[s], runEnd[starts[s]], level);
                longest = Math.Max(longest, tops[s]);
            }

            while (pending < held.Length && ascending[pending] <= longest)
            {
                held[pending++] = level;
            }

            if (next < 0)
            {
                break;
            }

            // Down to the next sample level: each stretch grows linearly; the highest level at which one reaches d.
            double below = temps[order[next]];
            double reach = 0;
            for (int s = 0; s < starts.Count; s++)
            {
                bottoms[s] = StretchLength(times, temps, starts[s], runEnd[starts[s]], below);
                reach = Math.Max(reach, bottoms[s]);
            }

            while (pending < held.Length && ascending[pending] < reach)
            {
                double d = ascending[pending], best = double.NegativeInfinity;
                for (int s = 0; s < starts.Count; s++)
                {
                    double top = tops[s], bottom = bottoms[s];
                    if (bottom > d)
                    {
                        best = Math.Max(best, level + ((below - level) * (d - top) / (bottom - top)));
                    }
                }

                held[pending++] = best;
            }
        }

        for (; pending < held.Length; pending++)
        {
            held[pending] = double.NaN;
        }

        return held;
    }

    /// <summary>
    /// The length of the stretch from sample i to sample j at a level at or below both: the time between them, and on
    /// either side the part of the piece beyond the sample that lies at or above the level.
    /// </summary>
    private static double StretchLength(double[] times, double[] temps, int i, int j, double level)
    {
        double length = times[j] - times[i];
        if (i > 0 && level < temps[i])
        {
            length += (times[i] - times[i - 1]) * (temps[i] - level) / (temps[i] - temps[i - 1]);
        }

        if (j < times.Length - 1 && level < temps[j])
        {
            length += (times[j + 1] - times[j]) * (temps[j] - level) / (temps[j] - temps[j + 1]);
        }

        return length;
    }

    /// <summary>The most runs (stretches that only rise or only fall) a history may have for <see cref="ByRuns"/> to order it.</summary>
    private const int MostRuns = 8;

    /// <summary>
    /// For a history made of at most <see cref="MostRuns"/> runs that each only rise or only fall (most are a few:
    /// heating, a hold, cooling), its samples in ascending order of temperature, by merging the runs (a falling one read
    /// backwards) in place of a sort; false for any other history. Samples of equal temperature may come in any order
    /// (the sweep takes a level's samples together).
    /// </summary>
    private static bool ByRuns(double[] temps, int[] order)
    {
        int n = temps.Length, runs = 0;
        Span<int> head = stackalloc int[MostRuns], end = stackalloc int[MostRuns], step = stackalloc int[MostRuns];
        for (int first = 0; first < n;)
        {
            if (runs == MostRuns)
            {
                return false;
            }

            int last = first;
            bool falls = first + 1 < n && temps[first + 1] < temps[first];
            while (last + 1 < n && (falls ? temps[last + 1] <= temps[last] : temps[last + 1] >= temps[last]))
            {
                last++;
            }

            // A rising run is read from its first sample up, a falling one from its last down: each ascends.
            (head[runs], end[runs], step[runs]) = falls ? (last, first - 1, -1) : (first, last + 1, 1);
            runs++;
            first = last + 1;
        }

        for (int o = 0; o < n; o++)
        {
            int pick = -1;
            for (int r = 0; r < runs; r++)
            {
                if (head[r] != end[r] && (pick < 0 || temps[head[r]] < temps[head[pick]]))
                {
                    pick = r;
                }
            }

            order[o] = head[pick];
            head[pick] += step[pick];
        }

        return true;
    }

    private static double Sustained(double[] times, double[] temps, double[] slopes, double seconds, int[] queue)
    {
        int n = times.Length;
        if (n < 2 || times[n - 1] - times[0] < seconds)
        {
            return double.NaN;
        }

        double first = times[0], lastStart = times[n - 1] - seconds;
        if (seconds <= 0)
        {
            double peak = double.NegativeInfinity;
            foreach (double t in temps)
            {
                peak = double.IsNaN(t) ? double.NaN : Math.Max(peak, t);
            }

            return peak;
        }

        // The window starts where s or s + d meets a sample: two sorted sequences, merged as they are read.
        int head = 0, tail = 0;
        int j = 0, m = 0, pushed = 0, forward = 1, backward = 0;
        double a = first, best = double.NegativeInfinity;
        while (true)
        {
            // The next event after a: the next sample time, or the next sample time less d, within the starts.
            while (forward < n && times[forward] <= a)
            {
                forward++;
            }

            while (backward < n && times[backward] - seconds <= a)
            {
                backward++;
            }

            double next = lastStart;
            if (forward < n)
            {
                next = Math.Min(next, times[forward]);
            }

            if (backward < n)
            {
                next = Math.Min(next, times[backward] - seconds);
            }

            double b = Math.Max(a, next);
            double mid = 0.5 * (a + b);
            while (j + 2 < n && times[j + 1] <= mid)
            {
                j++;
            }

            while (m + 2 < n && times[m + 1] <= mid + seconds)
            {
                m++;
            }

            // The samples strictly inside the window: indices j+1 .. m, their minimum at the queue's head.
            while (pushed <= m)
            {
                while (tail > head && temps[queue[tail - 1]] >= temps[pushed])
                {
                    tail--;
                }

                queue[tail++] = pushed++;
            }

            while (tail > head && queue[head] <= j)
            {
                head++;
            }

            double interior = tail > head ? temps[queue[head]] : double.PositiveInfinity;
            double startA = Linear(times, temps, slopes, j, a), startB = Linear(times, temps, slopes, j, b);
            double endA = Linear(times, temps, slopes, m, a + seconds), endB = Linear(times, temps, slopes, m, b + seconds);
            best = Math.Max(best, Math.Min(interior, Math.Max(Math.Min(startA, endA), Math.Min(startB, endB))));
            double da = startA - endA, db = startB - endB;
            if (da * db < 0)
            {
                // The two lines cross inside: there the window's minimum of its two ends is largest.
                double f = da / (da - db);
                best = Math.Max(best, Math.Min(interior, startA + (f * (startB - startA))));
            }

            if (double.IsNaN(best))
            {
                return double.NaN;
            }

            if (b >= lastStart)
            {
                break;
            }

            a = b;
        }

        return best;
    }

    /// <summary>The history's value at t on the piece from sample k to k + 1 (held at the ends outside it), by the piece's slope.</summary>
    private static double Linear(double[] times, double[] temps, double[] slopes, int k, double t)
    {
        double ta = times[k];
        if (t <= ta)
        {
            return temps[k];
        }

        return t >= times[k + 1] ? temps[k + 1] : temps[k] + (slopes[k] * (t - ta));
    }

    /// <summary>The longest continuous time the history spends at or above a level, s.</summary>
    public static double LongestRunAtOrAbove(IReadOnlyList<HeatingSample> history, double level)
    {
        double longest = 0;
        double? runStart = history[0].TemperatureCelsius >= level ? history[0].TimeSeconds : null;
        for (int k = 1; k < history.Count; k++)
        {
            HeatingSample a = history[k - 1], b = history[k];
            bool aIn = a.TemperatureCelsius >= level, bIn = b.TemperatureCelsius >= level;
            if (aIn && !bIn)
            {
                double end = Crossing(a, b, level);
                longest = Math.Max(longest, end - runStart!.Value);
                runStart = null;
            }
            else if (!aIn && bIn)
            {
                runStart = Crossing(a, b, level);
            }
        }

        if (runStart is { } start)
        {
            longest = Math.Max(longest, history[history.Count - 1].TimeSeconds - start);
        }

        return longest;
    }

    private static double Crossing(HeatingSample a, HeatingSample b, double level)
    {
        double span = b.TemperatureCelsius - a.TemperatureCelsius;
        double f = span == 0 ? 0 : (level - a.TemperatureCelsius) / span;
        return a.TimeSeconds + (f * (b.TimeSeconds - a.TimeSeconds));
    }
}
