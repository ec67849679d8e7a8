using System;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;
using Xunit.Abstractions;

namespace InductionHazard.Tests.Assessment;

/// <summary>
/// A stay given longer than the drive changes is read as the longest an item stays: leaving soon after the drive adds
/// the heat of leaving to the drive's before the item has shed it, so the shorter stay is judged too and the worse kept.
/// </summary>
public class StayTests
{
    private readonly ITestOutputHelper _out;

    public StayTests(ITestOutputHelper output) => _out = output;

    [Validates("a ring's rise after a ramp and leaving alike, stacked (short stay) and apart (long stay): 2 E / (m c) and E / (m c), E = (A B / T)^2 T / R", "Faraday's law and Joule heating, lumped heat capacity (textbook)", "0.01")]
    [Fact]
    public void ALongStayIsJudgedNoMilderThanLeavingAsSoonAsTheDriveStops()
    {
        // A worn 20 mm copper ring in a uniform ramp to 3 T over 1 s, carried out over 1 s (the default): the ramp and
        // the leaving each deposit E = (A B / T)^2 T / R (L/R = 91 us, so the current follows the emf). Leaving at once,
        // the two add before the ring cools (its time constant on the skin some minutes): a rise of 2 E / (m c). After
        // 8 h in the field the ramp's heat is long gone: E / (m c). The stay given, 8 h, is judged no milder than 1 s.
        ConductiveItem ring = Fixtures.Ring("Copper", 0.02, 0.002, contact: "Skin");
        var source = Fixtures.UniformRamp(0, 3, 1);
        InductionResponse response = Fixtures.Respond(ring, source, exposure: 8 * 3600);
        Assert.NotNull(response.ShorterStay);
        InductionResponse shorter = response.ShorterStay!;
        Assert.Equal(1, shorter.ExposureSeconds, 12);
        Assert.Equal(8 * 3600, response.ExposureSeconds, 6);

        double energy = Math.Pow(response.LoopAreaSquareMeters * 3 / 1, 2) * 1 / response.ResistanceOhms;
        double heatCapacity = ring.MassKilograms * ring.Material.SpecificHeatJoulesPerKilogramKelvin;
        _out.WriteLine($"E = {energy:G5} J; rise leaving at once {shorter.TemperatureRiseKelvin:G5} K against {2 * energy / heatCapacity:G5}; after 8 h {response.TemperatureRiseKelvin:G5} K against {energy / heatCapacity:G5}");
        Within.Relative(2 * energy / heatCapacity, shorter.TemperatureRiseKelvin, 0.01, "rise leaving as soon as the ramp ends");
        Within.Relative(energy / heatCapacity, response.TemperatureRiseKelvin, 0.01, "rise leaving after 8 h");

        InductionAssessment assessed = HazardAssessor.Assess(response, HazardPolicy.Default);
        InductionAssessment asGiven = HazardAssessor.Assess(response with { ShorterStay = null }, HazardPolicy.Default);
        InductionAssessment atOnce = HazardAssessor.Assess(shorter, HazardPolicy.Default);
        Assert.Same(shorter, assessed.Response);
        Assert.Equal(asGiven.InputHash, assessed.InputHash);
        Assert.NotEqual(HazardAssessor.Assess(Fixtures.Respond(ring, source), HazardPolicy.Default).InputHash, assessed.InputHash);
        Assert.Equal(atOnce.BurnMargin, assessed.BurnMargin);
        Assert.True(assessed.BurnMargin < 0.6 * asGiven.BurnMargin, assessed.BurnMargin + " against " + asGiven.BurnMargin);
        Assert.Contains(assessed.Response.ModelNotes, n => n.StartsWith("stay: judged as given (28.8 ks) and leaving as soon as the drive stops changing (1 s)", StringComparison.Ordinal) && n.EndsWith("this is the shorter stay", StringComparison.Ordinal));
    }

