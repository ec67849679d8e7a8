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
/// against the textbook emf = omega B A (or B A / t) and I = emf / R computed in the same run as the baseline.
/// </summary>
[MemoryDiagnoser]
public class EngineBenchmarks
{
    private ConductiveItem _ring = null!;
    private FieldSource _sine = null!;
    private FieldSource _ramp10ms = null!;
    private FieldSource _ramp1s = null!;

    /// <summary>Builds the item and sources once.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _ring = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002 }, MaterialLibrary.BuiltIn);
        _sine = FieldSource.Uniform("sine", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        _ramp10ms = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 0.01, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        _ramp1s = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 1, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
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

    private Verdict Assess(FieldSource source) =>
        HazardAssessor.Assess(InductionEngine.Respond(new Scenario(_ring, source)), HazardPolicy.Default).Verdict;
}
