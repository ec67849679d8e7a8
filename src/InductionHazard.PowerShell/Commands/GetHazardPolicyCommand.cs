using System.Management.Automation;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.PowerShell.Binding;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Get-HazardPolicy: the limits and safety factor assessments apply, the published defaults merged with a site policy file, each with its source.</summary>
[Cmdlet(VerbsCommon.Get, "HazardPolicy")]
[OutputType(typeof(HazardPolicy))]
public sealed class GetHazardPolicyCommand : PSCmdlet
{
    /// <summary>A site policy file (.psd1, read as data); without it, the published defaults.</summary>
    [Parameter(Position = 0, ValueFromPipelineByPropertyName = true)]
    [Alias("FullName")]
    public string? Path { get; set; }

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        if (Path is null)
        {
            WriteObject(HazardPolicy.Default);
            return;
        }

        try
        {
            WriteObject(PolicyFile.Read(SessionState.Path.GetUnresolvedProviderPathFromPSPath(Path)));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Path));
        }
    }
}
