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

    /// <summary>
    /// The default step budget. A run that heats to melting in 0.5 K steps takes a few thousand; 8 h of cooling a
    /// few hundred. A run that needs more is stopped and says so, rather than running on.
    /// </summary>
    public const int DefaultMaxSteps = 200_000;

    /// <summary>The longest step by default, s: 10 minutes.</summary>
    public const double DefaultLongestStepSeconds = 600;

    /// <summary>
    /// Integrates from t0 to t1 and appends samples. Stops early, and says so, when the temperature passes
    /// <paramref name="stopAboveCelsius"/> (the melting point: a molten loop opens and the model ends there), when the
    /// step budget runs out, or when time stops advancing.
    /// </summary>
    /// <param name="model">The lumped model.</param>
    /// <param name="power">Heating power P(t, T), W.</param>
    /// <param name="t0">Start time, s.</param>
    /// <param name="t1">End time, s.</param>
    /// <param name="celsius0">Temperature at t0, °C.</param>
    /// <param name="samples">Receives a sample at each accepted step.</param>
    /// <param name="cancellation">Stops the run.</param>
    /// <param name="maxStepKelvin">The largest temperature change in one step, K.</param>
    /// <param name="maxStepSeconds">The largest step, s (default: <see cref="DefaultLongestStepSeconds"/>).</param>
    /// <param name="stopAboveCelsius">The run stops at the first step that ends above this temperature, °C.</param>
    /// <param name="maxSteps">The step budget.</param>
    public static HeatingIntegration Run(
        LumpedThermalModel model,
        Func<double, double, double> power,
        double t0,
        double t1,
        double celsius0,
        ICollection<HeatingSample> samples,
        CancellationToken cancellation,
        double maxStepKelvin = DefaultMaxStepKelvin,
        double? maxStepSeconds = null,
        double stopAboveCelsius = double.PositiveInfinity,
        int maxSteps = DefaultMaxSteps)
    {
        double t = t0;
        double temperature = celsius0;
        double energy = 0;
        // Each step is the exact solution of the linearised equation with the power at its mean: accurate however
        // long while the temperature moves little, so the step is bounded by the temperature change (maxStepKelvin),
        // not by the cooling time constant; 10 min at most keeps the history readable for the contact checks.
        double cap = maxStepSeconds ?? DefaultLongestStepSeconds;
        if (!(cap > 0) || double.IsInfinity(cap))
        {
            cap = Math.Max((t1 - t0) / 1000, 1e-9);
        }

        double dt = Math.Min(cap, Math.Max((t1 - t0) / 1000, cap / 100));
        int steps = 0;
        while (t < t1)
        {
            if (++steps > maxSteps)
            {
                return new HeatingIntegration(temperature, energy, null, true, steps);
            }

            if ((steps & 255) == 0)
            {
                cancellation.ThrowIfCancellationRequested();
            }

            double h = Math.Min(dt, t1 - t);
            if (!(t + h > t))
            {
                // Time no longer advances at this magnitude: stop and say so rather than loop.
                return new HeatingIntegration(temperature, energy, null, true, steps);
            }

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

            if (temperature > stopAboveCelsius)
            {
                return new HeatingIntegration(temperature, energy, t, false, steps);
            }

            dt = Math.Min(cap, h * 1.5);
        }

        return new HeatingIntegration(temperature, energy, null, false, steps);
    }
}
