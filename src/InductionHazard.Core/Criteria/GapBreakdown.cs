using System;

namespace InductionHazard.Criteria;

/// <summary>
/// The voltage that breaks down a gap in air at 1 atm and 20 °C, V: the lower of Paschen's law and the engineering
/// fit of measured uniform-field breakdown, and never below the measured Paschen minimum.
/// </summary>
public static class GapBreakdown
{
    /// <summary>Paschen's A for air, 1/(cm Torr) (Raizer, Gas Discharge Physics, 1991).</summary>
    public const double PaschenA = 15;

    /// <summary>Paschen's B for air, V/(cm Torr) (Raizer 1991).</summary>
    public const double PaschenB = 365;

    /// <summary>The secondary emission coefficient taken for Paschen's law (Raizer 1991: about 0.01).</summary>
    public const double SecondaryEmission = 0.01;

    /// <summary>The measured minimum of air's Paschen curve, about 327 V near 0.57 Torr cm (Raizer 1991): no gap breaks down below it.</summary>
    public const double MinimumVolts = 327;

    /// <summary>Atmospheric pressure, Torr.</summary>
    public const double AtmosphereTorr = 760;

    /// <summary>
    /// Paschen's law, V = B p d / (ln(A p d) - ln ln(1 + 1/gamma)) (Raizer 1991), at 1 atm; infinity left of where the
    /// denominator vanishes (the minimum then governs).
    /// </summary>
    public static double PaschenVolts(double gapMeters)
    {
        double pd = AtmosphereTorr * gapMeters * 100;
        double denominator = Math.Log(PaschenA * pd) - Math.Log(Math.Log(1 + (1 / SecondaryEmission)));
        return denominator > 0 ? PaschenB * pd / denominator : double.PositiveInfinity;
    }

    /// <summary>
    /// The fit of measured uniform-field breakdown in air, V = (24.22 x + 6.08 sqrt(x)) kV with x = 293 p d / (760 T)
    /// (p Torr, d cm, T kelvin) (Kuffel, Zaengl and Kuffel, High Voltage Engineering, 2000), at 1 atm and 20 °C.
    /// </summary>
    public static double MeasuredFitVolts(double gapMeters)
    {
        double x = gapMeters * 100;
        return 1000 * ((24.22 * x) + (6.08 * Math.Sqrt(x)));
    }

    /// <summary>The breakdown voltage of the gap: max(327 V, min(Paschen, the measured fit)), V.</summary>
    public static double Volts(double gapMeters) =>
        Math.Max(MinimumVolts, Math.Min(PaschenVolts(gapMeters), MeasuredFitVolts(gapMeters)));
}
