using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Criteria;

namespace InductionHazard.Assessment;

/// <summary>One mechanism's check: the quantity predicted, the limit, the margin and the verdict, with the limit's source.</summary>
public sealed class MechanismResult
{
    private MechanismResult(HazardMechanism mechanism)
    {
        Mechanism = mechanism;
    }

    /// <summary>The mechanism.</summary>
    public HazardMechanism Mechanism { get; }

    /// <summary>False when the mechanism cannot arise for this item (a closed loop has no gap to bridge).</summary>
    public bool Applies { get; private set; }

    /// <summary>The verdict; null when the mechanism does not apply.</summary>
    public Verdict? Verdict { get; private set; }

    /// <summary>What was compared ("gap voltage, rms").</summary>
    public string Quantity { get; private set; } = string.Empty;

    /// <summary>The predicted value, in <see cref="Unit"/>.</summary>
    public double Predicted { get; private set; } = double.NaN;

    /// <summary>The limit, in <see cref="Unit"/>.</summary>
    public double Limit { get; private set; } = double.NaN;

    /// <summary>The unit of the predicted value and the limit.</summary>
    public string Unit { get; private set; } = string.Empty;

    /// <summary>Limit over predicted (for temperatures: the allowed rise over the predicted rise); at least 1 passes.</summary>
    public double Margin { get; private set; } = double.NaN;

    /// <summary>
    /// True when this margin comes before another result's in ascending order (or there is none yet): the order of
    /// sorting by margin, NaN first, so that a scan keeping the first of equals picks what ordering by it would.
    /// </summary>
    internal bool MarginBelow(MechanismResult? other) => other is null || Margin.CompareTo(other.Margin) < 0;

    /// <summary>Where the limits come from, one source per entry (ConvertTo-Json gives them in one line, as Basis).</summary>
    [Newtonsoft.Json.JsonIgnore]
    public IReadOnlyList<string> Sources { get; private set; } = System.Array.Empty<string>();

    /// <summary>Where the limits come from, in one line.</summary>
    public string Basis => string.Join("; ", Sources);

    private object _detail = string.Empty;

    /// <summary>The finding in one sentence, or why the mechanism does not apply or cannot be judged (written when first read).</summary>
    public string Detail => LaterText.Read(ref _detail);

    /// <summary>A mechanism that cannot arise for this item.</summary>
    public static MechanismResult NotApplicable(HazardMechanism mechanism, string reason) =>
        new(mechanism) { Applies = false, _detail = reason };

    /// <summary>The same, with the reason written by <paramref name="reason"/> from <paramref name="figures"/> when first read.</summary>
    internal static MechanismResult NotApplicable<T>(HazardMechanism mechanism, T figures, Func<T, string> reason) =>
        new(mechanism) { Applies = false, _detail = LaterText.From(figures, reason) };

    /// <summary>A mechanism that applies but cannot be judged (a broken assumption, a failed number).</summary>
    public static MechanismResult Indeterminate(HazardMechanism mechanism, IReadOnlyList<string> sources, IEnumerable<ValidityIssue> issues) =>
        new(mechanism)
        {
            Applies = true,
            Verdict = Criteria.Verdict.Indeterminate,
            Sources = sources,
            _detail = "cannot be judged: " + string.Join("; ", issues.Select(i => i.Reason)),
        };

    /// <summary>A judged mechanism; the verdict follows from the margin and the safety factor.</summary>
    public static MechanismResult Judged(HazardMechanism mechanism, string quantity, double predicted, double limit, string unit, double margin, double safetyFactor, IReadOnlyList<string> sources, string detail) =>
        Judged(mechanism, quantity, predicted, limit, unit, margin, safetyFactor, sources, (object)detail);

    /// <summary>The same, with the finding written by <paramref name="detail"/> from <paramref name="figures"/> when first read.</summary>
    internal static MechanismResult Judged<T>(HazardMechanism mechanism, string quantity, double predicted, double limit, string unit, double margin, double safetyFactor, IReadOnlyList<string> sources, T figures, Func<T, string> detail) =>
        Judged(mechanism, quantity, predicted, limit, unit, margin, safetyFactor, sources, LaterText.From(figures, detail));

    private static MechanismResult Judged(HazardMechanism mechanism, string quantity, double predicted, double limit, string unit, double margin, double safetyFactor, IReadOnlyList<string> sources, object detail) =>
        new(mechanism)
        {
            Applies = true,
            Quantity = quantity,
            Predicted = predicted,
            Limit = limit,
            Unit = unit,
            Margin = VerdictRules.Bounded(margin),
            Verdict = VerdictRules.FromMargin(margin, safetyFactor),
            Sources = sources,
            _detail = detail,
        };

    /// <summary>
    /// This result as found for another of the item's possible orientations or stays than the one its assessment
    /// shows, its finding led by which ("with normal (1, 0, 0): peak force ...").
    /// </summary>
    /// <param name="where">Which orientation or stay it is.</param>
    internal MechanismResult Elsewhere(string where)
    {
        var copy = (MechanismResult)MemberwiseClone();
        copy._detail = LaterText.From((where, original: this), static f => f.where + ": " + f.original.Detail);
        return copy;
    }

    /// <summary>"Burn: Hazard (margin 0.42)".</summary>
    public override string ToString() =>
        Mechanism + ": " + (Applies ? Verdict + " (margin " + Quantities.SiFormat.Margin(Margin) + ")" : "not applicable");
}
