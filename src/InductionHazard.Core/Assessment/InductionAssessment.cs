using System;
using System.Collections.Generic;
using InductionHazard.Criteria;

namespace InductionHazard.Assessment;

/// <summary>
/// The verdict on one item at one place: per-mechanism results and margins, the governing mechanism, the key
/// numbers flattened for CSV export, the cautions and the provenance. Built by <see cref="HazardAssessor"/>.
/// </summary>
public sealed class InductionAssessment
{
    /// <summary>The item's name.</summary>
    public string ItemName { get => _itemName; init => _itemName = value; }

    private string _itemName = string.Empty;

    /// <summary>The position of the item's record in the input (1-based), when it came from a pipeline or file.</summary>
    public int? RowNumber { get => _rowNumber; init => _rowNumber = value; }

    private int? _rowNumber;

    /// <summary>The site station at which the item was assessed; empty when the field came from -Source.</summary>
    public string StationName { get => _stationName; init => _stationName = value; }

    private string _stationName = string.Empty;

    /// <summary>The inventory row's own columns (asset tag, holder, location, notes...): every column that is not an item, placement or station field.</summary>
    public InventoryFields Inventory { get => _inventory; init => _inventory = value; }

    private InventoryFields _inventory = InventoryFields.Empty;

    /// <summary>The source's name.</summary>
    public string SourceName { get; init; } = string.Empty;

    /// <summary>How the item's loop was oriented: as given, or facing the largest flux change (with the normal).</summary>
    public string Orientation { get; init; } = string.Empty;

    /// <summary>The overall verdict.</summary>
    public Verdict Verdict { get; init; }

    /// <summary>The mechanism that decides the verdict (lowest margin, or the one that cannot be judged).</summary>
    public HazardMechanism? GoverningMechanism { get; init; }

    /// <summary>The lowest margin over the mechanisms that apply; NaN when the verdict is Indeterminate.</summary>
    public double MinimumMargin { get; init; } = double.NaN;

    private object _summary = string.Empty;

    /// <summary>The finding in one sentence (written when first read).</summary>
    public string Summary
    {
        get => LaterText.Read(ref _summary);
        init => _summary = value;
    }

    /// <summary>The finding, to be written when first read.</summary>
    internal LaterText LaterSummary
    {
        init => _summary = value;
    }

    private object _action = string.Empty;

    /// <summary>What to do, in plain words: the action for a Hazard or Indeterminate, what restores the margin for a Caution (written when first read).</summary>
    public string Action
    {
        get => LaterText.Read(ref _action);
        init => _action = value;
    }

    /// <summary>The action, to be written when first read.</summary>
    internal LaterText LaterAction
    {
        init => _action = value;
    }

    /// <summary>The action in a few words ("Take it off", "Keep out or fix down", "Unsafe until assessed", "Use with care", "None"), for narrow tables.</summary>
    public string ActionBrief { get; init; } = string.Empty;

    /// <summary>Every mechanism checked, including those that do not apply (with the reason).</summary>
    public MechanismList Mechanisms { get; init; } = MechanismList.Empty;

    /// <summary>The Shock margin; null when it does not apply.</summary>
    public double? ShockMargin { get; init; }

    /// <summary>The Arc margin (the gap's breakdown voltage over the peak gap voltage), or null when it does not apply.</summary>
    public double? ArcMargin { get; init; }

    /// <summary>The Burn margin; null when it does not apply.</summary>
    public double? BurnMargin { get; init; }

    /// <summary>The Overheat margin; null when it does not apply.</summary>
    public double? OverheatMargin { get; init; }

    /// <summary>The Force margin (the item's weight over the peak force), or null when it does not apply.</summary>
    public double? ForceMargin { get; init; }

    /// <summary>The Torque margin (the gravitational torque over the peak torque), or null when it does not apply.</summary>
    public double? TorqueMargin { get; init; }

    /// <summary>The Attraction margin (a ferromagnetic item's weight over its pull), or null when it does not apply.</summary>
    public double? AttractionMargin { get; init; }

    /// <summary>The Exposure margin (a worn or held item's wearer in the field), or null when it does not apply.</summary>
    public double? ExposureMargin { get; init; }

    // The figures below are those of the response kept, or for an item whose orientation the engine chose among several
    // (a body given no normal, judged with its axis along the largest flux change and across it) or judged for two
    // stays, each the largest over all it judged (WithLargestFigures): the orientation is not known, and the one kept
    // for its verdict may link no flux around its axis at all.
    private double _peakFluxDensity, _peakFlux, _peakForce, _peakEmf, _peakCurrent, _peakTemperature, _energy;
    private double? _rmsEmf, _gapVoltage;

