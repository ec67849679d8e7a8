using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Items;
using Xunit;

namespace InductionHazard.Tests.Items;

public class MaterialLibraryTests
{
    [Theory]
    [InlineData("copper", "Copper")]
    [InlineData("ALUMINUM", "Aluminium")]
    [InlineData("Aluminium", "Aluminium")]
    [InlineData("Stainless304", "Stainless 304")]
    [InlineData("SS304", "Stainless 304")]
    [InlineData("ss 304", "Stainless 304")]
    [InlineData("Titanium", "Titanium grade 2")]
    [InlineData("Ti-6Al-4V", "Ti-6Al-4V")]
    [InlineData("brass", "Brass C26000")]
    [InlineData("mild steel", "Low-carbon steel 1010")]
    public void FindsMaterialsByCommonSpellings(string name, string expected)
    {
        Assert.Equal(expected, MaterialLibrary.BuiltIn.Find(name).Name);
    }

    [Fact]
    public void HoldsTheTenBuiltInMaterials()
    {
        Assert.Equal(10, MaterialLibrary.BuiltIn.Materials.Count);
    }

    [Fact]
    public void EveryBuiltInValueNamesItsSource()
    {
        string[] properties =
        {
            nameof(ConductorMaterial.ResistivityOhmMeters), nameof(ConductorMaterial.TemperatureCoefficientPerKelvin),
            nameof(ConductorMaterial.DensityKilogramsPerCubicMeter), nameof(ConductorMaterial.SpecificHeatJoulesPerKilogramKelvin),
            nameof(ConductorMaterial.ThermalConductivityWattsPerMeterKelvin), nameof(ConductorMaterial.MeltingCelsius),
            nameof(ConductorMaterial.RelativePermeability),
        };
        foreach (ConductorMaterial m in MaterialLibrary.BuiltIn.Materials)
        {
            foreach (string p in properties)
            {
                Assert.True(m.Sources.TryGetValue(p, out string? source) && source.Length > 5, m.Name + " has no source for " + p);
            }
        }
    }

    [Validates("each pure metal's thermal conductivity against its resistivity: k rho / T near the Sommerfeld Lorenz number (pi^2/3)(kB/e)^2 = 2.443e-8 W ohm/K^2", "Wiedemann-Franz law (textbook closed form, exact SI constants); measured Lorenz numbers at room temperature within about 12 % of it for these metals (Kittel, Introduction to Solid State Physics, table of Lorenz numbers, from memory)", "12 %")]
    [Theory]
    [InlineData("Copper")]
    [InlineData("Silver")]
    [InlineData("Gold")]
    [InlineData("Aluminium")]
    [InlineData("Platinum")]
    public void APureMetalsConductivitiesAgreeByTheWiedemannFranzLaw(string name)
    {
        // Two values of the table from different sources, tied by one law: a slip of a digit in either (a resistivity
        // ten times off, a conductivity from another alloy) shows as a Lorenz number far from the Sommerfeld value.
        const double Boltzmann = 1.380649e-23, Charge = 1.602176634e-19;
        double sommerfeld = System.Math.PI * System.Math.PI / 3 * (Boltzmann / Charge) * (Boltzmann / Charge);
        ConductorMaterial m = MaterialLibrary.BuiltIn.Find(name);
        double lorenz = m.ThermalConductivityWattsPerMeterKelvin * m.ResistivityOhmMeters / 293.15;
        Within.Relative(sommerfeld, lorenz, 0.12, name + "'s Lorenz number k rho / T");
    }

    [Validates("each latent heat of fusion per kilogram against the molar value over the standard atomic weight: Cu 13.26, Al 10.71, Ag 11.28, Au 12.55, Pt 22.17, Ti 14.15, Fe 13.81 kJ/mol", "CRC Handbook of Chemistry and Physics (molar heats of fusion, from memory); IUPAC standard atomic weights (from memory)", "1e-3")]
    [Theory]
    [InlineData("Copper", 13.26, 63.546)]
    [InlineData("Aluminium", 10.71, 26.9815)]
    [InlineData("Silver", 11.28, 107.8682)]
    [InlineData("Gold", 12.55, 196.96657)]
    [InlineData("Platinum", 22.17, 195.084)]
    [InlineData("Titanium grade 2", 14.15, 47.867)]
    [InlineData("Low-carbon steel 1010", 13.81, 55.845)]
    public void ALatentHeatPerKilogramIsTheMolarOneOverTheAtomicWeight(string name, double kilojoulesPerMole, double gramsPerMole)
    {
        // The table gives J/kg; the handbooks give kJ/mol: the pure metal's (for titanium grade 2 pure titanium, for
        // the steel pure iron, as their sources say).
        Within.Relative(kilojoulesPerMole * 1e3 / (gramsPerMole * 1e-3), MaterialLibrary.BuiltIn.Find(name).LatentHeatJoulesPerKilogram, 1e-3, name + "'s latent heat");
    }

