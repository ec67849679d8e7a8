using InductionHazard.Quantities;

namespace InductionHazard.Errors;

/// <summary>A value that is not a quantity of the expected kind: bad number, unknown unit or wrong dimension.</summary>
public sealed class QuantityFormatException : InductionHazardException
{
    /// <summary>Creates the exception.</summary>
    public QuantityFormatException(string message, string inputText, QuantityKind expected)
        : base(message)
    {
        InputText = inputText;
        Expected = expected;
    }

    /// <summary>The input as it was given.</summary>
    public string InputText { get; }

    /// <summary>The kind of quantity that was expected.</summary>
    public QuantityKind Expected { get; }

    /// <inheritdoc />
    public override string ErrorId => "InvalidQuantity";
}
