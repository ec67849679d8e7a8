using System;
using System.Collections.Generic;
using System.Threading;

namespace InductionHazard.Thermal;

/// <summary>
/// Integrates the lumped heating equation for a heating power that depends on time and temperature (for
/// example I^2 R(T)), by exact steps of <see cref="LumpedThermalModel.Advance"/> with a predictor-corrector on
/// the power (second order) and steps halved until the temperature changes by no more than a set amount.
/// </summary>
public static class HeatingIntegrator
{
    /// <summary>The default largest temperature change in one step, K.</summary>
    public const double DefaultMaxStepKelvin = 0.5;

    /// <summary>Integrates from t0 to t1 and appends samples; returns the final temperature and the energy delivered.</summary>
    /// <param name="model">The lumped model.</param>
    /// <param name="power">Heating power P(t, T), W.</param>
    /// <param name="t0">Start time, s.</param>
    /// <param name="t1">End time, s.</param>
    /// <param name="celsius0">Temperature at t0, °C.</param>
    /// <param name="samples">Receives a sample at each accepted step.</param>
    /// <param name="cancellation">Stops the run.</param>
    /// <param name="maxStepKelvin">The largest temperature change in one step, K.</param>
    /// <param name="maxStepSeconds">The largest step, s (default: a tenth of the cooling time constant).</param>
    public static (double FinalCelsius, double EnergyJoules) Run(
        LumpedThermalModel model,
        Func<double, double, double> power,
        double t0,
        double t1,
        double celsius0,
        ICollection<HeatingSample> samples,
        CancellationToken cancellation,
        double maxStepKelvin = DefaultMaxStepKelvin,
        double? maxStepSeconds = null)
    {
        double t = t0;
        double temperature = celsius0;
        double energy = 0;
        double cap = maxStepSeconds ?? Math.Min(model.TimeConstantSeconds(celsius0) / 10, 600);
        if (!(cap > 0) || double.IsInfinity(cap))
        {
            cap = Math.Max((t1 - t0) / 1000, 1e-9);
        }

        double dt = Math.Min(cap, Math.Max((t1 - t0) / 1000, cap / 100));
        int steps = 0;
        while (t < t1)
        {
            if ((++steps & 255) == 0)
            {
                cancellation.ThrowIfCancellationRequested();
            }

            double h = Math.Min(dt, t1 - t);
            double p0 = power(t, temperature);
            double predicted = model.Advance(temperature, p0, h);
            double p1 = power(t + h, predicted);
            double mean = 0.5 * (p0 + p1);
            double next = model.Advance(temperature, mean, h);
            if (Math.Abs(next - temperature) > maxStepKelvin && h > 1e-9 * Math.Max(1, t1 - t0))
            {
                dt = h / 2;
                continue;
            }

            t += h;
            energy += mean * h;
            temperature = next;
            samples.Add(new HeatingSample(t, temperature, p1));
            if (double.IsNaN(temperature) || double.IsInfinity(temperature))
            {
                break;
            }

            dt = Math.Min(cap, h * 1.5);
        }

        return (temperature, energy);
    }
}
