using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// Reads where an item sits from a data record: X, Y, Z (lengths such as '300 mm'; a bare number in a text cell
/// needs the unit in its column's name or the -Unit table, as for the item's sizes)
/// and NormalX, NormalY, NormalZ (a direction). A record that gives none leaves the placement to the command's
/// parameters.
/// </summary>
public static class PlacementRecordReader
{
    private static readonly string[] Position = { "X", "Y", "Z" };
    private static readonly string[] Normal = { "NormalX", "NormalY", "NormalZ" };

    /// <summary>The aliases each field accepts.</summary>
    public static IReadOnlyDictionary<string, string[]> Aliases { get; } = new Dictionary<string, string[]>
    {
        ["X"] = new[] { "PositionX", "PosX" },
        ["Y"] = new[] { "PositionY", "PosY" },
        ["Z"] = new[] { "PositionZ", "PosZ" },
        ["NormalX"] = new[] { "NX" },
        ["NormalY"] = new[] { "NY" },
        ["NormalZ"] = new[] { "NZ" },
    };

    /// <summary>The position and normal a record gives, each null when the record gives none of its components.</summary>
    /// <exception cref="RecordException">Some but not all components are given, or one is malformed.</exception>
    public static (Vector3D? Position, Vector3D? Normal) Read(IEnumerable<KeyValuePair<string, object?>> record, string label, IReadOnlyDictionary<string, string>? units = null)
    {
        var fields = new RecordFields(record, units);
        Vector3D? position = Vector(fields, Position, QuantityKind.Length);
        Vector3D? normal = Vector(fields, Normal, null);
        if (normal is { } n && (n.X == 0 && n.Y == 0 && n.Z == 0))
        {
            fields.AddError("NormalX", "the normal NormalX, NormalY, NormalZ must not be zero");
        }

        if (fields.Errors.Count > 0)
        {
            throw new RecordException(label, fields.Errors);
        }

        return (position, normal);
    }

    private static Vector3D? Vector(RecordFields fields, string[] names, QuantityKind? kind)
    {
        bool any = false, all = true;
        foreach (string name in names)
        {
            bool has = fields.Has(name, Aliases[name]);
            any |= has;
            all &= has;
        }

        if (!any)
        {
            return null;
        }

        if (!all)
        {
            fields.AddError(names[0], "give all of " + string.Join(", ", names) + ", or none");
            return null;
        }

        var c = new double?[3];
        for (int i = 0; i < 3; i++)
        {
            c[i] = kind is { } k ? fields.Quantity(names[i], k, required: true, Aliases[names[i]]) : fields.Number(names[i], required: true, Aliases[names[i]]);
        }

        return c[0] is { } x && c[1] is { } y && c[2] is { } z ? new Vector3D(x, y, z) : null;
    }
}
