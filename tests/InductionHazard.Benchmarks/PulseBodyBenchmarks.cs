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
/// A solid body beside a pulse coil, as the demo's brass drift lies: 6 mm across and 120 mm long, its centre 120 mm
/// out and 40 mm above a 12-turn coil of 80 mm radius fed by a crowbarred discharge (4 mF at 6 kV into 120 uH and 40
/// mOhm: first peak 1 ms, then an L/R decay of 3 ms followed for 28 ms). Solved as some 500 coaxial filaments; given
/// its normal (one orientation) and not (three), against a 20 mm copper ring of 2 mm wire at the same place and in
/// the same pulse (one path) as the baseline.
/// </summary>
[MemoryDiagnoser]
public class PulseBodyBenchmarks
{
    private Scenario _ring = null!;
    private Scenario _driftGiven = null!;
    private Scenario _driftJudged = null!;

    /// <summary>Builds the scenarios.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var coil = new FieldSource("P2", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.08, 12), new DischargeWaveform(4e-3, 6000, 120e-6, 0.04, crowbar: true)) });
        ConductiveItem drift = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "drift", ["Shape"] = "Cylinder", ["Material"] = "Brass", ["Diameter"] = "6 mm", ["Length"] = "120 mm", ["Contact"] = "Free" }, MaterialLibrary.BuiltIn);
        ConductiveItem ring = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002, ["Contact"] = "Free" }, MaterialLibrary.BuiltIn);
        var beside = new Vector3D(0.12, 0, 0.04);
        _ring = new Scenario(ring, coil, new Placement(beside));
        _driftJudged = new Scenario(drift, coil, new Placement(beside));
        _driftGiven = new Scenario(drift, coil, new Placement(beside, InductionEngine.Respond(_driftJudged).Normal));
    }

    /// <summary>The ring at the same place (the baseline).</summary>
    [Benchmark(Baseline = true)]
    public InductionAssessment Ring() => HazardAssessor.Assess(InductionEngine.Respond(_ring), HazardPolicy.Default);

    /// <summary>The drift given its normal: one orientation.</summary>
    [Benchmark]
    public InductionAssessment DriftNormalGiven() => HazardAssessor.Assess(InductionEngine.Respond(_driftGiven), HazardPolicy.Default);

    /// <summary>The drift given no normal: its axis along the largest flux change and across it both ways.</summary>
    [Benchmark]
    public InductionAssessment DriftNoNormal() => HazardAssessor.Assess(InductionEngine.Respond(_driftJudged), HazardPolicy.Default);
}
