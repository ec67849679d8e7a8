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
        double k = -Math.Log(r) * (c1 - c0);  // exponent change over the piece
        double start = Math.Pow(r, BreakpointCelsius - c0);
        double factor = Math.Abs(k) < 1e-12 ? 1.0 : SpecialFunctions.Expm1(k) / k;
        return start * minutes * factor;
    }
}
