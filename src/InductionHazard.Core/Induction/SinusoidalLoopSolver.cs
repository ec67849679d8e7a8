using System;
using System.Collections.Generic;
using System.Numerics;
using System.Threading;
using InductionHazard.Thermal;

namespace InductionHazard.Induction;

/// <summary>
/// A closed loop in a sinusoidal field, in periodic steady state: the phasor current I = E / Z(f, T) with the
/// loop's impedance including skin effect, and lumped heating with the cycle-averaged power
/// P(T) = |E|^2 Re Z(T) / (2 |Z(T)|^2). Two time scales: the cycle is solved exactly by phasors, the heating
/// over minutes by <see cref="HeatingIntegrator"/>.
/// </summary>
public sealed class SinusoidalLoopSolver
{
    private const int SamplesPerPeriod = 128;

    private readonly Func<double, Complex> _impedanceAt;
    private readonly LumpedThermalModel _thermal;

    /// <summary>Creates the solver.</summary>
    /// <param name="impedanceAtCelsius">The loop impedance at the drive frequency as a function of temperature, ohm.</param>
    /// <param name="thermal">The lumped heating of the loop.</param>
    public SinusoidalLoopSolver(Func<double, Complex> impedanceAtCelsius, LumpedThermalModel thermal)
    {
        _impedanceAt = impedanceAtCelsius;
        _thermal = thermal;
    }

    /// <summary>Runs the heating while the field is on and the cooling after it, to the end of the exposure.</summary>
    /// <param name="emfPhasor">The emf phasor E (peak), e(t) = Im(E e^(j omega (t - t0))), V.</param>
    /// <param name="frequencyHertz">The drive frequency.</param>
    /// <param name="fieldOn">When the field starts, s.</param>
    /// <param name="fieldOff">When the field stops, s (no later than <paramref name="exposureEnd"/>).</param>
    /// <param name="exposureEnd">When the assessment ends, s.</param>
    /// <param name="celsius0">The item's temperature when the field starts, °C.</param>
    /// <param name="cancellation">Stops the run.</param>
    /// <param name="stopAboveCelsius">The melting point: the run stops when the item passes it (a molten loop opens).</param>
    public SinusoidalRun Run(Complex emfPhasor, double frequencyHertz, double fieldOn, double fieldOff, double exposureEnd, double celsius0, CancellationToken cancellation, double stopAboveCelsius = double.PositiveInfinity)
    {
        double emfSquared = emfPhasor.Magnitude * emfPhasor.Magnitude;
        double peakCurrent = 0;
        double Power(double t, double celsius)
        {
            if (t > fieldOff)
            {
                return 0;
            }

            Complex z = _impedanceAt(celsius);
            double amplitude = emfPhasor.Magnitude / z.Magnitude;
            peakCurrent = Math.Max(peakCurrent, amplitude);
            return 0.5 * emfSquared * z.Real / (z.Magnitude * z.Magnitude);
        }

        var heating = new List<HeatingSample> { new(fieldOn, celsius0, Power(fieldOn, celsius0)) };
        HeatingIntegration on = HeatingIntegrator.Run(_thermal, Power, fieldOn, fieldOff, celsius0, heating, cancellation, stopAboveCelsius: stopAboveCelsius);
        HeatingIntegration last = on;
        if (exposureEnd > fieldOff && on.StoppedAboveLimitSeconds is null && !on.BudgetExceeded)
        {
            last = HeatingIntegrator.Run(_thermal, (_, _) => 0.0, fieldOff, exposureEnd, on.FinalCelsius, heating, cancellation);
        }

        Complex z0 = _impedanceAt(celsius0);
        Complex current = emfPhasor / z0;
        return new SinusoidalRun
        {
            CurrentPhasor = current,
            Impedance = z0,
            PeakCurrentAmperes = Math.Max(peakCurrent, current.Magnitude),
            Circuit = OnePeriod(emfPhasor, current, frequencyHertz, fieldOn, celsius0),
            Heating = heating,
            EnergyJoules = on.EnergyJoules,
            FinalCelsius = last.FinalCelsius,
            MeltedAtSeconds = on.StoppedAboveLimitSeconds,
            BudgetExceeded = on.BudgetExceeded || last.BudgetExceeded,
        };
    }

    private static CircuitSample[] OnePeriod(Complex emf, Complex current, double frequencyHertz, double t0, double celsius)
    {
        var samples = new CircuitSample[SamplesPerPeriod + 1];
        double omega = 2 * Math.PI * frequencyHertz;
        for (int k = 0; k <= SamplesPerPeriod; k++)
        {
            double t = k / (SamplesPerPeriod * frequencyHertz);
            Complex rotor = Complex.FromPolarCoordinates(1, omega * t);
            samples[k] = new CircuitSample(t0 + t, (emf * rotor).Imaginary, (current * rotor).Imaginary, celsius);
        }

        return samples;
    }
}
