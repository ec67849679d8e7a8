using InductionHazard.Criteria;

namespace InductionHazard.Assessment.Checks;

/// <summary>One hazard mechanism's check of a response against a policy.</summary>
public interface IHazardCheck
{
    /// <summary>The mechanism checked.</summary>
    HazardMechanism Mechanism { get; }

    /// <summary>Checks the response; never throws for a physical result, returns Indeterminate instead.</summary>
    MechanismResult Evaluate(InductionResponse response, HazardPolicy policy);
}
