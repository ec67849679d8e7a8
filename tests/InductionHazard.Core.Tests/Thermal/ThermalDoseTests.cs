using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class ThermalDoseTests
{
    // Sapareto and Dewey (1984): CEM43 = sum R^(43 - T) dt in minutes, R = 0.5 at or above 43 °C, 0.25 below.
    [Validates("CEM43 of plateaus", "Sapareto and Dewey (1984)", "1e-12")]
    [Theory]
    [InlineData(43, 10, 10)]
    [InlineData(45, 10, 40)]
    [InlineData(44, 30, 60)]
    [InlineData(41, 60, 3.75)]
    [InlineData(39, 480, 1.875)]
    public void AConstantTemperatureGivesTheDefinition(double celsius, double minutes, double expected)
    {
        Within.Relative(expected, ThermalDose.Cem43Minutes(celsius, minutes * 60), 1e-12, "CEM43 at " + celsius + " °C");
        var plateau = new[] { new HeatingSample(0, celsius, 0), new HeatingSample(minutes * 60, celsius, 0) };
        Within.Relative(expected, ThermalDose.Cem43Minutes(plateau), 1e-12, "CEM43 of the plateau history");
    }

    [Validates("exact integration against fine sampling", "the definition", "1e-6")]
    [Fact]
    public void ALinearRampIsIntegratedExactlyAcrossTheBreakpoint()
    {
        // 40 -> 46 °C over 10 minutes, against a fine sampling of the same history.
        var coarse = new[] { new HeatingSample(0, 40, 0), new HeatingSample(600, 46, 0) };
        var fine = Enumerable.Range(0, 600001).Select(k => new HeatingSample(k / 1000.0, 40 + (6 * k / 600000.0), 0)).ToArray();
        Within.Relative(ThermalDose.Cem43Minutes(fine), ThermalDose.Cem43Minutes(coarse), 1e-6, "dose of the ramp");
    }

    [Validates("the dose and its margin over a history sampled microkelvins apart", "the definition integrated in closed form over one linear piece", "1e-10")]
    [Theory]
    [InlineData(33.0, 39.0)]   // below 43 °C throughout
    [InlineData(40.0, 46.0)]   // across the breakpoint
    public void AFinelySampledRampHasTheDoseAndMarginOfItsOnePiece(double from, double to)
    {
        // 200,000 samples of a ramp over ten minutes, each some 30 microkelvin above the last (the weights of such
        // neighbours are found from each other, not afresh), against the same ramp as one piece. Added over the start:
        // the closed form t (w1 - w0) / ln(w1 / w0) on each side of 43 °C (Cem43Minutes), less t R^(43 - start).
        const int Samples = 200_000;
        var coarse = new[] { new HeatingSample(0, from, 0), new HeatingSample(600, to, 0) };
        var fine = Enumerable.Range(0, Samples + 1).Select(k => new HeatingSample(600.0 * k / Samples, from + ((to - from) * k / Samples), 0)).ToArray();
        double added = ThermalDose.Cem43Minutes(coarse) - ThermalDose.Cem43Minutes(from, 600);
        Within.Relative(added, ThermalDose.AddedCem43Minutes(fine, from), 1e-10, "added dose of the finely sampled ramp");
        Within.Relative(ThermalDose.RiseMargin(coarse, from, 2.0)!.Value, ThermalDose.RiseMargin(fine, from, 2.0)!.Value, 1e-10, "dose margin of the finely sampled ramp");
    }

    private static HeatingSample[] Plateau(double start, double plateau, double minutes) => new[]
    {
        new HeatingSample(0, start, 0), new HeatingSample(60, plateau, 0), new HeatingSample(60 + (minutes * 60), plateau, 0), new HeatingSample(120 + (minutes * 60), start, 0),
    };

    [Validates("a dose margin is the factor on the rise that brings the added CEM43 to its limit", "Sapareto and Dewey (1984), solved; van Rhoon et al. (2013) limit", "1e-9")]
    [Theory]
    [InlineData(44.0, 10.0)]
    [InlineData(42.0, 60.0)]
    [InlineData(47.0, 2.0)]
    public void TheDoseMarginIsTheFactorOnTheRiseThatMeetsTheLimit(double plateau, double minutes)
    {
        HeatingSample[] history = Plateau(33, plateau, minutes);
        double margin = ThermalDose.RiseMargin(history, 33, 2.0)!.Value;
        var scaled = Array.ConvertAll(history, s => new HeatingSample(s.TimeSeconds, 33 + (margin * (s.TemperatureCelsius - 33)), 0));
        Within.Relative(2.0, ThermalDose.AddedCem43Minutes(scaled, 33), 1e-9, "added dose at the margin");
    }

    [Validates("the dose margin of a plateau, solved by hand", "Sapareto and Dewey (1984): t R^(43 - T) for a constant temperature, solved for T", "1e-9")]
    [Theory]
    [InlineData(0.5, 480.0)]   // scaled to 39.0 °C: R = 0.25 throughout
    [InlineData(2.0, 1.0)]     // scaled to 44.0 °C: R = 0.5 at the margin
    [InlineData(0.01, 60.0)]   // a rise small enough that the added dose is nearly linear in the factor at 1
    public void TheDoseMarginOfAPlateauIsTheClosedForm(double rise, double minutes)
    {
        // From 33 °C to a plateau within a microsecond, held: the added dose at factor k is t (R^(43 - T) - 0.25^10)
        // with T = 33 + k rise, so the limit L is met where R^(43 - T) = L / t + 0.25^10 = w: T = 43 + log_2 w if w is
        // at least 1 (T at or above 43 °C, R = 0.5), else 43 + log_4 w (R = 0.25). The microsecond's ramp adds about
        // 1e-6 s / t relative, below 1e-9.
        const double Limit = 2.0;
        double seconds = minutes * 60;
        HeatingSample[] history = { new(0, 33, 0), new(1e-6, 33 + rise, 0), new(1e-6 + seconds, 33 + rise, 0) };
        double weight = (Limit / minutes) + Math.Pow(0.25, 10);
        double scaled = 43 + Math.Log(weight, weight >= 1 ? 2 : 4);
        Within.Relative((scaled - 33) / rise, ThermalDose.RiseMargin(history, 33, Limit)!.Value, 1e-9, "dose margin of a " + rise + " K plateau for " + minutes + " min");
    }

    [Fact]
    public void NoRiseAddsNoDoseWhateverTheRoom()
    {
        // A 45 °C room and no field change: the field adds nothing, so the dose margin is unbounded (the baseline is
        // the room's, not the field's).
        HeatingSample[] hot = { new(0, 45, 0), new(8 * 3600, 45, 0) };
        Assert.Equal(0, ThermalDose.AddedCem43Minutes(hot, 45));
        Assert.Equal(double.PositiveInfinity, ThermalDose.RiseMargin(hot, 45, 2.0));
    }

    [Fact]
    public void ADoseLimitBeyondTheFittedRangeIsNotUsed()
    {
        // A 2 ms spike from 33 to 50 °C adds far less than 2 CEM43 even when scaled to peak at 57 °C (1 s at 57 °C is
        // 273 CEM43, 2 ms about 0.1): the limit would be met only outside the relation's range, so the dose is not
        // the criterion there.
        HeatingSample[] brief = { new(0, 33, 0), new(0.001, 50, 0), new(0.002, 33, 0) };
        Assert.Null(ThermalDose.RiseMargin(brief, 33, 2.0));
    }

    [Fact]
    public void TheDoseMarginEqualsAPlainBisectionOnRandomHistories()
    {
        // The root finder (Newton's steps on the log of the dose, from the history as it is) against plain bisection on
        // the dose itself, on 300 random heating histories (fixed seed) and limits from 0.01 to 50 CEM43: the same factor
        // to 1e-9, below and above 1; null exactly where the dose at the range's end stays below the limit; and the
        // added dose it finds on its way the same as AddedCem43Minutes to the last bit.
        var random = new Random(20261202);
        int compared = 0, belowOne = 0, nulls = 0;
        foreach (double limit in new[] { 0.01, 2.0, 50 })
        {
            for (int trial = 0; trial < 300; trial++)
            {
                // A third of the histories brief (steps of milliseconds), whose dose may not reach the limit even at the range's end.
                double start = 30 + (random.NextDouble() * 8), t = 0, celsius = start, pace = trial % 3 == 0 ? 1e-3 : 1;
                var history = new List<HeatingSample> { new(0, start, 0) };
                for (int k = 0; k < 5 + random.Next(60); k++)
                {
                    t += pace * (1 + (random.NextDouble() * 300));
                    celsius = Math.Max(start, celsius + ((random.NextDouble() - 0.3) * 3));
                    history.Add(new HeatingSample(t, celsius, 0));
                }

                double? margin = ThermalDose.RiseMargin(history, start, limit, out double added);
                Assert.Equal(ThermalDose.AddedCem43Minutes(history, start), added);
                Assert.Equal(margin, ThermalDose.RiseMargin(history, start, limit));
                if (margin is { } infinite && double.IsInfinity(infinite))
                {
                    continue;
                }

                double Added(double f) =>
                    ThermalDose.Cem43Minutes(history.ConvertAll(h => new HeatingSample(h.TimeSeconds, start + (f * (h.TemperatureCelsius - start)), 0)))
                    - ThermalDose.Cem43Minutes(history.ConvertAll(h => new HeatingSample(h.TimeSeconds, start, 0)));
                double low = 0, high = (ThermalDose.FittedUpToCelsius - start) / (history.Max(h => h.TemperatureCelsius) - start);
                Assert.True((margin is null) == (Added(high) < limit), "trial " + trial + ": a margin exactly where the dose at the range's end reaches the limit");
                if (margin is null)
                {
                    nulls++;
                    continue;
                }

                for (int i = 0; i < 200; i++)
                {
                    double mid = 0.5 * (low + high);
                    if (Added(mid) < limit)
                    {
                        low = mid;
                    }
                    else
                    {
                        high = mid;
                    }
                }

                Within.Relative(0.5 * (low + high), margin.Value, 1e-9, "dose margin, limit " + limit + ", trial " + trial);
                compared++;
                belowOne += margin.Value < 1 ? 1 : 0;
            }
        }

        Assert.True(compared > 150 && belowOne > 20 && compared - belowOne > 20 && nulls > 20, compared + " margins compared (" + belowOne + " below 1), " + nulls + " without one");
    }

    [Validates("the dose a heating adds, each sample's weight shared by the pieces beside it, 300 random histories across 43 degC", "CEM43 of Sapareto and Dewey (1984) integrated piece by piece and split at 43 degC (independent implementation)", "1e-9 of the whole dose")]
    [Fact]
    public void TheAddedDoseIsTheHistorysDoseLessTheHeldStartsOnRandomHistoriesAcross43Degrees()
    {
        // The added dose (each sample's weight shared by the pieces beside it, the logarithmic mean on each piece)
        // against the piecewise integral of each piece on its own (split at 43 degC) less the constant start's dose.
        var random = new Random(20261203);
        for (int trial = 0; trial < 300; trial++)
        {
            double start = 30 + (random.NextDouble() * 8), t = 0;
            var history = new List<HeatingSample> { new(0, start, 0) };
            for (int k = 0; k < 2 + random.Next(60); k++)
            {
                t += random.Next(8) == 0 ? 0 : random.NextDouble() * 300;
                // Some pieces flat or nearly so, some crossing 43 degC, some ending on it.
                double celsius = random.Next(4) switch
                {
                    0 => history[history.Count - 1].TemperatureCelsius,
                    1 => history[history.Count - 1].TemperatureCelsius + (1e-6 * random.NextDouble()),
                    2 => 43,
                    _ => start + (random.NextDouble() * 15),
                };
                history.Add(new HeatingSample(t, celsius, 0));
            }

            double whole = ThermalDose.Cem43Minutes(history), expected = whole - ThermalDose.Cem43Minutes(start, t);
            Within.Absolute(expected, ThermalDose.AddedCem43Minutes(history, start), 1e-9 * whole, "trial " + trial + " (to 1e-9 of the history's whole dose)");
        }
    }
}
