using System.Management.Automation;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.PowerShell.Binding;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Import-HazardSite: reads a site file (a PowerShell data file, read as data: no code runs) into its stations.</summary>
[Cmdlet(VerbsData.Import, "HazardSite")]
[OutputType(typeof(HazardSite))]
public sealed class ImportHazardSiteCommand : PSCmdlet
{
    /// <summary>The site file (.psd1): Site, Stations with Name, Sources, Position, Normal, ExposureTime, LeaveTime, Description, and optionally Policy (a table, or a policy file's path).</summary>
    [Parameter(Mandatory = true, Position = 0, ValueFromPipelineByPropertyName = true)]
    [Alias("FullName")]
    public string Path { get; set; } = string.Empty;

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        string file = SessionState.Path.GetUnresolvedProviderPathFromPSPath(Path);
        try
        {
            System.Collections.IDictionary data = DataFile.Read(file, SiteReader.ErrorId);
            if (data["Policy"] is string policyPath)
            {
                // A policy file named by the site file, relative to the site file's folder.
                string folder = System.IO.Path.GetDirectoryName(file) ?? ".";
                string policyFile = System.IO.Path.Combine(folder, policyPath);
                try
                {
                    data["Policy"] = DataFile.Read(policyFile, PolicyReader.ErrorId);
                }
                catch (DataFileException ex)
                {
                    throw new DataFileException(file, null, "its Policy file: " + ex.Message, SiteReader.ErrorId);
                }
            }

            WriteObject(SiteReader.Read(data, file));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Path));
        }
    }
}
