using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Mechanics;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Assessment;

/// <summary>
/// The physics of one scenario: emf, gap voltage, current, energy, temperatures and their time series, with the
/// model used, its notes and any assumption that does not hold. Values are SI with the unit in the name.
/// </summary>
public sealed record InductionResponse
{
    /// <summary>The scenario solved.</summary>
    [Newtonsoft.Json.JsonIgnore]
    public Scenario Scenario { get; init; } = null!;

    /// <summary>The item's name.</summary>
    public string ItemName => Scenario.Item.Name;

    /// <summary>
    /// This response for another row that describes the same item at the same place (see <see cref="RepeatedRows"/>):
    /// the same physics, for <paramref name="scenario"/>, this one's scenario under that row's name and inventory columns
    /// (<see cref="Scenario.For"/>); the responses with a body's axis across the field (<see cref="AcrossAxis"/>) with it.
    /// </summary>
    internal InductionResponse For(Scenario scenario)
    {
        InductionResponse? shorter = ShorterStay?.For(scenario.LeavingAtOnce());
        if (AcrossAxis.Count == 0)
        {
            return this with { Scenario = scenario, ShorterStay = shorter };
        }

        var across = new InductionResponse[AcrossAxis.Count];
        for (int k = 0; k < across.Length; k++)
        {
            across[k] = AcrossAxis[k].For(scenario.With(AcrossAxis[k].Scenario.Placement));
        }

        return this with { Scenario = scenario, AcrossAxis = across, ShorterStay = shorter };
    }

    /// <summary>The source's name.</summary>
    public string SourceName => Scenario.Source.Name;

    /// <summary>The item.</summary>
    [Newtonsoft.Json.JsonIgnore]
    public ConductiveItem Item => Scenario.Item;

    /// <summary>The model used, in one line.</summary>
    public string Model { get; init; } = string.Empty;

    /// <summary>What the model did and why (shown with -Verbose).</summary>
    public IReadOnlyList<string> ModelNotes { get; init; } = Array.Empty<string>();

    /// <summary>Assumptions that do not hold; empty when the model is valid throughout.</summary>
    [Newtonsoft.Json.JsonIgnore]
    public IReadOnlyList<ValidityIssue> ValidityIssues { get; init; } = Array.Empty<ValidityIssue>();

    /// <summary>True when every model assumption holds.</summary>
    public bool IsValid => ValidityIssues.Count == 0;

    /// <summary>The loop's unit normal used.</summary>
    public Vector3D Normal { get; init; }

    /// <summary>How the loop's orientation was chosen: given, or facing the largest flux change.</summary>
    public string Orientation { get; init; } = string.Empty;

    /// <summary>The area of the loop, m^2.</summary>
    public double LoopAreaSquareMeters { get; init; }

    /// <summary>The largest flux density normal to the loop at its centre, T.</summary>
    public double PeakFluxDensityTesla { get; init; }

    /// <summary>The largest flux through the loop, Wb.</summary>
    public double PeakFluxWebers { get; init; }

    /// <summary>The net change of flux over a transient drive, Wb; null for an alternating drive.</summary>
    public double? FluxChangeWebers { get; init; }

    /// <summary>The drive's highest significant frequency, Hz.</summary>
    public double FrequencyHertz { get; init; }

    /// <summary>The time course of the emf.</summary>
    public EmfKind EmfKind { get; init; }

    /// <summary>The largest emf around the loop, |dPhi/dt|, V.</summary>
    public double PeakEmfVolts { get; init; }

    /// <summary>The rms emf of an alternating drive, V; null for a transient.</summary>
    public double? RmsEmfVolts { get; init; }

    /// <summary>The largest voltage across the gap of a split ring (the open-circuit emf), V; null for a closed loop.</summary>
    public double? GapVoltageVolts { get; init; }

    /// <summary>
    /// The gap emf of a split ring in a transient drive taken as one impulse (its integrals and width); null for an
    /// alternating drive, a closed loop, or a drive too long to sample finely.
    /// </summary>
    public EmfImpulse? GapImpulse { get; init; }

