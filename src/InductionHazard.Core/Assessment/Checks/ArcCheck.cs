using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Arc: the peak voltage across the gap of a split ring (from the drive, or from moving the item) against the
/// breakdown voltage of that gap in air (<see cref="GapBreakdown"/>). A spark pits the item and can ignite a
/// flammable atmosphere, which follows its own hazardous-area rules beyond this check.
/// </summary>
public sealed class ArcCheck : IHazardCheck
{
    private static readonly string[] Sources = { Standards.GapBreakdown };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Arc;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (!response.Item.IsSplit)
        {
            return MechanismResult.NotApplicable(Mechanism, "closed loop: no gap to spark across");
        }

        var issues = response.IssuesAffecting(AffectedResults.Emf);
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, Sources, issues);
        }

        double gap = response.Item.GapMeters;
        double predicted = response.GapVoltageVolts ?? response.PeakEmfVolts;
        double breakdown = GapBreakdown.Volts(gap);
        double margin = VerdictRules.Margin(breakdown, predicted);
        return MechanismResult.Judged(
            Mechanism, "gap voltage, peak", predicted, breakdown, "V", margin, policy.SafetyFactor, Sources, (predicted, gap, breakdown),
            static f => "peak gap voltage " + SiFormat.Format(f.predicted, "V") + " against the breakdown of a " + SiFormat.Format(f.gap, "m") + " gap in air, " + SiFormat.Format(f.breakdown, "V")
                + " (in a flammable atmosphere, hazardous-area rules govern any spark)");
    }
}
