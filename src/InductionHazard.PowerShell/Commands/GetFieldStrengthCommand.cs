using System;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Get-FieldStrength: a source's field at points: peak |B|, peak |dB/dt|, the field vector at the peak, the governing frequency.</summary>
[Cmdlet(VerbsCommon.Get, "FieldStrength", DefaultParameterSetName = PositionSet)]
[OutputType(typeof(FieldStrength))]
public sealed class GetFieldStrengthCommand : PSCmdlet
{
    private const string PositionSet = "Position";
    private const string InputObjectSet = "InputObject";
    private FieldSource _source = null!;
    private int _row;

    /// <summary>The field source, from New-FieldSource; several sources sum into one.</summary>
    [Parameter(Mandatory = true, Position = 0)]
    public FieldSource[] Source { get; set; } = null!;

    /// <summary>The points, as x,y,z lengths ('0, 300 mm, 0'; bare numbers in metres).</summary>
    [Parameter(Mandatory = true, Position = 1, ParameterSetName = PositionSet)]
    [Vector(QuantityKind.Length, Many = true)]
    public Vector3D[] Position { get; set; } = Array.Empty<Vector3D>();

    /// <summary>Rows with X, Y, Z columns (Import-Csv output, hashtables), one result per row; or points themselves, as Test-FieldExposure takes them ('0, 300 mm, 0').</summary>
    /// <remarks>One object as the shell binds it from the pipeline; several given at once arrive as one collection and are taken in turn (<see cref="ItemInput.ForEachGiven"/>), a $null its row's error.</remarks>
    [Parameter(Mandatory = true, ValueFromPipeline = true, ParameterSetName = InputObjectSet)]
    [AllowNull]
    [AllowEmptyCollection]
    public PSObject? InputObject { get; set; }

    /// <summary>The unit of bare numbers in the rows' X, Y, Z where the headers do not name it: @{ X = 'mm'; Y = 'mm'; Z = 'mm' }.</summary>
    [Parameter(ParameterSetName = InputObjectSet)]
    public System.Collections.Hashtable? Unit { get; set; }

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
        if (ParameterSetName == PositionSet)
        {
            foreach (Vector3D point in Position)
            {
                Write(point, point, "position " + point);
            }

            return;
        }

        ItemInput.ForEachGiven(InputObject, ReadOne);
    }

    /// <summary>One row or point: its field written, or an error naming the row.</summary>
    private void ReadOne(PSObject? input)
    {
        _row++;
        string label = "row " + _row;
        try
        {
            if (input is null || input.BaseObject is null)
            {
                throw ItemInput.NothingGiven(label);
            }

            Write(PointInput.Of(input, label, Unit), input, label);
        }
        catch (InductionHazardException ex)
        {
            WriteError(ErrorRecords.From(ex, input, label));
        }
    }

    private void Write(Vector3D point, object target, string label)
    {
        try
        {
            WriteObject(FieldStrength.At(_source, point));
        }
        catch (FieldEvaluationException ex)
        {
            WriteError(ErrorRecords.From(new InvalidInputException("Position", ex.Message), target, label));
        }
    }
}
