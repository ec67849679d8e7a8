using System;
using System.Collections.Generic;
using MathNet.Numerics;

namespace InductionHazard.Thermal;

/// <summary>
/// Cumulative equivalent minutes at 43 °C: CEM43 = sum R^(43 - T) dt (minutes), R = 0.5 at or above 43 °C and
/// 0.25 below (Sapareto and Dewey, Int J Radiat Oncol Biol Phys 10:787, 1984).
/// </summary>
public static class ThermalDose
{
    /// <summary>The breakpoint temperature of the dose model, °C.</summary>
    public const double BreakpointCelsius = 43.0;

    /// <summary>R at or above the breakpoint.</summary>
    public const double RateAbove = 0.5;

    /// <summary>R below the breakpoint.</summary>
    public const double RateBelow = 0.25;

    /// <summary>
    /// The dose of a temperature history taken as linear between samples, minutes. Each piece is integrated
    /// exactly (split where it crosses 43 °C), so the result does not depend on how finely a plateau is sampled.
    /// </summary>
    public static double Cem43Minutes(IReadOnlyList<HeatingSample> history)
    {
        double minutes = 0;
        for (int k = 1; k < history.Count; k++)
        {
            minutes += Segment(history[k - 1].TimeSeconds, history[k - 1].TemperatureCelsius, history[k].TimeSeconds, history[k].TemperatureCelsius);
        }

        return minutes;
    }

    /// <summary>
    /// The highest temperature of the range the dose relation was fitted on, °C: about 40-57 °C (from memory;
    /// Sapareto and Dewey 1984 and the data behind it). Above it the relation is extrapolation, and the contact
    /// temperature criterion governs instead.
    /// </summary>
    public const double FittedUpToCelsius = 57.0;

    private static readonly double LogRateAbove = Math.Log(RateAbove);

    private static readonly double LogRateBelow = Math.Log(RateBelow);

    /// <summary>
    /// The dose the heating adds over its baseline: CEM43 of the history less CEM43 of the item held at its
    /// starting temperature for the same time, minutes.
    /// </summary>
    public static double AddedCem43Minutes(IReadOnlyList<HeatingSample> history, double startCelsius) =>
        Scaled(history, startCelsius, 1) - Scaled(history, startCelsius, 0);

    /// <summary>
    /// The margin on the rise for a dose limit: the factor k on the temperature rise the field adds (T' = start +
    /// k (T - start)) at which the added dose reaches the limit, by bisection on the exactly integrated dose
    /// (which grows with k). Infinity when nothing is added. Null when that factor would take the history above
    /// <see cref="FittedUpToCelsius"/>, where the relation does not hold: the dose cannot then be the criterion.
    /// </summary>
    public static double? RiseMargin(IReadOnlyList<HeatingSample> history, double startCelsius, double limitMinutes)
    {
        double peak = double.NegativeInfinity;
        foreach (HeatingSample s in history)
        {
            peak = Math.Max(peak, s.TemperatureCelsius);
        }

        double rise = peak - startCelsius;
        if (!(rise > 0))
        {
            return double.PositiveInfinity;
        }

        double baseline = Scaled(history, startCelsius, 0);
        double Added(double k)
        {
            // A scaled history far beyond the range overflows the exponential: that dose is beyond any limit.
            double added = Scaled(history, startCelsius, k) - baseline;
            return double.IsNaN(added) ? double.PositiveInfinity : added;
        }

        double inRange = (FittedUpToCelsius - startCelsius) / rise;
        if (!(inRange > 0))
        {
            return null;
        }

        double addedInRange = Added(inRange);
        if (addedInRange < limitMinutes)
        {
            return null;
        }

        // The added dose grows with k from 0 at k = 0, close to exponentially (the CEM43 rate is 2 per kelvin above
        // 43 degC): regula falsi with the Illinois step on the log of added dose over the limit, nearly linear in k, in
        // the bracket [0, inRange]; a bisection step wherever an end is not finite (a scaled history that overflows, or
        // no dose at k = 0). Ten or so passes over the history instead of bisection's forty.
        double G(double k)
        {
            double added = Added(k);
            return added > 0 ? Math.Log(added / limitMinutes) : double.NegativeInfinity;
        }

        double low = 0, high = inRange, gLow = double.NegativeInfinity, gHigh = addedInRange > 0 ? Math.Log(addedInRange / limitMinutes) : double.NegativeInfinity;
        int side = 0;
        for (int i = 0; i < 200 && high - low > 1e-12 * high; i++)
        {
            double x = 0.5 * (low + high);
            if (!double.IsInfinity(gLow) && !double.IsInfinity(gHigh) && gHigh > gLow)
            {
                double secant = low - (gLow * (high - low) / (gHigh - gLow));
                if (secant > low && secant < high)
                {
                    x = secant;
                }
            }

            double gx = G(x);
            if (Math.Abs(gx) < 1e-13)
            {
                // The dose at x is the limit to 1e-13 relative: x is the root to about that, over the log's slope.
                return x;
            }

            if (gx < 0)
            {
                (low, gLow) = (x, gx);
                gHigh = side == -1 && !double.IsInfinity(gHigh) ? 0.5 * gHigh : gHigh;
                side = -1;
            }
            else
            {
                (high, gHigh) = (x, gx);
                gLow = side == 1 && !double.IsInfinity(gLow) ? 0.5 * gLow : gLow;
                side = 1;
            }
        }

        return 0.5 * (low + high);
    }

