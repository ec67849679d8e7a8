using System;
using System.Collections.Generic;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class TemperatureHistoryTests
{
    private static readonly HeatingSample[] Triangle =
    {
        new(0, 30, 0), new(100, 70, 0), new(200, 30, 0),
    };

    [Fact]
    public void TheSustainedTemperatureOfATriangleIsLinearInTheDuration()
    {
        // A symmetric triangle from 30 to 70 °C and back over 200 s stays above 70 - 40 d / 200 for d seconds.
        foreach (double d in new[] { 0.0, 10, 50, 100, 199 })
        {
            Within.Absolute(70 - (40 * d / 200), TemperatureHistory.SustainedFor(Triangle, d), 1e-6, "held for " + d + " s");
        }

        Assert.True(double.IsNaN(TemperatureHistory.SustainedFor(Triangle, 300)), "a history shorter than the contact has no answer");
    }

    [Fact]
    public void FindsPeaksAndCrossings()
    {
        Assert.Equal(70, TemperatureHistory.Peak(Triangle));
        Assert.Equal(50, TemperatureHistory.FirstReaching(Triangle, 50)!.Value, 12);
        Assert.Null(TemperatureHistory.FirstReaching(Triangle, 71));
        Assert.Equal(100, TemperatureHistory.LongestRunAtOrAbove(Triangle, 50), 12);
    }

    /// <summary>
    /// An independent definition of the same quantity: bisection on the level L for the longest run at or above L
    /// (the largest L whose longest run is at least the duration).
    /// </summary>
    private static double ByBisection(HeatingSample[] history, double seconds)
    {
        double low = double.PositiveInfinity, high = double.NegativeInfinity;
        foreach (HeatingSample s in history)
        {
            low = System.Math.Min(low, s.TemperatureCelsius);
            high = System.Math.Max(high, s.TemperatureCelsius);
        }

        if (TemperatureHistory.LongestRunAtOrAbove(history, high) >= seconds)
        {
            return high;
        }

        for (int i = 0; i < 200 && high - low > 1e-12; i++)
        {
            double mid = 0.5 * (low + high);
            if (TemperatureHistory.LongestRunAtOrAbove(history, mid) >= seconds)
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

    [Validates("the highest temperature held for a contact time, one exact sweep, 300 random histories", "bisection on the longest run at or above a level (independent algorithm)", "1e-9")]
    [Fact]
    public void TheOneSweepAnswerEqualsBisectionOnTheLongestRunForRandomHistories()
    {
        var random = new System.Random(20261201);
        for (int trial = 0; trial < 300; trial++)
        {
            int n = random.Next(2, 40);
            var history = new HeatingSample[n];
            double t = 0;
            for (int k = 0; k < n; k++)
            {
                t += k == 0 ? 0 : 0.1 + (random.NextDouble() * 10);
                history[k] = new HeatingSample(t, 30 + (random.NextDouble() * 40), 0);
            }

            foreach (double fraction in new[] { 0.0, 0.01, 0.1, 0.37, 0.8, 1.0 })
            {
                double d = fraction * t;
                Within.Absolute(ByBisection(history, d), TemperatureHistory.SustainedFor(history, d), 1e-9, "trial " + trial + ", " + d + " s");
            }
        }
    }

    [Validates("the highest temperature held for every contact time at once, by a sweep down through the levels, 300 random histories with plateaus, two in five as a few rising and falling runs", "bisection on the longest run at or above a level (independent algorithm)", "1e-9")]
    [Fact]
    public void TheSweepThroughTheLevelsEqualsBisectionOnTheLongestRunForRandomHistories()
    {
        var random = new System.Random(20261202);
        int swept = 0;
        for (int trial = 0; trial < 300; trial++)
        {
            int n = random.Next(2, 40);
            var history = new HeatingSample[n];
            double t = 0;
            bool plateaus = trial % 3 == 0, repeats = trial % 4 == 1, runs = trial % 5 < 2;
            for (int k = 0; k < n; k++)
            {
                // Some histories repeat a time (a step that ends on a breakpoint), so that a piece has no length.
                t += k == 0 || (repeats && random.Next(3) == 0) ? 0 : 0.1 + (random.NextDouble() * 10);
                // Some histories take few distinct values, so that samples share levels and stretches join at them.
                double temperature = plateaus ? 30 + random.Next(4) : 30 + (random.NextDouble() * 40);
                history[k] = new HeatingSample(t, temperature, 0);
            }

            if (runs)
            {
                // Two in five rise and fall in a few runs (as heating, a hold and cooling do, plateaus included), the
                // case the sweep orders by merging the runs instead of sorting: the values sorted, cut into up to
                // eight pieces, every other piece reversed.
                double[] values = Array.ConvertAll(history, h => h.TemperatureCelsius);
                Array.Sort(values);
                var cuts = new List<int> { 0, n };
                for (int c = random.Next(8); c > 0; c--)
                {
                    cuts.Add(random.Next(n));
                }

                cuts.Sort();
                for (int c = 1; c < cuts.Count; c += 2)
                {
                    Array.Reverse(values, cuts[c - 1], cuts[c] - cuts[c - 1]);
                }

                for (int k = 0; k < n; k++)
                {
                    history[k] = new HeatingSample(history[k].TimeSeconds, values[k], 0);
                }
            }

            var durations = new[] { 0.0, 0.01 * t, 0.1 * t, 0.37 * t, 0.8 * t, t, 1.01 * t };
            double[]? all = new TemperatureHistory.SustainedLevels(history).ForAll(durations);
            if (all is null)
            {
                continue;
            }

            swept++;
            for (int k = 0; k < durations.Length; k++)
            {
                if (durations[k] > t)
                {
                    Assert.True(double.IsNaN(all[k]), "trial " + trial + ": a contact longer than the history has no answer");
                    continue;
                }

                Within.Absolute(ByBisection(history, durations[k]), all[k], 1e-9, "trial " + trial + ", " + durations[k] + " s");
            }
        }

        Assert.True(swept > 250, "the sweep through the levels answered only " + swept + " of 300 histories");
    }
}
