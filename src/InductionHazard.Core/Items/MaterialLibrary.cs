using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// Finds conductor materials by name: the built-in table plus any materials the user supplies. Names match
/// without regard to case, spaces or punctuation, and through common spellings (Aluminium and Aluminum,
/// Stainless304 and SS304, Titanium for grade 2).
/// </summary>
public sealed class MaterialLibrary
{
    private readonly Dictionary<string, ConductorMaterial> _byKey = new(StringComparer.Ordinal);
    private readonly List<ConductorMaterial> _materials = new();

    private MaterialLibrary(IEnumerable<ConductorMaterial> materials)
    {
        foreach (ConductorMaterial material in materials)
        {
            Add(material);
        }
    }

    /// <summary>The built-in table alone.</summary>
    public static MaterialLibrary BuiltIn { get; } = new(BuiltInMaterials.All);

    /// <summary>Every material: user-supplied ones first, then the built-in table in its order.</summary>
    public IReadOnlyList<ConductorMaterial> Materials => _materials;

    /// <summary>A library with the given materials added (a user material shadows a built-in one of the same name).</summary>
    public MaterialLibrary With(IEnumerable<ConductorMaterial> additional) =>
        new(additional.Concat(_materials.Where(m => additional.All(a => RecordFields.Normalize(a.Name) != RecordFields.Normalize(m.Name)))));

    /// <summary>Finds a material by name or alias.</summary>
    /// <exception cref="UnknownMaterialException">No material has that name.</exception>
    public ConductorMaterial Find(string name)
    {
        if (TryFind(name, out ConductorMaterial? material))
        {
            return material!;
        }

        throw new UnknownMaterialException(name, _materials.Select(m => m.Name).ToArray());
    }

    /// <summary>Finds a material by name or alias; false when there is none.</summary>
    public bool TryFind(string name, out ConductorMaterial? material) =>
        _byKey.TryGetValue(RecordFields.Normalize(name), out material);

