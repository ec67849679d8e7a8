using System;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;
using InductionHazard.Waveforms;

namespace InductionHazard.Assessment;

/// <summary>One item at one place in one source's field, for a stated time, in stated surroundings.</summary>
public sealed class Scenario
{
    /// <summary>The longest exposure the module assesses, s: 8 h, the longest contact time of ISO 13732-1.</summary>
    public const double LongestExposureSeconds = 8 * 3600.0;

    /// <summary>Creates the scenario.</summary>
    /// <param name="item">The item.</param>
    /// <param name="source">The field source.</param>
    /// <param name="placement">Where the item is and how it faces; null: at the origin facing the field.</param>
    /// <param name="exposureSeconds">How long the item stays in the field from the start of the drive; null: as long as the drive changes (a continuous drive: 8 h). The cooling that follows is assessed too, as the item is still worn or held.</param>
    /// <param name="environment">The surroundings; null: still air at 20 °C.</param>
    /// <param name="leaveSeconds">How long carrying the item out of the field takes, s (the flux it holds falls to zero over it); null: <see cref="DefaultLeaveSeconds"/>.</param>
    /// <exception cref="InvalidInputException">The exposure or leave time is out of range.</exception>
    public Scenario(ConductiveItem item, FieldSource source, Placement? placement = null, double? exposureSeconds = null, ThermalEnvironment? environment = null, double? leaveSeconds = null)
    {
        ValidateExposure(exposureSeconds);
        ValidateLeave(leaveSeconds);
        LeaveSeconds = leaveSeconds ?? DefaultLeaveSeconds;
        Item = item;
        Source = source;
        Placement = placement ?? Placement.FacingField;
        ExposureSeconds = exposureSeconds;
        Environment = environment ?? ThermalEnvironment.StillAir;
    }

    /// <summary>The item.</summary>
    public ConductiveItem Item { get; }

    /// <summary>
    /// A SHA-256 fingerprint of everything the assessment was computed from: the item (shape, dimensions as the
    /// engine sees them, material constants, contact), the source's terms and waveforms, the placement, times and
    /// surroundings, and the inventory row's own columns. Two scenarios with the same fingerprint gave the same inputs.
    /// </summary>
    /// <remarks>
    /// The source's part is hashed once per source (sources are immutable) and the fingerprint hashes it with the
    /// item's part and the rest, so a whole inventory in one field does not describe the source again per item.
    /// </remarks>
    public string Fingerprint()
    {
        var text = new System.Text.StringBuilder(256);
        text.Append(ItemHash(Item)).Append('|').Append(SourceHashes.GetValue(Source, SourceHash))
            .Append('|').Append(Exact(Placement.Centre)).Append('|').Append(Placement.Normal is { } n && Placement.AxisAlong is null ? Exact(n) : Placement.TiltDegrees is { } tilt ? "tilted " + TextHash.Exact(tilt) : "facing the field").Append('|').Append(Placement.Velocity is { } v ? Exact(v) : "still")
            .Append('|').Append((Shortened ? StayGiven : ExposureSeconds) is { } e ? TextHash.Exact(e) : "default").Append('|').Append(TextHash.Exact(LeaveSeconds))
            .Append('|').Append(TextHash.Exact(Environment.AmbientCelsius)).Append('|').Append(StationName).Append('|').Append(Inventory);
        if (WearerGroup is { } group)
        {
            // Added only where a row names a group, so that the fingerprints of scenarios without one stay as they were.
            text.Append("|wearer=").Append(group);
        }

        return TextHash.Sha256(text.ToString());
    }

    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<FieldSource, string> SourceHashes = new();

    /// <summary>A vector's components to the last bit (its display rounds them to four figures).</summary>
    private static string Exact(Vector3D v) => TextHash.Exact(v.X) + "," + TextHash.Exact(v.Y) + "," + TextHash.Exact(v.Z);

