using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// The inventory rows of one run that describe the same item at the same place: a box of identical spanners, a
/// tray of rings of one size, the same ladder at every bay. The first such row is assessed and the others take its
/// result under their own name, row number and inventory columns
/// (<see cref="Relabel(InductionResponse, string, IReadOnlyList{KeyValuePair{string, object}}, int)"/>), as assessing
/// them afresh would give it. A row is known by its item, placement and station fields exactly as written
/// (<see cref="KeyOf"/>); every other input of the run (the source, the policy, the unit table, the times and
/// surroundings) is the same for all its rows. The commands keep the first rows' work in a
/// <see cref="BoundedCache{TKey, TValue}"/> of a few hundred, so that an inventory of items all different holds no more.
/// </summary>
internal static class RepeatedRows
{
    /// <summary>
    /// What a row's assessment depends on: each item, placement and station field (columns known to
    /// <see cref="ItemRecordReader"/>, <see cref="PlacementRecordReader"/> or a site's station column) by its column name
    /// and its value exactly as given; the item's name and the inventory's own columns are left out, as they only label
    /// the result. Null when a value is of a kind that cannot be written exactly (an object other than text, a number or
    /// a true/false), for a row that names its item in more than one column (the reader refuses columns that disagree,
    /// which the key does not see), and for a row with no field at all: such a row is assessed on its own.
    /// </summary>
    /// <param name="record">The row's named values.</param>
    public static string? KeyOf(IReadOnlyList<KeyValuePair<string, object?>> record)
    {
        var key = new StringBuilder(128);
        bool named = false;
        foreach (KeyValuePair<string, object?> pair in record)
        {
            if (string.IsNullOrWhiteSpace(pair.Key))
            {
                continue;
            }

            string field = RecordFields.FieldKey(pair.Key);
            if (NameFields.Contains(field))
            {
                if (named)
                {
                    return null;
                }

                named = true;
                continue;
            }

            if (!InventoryFields.IsItemOrPlacementField(field))
            {
                continue;
            }

            key.Append(pair.Key).Append('\u001f');
            if (!AppendExactly(key, pair.Value))
            {
                return null;
            }

            key.Append('\u001e');
        }

        return key.Length == 0 ? null : key.ToString();
    }

    /// <summary>
    /// The first row's response for another row with the same key: its scenario under the row's item name (its Name
    /// column, else "row N", as <see cref="ItemRecordReader"/> names it) and with the row's inventory columns.
    /// </summary>
    /// <param name="first">The response of the first row with the key.</param>
    /// <param name="name">The other row's item name as its record gives it (<see cref="ItemRecordReader.NameOf"/>), or null.</param>
    /// <param name="record">The other row's named values.</param>
    /// <param name="rowNumber">The other row's position in the input (1-based).</param>
    public static InductionResponse Relabel(InductionResponse first, string? name, IReadOnlyList<KeyValuePair<string, object?>> record, int rowNumber) =>
        first.For(first.Scenario.For(ItemRecordReader.ItemName(name, rowNumber), InventoryFields.Of(record)));

    /// <summary>
    /// The first row's safe distance for another row with the same key: the same search under the row's item name (its
    /// Name column, else "row N"); a search's assessments carry no row number or inventory columns.
    /// </summary>
    public static SafeDistanceResult Relabel(SafeDistanceResult first, string? name, int rowNumber)
    {
        string itemName = ItemRecordReader.ItemName(name, rowNumber);
        InductionResponse response = first.Assessment.Response;
        InductionAssessment there = first.Assessment.For(response.For(response.Scenario.For(itemName, response.Scenario.Inventory)), first.Assessment.RowNumber);
        return first with { ItemName = itemName, Assessment = there };
    }

    /// <summary>The Name column and its aliases, normalized: they name the item and do not change what is assessed.</summary>
    private static readonly HashSet<string> NameFields = NameKeys();

    private static HashSet<string> NameKeys()
    {
        var names = new HashSet<string>(StringComparer.Ordinal) { RecordFields.Normalize("Name") };
        foreach (string alias in ItemRecordReader.Aliases["Name"])
        {
            names.Add(RecordFields.Normalize(alias));
        }

        return names;
    }

    /// <summary>Writes a value with its kind, exactly (a double by its bits); false for a value that cannot be.</summary>
    private static bool AppendExactly(StringBuilder key, object? value)
    {
        switch (value)
        {
            case null:
                key.Append('0');
                return true;
            case string text:
                key.Append('s').Append(text);
                return true;
            case double d:
                key.Append('d').Append(BitConverter.DoubleToInt64Bits(d).ToString("x16", CultureInfo.InvariantCulture));
                return true;
            case float f:
                key.Append('f').Append(BitConverter.DoubleToInt64Bits(f).ToString("x16", CultureInfo.InvariantCulture));
                return true;
            case int or long or short or sbyte or byte or uint or ulong or ushort:
                key.Append('i').Append(value.GetType().Name).Append(Convert.ToString(value, CultureInfo.InvariantCulture));
                return true;
            case decimal m:
                key.Append('m').Append(m.ToString(CultureInfo.InvariantCulture));
                return true;
            case bool b:
                key.Append(b ? 'T' : 'F');
                return true;
            default:
                return false;
        }
    }
}
