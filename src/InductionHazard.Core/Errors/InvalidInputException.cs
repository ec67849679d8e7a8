namespace InductionHazard.Errors;

/// <summary>An input that parsed but cannot be used: out of range, inconsistent or missing.</summary>
public sealed class InvalidInputException : InductionHazardException
{
    /// <summary>Creates the exception for a named input.</summary>
    /// <param name="field">The parameter or data field, as the user names it (for example "Diameter").</param>
    /// <param name="reason">What is wrong, as a sentence fragment that follows the field name.</param>
    public InvalidInputException(string field, string reason)
        : base(field + ": " + reason)
    {
        Field = field;
        Reason = reason;
    }

    /// <summary>The parameter or data field at fault.</summary>
    public string Field { get; }

    /// <summary>What is wrong with it.</summary>
    public string Reason { get; }

    /// <inheritdoc />
    public override string ErrorId => "InvalidInput";
}
