using System;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>Exposure inside an item's assessment: a worn or held item puts a person where it is.</summary>
public class ExposureCheckTests
{
    private static InductionAssessment Assess(ConductiveItem item, FieldSource source, double? exposure = null) =>
        HazardAssessor.Assess(Fixtures.Respond(item, source, exposure), HazardPolicy.Default);

    private static MechanismResult Exposure(InductionAssessment a) => a.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Exposure);

    [Validates("Exposure of a ring's wearer at 9.6 kHz: 0.1 mT rms occupational", "ICNIRP 2010, Health Phys 99:818, table 3", "1e-9")]
    [Fact]
    public void AWornRingsWearerIsJudgedAgainstTheReferenceLevelAtTheDrivesFrequency()
    {
        // 1.5 mT peak at 9.6 kHz: 1.06 mT rms against the occupational 0.1 mT of 3 kHz to 10 MHz.
        InductionAssessment a = Assess(Fixtures.Ring("Titanium", 0.02, 0.001, gap: 0.002), Fixtures.UniformSine(1.5e-3, 9600), exposure: 1);
        Within.Relative(1e-4 / (1.5e-3 / Math.Sqrt(2)), a.ExposureMargin!.Value, 1e-9, "Exposure margin");
        MechanismResult m = Exposure(a);
        Assert.Equal(Verdict.Hazard, m.Verdict);
        Assert.Contains(m.Sources, s => s.StartsWith("ICNIRP 2010", StringComparison.Ordinal));
        Assert.Contains("the field the wearer is in", m.Detail, StringComparison.Ordinal);
    }

    [Validates("Exposure of a held item's user in a field ramped to 3 T: 2 T static", "ICNIRP 2009, Health Phys 96:504", "1e-9")]
    [Fact]
    public void AHeldItemsUserInAStaticFieldIsJudgedAgainstTheHeadAndTrunkLimit()
    {
        InductionAssessment a = Assess(Fixtures.Ring("Titanium", 0.05, 0.004, gap: 0.01, contact: "Held"), Fixtures.UniformRamp(0, 3, 600));
        Within.Relative(2.0 / 3, a.ExposureMargin!.Value, 1e-9, "Exposure margin");
        Assert.Contains("limbs alone may take 8 T", Exposure(a).Detail, StringComparison.Ordinal);
        if (a.GoverningMechanism == HazardMechanism.Exposure)
        {
            Assert.Equal("Keep people out", a.ActionBrief);
        }
    }

    [Validates("A site's static exposure limit for a controlled environment: at most 8 T", "ICNIRP 2009, Health Phys 96:504", "1e-9")]
    [Fact]
    public void ASitePolicyMayRaiseTheStaticLimitForAControlledEnvironmentAndIsNamedAsItsSource()
    {
        // ICNIRP 2009: up to 8 T for specific work in a controlled environment, a site's decision.
        var controlled = new HazardPolicy { Name = "magnet hall", StaticExposureLimitTesla = 8 }.Validated();
        InductionResponse r = Fixtures.Respond(Fixtures.Ring("Titanium", 0.05, 0.004, gap: 0.01, contact: "Held"), Fixtures.UniformRamp(0, 7, 600));
        InductionAssessment published = HazardAssessor.Assess(r, HazardPolicy.Default), site = HazardAssessor.Assess(r, controlled);
        Within.Relative(2.0 / 7, published.ExposureMargin!.Value, 1e-9, "Exposure margin against 2 T");
        Within.Relative(8.0 / 7, site.ExposureMargin!.Value, 1e-9, "Exposure margin against the site's 8 T");
        Assert.Equal(Verdict.Caution, Exposure(site).Verdict);
        Assert.Contains(Exposure(site).Sources, s => s.StartsWith("site policy 'magnet hall': StaticExposureLimit = 8 T", StringComparison.Ordinal));
        Assert.DoesNotContain(Exposure(published).Sources, s => s.Contains("site policy", StringComparison.Ordinal));
        Assert.Throws<Errors.InvalidInputException>(() => new HazardPolicy { StaticExposureLimitTesla = 9 }.Validated());
    }

    [Validates("Exposure of a visitor's ring at 50 Hz: 0.2 mT rms for the general public (1 mT for workers)", "ICNIRP 2010, Health Phys 99:818, tables 3 and 4", "1e-9")]
    [Fact]
    public void APolicyForThePublicJudgesAWearersFieldAgainstThePublicsReferenceLevel()
    {
        // 0.5 mT peak at 50 Hz, one direction: 0.354 mT rms. Workers: 1 mT rms from 25 to 300 Hz, margin 2.83, Clear.
        // The public: 0.2 mT rms from 25 to 400 Hz, margin 0.566, Hazard.
        var visitors = new HazardPolicy { Name = "visitor gallery", ExposureGroup = ExposureGroup.Public }.Validated();
        InductionResponse r = Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformSine(0.5e-3, 50), 1);
        InductionAssessment workers = HazardAssessor.Assess(r, HazardPolicy.Default), visitor = HazardAssessor.Assess(r, visitors);
        double rms = 0.5e-3 / Math.Sqrt(2);
        Within.Relative(1e-3 / rms, workers.ExposureMargin!.Value, 1e-9, "Exposure margin against the occupational 1 mT");
        Within.Relative(2e-4 / rms, visitor.ExposureMargin!.Value, 1e-9, "Exposure margin against the public's 0.2 mT");
        Assert.Equal(Verdict.Clear, Exposure(workers).Verdict);
        Assert.Equal(Verdict.Hazard, Exposure(visitor).Verdict);
        Assert.Equal(Verdict.Hazard, visitor.Verdict);
        Assert.Contains("against the general public's limit", Exposure(visitor).Detail, StringComparison.Ordinal);
        Assert.Contains("against the occupational limit", Exposure(workers).Detail, StringComparison.Ordinal);
        Assert.Contains(Exposure(visitor).Sources, s => s == "site policy 'visitor gallery': ExposureGroup = Public");
        Assert.DoesNotContain(Exposure(workers).Sources, s => s.Contains("ExposureGroup", StringComparison.Ordinal));
        Assert.Equal(FieldExposure.At(Fixtures.UniformSine(0.5e-3, 50), Vector3D.Zero, true, HazardPolicy.Default).Margin, visitor.ExposureMargin!.Value, 12);
    }

    [Validates("Exposure of a visitor named by an inventory row among workers, 2.5 m from a 3 kA rms line at 50 Hz: 240 uT rms against the public's 0.2 mT (the workers' 1 mT)", "ICNIRP 2010, Health Phys 99:818, tables 3 and 4; Ampere's law for the field (B = mu0 I / 2 pi r)", "1e-6")]
    [Fact]
    public void ARowThatNamesItsWearerAVisitorIsJudgedAtThePublicsLevelUnderAWorkersPolicy()
    {
        // A long straight conductor: B = mu0 I / (2 pi r) = 2e-7 * 3000 A rms / 2.5 m = 240 uT rms (Ampere's law).
        FieldSource line = new("line", new[] { new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), new SineWaveform(3000 * Math.Sqrt(2), 50, drive: DriveKind.Current)) });
        var place = new Placement(new Vector3D(2.5, 0, 0));
        var worker = new Scenario(Fixtures.Ring(), line, place, 60);
        var visitor = new Scenario(Fixtures.Ring(), line, place, 60) { WearerGroup = ExposureGroup.Public };
        var named = new Scenario(Fixtures.Ring(), line, place, 60) { WearerGroup = ExposureGroup.Occupational };
        InductionAssessment w = HazardAssessor.Assess(InductionEngine.Respond(worker), HazardPolicy.Default);
        InductionAssessment v = HazardAssessor.Assess(InductionEngine.Respond(visitor), HazardPolicy.Default);
        InductionAssessment n = HazardAssessor.Assess(InductionEngine.Respond(named), HazardPolicy.Default);
        Within.Relative(1e-3 / 240e-6, w.ExposureMargin!.Value, 1e-6, "a worker's exposure margin against 1 mT");
        Within.Relative(2e-4 / 240e-6, v.ExposureMargin!.Value, 1e-6, "a visitor's exposure margin against 0.2 mT");
        Assert.Equal(w.ExposureMargin, n.ExposureMargin);
        Assert.Equal(Verdict.Hazard, Exposure(v).Verdict);
        Assert.Equal(ExposureGroup.Public, v.ExposureGroup);
        Assert.Equal(ExposureGroup.Occupational, w.ExposureGroup);
        Assert.Contains(Exposure(v).Sources, s => s == "inventory row: ExposureGroup = Public (the policy 'default (published limits)' judges workers)");
        Assert.Contains("against the general public's limit", Exposure(v).Detail, StringComparison.Ordinal);

        // The visitor's policy is the workers' in every value but the group, and is told apart by its fingerprint.
        Assert.Equal(w.PolicyName, v.PolicyName);
        Assert.NotEqual(w.PolicyHash, v.PolicyHash);
        Assert.Equal(new HazardPolicy { Name = HazardPolicy.Default.Name, ExposureGroup = ExposureGroup.Public }.Fingerprint, v.PolicyHash);

        // Under a policy that judges the public, a row that names a worker is judged as one of the public all the same.
        var gallery = new HazardPolicy { Name = "gallery", ExposureGroup = ExposureGroup.Public }.Validated();
        Assert.Equal(v.ExposureMargin, HazardAssessor.Assess(InductionEngine.Respond(named), gallery).ExposureMargin);
    }

    [Fact]
    public void APolicyForAVisitorDiffersFromItsPolicyInTheGroupAlone()
    {
        var site = new HazardPolicy { Name = "bay rules", SafetyFactor = 3, AlternatingVoltageLimitRms = 25, TouchSeconds = 2, LaunchSpeedLimit = 1.5, StaticExposureLimitTesla = 4 }.Validated();
        HazardPolicy forVisitor = site.For(ExposureGroup.Public);
        Assert.Equal(ExposureGroup.Public, forVisitor.ExposureGroup);
        Assert.Same(forVisitor, site.For(ExposureGroup.Public));
        Assert.Same(site, site.For(ExposureGroup.Occupational));
        Assert.Same(site, site.For(null));
        Assert.Same(forVisitor, forVisitor.For(ExposureGroup.Public));
        foreach (System.Reflection.PropertyInfo p in typeof(HazardPolicy).GetProperties().Where(p => p.GetIndexParameters().Length == 0 && !p.GetMethod!.IsStatic))
        {
            if (p.Name is nameof(HazardPolicy.ExposureGroup) or nameof(HazardPolicy.Fingerprint) or nameof(HazardPolicy.ExposureGroupSource) or nameof(HazardPolicy.Limits))
            {
                continue;
            }

            Assert.True(Equals(p.GetValue(site), p.GetValue(forVisitor)), p.Name + " differs");
        }

        Assert.Equal(site.Limits, forVisitor.Limits);
        Assert.Equal("inventory row: ExposureGroup = Public (the policy 'bay rules' judges workers)", forVisitor.ExposureGroupSource);
    }

    [Validates("Exposure of a visitor holding an item in a field ramped to 0.6 T: 400 mT static for the general public", "ICNIRP 2009, Health Phys 96:504", "1e-9")]
    [Fact]
    public void APolicyForThePublicJudgesAStaticFieldAgainstThePublics400MilliTesla()
    {
        var visitors = new HazardPolicy { Name = "visitor gallery", ExposureGroup = ExposureGroup.Public }.Validated();
        InductionResponse r = Fixtures.Respond(Fixtures.Ring("Titanium", 0.05, 0.004, gap: 0.01, contact: "Held"), Fixtures.UniformRamp(0, 0.6, 600));
        InductionAssessment workers = HazardAssessor.Assess(r, HazardPolicy.Default), visitor = HazardAssessor.Assess(r, visitors);
        Within.Relative(2.0 / 0.6, workers.ExposureMargin!.Value, 1e-9, "Exposure margin against the workers' 2 T");
        Within.Relative(0.4 / 0.6, visitor.ExposureMargin!.Value, 1e-9, "Exposure margin against the public's 400 mT");
        Assert.Equal(Verdict.Hazard, Exposure(visitor).Verdict);
        Assert.DoesNotContain("limbs", Exposure(visitor).Detail, StringComparison.Ordinal);
        Assert.Contains("limbs alone may take 8 T", Exposure(workers).Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void TheMarginIsTheOneTestFieldExposureGivesAtTheSamePlace()
    {
        FieldSource coil = new("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 50), new SineWaveform(200, 50, drive: DriveKind.Current)) });
        var place = new Vector3D(0.02, 0, 0.05);
        InductionAssessment a = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(Fixtures.Ring(), coil, new Placement(place), null)), HazardPolicy.Default);
        Within.Relative(FieldExposure.At(coil, place, false, HazardPolicy.Default).Margin, a.ExposureMargin!.Value, 1e-12, "Exposure margin against Test-FieldExposure's");
    }

    [Fact]
    public void ScalingTheFieldByTheExposureMarginLandsItOnTheLimit()
    {
        double? margin = Assess(Fixtures.Ring(), Fixtures.UniformSine(0.5e-3, 50), exposure: 1).ExposureMargin;
        Assert.NotNull(margin);
        Within.Relative(1.0, Assess(Fixtures.Ring(), Fixtures.UniformSine(0.5e-3 * margin!.Value, 50), exposure: 1).ExposureMargin!.Value, 1e-9, "Exposure margin after scaling");
    }

    [Theory]
    [InlineData("Free")]
    [InlineData("Fixed")]
    public void ALooseOrFixedItemPutsNoOneAtItsPlace(string contact)
    {
        InductionAssessment a = Assess(Fixtures.Ring("Copper", 0.05, 0.002, contact: contact), Fixtures.UniformSine(1.5e-3, 9600), exposure: 1);
        Assert.Null(a.ExposureMargin);
        Assert.False(Exposure(a).Applies);
        Assert.Contains("Test-FieldExposure", Exposure(a).Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void WhenExposureGovernsTheActionStillSaysTheItemItselfCouldNotBeJudged()
    {
        // A thick copper frame in a strong 50 Hz field, held: the holder's exposure is over its limit, and the frame's
        // own heating is outside the thin-wire model (Indeterminate); the action names both.
        InductionAssessment a = Assess(Fixtures.Frame("Copper", 0.02, 0.02, 0.006, contact: "Held"), Fixtures.UniformSine(0.02, 50), exposure: 1);
        Assert.Equal(Verdict.Hazard, a.Verdict);
        Assert.Equal(HazardMechanism.Exposure, a.GoverningMechanism);
        Assert.Contains("The item itself could not be judged", a.Action, StringComparison.Ordinal);
    }

    [Fact]
    public void AnExposureTheWeightedPeakCannotJudgeIsIndeterminateWithItsReason()
    {
        // A sine above 10 MHz is beyond the reference levels used: the wearer's exposure cannot be judged, and the
        // assessment says so among its reasons.
        InductionAssessment a = Assess(Fixtures.Ring("Titanium", 0.02, 0.001, gap: 0.002), Fixtures.UniformSine(1e-9, 20e6), exposure: 1);
        Assert.Equal(Verdict.Indeterminate, Exposure(a).Verdict);
        Assert.Equal(Verdict.Indeterminate, a.Verdict);
        Assert.Contains(a.Reasons, r => r.StartsWith("Exposure: cannot be judged", StringComparison.Ordinal) && r.Contains("10 MHz", StringComparison.Ordinal));
    }
}
