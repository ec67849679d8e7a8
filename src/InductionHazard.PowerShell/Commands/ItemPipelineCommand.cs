using System;
using System.Diagnostics;
using System.Management.Automation;
using System.Collections.Generic;
using System.Threading;
using System.Threading.Tasks;
using InductionHazard.Assessment;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.PowerShell.Commands;

/// <summary>
/// What Get-InductionResponse and Test-InductionHazard share: items from the pipeline (item objects, CSV rows or
/// hashtables), one output per input in order, a non-terminating error naming the row and field for a bad
/// record, progress on long runs, verbose model notes, and cancellation.
/// </summary>
public abstract class ItemPipelineCommand : PSCmdlet, IDisposable
{
    private readonly CancellationTokenSource _cancellation = new();
    private readonly Stopwatch _sinceProgress = new();
    private MaterialLibrary _materials = MaterialLibrary.BuiltIn;
    private ThermalEnvironment _environment = ThermalEnvironment.StillAir;
    private bool _ambientGiven;
    private int _row;
    private bool _verbose = true;

    /// <summary>The switch as bound, read once for the workers that make the scenarios.</summary>
    private bool _acceptUnusualSize;

    /// <summary>How many rows pass between the collections that keep a long stream's memory flat.</summary>
    private const int RowsPerHeapTrim = 50_000;
    private FieldSource _source = null!;
    private readonly Queue<Pending> _pending = new();

    /// <summary>
    /// The work of the second row of each item at each place, for the rows that repeat it after that (an inventory's
    /// identical items): they take its result under their own names. A few hundred distinct rows are kept, and no more.
    /// A row's work is kept only when its key comes a second time (<see cref="BoundedCache{TKey, TValue}.AddOnRepeat"/>):
    /// in an inventory of items all different, keeping every row's result while some hundreds of rows pass made the
    /// runtime carry each into its older generation before it was dropped, for no repeat.
    /// </summary>
    private readonly BoundedCache<string, (Task<Solved> Work, int Row)> _repeated = new(256, StringComparer.Ordinal);

    /// <summary>
    /// Starts the workers' tasks with -ThrottleLimit above 1: on the thread pool, but never more than -ThrottleLimit of
    /// them at once, whatever the machine's core count (the pool alone would run every queued task a core is free for).
    /// </summary>
    private TaskFactory? _workers;
    private IReadOnlyDictionary<string, string>? _units;
    private readonly UnreadColumns _unreadColumns = new();

    /// <summary><see cref="ProcessOne"/> as a delegate, made once rather than on every row.</summary>
    private Action<PSObject?>? _processOne;

    /// <summary>The items: objects from New-ConductiveItem, or data rows (Import-Csv output, hashtables) with the item columns.</summary>
    /// <remarks>
    /// One object as the shell binds it from the pipeline, row by row; several given at once (-Item $band, $ring) arrive
    /// as one collection and are taken in turn (<see cref="ItemInput.ForEachGiven"/>).
    /// </remarks>
    [Parameter(Mandatory = true, Position = 0, ValueFromPipeline = true)]
    [Alias("Item")]
    [AllowNull]
    [AllowEmptyCollection]
    public PSObject? InputObject { get; set; }

    /// <summary>The parameter set that takes the field from -Source.</summary>
    protected const string SourceSet = "Source";

    /// <summary>The parameter set that takes the field from a site's stations.</summary>
    protected const string SiteSet = "Site";

    /// <summary>The field source, from New-FieldSource; several sources sum into one.</summary>
    [Parameter(Mandatory = true, Position = 1, ParameterSetName = SourceSet)]
    public FieldSource[] Source { get; set; } = null!;

    /// <summary>A site, from Import-HazardSite: each row is assessed at the station its Station column names (or at -Station).</summary>
    [Parameter(Mandatory = true, ParameterSetName = SiteSet)]
    public HazardSite Site { get; set; } = null!;

    /// <summary>The station of -Site at which every item is assessed, in place of the rows' Station column.</summary>
    [Parameter(ParameterSetName = SiteSet)]
    [ArgumentCompleter(typeof(StationCompleter))]
    public string? Station { get; set; }

