using System;
using System.Collections.Generic;
using System.Threading;

namespace InductionHazard.Thermal;

/// <summary>
/// Integrates the lumped heating equation for a heating power that depends on time and temperature (for
/// example I^2 R(T)), by exact steps of <see cref="LumpedThermalModel.Advance(double, double, double)"/> with the power from an embedded
/// Runge-Kutta pair in exponential form: Euler's power at the step's start (first order) and Heun's mean of the
/// powers at its ends (second order). Their difference is the step's error estimate: a step whose estimate
/// exceeds <see cref="ErrorToleranceKelvin"/>, or whose temperature changes by more than a set amount, is taken
/// again shorter, and the next step grows or shrinks with the estimate.
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

    /// <summary>The largest error estimate accepted in one step, K (the first- and second-order temperatures' difference).</summary>
    public const double ErrorToleranceKelvin = 0.01;

    /// <summary>
    /// The longest step by default, s: an hour. A longer step is taken only where the temperature is steady (the
    /// error control and the largest temperature change bound it elsewhere), and the contact checks read the history
    /// exactly as it is sampled, so this bounds only how coarse a chart of a long plateau may look.
    /// </summary>
    public const double DefaultLongestStepSeconds = 3600;

    /// <summary>The shortest first step, s (or the cap, if shorter): a run's first step is a thousandth of it, at least this.</summary>
    private const double FirstStepFloorSeconds = 6;

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
        // not by the cooling time constant; an hour at most keeps a chart of a long plateau readable.
        double cap = maxStepSeconds ?? DefaultLongestStepSeconds;
        if (!(cap > 0) || double.IsInfinity(cap))
        {
            cap = Math.Max((t1 - t0) / 1000, 1e-9);
        }

        double dt = Math.Min(cap, Math.Max((t1 - t0) / 1000, Math.Min(cap, FirstStepFloorSeconds)));
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
            double g = model.Conductance(temperature);
            var step = new LumpedThermalModel.Step(model, h, g);
            double predicted = step.Advance(temperature, p0);
            double p1 = power(t + h, predicted);
            double mean = 0.5 * (p0 + p1);
            double next = step.Advance(temperature, mean);
            double error = Math.Abs(next - predicted);
            bool shortest = !(h > 1e-9 * Math.Max(1, t1 - t0));
            if (!shortest && (Math.Abs(next - temperature) > maxStepKelvin || error > ErrorToleranceKelvin))
            {
                dt = h * Math.Max(0.2, Math.Min(0.5, error > ErrorToleranceKelvin ? 0.9 * Math.Sqrt(ErrorToleranceKelvin / error) : 0.5));
                continue;
            }

            // A step to the end lands on it exactly (t + (t1 - t) can fall an ulp short and leave a sliver step).
            t = h == t1 - t ? t1 : t + h;
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

            // Grow by at most half, less when the error estimate is near its tolerance (the pair's estimate goes as h^2).
            double growth = error > 0 ? Math.Min(1.5, 0.9 * Math.Sqrt(ErrorToleranceKelvin / error)) : 1.5;
            dt = Math.Min(cap, h * Math.Max(1.0, growth));
        }

        return new HeatingIntegration(temperature, energy, null, false, steps);
    }
}
