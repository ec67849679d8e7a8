using System;
using System.Collections.Generic;
using System.Management.Automation;
using System.Reflection;
using System.Threading;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// The properties of a custom object (an Import-Csv row, a [pscustomobject]) read from the members the object holds
/// itself, in their order, rather than through the shell's public property collection, which is built afresh on every
/// enumeration with the members its type names add (some 5 us against 0.2 for five columns; a tenth to a sixth of a
/// row's time in an audit's pipeline). The shell offers the object's own members only internally, so they are read through reflection, and
/// trusted for a list of type names only once the public collection of an object with those names gave the same
/// properties in the same order: the members the type names add (extended type data) are the same for every object
/// with those names, so an object whose names add a property is read through the public collection, as is any object
/// where the shell has no such members.
/// </summary>
internal static class OwnMembers
{
    /// <summary>How many lists of type names are remembered, trusted or not; beyond, an object is checked each time.</summary>
    private const int Remembered = 64;

    private static readonly Func<PSObject, object>? Reader = MakeReader();
    private static readonly object Gate = new();
    private static string[][] s_trusted = Array.Empty<string[]>();
    private static string[][] s_refused = Array.Empty<string[]>();

    /// <summary>
    /// Adds the object's gettable properties (note, code, alias and script properties, as the public collection
    /// gives them) to <paramref name="values"/> and returns true; false, adding nothing, where they must be read
    /// through the public collection.
    /// </summary>
    public static bool TryRead(PSObject input, List<KeyValuePair<string, object?>> values, Func<PSPropertyInfo, object?> value)
    {
        if (Reader is null || input.BaseObject is not PSCustomObject)
        {
            return false;
        }

        IList<string> typeNames = input.TypeNames;
        if (Find(Volatile.Read(ref s_refused), typeNames))
        {
            return false;
        }

        if (Reader(input) is not IEnumerable<PSMemberInfo> own)
        {
            return false;
        }

        if (!Find(Volatile.Read(ref s_trusted), typeNames))
        {
            bool same = SameProperties(Taken(input.Properties), Taken(own));
            Remember(typeNames, same);
            if (!same)
            {
                return false;
            }
        }

        foreach (PSMemberInfo member in own)
        {
            if (Taken(member) is { } property)
            {
                values.Add(new KeyValuePair<string, object?>(property.Name, value(property)));
            }
        }

        return true;
    }

    /// <summary>A member that is read as a column: a gettable property of the kinds rows carry, as the public collection takes them.</summary>
    private static PSPropertyInfo? Taken(PSMemberInfo member) =>
        member is PSPropertyInfo p && p.IsGettable && p.MemberType is PSMemberTypes.NoteProperty or PSMemberTypes.Property or PSMemberTypes.AliasProperty or PSMemberTypes.ScriptProperty
            ? p : null;

    private static List<string> Taken<T>(IEnumerable<T> members)
        where T : PSMemberInfo
    {
        var names = new List<string>();
        foreach (T member in members)
        {
            if (Taken(member) is { } property)
            {
                names.Add(property.Name);
            }
        }

        return names;
    }

    private static bool SameProperties(List<string> shown, List<string> own)
    {
        if (shown.Count != own.Count)
        {
            return false;
        }

        for (int i = 0; i < shown.Count; i++)
        {
            if (!string.Equals(shown[i], own[i], StringComparison.Ordinal))
            {
                return false;
            }
        }

        return true;
    }

    private static bool Find(string[][] known, IList<string> typeNames)
    {
        foreach (string[] names in known)
        {
            if (names.Length != typeNames.Count)
            {
                continue;
            }

            int i = 0;
            while (i < names.Length && string.Equals(names[i], typeNames[i], StringComparison.Ordinal))
            {
                i++;
            }

            if (i == names.Length)
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Adds the type names to the trusted or refused lists, each replaced whole so that any thread may read it.</summary>
    private static void Remember(IList<string> typeNames, bool trusted)
    {
        lock (Gate)
        {
            ref string[][] list = ref trusted ? ref s_trusted : ref s_refused;
            if (list.Length >= Remembered || Find(list, typeNames))
            {
                return;
            }

            var names = new string[typeNames.Count];
            typeNames.CopyTo(names, 0);
            var grown = new string[list.Length + 1][];
            Array.Copy(list, grown, list.Length);
            grown[list.Length] = names;
            Volatile.Write(ref list, grown);
        }
    }

    /// <summary>The getter of the shell's internal PSObject.InstanceMembers; null if this shell has none.</summary>
    private static Func<PSObject, object>? MakeReader()
    {
        try
        {
            MethodInfo? getter = typeof(PSObject).GetProperty("InstanceMembers", BindingFlags.NonPublic | BindingFlags.Instance)?.GetGetMethod(nonPublic: true);
            return getter is null || !typeof(IEnumerable<PSMemberInfo>).IsAssignableFrom(getter.ReturnType)
                ? null
                : (Func<PSObject, object>)Delegate.CreateDelegate(typeof(Func<PSObject, object>), getter);
        }
        catch (Exception ex) when (ex is ArgumentException or MemberAccessException or AmbiguousMatchException)
        {
            return null;
        }
    }
}
