using System.Management.Automation;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.PowerShell.Binding;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Test-InductionHazard: a verdict for each item at a place (Clear, Caution, Hazard or Indeterminate), with margins per mechanism.</summary>
[Cmdlet(VerbsDiagnostic.Test, "InductionHazard", DefaultParameterSetName = SourceSet)]
[OutputType(typeof(InductionAssessment))]
public sealed class TestInductionHazardCommand : ItemPipelineCommand
{
    /// <summary>The limits and safety factor: a policy from Get-HazardPolicy, a policy file's path, or a table of policy values; by default, with -Site, the policy of the row's station (its own over the site's), else the published limits.</summary>
    [Parameter]
    [Policy]
    public HazardPolicy? Policy { get; set; }

    /// <inheritdoc />
    protected override void BeginProcessing()
    {
        base.BeginProcessing();
        if (Policy is not null && AtSite)
        {
            // -Policy replaces a station's own policy too: a visitors' station would otherwise lose its public limits unseen.
            foreach (Station station in Site.Stations)
            {
                if ((Station is null || ReferenceEquals(Site.Find(Station), station)) && StationPolicy.Replaced(station, Policy) is { } replaced)
                {
                    WriteWarning(replaced);
                }
            }
        }
    }

    /// <inheritdoc />
    protected override object Compute(InductionResponse response, int row) =>
        HazardAssessor.Assess(response, Policy ?? (AtSite ? Site.PolicyAt(response.Scenario.StationName!) : null) ?? HazardPolicy.Default, row);

    /// <inheritdoc />
    protected override object Relabel(object first, InductionResponse response, int row) =>
        ((InductionAssessment)first).For(response, row);

    /// <inheritdoc />
    protected override void Emit(object result)
    {
        var assessment = (InductionAssessment)result;
        if (assessment.Verdict == Verdict.Indeterminate)
        {
            WriteWarning(assessment.ItemName + ": Indeterminate: " + string.Join("; ", assessment.Reasons));
        }

        if (StationPolicy.WearerNotApplied(assessment.ItemName, assessment.Response.Scenario.WearerGroup, assessment.ExposureGroup, assessment.PolicyName) is { } notApplied)
        {
            WriteWarning(notApplied);
        }

        // The inventory's own columns also as properties of the output, so that Select-Object AssetTag and Export-Csv see them;
        // a column named like one of the assessment's own properties stays in Inventory only.
        var output = PSObject.AsPSObject(assessment);
        foreach (System.Collections.Generic.KeyValuePair<string, string> column in assessment.Inventory)
        {
            if (output.Properties[column.Key] is null)
            {
                output.Properties.Add(new PSNoteProperty(column.Key, column.Value));
            }
        }

        WriteObject(output);
    }
}
