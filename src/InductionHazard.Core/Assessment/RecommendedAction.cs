using System.Collections.Generic;
using System.Linq;
using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// What to do about an assessment, in plain words: for a Hazard or an Indeterminate verdict the action (keep the
/// item out, fix it down, assess it another way); for a Caution what would restore the margin; for Clear, nothing.
/// </summary>
public static class RecommendedAction
{
    /// <summary>The action for a verdict and its governing mechanism.</summary>
    /// <param name="verdict">The overall verdict.</param>
    /// <param name="governing">The mechanism that governs it.</param>
    /// <param name="policy">The policy (its safety factor).</param>
    /// <param name="contact">How a person touches the item: a worn item is taken off, others kept out.</param>
    /// <param name="othersUnjudged">Whether some of the item's own mechanisms could not be judged: fixing it down is not offered then (see <see cref="Unjudged"/>).</param>
    public static string For(Verdict verdict, MechanismResult? governing, HazardPolicy policy, ContactKind contact = ContactKind.Free, bool othersUnjudged = false)
    {
        string fixDown = contact == ContactKind.Skin || othersUnjudged ? string.Empty : ", or fix it down";
        string keepOut = contact == ContactKind.Skin ? "Take it off before entering this place" : "Keep it out of this place";
        if (verdict == Verdict.Indeterminate || governing is null)
        {
            return "Treat it as unsafe here: " + (contact == ContactKind.Skin ? "take it off before entering" : "keep it out of this place") + " until it is assessed another way (measured, or by a specialist), since the module cannot judge it.";
        }

        if (verdict == Verdict.Clear)
        {
            return "No action needed at this place.";
        }

        if (verdict == Verdict.Caution)
        {
            double factor = policy.SafetyFactor / governing.Margin;
            string what = governing.Unit == "°C" ? "rise in " + governing.Quantity : governing.Quantity;
            return "Usable with care; to restore the safety factor of " + SiFormat.Plain(policy.SafetyFactor) + ", the " + what + " must fall by a factor of "
                + SiFormat.Plain(factor) + ": " + Remedy(governing.Mechanism) + ".";
        }

        return governing.Mechanism switch
        {
            HazardMechanism.Shock => keepOut + ": a person bridging its gap would take a voltage above the safe limit; do not wear or hold it here.",
            HazardMechanism.Arc => keepOut + ": its gap would spark, and never near a flammable atmosphere.",
            HazardMechanism.Burn => keepOut + ": it would burn the skin it touches.",
            HazardMechanism.Overheat => keepOut + ": it would overheat, softening or melting.",
            HazardMechanism.Force => keepOut + (fixDown.Length == 0 ? string.Empty : fixDown + " with a mounting rated for the force") + ": the field would push or throw it.",
            HazardMechanism.Torque => keepOut + fixDown + ": the field would twist it hard enough to wrench it from the hand, the body or its mounting.",
            HazardMechanism.Attraction => keepOut + ": it would be pulled toward the source and could become a projectile.",
            HazardMechanism.Exposure => "Keep people out of this place while the source runs, with or without the item: the field here is above the limit for a person's own exposure (see Test-FieldExposure).",
            _ => keepOut + " until the exposure is reduced and it is assessed again.",
        };
    }

    /// <summary>
    /// Where the item's own hazard governs but the person's own exposure is a Hazard too, the place's action as well, so
    /// that taking the item off is not read as leave to enter ("... The place itself: keep people out ...").
    /// </summary>
    /// <param name="applicable">The mechanisms that apply.</param>
    /// <param name="governing">The mechanism that governs.</param>
    public static string PlaceItself(IReadOnlyList<MechanismResult> applicable, MechanismResult? governing)
    {
        if (governing is null || governing.Mechanism == HazardMechanism.Exposure || governing.Verdict != Verdict.Hazard)
        {
            return string.Empty;
        }

        foreach (MechanismResult r in applicable)
        {
            if (r.Mechanism == HazardMechanism.Exposure && r.Verdict == Verdict.Hazard)
            {
                return " The place itself: keep people out while the source runs, with or without the item: the field here is above the limit for a person's own exposure (see Test-FieldExposure).";
            }
        }

        return string.Empty;
    }

    /// <summary>
    /// Where the person's own exposure governs, the item's own worst hazard as well, so that the action for the item
    /// is not lost behind the place's ("... The item itself: take it off before entering this place: it would burn
    /// the skin it touches.").
    /// </summary>
    /// <param name="applicable">The mechanisms that apply.</param>
    /// <param name="governing">The mechanism that governs.</param>
    /// <param name="policy">The policy.</param>
    /// <param name="contact">How a person touches the item.</param>
    public static string ItemItself(System.Collections.Generic.IReadOnlyList<MechanismResult> applicable, MechanismResult? governing, HazardPolicy policy, ContactKind contact)
    {
        if (governing?.Mechanism != HazardMechanism.Exposure)
        {
            return string.Empty;
        }

        // The item's own Hazard of smallest margin (the first on a tie; see MechanismResult.MarginBelow).
        MechanismResult? own = null;
        for (int k = 0; k < applicable.Count; k++)
        {
            MechanismResult r = applicable[k];
            if (r.Mechanism != HazardMechanism.Exposure && r.Verdict == Verdict.Hazard && r.MarginBelow(own))
            {
                own = r;
            }
        }

        List<string>? unjudged = UnjudgedOwn(applicable);

        if (own is null)
        {
            return unjudged is null
                ? string.Empty
                : " The item itself could not be judged (" + string.Join(", ", unjudged) + "): treat it as unsafe here until it is assessed another way.";
        }

        string action = RecommendedAction.For(Verdict.Hazard, own, policy, contact, othersUnjudged: unjudged is not null);
        return " The item itself: " + char.ToLowerInvariant(action[0]) + action.Substring(1)
            + (unjudged is null ? string.Empty : " Not judged for the item: " + string.Join(", ", unjudged) + " (see the findings); until they are assessed another way (measured, or by a specialist), keep it out.");
    }

