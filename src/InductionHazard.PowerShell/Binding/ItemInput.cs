using System.Collections.Generic;
using System.Management.Automation;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Turns one pipeline object into an item: an item passes through, a row or hashtable is read by its fields.</summary>
internal static class ItemInput
{
    /// <summary>The item for one input.</summary>
    /// <exception cref="Errors.RecordException">The row cannot make an item.</exception>
    public static ConductiveItem ToItem(PSObject input, MaterialLibrary materials, int row, IReadOnlyDictionary<string, string>? units = null) =>
        input.BaseObject is ConductiveItem item ? item : ItemRecordReader.Read(Records.From(input), materials, row, units);

    /// <summary>The position and normal a row gives (X, Y, Z, NormalX, NormalY, NormalZ); none for an item object.</summary>
    /// <exception cref="Errors.RecordException">The row gives some components but not all, or a malformed one.</exception>
    public static (Quantities.Vector3D? Position, Quantities.Vector3D? Normal) PlacementOf(PSObject input, string label, IReadOnlyDictionary<string, string>? units = null) =>
        input.BaseObject is ConductiveItem ? (null, null) : PlacementRecordReader.Read(Records.From(input), label, units);

    /// <summary>A -Unit table (@{ Diameter = 'mm' }) as field names and unit strings.</summary>
    public static IReadOnlyDictionary<string, string>? UnitsOf(System.Collections.IDictionary? table)
    {
        if (table is null)
        {
            return null;
        }

        var units = new Dictionary<string, string>(System.StringComparer.OrdinalIgnoreCase);
        foreach (object key in table.Keys)
        {
            units[System.Convert.ToString(key, System.Globalization.CultureInfo.InvariantCulture) ?? string.Empty] =
                System.Convert.ToString(Binding.QuantityAttribute.Unwrap(table[key]), System.Globalization.CultureInfo.InvariantCulture) ?? string.Empty;
        }

        return units;
    }

    /// <summary>The station a row names in its Station column (aliases Place, Location); an item object names none.</summary>
    /// <exception cref="Errors.RecordException">The row names no station.</exception>
    public static string StationOf(PSObject input, string label, Assessment.HazardSite site)
    {
        string? name = input.BaseObject is ConductiveItem ? null : new Quantities.RecordFields(Records.From(input)).Text("Station", required: false, "Place", "Location");
        return name ?? throw new Errors.RecordException(label, new[]
        {
            new Errors.FieldError("Station", "is missing: name one of the stations of " + site.Name + " (" + string.Join(", ", System.Linq.Enumerable.Select(site.Stations, s => s.Name)) + "), or give -Station", "InvalidInput"),
        });
    }

    /// <summary>How the input is named in messages: "row 7 ('Wedding band')".</summary>
    public static string Label(PSObject input, int row)
    {
        if (input.BaseObject is ConductiveItem item)
        {
            return ItemRecordReader.Label(row, item.Name);
        }

        return ItemRecordReader.Label(row, ItemRecordReader.NameOf(Records.From(input)));
    }
}