    /// <summary>The loop's d.c. resistance at the starting temperature, ohm.</summary>
    public double ResistanceOhms { get; init; }

    /// <summary>The loop's a.c. resistance at the drive frequency (alternating drive), ohm; null otherwise.</summary>
    public double? AcResistanceOhms { get; init; }

    /// <summary>The loop's self-inductance used, H.</summary>
    public double InductanceHenries { get; init; }

    /// <summary>The loop's time constant L / R, s.</summary>
    public double TimeConstantSeconds { get; init; }

    /// <summary>The skin depth at the drive's significant frequency and the starting temperature, m.</summary>
    public double SkinDepthMeters { get; init; }

    private object _regime = string.Empty;

    /// <summary>Whether resistance or inductance limits the current, with the ratio that says so (written when first read).</summary>
    public string Regime
    {
        get => LaterText.Read(ref _regime);
        init => _regime = value;
    }

    /// <summary>The regime, to be written when first read.</summary>
    internal LaterText LaterRegime
    {
        init => _regime = value;
    }

    /// <summary>The largest force on the item, N (zero in a uniform field; from the induced currents in the source's field gradient).</summary>
    public double PeakForceNewtons { get; init; }

    /// <summary>The direction of the peak force (a unit vector; zero when there is no force).</summary>
    public Vector3D PeakForceDirection { get; init; }

    /// <summary>The cycle-averaged force while an alternating field runs, N (a steady push or pull); null for a transient drive.</summary>
    public double? MeanForceNewtons { get; init; }

    /// <summary>The impulse, the magnitude of the integral of the force over the run, N s; null for an alternating drive.</summary>
    public double? ImpulseNewtonSeconds { get; init; }

    /// <summary>The speed the impulse gives a free (loose) item at rest, |J| / m, m/s; null for an item held, worn or fixed, or an alternating drive.</summary>
    public double? LaunchSpeedMetersPerSecond { get; init; }

    /// <summary>The peak force over the item's weight m g (g = 9.80665 m/s^2).</summary>
    public double ForceToWeightRatio { get; init; }

    /// <summary>The largest torque on the item's magnetic moment, |m x B|, N m.</summary>
    public double PeakTorqueNewtonMeters { get; init; }

    /// <summary>
    /// For an item placed without a normal or a tilt (its orientation the engine's choice): the largest torque on its
    /// induced moment were it turned from that orientation, N m: in a field of one direction at 45 degrees, half the
    /// largest |m| |B| (the moment falls as the cosine of the turn, the field across it grows as the sine); where the field
    /// turns as it alternates, |m| |B| itself, a bound. Null when the orientation was given, or the item is split,
    /// ferromagnetic or a sphere.
    /// </summary>
    public double? PeakTorqueTurnedNewtonMeters { get; init; }

    /// <summary>For a pulse train: the temperature the item would settle at just after each pulse if the train went on, °C; null otherwise (or when nothing cools it).</summary>
    public double? PeriodicSteadyStateCelsius { get; init; }

    /// <summary>For an item moved through the field (-Velocity): the emf around its outline from the motion, V; null when it is not moved.</summary>
    public double? MotionalEmfVolts { get; init; }

    /// <summary>For a closed item moved through the field: the force opposing the motion at the stated speed, N (resistive limit, an upper bound); null otherwise.</summary>
    public double? BrakingForceNewtons { get; init; }

    /// <summary>For a closed item moved through the field: the speed at which the braking force equals its weight, m/s; null otherwise (or when nothing brakes it).</summary>
    public double? SpeedForWeightMetersPerSecond { get; init; }

    /// <summary>For a ferromagnetic item: its magnetisation, pull and twist in the source's field; null otherwise.</summary>
    [Newtonsoft.Json.JsonIgnore]
    public FerromagneticAttraction? Attraction { get; init; }

    /// <summary>The pull on a ferromagnetic item toward stronger field, N; null for an item that is not ferromagnetic.</summary>
    public double? AttractionForceNewtons => Attraction?.ForceNewtons;

