using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using InductionHazard.Thermal;

namespace InductionHazard.Induction;

/// <summary>
/// The closed loop in time: L di/dt + R(T) i = e(t), coupled to lumped heating. Each step is the exact
/// exponential update (<see cref="RlStep"/>) for an emf linear over the step, which is exact for piecewise-linear
/// drives because steps land on every breakpoint. R(T) is taken at the mid-step temperature by a
/// predictor-corrector, and steps are halved until the temperature changes by no more than a set amount.
/// </summary>
public sealed class TransientLoopSolver
{
    private const double Growth = 1.25;
    private const int MaxRecordedSamples = 4000;

    private readonly double _inductance;
    private readonly Func<double, double> _resistanceAt;
    private readonly LumpedThermalModel _thermal;

    /// <summary>Creates the solver.</summary>
    /// <param name="inductanceHenries">The loop's self-inductance L.</param>
    /// <param name="resistanceAtCelsius">The loop's resistance at a temperature, R(T).</param>
    /// <param name="thermal">The lumped heating of the loop.</param>
    public TransientLoopSolver(double inductanceHenries, Func<double, double> resistanceAtCelsius, LumpedThermalModel thermal)
    {
        _inductance = inductanceHenries;
        _resistanceAt = resistanceAtCelsius;
        _thermal = thermal;
    }

    /// <summary>The largest temperature change in one step, K.</summary>
    public double MaxStepKelvin { get; init; } = HeatingIntegrator.DefaultMaxStepKelvin;

    /// <summary>The largest step, s (for drives that are not piecewise linear), while the drive is curved.</summary>
    public double MaxStepSeconds { get; init; } = double.PositiveInfinity;

    /// <summary>Until when <see cref="MaxStepSeconds"/> applies, s: after it the emf is piecewise linear (leaving, cooling).</summary>
    public double CurvedUntilSeconds { get; init; } = double.PositiveInfinity;

    /// <summary>The most steps before the run gives up and says so.</summary>
    public int MaxSteps { get; init; } = HeatingIntegrator.DefaultMaxSteps;

    /// <summary>The run stops at the first step that ends above this temperature, °C: the melting point, where a molten loop opens.</summary>
    public double StopAboveCelsius { get; init; } = double.PositiveInfinity;

