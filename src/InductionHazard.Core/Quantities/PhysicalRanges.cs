namespace InductionHazard.Quantities;

/// <summary>
/// The physical range of every dimensioned input, each with its reason. Bounds are wide: they refuse what no
/// item, drive or room can be (a 5-angstrom wire, a gap of a nanometre, a 1e17 s start), not what is merely
/// unusual. Figures marked "from memory" were recalled and are bounds, not test values.
/// </summary>
public static class PhysicalRanges
{
    /// <summary>A dimension of an item (diameter, wire diameter, width, thickness), m.</summary>
    public static PhysicalRange ItemDimension { get; } = new(
        "Diameter", 10e-6, 100.0, "m", "from a fine wire of 10 um to a cable loop or frame of 100 m; check the unit");

    /// <summary>
    /// The gap of a split loop, m. Below about 7.5 um (the Paschen minimum at 1 atm: 0.57 Torr cm, Raizer 1991)
    /// a gap breaks down by field emission and is bridged by surface roughness: it is not an open circuit.
    /// </summary>
    public static PhysicalRange Gap { get; } = new(
        "Gap", 10e-6, 100.0, "m", "a narrower gap breaks down by field emission and is bridged by surface roughness, so it cannot be taken as an open circuit; 0 means a closed loop");

    /// <summary>How far along a ray a safe distance is looked for, m: from a millimetre to the size of a site.</summary>
    public static PhysicalRange Distance { get; } = new(
        "MaxDistance", 1e-3, 1000.0, "m", "from a millimetre to the size of a site");

    /// <summary>How long an item stays in the field, s (common practice: nobody carries an item into a field and out again in under 0.1 s).</summary>
    public static PhysicalRange ExposureTime { get; } = new(
        "ExposureTime", 0.1, 8 * 3600.0, "s", "nobody carries an item into a field and out again in under 0.1 s; 8 h is the longest contact time of ISO 13732-1");

    /// <summary>When a drive starts, s: times are measured from the start of the assessment.</summary>
    public static PhysicalRange StartTime { get; } = new(
        "Start", -1e6, 1e6, "s", "drive times are measured from the start of the assessment; 1e6 s is over 11 days, beyond any exposure assessed (8 h at most)");

    /// <summary>A duration or time constant of a drive, s.</summary>
    public static PhysicalRange DriveDuration { get; } = new(
        "Duration", 1e-9, 1e6, "s", "from a nanosecond edge to a drive of over 11 days");

    /// <summary>The frequency of an alternating drive, Hz.</summary>
    public static PhysicalRange Frequency { get; } = new(
        "Frequency", 1e-3, 1e9, "Hz", "from a slow cycle of 1000 s to 1 GHz, beyond which no hand-sized item is quasi-static");

    /// <summary>
    /// A flux density of a drive, T: the strongest fields made are about 100 T sustained and near 1000 T in
    /// destructive pulses (from memory).
    /// </summary>
    public static PhysicalRange FluxDensity { get; } = new(
        "Amplitude", -1000.0, 1000.0, "T", "the strongest fields made are near 1000 T in destructive pulses");

    /// <summary>A current of a drive, A: beyond the largest fault and pulsed-power currents (tens of MA, from memory).</summary>
    public static PhysicalRange Current { get; } = new(
        "Amplitude", -1e8, 1e8, "A", "beyond the largest fault and pulsed-power currents");

    /// <summary>How fast a person moves an item through a field, m/s (common practice: a walk is about 1.5 m/s, a throw or a fall from a few metres under 10).</summary>
    public static PhysicalRange Speed { get; } = new(
        "Velocity", 0.0, 30.0, "m/s", "a person walks at about 1.5 m/s and a dropped or thrown item moves at under 10 m/s");

    /// <summary>How far an item's loop is turned from the orientation that links the largest flux change, degrees.</summary>
    public static PhysicalRange Tilt { get; } = new(
        "Tilt", 0.0, 90.0, "degrees", "0 faces the largest flux change, 90 is edge-on to it");

    /// <summary>The temperature of the surrounding air, °C.</summary>
    public static PhysicalRange Ambient { get; } = new(
        "AmbientTemperature", -50.0, 60.0, "°C", "outdoor and plant-room air; the heating and burn models are for room conditions");

    /// <summary>A material's resistivity at 20 °C, ohm m: from below silver (1.59e-8) to semiconducting carbon.</summary>
    public static PhysicalRange Resistivity { get; } = new(
        "Resistivity", 1e-9, 1.0, "Ω·m", "metals lie between 1.5e-8 (silver) and about 2e-6 ohm m; outside this span the material is not a conductor this module assesses");

    /// <summary>A material's temperature coefficient of resistivity, 1/K.</summary>
    public static PhysicalRange TemperatureCoefficient { get; } = new(
        "TemperatureCoefficient", -1e-3, 0.01, "1/K", "pure metals are near 0.004 per K and resistance alloys near zero");

    /// <summary>A material's density, kg/m^3: osmium, the densest element, is 22,590 kg/m^3.</summary>
    public static PhysicalRange Density { get; } = new(
        "Density", 100.0, 25000.0, "kg/m³", "no solid is denser than osmium, 22,590 kg/m3");

    /// <summary>A material's specific heat, J/(kg K): metals lie between about 100 (lead, gold) and 1,800 (beryllium).</summary>
    public static PhysicalRange SpecificHeat { get; } = new(
        "SpecificHeat", 50.0, 5000.0, "J/(kg·K)", "metals lie between about 100 and 1,800 J/(kg K)");

    /// <summary>A material's thermal conductivity, W/(m K).</summary>
    public static PhysicalRange ThermalConductivity { get; } = new(
        "ThermalConductivity", 0.1, 5000.0, "W/(m·K)", "no solid conducts heat better than diamond, about 2,200 W/(m K)");

    /// <summary>A material's melting (or solidus) temperature, °C: above the warmest room, up to tungsten (3,422 °C).</summary>
    public static PhysicalRange Melting { get; } = new(
        "MeltingTemperature", 60.0, 4000.0, "°C", "a solid item in a room melts above 60 °C; tungsten, the highest-melting metal, melts at 3,422 °C");

    /// <summary>A material's latent heat of fusion.</summary>
    public static PhysicalRange LatentHeat { get; } = new(
        "LatentHeat", 5e3, 2.5e6, "J/kg", "from mercury's 11 kJ/kg to silicon's 1.8 MJ/kg, with room on both sides");

    /// <summary>A material's relative permeability.</summary>
    public static PhysicalRange RelativePermeability { get; } = new(
        "RelativePermeability", 1.0, 1e6, string.Empty, "1 for a non-magnetic conductor, up to about 1e6 for the softest magnetic alloys");
}