    /// <summary>
    /// For a body with an axis placed without a normal: the responses with its axis across the largest flux change
    /// (this one has it along), which an assessment judges beside this one, keeping the worst. Empty otherwise.
    /// </summary>
    internal IReadOnlyList<InductionResponse> AcrossAxis { get; init; } = Array.Empty<InductionResponse>();

    /// <summary>
    /// For an item carried out of a transient field whose stay lasts past the time the field at it first reaches its
    /// largest and holds (a stay longer than a drive that ends holding flux, or one through a drive that holds its peak
    /// and falls again): the same scenario leaving then, which an assessment judges beside this one, keeping the worse
    /// (leaving soon after the drive heats the item before it has shed the drive's heat; leaving at the peak carries the
    /// most flux out). Null otherwise.
    /// </summary>
    internal InductionResponse? ShorterStay { get; init; }

    /// <summary>The item's mass, kg.</summary>
    public double MassKilograms => Scenario.Item.MassKilograms;

    /// <summary>
    /// What every response has, set first within the initializer that makes it: the scenario, the notes and issues,
    /// the loop, and the item at its starting temperature.
    /// </summary>
    internal EngineContext Context
    {
        init
        {
            Scenario = value.Scenario;
            ModelNotes = value.Notes;
            ValidityIssues = value.Issues;
            Normal = value.Normal;
            Orientation = value.Orientation;
            LoopAreaSquareMeters = value.Scenario.Item.Loop.LoopAreaSquareMeters;
            FrequencyHertz = value.Frequency;
            ResistanceOhms = value.Rdc;
            InductanceHenries = value.Ldc;
            TimeConstantSeconds = value.Ldc / value.Rdc;
            SkinDepthMeters = value.SkinDepthMeters;
            InitialTemperatureCelsius = value.Start;
            PeakTemperatureCelsius = value.Start;
            FinalTemperatureCelsius = value.Start;
        }
    }

    /// <summary>
    /// The forces, set within the initializer that makes the response (after <see cref="Scenario"/>, whose item's
    /// mass and contact they read): the peak force and its direction, the ratio to the item's weight, the impulse and
    /// the launch speed of a free item (a transient drive), the mean force (an alternating one), the peak torque. The
    /// engine makes each response in one initializer rather than copying it for each part.
    /// </summary>
    internal (Vector3D Peak, Vector3D? Impulse, double Torque, Vector3D? Mean) Forces
    {
        init
        {
            double mass = Scenario.Item.MassKilograms;
            double impulseSize = value.Impulse?.Length ?? double.NaN;
            PeakForceNewtons = value.Peak.Length;
            PeakForceDirection = value.Peak.Length > 0 ? value.Peak.Normalized() : Vector3D.Zero;
            ForceToWeightRatio = value.Peak.Length / (mass * PhysicalConstants.StandardGravity);
            ImpulseNewtonSeconds = value.Impulse is null ? null : impulseSize;
            LaunchSpeedMetersPerSecond = value.Impulse is null || Scenario.Item.Contact != Items.ContactKind.Free ? null : impulseSize / mass;
            MeanForceNewtons = value.Mean?.Length;
            PeakTorqueNewtonMeters = value.Torque;
        }
    }

    /// <summary>A closed item's heating, set within the initializer that makes the response.</summary>
    internal HeatingFindings Heating
    {
        init
        {
            EnergyDissipatedJoules = value.EnergyJoules;
            PeakTemperatureCelsius = value.PeakCelsius;
            FinalTemperatureCelsius = value.FinalCelsius;
            MeltingReachedSeconds = value.MeltingReachedSeconds;
            MeltThroughSeconds = value.MeltThroughSeconds;
            HeatingSeries = value.Series;
        }
    }

    /// <summary>The number of current paths the item was solved with: 1 for a thin loop, the filament count for a thick section or a body; 0 when not solved.</summary>
    public int PathCount { get; init; }