    /// <summary>Runs from tStart to tEnd with the current zero at the start.</summary>
    /// <param name="emf">The emf e(t) around the loop, V.</param>
    /// <param name="breakpoints">Times where the emf's slope may jump; steps land on each.</param>
    /// <param name="tStart">Start time, s.</param>
    /// <param name="tEnd">End time, s.</param>
    /// <param name="celsius0">The item's temperature at the start, °C.</param>
    /// <param name="cancellation">Stops the run.</param>
    /// <remarks>The run stops early, and says so, when the step budget runs out, when time stops advancing, or when the item passes <see cref="StopAboveCelsius"/>.</remarks>
    public TransientRun Run(Func<double, double> emf, IEnumerable<double> breakpoints, double tStart, double tEnd, double celsius0, CancellationToken cancellation)
    {
        double[] edges = breakpoints.Where(b => b > tStart && b < tEnd).Append(tEnd).Distinct().OrderBy(b => b).ToArray();
        var circuit = new List<CircuitSample> { new(tStart, emf(tStart), 0, celsius0) };
        var heating = new List<HeatingSample> { new(tStart, celsius0, 0) };
        double recordSpacing = (tEnd - tStart) / MaxRecordedSamples;
        double t = tStart, i = 0, temperature = celsius0, energy = 0;
        (double current, double at) peak = (0, tStart);
        int steps = 0;
        bool budgetExceeded = false;
        double? melted = null;

        foreach (double edge in edges)
        {
            double h = FreshStep(temperature, edge - t, t);
            while (t < edge)
            {
                if (++steps > MaxSteps)
                {
                    budgetExceeded = true;
                    break;
                }

                if ((steps & 1023) == 0)
                {
                    cancellation.ThrowIfCancellationRequested();
                }

                h = Math.Min(h, edge - t);
                if (edge - t - h < 1e-12 * Math.Max(1, Math.Abs(edge)))
                {
                    h = edge - t;
                }

                if (!(t + h > t))
                {
                    // Time no longer advances at this magnitude: stop and say so rather than loop.
                    budgetExceeded = true;
                    break;
                }

                // The emf over the step as a line through its values at h/4 and 3h/4: exact for linear e.
                double ea = emf(t + (h / 4)), eb = emf(t + (3 * h / 4));
                double slope = (eb - ea) / (h / 2);
                double e0 = ea - (slope * h / 4);

                Step trial = TakeStep(i, temperature, e0, slope, h);
                if (Math.Abs(trial.Celsius - temperature) > MaxStepKelvin && h > 1e-15 * Math.Max(1, Math.Abs(t)))
                {
                    h /= 2;
                    continue;
                }

                (double stepPeak, double stepPeakAt) = RlStep.Peak(_inductance, trial.Resistance, i, e0, slope, h);
                if (Math.Abs(stepPeak) > Math.Abs(peak.current))
                {
                    peak = (stepPeak, t + stepPeakAt);
                }

                t += h;
                i = trial.Current;
                energy += trial.Energy;
                temperature = trial.Celsius;
                bool melting = temperature > StopAboveCelsius;
                if (melting || t >= edge || t - circuit[circuit.Count - 1].TimeSeconds >= recordSpacing || Changed(circuit[circuit.Count - 1], i, temperature))
                {
                    circuit.Add(new CircuitSample(t, emf(Math.Min(t, edge - (1e-9 * h))), i, temperature));
                    heating.Add(new HeatingSample(t, temperature, trial.Energy / h));
                }

                if (!IsFinite(i) || !IsFinite(temperature))
                {
                    break;
                }

                if (melting)
                {
                    melted = t;
                    break;
                }

                h = Math.Min(h * Growth, MaxStep(temperature, t));
            }

            if (budgetExceeded || melted is not null || !IsFinite(i) || !IsFinite(temperature))
            {
                break;
            }
        }

        return new TransientRun
        {
            Circuit = circuit,
            Heating = heating,
            PeakCurrentAmperes = peak.current,
            PeakCurrentSeconds = peak.at,
            EnergyJoules = energy,
            FinalCelsius = temperature,
            Steps = steps,
            BudgetExceeded = budgetExceeded,
            MeltedAtSeconds = melted,
        };
    }

    private static bool IsFinite(double value) => Quantities.Finite.Is(value);

    private static bool Changed(CircuitSample last, double current, double temperature) =>
        Math.Abs(temperature - last.TemperatureCelsius) > 0.5
        || Math.Abs(current - last.CurrentAmperes) > 0.02 * Math.Max(Math.Abs(current), Math.Abs(last.CurrentAmperes));

    /// <summary>The first step of a segment: an eighth of L/R, so the exponential is resolved from its start.</summary>
    private double FreshStep(double celsius, double segment, double t) =>
        Math.Min(Math.Min(_inductance / _resistanceAt(celsius) / 8, segment), MaxStep(celsius, t));

    private double MaxStep(double celsius, double t) =>
        Math.Min(t < CurvedUntilSeconds ? MaxStepSeconds : double.PositiveInfinity, Math.Max(_thermal.TimeConstantSeconds(celsius) / 10, 1e-6));

    /// <summary>One step with R at the mid-step temperature (predictor-corrector).</summary>
    private Step TakeStep(double i0, double celsius, double e0, double slope, double h)
    {
        Step predicted = StepAt(_resistanceAt(celsius), i0, celsius, e0, slope, h);
        return StepAt(_resistanceAt(0.5 * (celsius + predicted.Celsius)), i0, celsius, e0, slope, h);
    }

    private Step StepAt(double resistance, double i0, double celsius, double e0, double slope, double h)
    {
        double current = RlStep.Current(_inductance, resistance, i0, e0, slope, h);
        double energy = RlStep.Energy(_inductance, resistance, i0, e0, slope, h);
        double next = _thermal.Advance(celsius, energy / h, h);
        return new Step(current, energy, next, resistance);
    }

    private readonly struct Step
    {
        public Step(double current, double energy, double celsius, double resistance)
        {
            Current = current;
            Energy = energy;
            Celsius = celsius;
            Resistance = resistance;
        }

        public double Current { get; }

        public double Energy { get; }

        public double Celsius { get; }

        public double Resistance { get; }
    }
}
