using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Torque: the peak torque on the item's induced magnetic moment, |m x B|, against the gravitational torque of the
/// item about its centre, m g L / 2 with L its largest dimension: the comparison ASTM F2213 makes for magnetically
/// induced torque (the L / 2 lever is the worst case of an item pivoting at its centre; from memory of the
/// standard's method). A ferromagnetic item's twist is that of its magnetisation, bounded by V M |B| (the induced
/// moment does not apply to it). A fixed item's torque is taken by its mounting.
/// </summary>
public sealed class TorqueCheck : IHazardCheck
{
    private static readonly string[] Sources = { Standards.TorqueAgainstGravity };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Torque;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (response.Item.IsSplit)
        {
            return MechanismResult.NotApplicable(Mechanism, "open loop: no current flows, so no torque acts on it");
        }

        if (response.Item.Contact == ContactKind.Fixed)
        {
            return MechanismResult.NotApplicable(Mechanism, "fixed item: its mounting takes the torque");
        }

        // A ferromagnetic item's twist is that of its magnetisation (bounded by V M |B|), which needs the field only.
        bool magnetised = response.Item.Material.IsFerromagnetic;
        var issues = response.IssuesAffecting(magnetised ? AffectedResults.Field : AffectedResults.Current);
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, Sources, issues);
        }

        // Placed without a normal, the item may sit turned from the orientation the engine chose: its torque is judged
        // at the worst turn where that exceeds the torque as placed (which is nil facing a field of one direction).
        double placed = response.PeakTorqueNewtonMeters;
        bool turned = response.PeakTorqueTurnedNewtonMeters is { } t && !(t <= placed);
        double torque = turned ? response.PeakTorqueTurnedNewtonMeters!.Value : placed;
        if (torque == 0)
        {
            return MechanismResult.NotApplicable(Mechanism, magnetised
                ? "a sphere of soft ferromagnetic material has no preferred axis, so the field does not twist it"
                : "the item's induced moment lies along the field, so it feels no torque");
        }

        double gravitational = response.MassKilograms * PhysicalConstants.StandardGravity * response.Item.Loop.LargestDimensionMeters / 2;
        double margin = VerdictRules.Margin(gravitational, torque);
        return MechanismResult.Judged(
            Mechanism, turned ? "peak torque, the item turned" : "peak torque", torque, gravitational, "N·m", margin, policy.SafetyFactor, Sources, (magnetised, torque, gravitational, turned, placed),
            static f => (f.magnetised ? "twist of its magnetisation, at most V M |B| = " : "peak torque ") + SiFormat.Format(f.torque, "N·m")
                + (f.turned ? " with the item turned from the orientation that links the largest flux change (its orientation not given; " + SiFormat.Format(f.placed, "N·m") + " as placed)" : string.Empty)
                + " against the gravitational torque m g L/2 = " + SiFormat.Format(f.gravitational, "N·m"));
    }
}