    /// <summary>Where the item's loop is centred, as x,y,z lengths ('0, 300 mm, 0'; bare numbers in metres); the origin by default. Rows may give X, Y, Z or a Position column instead.</summary>
    [Parameter]
    [Vector(QuantityKind.Length)]
    public Vector3D? Position { get; set; }

    /// <summary>The normal of the item's loop as x,y,z or an axis; by default the orientation that links the largest flux change. Rows may give NormalX, NormalY, NormalZ or a Normal column instead.</summary>
    [Parameter]
    [Vector]
    public Vector3D? Normal { get; set; }

    /// <summary>Instead of -Normal, how far the item's loop is turned from the orientation that links the largest flux change ('30 deg'; 0 to 90 degrees), toward the side that keeps the most. Rows may give their own Tilt.</summary>
    [Parameter]
    [Quantity(QuantityKind.Angle)]
    public double? Tilt { get; set; }

    /// <summary>The velocity at which the item is moved through the field, as x,y,z speeds ('1.5 m/s, 0, 0'; bare numbers in m/s): the motional emf around it and, for a closed item, the braking force, with the field at its peak. Rows may give their own as VelocityX, VelocityY, VelocityZ or a Velocity column (zero: placed).</summary>
    [Parameter]
    [Vector(QuantityKind.Speed)]
    public Vector3D? Velocity { get; set; }

    /// <summary>How long carrying the item out of the field takes ('1 s', a brisk walk, by default): the flux it holds falls to zero over it. Fixed items stay.</summary>
    [Parameter]
    [Quantity(QuantityKind.Time)]
    public double? LeaveTime { get; set; }

    /// <summary>How long the item stays in the field from the start of the drive ('10 min'); by default while the drive changes, or 8 h for a field that runs on. The cooling after it is assessed too.</summary>
    [Parameter]
    [Quantity(QuantityKind.Time)]
    public double? ExposureTime { get; set; }

    /// <summary>The temperature of the surrounding air ('20 degC' by default, or the station's with -Site where it gives one). Rows may give their own AmbientTemperature.</summary>
    [Parameter]
    [Quantity(QuantityKind.Temperature)]
    public double AmbientTemperature { get; set; } = 20.0;

    /// <summary>The unit of the bare numbers in data rows, by column, where the headers do not name it: @{ Diameter = 'mm'; WireDiameter = 'mm' }.</summary>
    [Parameter]
    public System.Collections.Hashtable? Unit { get; set; }

    /// <summary>Accept item sizes outside those of things people wear, carry or install (a cable loop 50 m across), which are otherwise refused as likely unit slips.</summary>
    [Parameter]
    public SwitchParameter AcceptUnusualSize { get; set; }

    /// <summary>Materials that data rows may name besides the built-in ones (hashtables or materials).</summary>
    [Parameter]
    [Material]
    public ConductorMaterial[]? AdditionalMaterial { get; set; }

