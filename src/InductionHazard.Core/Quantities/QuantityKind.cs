namespace InductionHazard.Quantities;

/// <summary>The physical dimension a parameter or a data field expects.</summary>
public enum QuantityKind
{
    /// <summary>A length; canonical unit metre.</summary>
    Length,

    /// <summary>An area; canonical unit square metre.</summary>
    Area,

    /// <summary>A time or duration; canonical unit second.</summary>
    Time,

    /// <summary>A frequency; canonical unit hertz.</summary>
    Frequency,

    /// <summary>A magnetic flux density; canonical unit tesla.</summary>
    MagneticFluxDensity,

    /// <summary>An electric current; canonical unit ampere.</summary>
    ElectricCurrent,

    /// <summary>A voltage; canonical unit volt.</summary>
    Voltage,

    /// <summary>An electrical resistance; canonical unit ohm.</summary>
    Resistance,

    /// <summary>An electrical resistivity; canonical unit ohm metre.</summary>
    Resistivity,

    /// <summary>A temperature; canonical unit degree Celsius.</summary>
    Temperature,

    /// <summary>A temperature difference; canonical unit kelvin.</summary>
    TemperatureDifference,

    /// <summary>A mass; canonical unit kilogram.</summary>
    Mass,

    /// <summary>A mass density; canonical unit kilogram per cubic metre.</summary>
    Density,

    /// <summary>A specific heat capacity; canonical unit joule per kilogram kelvin.</summary>
    SpecificHeat,

    /// <summary>A thermal conductivity; canonical unit watt per metre kelvin.</summary>
    ThermalConductivity,

    /// <summary>A heat transfer coefficient; canonical unit watt per square metre kelvin.</summary>
    HeatTransferCoefficient,

    /// <summary>An energy; canonical unit joule.</summary>
    Energy,

    /// <summary>A power; canonical unit watt.</summary>
    Power,

    /// <summary>An angle; canonical unit degree (a bare number is in degrees).</summary>
    Angle,

    /// <summary>A capacitance; canonical unit farad.</summary>
    Capacitance,

    /// <summary>An inductance; canonical unit henry.</summary>
    Inductance,

    /// <summary>A speed; canonical unit metre per second.</summary>
    Speed,

    /// <summary>An electric charge; canonical unit coulomb.</summary>
    ElectricCharge,

    /// <summary>An energy per mass (a latent heat); canonical unit joule per kilogram.</summary>
    SpecificEnergy,
}