    [Fact]
    public void OnlyAStayLongerThanTheDriveFromAFieldThatStillHoldsFluxIsJudgedShorterToo()
    {
        // Not for the default stay (as long as the drive changes), a fixed item (it does not leave), a drive that ends
        // holding nothing (leaving heats nothing), or a sine (its heating grows with the stay).
        ConductiveItem ring = Fixtures.Ring("Copper", 0.02, 0.002, contact: "Skin");
        Assert.Null(Fixtures.Respond(ring, Fixtures.UniformRamp(0, 3, 1)).ShorterStay);
        Assert.Null(Fixtures.Respond(ring, Fixtures.UniformRamp(0, 3, 1), exposure: 0.5).ShorterStay);
        Assert.Null(Fixtures.Respond(Fixtures.Ring("Copper", 0.02, 0.002, contact: "Fixed"), Fixtures.UniformRamp(0, 3, 1), exposure: 600).ShorterStay);
        Assert.Null(Fixtures.Respond(ring, Fixtures.UniformRamp(3, 0, 1), exposure: 600).ShorterStay);
        Assert.Null(Fixtures.Respond(ring, Fixtures.UniformSine(0.01, 50, duration: 10), exposure: 600).ShorterStay);
        Assert.NotNull(Fixtures.Respond(ring, Fixtures.UniformRamp(0, 3, 1), exposure: 600).ShorterStay);

        // A drive shorter than any stay that can be given (0.1 s at least): its own span, not a refused input.
        InductionResponse pulse = Fixtures.Respond(ring, Fixtures.UniformRamp(0, 1, 0.01), exposure: 2);
        Assert.Equal(0.01, pulse.ShorterStay!.ExposureSeconds, 12);
        Assert.True(HazardAssessor.Assess(pulse, HazardPolicy.Default).BurnMargin <= HazardAssessor.Assess(pulse with { ShorterStay = null }, HazardPolicy.Default).BurnMargin);
    }

