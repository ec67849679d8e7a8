using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// A conducting material's electrical, thermal and magnetic properties at 20 °C, each with the source it came
/// from (<see cref="Sources"/>, keyed by property name).
/// </summary>
public sealed class ConductorMaterial
{
    /// <summary>The display name ("Copper", "Titanium grade 2").</summary>
    public string Name { get; init; } = string.Empty;

    /// <summary>Other names that find this material (matched without regard to case, spaces or punctuation).</summary>
    public IReadOnlyList<string> Aliases { get; init; } = System.Array.Empty<string>();

    /// <summary>Electrical resistivity at 20 °C, ohm metre.</summary>
    public double ResistivityOhmMeters { get; init; }

    /// <summary>
    /// Temperature coefficient of resistivity about 20 °C, 1/K: rho(T) = rho20 (1 + alpha (T - 20)).
    /// Zero with <see cref="TemperatureCoefficientKnown"/> false when no source gives it.
    /// </summary>
    public double TemperatureCoefficientPerKelvin { get; init; }

    /// <summary>False when no confirmed alpha exists and resistivity is held at its 20 °C value.</summary>
    public bool TemperatureCoefficientKnown { get; init; } = true;

    /// <summary>Mass density, kg/m^3.</summary>
    public double DensityKilogramsPerCubicMeter { get; init; }

    /// <summary>Specific heat capacity, J/(kg K).</summary>
    public double SpecificHeatJoulesPerKilogramKelvin { get; init; }

    /// <summary>Thermal conductivity, W/(m K); used for the lumped-heating (Biot number) check.</summary>
    public double ThermalConductivityWattsPerMeterKelvin { get; init; }

    /// <summary>Relative permeability (1 for non-magnetic metals; a nominal low-field value for ferromagnetic ones).</summary>
    public double RelativePermeability { get; init; } = 1.0;

    /// <summary>True for ferromagnetic materials, whose permeability depends on the field and which are attracted by it.</summary>
    public bool IsFerromagnetic { get; init; }

    /// <summary>Saturation flux density of a ferromagnetic material, T; NaN otherwise.</summary>
    public double SaturationTesla { get; init; } = double.NaN;

    /// <summary>Melting point, or solidus of an alloy, °C: the Overheat limit.</summary>
    public double MeltingCelsius { get; init; }

    /// <summary>Latent heat of fusion, J/kg: what melting through takes beyond reaching the melting point; NaN when not known.</summary>
    public double LatentHeatJoulesPerKilogram { get; init; } = double.NaN;

    /// <summary>Where each value came from, keyed by property name.</summary>
    public IReadOnlyDictionary<string, string> Sources { get; init; } = new Dictionary<string, string>();

    /// <summary>True for the module's own table; false for a material defined by the user.</summary>
    public bool IsBuiltIn { get; init; }

    /// <summary>Volumetric heat capacity rho_m c, J/(m^3 K).</summary>
    public double VolumetricHeatCapacity => DensityKilogramsPerCubicMeter * SpecificHeatJoulesPerKilogramKelvin;

    /// <summary>
    /// Resistivity at a temperature, ohm metre: rho20 (1 + alpha (T - 20)), the linear law of IEC 60028 about 20 °C
    /// (for copper the same as rho20 (beta + T) / (beta + 20) with beta = 1/alpha - 20, IEC 60949).
    /// </summary>
    public double ResistivityAt(double celsius) =>
        ResistivityOhmMeters * (1 + (TemperatureCoefficientPerKelvin * (celsius - PhysicalConstants.ReferenceCelsius)));

    /// <summary>The name.</summary>
    public override string ToString() => Name;
}
