using System;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Criteria;

public class ExposureLimitsTests
{
    [Validates("occupational reference levels for B at each band edge and in between: 0.2/f^2, 2.5e-2/f, 1 mT, 0.3/f, 0.1 mT", "ICNIRP 2010, Health Phys 99:818, table 3", "1e-12")]
    [Theory]
    [InlineData(1.0, 0.2)]
    [InlineData(4.0, 0.2 / 16)]
    [InlineData(8.0, 2.5e-2 / 8)]
    [InlineData(16.0, 2.5e-2 / 16)]
    [InlineData(25.0, 1e-3)]
    [InlineData(50.0, 1e-3)]
    [InlineData(300.0, 1e-3)]
    [InlineData(1000.0, 0.3 / 1000)]
    [InlineData(3000.0, 1e-4)]
    [InlineData(1e6, 1e-4)]
    public void OccupationalReferenceLevels(double f, double tesla) =>
        Within.Relative(tesla, ExposureLimits.OccupationalTesla(f), 1e-12, "occupational at " + f + " Hz");

    [Validates("public reference levels for B at each band edge and in between: 4e-2/f^2, 5e-3/f, 0.2 mT, 8e-2/f, 27 uT", "ICNIRP 2010, Health Phys 99:818, table 4", "1e-12")]
    [Theory]
    [InlineData(2.0, 4e-2 / 4)]
    [InlineData(8.0, 5e-3 / 8)]
    [InlineData(50.0, 2e-4)]
    [InlineData(400.0, 8e-2 / 400)]
    [InlineData(2000.0, 8e-2 / 2000)]
    [InlineData(3000.0, 2.7e-5)]
    [InlineData(1e5, 2.7e-5)]
    public void PublicReferenceLevels(double f, double tesla) =>
        Within.Relative(tesla, ExposureLimits.PublicTesla(f), 1e-12, "public at " + f + " Hz");

    [Fact]
    public void TheBandsMeetWithoutAJumpWhereTheTablesSayTheyDo()
    {
        // Continuity at 8 Hz and 300 Hz (occupational) and 8 Hz and 400 Hz (public) follows from the tables' formulas.
        Within.Relative(0.2 / 64, 2.5e-2 / 8, 1e-12, "occupational at 8 Hz");
        Within.Relative(ExposureLimits.OccupationalTesla(299.999999), ExposureLimits.OccupationalTesla(300), 1e-8, "occupational at 300 Hz");
        Within.Relative(ExposureLimits.PublicTesla(399.999999), ExposureLimits.PublicTesla(400), 1e-8, "public at 400 Hz");
        Assert.True(double.IsNaN(ExposureLimits.OccupationalTesla(0.5)) && double.IsNaN(ExposureLimits.PublicTesla(2e7)), "outside 1 Hz - 10 MHz: no reference level");
    }

