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
        if (!(inRange > 0) || Added(inRange) < limitMinutes)
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

        double low = 0, high = inRange, gLow = double.NegativeInfinity, gHigh = G(high);
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
    private static double Scaled(IReadOnlyList<HeatingSample> history, double startCelsius, double k)
    {
        double minutes = 0;
        for (int i = 1; i < history.Count; i++)
        {
            HeatingSample a = history[i - 1], b = history[i];
            minutes += Segment(a.TimeSeconds, startCelsius + (k * (a.TemperatureCelsius - startCelsius)), b.TimeSeconds, startCelsius + (k * (b.TemperatureCelsius - startCelsius)));
        }

        return minutes;
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