    /// <summary>The dose of the history with its rise over the start scaled by k, minutes.</summary>
    /// <remarks>
    /// Each piece integrates exactly as <see cref="Segment"/> does, written as the logarithmic mean of the weights
    /// R^(43 - T) at its ends, (w1 - w0) / ln(w1 / w0) times its length, so that each sample's weight is one
    /// exponential shared by the two pieces beside it; a piece whose weights differ by less than 0.1 % takes the
    /// series of e^x - 1 instead (no cancellation). The root search for the margin calls this a dozen times.
    /// </remarks>
    private static double Scaled(IReadOnlyList<HeatingSample> history, double startCelsius, double k)
    {
        if (k == 0)
        {
            // Held at the start throughout: one weight over the whole span.
            double seconds = 0;
            for (int i = 1; i < history.Count; i++)
            {
                seconds += Math.Max(0, history[i].TimeSeconds - history[i - 1].TimeSeconds);
            }

            return Weight(startCelsius) * seconds / 60.0;
        }

        double minutes = 0;
        HeatingSample a = history[0];
        double ca = startCelsius + (k * (a.TemperatureCelsius - startCelsius));
        double wa = Weight(ca);
        for (int i = 1; i < history.Count; i++)
        {
            HeatingSample b = history[i];
            double cb = startCelsius + (k * (b.TemperatureCelsius - startCelsius));
            double wb = Weight(cb);
            double seconds = b.TimeSeconds - a.TimeSeconds;
            if (seconds > 0)
            {
                if ((ca - BreakpointCelsius) * (cb - BreakpointCelsius) < 0)
                {
                    // Split where it crosses 43 degC, where the weight is 1 at either rate.
                    double before = seconds * (BreakpointCelsius - ca) / (cb - ca);
                    minutes += LogMean(wa, 1, ca, BreakpointCelsius, Rate(ca), before) + LogMean(1, wb, BreakpointCelsius, cb, Rate(cb), seconds - before);
                }
                else
                {
                    minutes += LogMean(wa, wb, ca, cb, Rate(0.5 * (ca + cb)), seconds);
                }
            }

            (a, ca, wa) = (b, cb, wb);
        }

        return minutes;
    }

    /// <summary>R^(43 - T) at a temperature, with R for that temperature's side of 43 degC (1 at 43 degC on either).</summary>
    private static double Weight(double celsius) =>
        Math.Exp((celsius >= BreakpointCelsius ? LogRateAbove : LogRateBelow) * (BreakpointCelsius - celsius));

    /// <summary>The integral of r^(43 - T) over a piece where T runs linearly from c0 to c1 and the weights are w0 and w1, minutes.</summary>
    private static double LogMean(double w0, double w1, double c0, double c1, double r, double seconds)
    {
        double x = -(r == RateAbove ? LogRateAbove : LogRateBelow) * (c1 - c0);  // ln(w1 / w0)
        if (Math.Abs(x) < 1e-3)
        {
            // (e^x - 1) / x to five terms: the next is below x^5 / 720, under 2e-18.
            return w0 * seconds / 60.0 * (1 + (x / 2 * (1 + (x / 3 * (1 + (x / 4 * (1 + (x / 5))))))));
        }

        return seconds / 60.0 * (w1 - w0) / x;
    }

    /// <summary>The dose of a constant temperature held for a time, minutes.</summary>
    public static double Cem43Minutes(double celsius, double seconds) =>
        Math.Pow(Rate(celsius), BreakpointCelsius - celsius) * seconds / 60.0;

    private static double Rate(double celsius) => celsius >= BreakpointCelsius ? RateAbove : RateBelow;

    private static double Segment(double t0, double c0, double t1, double c1)
    {
        if (!(t1 > t0))
        {
            return 0;
        }

        bool crosses = (c0 - BreakpointCelsius) * (c1 - BreakpointCelsius) < 0;
        if (crosses)
        {
            double tc = t0 + ((t1 - t0) * (BreakpointCelsius - c0) / (c1 - c0));
            return Piece(t0, c0, tc, BreakpointCelsius, Rate(c0)) + Piece(tc, BreakpointCelsius, t1, c1, Rate(c1));
        }

        return Piece(t0, c0, t1, c1, Rate(0.5 * (c0 + c1)));
    }

    /// <summary>The integral of r^(43 - T) over a piece where T is linear and r fixed, minutes.</summary>
    private static double Piece(double t0, double c0, double t1, double c1, double r)
    {
        double minutes = (t1 - t0) / 60.0;
        double logRate = r == RateAbove ? LogRateAbove : r == RateBelow ? LogRateBelow : Math.Log(r);
        double k = -logRate * (c1 - c0);  // exponent change over the piece
        double start = Math.Exp(logRate * (BreakpointCelsius - c0));
        double factor = Math.Abs(k) < 1e-12 ? 1.0 : Quantities.Exponential.Minus1(k) / k;
        return start * minutes * factor;
    }
}