    [Validates("static limits: 2 T occupational (head and trunk), 400 mT public; a margin of 1 on the limit", "ICNIRP 2009, Health Phys 96:504", "1e-12")]
    [Fact]
    public void AStaticFieldIsJudgedAgainstTheIcnirp2009Limits()
    {
        var slow = FieldSource.Uniform("magnet", new RampWaveform(0, 2, 600, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        FieldExposure worker = FieldExposure.At(slow, Vector3D.Zero, publicExposure: false, HazardPolicy.Default);
        FieldExposure visitor = FieldExposure.At(slow, Vector3D.Zero, publicExposure: true, HazardPolicy.Default);
        Within.Relative(1, worker.Margin, 1e-12, "2 T against 2 T");
        Assert.Equal(Verdict.Caution, worker.Verdict);
        Within.Relative(0.4 / 2, visitor.Margin, 1e-12, "2 T against 400 mT");
        Assert.Equal(Verdict.Hazard, visitor.Verdict);
        Assert.True(worker.ImplantLineExceeded && worker.ProjectileLineExceeded);
    }

    [Fact]
    public void AFieldAtOneHertzToWithinRoundingIsJudgedAsTimeVaryingHoweverItsTimeWasWritten()
    {
        // The knee of a 0.35 s rise is 1 Hz: as "0.35 s" it is 1.0 Hz, as "350 ms" 0.9999999999999999 Hz. Either way the
        // field takes the time-varying limits (the stricter side of ICNIRP's 1 Hz line; the static limit gave a margin
        // twenty times larger); a field clearly below the line is still judged as static.
        double parsed = QuantityParser.Parse("350 ms", QuantityKind.Time);
        Assert.NotEqual(0.35, parsed);
        FieldExposure[] exposures = new[] { 0.35, parsed }
            .Select(seconds => FieldExposure.At(FieldSource.Uniform("ramp", new RampWaveform(0, 5, seconds, drive: DriveKind.FluxDensity), Vector3D.UnitZ), Vector3D.Zero, publicExposure: false, HazardPolicy.Default))
            .ToArray();
        Assert.All(exposures, e => Assert.StartsWith("pulsed or mixed", e.Basis, StringComparison.Ordinal));
        Assert.All(exposures, e => Assert.True(e.Margin < 0.05, "margin " + e.Margin + ": the weighted peak's, not the static limit's 0.4"));
        Assert.True(ExposureLimits.CountsAsStatic(0.999) && !ExposureLimits.CountsAsStatic(0.9999999999999999) && !ExposureLimits.CountsAsStatic(1));
        Assert.False(double.IsNaN(ExposureLimits.OccupationalTesla(0.9999999999999999)), "no gap between the static and time-varying levels");
    }

    [Validates("a 50 Hz sinusoid at the occupational reference level: rms 1 mT, margin 1", "ICNIRP 2010 table 3", "1e-12")]
    [Fact]
    public void ASinusoidIsJudgedByItsRmsAtItsFrequency()
    {
        var mains = FieldSource.Uniform("mains", new SineWaveform(Math.Sqrt(2) * 1e-3, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        FieldExposure e = FieldExposure.At(mains, Vector3D.Zero, publicExposure: false, HazardPolicy.Default);
        Within.Relative(1e-3, e.ComparedTesla, 1e-12, "rms");
        Within.Relative(1, e.Margin, 1e-9, "margin at the level");
        Assert.True(e.ImplantLineExceeded && !e.ProjectileLineExceeded);
    }

    [Validates("a field that turns as it alternates (beside a flat three-phase set) is judged by its resultant rms, the root of the time average of |B|^2, not by its peak over sqrt 2", "the resultant field of IEC 61786-1 (root sum of squares of the components' rms values; from memory), computed here by averaging |B(t)|^2 over a period of the three lines' fields, mu0 i / (2 pi r) each (Ampere's law)", "1e-9")]
    [Fact]
    public void ARotatingFieldIsJudgedByItsResultantRmsNotItsPeakOverRootTwo()
    {
        // Three 1 kA (amplitude) conductors at 50 Hz in a row 100 mm apart, 120 degrees apart in phase; a point 50 mm from
        // the middle one, across the row, where the three fields point different ways and their sum traces a fat
        // ellipse over a cycle: its resultant rms is 1.32 times its peak over sqrt 2, which understated it by a quarter.
        // The reference averages |B|^2 over 64 instants of a period (exact for a sum of sinusoids of one frequency).
        (FieldSource set, Vector3D point, double resultant, double peak) = Fixtures.ThreePhaseAtFiftyMillimetres();
        FieldExposure e = FieldExposure.At(set, point, publicExposure: false, HazardPolicy.Default);
        Within.Relative(resultant, e.ComparedTesla, 1e-9, "the resultant rms");
        Assert.True(e.ComparedTesla > 1.3 * peak / Math.Sqrt(2), "the field turns here: its resultant rms " + e.ComparedTesla + " exceeds its peak over sqrt 2, " + (peak / Math.Sqrt(2)));
        Within.Relative(1e-3 / resultant, e.Margin, 1e-9, "the margin against 1 mT at 50 Hz");
        Assert.Equal("sinusoid, resultant rms", e.Basis);
    }
}
