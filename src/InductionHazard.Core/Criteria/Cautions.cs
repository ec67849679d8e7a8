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

    /// <summary>
    /// The last few lists made, newest first, by the very strings they were made from (most inventories repeat a
    /// handful): an array read without locks and replaced whole when a list is added, so any thread may.
    /// </summary>
    private static (string[] Sources, IReadOnlyList<string> Cautions)[] Recent = System.Array.Empty<(string[], IReadOnlyList<string>)>();

    /// <summary>The standard cautions, followed by the sources of the limits used.</summary>
    public static IReadOnlyList<string> For(IEnumerable<string> limitSources)
    {
        // An array is compared as it is (no copy); it is copied only when it is kept.
        string[] sources = limitSources as string[] ?? System.Linq.Enumerable.ToArray(limitSources);
        (string[] Sources, IReadOnlyList<string> Cautions)[] recent = Recent;
        foreach ((string[] known, IReadOnlyList<string> cautions) in recent)
        {
            if (Same(known, sources))
            {
                return cautions;
            }
        }

        IReadOnlyList<string> made = System.Array.AsReadOnly(new[] { EngineeringEstimate, Governance, Indeterminate, "Limits from: " + string.Join("; ", sources) + "." });
        var next = new (string[] Sources, IReadOnlyList<string> Cautions)[System.Math.Min(16, recent.Length + 1)];
        next[0] = ((string[])sources.Clone(), made);
        System.Array.Copy(recent, 0, next, 1, next.Length - 1);
        Recent = next;
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