    /// <summary>
    /// The largest flux density normal to the item's loop at its centre, T. For an item whose orientation was not given
    /// and that was judged in several (a body with its axis along the largest flux change and across it), this and the
    /// figures below are each the largest over the orientations and stays judged. The field is the source's, shown whatever
    /// the item's own model; the figures below are NaN when a broken model assumption affects them.
    /// </summary>
    public double PeakFluxDensityTesla { get => _peakFluxDensity; init => _peakFluxDensity = value; }

    /// <summary>The largest flux through the item's loop, Wb.</summary>
    public double PeakFluxWebers { get => _peakFlux; init => _peakFlux = value; }

    /// <summary>The peak force on the item, N (NaN when the current is not trusted).</summary>
    public double PeakForceNewtons { get => _peakForce; init => _peakForce = value; }

    /// <summary>The peak emf around the loop, V.</summary>
    public double PeakEmfVolts { get => _peakEmf; init => _peakEmf = value; }

    /// <summary>The rms emf around the loop of an alternating drive, V; null for a transient.</summary>
    public double? RmsEmfVolts { get => _rmsEmf; init => _rmsEmf = value; }

    /// <summary>The peak gap voltage of a split ring, V; null for a closed loop.</summary>
    public double? GapVoltageVolts { get => _gapVoltage; init => _gapVoltage = value; }

    /// <summary>The peak loop current, A.</summary>
    public double PeakCurrentAmperes { get => _peakCurrent; init => _peakCurrent = value; }

    /// <summary>The item's peak temperature, °C.</summary>
    public double PeakTemperatureCelsius { get => _peakTemperature; init => _peakTemperature = value; }

    /// <summary>The energy dissipated in the item, J.</summary>
    public double EnergyDissipatedJoules { get => _energy; init => _energy = value; }

    /// <summary>How many orientations and stays the figures are the largest over: 1 for an item judged as it was placed.</summary>
    public int FiguresJudgedOver { get; private set; } = 1;

    /// <summary>The response whose current a chart draws: of the orientations and stays judged, the one whose peak current is the figure shown (this one's own by default).</summary>
    internal InductionResponse CurrentCharted => _currentCharted ?? _response;

    /// <summary>The response whose heating a chart draws: the one whose peak temperature is the figure shown (this one's own by default).</summary>
    internal InductionResponse HeatingCharted => _heatingCharted ?? _response;

    private InductionResponse? _currentCharted, _heatingCharted;

    /// <summary>
    /// This assessment with each figure the largest over <paramref name="judged"/> (the orientations and stays judged,
    /// this one among them): NaN where any is NaN, as a figure not trusted in one of them is not shown from the others.
    /// </summary>
    internal InductionAssessment WithLargestFigures(IReadOnlyList<InductionAssessment> judged)
    {
        var copy = (InductionAssessment)MemberwiseClone();
        copy._peakFluxDensity = Largest(judged, a => a._peakFluxDensity);
        copy._peakFlux = Largest(judged, a => a._peakFlux);
        copy._peakForce = Largest(judged, a => a._peakForce);
        copy._peakEmf = Largest(judged, a => a._peakEmf);
        copy._rmsEmf = _rmsEmf is null ? null : Largest(judged, a => a._rmsEmf ?? double.NaN);
        copy._gapVoltage = _gapVoltage is null ? null : Largest(judged, a => a._gapVoltage ?? double.NaN);
        copy._peakCurrent = Largest(judged, a => a._peakCurrent);
        copy._peakTemperature = Largest(judged, a => a._peakTemperature);
        copy._energy = Largest(judged, a => a._energy);
        copy.FiguresJudgedOver = judged.Count;
        copy._currentCharted = Reaching(judged, copy._peakCurrent, a => a._peakCurrent);
        copy._heatingCharted = Reaching(judged, copy._peakTemperature, a => a._peakTemperature);
        return copy;
    }

    /// <summary>The response of the first judged whose figure is the one shown (this one's where it is, or none is finite).</summary>
    private InductionResponse? Reaching(IReadOnlyList<InductionAssessment> judged, double shown, Func<InductionAssessment, double> figure)
    {
        if (figure(this) == shown || double.IsNaN(shown))
        {
            return null;
        }

        foreach (InductionAssessment a in judged)
        {
            if (figure(a) == shown)
            {
                return a._response;
            }
        }

        return null;
    }

