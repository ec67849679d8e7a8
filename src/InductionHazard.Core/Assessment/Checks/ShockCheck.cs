using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Shock: the voltage across the gap of a split ring, which a finger or hand can bridge, against the
/// extra-low-voltage limits of IEC 61140 (50 V a.c. rms; 120 V ripple-free d.c. for a unidirectional pulse).
/// </summary>
public sealed class ShockCheck : IHazardCheck
{
    private static string[] SourcesOf(HazardPolicy policy, bool alternating) =>
        new[] { policy.SourceOf(alternating ? "AlternatingVoltageLimit" : "DirectVoltageLimit") };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Shock;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (!response.Item.IsSplit)
        {
            return MechanismResult.NotApplicable(Mechanism, "closed loop: no gap for a person to bridge");
        }

        var issues = response.IssuesAffecting(AffectedResults.Emf);
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, SourcesOf(policy, response.EmfKind == EmfKind.Alternating), issues);
        }

        bool alternating = response.EmfKind == EmfKind.Alternating;
        double predicted = alternating ? response.RmsEmfVolts ?? double.NaN : response.PeakEmfVolts;
        double limit = alternating ? policy.AlternatingVoltageLimitRms : policy.DirectVoltageLimit;
        string quantity = alternating ? "gap voltage, rms" : "gap voltage, peak of a unidirectional pulse";
        double margin = VerdictRules.Margin(limit, predicted);

        // Moving the item gives a steady (unidirectional) gap voltage of its own: judged against the d.c. limit when it is the worse.
        if (response.MotionalEmfVolts is { } motional && VerdictRules.Margin(policy.DirectVoltageLimit, motional) < margin)
        {
            (predicted, limit, quantity) = (motional, policy.DirectVoltageLimit, "gap voltage from moving the item");
            margin = VerdictRules.Margin(limit, predicted);
            alternating = false;
        }
        return MechanismResult.Judged(
            Mechanism, quantity, predicted, limit, "V", margin, policy.SafetyFactor, SourcesOf(policy, alternating),
            quantity + " " + SiFormat.Format(predicted, "V") + " against the extra-low-voltage limit " + SiFormat.Format(limit, "V")
            + (alternating ? " rms" : " d.c."));
    }
}
