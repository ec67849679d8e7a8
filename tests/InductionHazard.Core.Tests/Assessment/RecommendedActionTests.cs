using System;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Items;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>
/// The action's wording where a Hazard stands beside mechanisms that could not be judged. These check a rule of the
/// module (common practice: a remedy for one hazard is not leave to use an item whose other hazards are unknown), not
/// physics against an outside source.
/// </summary>
public sealed class RecommendedActionTests
{
    private static readonly string[] Sources = { "test" };

    private static MechanismResult Force(double margin) =>
        MechanismResult.Judged(HazardMechanism.Force, "peak force", 1.0 / margin, 1.0, "N", margin, 2.0, Sources, "peak force against its weight");

    private static MechanismResult Unknown(HazardMechanism mechanism) =>
        MechanismResult.Indeterminate(mechanism, Sources, new[] { new ValidityIssue("its orientation is not given", AffectedResults.Heating) });

    [Fact]
    public void AForceHazardBesideUnjudgedHeatingDoesNotOfferFixingDownAlone()
    {
        MechanismResult force = Force(0.24);
        MechanismResult[] applicable = { Unknown(HazardMechanism.Burn), Unknown(HazardMechanism.Overheat), force };
        string unjudged = RecommendedAction.Unjudged(Verdict.Hazard, applicable, force, ContactKind.Free);
        string action = RecommendedAction.For(Verdict.Hazard, force, HazardPolicy.Default, ContactKind.Free, othersUnjudged: unjudged.Length > 0) + unjudged;
        Assert.Equal("Keep it out of this place: the field would push or throw it. Not judged: Burn, Overheat (see the findings): fixing it down would not answer them; keep it out until they are assessed another way (measured, or by a specialist).", action);
        Assert.StartsWith("Keep it out of this place, or fix it down", RecommendedAction.For(Verdict.Hazard, force, HazardPolicy.Default, ContactKind.Free), StringComparison.Ordinal);
        Assert.Equal("Keep it out", RecommendedAction.Brief(Verdict.Hazard, force, ContactKind.Free, applicable));

        // Every mechanism judged: fixing it down is offered, and nothing is added.
        MechanismResult[] judged = { force };
        Assert.Equal(string.Empty, RecommendedAction.Unjudged(Verdict.Hazard, judged, force, ContactKind.Free));
        Assert.Equal("Keep out or fix down", RecommendedAction.Brief(Verdict.Hazard, force, ContactKind.Free, judged));
    }

    [Fact]
    public void AWornItemsHazardBesideUnjudgedHeatingAsksForThemToBeAssessedBeforeItIsAllowed()
    {
        MechanismResult force = Force(0.5);
        MechanismResult[] applicable = { Unknown(HazardMechanism.Burn), force };
        string added = RecommendedAction.Unjudged(Verdict.Hazard, applicable, force, ContactKind.Skin);
        Assert.Equal(" Not judged: Burn (see the findings); assess them another way (measured, or by a specialist) before it is allowed here, even once the Force hazard is answered.", added);
        Assert.Equal("Take it off", RecommendedAction.Brief(Verdict.Hazard, force, ContactKind.Skin, applicable));
    }

    [Fact]
    public void WhereTheWearersExposureGovernsTheItemsOwnHazardDoesNotOfferFixingDownBesideUnjudgedMechanisms()
    {
        MechanismResult exposure = MechanismResult.Judged(HazardMechanism.Exposure, "field", 10, 1, "T", 0.1, 2.0, Sources, "the field the person holding it is in");
        MechanismResult torque = MechanismResult.Judged(HazardMechanism.Torque, "peak torque", 5, 1, "N m", 0.2, 2.0, Sources, "peak torque against the gravitational torque");
        MechanismResult[] applicable = { Unknown(HazardMechanism.Burn), Unknown(HazardMechanism.Force), torque, exposure };
        string added = RecommendedAction.ItemItself(applicable, exposure, HazardPolicy.Default, ContactKind.Held);
        Assert.Equal(" The item itself: keep it out of this place: the field would twist it hard enough to wrench it from the hand, the body or its mounting. Not judged for the item: Burn, Force (see the findings); until they are assessed another way (measured, or by a specialist), keep it out.", added);
        MechanismResult[] judged = { torque, exposure };
        Assert.StartsWith(" The item itself: keep it out of this place, or fix it down:", RecommendedAction.ItemItself(judged, exposure, HazardPolicy.Default, ContactKind.Held), StringComparison.Ordinal);
    }

    [Fact]
    public void OnlyAHazardVerdictAddsTheClause()
    {
        // An Indeterminate verdict already says to treat the item as unsafe; a Caution or Clear beside an unjudged
        // mechanism is not a verdict the module gives (it would be Indeterminate).
        MechanismResult force = Force(1.5);
        MechanismResult[] applicable = { Unknown(HazardMechanism.Burn), force };
        Assert.Equal(string.Empty, RecommendedAction.Unjudged(Verdict.Indeterminate, applicable, force, ContactKind.Free));
        Assert.Equal(string.Empty, RecommendedAction.Unjudged(Verdict.Caution, applicable, force, ContactKind.Free));
    }
}