    /// <summary>The item as the engine sees it: shape, dimensions, contact and every material constant.</summary>
    private static string ItemHash(ConductiveItem item)
    {
        ConductorMaterial m = item.Material;
        var text = new System.Text.StringBuilder();
        text.Append(item.Describe()).Append('|').Append(item.Shape).Append('|').Append(item.Contact).Append('|')
            .Append(TextHash.Exact(item.GapMeters)).Append('|').Append(TextHash.Exact(item.Loop.PathLengthMeters)).Append('|')
            .Append(TextHash.Exact(item.Loop.LoopAreaSquareMeters)).Append('|').Append(TextHash.Exact(item.Loop.VolumeCubicMeters)).Append('|')
            .Append(TextHash.Exact(item.Loop.Section.AreaSquareMeters)).Append('|')
            .Append(m.Name).Append('|').Append(TextHash.Exact(m.ResistivityOhmMeters)).Append('|').Append(TextHash.Exact(m.TemperatureCoefficientPerKelvin)).Append('|')
            .Append(TextHash.Exact(m.DensityKilogramsPerCubicMeter)).Append('|').Append(TextHash.Exact(m.SpecificHeatJoulesPerKilogramKelvin)).Append('|')
            .Append(TextHash.Exact(m.ThermalConductivityWattsPerMeterKelvin)).Append('|').Append(TextHash.Exact(m.RelativePermeability)).Append('|')
            .Append(TextHash.Exact(m.MeltingCelsius)).Append('|').Append(TextHash.Exact(m.LatentHeatJoulesPerKilogram));
        return TextHash.Sha256(text.ToString());
    }

    /// <summary>The source: its description, and each term's geometry and waveform.</summary>
    private static string SourceHash(FieldSource source)
    {
        var text = new System.Text.StringBuilder();
        text.Append(source.Describe());
        foreach (SourceTerm term in source.Terms)
        {
            FieldWaveform w = term.Waveform;
            text.Append('|').Append(term.Geometry.Describe()).Append('|').Append(w.Form).Append('|').Append(TextHash.Exact(w.PeakValue)).Append('|')
                .Append(TextHash.Exact(w.PeakRate)).Append('|').Append(TextHash.Exact(w.StartSeconds)).Append('|').Append(TextHash.Exact(w.EndSeconds)).Append('|')
                .Append(TextHash.Exact(w.SignificantFrequencyHertz));
        }

        return TextHash.Sha256(text.ToString());
    }

    /// <summary>
    /// This scenario for another row that describes the same item at the same place (see <see cref="RepeatedRows"/>):
    /// the item under that row's name, with that row's inventory columns; everything the physics reads is this one's.
    /// </summary>
    internal Scenario For(string itemName, InventoryFields inventory) =>
        new(Item.Named(itemName), Source, Placement, ExposureSeconds, Environment, LeaveSeconds) { StationName = StationName, WearerGroup = WearerGroup, Inventory = inventory, StayGiven = StayGiven, Shortened = Shortened };

    /// <summary>
    /// This scenario leaving as soon as the drive stops changing (the default stay), for judging beside the stay given
    /// (<see cref="InductionResponse.ShorterStay"/>); its fingerprint is still the inputs', the stay given among them.
    /// </summary>
    internal Scenario LeavingAtOnce() => Leaving(null);

    /// <summary>
    /// This scenario leaving after a time from the drive's start, shorter than the stay given or the default, where the
    /// field at the item first reaches its largest and holds (<see cref="InductionResponse.ShorterStay"/>); its fingerprint
    /// is still the inputs'.
    /// </summary>
    /// <param name="seconds">The stay, s (at least the shortest anyone gives).</param>
    internal Scenario LeavingAfter(double seconds) => Leaving(seconds);

    private Scenario Leaving(double? seconds) =>
        new(Item, Source, Placement, seconds, Environment, LeaveSeconds) { StationName = StationName, WearerGroup = WearerGroup, Inventory = Inventory, StayGiven = Shortened ? StayGiven : ExposureSeconds, Shortened = true };

    /// <summary>For a scenario made by <see cref="LeavingAtOnce"/> or <see cref="LeavingAfter"/>, the stay the inputs gave, s (null: the default); null otherwise.</summary>
    internal double? StayGiven { get; private init; }

