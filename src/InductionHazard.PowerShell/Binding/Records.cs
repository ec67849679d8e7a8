using System;
using System.Collections;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Management.Automation;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Presents a pipeline object (a CSV row, a hashtable, any object) as named values for the core's record readers.</summary>
internal static class Records
{
    /// <summary>The named values of a hashtable.</summary>
    public static IEnumerable<KeyValuePair<string, object?>> From(IDictionary dictionary) =>
        dictionary.Keys.Cast<object>().Select(k => new KeyValuePair<string, object?>(Convert.ToString(k, CultureInfo.InvariantCulture) ?? string.Empty, QuantityAttribute.Unwrap(dictionary[k])));

    /// <summary>The named values of any object: a hashtable's entries, else its properties.</summary>
    public static IEnumerable<KeyValuePair<string, object?>> From(PSObject input)
    {
        if (input.BaseObject is IDictionary dictionary)
        {
            return From(dictionary);
        }

        // One pass without LINQ: the shell builds the object's member collection on every enumeration, and this runs for
        // every row; a custom object's own members where they can be trusted (OwnMembers).
        var values = new List<KeyValuePair<string, object?>>();
        if (OwnMembers.TryRead(input, values, static p => QuantityAttribute.Unwrap(SafeValue(p))))
        {
            return values.ToArray();
        }

        foreach (PSPropertyInfo p in input.Properties)
        {
            if (p.IsGettable && p.MemberType is PSMemberTypes.NoteProperty or PSMemberTypes.Property or PSMemberTypes.AliasProperty or PSMemberTypes.ScriptProperty)
            {
                values.Add(new KeyValuePair<string, object?>(p.Name, QuantityAttribute.Unwrap(SafeValue(p))));
            }
        }

        return values.ToArray();
    }

    private static object? SafeValue(PSPropertyInfo property)
    {
        try
        {
            return property.Value;
        }
        catch (GetValueException)
        {
            return null;
        }
    }
}
