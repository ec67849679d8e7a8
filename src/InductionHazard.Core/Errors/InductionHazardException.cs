using System;

namespace InductionHazard.Errors;

/// <summary>
/// The base of the module's exceptions: an input the module cannot use. Each subclass has a stable
/// <see cref="ErrorId"/> that the PowerShell layer puts on its ErrorRecord.
/// </summary>
public abstract class InductionHazardException : Exception
{
    /// <summary>Creates the exception with its message.</summary>
    protected InductionHazardException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with its message and cause.</summary>
    protected InductionHazardException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>A stable identifier of the kind of error, for scripts and tests.</summary>
    public abstract string ErrorId { get; }
}
