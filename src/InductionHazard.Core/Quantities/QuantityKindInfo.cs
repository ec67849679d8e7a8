using System;
using System.Collections.Generic;
using UnitsNet.Units;

namespace InductionHazard.Quantities;

/// <summary>What the module knows of a quantity kind: its words, its canonical unit and its UnitsNet unit type.</summary>
public sealed class QuantityKindInfo
{
    private static readonly Dictionary<QuantityKind, QuantityKindInfo> Table = new()
    {
        [QuantityKind.Length] = new(QuantityKind.Length, "a length", "m", "'20 mm'", LengthUnit.Meter),
        [QuantityKind.Area] = new(QuantityKind.Area, "an area", "m²", "'3 mm²'", AreaUnit.SquareMeter),
        [QuantityKind.Time] = new(QuantityKind.Time, "a time", "s", "'2 ms'", DurationUnit.Second),
        [QuantityKind.Frequency] = new(QuantityKind.Frequency, "a frequency", "Hz", "'50 Hz'", FrequencyUnit.Hertz),
        [QuantityKind.MagneticFluxDensity] = new(QuantityKind.MagneticFluxDensity, "a magnetic flux density", "T", "'1.5 T'", MagneticFieldUnit.Tesla),
        [QuantityKind.ElectricCurrent] = new(QuantityKind.ElectricCurrent, "an electric current", "A", "'40 kA'", ElectricCurrentUnit.Ampere),
        [QuantityKind.Voltage] = new(QuantityKind.Voltage, "a voltage", "V", "'50 V'", ElectricPotentialUnit.Volt),
        [QuantityKind.Resistance] = new(QuantityKind.Resistance, "a resistance", "Ω", "'2 kohm'", ElectricResistanceUnit.Ohm),
        [QuantityKind.Resistivity] = new(QuantityKind.Resistivity, "a resistivity", "Ω·m", "'1.72e-8 ohm m'", ElectricResistivityUnit.OhmMeter),
        [QuantityKind.Temperature] = new(QuantityKind.Temperature, "a temperature", "°C", "'20 degC'", TemperatureUnit.DegreeCelsius),
        [QuantityKind.TemperatureDifference] = new(QuantityKind.TemperatureDifference, "a temperature difference", "K", "'10 K'", TemperatureDeltaUnit.Kelvin),
        [QuantityKind.Mass] = new(QuantityKind.Mass, "a mass", "kg", "'12 g'", MassUnit.Kilogram),
        [QuantityKind.Density] = new(QuantityKind.Density, "a density", "kg/m³", "'8.9 g/cm³'", DensityUnit.KilogramPerCubicMeter),
        [QuantityKind.SpecificHeat] = new(QuantityKind.SpecificHeat, "a specific heat capacity", "J/(kg·K)", "'385 J/kg·K'", SpecificEntropyUnit.JoulePerKilogramKelvin),
        [QuantityKind.ThermalConductivity] = new(QuantityKind.ThermalConductivity, "a thermal conductivity", "W/(m·K)", "'401 W/m·K'", ThermalConductivityUnit.WattPerMeterKelvin),
        [QuantityKind.HeatTransferCoefficient] = new(QuantityKind.HeatTransferCoefficient, "a heat transfer coefficient", "W/(m²·K)", "'10 W/m²·K'", HeatTransferCoefficientUnit.WattPerSquareMeterKelvin),
        [QuantityKind.Energy] = new(QuantityKind.Energy, "an energy", "J", "'5 J'", EnergyUnit.Joule),
        [QuantityKind.Power] = new(QuantityKind.Power, "a power", "W", "'2 W'", PowerUnit.Watt),
        [QuantityKind.Angle] = new(QuantityKind.Angle, "an angle", "degrees", "'90 deg'", AngleUnit.Degree),
        [QuantityKind.Capacitance] = new(QuantityKind.Capacitance, "a capacitance", "F", "'2 mF'", CapacitanceUnit.Farad),
        [QuantityKind.Inductance] = new(QuantityKind.Inductance, "an inductance", "H", "'40 uH'", ElectricInductanceUnit.Henry),
        [QuantityKind.Speed] = new(QuantityKind.Speed, "a speed", "m/s", "'1.5 m/s'", SpeedUnit.MeterPerSecond),
        [QuantityKind.ElectricCharge] = new(QuantityKind.ElectricCharge, "an electric charge", "C", "'45 uC'", ElectricChargeUnit.Coulomb),
        [QuantityKind.SpecificEnergy] = new(QuantityKind.SpecificEnergy, "an energy per mass", "J/kg", "'209 kJ/kg'", SpecificEnergyUnit.JoulePerKilogram),
    };

    private QuantityKindInfo(QuantityKind kind, string description, string canonicalSymbol, string example, Enum canonicalUnit)
    {
        Kind = kind;
        Description = description;
        CanonicalSymbol = canonicalSymbol;
        Example = example;
        CanonicalUnit = canonicalUnit;
    }

    /// <summary>The kind.</summary>
    public QuantityKind Kind { get; }

    /// <summary>The kind in words with its article, for messages ("a length").</summary>
    public string Description { get; }

    /// <summary>The symbol of the canonical unit that bare numbers are taken in ("m", "°C").</summary>
    public string CanonicalSymbol { get; }

    /// <summary>An example of a valid input string, quoted as typed in a shell.</summary>
    public string Example { get; }

    /// <summary>The UnitsNet unit that bare numbers are taken in and parsed values are converted to.</summary>
    public Enum CanonicalUnit { get; }

    /// <summary>The UnitsNet unit enum type of the kind.</summary>
    public Type UnitType => CanonicalUnit.GetType();

    /// <summary>Every kind the module parses.</summary>
    public static IEnumerable<QuantityKindInfo> All => Table.Values;

    /// <summary>The information for a kind.</summary>
    public static QuantityKindInfo Of(QuantityKind kind) => Table[kind];
}