    /// <summary>True for a scenario made by <see cref="LeavingAtOnce"/> or <see cref="LeavingAfter"/>: its stay is not the inputs' (<see cref="StayGiven"/> is).</summary>
    internal bool Shortened { get; private init; }

    /// <summary>How a shortened scenario leaves, in words: as soon as the drive stops changing (<see cref="LeavingAtOnce"/>), or as soon as the field at the item first reaches its largest and holds (<see cref="LeavingAfter"/>).</summary>
    internal string LeavingWords =>
        ExposureSeconds is null ? "leaving as soon as the drive stops changing" : "leaving as soon as the field at the item first reaches its largest and holds";

    /// <summary>This scenario with the item placed otherwise; everything else is this one's.</summary>
    internal Scenario With(Placement placement) =>
        new(Item, Source, placement, ExposureSeconds, Environment, LeaveSeconds) { StationName = StationName, WearerGroup = WearerGroup, Inventory = Inventory, StayGiven = StayGiven, Shortened = Shortened };

    /// <summary>The site station the scenario stands for, if it came from one.</summary>
    public string? StationName { get; init; }

    /// <summary>
    /// Whose exposure the wearer or holder is judged for, where the inventory row names it (its ExposureGroup column):
    /// null gives the policy's group; Public judges the person as one of the public under any policy
    /// (<see cref="Criteria.HazardPolicy.For"/>).
    /// </summary>
    public Criteria.ExposureGroup? WearerGroup { get; init; }

    /// <summary>The inventory row's own columns (asset tag, holder, notes...), which travel with the assessment.</summary>
    public InventoryFields Inventory { get; init; } = InventoryFields.Empty;

    /// <summary>Checks an exposure time: from 0.1 s to 8 h (<see cref="PhysicalRanges.ExposureTime"/>).</summary>
    /// <exception cref="InvalidInputException">It is out of range.</exception>
    public static void ValidateExposure(double? exposureSeconds)
    {
        if (exposureSeconds is { } e)
        {
            PhysicalRanges.ExposureTime.Check(e);
        }
    }

    /// <summary>How long carrying an item out of a field takes by default, s: a brisk walk of 1 s (common practice).</summary>
    public const double DefaultLeaveSeconds = 1.0;

    /// <summary>Checks a leave time: from 0.1 s to 8 h, as an exposure.</summary>
    /// <exception cref="InvalidInputException">It is out of range.</exception>
    public static void ValidateLeave(double? leaveSeconds)
    {
        if (leaveSeconds is { } l)
        {
            PhysicalRanges.ExposureTime.For("LeaveTime").Check(l);
        }
    }

    /// <summary>How long carrying the item out of the field takes, s.</summary>
    public double LeaveSeconds { get; }

    /// <summary>
    /// True when the item is carried out of the field at the end of the exposure (worn, held or loose items), so the
    /// flux it holds then falls to zero over <see cref="LeaveSeconds"/>; a fixed item stays.
    /// </summary>
    public bool Leaves => Item.Contact != ContactKind.Fixed;

    /// <summary>The source.</summary>
    public FieldSource Source { get; }

    /// <summary>The item's placement.</summary>
    public Placement Placement { get; }

    /// <summary>How long the item stays in the field from the start of the drive, s; null for the default.</summary>
    public double? ExposureSeconds { get; }

    /// <summary>The surroundings.</summary>
    public ThermalEnvironment Environment { get; }

    /// <summary>
    /// The item's temperature when the drive starts, °C: a worn or held item is at skin temperature (or ambient,
    /// if warmer); any other item at ambient.
    /// </summary>
    public double InitialCelsius => Item.Contact is ContactKind.Skin or ContactKind.Held
        ? Math.Max(Environment.AmbientCelsius, SkinContact.SurfaceCelsius)
        : Environment.AmbientCelsius;

    /// <summary>"Wedding band in F1 coil mouth at (0, 0, 0.06)".</summary>
    public override string ToString() => Item.Name + " in " + Source.Name + " at " + Placement.Centre + (StationName is { Length: > 0 } s ? " (station " + s + ")" : string.Empty);
}
