using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Attraction: the pull on a ferromagnetic item toward stronger field, V M grad|B|, against its weight (the ASTM
/// F2052 criterion: an item whose magnetic force stays below its weight is not pulled harder than gravity pulls it).
/// Where the pull beats the weight a loose item becomes a projectile. A fixed item's mounting takes the pull.
/// </summary>
public sealed class AttractionCheck : IHazardCheck
{
    private static readonly string[] Sources = { Standards.AttractionAgainstWeight, Standards.Demagnetisation };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Attraction;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (!response.Item.Material.IsFerromagnetic)
        {
            return MechanismResult.NotApplicable(Mechanism, response.Item.Material.Name + " is not ferromagnetic: no pull beyond the induced-current force");
        }

        if (response.Item.Contact == ContactKind.Fixed)
        {
            return MechanismResult.NotApplicable(Mechanism, response.AttractionForceNewtons ?? double.NaN, static pull => "fixed item: its mounting takes the pull (" + SiFormat.Format(pull, "N") + "); check the mounting's rating");
        }

        var issues = response.IssuesAffecting(AffectedResults.Field);
        if (issues.Count > 0 || response.Attraction is null)
        {
            return MechanismResult.Indeterminate(Mechanism, Sources, issues);
        }

        var pull = response.Attraction;
        if (pull.ForceNewtons == 0)
        {
            return MechanismResult.NotApplicable(Mechanism, "the field has no gradient at the item (uniform), so it is not pulled; it is still twisted (Torque)");
        }

        double weight = response.MassKilograms * PhysicalConstants.StandardGravity;
        double margin = VerdictRules.Margin(weight, pull.ForceNewtons);
        return MechanismResult.Judged(
            Mechanism, "pull", pull.ForceNewtons, weight, "N", margin, policy.SafetyFactor, Sources, (pull, weight),
            static f => "pull " + SiFormat.Format(f.pull.ForceNewtons, "N") + " toward stronger field (" + SiFormat.Format(f.pull.FieldTesla, "T") + ", gradient " + SiFormat.Format(f.pull.GradientTeslaPerMeter, "T/m")
                + ", magnetisation " + SiFormat.Format(f.pull.MagnetisationTesla, "T") + ") against the item's weight " + SiFormat.Format(f.weight, "N"));
    }
}
