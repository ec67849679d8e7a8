using System.Linq;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.PowerShell.Commands;

/// <summary>New-FieldSource: a magnetic field source (uniform, conductor, bar, three-phase set, coil, solenoid, dipole or map) driven by a waveform.</summary>
[Cmdlet(VerbsCommon.New, "FieldSource", DefaultParameterSetName = UniformSet)]
[OutputType(typeof(FieldSource))]
public sealed class NewFieldSourceCommand : PSCmdlet
{
    private const string UniformSet = "Uniform";
    private const string ConductorSet = "Conductor";
    private const string SegmentSet = "Segment";
    private const string BusbarSet = "Busbar";
    private const string ThreePhaseSet = "ThreePhase";
    private const string CoilSet = "Coil";
    private const string SolenoidSet = "Solenoid";
    private const string DipoleSet = "Dipole";
    private const string MapSet = "Map";

    /// <summary>Makes a uniform field whose flux density follows the waveform (in tesla); the default.</summary>
    [Parameter(ParameterSetName = UniformSet)]
    public SwitchParameter Uniform { get; set; }

    /// <summary>Makes an infinitely long straight conductor along -Axis through -Center, or a segment from -Start to -End.</summary>
    [Parameter(Mandatory = true, ParameterSetName = ConductorSet)]
    [Parameter(Mandatory = true, ParameterSetName = SegmentSet)]
    public SwitchParameter Conductor { get; set; }

    /// <summary>Makes a long bar of rectangular section -Width x -Thickness along -Axis.</summary>
    [Parameter(Mandatory = true, ParameterSetName = BusbarSet)]
    public SwitchParameter Busbar { get; set; }

    /// <summary>Makes three parallel conductors driven 120 degrees apart, -Spacing apart in a flat row or a trefoil.</summary>
    [Parameter(Mandatory = true, ParameterSetName = ThreePhaseSet)]
    public SwitchParameter ThreePhase { get; set; }

    /// <summary>Makes a flat circular coil of -Radius and -Turns about -Axis.</summary>
    [Parameter(Mandatory = true, ParameterSetName = CoilSet)]
    public SwitchParameter Coil { get; set; }

    /// <summary>Makes a solenoid of -Radius, -Length and -Turns about -Axis.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SolenoidSet)]
    public SwitchParameter Solenoid { get; set; }

    /// <summary>Makes a magnetic dipole of -Moment: the far field of a compact source.</summary>
    [Parameter(Mandatory = true, ParameterSetName = DipoleSet)]
    public SwitchParameter Dipole { get; set; }

    /// <summary>A gridded field map (x, y, z, Bx, By, Bz; units in the header such as 'x (mm)', else metres and tesla), scaled so the drive is |B| at its strongest node.</summary>
    [Parameter(Mandatory = true, ParameterSetName = MapSet)]
    public string Map { get; set; } = string.Empty;

    /// <summary>The drive in time, from New-FieldWaveform: tesla for uniform and mapped fields, amperes for conductors and coils, a bare factor for a dipole.</summary>
    [Parameter(Mandatory = true, ValueFromPipeline = true)]
    public FieldWaveform Waveform { get; set; } = null!;

    /// <summary>The direction of a uniform field for a positive drive, as x,y,z or an axis name ('z', '-x'); +z by default.</summary>
    [Parameter(ParameterSetName = UniformSet)]
    [Vector]
    public Vector3D Direction { get; set; } = Vector3D.UnitZ;

    /// <summary>The direction of a conductor, bar, three-phase set, coil or solenoid (positive current flows along it, or circulates anticlockwise about it); +z by default.</summary>
    [Parameter(ParameterSetName = ConductorSet)]
    [Parameter(ParameterSetName = BusbarSet)]
    [Parameter(ParameterSetName = ThreePhaseSet)]
    [Parameter(ParameterSetName = CoilSet)]
    [Parameter(ParameterSetName = SolenoidSet)]
    [Vector]
    public Vector3D Axis { get; set; } = Vector3D.UnitZ;

