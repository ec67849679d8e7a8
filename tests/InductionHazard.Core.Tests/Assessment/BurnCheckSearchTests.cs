using System;
using System.Collections.Generic;
using InductionHazard.Assessment.Checks;
using InductionHazard.Criteria;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>The burn check's search for the worst contact time skips some contact times: it must not change the answer.</summary>
public sealed class BurnCheckSearchTests
{
    /// <summary>Every contact time swept: the smallest margin, the shortest on a tie, the shortest NaN if any.</summary>
    private static int EverySwept(IReadOnlyList<HeatingSample> history, double[] durations, double[] thresholds, double start, out double margin)
    {
        int worst = -1;
        margin = double.NaN;
        for (int k = 0; k < durations.Length; k++)
        {
            double held = TemperatureHistory.SustainedFor(history, durations[k]);
            double m = double.IsNaN(held) ? double.NaN : thresholds[k] <= start ? 0 : VerdictRules.Margin(thresholds[k] - start, Math.Max(0, held - start));
            if (double.IsNaN(m))
            {
                margin = m;
                return k;
            }

            if (worst < 0 || m < margin)
            {
                (worst, margin) = (k, m);
            }
        }

        return worst;
    }

    [Fact]
    public void TheWorstContactTimeIsTheOneEverySweptContactTimeGivesForRandomHistories()
    {
        var random = new Random(20261202);
        for (int trial = 0; trial < 400; trial++)
        {
            int n = random.Next(2, 60);
            var history = new HeatingSample[n];
            double t = 0, start = 30 + (random.NextDouble() * 5);
            bool plateau = random.Next(3) == 0;
            for (int k = 0; k < n; k++)
            {
                t += k == 0 ? 0 : 0.1 + (random.NextDouble() * 100);
                double rise = plateau ? Math.Round(random.NextDouble() * 3) : random.NextDouble() * 20;
                history[k] = new HeatingSample(t, k == 0 ? start : start + rise, 0);
            }

            if (trial % 50 == 7)
            {
                // A history that could not be followed somewhere: the shortest contact time it stops is the answer.
                history[random.Next(1, n)] = new HeatingSample(history[n / 2].TimeSeconds, double.NaN, 0);
                Array.Sort(history, (a, b) => a.TimeSeconds.CompareTo(b.TimeSeconds));
            }

            int count = random.Next(1, 70);
            var durations = new double[count];
            var thresholds = new double[count];
            for (int k = 0; k < count; k++)
            {
                durations[k] = t * Math.Pow(10, -3 + (3.0 * k / Math.Max(1, count - 1)));
                thresholds[k] = 43 + (30 * Math.Pow(1 - ((double)k / count), 2));
            }

            int expected = EverySwept(history, durations, thresholds, start, out double expectedMargin);
            int found = BurnCheck.WorstContact(k => TemperatureHistory.SustainedFor(history, durations[k]), TemperatureHistory.Peak(history), durations, thresholds, start, out _, out double margin);
            Assert.True(expected == found, "trial " + trial + ": contact time " + found + " chosen, every one swept gives " + expected);
            Assert.True(expectedMargin.Equals(margin) || Math.Abs(expectedMargin - margin) <= 1e-12 * expectedMargin, "trial " + trial + ": margin " + margin + " against " + expectedMargin);

            // The same choice from the levels given all at once.
            double[] levels = Array.ConvertAll(durations, d => TemperatureHistory.SustainedFor(history, d));
            int direct = BurnCheck.Smallest(levels, thresholds, start, out _, out double directMargin);
            Assert.True(expected == direct && (expectedMargin.Equals(directMargin) || Math.Abs(expectedMargin - directMargin) <= 1e-12 * expectedMargin), "trial " + trial + ": from all levels, contact time " + direct + " against " + expected);
        }
    }
}
