using System;
using System.Collections.Generic;
using BenchmarkDotNet.Attributes;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Benchmarks;

/// <summary>
/// One ring assessment (a 20 mm copper ring of 2 mm wire, worn) in a uniform field, from scenario to verdict,
/// against the textbook emf = omega B A (or B A / t) and I = emf / R computed in the same run as the baseline; and one
/// inventory row as the pipeline meets it: a ring of its own (ten diameters in turn) read from the row's text, its
/// placement and inventory columns read, then assessed.
/// </summary>
[MemoryDiagnoser]
public class EngineBenchmarks
{
    private ConductiveItem _ring = null!;
    private FieldSource _sine = null!;
    private FieldSource _ramp10ms = null!;
    private FieldSource _ramp1s = null!;
    private KeyValuePair<string, object?>[][] _rows = null!;
    private int _next;
    private string[] _distinctDiameters = null!;
    private int _nextDistinct;

    /// <summary>Builds the item and sources once.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _ring = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002 }, MaterialLibrary.BuiltIn);
        _sine = FieldSource.Uniform("sine", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        _ramp10ms = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 0.01, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        _ramp1s = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 1, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        _distinctDiameters = new string[100_000];
        for (int k = 0; k < _distinctDiameters.Length; k++)
        {
            _distinctDiameters[k] = (18 + (1e-4 * k)).ToString("R", System.Globalization.CultureInfo.InvariantCulture) + " mm";
        }

        _rows = new KeyValuePair<string, object?>[10][];
        for (int k = 0; k < _rows.Length; k++)
        {
            _rows[k] = new KeyValuePair<string, object?>[]
            {
                new("Name", "Ring " + k), new("Material", "Copper"), new("Diameter", (18 + k) + " mm"), new("WireDiameter", "2 mm"), new("Contact", "Skin"),
            };
        }
    }

    /// <summary>The textbook formula: emf = omega B A, I = emf / R.</summary>
    [Benchmark(Baseline = true)]
    public double Textbook()
    {
        var sine = (SineWaveform)_sine.Terms[0].Waveform;
        return 2 * Math.PI * sine.FrequencyHertz * sine.Amplitude * _ring.Loop.LoopAreaSquareMeters / _ring.ResistanceOhms;
    }

    /// <summary>A continuous 10 mT, 50 Hz sine (8 h assessed).</summary>
    [Benchmark]
    public Verdict SineContinuous() => Assess(_sine);

    /// <summary>A ramp 0 to 1 T in 10 ms.</summary>
    [Benchmark]
    public Verdict Ramp10Milliseconds() => Assess(_ramp10ms);

    /// <summary>A ramp 0 to 1 T in 1 s.</summary>
    [Benchmark]
    public Verdict Ramp1Second() => Assess(_ramp1s);

    /// <summary>An inventory row (rings of ten diameters in turn, as text) read and assessed in a ramp in 10 ms.</summary>
    [Benchmark]
    public Verdict InventoryRowRamp10Milliseconds()
    {
        KeyValuePair<string, object?>[] row = _rows[_next];
        _next = (_next + 1) % _rows.Length;
        ConductiveItem item = ItemRecordReader.Read(row, MaterialLibrary.BuiltIn, _next, null, false);
        // Read by its parts, so that the program builds against commits whose reader gave two vectors or three.
        var placement = PlacementRecordReader.Read(row, "row", null);
        var scenario = new Scenario(item, _ramp10ms, new Placement(placement.Item1 ?? Vector3D.Zero, placement.Item2, null)) { Inventory = InventoryFields.Of(row) };
        return HazardAssessor.Assess(InductionEngine.Respond(scenario), HazardPolicy.Default).Verdict;
    }

    /// <summary>
    /// An inventory row of a ring of its own size (one of 100,000 diameter texts in turn, each a text the parser has
    /// not kept), read as the pipeline reads it: its item, its placement and its inventory columns, with no assessment.
    /// </summary>
    [Benchmark]
    public object ReadDistinctRow()
    {
        int k = _nextDistinct;
        _nextDistinct = (_nextDistinct + 1) % _distinctDiameters.Length;
        var row = new KeyValuePair<string, object?>[]
        {
            new("Name", "Ring"), new("Material", "Copper"), new("Diameter", _distinctDiameters[k]), new("WireDiameter", "2 mm"), new("Contact", "Skin"),
        };
        ConductiveItem item = ItemRecordReader.Read(row, MaterialLibrary.BuiltIn, k, null, false);
        var placement = PlacementRecordReader.Read(row, "row", null);
        return (item, placement.Item1, InventoryFields.Of(row));
    }

    private Verdict Assess(FieldSource source) =>
        HazardAssessor.Assess(InductionEngine.Respond(new Scenario(_ring, source)), HazardPolicy.Default).Verdict;
}
