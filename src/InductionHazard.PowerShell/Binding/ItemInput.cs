using System.Collections.Generic;
using System.Management.Automation;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Turns one pipeline object into an item: an item passes through, a row or hashtable is read by its fields.</summary>
internal static class ItemInput
{
    /// <summary>
    /// Takes what a pipeline parameter that takes one object was bound to: one object, or the objects of a collection
    /// given at once (-Item $band, $ring) in turn, as the shell would enumerate them (a hashtable or a text being one, as
    /// the shell takes them), a $null among them passed on as null. A parameter that takes one object is bound row by row
    /// from the pipeline, where an array-typed one made the shell wrap every piped row in an array of one (some 0.8 us a
    /// row).
    /// </summary>
    /// <param name="input">The parameter's value.</param>
    /// <param name="one">What to do with each object.</param>
    public static void ForEachGiven(PSObject? input, System.Action<PSObject?> one)
    {
        object? bound = input?.BaseObject;
        if (bound is not null && bound is not string && bound is not System.Collections.IDictionary && LanguagePrimitives.GetEnumerable(bound) is { } several)
        {
            foreach (object? each in several)
            {
                one(each is null ? null : PSObject.AsPSObject(each));
            }
        }
        else
        {
            one(input);
        }
    }

    /// <summary>The error of a row that the pipeline gave as $null (an empty line, a missing object), named by its label and the parameter it came to.</summary>
    public static Errors.RecordException NothingGiven(string label, string parameter = "InputObject") =>
        new(label, new[] { new Errors.FieldError(parameter, "is $null: the pipeline gave nothing for this row (an empty line or a missing object)", "InvalidInput") });

    /// <summary>The named values of a row, read once (they are read by several readers); null for an item object.</summary>
    public static IReadOnlyList<KeyValuePair<string, object?>>? RecordOf(PSObject input) =>
        input.BaseObject is ConductiveItem ? null
            : Records.From(input) is var values && values is KeyValuePair<string, object?>[] read ? read : System.Linq.Enumerable.ToArray(values);

    /// <summary>The item for one input whose record has been read (<see cref="RecordOf"/>).</summary>
    /// <exception cref="Errors.RecordException">The row cannot make an item.</exception>
    public static ConductiveItem ToItem(PSObject input, IReadOnlyList<KeyValuePair<string, object?>>? record, MaterialLibrary materials, int row, IReadOnlyDictionary<string, string>? units, bool acceptUnusualSize) =>
        record is null ? (ConductiveItem)input.BaseObject : ItemRecordReader.Read(record, materials, row, units, acceptUnusualSize);

    /// <summary>The item for one input.</summary>
    /// <exception cref="Errors.RecordException">The row cannot make an item.</exception>
    public static ConductiveItem ToItem(PSObject input, MaterialLibrary materials, int row, IReadOnlyDictionary<string, string>? units = null, bool acceptUnusualSize = false) =>
        ToItem(input, RecordOf(input), materials, row, units, acceptUnusualSize);

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
