using System;
using System.Management.Automation;
using InductionHazard.Errors;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Maps the core's exceptions to ErrorRecords with stable ids, categories and the offending object.</summary>
internal static class ErrorRecords
{
    /// <summary>The error record of an input the core refused.</summary>
    public static ErrorRecord From(InductionHazardException ex, object? target, string? targetName = null)
    {
        ErrorCategory category = ex switch
        {
            UnknownMaterialException => ErrorCategory.ObjectNotFound,
            QuantityFormatException => ErrorCategory.InvalidArgument,
            RecordException => ErrorCategory.InvalidData,
            _ => ErrorCategory.InvalidArgument,
        };
        var record = new ErrorRecord(ex, ex.ErrorId, category, target);
        if (targetName is not null)
        {
            record.CategoryInfo.TargetName = targetName;
        }

        if (ex is RecordException rec)
        {
            record.ErrorDetails = new ErrorDetails(ex.Message)
            {
                RecommendedAction = "Correct the field" + (rec.Errors.Count > 1 ? "s" : string.Empty) + " named in the message and run the record again; the other records were processed.",
            };
        }

        return record;
    }

    /// <summary>
    /// True for an exception that belongs to one record and must not stop the pipeline: anything but the shell's
    /// own flow control (a stopped pipeline, a user's break) and a failure of the process itself.
    /// </summary>
    public static bool IsRecordFailure(Exception ex) =>
        ex is not (PipelineStoppedException or FlowControlException or OperationCanceledException or OutOfMemoryException or StackOverflowException);

    /// <summary>The error record of an unexpected failure while processing one record (the run goes on).</summary>
    public static ErrorRecord Unexpected(Exception ex, object? target, string label) =>
        new(new InvalidOperationException(label + ": the assessment failed unexpectedly: " + ex.Message, ex), "AssessmentFailed", ErrorCategory.NotSpecified, target);
}