    [Validates("rho20 1.7241e-8 ohm m, alpha 0.00393 /K", "IEC 60028", "1e-4")]
    [Fact]
    public void CopperIsTheInternationalAnnealedCopperStandard()
    {
        // IEC 60028: 1/58 ohm mm^2/m = 1.7241e-8 ohm m and 0.00393 /K at 20 °C.
        ConductorMaterial cu = MaterialLibrary.BuiltIn.Find("Cu");
        Within.Relative(1.7241e-8, cu.ResistivityOhmMeters, 1e-4, "rho20 of copper");
        Within.Relative(0.00393, cu.TemperatureCoefficientPerKelvin, 1e-3, "alpha of copper");
        Within.Relative(1.7241e-8 * (1 + (0.00393 * 80)), cu.ResistivityAt(100), 1e-4, "rho(100 °C) by the linear law");
    }

    [Fact]
    public void UnknownNamesListTheKnownOnes()
    {
        var error = Assert.Throws<UnknownMaterialException>(() => MaterialLibrary.BuiltIn.Find("Unobtainium"));
        Assert.Contains("Copper", error.Message, System.StringComparison.Ordinal);
        Assert.Equal("UnknownMaterial", error.ErrorId);
    }

    [Fact]
    public void DefinesAMaterialFromNamedValuesWithUnits()
    {
        ConductorMaterial m = MaterialLibrary.Define(new Dictionary<string, object?>
        {
            ["Name"] = "Test alloy",
            ["Resistivity"] = "2.5e-7 ohm m",
            ["Alpha"] = 0.002,
            ["Density"] = "15.5 g/cm3",
            ["SpecificHeat"] = 150,
            ["MeltingTemperature"] = "900 degC",
            ["Source"] = "assay report 17",
        });
        Assert.Equal(2.5e-7, m.ResistivityOhmMeters, 15);
        Assert.Equal(15500, m.DensityKilogramsPerCubicMeter, 9);
        Assert.Equal(900, m.MeltingCelsius, 9);
        Assert.False(m.IsBuiltIn);
        Assert.Equal("assay report 17", m.Sources[nameof(ConductorMaterial.ResistivityOhmMeters)]);

        MaterialLibrary library = MaterialLibrary.BuiltIn.With(new[] { m });
        Assert.Same(m, library.Find("test alloy"));
        Assert.Equal("Copper", library.Find("copper").Name);
    }

    [Fact]
    public void ADefinitionReportsEveryProblemAtOnce()
    {
        var error = Assert.Throws<RecordException>(() => MaterialLibrary.Define(new Dictionary<string, object?>
        {
            ["Name"] = "Bad",
            ["Resistivity"] = "3 T",
            ["Density"] = -1,
            ["Melting"] = 900,
            ["Resistivty"] = 1e-8,
        }));
        Assert.Equal(new[] { "Resistivity", "SpecificHeat", "Density", "Resistivty" }, error.Fields.ToArray());
    }

    // Defect: custom materials accepted a melting point of -500 K, a negative temperature coefficient that makes the
    // resistivity negative at skin temperature, and values of 1e300. Each is refused naming the property.
    [Theory]
    [InlineData("MeltingTemperature", "-500 K")]
    [InlineData("TemperatureCoefficient", -0.01)]
    [InlineData("Resistivity", 1e300)]
    [InlineData("Density", 1e300)]
    [InlineData("SpecificHeat", 1e300)]
    [InlineData("RelativePermeability", 1e300)]
    public void PropertiesNoMaterialCanHaveAreRefused(string property, object value)
    {
        var definition = new Dictionary<string, object?>
        {
            ["Name"] = "Hostile alloy",
            ["Resistivity"] = 5e-8,
            ["Density"] = 8000,
            ["SpecificHeat"] = 400,
            ["MeltingTemperature"] = 1000,
        };
        definition[property] = value;
        var error = Assert.Throws<RecordException>(() => MaterialLibrary.Define(definition));
        Assert.Contains(property, error.Fields);
    }

    [Fact]
    public void ATemperatureCoefficientThatTurnsTheResistivityNegativeBeforeMeltingIsRefused()
    {
        // -9e-4 per K is inside the range of resistance alloys, but 1 + alpha (T - 20) reaches zero near 1131 °C.
        var error = Assert.Throws<RecordException>(() => MaterialLibrary.Define(new Dictionary<string, object?>
        {
            ["Name"] = "Odd alloy", ["Resistivity"] = 5e-7, ["Alpha"] = -9e-4, ["Density"] = 8000, ["SpecificHeat"] = 400, ["MeltingTemperature"] = 1400,
        }));
        Assert.Contains("zero or negative", error.Message, System.StringComparison.Ordinal);
    }
}