    /// <summary>The largest current around the loop, A (zero for a split ring).</summary>
    public double PeakCurrentAmperes { get; init; }

    /// <summary>The textbook estimate peak emf / R, A, shown beside the circuit result for comparison only.</summary>
    public double? NaiveCurrentAmperes { get; init; }

    /// <summary>|Delta Phi| / L, the current a change much faster than L/R tends to, A (transient drives).</summary>
    public double? InductiveLimitCurrentAmperes { get; init; }

    private object _currentSense = string.Empty;

    /// <summary>The sense of the current in plain words (Lenz's law; written when first read).</summary>
    public string CurrentSense
    {
        get => LaterText.Read(ref _currentSense);
        init => _currentSense = value;
    }

    /// <summary>The sense of the current, to be written when first read.</summary>
    internal LaterText LaterCurrentSense
    {
        init => _currentSense = value;
    }

    /// <summary>The energy dissipated in the item, J.</summary>
    public double EnergyDissipatedJoules { get; init; }

    /// <summary>The item's temperature when the drive starts, °C.</summary>
    public double InitialTemperatureCelsius { get; init; }

    /// <summary>The item's highest temperature, °C.</summary>
    public double PeakTemperatureCelsius { get; init; }

    /// <summary>The item's temperature at the end of the exposure, °C.</summary>
    public double FinalTemperatureCelsius { get; init; }

    /// <summary>Peak minus initial temperature, K.</summary>
    public double TemperatureRiseKelvin => PeakTemperatureCelsius - InitialTemperatureCelsius;

    /// <summary>When the item reaches its melting point, s; null if it does not (beyond it the model is notional).</summary>
    public double? MeltingReachedSeconds { get; init; }

    /// <summary>
    /// How long after reaching its melting point the item would take to melt through (its latent heat over the power
    /// it takes in there, less its losses), if that power held, s; null when it does not melt or cannot be estimated.
    /// The model itself stops at the melting point: a molten loop opens.
    /// </summary>
    public double? MeltThroughSeconds { get; init; }

    /// <summary>How long the item is in the field, from the start of the drive, s.</summary>
    public double ExposureSeconds { get; init; }

    /// <summary>The time assessed, from the start of the drive: the exposure and the cooling after it, s.</summary>
    public double AssessedSeconds { get; init; }

    /// <summary>The electrical time series (one period for an alternating drive).</summary>
    [Newtonsoft.Json.JsonIgnore]
    public IReadOnlyList<CircuitSample> CircuitSeries { get; init; } = Array.Empty<CircuitSample>();

    /// <summary>The temperature history over the exposure.</summary>
    [Newtonsoft.Json.JsonIgnore]
    public IReadOnlyList<HeatingSample> HeatingSeries { get; init; } = Array.Empty<HeatingSample>();

    /// <summary>True when no validity issue affects any of the given results.</summary>
    public bool Trusts(AffectedResults results) => IssuesAffecting(results).Count == 0;

    /// <summary>"item in source".</summary>
    public override string ToString() => ItemName + " in " + SourceName;

    /// <summary>The validity issues that affect any of the given results.</summary>
    public IReadOnlyList<ValidityIssue> IssuesAffecting(AffectedResults results)
    {
        List<ValidityIssue>? affecting = null;
        for (int k = 0; k < ValidityIssues.Count; k++)
        {
            ValidityIssue issue = ValidityIssues[k];
            if ((issue.Affects & results) != 0)
            {
                (affecting ??= new List<ValidityIssue>()).Add(issue);
            }
        }

        return affecting is null ? Array.Empty<ValidityIssue>() : affecting.ToArray();
    }
}

/// <summary>What a closed item's heating history gives a response: its energy, peak and final temperatures, when it reaches its melting point and how long it then takes to melt through.</summary>
internal readonly record struct HeatingFindings(IReadOnlyList<HeatingSample> Series, double EnergyJoules, double PeakCelsius, double FinalCelsius, double? MeltingReachedSeconds, double? MeltThroughSeconds);
