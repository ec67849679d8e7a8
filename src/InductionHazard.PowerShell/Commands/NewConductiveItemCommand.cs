using System;
using System.Collections.Generic;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Items;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Commands;

/// <summary>New-ConductiveItem: a ring, band, loop or solid body, from parameters or from data rows.</summary>
[Cmdlet(VerbsCommon.New, "ConductiveItem", DefaultParameterSetName = ParametersSet)]
[OutputType(typeof(ConductiveItem))]
public sealed class NewConductiveItemCommand : PSCmdlet
{
    private const string ParametersSet = "Parameters";
    private const string InputObjectSet = "InputObject";
    private MaterialLibrary _materials = MaterialLibrary.BuiltIn;
    private int _row;
    private IReadOnlyDictionary<string, string>? _units;

    /// <summary><see cref="ReadOne"/> as a delegate, made once rather than on every row.</summary>
    private Action<PSObject?>? _readOne;

    /// <summary>The item's name as it appears in assessments.</summary>
    [Parameter(ParameterSetName = ParametersSet, Position = 0)]
    public string? Name { get; set; }

    /// <summary>The shape: Ring (a round-wire ring or a band) or RectangularLoop (-Width x -Height of round wire), closed or split (-Gap); or a solid body: Disc (-Diameter -Thickness), Cylinder (-Diameter -Length), Tube (-Diameter -WallThickness -Length [-ClosedEnds]), Sphere (-Diameter), Plate (-Width -Height -Thickness) or Bar (-Width -Height -Length).</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    public ItemShape Shape { get; set; } = ItemShape.Ring;

    /// <summary>The material: a built-in name ('Gold', 'SS304'), a hashtable defining one, or a material from Get-ConductorMaterial.</summary>
    [Parameter(Mandatory = true, ParameterSetName = ParametersSet)]
    [Material]
    [ArgumentCompleter(typeof(MaterialCompleter))]
    public ConductorMaterial Material { get; set; } = null!;

    /// <summary>The loop's mean diameter (the centre line of the wire or band), for example '20 mm'; a body's outside diameter.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? Diameter { get; set; }

    /// <summary>The inner diameter, as jewellers size rings; the mean diameter adds the wire diameter or band thickness.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? InnerDiameter { get; set; }

    /// <summary>The diameter of a round wire.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? WireDiameter { get; set; }

    /// <summary>The width of a band, along the ring's axis; for a rectangular loop, one side of its centre line.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? Width { get; set; }

    /// <summary>The radial thickness of a band; the thickness of a Disc.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? Thickness { get; set; }

    /// <summary>The height of a rectangular loop (the side across -Width), on the wire's centre line.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? Height { get; set; }

    /// <summary>The length of a Cylinder or Tube along its axis.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? Length { get; set; }

    /// <summary>The wall thickness of a Tube.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? WallThickness { get; set; }

    /// <summary>A Tube closed by end walls of its wall thickness (a gas cylinder's shell).</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    public SwitchParameter ClosedEnds { get; set; }

    /// <summary>The width of the gap of a split ring; omit or 0 for a closed ring.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Quantity(QuantityKind.Length)]
    public double? Gap { get; set; }

    /// <summary>How a person touches the item: Skin (worn, the default), Held, Free or Fixed; or as people say it: Worn, Carried, Loose, Installed.</summary>
    [Parameter(ParameterSetName = ParametersSet)]
    [Contact]
    public ContactKind Contact { get; set; } = ContactKind.Skin;

    /// <summary>Data rows (Import-Csv output, hashtables) with columns Name, Shape, Material, Diameter or InnerDiameter, WireDiameter or Width and Thickness, Gap, Contact.</summary>
    /// <remarks>One object as the shell binds it from the pipeline; several given at once arrive as one collection and are taken in turn (<see cref="ItemInput.ForEachGiven"/>), a $null its row's error.</remarks>
    [Parameter(Mandatory = true, ValueFromPipeline = true, ParameterSetName = InputObjectSet)]
    [AllowNull]
    [AllowEmptyCollection]
    public PSObject? InputObject { get; set; }

    /// <summary>The unit of the bare numbers in data rows, by column, where the headers do not name it: @{ Diameter = 'mm' }.</summary>
    [Parameter(ParameterSetName = InputObjectSet)]
    public System.Collections.Hashtable? Unit { get; set; }

    /// <summary>Materials that data rows may name besides the built-in ones (hashtables or materials).</summary>
    [Parameter(ParameterSetName = InputObjectSet)]
    [Material]
    public ConductorMaterial[]? AdditionalMaterial { get; set; }

    /// <summary>Accept item sizes outside those of things people wear, carry or install (a cable loop 50 m across), which are otherwise refused as likely unit slips.</summary>
    [Parameter]
    public SwitchParameter AcceptUnusualSize { get; set; }

    /// <inheritdoc />
    protected override void BeginProcessing()
    {
        _units = ItemInput.UnitsOf(Unit);
        if (AdditionalMaterial is { Length: > 0 })
        {
            _materials = MaterialLibrary.BuiltIn.With(AdditionalMaterial);
        }
    }

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        if (ParameterSetName == ParametersSet)
        {
            try
            {
                WriteObject(ItemRecordReader.Read(BoundValues(), _materials, acceptUnusualSize: AcceptUnusualSize.IsPresent));
            }
            catch (InductionHazardException ex)
            {
                ThrowTerminatingError(ErrorRecords.From(ex, null));
            }

            return;
        }

        ItemInput.ForEachGiven(InputObject, _readOne ??= ReadOne);
    }

    /// <summary>One row or item: its item written, or an error naming the row.</summary>
    private void ReadOne(PSObject? given)
    {
        _row++;

        // A $null (an empty line, a missing object) is that row's error, not the shell's binding error.
        PSObject input = given ?? new PSObject(string.Empty);
        try
        {
            if (given is null || given.BaseObject is null)
            {
                throw ItemInput.NothingGiven(ItemInput.Label(input, _row));
            }

            WriteObject(ItemInput.ToItem(input, _materials, _row, _units, AcceptUnusualSize.IsPresent));
        }
        catch (InductionHazardException ex)
        {
            WriteError(ErrorRecords.From(ex, input, ItemInput.Label(input, _row)));
        }
        catch (Exception ex) when (ErrorRecords.IsRecordFailure(ex))
        {
            WriteError(ErrorRecords.Unexpected(ex, input, ItemInput.Label(input, _row)));
        }
    }

    private Dictionary<string, object?> BoundValues()
    {
        var values = new Dictionary<string, object?>();
        foreach (KeyValuePair<string, object> pair in MyInvocation.BoundParameters)
        {
            values[pair.Key] = pair.Value is SwitchParameter s ? s.IsPresent : pair.Value;
        }

        return values;
    }
}
