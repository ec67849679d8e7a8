using System;

namespace InductionHazard.Thermal;

/// <summary>
/// Facts about skin that set the starting point of a worn or held item, and the heat a worn ring or band loses into
/// the skin under it.
/// </summary>
/// <remarks>
/// The skin under a worn item is perfused tissue. In Pennes' bioheat equation (Pennes, J Appl Physiol 1:93, 1948),
/// k T'' = w_b rho_b c_b (T - T_s) in one dimension, a surface held dT above the tissue's own temperature loses
/// q = sqrt(k w_b rho_b c_b) dT into it in the steady state: a contact conductance per area. Each value is taken
/// at the low end, so that the item keeps more of its heat (the safe side), and the conductance is the steady one,
/// below the larger conduction of the first minutes.
/// </remarks>
public static class SkinContact
{
    /// <summary>
    /// The surface temperature of skin, about 33 °C: an item worn or held starts there (common practice; mean skin
    /// temperature of a resting person in a comfortable room is 32-34 °C).
    /// </summary>
    public const double SurfaceCelsius = 33.0;

    /// <summary>
    /// Thermal conductivity of the epidermis, W/(m K): 0.209 (Holmes' compilation, in Valvano, Bioheat Transfer,
    /// Encyclopedia of Medical Devices and Instrumentation; the lowest of the skin layers, the safe side).
    /// </summary>
    public const double ConductivityWattsPerMeterKelvin = 0.209;

    /// <summary>Volumetric heat capacity of blood, rho_b c_b, J/(m^3 K): 1060 kg/m^3 x 3770 J/(kg K) (from memory).</summary>
    public const double BloodHeatCapacityJoulesPerCubicMeterKelvin = 1060 * 3770.0;

    /// <summary>
    /// Blood perfusion of skin, w_b, 1/s: 2e-4 (about 1.2 ml per 100 g per minute, skin near the low end of its
    /// resting range, as when cool; from memory).
    /// </summary>
    public const double PerfusionPerSecond = 2e-4;

    /// <summary>
    /// The fraction of a worn ring's or band's surface taken to lie on skin: 1/8 (a band's inner face is about
    /// two fifths of its surface, a round wire touches along about a sixth of its circumference: the lower share,
    /// and lower still, is the safe side; an assumption of this module).
    /// </summary>
    public const double ContactFraction = 1.0 / 8;

    /// <summary>
    /// The steady contact conductance of perfused skin per area, sqrt(k w_b rho_b c_b), W/(m^2 K): about 12.9.
    /// </summary>
    public static double ConductancePerArea { get; } =
        Math.Sqrt(ConductivityWattsPerMeterKelvin * PerfusionPerSecond * BloodHeatCapacityJoulesPerCubicMeterKelvin);

    /// <summary>
    /// The heat transfer coefficient the skin adds, averaged over the item's whole surface, W/(m^2 K): the contact
    /// conductance times the contact fraction.
    /// </summary>
    public static double SurfaceAveragedCoefficient => ConductancePerArea * ContactFraction;
}
