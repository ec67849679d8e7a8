using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Force: the peak force on the item's induced currents in the source's field gradient against the item's own
/// weight m g, the criterion of ASTM F2052 (a force below the weight moves an item no more than gravity does); for an
/// item moved through the field, the braking force too, whichever is larger. A fixed item's force is taken by its
/// mounting; a uniform field exerts no net force.
/// </summary>
public sealed class ForceCheck : IHazardCheck
{
    private static readonly string[] Sources = { Standards.ForceAgainstWeight };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Force;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (response.Item.IsSplit)
        {
            return MechanismResult.NotApplicable(Mechanism, "open loop: no current flows, so no force acts on it");
        }

        if (response.Item.Contact == ContactKind.Fixed)
        {
            return MechanismResult.NotApplicable(Mechanism, response.PeakForceNewtons, static force => "fixed item: its mounting takes the force (" + SiFormat.Format(force, "N") + " at peak); check the mounting's rating");
        }

        var issues = response.IssuesAffecting(AffectedResults.Current);
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, Sources, issues);
        }

        double braking = response.BrakingForceNewtons ?? 0;
        double force = System.Math.Max(response.PeakForceNewtons, braking);
        if (force == 0)
        {
            return MechanismResult.NotApplicable(Mechanism, "the field has no gradient over the item (uniform), so the induced currents feel no net force");
        }

        double weight = response.MassKilograms * PhysicalConstants.StandardGravity;
        double margin = VerdictRules.Margin(weight, force);

        // A site's launch-speed limit, for a loose item, where the launch speed is known: the smaller margin governs.
        if (response.Item.Contact == ContactKind.Free && !double.IsNaN(policy.LaunchSpeedLimit) && response.LaunchSpeedMetersPerSecond is { } launch
            && VerdictRules.Margin(policy.LaunchSpeedLimit, launch) < margin)
        {
            return MechanismResult.Judged(
                Mechanism, "launch speed of the loose item", launch, policy.LaunchSpeedLimit, "m/s", VerdictRules.Margin(policy.LaunchSpeedLimit, launch), policy.SafetyFactor,
                new[] { Standards.ForceAgainstWeight, policy.SourceOf("LaunchSpeedLimit") }, (launch, policy.LaunchSpeedLimit, force, weight),
                static f => "a loose item would leave at " + SiFormat.Format(f.launch, "m/s") + " against the site's limit " + SiFormat.Format(f.LaunchSpeedLimit, "m/s")
                    + " (peak force " + SiFormat.Format(f.force, "N") + " against its weight " + SiFormat.Format(f.weight, "N") + ")");
        }

        return MechanismResult.Judged(
            Mechanism, braking > response.PeakForceNewtons ? "braking force" : "peak force", force, weight, "N", margin, policy.SafetyFactor, Sources, (response, braking, weight),
            static f => (f.braking > f.response.PeakForceNewtons
                    ? "braking force " + SiFormat.Format(f.braking, "N") + " against the motion (equal to the weight at " + SiFormat.Format(f.response.SpeedForWeightMetersPerSecond ?? double.NaN, "m/s") + ")"
                    : "peak force " + SiFormat.Format(f.response.PeakForceNewtons, "N") + " along " + Directions.Describe(f.response.PeakForceDirection))
                + " against the item's weight " + SiFormat.Format(f.weight, "N")
                + (f.response.LaunchSpeedMetersPerSecond is { } v ? "; a loose item would leave at " + SiFormat.Format(v, "m/s") : string.Empty));
    }
}