    /// <summary>
    /// Where a Hazard stands beside mechanisms of the item's own that could not be judged, says so, so that answering the
    /// governing hazard (fixing the item down, a shorter stay) is not read as leave to use it: "... Not judged: Burn,
    /// Overheat (see the findings): fixing it down would not answer them; keep it out until they are assessed another
    /// way." <see cref="For"/> then does not offer fixing it down. Empty for any other verdict (an Indeterminate
    /// verdict's action already says to treat the item as unsafe), and where the person's exposure governs (<see
    /// cref="ItemItself"/> speaks for the item then).
    /// </summary>
    /// <param name="verdict">The overall verdict.</param>
    /// <param name="applicable">The mechanisms that apply.</param>
    /// <param name="governing">The mechanism that governs.</param>
    /// <param name="contact">How a person touches the item.</param>
    public static string Unjudged(Verdict verdict, IReadOnlyList<MechanismResult> applicable, MechanismResult? governing, ContactKind contact)
    {
        if (verdict != Verdict.Hazard || governing is null || governing.Mechanism == HazardMechanism.Exposure)
        {
            return string.Empty;
        }

        List<string>? unjudged = UnjudgedOwn(applicable);
        if (unjudged is null)
        {
            return string.Empty;
        }

        string names = string.Join(", ", unjudged);
        return OffersFixingDown(governing, contact)
            ? " Not judged: " + names + " (see the findings): fixing it down would not answer them; keep it out until they are assessed another way (measured, or by a specialist)."
            : " Not judged: " + names + " (see the findings); assess them another way (measured, or by a specialist) before it is allowed here, even once the " + governing.Mechanism + " hazard is answered.";
    }

    /// <summary>The action in a few words, for a table at 80 columns: "Take it off", "Keep out or fix down", "Unsafe until assessed", "Use with care", "None".</summary>
    /// <param name="verdict">The overall verdict.</param>
    /// <param name="governing">The mechanism that governs.</param>
    /// <param name="contact">How a person touches the item.</param>
    /// <param name="applicable">The mechanisms that apply: where some of the item's own could not be judged, fixing it down is not offered.</param>
    public static string Brief(Verdict verdict, MechanismResult? governing, ContactKind contact = ContactKind.Free, IReadOnlyList<MechanismResult>? applicable = null)
    {
        if (verdict == Verdict.Indeterminate || governing is null)
        {
            return "Unsafe until assessed";
        }

        return verdict switch
        {
            Verdict.Clear => "None",
            Verdict.Caution => "Use with care",
            _ when governing.Mechanism == HazardMechanism.Exposure => "Keep people out",
            _ when contact == ContactKind.Skin => "Take it off",
            _ when OffersFixingDown(governing, contact) && (applicable is null || UnjudgedOwn(applicable) is null) => "Keep out or fix down",
            _ => "Keep it out",
        };
    }

    private static bool OffersFixingDown(MechanismResult governing, ContactKind contact) =>
        contact != ContactKind.Skin && governing.Mechanism is HazardMechanism.Force or HazardMechanism.Torque;

    /// <summary>The item's own mechanisms (not the person's exposure) that could not be judged, or null if none.</summary>
    private static List<string>? UnjudgedOwn(IReadOnlyList<MechanismResult> applicable)
    {
        List<string>? unjudged = null;
        for (int k = 0; k < applicable.Count; k++)
        {
            MechanismResult r = applicable[k];
            if (r.Mechanism != HazardMechanism.Exposure && r.Verdict == Verdict.Indeterminate)
            {
                (unjudged ??= new List<string>()).Add(r.Mechanism.ToString());
            }
        }

        return unjudged;
    }

    private static string Remedy(HazardMechanism mechanism) => mechanism switch
    {
        HazardMechanism.Burn or HazardMechanism.Overheat => "a shorter time in the field, more distance from the source, or an item that is not a closed metal loop",
        HazardMechanism.Shock or HazardMechanism.Arc => "more distance from the source, a slower field change, or an item without a gap (or not metal)",
        HazardMechanism.Force or HazardMechanism.Torque or HazardMechanism.Attraction => "more distance from the source, a weaker field, or fixing the item down",
        HazardMechanism.Exposure => "more distance from the source or a weaker field, for the person as much as the item",
        _ => "more distance from the source or a weaker field",
    };
}
