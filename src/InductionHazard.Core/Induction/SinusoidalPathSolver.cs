using System;
using System.Collections.Generic;
using System.Numerics;
using System.Threading;
using InductionHazard.Thermal;

namespace InductionHazard.Induction;

/// <summary>
/// A closed loop or path set in a sinusoidal field, in periodic steady state: the response at each temperature
/// (the cycle-averaged power and the total current phasor, from phasors) and lumped heating with that power. Two time
/// scales: the cycle is solved exactly by phasors, the heating over minutes by <see cref="HeatingIntegrator"/>.
/// </summary>
public sealed class SinusoidalPathSolver
{
    private const int SamplesPerPeriod = 128;

    private readonly Func<double, SteadyState> _responseAt;
    private readonly LumpedThermalModel _thermal;

    /// <summary>Creates the solver.</summary>
    /// <param name="responseAtCelsius">The steady response at a temperature: cycle-averaged power and total current phasor.</param>
    /// <param name="thermal">The lumped heating of the item.</param>
    public SinusoidalPathSolver(Func<double, SteadyState> responseAtCelsius, LumpedThermalModel thermal)
    {
        _responseAt = responseAtCelsius;
        _thermal = thermal;
    }

    /// <summary>
    /// The steady response of one loop of impedance Z(T) to an emf phasor E: I = E / Z, P = |E|^2 Re Z / (2 |Z|^2).
    /// </summary>
    public static Func<double, SteadyState> Loop(Func<double, Complex> impedanceAtCelsius, Complex emfPhasor)
    {
        // Squared magnitudes as sums of squares, and E / Z as E conj(Z) / |Z|^2 with one division shared with the power:
        // the library's magnitude and quotient guard against overflow that volts and ohms never reach.
        double e2 = (emfPhasor.Real * emfPhasor.Real) + (emfPhasor.Imaginary * emfPhasor.Imaginary);
        return celsius =>
        {
            Complex z = impedanceAtCelsius(celsius);
            double inverse = 1 / ((z.Real * z.Real) + (z.Imaginary * z.Imaginary));
            var current = new Complex(
                ((emfPhasor.Real * z.Real) + (emfPhasor.Imaginary * z.Imaginary)) * inverse,
                ((emfPhasor.Imaginary * z.Real) - (emfPhasor.Real * z.Imaginary)) * inverse);
            return new SteadyState(0.5 * e2 * z.Real * inverse, current);
        };
    }

    /// <summary>Runs the heating while the field is on and the cooling after it, to the end of the exposure.</summary>
    /// <param name="emfPhasor">The emf phasor E (peak) around the outline, e(t) = Im(E e^(j omega (t - t0))), V.</param>
    /// <param name="frequencyHertz">The drive frequency.</param>
    /// <param name="fieldOn">When the field starts, s.</param>
    /// <param name="fieldOff">When the field stops, s (no later than <paramref name="exposureEnd"/>).</param>
    /// <param name="exposureEnd">When the assessment ends, s.</param>
    /// <param name="celsius0">The item's temperature when the field starts, °C.</param>
    /// <param name="cancellation">Stops the run.</param>
    /// <param name="stopAboveCelsius">The melting point: the run stops when the item passes it (a molten loop opens).</param>
    public SinusoidalRun Run(Complex emfPhasor, double frequencyHertz, double fieldOn, double fieldOff, double exposureEnd, double celsius0, CancellationToken cancellation, double stopAboveCelsius = double.PositiveInfinity)
    {
        // The largest squared current magnitude: the root is taken once at the end (it is monotone, so the same peak).
        double peakSquared = 0;

        // The last temperature asked and its state: once the item settles, a step's start is the last step's prediction
        // and the same temperature is asked again (the state depends on the temperature alone).
        double askedCelsius = double.NaN;
        SteadyState asked = default;
        double Power(double t, double celsius)
        {
            if (t > fieldOff)
            {
                return 0;
            }

            if (!(celsius == askedCelsius))
            {
                (asked, askedCelsius) = (_responseAt(celsius), celsius);
            }

            SteadyState state = asked;
            Complex i = state.CurrentPhasor;
            peakSquared = Math.Max(peakSquared, (i.Real * i.Real) + (i.Imaginary * i.Imaginary));
            return state.PowerWatts;
        }

        // Room for a typical history from the start (a worn ring's 8 hours take some 30 samples), rather than growing from four.
        var heating = new List<HeatingSample>(32) { new(fieldOn, celsius0, Power(fieldOn, celsius0)) };
        HeatingIntegration on = HeatingIntegrator.Run(_thermal, Power, fieldOn, fieldOff, celsius0, heating, cancellation, stopAboveCelsius: stopAboveCelsius);
        HeatingIntegration last = on;
        if (exposureEnd > fieldOff && on.StoppedAboveLimitSeconds is null && !on.BudgetExceeded)
        {
            last = HeatingIntegrator.Run(_thermal, (_, _) => 0.0, fieldOff, exposureEnd, on.FinalCelsius, heating, cancellation);
        }

        Complex current = _responseAt(celsius0).CurrentPhasor;
        return new SinusoidalRun
        {
            CurrentPhasor = current,
            Impedance = emfPhasor / current,
            PeakCurrentAmperes = Math.Max(Math.Sqrt(peakSquared), current.Magnitude),
            Circuit = new PeriodSamples(emfPhasor, current, frequencyHertz, fieldOn, celsius0, SamplesPerPeriod),
            Heating = heating,
            EnergyJoules = on.EnergyJoules,
            FinalCelsius = last.FinalCelsius,
            MeltedAtSeconds = on.StoppedAboveLimitSeconds,
            BudgetExceeded = on.BudgetExceeded || last.BudgetExceeded,
        };
    }
}
