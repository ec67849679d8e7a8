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
/// What judging a body's axis across the field costs: a copper rod 10 mm across and 120 mm long, held in a uniform
/// 10 mT field at 50 Hz and 60 mm above a 100 mm coil, assessed without a normal (solved along the largest flux
/// change and across it both ways, the worst kept) against the same rod given its axis along the field (one solve),
/// in the same run.
/// </summary>
[MemoryDiagnoser]
public class BodyOrientationBenchmarks
{
    private Scenario _uniformGiven = null!;
    private Scenario _uniformJudged = null!;
    private Scenario _coilGiven = null!;
    private Scenario _coilJudged = null!;

    /// <summary>Builds the scenarios.</summary>
    [GlobalSetup]
    public void Setup()
    {
        ConductiveItem rod = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "rod", ["Shape"] = "Cylinder", ["Material"] = "Copper", ["Diameter"] = "10 mm", ["Length"] = "120 mm", ["Contact"] = "Held" }, MaterialLibrary.BuiltIn);
        var uniform = FieldSource.Uniform("mains", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.05, 10), new SineWaveform(100, 50, drive: DriveKind.Current)) });
        _uniformGiven = new Scenario(rod, uniform, new Placement(Vector3D.Zero, Vector3D.UnitZ));
        _uniformJudged = new Scenario(rod, uniform);
        var above = new Vector3D(0, 0, 0.06);
        _coilJudged = new Scenario(rod, coil, new Placement(above));
        _coilGiven = new Scenario(rod, coil, new Placement(above, InductionEngine.Respond(_coilJudged).Normal));
    }

    /// <summary>Uniform field, the axis given along it (the baseline).</summary>
    [Benchmark(Baseline = true)]
    public InductionAssessment UniformAxisGiven() => HazardAssessor.Assess(InductionEngine.Respond(_uniformGiven), HazardPolicy.Default);

    /// <summary>Uniform field, no normal: three orientations judged.</summary>
    [Benchmark]
    public InductionAssessment UniformNoNormal() => HazardAssessor.Assess(InductionEngine.Respond(_uniformJudged), HazardPolicy.Default);

    /// <summary>Above a coil, the axis given along the largest flux change.</summary>
    [Benchmark]
    public InductionAssessment CoilAxisGiven() => HazardAssessor.Assess(InductionEngine.Respond(_coilGiven), HazardPolicy.Default);

    /// <summary>Above a coil, no normal: three orientations judged.</summary>
    [Benchmark]
    public InductionAssessment CoilNoNormal() => HazardAssessor.Assess(InductionEngine.Respond(_coilJudged), HazardPolicy.Default);
}
