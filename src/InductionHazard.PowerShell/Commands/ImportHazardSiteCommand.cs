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
    /// <summary>The site file (.psd1): Site, Stations with Name, Sources, Position, Normal, ExposureTime, LeaveTime, Description and Policy (the station's own, over the site's), and optionally Policy (a table, or a policy file's path).</summary>
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
            ReadPolicyFile(data, file, "its Policy file");
            object? stations = data["Stations"];
            foreach (object? station in stations is System.Collections.IList list ? list : new[] { stations })
            {
                if (station is System.Collections.IDictionary table)
                {
                    ReadPolicyFile(table, file, "station '" + table["Name"] + "', its Policy file");
                }
            }

            WriteObject(SiteReader.Read(data, file));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Path));
        }
    }

    /// <summary>Replaces a table's Policy that names a policy file (relative to the site file's folder) with the file's values.</summary>
    private static void ReadPolicyFile(System.Collections.IDictionary table, string siteFile, string what)
    {
        if (table["Policy"] is string policyPath)
        {
            string folder = System.IO.Path.GetDirectoryName(siteFile) ?? ".";
            string policyFile = System.IO.Path.Combine(folder, policyPath);
            try
            {
                table["Policy"] = DataFile.Read(policyFile, PolicyReader.ErrorId);
            }
            catch (DataFileException ex)
            {
                throw new DataFileException(siteFile, null, what + ": " + ex.Message, SiteReader.ErrorId);
            }
        }
    }
}
