using System.Collections.Generic;
using System.Management.Automation;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Turns one pipeline object into an item: an item passes through, a row or hashtable is read by its fields.</summary>
internal static class ItemInput
{
    /// <summary>The item for one input.</summary>
    /// <exception cref="Errors.RecordException">The row cannot make an item.</exception>
    public static ConductiveItem ToItem(PSObject input, MaterialLibrary materials, int row, IReadOnlyDictionary<string, string>? units = null, bool acceptUnusualSize = false) =>
        input.BaseObject is ConductiveItem item ? item : ItemRecordReader.Read(Records.From(input), materials, row, units, acceptUnusualSize);

    /// <summary>The position and normal a row gives (X, Y, Z, NormalX, NormalY, NormalZ); none for an item object.</summary>
    /// <exception cref="Errors.RecordException">The row gives some components but not all, or a malformed one.</exception>
    public static (Quantities.Vector3D? Position, Quantities.Vector3D? Normal) PlacementOf(PSObject input, string label, IReadOnlyDictionary<string, string>? units = null) =>
        input.BaseObject is ConductiveItem ? (null, null) : PlacementRecordReader.Read(Records.From(input), label, units);

    /// <summary>The row's own columns that are not item, placement or station fields (asset tag, holder, notes...); none for an item object.</summary>
    public static Assessment.InventoryFields InventoryOf(PSObject input) =>
        input.BaseObject is ConductiveItem ? Assessment.InventoryFields.Empty : Assessment.InventoryFields.Of(Records.From(input));

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

    /// <summary>The station of the site at which a row is assessed: -Station, else the row's Station column.</summary>
    /// <exception cref="Errors.InductionHazardException">The row names no station, or one the site does not have.</exception>
    public static Assessment.Station StationOf(PSObject input, string label, Assessment.HazardSite site, string? station) =>
        station is not null ? site.Find(station)
        : input.BaseObject is ConductiveItem ? site.StationOf(System.Array.Empty<KeyValuePair<string, object?>>(), label)
        : site.StationOf(Records.From(input), label);

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
