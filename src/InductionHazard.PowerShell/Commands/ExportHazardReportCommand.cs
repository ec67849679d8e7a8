using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Management.Automation;
using InductionHazard.Assessment;
using InductionHazard.Errors;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Reporting;

namespace InductionHazard.PowerShell.Commands;

/// <summary>
/// Export-HazardReport: writes the assessments from the pipeline as one report a committee can file (HTML), or as
/// Markdown, CSV or JSON; through ShouldProcess, atomically, and never over an existing file without -Force.
/// </summary>
[Cmdlet(VerbsData.Export, "HazardReport", SupportsShouldProcess = true)]
[OutputType(typeof(FileInfo))]
public sealed class ExportHazardReportCommand : PSCmdlet
{
    private readonly List<InductionAssessment> _assessments = new();

    /// <summary>The report file; its extension (.html, .md, .csv, .json) names the format unless -Format does.</summary>
    [Parameter(Mandatory = true, Position = 0)]
    public string Path { get; set; } = string.Empty;

    /// <summary>The assessments, from Test-InductionHazard.</summary>
    [Parameter(Mandatory = true, ValueFromPipeline = true)]
    public InductionAssessment[] InputObject { get; set; } = null!;

    /// <summary>The format: Html, Markdown, Csv or Json; by default the one the file's extension names.</summary>
    [Parameter]
    public ReportFormat? Format { get; set; }

    /// <summary>The report's title; by default "Induction hazard assessment" and the site's name.</summary>
    [Parameter]
    public string? Title { get; set; }

    /// <summary>The site's name (or a site from Import-HazardSite), shown in the report's heading.</summary>
    [Parameter]
    public string? Site { get; set; }

    /// <summary>The errors of rows that could not be assessed (from -ErrorVariable): listed in the report, so that no inventory row is lost from it.</summary>
    [Parameter]
    [AllowEmptyCollection]
    public ErrorRecord[]? NotAssessed { get; set; }

    /// <summary>JSON only: every point of each time series, not just its summary.</summary>
    [Parameter]
    public SwitchParameter IncludeSeries { get; set; }

    /// <summary>Replaces an existing file.</summary>
    [Parameter]
    public SwitchParameter Force { get; set; }

    /// <summary>Writes the report file's FileInfo to the pipeline.</summary>
    [Parameter]
    public SwitchParameter PassThru { get; set; }

    /// <inheritdoc />
    protected override void ProcessRecord() => _assessments.AddRange(InputObject.Where(a => a is not null));

    /// <inheritdoc />
    protected override void EndProcessing()
    {
        string file = SessionState.Path.GetUnresolvedProviderPathFromPSPath(Path);
        ReportFormat format = Format ?? ReportFile.FormatOf(file)
            ?? throw Terminate("ReportFormatUnknown", ErrorCategory.InvalidArgument, "-Path '" + Path + "' has no extension that names a format (.html, .md, .csv, .json); give one or -Format");
        string[] failures = (NotAssessed ?? Array.Empty<ErrorRecord>()).Where(e => e is not null).Select(e => e.Exception?.Message ?? e.ToString()).ToArray();
        if (_assessments.Count == 0 && failures.Length == 0)
        {
            throw Terminate("ReportEmpty", ErrorCategory.InvalidData, "no assessments came through the pipeline, so no report was written (an empty report would read as a clean audit)");
        }

        if (File.Exists(file) && !Force)
        {
            throw Terminate("ReportExists", ErrorCategory.ResourceExists, "'" + file + "' exists; give -Force to replace it, or another -Path");
        }

        if (!ShouldProcess(file, "Write the " + format + " hazard report of " + _assessments.Count + " assessments"))
        {
            return;
        }

        try
        {
            var report = new HazardReport(_assessments, Title, Site, DateTime.UtcNow, failures);
            ReportFile.Write(report, format, file, overwrite: Force, IncludeSeries);
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Path));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            ThrowTerminatingError(new ErrorRecord(ex, "ReportWriteFailed", ErrorCategory.WriteError, file));
        }

        if (PassThru)
        {
            WriteObject(new FileInfo(file));
        }
    }

    private PipelineStoppedException Terminate(string id, ErrorCategory category, string message)
    {
        ThrowTerminatingError(new ErrorRecord(new InvalidOperationException("Export-HazardReport: " + message + "."), id, category, Path));
        return new PipelineStoppedException();
    }
}
