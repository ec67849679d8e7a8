using System;
using System.Collections.Generic;
using System.Management.Automation;
using System.Threading;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Find-SafeDistance: the nearest distance along a ray from which an item is Clear, with the mechanism that governs there.</summary>
[Cmdlet(VerbsCommon.Find, "SafeDistance", DefaultParameterSetName = SourceSet)]
[OutputType(typeof(SafeDistanceResult))]
public sealed class FindSafeDistanceCommand : PSCmdlet, IDisposable
{
    private const string SourceSet = "Source";
    private const string SiteSet = "Site";

    private readonly CancellationTokenSource _cancellation = new();
    private FieldSource _source = null!;
    private Vector3D _from;
    /// <summary>The station's normal or tilt, where the search runs at a station.</summary>
    private (Vector3D? Normal, double? TiltDegrees) _stationFacing;
    private double? _exposure;
    private HazardPolicy _policy = HazardPolicy.Default;
    private Vector3D? _velocity;
    private ThermalEnvironment _environment = ThermalEnvironment.StillAir;
    private int _row;
    private bool _positionsWarned;

    /// <summary>The search of the first row of each item, for the rows that repeat it (an inventory's identical items).</summary>
    private readonly BoundedCache<string, SafeDistanceResult> _repeated = new(256, StringComparer.Ordinal);

    /// <summary>The items: objects from New-ConductiveItem, or data rows with the item columns.</summary>
    /// <remarks>One object as the shell binds it from the pipeline; several given at once arrive as one collection and are taken in turn (<see cref="ItemInput.ForEachGiven"/>), a $null its row's error.</remarks>
    [Parameter(Mandatory = true, Position = 0, ValueFromPipeline = true)]
    [AllowNull]
    [AllowEmptyCollection]
    public PSObject? Item { get; set; }

    /// <summary>The field source, from New-FieldSource; several sources sum into one.</summary>
    [Parameter(Mandatory = true, Position = 1, ParameterSetName = SourceSet)]
    public FieldSource[] Source { get; set; } = null!;

    /// <summary>A site, from Import-HazardSite: the search runs in the field of its -Station, from the station's position, with its normal, exposure time and policy unless given.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SiteSet)]
    public HazardSite Site { get; set; } = null!;

    /// <summary>The station of -Site whose field, place and policy the search takes.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SiteSet)]
    [ArgumentCompleter(typeof(StationCompleter))]
    public string Station { get; set; } = null!;

    /// <summary>Where the ray starts, as x,y,z lengths ('0, 0, 500 mm'; bare numbers in metres); the origin by default, or the station's position with -Site.</summary>
    [Parameter]
    [Vector(QuantityKind.Length)]
    public Vector3D From { get; set; } = Vector3D.Zero;

    /// <summary>Which way the ray goes, as x,y,z or an axis ('x', '1, 1, 0'): usually away from the source.</summary>
    [Parameter(Mandatory = true)]
    [Vector]
    public Vector3D Direction { get; set; }

    /// <summary>How far along the ray to look ('10 m' by default).</summary>
    [Parameter]
    [Quantity(QuantityKind.Length)]
    public double MaxDistance { get; set; } = 10.0;

    /// <summary>The normal of the item's loop as x,y,z or an axis; by default the station's with -Site where it gives one, else, at each point, the orientation that links the largest flux change.</summary>
    [Parameter]
    [Vector]
    public Vector3D? Normal { get; set; }

    /// <summary>How long the item stays in the field ('10 min'); by default the station's with -Site where it gives one, else while the drive changes, or 8 h for a field that runs on.</summary>
    [Parameter]
    [Quantity(QuantityKind.Time)]
    public double? ExposureTime { get; set; }

    /// <summary>The limits and safety factor: a policy from Get-HazardPolicy, a policy file's path, or a table of policy values; by default the published limits, or the station's policy with -Site.</summary>
    [Parameter]
    [Policy]
    public HazardPolicy? Policy { get; set; }

    /// <summary>Accept item sizes outside those of things people wear, carry or install, which are otherwise refused as likely unit slips.</summary>
    [Parameter]
    public SwitchParameter AcceptUnusualSize { get; set; }

    /// <summary>The velocity at which the item is moved through the field at every point of the ray, as x,y,z speeds ('0, 0, 1.5 m/s'); by default the station's with -Site where it gives one, else none (placed, not moved).</summary>
    [Parameter]
    [Vector(QuantityKind.Speed)]
    public Vector3D? Velocity { get; set; }

    /// <summary>Instead of -Normal, how far the item's loop is turned from the orientation that links the largest flux change at each point ('30 deg'; 0 to 90 degrees). Rows may give their own Tilt.</summary>
    [Parameter]
    [Quantity(QuantityKind.Angle)]
    public double? Tilt { get; set; }

    /// <summary>The temperature of the surrounding air ('20 degC' by default, or the station's with -Site where it gives one). Rows may give their own AmbientTemperature.</summary>
    [Parameter]
    [Quantity(QuantityKind.Temperature)]
    public double AmbientTemperature { get; set; } = 20.0;

