using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Assessment;
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

    [Fact]
    public void NoContactTimesMarginIsBelowTheBoundThatLetsTheDoseGovernUnswept()
    {
        // The bound is the peak against the lowest threshold; every level held for a contact time is at most the peak,
        // also for rises of a few units in the last place of the temperature, where rounding in the interpolation of a
        // level would show first.
        var random = new Random(20261204);
        for (int trial = 0; trial < 600; trial++)
        {
            int n = random.Next(2, 60);
            double start = trial % 3 == 0 ? 30 + (random.NextDouble() * 5) : 20 + (random.NextDouble() * 900);
            double scale = Math.Pow(10, -13 + (random.NextDouble() * 14));
            var history = new HeatingSample[n];
            double t = 0;
            for (int k = 0; k < n; k++)
            {
                t += k == 0 ? 0 : 0.1 + (random.NextDouble() * 100);
                history[k] = new HeatingSample(t, k == 0 ? start : start + (scale * Math.Round(random.NextDouble() * 20, random.Next(0, 4))), 0);
            }

            int count = random.Next(1, 70);
            var durations = new double[count];
            var thresholds = new double[count];
            for (int k = 0; k < count; k++)
            {
                durations[k] = t * Math.Pow(10, -3 + (3.0 * k / Math.Max(1, count - 1)));
                thresholds[k] = start + (scale * (1 + (30 * Math.Pow(1 - ((double)k / count), 2))));
            }

            double bound = BurnCheck.ContactMarginBound(history, thresholds, start);
            EverySwept(history, durations, thresholds, start, out double smallest);
            Assert.True(bound <= smallest, "trial " + trial + ": bound " + bound.ToString("R") + " above the smallest margin " + smallest.ToString("R"));
            double[]? levels = new TemperatureHistory.SustainedLevels(history).ForAll(durations);
            if (levels is not null)
            {
                BurnCheck.Smallest(levels, thresholds, start, out _, out double swept);
                Assert.True(bound <= swept, "trial " + trial + ": bound " + bound.ToString("R") + " above the level sweep's smallest margin " + swept.ToString("R"));
            }
        }

        var broken = new[] { new HeatingSample(0, 33, 0), new HeatingSample(1, double.NaN, 0), new HeatingSample(2, 34, 0) };
        Assert.True(double.IsNaN(BurnCheck.ContactMarginBound(broken, new[] { 45.0 }, 33)), "a history with a NaN gives no bound");
    }

    [Fact]
    public void AWornRingsBurnMarginIsTheSmallerOfTheDoseMarginAndEveryContactTimeSwept()
    {
        // Where the dose governs, the contact times are swept only when the finding is read: the verdict must be what
        // sweeping every contact time first would give, and the finding must name the same worst contact time.
        var cases = new (InductionHazard.Items.ConductiveItem Item, InductionHazard.Fields.FieldSource Source)[]
        {
            (Fixtures.Ring(), Fixtures.UniformSine(0.01, 50)),
            (Fixtures.Ring(), Fixtures.UniformSine(0.004, 12000)),
            (Fixtures.Ring(), Fixtures.UniformSine(0.002, 2000)),
            (Fixtures.Ring("Copper", 0.03, 0.003), Fixtures.UniformSine(0.02, 400, duration: 120)),
            (Fixtures.Ring(), Fixtures.UniformRamp(0, 1, 0.01)),
            (Fixtures.Ring("Titanium", 0.02, 0.002), Fixtures.UniformRamp(0, 3, 1)),
            (Fixtures.Band("Aluminium", 0.06, 0.01, 0.001), Fixtures.UniformSine(0.001, 1000)),
            (Fixtures.Ring("Copper", 0.02, 0.002, contact: "Held"), Fixtures.UniformSine(0.003, 5000, duration: 30)),
        };
        int byDose = 0, byContact = 0;
        foreach (var (item, source) in cases)
        foreach (var policy in new[] { HazardPolicy.Default, new HazardPolicy { ThermalDoseLimitMinutes = 240 }, new HazardPolicy { ThermalDoseLimitMinutes = 1000 } })
        {
            InductionResponse response = Fixtures.Respond(item, source);
            MechanismResult burn = HazardAssessor.Assess(response, policy).Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn);
            IReadOnlyList<HeatingSample> history = response.HeatingSeries;
            double start = response.InitialTemperatureCelsius;
            double span = history[history.Count - 1].TimeSeconds - history[0].TimeSeconds;
            (double[] durations, double[] thresholds, _) = BurnCheck.Judged(BurnCheck.Durations(policy.ContactBurn, span), start);
            Assert.NotEmpty(durations);
            int worst = EverySwept(history, durations, thresholds, start, out double contact);
            double? dose = ThermalDose.RiseMargin(history, start, policy.ThermalDoseLimitMinutes);
            bool doseGoverns = dose is { } d && (double.IsNaN(d) || d < contact);
            _ = doseGoverns ? byDose++ : byContact++;
            string label = item.Name + " at " + source.Name;
            Assert.Equal(doseGoverns ? BurnDoseTextTests.DoseQuantity(response) : "skin contact temperature held for " + InductionHazard.Quantities.SiFormat.Format(durations[worst], "s"), burn.Quantity);
            double expected = VerdictRules.Bounded(doseGoverns ? dose!.Value : contact);
            Assert.True(Math.Abs(expected - burn.Margin) <= 1e-9 * expected, label + ": margin " + burn.Margin + " against " + expected);
            Assert.Contains("for " + InductionHazard.Quantities.SiFormat.Format(durations[worst], "s") + " against the threshold " + InductionHazard.Quantities.SiFormat.Celsius(thresholds[worst]), burn.Detail, StringComparison.Ordinal);
            Assert.Contains("(margin " + InductionHazard.Quantities.SiFormat.Margin(VerdictRules.Bounded(contact)) + ")", burn.Detail, StringComparison.Ordinal);

            // Whichever governs, the finding gives the dose and its margin as solved on their own.
            double? margin = ThermalDose.RiseMargin(history, start, policy.ThermalDoseLimitMinutes, out double added);
            Assert.Contains(
                margin is { } m
                    ? (response.PeakTemperatureCelsius > ThermalDose.FittedUpToCelsius ? "its limit reached at a rise " + InductionHazard.Quantities.SiFormat.Margin(m) : "thermal dose added " + InductionHazard.Quantities.SiFormat.Plain(added) + " CEM43 against " + InductionHazard.Quantities.SiFormat.Plain(policy.ThermalDoseLimitMinutes) + " (margin on the rise " + InductionHazard.Quantities.SiFormat.Margin(m) + ")")
                    : "thermal dose not the criterion",
                burn.Detail,
                StringComparison.Ordinal);
        }

        Assert.True(byDose >= 2 && byContact >= 2, "the cases should include both criteria governing: dose " + byDose + ", contact " + byContact);
    }

    /// <summary>
    /// The contact times judged: from the curve's shortest to the shorter of its longest and the history's span, 12 a
    /// decade evenly in the logarithm (first (last / first)^(k / count), written out here), with the curve's own points
    /// among them at their own temperatures, ascending and distinct, each with the threshold the curve gives it.
    /// </summary>
    [Theory]
    [InlineData(0.5)]
    [InlineData(0.7)]
    [InlineData(10)]
    [InlineData(37.3)]
    [InlineData(60)]
    [InlineData(1234.5)]
    [InlineData(8 * 3600.0)]
    [InlineData(1e6)]
    public void TheContactTimesAreTwelveADecadeWithTheCurvesPointsAndTheirThresholds(double span)
    {
        ContactBurnThreshold curve = ContactBurnThreshold.UncoatedMetal;
        (double[] seconds, double[] celsius) = BurnCheck.Durations(curve, span);
        double first = curve.ShortestSeconds, last = Math.Min(curve.LongestSeconds, span);
        int count = (int)Math.Ceiling(Math.Log10(last / first) * 12);
        var expected = Enumerable.Range(0, count + 1).Select(k => first * Math.Pow(last / first, count == 0 ? 0 : (double)k / count))
            .Concat(curve.Points.Select(p => p.Seconds).Where(t => t <= last)).OrderBy(t => t).ToList();
        var distinct = new List<double>();
        foreach (double t in expected)
        {
            if (distinct.Count == 0 || Math.Abs(t - distinct[distinct.Count - 1]) > 1e-12 * t)
            {
                distinct.Add(t);
            }
        }

        Assert.Equal(distinct.Count, seconds.Length);
        Assert.Equal(first, seconds[0]);
        Assert.Equal(last, seconds[seconds.Length - 1]);
        for (int k = 0; k < seconds.Length; k++)
        {
            Assert.True(Math.Abs(seconds[k] - distinct[k]) <= 1e-13 * distinct[k], $"time {k}: {seconds[k]} against {distinct[k]}");
            Assert.True(k == 0 || seconds[k] > seconds[k - 1], $"time {k} not above the one before");
            Assert.True(Math.Abs(celsius[k] - curve.CelsiusFor(seconds[k])) <= 1e-12, $"threshold {k}: {celsius[k]} against {curve.CelsiusFor(seconds[k])}");
        }

        foreach ((double t, double c) in curve.Points.Where(p => p.Seconds <= last))
        {
            int at = Array.IndexOf(seconds, t);
            Assert.True(at >= 0, "the curve's point at " + t + " s is among the contact times");
            Assert.Equal(c, celsius[at]);
        }
    }

    [Fact]
    public void AThresholdCurveWhoseTimesDoNotIncreaseIsRefusedNamingThePoint()
    {
        var ex = Assert.Throws<ArgumentException>(() => new ContactBurnThreshold(new[] { (1.0, 60.0), (10.0, 50.0), (10.0, 48.0) }, "test"));
        Assert.Contains("Point 2", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => new ContactBurnThreshold(new[] { (0.0, 60.0) }, "test"));
        Assert.Throws<ArgumentException>(() => new ContactBurnThreshold(new[] { (1.0, double.NaN) }, "test"));
    }
}

