using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// Reads where an item sits and how it is moved from a data record: its position as X, Y, Z or one Position column
/// ('0.3 m, 0, 1.2 m'), lengths; its normal as NormalX, NormalY, NormalZ or one Normal column ('0, 0, 1', 'z'), a
/// direction, or instead a Tilt ('30 deg') from the orientation that links the largest flux change; its velocity as
/// VelocityX, VelocityY, VelocityZ or one Velocity column ('0, 0, -1.5 m/s'), speeds. A bare
/// number in a text cell needs the unit in its column's name or the -Unit table, as for the item's sizes. A record
/// that gives none of a vector leaves it to the command's parameters; a velocity of zero says the item is placed,
/// not moved.
/// </summary>
public static class PlacementRecordReader
{
    private static readonly string[] Position = { "X", "Y", "Z" };
    private static readonly string[] Normal = { "NormalX", "NormalY", "NormalZ" };
    private static readonly string[] Velocity = { "VelocityX", "VelocityY", "VelocityZ" };

    /// <summary>The aliases each field accepts.</summary>
    public static IReadOnlyDictionary<string, string[]> Aliases { get; } = new Dictionary<string, string[]>
    {
        ["X"] = new[] { "PositionX", "PosX" },
        ["Y"] = new[] { "PositionY", "PosY" },
        ["Z"] = new[] { "PositionZ", "PosZ" },
        ["Position"] = Array.Empty<string>(),
        ["NormalX"] = new[] { "NX" },
        ["NormalY"] = new[] { "NY" },
        ["NormalZ"] = new[] { "NZ" },
        ["Normal"] = Array.Empty<string>(),
        ["VelocityX"] = new[] { "VelX" },
        ["VelocityY"] = new[] { "VelY" },
        ["VelocityZ"] = new[] { "VelZ" },
        ["Velocity"] = Array.Empty<string>(),
        ["Tilt"] = Array.Empty<string>(),
    };

    /// <summary>Every field's key and its aliases', normalized: most rows give none of them, and are not read further.</summary>
    private static readonly HashSet<string> Keys = new(Aliases.SelectMany(p => p.Value.Append(p.Key)).Select(RecordFields.Normalize), StringComparer.Ordinal);

    /// <summary>
    /// A record's Tilt, with the errors it has recorded on the fields: outside 0 to 90 degrees, or given beside a normal
    /// (a row's, a site file station's).
    /// </summary>
    /// <param name="fields">The record's fields.</param>
    /// <param name="normalGiven">Whether the record gives a normal too.</param>
    /// <param name="normalNames">How the record names its normal, for the message.</param>
    internal static double? Tilt(RecordFields fields, bool normalGiven, string normalNames)
    {
        double? tilt = fields.Quantity("Tilt", QuantityKind.Angle, required: false, NoAliases);
        if (tilt is { } t && PhysicalRanges.Tilt.Problem(t) is { } problem)
        {
            fields.AddError("Tilt", problem);
        }
        else if (tilt is not null && normalGiven)
        {
            fields.AddError("Tilt", "give a normal (" + normalNames + ") or a tilt from the worst orientation, not both");
        }

        return tilt;
    }

    /// <summary>The position, normal, velocity and tilt a record gives, each null when the record gives none of it.</summary>
    /// <exception cref="RecordException">Some but not all components are given, a vector is given both ways, one is malformed, the normal is zero, the speed is beyond what a person moves an item at, or a tilt is given with a normal or outside 0 to 90 degrees.</exception>
    public static (Vector3D? Position, Vector3D? Normal, Vector3D? Velocity, double? TiltDegrees) Read(IEnumerable<KeyValuePair<string, object?>> record, string label, IReadOnlyDictionary<string, string>? units = null)
    {
        // A row without a placement column (most of an inventory read at a station or one -Position) makes no reader.
        if (!RecordFields.HasColumn(record, Keys))
        {
            return (null, null, null, null);
        }

        var fields = new RecordFields(record, units);
        Vector3D? position = Vector(fields, "Position", Position, QuantityKind.Length);
        Vector3D? normal = Vector(fields, "Normal", Normal, null);
        Vector3D? velocity = Vector(fields, "Velocity", Velocity, QuantityKind.Speed);
        double? tilt = Tilt(fields, normal is not null || fields.Has("Normal") || fields.Has("NormalX", Aliases["NormalX"]), "Normal or NormalX, NormalY, NormalZ");
        if (normal is { } n && (n.X == 0 && n.Y == 0 && n.Z == 0))
        {
            fields.AddError(fields.Has("Normal") ? "Normal" : "NormalX", "the normal must not be zero");
        }

        if (velocity is { } v && PhysicalRanges.Speed.Problem(v.Length) is { } tooFast)
        {
            fields.AddError(fields.Has("Velocity") ? "Velocity" : "VelocityX", "the speed " + tooFast);
        }

        if (fields.Errors.Count > 0)
        {
            throw new RecordException(label, fields.Errors);
        }

        return (position, normal, velocity, tilt);
    }

    private static readonly string[] NoAliases = Array.Empty<string>();

    private static Vector3D? Vector(RecordFields fields, string whole, string[] names, QuantityKind? kind)
    {
        bool any = false, all = true;
        foreach (string name in names)
        {
            bool has = fields.Has(name, Aliases[name]);
            any |= has;
            all &= has;
        }

        if (fields.Has(whole))
        {
            if (any)
            {
                fields.AddError(whole, "give " + whole + " or " + string.Join(", ", names) + ", not both");
                return null;
            }

            return fields.Vector(whole, kind);
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
