using System.Management.Automation;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Turns one pipeline object into an item: an item passes through, a row or hashtable is read by its fields.</summary>
internal static class ItemInput
{
    /// <summary>The item for one input.</summary>
    /// <exception cref="Errors.RecordException">The row cannot make an item.</exception>
    public static ConductiveItem ToItem(PSObject input, MaterialLibrary materials, int row) =>
        input.BaseObject is ConductiveItem item ? item : ItemRecordReader.Read(Records.From(input), materials, row);

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