    /// <inheritdoc />
    protected override void BeginProcessing()
    {
        try
        {
            (_from, _exposure, _policy, _velocity) = (From, ExposureTime, Policy ?? HazardPolicy.Default, Velocity);
            _environment = new ThermalEnvironment(AmbientTemperature);
            if (ParameterSetName == SiteSet)
            {
                // The station's field, and its place, normal, exposure time, velocity, air and policy where the command does not give them.
                Station station = Site.Find(Station);
                _source = station.Source;
                _from = MyInvocation.BoundParameters.ContainsKey(nameof(From)) ? From : station.Placement.Centre;
                _stationFacing = station.Placement.Facing;
                _exposure = ExposureTime ?? station.ExposureSeconds;
                _velocity = Velocity ?? station.Placement.Velocity;
                if (!MyInvocation.BoundParameters.ContainsKey(nameof(AmbientTemperature)) && station.AmbientCelsius is { } stationAir)
                {
                    _environment = new ThermalEnvironment(stationAir);
                }
                else if (StationAir.Replaced(station, AmbientTemperature) is { } airReplaced)
                {
                    WriteWarning(airReplaced);
                }

                _policy = Policy ?? Site.PolicyAt(station.Name) ?? HazardPolicy.Default;
                if (Policy is not null && StationPolicy.Replaced(station, Policy) is { } replaced)
                {
                    WriteWarning(replaced);
                }
            }
            else
            {
                _source = FieldSource.Combine(Source);
            }

            Require.Direction("Direction", Direction);
            PhysicalRanges.Distance.For("MaxDistance").Check(MaxDistance);
            Scenario.ValidateExposure(ExposureTime);
            if (Normal is { } n)
            {
                Require.Direction("Normal", n);
            }

            if (Tilt is { } tilt)
            {
                _ = new Placement(Vector3D.Zero, Normal, null, tilt);
            }

            if (_velocity is { } moving)
            {
                // Checked as a placement checks it: a finite speed a person or a dropped item can have.
                _ = new Placement(Vector3D.Zero, null, moving);
            }
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, null));
        }
    }

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        ItemInput.ForEachGiven(Item, SearchOne);
    }

    /// <summary>One row or item: its search written, or an error naming the row.</summary>
    private void SearchOne(PSObject? given)
    {
        _row++;
        // A $null (an empty line, a missing object) is that row's error, not the shell's binding error.
        PSObject input = given ?? new PSObject(string.Empty);
        // A row's fields are read once: for its name in messages, its key and its item.
        IReadOnlyList<KeyValuePair<string, object?>>? record = given is null ? null : ItemInput.RecordOf(input);
        string? name = record is null ? null : ItemRecordReader.NameOf(record);
        string label = record is null ? ItemInput.Label(input, _row) : ItemRecordReader.Label(_row, name);
        try
        {
            if (given is null || given.BaseObject is null)
            {
                throw ItemInput.NothingGiven(label, nameof(Item));
            }

            // A row whose item fields are written as an earlier row's takes that row's search under its own name.
            string? key = record is null ? null : RepeatedRows.KeyOf(record);
            ExposureGroup? wearer = record is null ? null : WearerGroupReader.Read(record, label);
            if (StationPolicy.WearerNotApplied(label, wearer, _policy.ExposureGroup, _policy.Name) is { } notApplied)
            {
                WriteWarning(notApplied);
            }

            // A row's own normal and velocity hold along the whole ray; its position does not move the ray's start.
            (Vector3D? rowPosition, Vector3D? rowNormal, Vector3D? rowVelocity, double? rowTilt) = record is null ? (null, null, null, null) : PlacementRecordReader.Read(record, label);
            if (rowPosition is not null && !_positionsWarned)
            {
                _positionsWarned = true;
                WriteWarning(label + " gives a position (X, Y, Z or Position), which the search does not read: every row is searched along the ray from -From or its station's position; a row's own normal and velocity are read.");
            }

            SafeDistanceResult result;
            if (key is not null && _repeated.TryGet(key, out SafeDistanceResult first))
            {
                result = RepeatedRows.Relabel(first, name, _row);
            }
            else
            {
                ConductiveItem item = ItemInput.ToItem(input, record, MaterialLibrary.BuiltIn, _row, null, AcceptUnusualSize.IsPresent);
                // The row's normal or tilt, else -Normal or -Tilt, else the station's.
                (Vector3D? normal, double? tilt) = Placement.Orientation((rowNormal, rowTilt), (Normal, Tilt), _stationFacing);

                // A visitor the row names is judged at the public's limits along the whole ray.
                HazardPolicy policy = _policy.For(wearer);
                (double? rowExposure, double? rowLeave, double? rowAmbient) = record is null ? (null, null, null) : ExposureRecordReader.Read(record, label);

                var progress = new ProgressRecord(2, "Find-SafeDistance", label);
                result = SafeDistance.Find(
                    item, _source, _from, Direction, MaxDistance, policy, normal, rowExposure ?? _exposure, rowAmbient is { } air ? new ThermalEnvironment(air) : _environment, rowVelocity ?? _velocity, rowLeave, tilt,
                    fraction => { progress.PercentComplete = (int)(100 * fraction); WriteProgress(progress); },
                    _cancellation.Token);
                progress.RecordType = ProgressRecordType.Completed;
                WriteProgress(progress);
                if (key is not null)
                {
                    _repeated.Add(key, result);
                }
            }

            if (result.DipsAgain)
            {
                WriteWarning(label + ": Clear nearer in, then not Clear again further out; the distance given is beyond the last point that is not Clear.");
            }

            if (!result.Found)
            {
                WriteWarning(label + ": not Clear anywhere within " + SiFormat.Format(MaxDistance, "m") + " along the ray; keep it out of this field or look further with -MaxDistance.");
            }

            WriteObject(result);
        }
        catch (InductionHazardException ex)
        {
            WriteError(ErrorRecords.From(ex, input, label));
        }
        catch (OperationCanceledException)
        {
            throw new PipelineStoppedException();
        }
    }

    /// <inheritdoc />
    protected override void StopProcessing() => _cancellation.Cancel();

    /// <summary>Releases the cancellation source.</summary>
    public void Dispose()
    {
        _cancellation.Dispose();
        GC.SuppressFinalize(this);
    }
}
