using System;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>The weighted-peak method, against what it must reduce to where the answer is known in closed form.</summary>
public sealed class WeightedPeakTests
{
    private static FieldSource Tones(params (double Tesla, double Hertz)[] tones) =>
        new("tones", tones.Select(t => new SourceTerm(new UniformField(Vector3D.UnitZ), new SineWaveform(t.Tesla, t.Hertz, drive: DriveKind.FluxDensity))).ToArray());

    [Theory]
    [InlineData(5.0)]
    [InlineData(15.0)]
    [InlineData(100.0)]
    [InlineData(1000.0)]
    [InlineData(20000.0)]
    [Validates("weighted-peak index of a sinusoid in each band of the reference levels: its rms over the level", "ICNIRP 2010 table 3 (occupational reference levels; the method reduces to them for one frequency)", "0.1 %")]
    public void ForOneSinusoidTheIndexIsItsRmsOverTheReferenceLevel(double hertz)
    {
        double tesla = 1e-3;
        (double index, string? problem) = WeightedPeak.At(Tones((tesla, hertz)), Vector3D.Zero, publicExposure: false);
        Assert.Null(problem);
        Within.Relative(tesla / Math.Sqrt(2) / ExposureLimits.OccupationalTesla(hertz), index, 1e-3, "index at " + hertz + " Hz");
    }

    [Fact]
    [Validates("weighted-peak index of 50 Hz and 150 Hz tones, where the levels are flat: the peak of the summed field over the peak level", "ICNIRP 2010 table 3 and ICNIRP 2003 (the weighted peak is the field itself where the weighting is flat); peak of the sum found by a direct time-domain search", "0.1 %")]
    public void WhereTheLevelsAreFlatTheIndexIsThePeakOfTheSummedField()
    {
        (double index, _) = WeightedPeak.At(Tones((1e-3, 50), (0.6e-3, 150)), Vector3D.Zero, publicExposure: false);
        double peak = Enumerable.Range(0, 200_000).Select(i => i * 0.02 / 200_000).Max(t => Math.Abs((1e-3 * Math.Sin(2 * Math.PI * 50 * t)) + (0.6e-3 * Math.Sin(2 * Math.PI * 150 * t))));
        Within.Relative(peak / (Math.Sqrt(2) * 1e-3), index, 1e-3, "index in the flat band");
    }

    [Fact]
    [Validates("weighted-peak index of 500 Hz and 1.5 kHz tones, where the levels fall as 1/f: the peak rate of change over 2 pi 0.3 T Hz sqrt 2", "ICNIRP 2010 table 3 (0.3/f T between 300 Hz and 3 kHz: the weighting is a differentiator there); peak rate found by a direct time-domain search", "0.1 %")]
    public void WhereTheLevelsFallAsOneOverFTheIndexFollowsThePeakRateOfChange()
    {
        (double index, _) = WeightedPeak.At(Tones((1e-4, 500), (0.5e-4, 1500)), Vector3D.Zero, publicExposure: false);
        double peakRate = Enumerable.Range(0, 200_000).Select(i => i * 0.002 / 200_000)
            .Max(t => Math.Abs((1e-4 * 2 * Math.PI * 500 * Math.Cos(2 * Math.PI * 500 * t)) + (0.5e-4 * 2 * Math.PI * 1500 * Math.Cos(2 * Math.PI * 1500 * t))));
        Within.Relative(peakRate / (2 * Math.PI * 0.3 * Math.Sqrt(2)), index, 1e-3, "index in the 1/f band");
    }

