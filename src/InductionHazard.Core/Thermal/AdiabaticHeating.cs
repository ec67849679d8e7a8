using System;

namespace InductionHazard.Thermal;

/// <summary>
/// Adiabatic heating of a conductor by a current: the integral of i^2 dt equals k^2 S^2, with
/// k = sqrt(Qc (beta + 20) / rho20 ln((beta + Tf) / (beta + Ti))) (IEC 60949; IEC 60364-5-54 Annex A).
/// Qc is the volumetric heat capacity, beta the reciprocal of the temperature coefficient at 0 °C.
/// </summary>
public static class AdiabaticHeating
{
    /// <summary>The factor k, A s^0.5 / m^2 (divide by 1e6 for the tabulated A s^0.5 / mm^2).</summary>
    public static double KFactor(double volumetricHeatCapacity, double betaKelvin, double resistivity20, double initialCelsius, double finalCelsius) =>
        Math.Sqrt(volumetricHeatCapacity * (betaKelvin + 20) / resistivity20 * Math.Log((betaKelvin + finalCelsius) / (betaKelvin + initialCelsius)));

    /// <summary>The final temperature after a given integral of i^2 dt through section S, °C (the same law solved for Tf).</summary>
    public static double FinalCelsius(double volumetricHeatCapacity, double betaKelvin, double resistivity20, double initialCelsius, double currentSquaredSeconds, double sectionSquareMeters) =>
        ((betaKelvin + initialCelsius) * Math.Exp(currentSquaredSeconds * resistivity20 / (volumetricHeatCapacity * (betaKelvin + 20) * sectionSquareMeters * sectionSquareMeters))) - betaKelvin;
}
