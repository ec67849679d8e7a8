using System;
using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Criteria;

/// <summary>
/// Margins on one scale: a margin is the factor by which the predicted quantity could grow before its limit, so
/// scaling the input by what grows the quantity by that factor lands on the limit (margin 1).
/// </summary>
public sealed class MarginScaleTests
{
    private static readonly MaterialLibrary Steady = Fixtures.WithSteadyCopper;

    private static ConductiveItem Ring(double gap, string contact = "Free", string material = "Copper") =>
        ItemRecordReader.Read(
            new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = material, ["Diameter"] = 0.06, ["WireDiameter"] = 0.002, ["Gap"] = gap, ["Contact"] = contact },
            Steady);

    private static InductionAssessment Assess(ConductiveItem item, FieldSource source, Vector3D centre, Vector3D? normal = null, double? exposure = null, double ambient = 20) =>
        HazardAssessor.Assess(InductionEngine.Respond(new Scenario(item, source, new Placement(centre, normal), exposure, new ThermalEnvironment(ambient))), HazardPolicy.Default);

    private static FieldSource Sine(double tesla) => FieldSource.Uniform("sine", new SineWaveform(tesla, 5000, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

    private static FieldSource Coil(double amperes, double seconds = 0.05) =>
        new("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 500), new RampWaveform(0, amperes, seconds, drive: DriveKind.Current)) });

    [Fact]
    public void ScalingTheFieldByTheShockMarginLandsTheGapVoltageOnTheLimit()
    {
        // The gap voltage is linear in the field: the field times the margin meets the ELV limit.
        double? margin = Assess(Ring(0.002), Sine(0.02), Vector3D.Zero).ShockMargin;
        Assert.NotNull(margin);
        Within.Relative(1.0, Assess(Ring(0.002), Sine(0.02 * margin!.Value), Vector3D.Zero).ShockMargin!.Value, 1e-9, "Shock margin after scaling");
    }

    [Fact]
    public void ScalingTheFieldByTheArcMarginLandsTheGapVoltageOnTheBreakdownVoltage()
    {
        double? margin = Assess(Ring(1e-4), Sine(0.5), Vector3D.Zero).ArcMargin;
        Assert.NotNull(margin);
        Within.Relative(1.0, Assess(Ring(1e-4), Sine(0.5 * margin!.Value), Vector3D.Zero).ArcMargin!.Value, 1e-9, "Arc margin after scaling");
    }

    [Fact]
    public void ScalingTheDriveByTheRootOfTheForceMarginLandsTheForceOnTheWeight()
    {
        // Induced current and field both follow the drive, so the force goes as its square: exactly so for a ring whose
        // resistance does not change as it warms.
        var above = new Vector3D(0, 0, 0.08);
        double? margin = Assess(Ring(0, material: "steady copper"), Coil(2000), above, Vector3D.UnitZ).ForceMargin;
        Assert.NotNull(margin);
        Within.Relative(1.0, Assess(Ring(0, material: "steady copper"), Coil(2000 * Math.Sqrt(margin!.Value)), above, Vector3D.UnitZ).ForceMargin!.Value, 1e-6, "Force margin after scaling");
    }

    [Fact]
    public void ScalingTheFieldByTheRootOfTheTorqueMarginLandsTheTorqueOnTheGravitationalTorque()
    {
        // A ring tilted in a uniform changing field: its moment follows the field, so the torque goes as its square.
        var tilted = new Vector3D(0, Math.Sin(0.5), Math.Cos(0.5));
        FieldSource Ramp(double tesla) => FieldSource.Uniform("ramp", new RampWaveform(0, tesla, 0.01, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        double? margin = Assess(Ring(0, material: "steady copper"), Ramp(1), Vector3D.Zero, tilted).TorqueMargin;
        Assert.NotNull(margin);
        Within.Relative(1.0, Assess(Ring(0, material: "steady copper"), Ramp(Math.Sqrt(margin!.Value)), Vector3D.Zero, tilted).TorqueMargin!.Value, 1e-6, "Torque margin after scaling");
    }

    [Fact]
    public void ScalingTheFieldByTheRootOfTheBurnMarginLandsTheTouchTemperatureOnTheThreshold()
    {
        // A loose ring touched briefly: its rise over the start is the Joule heat over a linear cooling (a resistance
        // that does not warm, no radiation), so the rise goes as the field's square.
        var still = new ThermalEnvironment(20, ThermalEnvironment.StillAirConvection, 0.0);
        InductionAssessment Touch(double tesla) =>
            HazardAssessor.Assess(InductionEngine.Respond(new Scenario(Ring(0, "Free", "steady copper"), Sine(tesla), new Placement(Vector3D.Zero), 60, still)), HazardPolicy.Default);
        double? margin = Touch(0.0009).BurnMargin;
        Assert.NotNull(margin);
        Assert.InRange(margin!.Value, 1.5, 1e6);
        Within.Relative(1.0, Touch(0.0009 * Math.Sqrt(margin.Value)).BurnMargin!.Value, 1e-6, "Burn margin after scaling");
    }

    [Fact]
    public void ScalingTheFieldByTheRootOfTheOverheatMarginLandsThePeakTemperatureOnTheMeltingPoint()
    {
        // The same linear ring, left in the field for a minute: its rise goes as the field's square, and its peak at
        // the field times the root of the margin is the melting point.
        var still = new ThermalEnvironment(20, ThermalEnvironment.StillAirConvection, 0.0);
        InductionAssessment Heat(double tesla) =>
            HazardAssessor.Assess(InductionEngine.Respond(new Scenario(Ring(0, "Fixed", "steady copper"), Sine(tesla), new Placement(Vector3D.Zero), 60, still)), HazardPolicy.Default);
        double? margin = Heat(0.0009).OverheatMargin;
        Assert.NotNull(margin);
        Assert.InRange(margin!.Value, 2, 1e6);
        // Scaled to 0.999 of the root (just short of melting, where the run stops): the margin is then 1 / 0.999^2.
        Within.Relative(1 / (0.999 * 0.999), Heat(0.0009 * Math.Sqrt(margin.Value) * 0.999).OverheatMargin!.Value, 1e-6, "Overheat margin after scaling to 0.999 of its root");
    }

    [Fact]
    public void ScalingTheCoilCurrentByTheRootOfTheAttractionMarginLandsThePullOnTheWeight()
    {
        // An unsaturated steel ball on a coil's axis: its magnetisation follows the field, so the pull (moment times
        // gradient) goes as the coil current's square.
        ConductiveItem ball = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ball", ["Shape"] = "Sphere", ["Material"] = "Steel", ["Diameter"] = 0.01, ["Contact"] = "Free" }, MaterialLibrary.BuiltIn);
        FieldSource Magnet(double amperes) =>
            new("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 100), new RampWaveform(0, amperes, 600, drive: DriveKind.Current)) });
        var onAxis = new Vector3D(0, 0, 0.1);
        double? margin = Assess(ball, Magnet(20), onAxis).AttractionMargin;
        Assert.NotNull(margin);
        Within.Relative(1.0, Assess(ball, Magnet(20 * Math.Sqrt(margin!.Value)), onAxis).AttractionMargin!.Value, 1e-6, "Attraction margin after scaling");
    }

    [Fact]
    public void ASiteLaunchSpeedLimitJudgesALooseItemAndNamesTheSite()
    {
        // A loose ring pushed for a whole second by a coil's slow ramp: with no site value only its weight counts; a site
        // limit a third of the speed at which the launch margin would equal the weight margin makes the launch speed
        // govern, with a third of the weight margin, and names the site as the source.
        var above = new Vector3D(0, 0, 0.08);
        InductionResponse r = InductionEngine.Respond(new Scenario(Ring(0, "Free"), Coil(20000, 1.0), new Placement(above, Vector3D.UnitZ)));
        Assert.NotNull(r.LaunchSpeedMetersPerSecond);
        MechanismResult byWeight = Assert.Single(HazardAssessor.Assess(r, HazardPolicy.Default).Mechanisms, m => m.Mechanism == HazardMechanism.Force);
        Assert.Equal("N", byWeight.Unit);

        var site = new HazardPolicy { Name = "bay rules", LaunchSpeedLimit = r.LaunchSpeedMetersPerSecond!.Value * byWeight.Margin / 3 };
        MechanismResult byLaunch = Assert.Single(HazardAssessor.Assess(r, site).Mechanisms, m => m.Mechanism == HazardMechanism.Force);
        Assert.Equal("m/s", byLaunch.Unit);
        Within.Relative(byWeight.Margin / 3, byLaunch.Margin, 1e-9, "launch-speed margin");
        Assert.Contains(byLaunch.Sources, src => src.StartsWith("site policy 'bay rules': LaunchSpeedLimit", StringComparison.Ordinal));
    }

    [Fact]
    public void AWornRingInAHotRoomWithNoFieldIsNotAHazardOfTheFieldAndTheRoomIsNamed()
    {
        // 45 °C air holds the skin at the burn threshold for long contact (ISO 13732-1: 43 °C for 8 h): the place's
        // own hazard. The field adds nothing here, so the field's verdict is Clear, and the finding says both.
        InductionAssessment none = Assess(Ring(0, "Skin"), Sine(0), Vector3D.Zero, ambient: 45);
        Assert.Equal(Verdict.Clear, none.Verdict);
        MechanismResult burn = Assert.Single(none.Mechanisms, m => m.Mechanism == HazardMechanism.Burn);
        Assert.Contains("surroundings alone", burn.Detail, StringComparison.Ordinal);

        // A field that does heat the ring is judged by the dose it adds over that baseline, and can still be a Hazard.
        InductionAssessment heated = Assess(Ring(0, "Skin"), Sine(0.01), Vector3D.Zero, ambient: 45);
        MechanismResult burnHeated = Assert.Single(heated.Mechanisms, m => m.Mechanism == HazardMechanism.Burn);
        Assert.Equal(InductionHazard.Tests.Assessment.BurnDoseTextTests.DoseQuantity(heated.Response), burnHeated.Quantity);
        Assert.True(burnHeated.Margin > 0 && burnHeated.Margin < none.Mechanisms[2].Margin);
    }
}