    [Fact]
    public void APulseIsJudgedByItsWeightedPeakAndAFieldThatStaysByTheStaticLimit()
    {
        // A 1 ms ramp to 1 mT: its changes are judged, with a finite margin and the method named.
        var pulse = FieldSource.Uniform("pulse", new RampWaveform(0, 1e-3, 1e-3, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        FieldExposure e = FieldExposure.At(pulse, Vector3D.Zero, publicExposure: false, HazardPolicy.Default);
        Assert.NotEqual(Verdict.Indeterminate, e.Verdict);
        Assert.True(Finite.Is(e.Margin) && e.Margin > 0);
        Assert.Contains("weighted peak", e.Basis, StringComparison.Ordinal);
        Assert.Contains(ExposureLimits.WeightedPeakSource, e.Standards);

        // Faster is worse: the same step in a tenth of the time has a smaller margin.
        var faster = FieldSource.Uniform("faster", new RampWaveform(0, 1e-3, 1e-4, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        Assert.True(FieldExposure.At(faster, Vector3D.Zero, false, HazardPolicy.Default).Margin < e.Margin);

        // A magnet ramped to 7 T over ten minutes and held: hardly any changing field, but 7 T stays; the static limit governs.
        var magnet = FieldSource.Uniform("magnet", new RampWaveform(0, 7, 600, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        FieldExposure held = FieldExposure.At(magnet, Vector3D.Zero, false, HazardPolicy.Default);
        Assert.Equal(Verdict.Hazard, held.Verdict);
        Within.Relative(ExposureLimits.StaticOccupationalTesla / 7, held.Margin, 1e-9, "static margin");
    }

    [Fact]
    public void AHarmonicWithinRoundingOfACornerIsWeightedAsTheCornerItself()
    {
        // A 0.35 s ramp to 5 T from t = 0 has a 1.4 s record, whose 35th harmonic is 25 Hz, a corner where the
        // weighting's phase turns from 90 to 0 degrees. Written as "350 ms" (0.35000000000000003 s), or started at
        // 1 s, the same harmonic came out at 24.999999999999996 Hz and was weighted as the band below: indices of
        // 51.6 against 50.1. Every way of writing the ramp must give one index.
        double parsed = QuantityParser.Parse("350 ms", QuantityKind.Time);
        double[] indices = new[] { (0.35, 0.0), (parsed, 0.0), (0.35, 1.0), (parsed, 1.0) }
            .Select(c => WeightedPeak.At(FieldSource.Uniform("ramp", new RampWaveform(0, 5, c.Item1, c.Item2, DriveKind.FluxDensity), Vector3D.UnitZ), Vector3D.Zero, publicExposure: false).Index)
            .ToArray();
        Assert.All(indices, i => Within.Relative(indices[0], i, 1e-9, "index"));

        foreach (double corner in new[] { 1.0, 8, 25, 300, 400, 3000 })
        {
            double below = corner * (1 - 1e-15);
            Assert.Equal(WeightedPeak.PhaseRadians(corner, publicExposure: false), WeightedPeak.PhaseRadians(below, publicExposure: false));
            Assert.Equal(WeightedPeak.PhaseRadians(corner, publicExposure: true), WeightedPeak.PhaseRadians(below, publicExposure: true));
            Assert.Equal(ExposureLimits.PublicTesla(corner), ExposureLimits.PublicTesla(below), 1e-12);
            Assert.Equal(ExposureLimits.OccupationalTesla(corner), ExposureLimits.OccupationalTesla(below), 1e-12);
        }

        // Clearly below a corner is still the band below.
        Assert.Equal(Math.PI / 2, WeightedPeak.PhaseRadians(24.9, publicExposure: false));
        Assert.Equal(8e-2 / 2999, ExposureLimits.PublicTesla(2999));
    }

    [Validates("weighted-peak index of a field that turns as it alternates (beside a flat three-phase set): its resultant rms over the reference level, as a sinusoid of one frequency is judged", "ICNIRP 2010 table 3 (1 mT rms at 50 Hz, occupational); the resultant field (root sum of squares of the components' rms values; IEC 61786-1, from memory), computed here by averaging |B(t)|^2 over a period of the three lines' fields, mu0 i / (2 pi r) each (Ampere's law)", "1e-5")]
    [Fact]
    public void ForAFieldThatTurnsTheIndexIsItsResultantRmsOverTheReferenceLevel()
    {
        // The point 50 mm from the middle of three 1 kA lines 100 mm apart, where the field traces a fat ellipse: the
        // largest magnitude of the weighted vector is its major semi-axis over 1 mT sqrt 2, a quarter below the resultant
        // rms the reference levels are read against. A trace of a fifth harmonic (1 %) must not loosen the judgement.
        (FieldSource set, Vector3D point, double resultant, _) = Fixtures.ThreePhaseAtFiftyMillimetres(1000);
        double index = WeightedPeak.At(set, point, publicExposure: false).Index;
        Within.Relative(resultant / 1e-3, index, 1e-5, "index against the resultant rms over 1 mT");
        Within.Relative(FieldExposure.At(set, point, false, HazardPolicy.Default).Margin, 1 / index, 1e-5, "the margin a sinusoid of one frequency is given");

        (FieldSource harmonic, _, _, _) = Fixtures.ThreePhaseAtFiftyMillimetres(10, 250);
        var both = FieldSource.Combine(new[] { set, harmonic });
        double withHarmonic = WeightedPeak.At(both, point, publicExposure: false).Index;
        Assert.True(Math.Abs((withHarmonic / index) - 1) < 0.02, "a 1 % fifth harmonic moves the index by " + ((withHarmonic / index) - 1).ToString("P1", System.Globalization.CultureInfo.InvariantCulture));
    }

    [Fact]
    public void AFieldThatIsNotANumberGivesNoIndexNeverAPassingOne()
    {
        // A geometry that yields NaN (a defect inside a field model) under a pulse: the index is NaN with its reason,
        // not the largest of the samples that are numbers (which would be 0 here, and pass).
        FieldSource broken = Fixtures.BrokenGeometry(new RampWaveform(0, 1, 0.01, drive: DriveKind.FluxDensity));
        (double index, string? problem) = WeightedPeak.At(broken, Vector3D.Zero, publicExposure: false);
        Assert.True(double.IsNaN(index), "index " + index);
        Assert.Equal("the weighted field is not a finite number", problem);
    }
}

