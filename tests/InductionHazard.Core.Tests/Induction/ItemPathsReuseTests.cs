using System.Linq;
using System.Threading.Tasks;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>
/// An item keeps the current paths last built for it and hands them out again when asked for the same frequency,
/// starting temperature, model and refinement: the same paths as building them afresh, never those built for
/// anything else.
/// </summary>
public class ItemPathsReuseTests
{
    [Fact]
    public void TheSameAskGetsTheSamePathsAndAnyOtherGetsPathsBuiltForIt()
    {
        ConductiveItem disc = FilamentModelTests.Body("Disc", "Aluminium", 0.04, thickness: 0.01);
        ItemPaths first = ItemPaths.For(disc, 1000, 20, thinLoop: false);
        Assert.Same(first, ItemPaths.For(disc, 1000, 20, thinLoop: false));

        // Each part of the ask changes what is built: the skin depth (frequency), the resistivity (start), the
        // model (thin or filaments), the mesh (refinement).
        foreach ((double f, double start, bool thin, int refinement) in new[] { (5000.0, 20.0, false, 1), (1000.0, 60.0, false, 1), (1000.0, 20.0, true, 1), (1000.0, 20.0, false, 2) })
        {
            ItemPaths other = ItemPaths.For(disc, f, start, thin, refinement);
            ItemPaths fresh = ItemPaths.For(FilamentModelTests.Body("Disc", "Aluminium", 0.04, thickness: 0.01), f, start, thin, refinement);
            Assert.NotSame(first, other);
            Assert.Equal(fresh.Description, other.Description);
            Assert.Equal(fresh.Paths!.Count, other.Paths!.Count);
            Assert.Equal(fresh.ReferenceResistivityOhmMeters, other.ReferenceResistivityOhmMeters);
            Assert.Equal(fresh.Modes!.Lambdas, other.Modes!.Lambdas);
        }

        // Asked again after the others, the first ask is built again, equal to the first.
        ItemPaths again = ItemPaths.For(disc, 1000, 20, thinLoop: false);
        Assert.Equal(first.Description, again.Description);
        Assert.Equal(first.Modes!.Lambdas, again.Modes!.Lambdas);
    }

    [Fact]
    public void OneItemAssessedAtTwoSourcesOnManyThreadsGivesWhatEachGivesAlone()
    {
        // Two sources of different frequencies take turns on one item from eight threads, so its kept paths are
        // replaced while other threads read them: every response equals the one a fresh item gives at that source.
        ConductiveItem disc = FilamentModelTests.Body("Disc", "Copper", 0.03, thickness: 0.004);
        FieldSource low = FieldSource.Uniform("low", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        FieldSource high = FieldSource.Uniform("high", new SineWaveform(0.001, 20000, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        double Alone(FieldSource s) => InductionEngine.Respond(new Scenario(FilamentModelTests.Body("Disc", "Copper", 0.03, thickness: 0.004), s)).PeakTemperatureCelsius;
        double lowAlone = Alone(low), highAlone = Alone(high);
        Assert.NotEqual(lowAlone, highAlone);
        double[] seen = new double[64];
        Parallel.For(0, seen.Length, new ParallelOptions { MaxDegreeOfParallelism = 8 }, i => seen[i] = InductionEngine.Respond(new Scenario(disc, i % 2 == 0 ? low : high)).PeakTemperatureCelsius);
        Assert.All(Enumerable.Range(0, seen.Length), i => Assert.Equal(i % 2 == 0 ? lowAlone : highAlone, seen[i]));
    }
}
