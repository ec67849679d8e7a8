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

    /// <summary>The last few lists made, by the very strings they were made from (most inventories repeat a handful).</summary>
    private static readonly System.Collections.Concurrent.ConcurrentQueue<(string[] Sources, IReadOnlyList<string> Cautions)> Recent = new();

    /// <summary>The standard cautions, followed by the sources of the limits used.</summary>
    public static IReadOnlyList<string> For(IEnumerable<string> limitSources)
    {
        string[] sources = System.Linq.Enumerable.ToArray(limitSources);
        foreach ((string[] known, IReadOnlyList<string> cautions) in Recent)
        {
            if (Same(known, sources))
            {
                return cautions;
            }
        }

        IReadOnlyList<string> made = System.Array.AsReadOnly(new[] { EngineeringEstimate, Governance, Indeterminate, "Limits from: " + string.Join("; ", sources) + "." });
        Recent.Enqueue((sources, made));
        while (Recent.Count > 16 && Recent.TryDequeue(out _))
        {
        }

        return made;
    }

    /// <summary>True when two lists hold the same strings in the same order (by reference first, then by value).</summary>
    private static bool Same(string[] a, string[] b)
    {
        if (a.Length != b.Length)
        {
            return false;
        }

        for (int i = 0; i < a.Length; i++)
        {
            if (!ReferenceEquals(a[i], b[i]) && !string.Equals(a[i], b[i], System.StringComparison.Ordinal))
            {
                return false;
            }
        }

        return true;
    }
}
