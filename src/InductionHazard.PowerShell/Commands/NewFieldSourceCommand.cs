using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.PowerShell.Commands;

/// <summary>New-FieldSource: a magnetic field source driven by a waveform.</summary>
[Cmdlet(VerbsCommon.New, "FieldSource", DefaultParameterSetName = UniformSet)]
[OutputType(typeof(FieldSource))]
public sealed class NewFieldSourceCommand : PSCmdlet
{
    private const string UniformSet = "Uniform";

    /// <summary>Makes a uniform field whose flux density follows the waveform (in tesla).</summary>
    [Parameter(Mandatory = true, ParameterSetName = UniformSet)]
    public SwitchParameter Uniform { get; set; }

    /// <summary>The drive in time, from New-FieldWaveform.</summary>
    [Parameter(Mandatory = true, ValueFromPipeline = true)]
    public FieldWaveform Waveform { get; set; } = null!;

    /// <summary>The direction of the field for a positive drive, as x,y,z or an axis name ('z', '-x'); +z by default.</summary>
    [Parameter(ParameterSetName = UniformSet)]
    [Vector]
    public Vector3D Direction { get; set; } = Vector3D.UnitZ;

    /// <summary>The source's name, shown in assessments and reports.</summary>
    [Parameter]
    [ValidateNotNullOrEmpty]
    public string Name { get; set; } = "uniform field";

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        try
        {
            WriteObject(FieldSource.Uniform(Name, Waveform, Direction));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Waveform));
        }
    }
}
