namespace InductionHazard.Errors;

/// <summary>A data file (a capture, a field map, a site file) that cannot be read, naming the file, the line and what was wrong.</summary>
public sealed class DataFileException : InductionHazardException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="path">The file.</param>
    /// <param name="line">The 1-based line at fault; null for the file as a whole.</param>
    /// <param name="reason">What is wrong.</param>
    /// <param name="errorId">The stable id ("InvalidCapture", "InvalidFieldMap", "InvalidSiteFile").</param>
    public DataFileException(string path, int? line, string reason, string errorId)
        : base(path + (line is { } l ? ", line " + l.ToString(System.Globalization.CultureInfo.InvariantCulture) : string.Empty) + ": " + reason)
    {
        Path = path;
        Line = line;
        Reason = reason;
        ErrorId = errorId;
    }

    /// <summary>The file.</summary>
    public string Path { get; }

    /// <summary>The line at fault (1-based), or null.</summary>
    public int? Line { get; }

    /// <summary>What is wrong.</summary>
    public string Reason { get; }

    /// <inheritdoc />
    public override string ErrorId { get; }
}
