using System.Collections.Generic;
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
}
