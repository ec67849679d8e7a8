namespace InductionHazard.Assessment;

/// <summary>A model assumption that does not hold for a scenario, and the results it makes untrustworthy.</summary>
public sealed class ValidityIssue
{
    /// <summary>Creates the issue.</summary>
    public ValidityIssue(string reason, AffectedResults affects)
    {
        Reason = reason;
        Affects = affects;
    }

    /// <summary>What does not hold, in words.</summary>
    public string Reason { get; }

    /// <summary>The results it affects.</summary>
    public AffectedResults Affects { get; }

    /// <summary>The reason.</summary>
    public override string ToString() => Reason;
}
