using System.Management.Automation;
using InductionHazard.Assessment;
using InductionHazard.Errors;
using InductionHazard.PowerShell.Binding;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Import-HazardSite: reads a site file (a PowerShell data file, read as data: no code runs) into its stations.</summary>
[Cmdlet(VerbsData.Import, "HazardSite")]
[OutputType(typeof(HazardSite))]
public sealed class ImportHazardSiteCommand : PSCmdlet
{
    /// <summary>The site file (.psd1): Site, and Stations with Name, Sources, Position, Normal, ExposureTime, LeaveTime, Description.</summary>
    [Parameter(Mandatory = true, Position = 0, ValueFromPipelineByPropertyName = true)]
    [Alias("FullName")]
    public string Path { get; set; } = string.Empty;

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        string file = SessionState.Path.GetUnresolvedProviderPathFromPSPath(Path);
        try
        {
            WriteObject(SiteReader.Read(DataFile.Read(file, SiteReader.ErrorId), file));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Path));
        }
    }
}
