namespace InductionHazard.Errors;

/// <summary>
/// The field or flux of a source cannot be given at a place: the point is on or inside a conductor, outside a
/// field map, or too close to a source for its model or for the flux quadrature to hold.
/// </summary>
public sealed class FieldEvaluationException : InductionHazardException
{
    /// <summary>Creates the exception with the reason.</summary>
    public FieldEvaluationException(string reason)
        : base(reason)
    {
    }

    /// <inheritdoc />
    public override string ErrorId => "FieldNotEvaluable";
}
