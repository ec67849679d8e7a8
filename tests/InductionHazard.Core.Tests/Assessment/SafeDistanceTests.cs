using System;
using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>Find-SafeDistance's search, against the closed form of a ring beside a long straight conductor.</summary>
public sealed class SafeDistanceTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    private static FieldSource Line(double amperes, double hertz) =>
        new("line", new[] { new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), new SineWaveform(amperes, hertz, drive: DriveKind.Current)) });

    private static ConductiveItem SplitRing(double meanDiameter) =>
        ItemRecordReader.Read(
            new Dictionary<string, object?> { ["Name"] = "split ring", ["Material"] = "Copper", ["Diameter"] = meanDiameter, ["WireDiameter"] = 0.001, ["Gap"] = 0.002, ["Contact"] = "Free" },
            MaterialLibrary.BuiltIn);

    [Fact]
    [Validates("Find-SafeDistance: a split ring beside a long conductor is Clear from the distance where its gap voltage meets the ELV limit over the safety factor", "flux of a long straight conductor through a coplanar circle, Phi = mu0 I (d - sqrt(d^2 - a^2)) (textbook closed form)", "0.1 %")]
    public void ASplitRingBesideALongConductorIsClearFromTheClosedFormDistance()
    {
        // The ring's plane holds the conductor (normal along y); its centre moves out along x from just beyond its radius.
        // Gap voltage rms = omega Phi / sqrt 2; Clear when 50 V rms / V >= 2, so the crossing is where V = 25 V:
        // d - sqrt(d^2 - a^2) = c with c = 25 sqrt 2 / (omega mu0 I), so d = (a^2 + c^2) / (2 c).
        double a = 0.05, amperes = 20e3, hertz = 10e3;
        double c = 25 * Math.Sqrt(2) / (2 * Math.PI * hertz * Mu0 * amperes);
        double expected = ((a * a) + (c * c)) / (2 * c);
        var from = new Vector3D(0.051, 0, 0);

        SafeDistanceResult found = SafeDistance.Find(SplitRing(2 * a), Line(amperes, hertz), from, Vector3D.UnitX, 1.0, HazardPolicy.Default, normal: Vector3D.UnitY);

        Assert.True(found.Found);
        Within.Relative(expected, from.X + found.DistanceMeters, 0.001, "centre distance of the crossing");
        Assert.Equal(Verdict.Clear, found.Verdict);
        Assert.Equal(HazardMechanism.Shock, found.GoverningMechanism);
        Assert.False(found.DipsAgain);
    }

    [Fact]
    [Validates("Find-SafeDistance: a worn ring beside a 50 Hz line is Clear from where the wearer's field falls to the occupational reference level over the safety factor", "ICNIRP 2010, Health Phys 99:818, table 3 (1 mT rms at 25-300 Hz, occupational); field of a long straight conductor, B = mu0 I / (2 pi r) (Ampere's law)", "0.1 %")]
    public void AWornRingBesideAMainsLineIsClearWhereTheWearersFieldMeetsTheReferenceLevel()
    {
        // Clear when 1 mT rms / B_rms >= 2: mu0 I / (2 pi r sqrt 2) = 0.5 mT.
        WornRingBesideALineIsClearWhereTheFieldIs(HazardPolicy.Default, 0.5e-3, 2.0);
    }

    [Fact]
    [Validates("Find-SafeDistance for the public: a visitor's worn ring beside a 50 Hz line is Clear from where the field falls to the public's reference level over the safety factor", "ICNIRP 2010, Health Phys 99:818, table 4 (0.2 mT rms at 25-400 Hz, general public); B = mu0 I / (2 pi r) (Ampere's law)", "0.1 %")]
    public void AVisitorsWornRingBesideAMainsLineIsClearFiveTimesFartherOut()
    {
        // Clear when 0.2 mT rms / B_rms >= 2: mu0 I / (2 pi r sqrt 2) = 0.1 mT, five times the workers' distance.
        WornRingBesideALineIsClearWhereTheFieldIs(new HazardPolicy { Name = "visitor gallery", ExposureGroup = ExposureGroup.Public }.Validated(), 0.1e-3, 5.0);
    }

    /// <summary>
    /// A closed copper ring worn at the centre it is placed at, beside a 2 kA, 50 Hz line: at these distances its own
    /// currents are far below any limit (some 0.1 mV of emf), so the wearer's exposure governs, and the search finds
    /// where the line's rms field falls to <paramref name="clearRmsTesla"/>: r = mu0 I / (2 pi sqrt 2 B_rms) with I the
    /// current's amplitude.
    /// </summary>
    private static void WornRingBesideALineIsClearWhereTheFieldIs(HazardPolicy policy, double clearRmsTesla, double maxDistanceMeters)
    {
        double amperes = 2000;
        double expected = Mu0 * amperes / (2 * Math.PI * Math.Sqrt(2) * clearRmsTesla);
        var from = new Vector3D(0.05, 0, 0);
        ConductiveItem ring = ItemRecordReader.Read(
            new Dictionary<string, object?> { ["Name"] = "worn ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002, ["Contact"] = "Skin" },
            MaterialLibrary.BuiltIn);

        SafeDistanceResult found = SafeDistance.Find(ring, Line(amperes, 50), from, Vector3D.UnitX, maxDistanceMeters, policy);

        Assert.True(found.Found);
        Within.Relative(expected, from.X + found.DistanceMeters, 0.001, "centre distance of the crossing");
        Assert.Equal(Verdict.Clear, found.Verdict);
        Assert.Equal(HazardMechanism.Exposure, found.GoverningMechanism);
    }

    [Fact]
    public void TheDistanceFoundIsClearAndTwoPercentNearerIsNot()
    {
        var from = new Vector3D(0.051, 0, 0);
        FieldSource line = Line(20e3, 10e3);
        ConductiveItem ring = SplitRing(0.1);
        SafeDistanceResult found = SafeDistance.Find(ring, line, from, Vector3D.UnitX, 1.0, HazardPolicy.Default, normal: Vector3D.UnitY);
        Verdict At(double s) => HazardAssessor.Assess(InductionEngine.Respond(new Scenario(ring, line, new Placement(from + (s * Vector3D.UnitX), Vector3D.UnitY))), HazardPolicy.Default).Verdict;
        Assert.Equal(Verdict.Clear, At(found.DistanceMeters));
        Assert.NotEqual(Verdict.Clear, At(0.98 * found.DistanceMeters));
    }

    [Fact]
    public void NothingClearWithinTheLimitGivesNoDistanceAndAClearStartGivesZero()
    {
        var from = new Vector3D(0.051, 0, 0);
        SafeDistanceResult none = SafeDistance.Find(SplitRing(0.1), Line(20e3, 10e3), from, Vector3D.UnitX, 0.005, HazardPolicy.Default, normal: Vector3D.UnitY);
        Assert.False(none.Found);
        Assert.True(double.IsNaN(none.DistanceMeters));
        Assert.NotEqual(Verdict.Clear, none.Verdict);

        SafeDistanceResult at = SafeDistance.Find(SplitRing(0.1), Line(1, 50), from, Vector3D.UnitX, 1.0, HazardPolicy.Default, normal: Vector3D.UnitY);
        Assert.Equal(0.0, at.DistanceMeters);
    }

    [Fact]
    public void AMarginThatDipsAgainFurtherOutIsReportedAndTheDistanceIsBeyondIt()
    {
        // Two conductors on the ray, 0.5 m apart: Clear between them, not Clear again beside the second.
        var far = new Axis(new Vector3D(0.5, 0, 0), Vector3D.UnitZ);
        var source = new FieldSource("two lines", new[]
        {
            new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), new SineWaveform(20e3, 10e3, drive: DriveKind.Current)),
            new SourceTerm(new LineConductor(far), new SineWaveform(20e3, 10e3, drive: DriveKind.Current)),
        });
        var from = new Vector3D(0.051, 0, 0);
        SafeDistanceResult found = SafeDistance.Find(SplitRing(0.1), source, from, Vector3D.UnitX, 1.0, HazardPolicy.Default, normal: Vector3D.UnitY);
        Assert.True(found.DipsAgain);
        Assert.True(from.X + found.DistanceMeters > 0.5, "the distance lies beyond the second conductor");
        Assert.Equal(Verdict.Clear, found.Verdict);
    }
}
