using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Thermal;

/// <summary>Melting with its latent heat: the time to melt through after the melting point is reached.</summary>
public class MeltThroughTests
{
    private const double MeanDiameter = 0.06, Wire = 0.002, Rho = Fixtures.SteadyCopperResistivity, Density = 8960, SpecificHeat = 385, Melting = 1085, Latent = 208.7e3;

    private static readonly MaterialLibrary Steady = Fixtures.WithSteadyCopper;

    private static InductionResponse Respond(double tesla, string material = "steady copper", ThermalEnvironment? room = null) =>
        InductionEngine.Respond(new Scenario(
            ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = material, ["Diameter"] = MeanDiameter, ["WireDiameter"] = Wire, ["Contact"] = "Fixed" }, Steady),
            FieldSource.Uniform("mains", new SineWaveform(tesla, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ),
            new Placement(Vector3D.Zero),
            3600,
            room ?? new ThermalEnvironment(20, 0, 0)));

    [Validates("Melting through a ring with no cooling: m L / P after m c dT / P", "enthalpy of fusion (energy balance); thin-ring power e^2 R / (R^2 + w^2 L^2), Maxwell's L", "2e-3")]
    [Fact]
    public void WithNoCoolingARingMeltsThroughInItsLatentHeatOverItsPower()
    {
        // Constant resistivity and no losses: the power P is constant, reaching the melting point takes m c dT / P and
        // melting through m L / P more. P = e^2 R / (R^2 + (w L)^2), e the rms emf, L = mu0 a (ln(8a/r) - 7/4).
        double a = MeanDiameter / 2, r = Wire / 2, area = Math.PI * a * a, section = Math.PI * r * r, omega = 2 * Math.PI * 50;
        double resistance = Rho * 2 * Math.PI * a / section, inductance = PhysicalConstants.VacuumPermeability * a * (Math.Log(8 * a / r) - 1.75);
        double tesla = 0.2, emf = omega * tesla * area / Math.Sqrt(2);
        double power = emf * emf * resistance / ((resistance * resistance) + (omega * omega * inductance * inductance));
        double mass = Density * section * 2 * Math.PI * a;
        InductionResponse response = Respond(tesla);
        Within.Relative(mass * SpecificHeat * (Melting - 20) / power, response.MeltingReachedSeconds!.Value, 2e-3, "time to the melting point");
        Within.Relative(mass * Latent / power, response.MeltThroughSeconds!.Value, 2e-3, "time to melt through after it");
        MechanismResult overheat = HazardAssessor.Assess(response, HazardPolicy.Default).Mechanisms.Single(m => m.Mechanism == HazardMechanism.Overheat);
        Assert.Equal(Verdict.Hazard, overheat.Verdict);
        Assert.Contains("latent heat", overheat.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void CoolingAtTheMeltingPointLengthensTheMeltAndAnItemThatDoesNotMeltHasNone()
    {
        // 15 W in; still air at 5 W/(m^2 K) takes about 6 W from the 1.2e-3 m^2 surface at the melting point.
        InductionResponse still = Respond(0.2), cooled = Respond(0.2, room: new ThermalEnvironment(20, 5, 0));
        Assert.NotNull(cooled.MeltThroughSeconds);
        Assert.True(cooled.MeltThroughSeconds > still.MeltThroughSeconds, "losses at the melting point slow the melt");

        // At 25 W/(m^2 K) the losses would be 31 W before the melting point: the ring never reaches it.
        InductionResponse held = Respond(0.2, room: new ThermalEnvironment(20, 25, 0));
        Assert.Null(held.MeltingReachedSeconds);
        Assert.Null(held.MeltThroughSeconds);
    }

    [Validates("Copper's latent heat of fusion, 13.26 kJ/mol", "CRC Handbook of Chemistry and Physics (from memory)", "1e-3")]
    [Fact]
    public void EveryBuiltInMaterialHasALatentHeatWithItsSource()
    {
        foreach (ConductorMaterial m in MaterialLibrary.BuiltIn.Materials)
        {
            Assert.InRange(m.LatentHeatJoulesPerKilogram, PhysicalRanges.LatentHeat.Minimum, PhysicalRanges.LatentHeat.Maximum);
            Assert.False(string.IsNullOrWhiteSpace(m.Sources[nameof(ConductorMaterial.LatentHeatJoulesPerKilogram)]), m.Name);
        }

        // CRC Handbook (from memory): copper 13.26 kJ/mol over 63.546 g/mol.
        Within.Relative(13.26e3 / 0.063546, MaterialLibrary.BuiltIn.Find("Copper").LatentHeatJoulesPerKilogram, 1e-3, "copper's latent heat");
    }

    [Fact]
    public void AUserMaterialMayGiveALatentHeatInAnyEnergyPerMassUnitAndAWrongOneIsRefused()
    {
        var definition = new Dictionary<string, object?> { ["Name"] = "x", ["Resistivity"] = 1e-7, ["Density"] = 8000, ["SpecificHeat"] = 450, ["MeltingTemperature"] = 1400 };
        Assert.True(double.IsNaN(MaterialLibrary.Define(definition).LatentHeatJoulesPerKilogram));
        definition["LatentHeat"] = "0.25 MJ/kg";
        Assert.Equal(250e3, MaterialLibrary.Define(definition).LatentHeatJoulesPerKilogram, 6);
        definition["LatentHeat"] = "250 J";
        Assert.Contains("LatentHeat", Assert.ThrowsAny<Exception>(() => MaterialLibrary.Define(definition)).Message, StringComparison.Ordinal);
        definition["LatentHeat"] = 250000.0;
        Assert.Equal(250e3, MaterialLibrary.Define(definition).LatentHeatJoulesPerKilogram, 6);
        definition["LatentHeat"] = "250 kJ";
        Assert.Throws<Errors.RecordException>(() => MaterialLibrary.Define(definition));
    }
}
