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
/// What finding the worst orientation costs where the field varies across the loop: a 20 mm copper ring worn near a
/// 100 mm coil at 50 Hz, assessed without a normal (the engine searches for the orientation that links the most flux)
/// against the same ring given that very normal (no search), in the same run. Two places: 10 mm from the winding,
/// where the search turns the ring some 7 degrees from the axes' estimate, and 100 mm above the coil's plane, where a poll about the
/// estimate finds nothing to gain and the search stops there.
/// </summary>
[MemoryDiagnoser]
public class OrientationBenchmarks
{
    private Scenario _nearSearched = null!;
    private Scenario _nearGiven = null!;
    private Scenario _aboveSearched = null!;
    private Scenario _aboveGiven = null!;

    /// <summary>Builds the scenarios, each given normal the one the search finds.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10), new SineWaveform(100, 50, drive: DriveKind.Current)) });
        ConductiveItem ring = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = "20 mm", ["WireDiameter"] = "2 mm" }, MaterialLibrary.BuiltIn);
        (Scenario Searched, Scenario Given) At(Vector3D centre)
        {
            var searched = new Scenario(ring, coil, new Placement(centre));
            return (searched, new Scenario(ring, coil, new Placement(centre, InductionEngine.Respond(searched).Normal)));
        }

        (_nearSearched, _nearGiven) = At(new Vector3D(0.09, 0, 0.01));
        (_aboveSearched, _aboveGiven) = At(new Vector3D(0.05, 0, 0.1));
    }

    /// <summary>Near the winding, the normal given (the baseline).</summary>
    [Benchmark(Baseline = true)]
    public InductionAssessment NearWindingNormalGiven() => HazardAssessor.Assess(InductionEngine.Respond(_nearGiven), HazardPolicy.Default);

    /// <summary>Near the winding, the normal searched for.</summary>
    [Benchmark]
    public InductionAssessment NearWindingSearched() => HazardAssessor.Assess(InductionEngine.Respond(_nearSearched), HazardPolicy.Default);

    /// <summary>Above the coil, the normal given.</summary>
    [Benchmark]
    public InductionAssessment AboveCoilNormalGiven() => HazardAssessor.Assess(InductionEngine.Respond(_aboveGiven), HazardPolicy.Default);

    /// <summary>Above the coil, the normal searched for.</summary>
    [Benchmark]
    public InductionAssessment AboveCoilSearched() => HazardAssessor.Assess(InductionEngine.Respond(_aboveSearched), HazardPolicy.Default);
}
