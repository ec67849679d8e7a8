using System.Collections.Generic;
using System.Linq;

namespace InductionHazard.Errors;

/// <summary>A data record (a CSV row, a hashtable) with one or more fields the module cannot use.</summary>
public sealed class RecordException : InductionHazardException
{
    /// <summary>Creates the exception from the field errors.</summary>
    public RecordException(string recordLabel, IReadOnlyList<FieldError> errors)
        : base(recordLabel + ": " + string.Join("; ", errors.Select(e => e.ToString())))
    {
        RecordLabel = recordLabel;
        Errors = errors;
    }

    /// <summary>What the record is called in messages, for example "row 7 ('Wedding band')".</summary>
    public string RecordLabel { get; }

    /// <summary>Every field error found in the record.</summary>
    public IReadOnlyList<FieldError> Errors { get; }

    /// <summary>The fields at fault, in the order found.</summary>
    public IEnumerable<string> Fields => Errors.Select(e => e.Field);

    /// <summary>The id of the first error when all agree, else "InvalidRecord".</summary>
    public override string ErrorId =>
        Errors.Select(e => e.ErrorId).Distinct().Count() == 1 ? Errors[0].ErrorId : "InvalidRecord";
}
