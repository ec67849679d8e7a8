namespace InductionHazard.Criteria;

/// <summary>The outcome of an assessment or of one mechanism. Ordered from the most to the least reassuring.</summary>
[Newtonsoft.Json.JsonConverter(typeof(Newtonsoft.Json.Converters.StringEnumConverter))]
public enum Verdict
{
    /// <summary>Every margin is at or above the policy's safety factor.</summary>
    Clear,

    /// <summary>Every margin is at least 1, but some are below the safety factor.</summary>
    Caution,

    /// <summary>Some margin is below 1: a limit is exceeded.</summary>
    Hazard,

    /// <summary>An input is missing, a number is not finite, or a model is outside its validity: no verdict can be given.</summary>
    Indeterminate,
}
