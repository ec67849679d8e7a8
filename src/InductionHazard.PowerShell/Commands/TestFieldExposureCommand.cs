using System;
using System.Management.Automation;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Test-FieldExposure: a person's own exposure to a source's field at points, against the ICNIRP limits.</summary>
[Cmdlet(VerbsDiagnostic.Test, "FieldExposure")]
[OutputType(typeof(FieldExposure))]
public sealed class TestFieldExposureCommand : PSCmdlet
{
    private FieldSource _source = null!;

    /// <summary>The field source, from New-FieldSource; several sources sum into one.</summary>
    [Parameter(Mandatory = true, Position = 0)]
    public FieldSource[] Source { get; set; } = null!;

    /// <summary>The points where a person stands or reaches, as x,y,z lengths ('0, 300 mm, 0'; bare numbers in metres); the origin by default.</summary>
    [Parameter(Position = 1, ValueFromPipeline = true)]
    [Vector(QuantityKind.Length, Many = true)]
    public Vector3D[] Position { get; set; } = { Vector3D.Zero };

    /// <summary>Judge against the general public's limits instead of the occupational ones (as a policy whose ExposureGroup is Public does).</summary>
    [Parameter]
    public SwitchParameter Public { get; set; }

    /// <summary>The safety factor between Clear and Caution, the static limit for workers and whose limits apply (ExposureGroup): a policy from Get-HazardPolicy, a policy file's path, or a table of policy values; by default the published one.</summary>
    [Parameter]
    [Policy]
    public HazardPolicy? Policy { get; set; }

    /// <inheritdoc />
    protected override void BeginProcessing()
    {
        try
        {
            _source = FieldSource.Combine(Source);
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, null));
        }
    }

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        foreach (Vector3D point in Position)
        {
            try
            {
                FieldExposure exposure = FieldExposure.At(_source, point, Public.IsPresent || Policy?.ExposureGroup == ExposureGroup.Public, Policy ?? HazardPolicy.Default);
                if (exposure.Verdict == Verdict.Indeterminate)
                {
                    WriteWarning("position " + point + ": " + exposure.Finding);
                }

                WriteObject(exposure);
            }
            catch (FieldEvaluationException ex)
            {
                WriteError(ErrorRecords.From(new InvalidInputException("Position", ex.Message), point, "position " + point));
            }
        }
    }
}