    /// <summary>
    /// Defines a material from named values (a hashtable): Name, Resistivity, Density, SpecificHeat and
    /// MeltingTemperature are required; TemperatureCoefficient (alias Alpha), ThermalConductivity,
    /// RelativePermeability, LatentHeat and Source are optional. Values may carry units ('2.4e-8 ohm m', '19.3 g/cm3').
    /// </summary>
    /// <exception cref="RecordException">A value is missing, malformed or out of range, or a name is not recognised.</exception>
    public static ConductorMaterial Define(IEnumerable<KeyValuePair<string, object?>> definition)
    {
        var fields = new RecordFields(definition);
        string? name = fields.Text("Name", required: true);
        double? rho = fields.Quantity("Resistivity", QuantityKind.Resistivity, required: true);
        double? alpha = fields.Number("TemperatureCoefficient", required: false, "Alpha", "TemperatureCoefficientPerKelvin");
        double? density = fields.Quantity("Density", QuantityKind.Density, required: true);
        double? cp = fields.Quantity("SpecificHeat", QuantityKind.SpecificHeat, required: true, "HeatCapacity");
        double? k = fields.Quantity("ThermalConductivity", QuantityKind.ThermalConductivity, required: false);
        double? mu = fields.Number("RelativePermeability", required: false, "MuR", "Permeability");
        double? melt = fields.Quantity("MeltingTemperature", QuantityKind.Temperature, required: true, "Melting", "MeltingPoint", "Solidus", "MeltingCelsius");
        double? latent = fields.Quantity("LatentHeat", QuantityKind.SpecificEnergy, required: false, "HeatOfFusion", "LatentHeatOfFusion");
        string source = fields.Text("Source", required: false, "Reference") ?? "user supplied";

        CheckRange(fields, PhysicalRanges.Resistivity, rho);
        CheckRange(fields, PhysicalRanges.TemperatureCoefficient, alpha);
        CheckRange(fields, PhysicalRanges.Density, density);
        CheckRange(fields, PhysicalRanges.SpecificHeat, cp);
        CheckRange(fields, PhysicalRanges.ThermalConductivity, k);
        CheckRange(fields, PhysicalRanges.RelativePermeability, mu);
        CheckRange(fields, PhysicalRanges.Melting, melt);
        CheckRange(fields, PhysicalRanges.LatentHeat, latent);
        if (alpha is { } a && melt is { } m && PhysicalRanges.TemperatureCoefficient.Contains(a) && PhysicalRanges.Melting.Contains(m))
        {
            // rho(T) = rho20 (1 + alpha (T - 20)) must stay positive over every temperature assessed: the coldest room to melting.
            double lowest = Math.Min(1 + (a * (PhysicalRanges.Ambient.Minimum - 20)), 1 + (a * (m - 20)));
            if (!(lowest > 0))
            {
                fields.AddError("TemperatureCoefficient", "would make the resistivity zero or negative between " + PhysicalRanges.Ambient.Minimum + " °C and the melting point; got " + a.ToString("G6", System.Globalization.CultureInfo.InvariantCulture) + " per K");
            }
        }

        fields.RejectUnused("is not a material property (use Name, Resistivity, TemperatureCoefficient, Density, SpecificHeat, ThermalConductivity, RelativePermeability, MeltingTemperature, LatentHeat, Source)");

        if (fields.Errors.Count > 0)
        {
            throw new RecordException("material '" + (name ?? "(no name)") + "'", fields.Errors);
        }

        bool ferromagnetic = mu is > 1.5;
        var sources = new Dictionary<string, string>
        {
            [nameof(ConductorMaterial.ResistivityOhmMeters)] = source,
            [nameof(ConductorMaterial.TemperatureCoefficientPerKelvin)] = alpha is null ? MaterialSource.NoAlpha : source,
            [nameof(ConductorMaterial.DensityKilogramsPerCubicMeter)] = source,
            [nameof(ConductorMaterial.SpecificHeatJoulesPerKilogramKelvin)] = source,
            [nameof(ConductorMaterial.ThermalConductivityWattsPerMeterKelvin)] = k is null ? "not given: the lumped-heating check assumes " + LowestMetalConductivity + " W/(m K), below any structural metal (common practice)" : source,
            [nameof(ConductorMaterial.RelativePermeability)] = mu is null ? "not given: 1 assumed" : source,
            [nameof(ConductorMaterial.MeltingCelsius)] = source,
            [nameof(ConductorMaterial.LatentHeatJoulesPerKilogram)] = latent is null ? "not given: the time to melt through is not estimated" : source,
        };
        return new ConductorMaterial
        {
            Name = name!,
            ResistivityOhmMeters = rho!.Value,
            TemperatureCoefficientPerKelvin = alpha ?? 0.0,
            TemperatureCoefficientKnown = alpha is not null,
            DensityKilogramsPerCubicMeter = density!.Value,
            SpecificHeatJoulesPerKilogramKelvin = cp!.Value,
            ThermalConductivityWattsPerMeterKelvin = k ?? LowestMetalConductivity,
            RelativePermeability = mu ?? 1.0,
            IsFerromagnetic = ferromagnetic,
            MeltingCelsius = melt!.Value,
            LatentHeatJoulesPerKilogram = latent ?? double.NaN,
            Sources = sources,
            IsBuiltIn = false,
        };
    }

    /// <summary>The thermal conductivity assumed when a user material gives none, W/(m K): below any structural metal.</summary>
    public const double LowestMetalConductivity = 5.0;

    private static void CheckRange(RecordFields fields, PhysicalRange range, double? value)
    {
        if (value is { } v && range.Problem(v) is { } problem)
        {
            fields.AddError(range.Field, problem);
        }
    }

    private void Add(ConductorMaterial material)
    {
        _materials.Add(material);
        foreach (string name in new[] { material.Name }.Concat(material.Aliases))
        {
            string key = RecordFields.Normalize(name);
            if (!_byKey.ContainsKey(key))
            {
                _byKey[key] = material;
            }
        }
    }
}
