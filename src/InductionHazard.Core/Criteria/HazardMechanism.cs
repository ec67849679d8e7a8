namespace InductionHazard.Criteria;

/// <summary>The ways an induced emf or current can hurt someone.</summary>
[Newtonsoft.Json.JsonConverter(typeof(Newtonsoft.Json.Converters.StringEnumConverter))]
public enum HazardMechanism
{
    /// <summary>A voltage a person can bridge, such as across the gap of a split ring.</summary>
    Shock,

    /// <summary>Electrical breakdown across a gap.</summary>
    Arc,

    /// <summary>Skin in contact with a heated item.</summary>
    Burn,

    /// <summary>The item itself softening, melting or fusing.</summary>
    Overheat,

    /// <summary>Net force and kick on the item.</summary>
    Force,

    /// <summary>Torque on the item.</summary>
    Torque,

    /// <summary>Ferromagnetic pull toward a static field.</summary>
    Attraction,

    /// <summary>The person's own exposure to the field.</summary>
    Exposure,
}
