using System.Collections.Generic;
using CsCheck;
using System.Threading;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class HeatingIntegratorTests
{
    // 1 g of copper-like metal (c = 385 J/(kg K)) with no cooling at all: the case that used to run for ever.
    private static LumpedThermalModel Uncooled() => new(0.001 * 385, 1e-4, new ThermalEnvironment(20, 0, 0));

    [Validates("time to melting of an uncooled item, m c (Tm - T0) / P", "energy balance (first law)", "1 %")]
    [Fact]
    public void AnUncooledItemStopsAtItsMeltingPoint()
    {
        // 10 W into 0.385 J/K with no cooling: dT/dt = 26 K/s, so 1084.6 °C is passed near 41 s (energy balance m c dT = P dt).
        var samples = new List<HeatingSample>();
        HeatingIntegration run = HeatingIntegrator.Run(Uncooled(), (_, _) => 10.0, 0, 8 * 3600, 20, samples, CancellationToken.None, stopAboveCelsius: 1084.6);
        Assert.NotNull(run.StoppedAboveLimitSeconds);
        Within.Relative((1084.6 - 20) * 0.385 / 10, run.StoppedAboveLimitSeconds!.Value, 0.01, "time to melting");
        Assert.True(run.FinalCelsius > 1084.6);
        Assert.False(run.BudgetExceeded);
    }

    [Validates("heating by a decaying power with linear cooling, P0 tau tc / (C (tc - tau)) (e^(-t/tc) - e^(-t/tau))", "closed form of the linear lumped equation", "0.01 K")]
    [Fact]
    public void ADecayingPowerIsFollowedToItsClosedFormByTheErrorControl()
    {
        // C dT/dt = P0 e^(-t/tau) - G (T - Ta): T - Ta = P0 / C (e^(-t/tc) - e^(-t/tau)) / (1/tau - 1/tc), tc = C / G.
        // The power falls a hundredfold in the first 5 s, far faster than the 0.5 K cap alone would notice.
        double c = 10, g = 0.1, p0 = 60, tau = 1, tc = c / g;
        var model = new LumpedThermalModel(c, 1, new ThermalEnvironment(20, g, 0));
        var samples = new List<HeatingSample>();
        HeatingIntegrator.Run(model, (t, _) => p0 * System.Math.Exp(-t / tau), 0, 300, 20, samples, CancellationToken.None);
        double Exact(double t) => p0 / c * (System.Math.Exp(-t / tc) - System.Math.Exp(-t / tau)) / ((1 / tau) - (1 / tc));
        // Every sample within the step tolerance, 0.01 K, of the closed form (a peak of 4.8 K near 1.6 s).
        foreach (HeatingSample x in samples)
        {
            Assert.True(System.Math.Abs(x.TemperatureCelsius - 20 - Exact(x.TimeSeconds)) <= 0.01, "at " + x.TimeSeconds + " s: " + (x.TemperatureCelsius - 20) + " K against " + Exact(x.TimeSeconds) + " K");
        }

        Assert.InRange(samples.Count, 10, 2000);
    }

    [Fact]
    public void ARunThatNeedsMoreStepsThanItsBudgetSaysSo()
    {
        var samples = new List<HeatingSample>();
        HeatingIntegration run = HeatingIntegrator.Run(Uncooled(), (_, _) => 10.0, 0, 8 * 3600, 20, samples, CancellationToken.None, maxSteps: 50);
        Assert.True(run.BudgetExceeded);
        Assert.True(run.Steps <= 51);
    }

    [Fact]
    public void ARunWhoseTimeStopsAdvancingEndsAndSaysSo()
    {
        // Defect: at a late start t + h == t, and the integrator looped without end.
        var samples = new List<HeatingSample>();
        HeatingIntegration run = HeatingIntegrator.Run(Uncooled(), (_, _) => 0.0, 1e17, 2e17, 20, samples, CancellationToken.None, maxStepSeconds: 1);
        Assert.True(run.BudgetExceeded);
    }

    [Fact]
    public void ARunEndsExactlyAtItsEndWithNoSliverStepBeforeIt()
    {
        // t + (t1 - t) can fall an ulp short of t1 when t is below half of t1 (for t = 0.11898231354594568 and t1 =
        // 1.3619209154143326 it gives 1.3619209154143324): the run then took a sliver step and recorded two samples an
        // ulp apart. Runs whose one step covers all of such a span end with one sample at t1 exactly.
        Gen.Select(Gen.Double[0, 0.5], Gen.Double[0.6, 2]).Sample((t0, t1) =>
        {
            var samples = new List<HeatingSample>();
            HeatingIntegrator.Run(Uncooled(), (_, _) => 1e-3, t0, t1, 20, samples, CancellationToken.None, maxStepSeconds: t1 - t0);
            Assert.Equal(t1, samples[samples.Count - 1].TimeSeconds);
            Assert.DoesNotContain(samples, x => x.TimeSeconds < t1 && x.TimeSeconds > t1 - (1e-12 * t1));
        }, seed: "0HeatEnd7Q2x", iter: 3000);
    }
}