    [Validates("a loose 150 mm copper loop through a 3 T magnet cycle (up in 60 s, held 10 min, down in 60 s), judged by default for leaving while the field holds: the emf of carrying it out, A B / t over the 1 s it takes", "Faraday's law for a flat loop leaving a uniform field linearly in time (textbook)", "1e-9")]
    [Fact]
    public void AStayThroughADriveThatHoldsItsPeakIsJudgedLeavingWhileItHolds()
    {
        // A magnet cycled up, held and down: staying through to the end, the loop leaves a field that has fallen to zero
        // and carries nothing out; the slow ramps drive some 0.9 mV around it. Carried out while the field holds (the
        // usual way a person leaves a magnet at field), it leaves 3 T over a second: A B / t = 53 mV, 82 A, and a
        // turned torque some sixty times the ramps'. Judged both ways by default, and the worse kept, as with a stay
        // given that ends within the hold.
        ConductiveItem loop = Fixtures.Ring("Copper", 0.15, 0.004, contact: "Free");
        var cycle = FieldSource.Uniform("magnet cycle", PiecewiseLinearWaveform.Trapezoid(3, 60, 600, 60, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        InductionResponse response = Fixtures.Respond(loop, cycle);
        Assert.NotNull(response.ShorterStay);
        InductionResponse atField = response.ShorterStay!;
        Assert.Equal(60, atField.ExposureSeconds, 9);
        Assert.Equal(720, response.ExposureSeconds, 9);

        double carried = response.LoopAreaSquareMeters * 3 / Scenario.DefaultLeaveSeconds;
        Within.Relative(carried, atField.PeakEmfVolts, 1e-9, "A B / t leaving at the field");
        Assert.True(response.PeakEmfVolts < 0.02 * carried, "staying through, the ramps' emf " + response.PeakEmfVolts);

        InductionAssessment assessed = HazardAssessor.Assess(response, HazardPolicy.Default);
        InductionAssessment through = HazardAssessor.Assess(response with { ShorterStay = null }, HazardPolicy.Default);
        _out.WriteLine($"through: {through.Verdict}, torque margin {through.TorqueMargin:G4}; kept: {assessed.Verdict}, torque margin {assessed.TorqueMargin:G4}, emf {assessed.PeakEmfVolts:G4} V");
        Assert.Same(atField, assessed.Response);
        Assert.Equal(Verdict.Hazard, assessed.Verdict);
        Assert.NotEqual(Verdict.Hazard, through.Verdict);
        Assert.True(assessed.TorqueMargin < 0.05 * through.TorqueMargin, assessed.TorqueMargin + " against " + through.TorqueMargin);
        Assert.Equal(through.InputHash, assessed.InputHash);
        Assert.Contains(assessed.Response.ModelNotes, n => n.StartsWith("stay: judged as given (by default the drive's span, 720 s) and leaving as soon as the field at the item first reaches its largest and holds (60 s)", StringComparison.Ordinal));

        // A stay given that ends within the hold leaves at the field already; it is judged leaving as the hold begins
        // too, which carries the ramp's heat out with it. Both carry 3 T out: their torques differ in the fifth figure
        // (their steps differ), and each mechanism is the worse of the two.
        InductionAssessment fiveMinutes = HazardAssessor.Assess(Fixtures.Respond(loop, cycle, exposure: 300), HazardPolicy.Default);
        Within.Relative(assessed.TorqueMargin!.Value, fiveMinutes.TorqueMargin!.Value, 1e-4, "the torque margins leaving at 60 s and at 300 s");
        Assert.True(fiveMinutes.TorqueMargin <= assessed.TorqueMargin, "the worse of the two stays");
        Assert.Equal(60, fiveMinutes.Response.ExposureSeconds, 9);

        // The same cycle started later leaves at the start of its hold too (a plateau read an ulp higher at its far end
        // is still left at its start), with the same margins.
        foreach (double start in new[] { 1000.0 / 3, 7654.321 })
        {
            var later = FieldSource.Uniform("magnet cycle", PiecewiseLinearWaveform.Trapezoid(3, 60, 600, 60, start, DriveKind.FluxDensity), Vector3D.UnitZ);
            InductionAssessment shifted = HazardAssessor.Assess(Fixtures.Respond(loop, later), HazardPolicy.Default);
            Assert.Equal(60, shifted.Response.ExposureSeconds, 6);
            Within.Relative(assessed.TorqueMargin!.Value, shifted.TorqueMargin!.Value, 1e-6, "the torque margin, started at " + start);
            Within.Relative(assessed.BurnMargin!.Value, shifted.BurnMargin!.Value, 1e-6, "the burn margin, started at " + start);
        }

        // Not for a drive whose peak does not hold for a leaving: a pulse, or a peak held for half the second it takes and
        // gone in another half. (A fall as slow as the rise keeps the field within 1 % of its peak through the second.)
        Assert.Null(Fixtures.Respond(loop, FieldSource.Uniform("short hold", PiecewiseLinearWaveform.Trapezoid(3, 60, 0.5, 0.5, drive: DriveKind.FluxDensity), Vector3D.UnitZ)).ShorterStay);
        Assert.NotNull(Fixtures.Respond(loop, FieldSource.Uniform("short hold, slow fall", PiecewiseLinearWaveform.Trapezoid(3, 60, 0.5, 60, drive: DriveKind.FluxDensity), Vector3D.UnitZ)).ShorterStay);
        Assert.Null(Fixtures.Respond(loop, Fixtures.UniformRamp(3, 0, 1), exposure: 600).ShorterStay);
    }

    [Fact]
    public void TheStayKeptIsTheOneThatHeatsMoreNotOneWhoseTorqueDiffersInItsFifthFigure()
    {
        // Both stays are torque Hazards, their torque margins a step's rounding apart (0.04643 and 0.04644 when this
        // was written); the heating differs by a quarter. The stay kept is the one that heats more, so the burn
        // margin reported is the smaller.
        ConductiveItem ring = Fixtures.Ring("Copper", 0.02, 0.002, contact: "Skin");
        InductionResponse response = InductionEngine.Respond(new Scenario(ring, Fixtures.UniformRamp(0, 3, 1), null, 601, null, 0.3));
        InductionAssessment asGiven = HazardAssessor.Assess(response with { ShorterStay = null }, HazardPolicy.Default);
        InductionAssessment atOnce = HazardAssessor.Assess(response.ShorterStay!, HazardPolicy.Default);
        _out.WriteLine($"torque margins {asGiven.TorqueMargin:G6} and {atOnce.TorqueMargin:G6}; burn margins {asGiven.BurnMargin:G6} and {atOnce.BurnMargin:G6}");
        Assert.Equal(Verdict.Hazard, asGiven.Verdict);
        Assert.True(atOnce.BurnMargin < 0.9 * asGiven.BurnMargin);
        Within.Relative(asGiven.TorqueMargin!.Value, atOnce.TorqueMargin!.Value, 1e-3, "torque margins of the two stays");
        Assert.Equal(atOnce.BurnMargin, HazardAssessor.Assess(response, HazardPolicy.Default).BurnMargin);
    }

    [Fact]
    public void ARepeatedRowTakesTheShorterStayItsFirstRowKept()
    {
        ConductiveItem ring = Fixtures.Ring("Copper", 0.02, 0.002, contact: "Skin");
        InductionResponse response = Fixtures.Respond(ring, Fixtures.UniformRamp(0, 3, 1), exposure: 600);
        InductionAssessment assessed = HazardAssessor.Assess(response, HazardPolicy.Default, 1);
        Assert.Equal(1, assessed.Response.ExposureSeconds, 12);
        InductionResponse again = RepeatedRows.Relabel(response, "Spare ring", Fixtures.InventoryRow(), 2);
        InductionAssessment relabelled = assessed.For(again, 2);
        Assert.Equal("Spare ring", relabelled.ItemName);
        Assert.Equal(1, relabelled.Response.ExposureSeconds, 12);
        Assert.Equal("Spare ring", relabelled.Response.ItemName);
        Assert.Equal(HazardAssessor.Assess(again, HazardPolicy.Default, 2).BurnMargin, relabelled.BurnMargin);
    }
}
