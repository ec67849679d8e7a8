using System.Collections.Generic;

namespace InductionHazard.Criteria;

/// <summary>The cautions every assessment and report carries.</summary>
public static class Cautions
{
    /// <summary>The engineering-estimate caution.</summary>
    public const string EngineeringEstimate =
        "Results are engineering estimates from simplified physical models and published limits; they are not a "
        + "measurement and not a certification.";

    /// <summary>Who governs.</summary>
    public const string Governance =
        "Local codes and regulations, the site's own rules and the judgement of licensed professionals govern; "
        + "where they are stricter, they apply.";

    /// <summary>What to do with an Indeterminate verdict.</summary>
    public const string Indeterminate =
        "An Indeterminate verdict is not a pass: treat the item as unsafe at that place until it is assessed "
        + "another way.";

    /// <summary>The standard cautions, followed by the sources of the limits used.</summary>
    public static IReadOnlyList<string> For(IEnumerable<string> limitSources)
    {
        var list = new List<string> { EngineeringEstimate, Governance, Indeterminate };
        list.Add("Limits from: " + string.Join("; ", limitSources) + ".");
        return list;
    }
}
