using System.Collections.Generic;
using static InductionHazard.Items.MaterialSource;

namespace InductionHazard.Items;

/// <summary>
/// The module's table of conductor materials at 20 °C. Every value names its source; values recalled and not
/// yet checked against a printed copy say so. Jewellery alloys (9-18 carat gold, sterling silver) are not
/// in the table: their resistivity is several times the pure metal's and no printed value is at hand, so they
/// are defined by the user (Get-ConductorMaterial -Definition).
/// </summary>
internal static class BuiltInMaterials
{
    public static IReadOnlyList<ConductorMaterial> All { get; } = new[]
    {
        Make("Copper", new[] { "Cu", "Annealed copper" },
            rho: (1.7241e-8, Confirmed(Iec60028)),
            alpha: (0.00393, Confirmed(Iec60028)),
            density: (8890, Confirmed(Iec60028)),
            cp: (385, FromMemory(Crc)),
            k: (401, FromMemory(Crc)),
            melt: (1084.62, Confirmed(Its90 + " (freezing point of copper)")),
            latent: (208.7e3, FromMemory(Crc + ", 13.26 kJ/mol"))),
        Make("Aluminium", new[] { "Aluminum", "Al", "Aluminium 1350", "EC aluminium" },
            rho: (2.8264e-8, Confirmed(Iec60949)),
            alpha: (0.00403, Confirmed(Iec60949 + "; 1/(beta + 20) with beta = 228 K")),
            density: (2703, FromMemory("IEC 60889 (hard-drawn aluminium wire)")),
            cp: (900, FromMemory(Crc)),
            k: (234, FromMemory(Asm + ", alloy 1350")),
            melt: (646, FromMemory(Asm + ", solidus of alloy 1350 (pure aluminium melts at 660.3 °C, ITS-90)")),
            latent: (396.9e3, FromMemory(Crc + ", pure aluminium, 10.71 kJ/mol"))),
        Make("Silver", new[] { "Ag", "Fine silver" },
            rho: (1.587e-8, FromMemory(Crc + ", 293 K")),
            alpha: (0.0038, FromMemory(Crc)),
            density: (10490, FromMemory(Crc)),
            cp: (235, FromMemory(Crc)),
            k: (429, FromMemory(Crc)),
            melt: (961.78, Confirmed(Its90 + " (freezing point of silver)")),
            latent: (104.6e3, FromMemory(Crc + ", 11.28 kJ/mol"))),
        Make("Gold", new[] { "Au", "Fine gold", "24ct gold" },
            rho: (2.214e-8, FromMemory(Crc + ", 293 K (older tables give 2.44e-8; the lower value is used)")),
            alpha: (0.0034, FromMemory(Crc)),
            density: (19300, FromMemory(Crc)),
            cp: (129, FromMemory(Crc)),
            k: (318, FromMemory(Crc)),
            melt: (1064.18, Confirmed(Its90 + " (freezing point of gold)")),
            latent: (63.7e3, FromMemory(Crc + ", 12.55 kJ/mol"))),
        Make("Platinum", new[] { "Pt" },
            rho: (1.05e-7, Confirmed(Crc)),
            alpha: (0.00385, Confirmed(Iec60751)),
            density: (21450, FromMemory(Crc)),
            cp: (131, FromMemory(Crc)),
            k: (71.6, FromMemory(Crc)),
            melt: (1768, FromMemory(Crc)),
            latent: (113.6e3, FromMemory(Crc + ", 22.17 kJ/mol"))),
        Make("Titanium grade 2", new[] { "Titanium", "Ti", "Ti grade 2", "CP titanium", "Grade 2 titanium" },
            rho: (5.2e-7, Confirmed(Asm)),
            alpha: (0.0, NoAlpha),
            density: (4510, Confirmed(Asm)),
            cp: (523, Confirmed(Asm)),
            k: (16.4, FromMemory(Asm)),
            melt: (1665, Confirmed(Asm)),
            latent: (295.6e3, FromMemory(Crc + ", pure titanium, 14.15 kJ/mol"))),
        Make("Ti-6Al-4V", new[] { "Ti6Al4V", "Titanium grade 5", "Ti grade 5", "Grade 5 titanium" },
            rho: (1.78e-6, Confirmed(Asm)),
            alpha: (0.0, NoAlpha),
            density: (4430, Confirmed(Asm)),
            cp: (526, Confirmed(Asm)),
            k: (6.7, FromMemory(Asm)),
            melt: (1604, Confirmed(Asm + ", solidus")),
            latent: (286e3, FromMemory("Mills, Recommended Values of Thermophysical Properties for Selected Commercial Alloys (2002)"))),
        Make("Stainless 304", new[] { "SS304", "304", "Stainless steel 304", "AISI 304", "Stainless" },
            rho: (7.2e-7, Confirmed(Asm)),
            alpha: (0.001, FromMemory(Asm + " (about 1e-3 /K)")),
            density: (8000, Confirmed(Asm)),
            cp: (500, Confirmed(Asm)),
            k: (16.2, FromMemory(Asm)),
            melt: (1400, Confirmed(Asm + ", solidus")),
            latent: (260e3, FromMemory("Mills, Recommended Values of Thermophysical Properties for Selected Commercial Alloys (2002)")),
            mu: (1.02, FromMemory(Asm + ", annealed; cold work raises it"))),
        Make("Brass C26000", new[] { "Brass", "C26000", "Cartridge brass", "CuZn30" },
            rho: (6.16e-8, Confirmed(Asm)),
            alpha: (0.0015, FromMemory(Asm + " (0.0015-0.002 /K; the lower value is used)")),
            density: (8530, FromMemory(Asm)),
            cp: (377, FromMemory(Asm)),
            k: (120, FromMemory(Asm)),
            melt: (915, FromMemory(Asm + ", solidus")),
            latent: (180e3, FromMemory("estimated from copper and zinc by mass (CRC: 208.7 and 112 kJ/kg)"))),
        Make("Low-carbon steel 1010", new[] { "Steel", "Mild steel", "Steel 1010", "1010", "Carbon steel" },
            rho: (1.43e-7, FromMemory(Asm)),
            alpha: (0.004, FromMemory(Asm + " (about 0.004 /K)")),
            density: (7870, FromMemory(Asm)),
            cp: (450, FromMemory(Asm + " (450-486 J/(kg K); the lower value is used)")),
            k: (65, FromMemory(Asm)),
            melt: (1500, FromMemory(Asm + " (about 1500 °C)")),
            latent: (247.3e3, FromMemory(Crc + ", pure iron, 13.81 kJ/mol")),
            mu: (1000, FromMemory("nominal low-field relative permeability of annealed low-carbon steel; depends strongly on the field")),
            saturation: (2.1, FromMemory(Asm + " (saturation about 2.1 T)"))),
    };

