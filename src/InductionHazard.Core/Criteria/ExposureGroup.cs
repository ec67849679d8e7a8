namespace InductionHazard.Criteria;

/// <summary>
/// Whose exposure to a field a policy judges (ICNIRP 2009 and 2010 set limits for each): workers who know of the field
/// and are trained for it, or the general public (visitors, contractors without that training, anyone else), whose
/// limits are lower.
/// </summary>
[Newtonsoft.Json.JsonConverter(typeof(Newtonsoft.Json.Converters.StringEnumConverter))]
public enum ExposureGroup
{
    /// <summary>Workers: the occupational limits (the default).</summary>
    Occupational,

    /// <summary>The general public: the limits for the public, five times below the workers' up to 300 Hz and about 3.7 times above 400 Hz.</summary>
    Public,
}
