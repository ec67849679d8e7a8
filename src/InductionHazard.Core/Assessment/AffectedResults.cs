using System;

namespace InductionHazard.Assessment;

/// <summary>Which results a broken model assumption makes untrustworthy.</summary>
[Flags]
public enum AffectedResults
{
    /// <summary>None.</summary>
    None = 0,

    /// <summary>The emf and gap voltage.</summary>
    Emf = 1,

    /// <summary>The loop current.</summary>
    Current = 2,

    /// <summary>The heating and temperatures.</summary>
    Heating = 4,

    /// <summary>The source's field and its gradient at the item (the pull and twist on a ferromagnetic item).</summary>
    Field = 8,

    /// <summary>Everything.</summary>
    All = Emf | Current | Heating | Field,
}