    private static ConductorMaterial Make(
        string name,
        string[] aliases,
        (double Value, string Source) rho,
        (double Value, string Source) alpha,
        (double Value, string Source) density,
        (double Value, string Source) cp,
        (double Value, string Source) k,
        (double Value, string Source) melt,
        (double Value, string Source) latent,
        (double Value, string Source)? mu = null,
        (double Value, string Source)? saturation = null)
    {
        var sources = new Dictionary<string, string>
        {
            [nameof(ConductorMaterial.ResistivityOhmMeters)] = rho.Source,
            [nameof(ConductorMaterial.TemperatureCoefficientPerKelvin)] = alpha.Source,
            [nameof(ConductorMaterial.DensityKilogramsPerCubicMeter)] = density.Source,
            [nameof(ConductorMaterial.SpecificHeatJoulesPerKilogramKelvin)] = cp.Source,
            [nameof(ConductorMaterial.ThermalConductivityWattsPerMeterKelvin)] = k.Source,
            [nameof(ConductorMaterial.MeltingCelsius)] = melt.Source,
            [nameof(ConductorMaterial.LatentHeatJoulesPerKilogram)] = latent.Source,
            [nameof(ConductorMaterial.RelativePermeability)] = mu?.Source ?? "non-magnetic metal: mu_r = 1 (common practice)",
        };
        if (saturation is { } sat)
        {
            sources[nameof(ConductorMaterial.SaturationTesla)] = sat.Source;
        }

        return new ConductorMaterial
        {
            Name = name,
            Aliases = aliases,
            ResistivityOhmMeters = rho.Value,
            TemperatureCoefficientPerKelvin = alpha.Value,
            TemperatureCoefficientKnown = alpha.Source != NoAlpha,
            DensityKilogramsPerCubicMeter = density.Value,
            SpecificHeatJoulesPerKilogramKelvin = cp.Value,
            ThermalConductivityWattsPerMeterKelvin = k.Value,
            MeltingCelsius = melt.Value,
            LatentHeatJoulesPerKilogram = latent.Value,
            RelativePermeability = mu?.Value ?? 1.0,
            IsFerromagnetic = saturation is not null,
            SaturationTesla = saturation?.Value ?? double.NaN,
            Sources = sources,
            IsBuiltIn = true,
        };
    }
}
