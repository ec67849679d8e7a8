using System.Collections.Generic;
using System.Collections.ObjectModel;
using System.Linq;

namespace InductionHazard.Assessment;

/// <summary>A list of sentences that reads as one line of text ("a; b") wherever text is wanted: Export-Csv, a table cell.</summary>
public sealed class TextList : ReadOnlyCollection<string>
{
    /// <summary>Creates the list.</summary>
    public TextList(IEnumerable<string> items)
        : base(items.ToList())
    {
    }

    /// <summary>An empty list.</summary>
    public static TextList Empty { get; } = new(Enumerable.Empty<string>());

    /// <summary>The entries joined by "; ".</summary>
    public override string ToString() => string.Join("; ", this);
}

/// <summary>Each mechanism's result, reading as one line ("Shock: Clear (margin 12); Burn: Hazard (margin 0.4)") wherever text is wanted.</summary>
public sealed class MechanismList : ReadOnlyCollection<MechanismResult>
{
    /// <summary>Creates the list.</summary>
    public MechanismList(IEnumerable<MechanismResult> results)
        : base(results.ToList())
    {
    }

    /// <summary>An empty list.</summary>
    public static MechanismList Empty { get; } = new(Enumerable.Empty<MechanismResult>());

    /// <summary>The mechanisms that apply, each with its verdict and margin, joined by "; ".</summary>
    public override string ToString() => string.Join("; ", this.Where(r => r.Applies));
}