    private static double Largest(IReadOnlyList<InductionAssessment> judged, Func<InductionAssessment, double> figure)
    {
        double largest = double.NegativeInfinity;
        foreach (InductionAssessment a in judged)
        {
            double value = figure(a);
            if (double.IsNaN(value))
            {
                return double.NaN;
            }

            largest = Math.Max(largest, value);
        }

        return largest;
    }

    /// <summary>Why the verdict is what it is: the broken assumptions of an Indeterminate, the findings of a Hazard or Caution.</summary>
    public TextList Reasons { get; init; } = TextList.Empty;

    /// <summary>The standards and sources of the limits applied (and of the safety factor).</summary>
    public TextList Standards { get; init; } = TextList.Empty;

    /// <summary>The cautions every assessment carries, with the standards the limits came from.</summary>
    public TextList Cautions { get; init; } = TextList.Empty;

    /// <summary>The policy applied.</summary>
    public string PolicyName { get; init; } = string.Empty;

    /// <summary>The SHA-256 fingerprint of the policy applied (<see cref="HazardPolicy.Fingerprint"/>).</summary>
    public string PolicyHash { get; init; } = string.Empty;

    private string? _inputHash;

    /// <summary>
    /// The SHA-256 fingerprint of the inputs the assessment was computed from (<see cref="Scenario.Fingerprint"/>),
    /// found when first read: reports and exports read it, a verdict on screen does not need it.
    /// </summary>
    public string InputHash
    {
        get => _inputHash ??= Response?.Scenario?.Fingerprint() ?? string.Empty;
        init => _inputHash = value;
    }

    /// <summary>Whose exposure the policy judged the person's own field for: workers or the general public.</summary>
    public Criteria.ExposureGroup ExposureGroup { get; init; }

    /// <summary>The safety factor applied between Clear and Caution.</summary>
    public double SafetyFactor { get; init; }

    /// <summary>The module version that produced the assessment.</summary>
    public string ModuleVersion { get; init; } = string.Empty;

    /// <summary>When the assessment was made: ISO 8601 in UTC ("2026-12-02T09:30:00Z"), which sorts as text and reads the same in every culture.</summary>
    public string AssessedUtc { get => _assessedUtc; init => _assessedUtc = value; }

    private string _assessedUtc = string.Empty;

    /// <summary>The physics behind the verdict. ConvertTo-Json gives its figures, not its time series or inputs (Export-HazardReport -Format Json -IncludeSeries gives those).</summary>
    public InductionResponse Response { get => _response; init => _response = value; }

    private InductionResponse _response = null!;

    /// <summary>Which of a body's responses with its axis across the field this assessment kept as the worst (<see cref="InductionResponse.AcrossAxis"/>); -1: the one along it, or an item with one response.</summary>
    internal int AcrossIndex { get; set; } = -1;

    /// <summary>Whether this assessment kept the shorter stay (<see cref="InductionResponse.ShorterStay"/>: leaving as soon as the drive stops changing, or as soon as the field at the item first reaches its largest and holds) over the stay given.</summary>
    internal bool ShorterStayKept { get; set; }

    /// <summary>
    /// This assessment for another row that describes the same item at the same place (see <see cref="RepeatedRows"/>):
    /// the same verdict, margins and findings under that row's item name, row number, station and inventory columns,
    /// stamped now; <paramref name="response"/> is this one's response for that row (<see cref="InductionResponse.For"/>).
    /// </summary>
    internal InductionAssessment For(InductionResponse response, int? rowNumber, DateTime? now = null)
    {
        var copy = (InductionAssessment)MemberwiseClone();
        copy._itemName = response.ItemName;
        copy._rowNumber = rowNumber;
        copy._stationName = response.Scenario.StationName ?? string.Empty;
        copy._inventory = response.Scenario.Inventory;
        copy._assessedUtc = HazardAssessor.Stamp((now ?? DateTime.UtcNow).ToUniversalTime());
        // An assessment that kept a body's axis across the field is that orientation's: the same of the row's response.
        InductionResponse stay = ShorterStayKept && response.ShorterStay is { } shorter ? shorter : response;
        copy._response = AcrossIndex >= 0 && AcrossIndex < stay.AcrossAxis.Count ? stay.AcrossAxis[AcrossIndex] : stay;
        copy._inputHash = null;
        return copy;
    }
}
