using System;
using System.Collections.Generic;

namespace InductionHazard.Thermal;

/// <summary>Questions asked of a temperature history taken as linear between its samples.</summary>
public static class TemperatureHistory
{
    /// <summary>The highest temperature in the history, °C.</summary>
    public static double Peak(IReadOnlyList<HeatingSample> history)
    {
        double peak = double.NegativeInfinity;
        foreach (HeatingSample sample in history)
        {
            if (double.IsNaN(sample.TemperatureCelsius))
            {
                return double.NaN;
            }

            peak = Math.Max(peak, sample.TemperatureCelsius);
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
    public static double SustainedFor(IReadOnlyList<HeatingSample> history, double seconds)
    {
        if (history.Count < 2 || history[history.Count - 1].TimeSeconds - history[0].TimeSeconds < seconds)
        {
            return double.NaN;
        }

        double low = double.PositiveInfinity, high = double.NegativeInfinity;
        foreach (HeatingSample s in history)
        {
            low = Math.Min(low, s.TemperatureCelsius);
            high = Math.Max(high, s.TemperatureCelsius);
        }

        if (LongestRunAtOrAbove(history, high) >= seconds)
        {
            return high;
        }

        for (int iteration = 0; iteration < 60 && high - low > 1e-9 * Math.Max(1, Math.Abs(high)); iteration++)
        {
            double mid = 0.5 * (low + high);
            if (LongestRunAtOrAbove(history, mid) >= seconds)
            {
                low = mid;
            }
            else
            {
                high = mid;
            }
        }

        return low;
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
