using System.Management.Automation;
using InductionHazard.Assessment;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Get-InductionResponse: the physics of each item in a source's field (emf, current, heating, time series).</summary>
[Cmdlet(VerbsCommon.Get, "InductionResponse", DefaultParameterSetName = SourceSet)]
[OutputType(typeof(InductionResponse))]
public sealed class GetInductionResponseCommand : ItemPipelineCommand
{
    /// <inheritdoc />
    protected override object Compute(InductionResponse response, int row) => response;

    /// <inheritdoc />
    protected override object Relabel(object first, InductionResponse response, int row) => response;
}
