namespace InductionHazard.Errors;

/// <summary>One thing wrong with one field of a data record.</summary>
public sealed class FieldError
{
    /// <summary>Creates the error.</summary>
    public FieldError(string field, string message, string errorId)
    {
        Field = field;
        Message = message;
        ErrorId = errorId;
    }

    /// <summary>The field (column) name, in the module's spelling.</summary>
    public string Field { get; }

    /// <summary>What is wrong, without the field name.</summary>
    public string Message { get; }

    /// <summary>The error id of the underlying error.</summary>
    public string ErrorId { get; }

    /// <summary>"Field: message".</summary>
    public override string ToString() => Field + ": " + Message;
}