    /// <summary>A point on the source's axis, or the dipole's position, as x,y,z lengths ('0, 300 mm, 0'; bare numbers in metres); the origin by default.</summary>
    [Parameter(ParameterSetName = ConductorSet)]
    [Parameter(ParameterSetName = BusbarSet)]
    [Parameter(ParameterSetName = ThreePhaseSet)]
    [Parameter(ParameterSetName = CoilSet)]
    [Parameter(ParameterSetName = SolenoidSet)]
    [Parameter(ParameterSetName = DipoleSet)]
    [Vector(QuantityKind.Length)]
    public Vector3D Center { get; set; }

    // Start and End also take a piped object's Start and End: without that, a waveform piped to -Conductor alone
    // ($w | New-FieldSource -Conductor) leaves the shell two sets it will not choose between before the pipeline
    // runs, and it refuses the command; with it, the shell waits, and a waveform (which has neither) makes a line.

    /// <summary>Where a conductor segment starts (the current enters), as x,y,z lengths.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SegmentSet, ValueFromPipelineByPropertyName = true)]
    [Vector(QuantityKind.Length)]
    public Vector3D Start { get; set; }

    /// <summary>Where a conductor segment ends (the current leaves), as x,y,z lengths.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SegmentSet, ValueFromPipelineByPropertyName = true)]
    [Vector(QuantityKind.Length)]
    public Vector3D End { get; set; }

    /// <summary>The bar's width, perpendicular to its axis ('100 mm').</summary>
    [Parameter(Mandatory = true, ParameterSetName = BusbarSet)]
    [Quantity(QuantityKind.Length)]
    public double Width { get; set; }

    /// <summary>The bar's thickness ('10 mm').</summary>
    [Parameter(Mandatory = true, ParameterSetName = BusbarSet)]
    [Quantity(QuantityKind.Length)]
    public double Thickness { get; set; }

    /// <summary>The distance between neighbouring conductors of a three-phase set.</summary>
    [Parameter(Mandatory = true, ParameterSetName = ThreePhaseSet)]
    [Quantity(QuantityKind.Length)]
    public double Spacing { get; set; }

    /// <summary>How a three-phase set is laid: Flat (in a row, the default) or Trefoil (a triangle).</summary>
    [Parameter(ParameterSetName = ThreePhaseSet)]
    [ValidateSet("Flat", "Trefoil")]
    public string Arrangement { get; set; } = "Flat";

    /// <summary>The radius of a coil or solenoid.</summary>
    [Parameter(Mandatory = true, ParameterSetName = CoilSet)]
    [Parameter(Mandatory = true, ParameterSetName = SolenoidSet)]
    [Quantity(QuantityKind.Length)]
    public double Radius { get; set; }

    /// <summary>The length of a solenoid.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SolenoidSet)]
    [Quantity(QuantityKind.Length)]
    public double Length { get; set; }

    /// <summary>The number of turns of a coil (1 by default) or a solenoid.</summary>
    [Parameter(ParameterSetName = CoilSet)]
    [Parameter(Mandatory = true, ParameterSetName = SolenoidSet)]
    public double Turns { get; set; }

    /// <summary>The dipole's moment at a drive of 1, as x,y,z in A m^2.</summary>
    [Parameter(Mandatory = true, ParameterSetName = DipoleSet)]
    [Vector]
    public Vector3D Moment { get; set; }

    /// <summary>The largest dimension of the source a dipole stands for: points nearer than 3 times it are refused.</summary>
    [Parameter(ParameterSetName = DipoleSet)]
    [Quantity(QuantityKind.Length)]
    public double SourceSize { get; set; }

    /// <summary>The source's name, shown in assessments and reports.</summary>
    [Parameter]
    [ValidateNotNullOrEmpty]
    public string Name { get; set; } = null!;

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        try
        {
            var values = BoundValues.Of(MyInvocation, SourceRecordReader.Forms.Append("Waveform").ToArray());
            values["Form"] = ParameterSetName == SegmentSet ? ConductorSet : ParameterSetName;
            if (ParameterSetName == MapSet)
            {
                values["Path"] = SessionState.Path.GetUnresolvedProviderPathFromPSPath(Map);
            }

            WriteObject(SourceRecordReader.Read(values, Waveform, SessionState.Path.CurrentFileSystemLocation.Path, "New-FieldSource"));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, Waveform));
        }
    }
}
