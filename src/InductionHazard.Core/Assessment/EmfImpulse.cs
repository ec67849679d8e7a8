using System;
using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// A transient gap emf taken as one impulse: its width, the integrals of |e| dt (the charge it drives through a
/// resistance R is this over R) and of e^2 dt (the energy it delivers to R is this over R) within the impulse and
/// over the whole exposure, and the largest emf outside the impulse.
/// </summary>
/// <param name="VoltSeconds">The integral of |e| dt within the impulse, V s.</param>
/// <param name="VoltSquaredSeconds">The integral of e^2 dt within the impulse, V^2 s.</param>
/// <param name="WidthSeconds">From the first to the last instant at which |e| reaches <see cref="WidthFraction"/> of its peak, s.</param>
/// <param name="TotalVoltSeconds">The integral of |e| dt over the whole exposure, V s.</param>
/// <param name="TotalVoltSquaredSeconds">The integral of e^2 dt over the whole exposure, V^2 s.</param>
/// <param name="OutsidePeakVolts">The largest |e| outside the impulse (a tail, or the emf of carrying the item out), V.</param>
public sealed record EmfImpulse(double VoltSeconds, double VoltSquaredSeconds, double WidthSeconds, double TotalVoltSeconds, double TotalVoltSquaredSeconds, double OutsidePeakVolts)
{
    /// <summary>
    /// The fraction of the peak that bounds the width: 5 %, three time constants of an exponential decay (the usual
    /// duration of a capacitor discharge; common practice).
    /// </summary>
    public const double WidthFraction = 0.05;

    /// <summary>An impulse that could not be measured: every value NaN.</summary>
    public static EmfImpulse Unknown { get; } = new(double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN);

    /// <summary>
    /// Measures the impulse over sampled times. Over each interval the integrals take the larger of the flux-change
    /// bound (|dPhi| and dPhi^2/dt, exact where the emf is constant) and the midpoint rule, so that a curved emf is
    /// not under-counted; an interval's level is the largest of its mean and its end and middle values.
    /// </summary>
    /// <param name="times">The sample times, sorted, resolving the drive.</param>
    /// <param name="emf">The emf at a time, V.</param>
    /// <param name="flux">The flux linked at a time, Wb; its change is minus the emf's integral.</param>
    /// <param name="peak">The emf's peak magnitude, V.</param>
    public static EmfImpulse Measure(IReadOnlyList<double> times, Func<double, double> emf, Func<double, double> flux, double peak)
    {
        int n = Math.Max(0, times.Count - 1);
        var volts = new double[n];
        var squared = new double[n];
        var level = new double[n];
        int first = -1, last = -1;
        for (int i = 0; i < n; i++)
        {
            double a = times[i], b = times[i + 1], dt = b - a;
            if (!(dt > 0))
            {
                continue;
            }

            double change = Math.Abs(flux(b) - flux(a));
            double middle = Math.Abs(emf(0.5 * (a + b)));
            volts[i] = Math.Max(change, middle * dt);
            squared[i] = Math.Max(change * change / dt, middle * middle * dt);
            level[i] = Math.Max(Math.Max(change / dt, middle), Math.Max(Math.Abs(emf(a)), Math.Abs(emf(b))));
            if (level[i] >= WidthFraction * peak && level[i] > 0)
            {
                first = first < 0 ? i : first;
                last = i;
            }
        }

        double inside = 0, insideSquared = 0, total = 0, totalSquared = 0, outside = 0;
        for (int i = 0; i < n; i++)
        {
            total += volts[i];
            totalSquared += squared[i];
            if (i >= first && i <= last)
            {
                inside += volts[i];
                insideSquared += squared[i];
            }
            else
            {
                outside = Math.Max(outside, level[i]);
            }
        }

        double width = first < 0 ? 0 : times[last + 1] - times[first];
        return Finite.All(inside, insideSquared, total, totalSquared, outside, width)
            ? new EmfImpulse(inside, insideSquared, width, total, totalSquared, outside)
            : Unknown;
    }

    /// <summary>"integral |e| dt 0.314 mV·s over 1 µs (0.628 mV·s over the exposure)".</summary>
    public override string ToString() =>
        "integral |e| dt " + SiFormat.Format(VoltSeconds, "V·s") + " over " + SiFormat.Format(WidthSeconds, "s") + " (" + SiFormat.Format(TotalVoltSeconds, "V·s") + " over the exposure)";
}
