using System;
using System.Collections.Generic;
using System.Collections.ObjectModel;
using System.Globalization;
using System.Linq;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// An inventory row's own columns (asset tag, holder, location, notes...): every column of the row that is not an
/// item, placement, station, exposure-group or exposure-time field, with its text, in the row's order. They travel
/// with the assessment into every report, so that results never have to be joined back to the inventory by row
/// number. Names match without regard to case. Shown as "AssetTag: MH-J-001; Holder: technician A" wherever text is wanted (Export-Csv, a table).
/// </summary>
public sealed class InventoryFields : ReadOnlyDictionary<string, string>
{
    private static readonly HashSet<string> ItemAndPlacementNames = KnownNames();

    private InventoryFields(IDictionary<string, string> fields)
        : base(fields)
    {
    }

    /// <summary>No inventory columns (an item made with New-ConductiveItem).</summary>
    public static InventoryFields Empty { get; } = new(new Dictionary<string, string>());

    /// <summary>The columns of a record that are not item, placement or station fields, in the record's order.</summary>
    /// <param name="record">The row's named values.</param>
    public static InventoryFields Of(IEnumerable<KeyValuePair<string, object?>> record)
    {
        // A Dictionary that is only added to enumerates in the order of addition: the row's order.
        var fields = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (KeyValuePair<string, object?> pair in record)
        {
            if (string.IsNullOrWhiteSpace(pair.Key) || ItemAndPlacementNames.Contains(RecordFields.FieldKey(pair.Key)) || fields.ContainsKey(pair.Key.Trim()))
            {
                continue;
            }

            fields.Add(pair.Key.Trim(), Convert.ToString(pair.Value, CultureInfo.InvariantCulture) ?? string.Empty);
        }

        return fields.Count == 0 ? Empty : new InventoryFields(fields);
    }

    /// <summary>Whether a column (by <see cref="RecordFields.FieldKey"/>) is an item, placement or station field rather than the inventory's own.</summary>
    internal static bool IsItemOrPlacementField(string fieldKey) => ItemAndPlacementNames.Contains(fieldKey);

    /// <summary>"AssetTag: MH-J-001; Holder: technician A" (empty columns left out).</summary>
    public override string ToString() =>
        string.Join("; ", this.Where(p => p.Value.Length > 0).Select(p => p.Key + ": " + p.Value));

    private static HashSet<string> KnownNames()
    {
        IEnumerable<string> names = ItemRecordReader.Aliases.SelectMany(p => p.Value.Append(p.Key))
            .Concat(PlacementRecordReader.Aliases.SelectMany(p => p.Value.Append(p.Key)))
            .Concat(HazardSite.StationAliases.Append("Station"))
            .Concat(WearerGroupReader.Aliases.Append(WearerGroupReader.Field))
            .Concat(ExposureRecordReader.Fields);
        return new HashSet<string>(names.Select(RecordFields.Normalize), StringComparer.Ordinal);
    }
}