    /// <inheritdoc />
    protected override void BeginProcessing()
    {
        try
        {
            _environment = new ThermalEnvironment(AmbientTemperature);
            _ambientGiven = MyInvocation.BoundParameters.ContainsKey(nameof(AmbientTemperature));
            _units = ItemInput.UnitsOf(Unit);
            if (ParameterSetName == SourceSet)
            {
                _source = FieldSource.Combine(Source);
            }
            else if (Station is not null)
            {
                _ = Site.Find(Station);
            }

            if (ParameterSetName == SiteSet && _ambientGiven)
            {
                foreach (Station station in Station is null ? Site.Stations : new[] { Site.Find(Station) })
                {
                    if (StationAir.Replaced(station, AmbientTemperature) is { } replaced)
                    {
                        WriteWarning(replaced);
                    }
                }
            }

            Scenario.ValidateExposure(ExposureTime);
            Scenario.ValidateLeave(LeaveTime);
            if (Normal is { } n)
            {
                Require.Direction("Normal", n);
            }

            if (Velocity is { } moving)
            {
                _ = new Placement(Vector3D.Zero, null, moving);
            }

            if (Tilt is { } tilt)
            {
                _ = new Placement(Vector3D.Zero, Normal, null, tilt);
            }
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, null));
        }

        if (AdditionalMaterial is { Length: > 0 })
        {
            _materials = MaterialLibrary.BuiltIn.With(AdditionalMaterial);
        }

        _verbose = VerboseWanted();
        AtSite = ParameterSetName == SiteSet;
        _acceptUnusualSize = AcceptUnusualSize.IsPresent;
        if (ThrottleLimit > 1)
        {
            var limited = new ConcurrentExclusiveSchedulerPair(TaskScheduler.Default, ThrottleLimit).ConcurrentScheduler;
            _workers = new TaskFactory(_cancellation.Token, TaskCreationOptions.DenyChildAttach, TaskContinuationOptions.None, limited);
        }

        _sinceProgress.Start();
    }

    /// <summary>
    /// Whether verbose output is wanted: -Verbose as given, else the caller's $VerbosePreference. Anything that cannot
    /// be read as "silently continue" or "ignore" counts as wanted, so the notes are never lost.
    /// </summary>
    private bool VerboseWanted()
    {
        if (MyInvocation.BoundParameters.TryGetValue("Verbose", out object? bound))
        {
            return bound is SwitchParameter given ? given.IsPresent : LanguagePrimitives.IsTrue(bound);
        }

        object? preference = GetVariableValue("VerbosePreference");
        string text = (preference is PSObject wrapped ? wrapped.BaseObject : preference)?.ToString() ?? string.Empty;
        return !(string.Equals(text, nameof(ActionPreference.SilentlyContinue), StringComparison.OrdinalIgnoreCase)
            || string.Equals(text, nameof(ActionPreference.Ignore), StringComparison.OrdinalIgnoreCase));
    }

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        // A collection given to -Item is its items (a hashtable or a text is one item, as the shell takes them).
        ItemInput.ForEachGiven(InputObject, _processOne ??= ProcessOne);
    }

    /// <summary>One item or row: its assessment started (or a repeat's taken), and the finished results at the queue's head written.</summary>
    private void ProcessOne(PSObject? given)
    {
        _row++;
        int row = _row;
        if (row % RowsPerHeapTrim == 0)
        {
            // A long audit's rows are released as they pass (what stays alive is a few megabytes), but the runtime
            // lets its old generation fill with them and keeps the freed space: a compacting full collection every
            // 50,000 rows (some milliseconds against seconds of work) keeps a million rows in about the memory of
            // ten thousand (docs/performance.md).
            GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
        }

        // A $null in the pipeline (an empty line, a missing object) is that row's error, not the shell's binding error.
        PSObject input = given ?? new PSObject(string.Empty);
        IReadOnlyList<KeyValuePair<string, object?>>? record = given is null ? null : ItemInput.RecordOf(input);
        if (record is not null && _unreadColumns.NewIn(record) is { } unread)
        {
            foreach (string warning in unread)
            {
                WriteWarning(warning);
            }
        }

        string? name = record is null ? null : ItemRecordReader.NameOf(record);
        string label = given is null ? ItemRecordReader.Label(row, null)
            : record is null ? ItemInput.Label(input, row) : ItemRecordReader.Label(row, name);
        ShowProgress(label);

        // A row that repeats an earlier one's item and place takes that row's work, done or under way.
        string? key = record is null || given?.BaseObject is null ? null : RepeatedRows.KeyOf(record);
        if (key is not null && _repeated.TryGet(key, out (Task<Solved> Work, int Row) first))
        {
            _pending.Enqueue(new Pending(first.Work, input, label, row, new Repeat(name, record!, first.Row)));
        }
        else
        {
            Task<Solved> work = Start(given, input, record, label, row);
            if (key is not null)
            {
                _repeated.AddOnRepeat(key, (work, row));
            }

            _pending.Enqueue(new Pending(work, input, label, row, null));
        }

        Drain(wait: _pending.Count > 2 * ThrottleLimit);
    }

    /// <summary>Items assessed at once on as many threads; results still come out in input order, as a serial run gives them.</summary>
    [Parameter]
    [ValidateRange(1, 64)]
    public int ThrottleLimit { get; set; } = 1;

    /// <summary>Whether the items are assessed at a site's stations (-Site), as bound; read once, for the workers.</summary>
    protected bool AtSite { get; private set; }

    /// <summary>What the command makes of one item's response (called on any thread: no writing here).</summary>
    protected abstract object Compute(InductionResponse response, int row);

    /// <summary>
    /// What <see cref="Compute"/> made for the first row of an item at a place, for a later row that repeats it
    /// (<see cref="RepeatedRows"/>): the same result for <paramref name="response"/>, the first row's response under
    /// that row's name and inventory columns, and for that row's number.
    /// </summary>
    protected abstract object Relabel(object first, InductionResponse response, int row);

    /// <summary>One row's work: the result and the response it was made from.</summary>
    private readonly record struct Solved(object Result, InductionResponse Response);

    /// <summary>Starts a row's work: on a worker with -ThrottleLimit above 1, else at once; a failure is the task's.</summary>
    private Task<Solved> Start(PSObject? given, PSObject input, IReadOnlyList<KeyValuePair<string, object?>>? record, string label, int row)
    {
        try
        {
            if (given is null || given.BaseObject is null)
            {
                throw ItemInput.NothingGiven(label);
            }

            // The row's fields are read here, on the pipeline thread (the shell's objects are not for other threads);
            // the item, its placement and its assessment are made from them on a worker when there are several.
            CancellationToken token = _cancellation.Token;
            return _workers is not null
                ? _workers.StartNew(() => Solve(ScenarioOf(input, record, label, row), row, token), token)
                : Task.FromResult(Solve(ScenarioOf(input, record, label, row), row, token));
        }
        catch (Exception ex) when (ex is not PipelineStoppedException)
        {
            var failed = new TaskCompletionSource<Solved>();
            failed.SetException(ex);
            return failed.Task;
        }
    }

    /// <summary>Writes one result to the pipeline (called on the pipeline thread, in input order).</summary>
    protected virtual void Emit(object result) => WriteObject(result);

    private Solved Solve(Scenario scenario, int row, CancellationToken token)
    {
        InductionResponse response = InductionEngine.Respond(scenario, token);
        return new Solved(Compute(response, row), response);
    }

    private Scenario ScenarioOf(PSObject input, IReadOnlyList<KeyValuePair<string, object?>>? record, string label, int row)
    {
        ConductiveItem item = ItemInput.ToItem(input, record, _materials, row, _units, _acceptUnusualSize);
        (Vector3D? rowPosition, Vector3D? rowNormal, Vector3D? rowVelocity, double? rowTilt) = record is null ? (null, null, null, null) : PlacementRecordReader.Read(record, label, _units);
        (double? rowExposure, double? rowLeave, double? rowAmbient) = record is null ? (null, null, null) : ExposureRecordReader.Read(record, label, _units);
        Station? station = !AtSite ? null
            : Station is not null ? Site.Find(Station)
            : Site.StationOf(record ?? Array.Empty<KeyValuePair<string, object?>>(), label);
        (Vector3D? normal, double? tilt) = Placement.Orientation((rowNormal, rowTilt), (Normal, Tilt), station?.Placement.Facing ?? (null, null));
        var placement = new Placement(
            rowPosition ?? Position ?? station?.Placement.Centre ?? Vector3D.Zero,
            normal,
            rowVelocity ?? Velocity ?? station?.Placement.Velocity,
            tilt);
        // The air: the row's own, else -AmbientTemperature where given, else the station's, else 20 degC.
        double? ambient = rowAmbient ?? (_ambientGiven ? null : station?.AmbientCelsius);
        ThermalEnvironment environment = ambient is { } air && air != _environment.AmbientCelsius ? new ThermalEnvironment(air) : _environment;
        return new Scenario(item, station?.Source ?? _source, placement, rowExposure ?? ExposureTime ?? station?.ExposureSeconds, environment, rowLeave ?? LeaveTime ?? station?.LeaveSeconds)
        {
            StationName = station?.Name,
            WearerGroup = record is null ? null : WearerGroupReader.Read(record, label),
            Inventory = record is null ? InventoryFields.Empty : InventoryFields.Of(record),
        };
    }

    /// <summary>Writes the finished results at the head of the queue, in order; with <paramref name="wait"/>, waits for the head first.</summary>
    private void Drain(bool wait)
    {
        while (_pending.Count > 0 && (wait || _pending.Peek().Work.IsCompleted))
        {
            Pending next = _pending.Dequeue();
            wait = false;
            try
            {
                Solved solved = next.Repeats is null ? next.Work.GetAwaiter().GetResult()
                    // A row that repeats one that failed is assessed on its own, so that its error names it.
                    : next.Work.IsFaulted ? Start(next.Input, next.Input, next.Repeats.Record, next.Label, next.Row).GetAwaiter().GetResult()
                    : RelabelSolved(next.Work.GetAwaiter().GetResult(), next.Repeats, next.Row);
                if (_verbose)
                {
                    // The model and its notes are written out only when verbose output is wanted (the notes stay on the response).
                    string repeats = next.Repeats is { } repeat && !next.Work.IsFaulted ? "the same item and place as row " + repeat.FirstRow.ToString(System.Globalization.CultureInfo.InvariantCulture) + ", whose result it takes; " : string.Empty;
                    WriteVerbose(next.Label + ": " + repeats + solved.Response.Model + ". " + string.Join("; ", solved.Response.ModelNotes));
                }

                Emit(solved.Result);
            }
            catch (InductionHazardException ex)
            {
                WriteError(ErrorRecords.From(ex, next.Input, next.Label));
            }
            catch (OperationCanceledException)
            {
                throw new PipelineStoppedException();
            }
            catch (Exception ex) when (ErrorRecords.IsRecordFailure(ex))
            {
                // Whatever one record does, the run goes on: the failure is that record's error, not the pipeline's.
                WriteError(ErrorRecords.Unexpected(ex, next.Input, next.Label));
            }
        }
    }

    private Solved RelabelSolved(Solved first, Repeat repeat, int row)
    {
        InductionResponse response = RepeatedRows.Relabel(first.Response, repeat.Name, repeat.Record, row);
        return new Solved(Relabel(first.Result, response, row), response);
    }

    /// <summary>
    /// One input on its way: its work (done, failed or running) and what names it in errors; for a row that repeats an
    /// earlier one, that row's work and this row's fields, to relabel its result with.
    /// </summary>
    private sealed class Pending
    {
        public Pending(Task<Solved> work, PSObject input, string label, int row, Repeat? repeats)
        {
            Work = work;
            Input = input;
            Label = label;
            Row = row;
            Repeats = repeats;
        }

        public Task<Solved> Work { get; }

        public PSObject Input { get; }

        public string Label { get; }

        public int Row { get; }

        public Repeat? Repeats { get; }
    }

    /// <summary>A row that repeats an earlier one: its item name as given (or null), its fields, and the row whose work it takes.</summary>
    private sealed record Repeat(string? Name, IReadOnlyList<KeyValuePair<string, object?>> Record, int FirstRow);

    /// <inheritdoc />
    protected override void EndProcessing()
    {
        while (_pending.Count > 0)
        {
            Drain(wait: true);
        }

        CompleteProgress();
    }

    /// <inheritdoc />
    protected override void StopProcessing() => _cancellation.Cancel();

    /// <summary>Releases the cancellation source.</summary>
    public void Dispose()
    {
        _cancellation.Dispose();
        GC.SuppressFinalize(this);
    }

    private void ShowProgress(string label)
    {
        if (_row > 1 && _sinceProgress.ElapsedMilliseconds < 250)
        {
            return;
        }

        _sinceProgress.Restart();
        WriteProgress(new ProgressRecord(1, MyInvocation.MyCommand.Name, "Item " + _row + ": " + label) { PercentComplete = -1 });
    }

    private void CompleteProgress() =>
        WriteProgress(new ProgressRecord(1, MyInvocation.MyCommand.Name, _row + " items") { RecordType = ProgressRecordType.Completed });
}