/// <summary>What the burn finding says of the dose once the item passes the range the dose relation was fitted on.</summary>
public sealed class BurnDoseTextTests
{
    /// <summary>The dose criterion's quantity as the rule has it: extrapolated once the item passes the fitted range's 57 °C.</summary>
    public static string DoseQuantity(InductionResponse response) =>
        response.PeakTemperatureCelsius > 57 ? "thermal dose added, extrapolated (the item passes 57.0 °C)" : "thermal dose added";

    [Fact]
    public void PastTheFittedRangeTheDoseIsNotPrintedAsANumber()
    {
        // A gold ring worn in 50 mT at 10 kHz reaches its melting point: the added dose at its own rise is some 1e300
        // CEM43 by the relation's extrapolation, a number with no meaning; the margin on the rise still stands.
        var ring = InductionHazard.Items.ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "band", ["Material"] = "Gold", ["Diameter"] = "20 mm", ["WireDiameter"] = "2 mm", ["Contact"] = "Skin" }, InductionHazard.Items.MaterialLibrary.BuiltIn);
        var field = InductionHazard.Fields.FieldSource.Uniform("coil", new InductionHazard.Waveforms.SineWaveform(0.05, 10000, drive: InductionHazard.Waveforms.DriveKind.FluxDensity), InductionHazard.Quantities.Vector3D.UnitZ);
        InductionAssessment hot = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(ring, field)), HazardPolicy.Default);
        Assert.True(hot.Response.PeakTemperatureCelsius > ThermalDose.FittedUpToCelsius);
        MechanismResult burn = hot.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn);
        Assert.Contains("thermal dose added beyond the range its relation was fitted on", burn.Detail, StringComparison.Ordinal);
        Assert.DoesNotContain("E+", burn.Detail, StringComparison.Ordinal);
        Assert.Equal("CEM43 min", burn.Unit);
        Assert.Equal("thermal dose added, extrapolated (the item passes 57.0 °C)", burn.Quantity);

        // A ring that warms a little keeps its dose as a number.
        var gentle = InductionHazard.Fields.FieldSource.Uniform("mains", new InductionHazard.Waveforms.SineWaveform(0.01, 50, drive: InductionHazard.Waveforms.DriveKind.FluxDensity), InductionHazard.Quantities.Vector3D.UnitZ);
        MechanismResult warm = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(ring, gentle)), HazardPolicy.Default).Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn);
        Assert.Matches("thermal dose added [0-9.e-]+ CEM43 against 2", warm.Detail);
        Assert.Equal("thermal dose added", warm.Quantity);
    }
}
