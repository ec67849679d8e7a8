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
            return MechanismResult.NotApplicable(Mechanism, "fixed item: its mounting takes the force (" + SiFormat.Format(response.PeakForceNewtons, "N") + " at peak); check the mounting's rating");
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
                new[] { Standards.ForceAgainstWeight, policy.SourceOf("LaunchSpeedLimit") },
                "a loose item would leave at " + SiFormat.Format(launch, "m/s") + " against the site's limit " + SiFormat.Format(policy.LaunchSpeedLimit, "m/s")
                + " (peak force " + SiFormat.Format(force, "N") + " against its weight " + SiFormat.Format(weight, "N") + ")");
        }

        string detail = (braking > response.PeakForceNewtons
                ? "braking force " + SiFormat.Format(braking, "N") + " against the motion (equal to the weight at " + SiFormat.Format(response.SpeedForWeightMetersPerSecond ?? double.NaN, "m/s") + ")"
                : "peak force " + SiFormat.Format(response.PeakForceNewtons, "N") + " along " + Directions.Describe(response.PeakForceDirection))
            + " against the item's weight " + SiFormat.Format(weight, "N")
            + (response.LaunchSpeedMetersPerSecond is { } v ? "; a loose item would leave at " + SiFormat.Format(v, "m/s") : string.Empty);
        return MechanismResult.Judged(Mechanism, braking > response.PeakForceNewtons ? "braking force" : "peak force", force, weight, "N", margin, policy.SafetyFactor, Sources, detail);
    }
}
