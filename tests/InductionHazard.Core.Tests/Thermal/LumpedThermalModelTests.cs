using System;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class LumpedThermalModelTests
{
    [Validates("exponential cooling", "Newton's law of cooling", "1e-12")]
    [Fact]
    public void CoolingFollowsNewtonsLaw()
    {
        // Newton's law of cooling (linear, no radiation): T(t) = Ta + (T0 - Ta) exp(-t h A / (m c)).
        var model = new LumpedThermalModel(0.5, 1e-3, new ThermalEnvironment(20, 8, 0));
        double tau = 0.5 / (8 * 1e-3), t = 0, temperature = 90;
        while (t < 2 * tau)
        {
            temperature = model.Advance(temperature, 0, 7.3);
            t += 7.3;
        }

        Within.Relative(20 + (70 * Math.Exp(-t / tau)), temperature, 1e-12, "temperature after cooling");
    }

    [Fact]
    public void WithoutCoolingEnergyGoesIntoHeatCapacity()
    {
        var model = new LumpedThermalModel(0.5, 1e-3, new ThermalEnvironment(20, 0, 0));
        Within.Relative(20 + (3.0 * 10 / 0.5), model.Advance(20, 3.0, 10), 1e-12, "dT = P t / (m c)");
    }

    [Validates("eps sigma (T^4 - Ta^4)", "Stefan-Boltzmann law (CODATA sigma)", "1e-12")]
    [Fact]
    public void RadiationAddsTheStefanBoltzmannLoss()
    {
        // Net radiation of a grey body to surroundings: eps sigma A (T^4 - Ta^4) (Stefan-Boltzmann law).
        var model = new LumpedThermalModel(1, 1, new ThermalEnvironment(20, 0, 0.8));
        double t = 500 + 273.15, ta = 20 + 273.15;
        double expected = 0.8 * 5.670374419e-8 * ((t * t * t * t) - (ta * ta * ta * ta));
        Within.Relative(expected, model.TransferCoefficient(500) * (500 - 20), 1e-12, "radiated power per area");
    }

    [Fact]
    public void TheBiotNumberIsHLcOverK()
    {
        Within.Relative(10 * 0.001 / 400, LumpedThermalModel.BiotNumber(10, 2e-6, 2e-3, 400), 1e-12, "Bi");
    }
}
