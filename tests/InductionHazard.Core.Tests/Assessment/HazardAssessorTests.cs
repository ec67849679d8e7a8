using System;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using Xunit;

namespace InductionHazard.Tests.Assessment;

public class HazardAssessorTests
{
    private static InductionAssessment Assess(InductionResponse r) => HazardAssessor.Assess(r, HazardPolicy.Default);

    [Validates("Shock margin 1 at 50 V rms", "IEC 61140 / IEC 60364-4-41", "1e-9")]
    [Theory]
    [InlineData(1.0, Verdict.Caution)]
    [InlineData(0.5, Verdict.Clear)]
    [InlineData(1.5, Verdict.Hazard)]
    public void ASplitRingsGapVoltageIsJudgedAgainstFiftyVoltsRms(double fractionOfLimit, Verdict expected)
    {
        // IEC 61140 / IEC 60364-4-41: extra-low voltage is at most 50 V a.c. rms.
        double d = 0.065, f = 50, area = Math.PI * d * d / 4;
        double tesla = fractionOfLimit * 50 * Math.Sqrt(2) / (2 * Math.PI * f * area);
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring("Titanium", d, 0.004, gap: 0.02, contact: "Free"), Fixtures.UniformSine(tesla, f)));
        Within.Relative(1 / fractionOfLimit, a.ShockMargin!.Value, 1e-9, "Shock margin");
        Assert.Equal(expected, a.Verdict);
        Assert.Equal(HazardMechanism.Shock, a.GoverningMechanism);
        Assert.Null(a.BurnMargin);
    }

    [Validates("Shock margin 2 at 60 V d.c.", "IEC 61140 (120 V ripple-free d.c.)", "1e-9")]
    [Fact]
    public void AUnidirectionalPulseIsJudgedAgainstTheDirectCurrentLimit()
    {
        // IEC 61140: 120 V ripple-free d.c.
        double d = 0.065, area = Math.PI * d * d / 4, ramp = 1e-3;
        double deltaB = 60 * ramp / area;
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring("Titanium", d, 0.004, gap: 0.02, contact: "Free"), Fixtures.UniformRamp(0, deltaB, ramp)));
        Within.Relative(2.0, a.ShockMargin!.Value, 1e-9, "Shock margin of a 60 V pulse");
        Assert.Equal(Verdict.Clear, a.Verdict);
    }

    [Fact]
    public void AClosedRingHasNoShockButBurnAndOverheat()
    {
        // 0.4 mT at 50 Hz: 0.28 mT rms, within the wearer's own 1 mT reference level (ICNIRP 2010).
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformSine(0.4e-3, 50)));
        Assert.False(a.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Shock).Applies);
        Assert.NotNull(a.BurnMargin);
        Assert.NotNull(a.OverheatMargin);
        Assert.Equal(Verdict.Clear, a.Verdict);
        Assert.Contains(a.Cautions, c => c.Contains("engineering estimates", StringComparison.Ordinal));
        Assert.Contains(a.Cautions, c => c.Contains("ISO 13732-1", StringComparison.Ordinal));
    }

    [Fact]
    public void ARingThatHeatsPastTheBurnThresholdIsAHazard()
    {
        // 12 kHz, 4 mT on a copper ring: tens of amperes circulate and the ring heats far past 43 °C.
        // (Its wearer's own exposure, 2.8 mT rms against 0.1 mT, is a Hazard too, and may govern.)
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformSine(0.004, 12000)));
        Assert.Equal(Verdict.Hazard, a.Verdict);
        Assert.True(a.BurnMargin < 1, "Burn margin " + a.BurnMargin);
        Assert.True(a.PeakTemperatureCelsius > 100);
        Assert.Contains(a.Reasons, r => r.StartsWith("Burn", StringComparison.Ordinal));
    }

    [Fact]
    public void AnItemThatMeltsIsAnOverheatHazard()
    {
        // A thin copper wire loop in a 2 T, 50 Hz field dissipates a hundred watts in a quarter of a gram: it melts.
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring("Copper", 0.05, 0.0005, contact: "Free"), Fixtures.UniformSine(2.0, 50)));
        Assert.True(a.Response.MeltingReachedSeconds is not null, "melting is reached");
        Assert.True(a.OverheatMargin < 1);
        Assert.Equal(Verdict.Hazard, a.Verdict);
    }

    [Fact]
    public void AnInvalidModelIsIndeterminateWithItsReasonNeverClear()
    {
        // A rectangular loop whose wire is too thick for the thin-loop formula has no filament model: outside validity.
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Frame("Copper", 0.02, 0.02, 0.006), Fixtures.UniformSine(1e-6, 50)));
        Assert.Equal(Verdict.Indeterminate, a.Verdict);
        Assert.True(double.IsNaN(a.MinimumMargin));
        Assert.Contains(a.Reasons, r => r.Contains("thin-loop", StringComparison.Ordinal));
        Assert.Single(a.Reasons);
        Assert.True(double.IsNaN(a.PeakCurrentAmperes), "the current is not shown from a model outside its validity");
        Assert.True(double.IsNaN(a.PeakTemperatureCelsius), "nor the temperature");
        Assert.True(a.PeakEmfVolts > 0, "the emf does not depend on the ring's inductance and is still shown");
        Assert.True(a.Response.PeakTemperatureCelsius > 0, "the response keeps the raw number for diagnosis");
    }

    [Fact]
    public void ANaNReachingAMarginIsIndeterminate()
    {
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring(), Fixtures.BrokenGeometrySine(50)));
        Assert.Equal(Verdict.Indeterminate, a.Verdict);
        Assert.Contains(a.Reasons, r => r.Contains("numerical failure", StringComparison.Ordinal));
    }

    [Fact]
    public void ALooseItemIsJudgedForABriefTouch()
    {
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring(contact: "Free"), Fixtures.UniformSine(0.004, 12000)));
        var burn = a.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn);
        Assert.Equal(65, burn.Limit, 9);
        Assert.Contains("touch", burn.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void EveryAssessmentSaysWhatToDoInPlainWords()
    {
        InductionAssessment clear = Assess(Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformSine(1e-6, 50)));
        Assert.Equal(Verdict.Clear, clear.Verdict);
        Assert.StartsWith("No action needed", clear.Action, StringComparison.Ordinal);

        // A field that burns a worn ring is far above the wearer's own reference level: people are kept out, and the
        // action still says to take the ring off, for the worst of its own hazards: the ring turned from the orientation
        // that links the most flux would be twisted harder still than it burns.
        InductionAssessment burn = Assess(Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformSine(0.5, 10000)));
        Assert.Equal(Verdict.Hazard, burn.Verdict);
        Assert.Equal(HazardMechanism.Exposure, burn.GoverningMechanism);
        Assert.Equal(Verdict.Hazard, burn.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn).Verdict);
        Assert.True(burn.TorqueMargin < burn.BurnMargin);
        Assert.StartsWith("Keep people out of this place", burn.Action, StringComparison.Ordinal);
        Assert.Contains("take it off", burn.Action, StringComparison.Ordinal);
        Assert.Contains("twist", burn.Action, StringComparison.Ordinal);
        Assert.Equal("Keep people out", burn.ActionBrief);

        // Given facing the field, it is not twisted, and the action says the ring would burn.
        InductionAssessment facing = Assess(Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformSine(0.5, 10000), normal: InductionHazard.Quantities.Vector3D.UnitZ));
        Assert.Null(facing.TorqueMargin);
        Assert.Contains("take it off", facing.Action, StringComparison.Ordinal);
        Assert.Contains("burn", facing.Action, StringComparison.Ordinal);

        // The other way about: a worn ring in a 7 T quench is twisted harder than the wearer's own field exceeds its limit.
        // Taking it off is not leave to enter: the place's action stands beside the item's.
        InductionAssessment twisted = Assess(Fixtures.Respond(Fixtures.Ring("Gold"), Fixtures.UniformRamp(7, 0, 1)));
        Assert.Equal(HazardMechanism.Torque, twisted.GoverningMechanism);
        Assert.Equal(Verdict.Hazard, twisted.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Exposure).Verdict);
        Assert.StartsWith("Take it off before entering this place", twisted.Action, StringComparison.Ordinal);
        Assert.Contains("The place itself: keep people out while the source runs", twisted.Action, StringComparison.Ordinal);
        Assert.DoesNotContain("The place itself", burn.Action, StringComparison.Ordinal);

        InductionAssessment loose = Assess(Fixtures.Respond(Fixtures.Ring(contact: "Free"), Fixtures.UniformSine(0.5, 10000)));
        Assert.Equal(Verdict.Hazard, loose.Verdict);
        Assert.StartsWith("Keep it out of this place", loose.Action, StringComparison.Ordinal);

        InductionAssessment unknown = Assess(Fixtures.Respond(Fixtures.Frame("Copper", 0.02, 0.02, 0.006), Fixtures.UniformSine(1e-6, 50)));
        Assert.Equal(Verdict.Indeterminate, unknown.Verdict);
        Assert.Contains("unsafe", unknown.Action, StringComparison.Ordinal);
    }

    [Fact]
    public void ACautionSaysByHowMuchItsGoverningQuantityMustFall()
    {
        // A split ring whose gap voltage is 40 V rms: Shock margin 50/40 = 1.25, below the factor 2: it must fall by 1.6.
        double area = Math.PI * 0.01 * 0.01, omega = 2 * Math.PI * 50;
        double peakTesla = 40 * Math.Sqrt(2) / (omega * area);
        InductionAssessment a = Assess(Fixtures.Respond(Fixtures.Ring(gap: 0.001, contact: "Free"), Fixtures.UniformSine(peakTesla, 50)));
        Assert.Equal(Verdict.Caution, a.Verdict);
        Assert.Contains("by a factor of 1.6", a.Action, StringComparison.Ordinal);
    }
}
