using System;
using System.Collections;
using System.Globalization;
using System.Linq;
using InductionHazard.Errors;

namespace InductionHazard.Quantities;

/// <summary>
/// Reads a vector: a <see cref="Vector3D"/>, three numbers (an array or "0,0,1"), an axis name ('z', '+x', '-y'),
/// or for positions three lengths with units ("300 mm, 0, 0"; a bare number is in metres).
/// </summary>
public static class VectorParser
{
    private static readonly char[] Separators = { ',', ';' };
    private static readonly char[] Space = { ' ' };

    /// <summary>Reads a vector whose components are plain numbers, or lengths when <paramref name="kind"/> is given.</summary>
    /// <param name="input">The value.</param>
    /// <param name="field">The parameter or field, for messages.</param>
    /// <param name="kind">The quantity of each component (Length for a position), or null for plain numbers.</param>
    /// <exception cref="InvalidInputException">The value is not three finite components or an axis name.</exception>
    public static Vector3D Parse(object? input, string field, QuantityKind? kind = null)
    {
        switch (input)
        {
            case Vector3D v:
                return Checked(v, field, input);
            case string text:
                Vector3D? axis = AxisNamed(text);
                if (axis is { } a)
                {
                    return a;
                }

                string inner = text.Trim().Trim('(', ')', '[', ']');
                string[] parts = inner.Split(Separators);
                if (parts.Length == 1)
                {
                    parts = inner.Split(Space, StringSplitOptions.RemoveEmptyEntries);
                }

                return FromParts(parts.Cast<object?>().ToArray(), field, kind, input);
            case IEnumerable items:
                return FromParts(items.Cast<object?>().Select(Unwrapped).ToArray(), field, kind, input);
            default:
                throw Invalid(field, input);
        }
    }

    /// <summary>The base object of a wrapper that exposes one (a PowerShell PSObject), found by its BaseObject property.</summary>
    private static object? Unwrapped(object? value) =>
        value?.GetType().GetProperty("BaseObject")?.GetValue(value) ?? value;

    private static Vector3D FromParts(object?[] parts, string field, QuantityKind? kind, object? original)
    {
        if (parts.Length != 3)
        {
            throw Invalid(field, original);
        }

        var numbers = new double[3];
        for (int i = 0; i < 3; i++)
        {
            object? part = parts[i] is string s ? s.Trim() : parts[i];
            if (kind is { } k)
            {
                if (!QuantityParser.TryParse(part, k, out numbers[i], out string? error))
                {
                    throw new InvalidInputException(field, "component " + (i + 1) + ": " + error);
                }
            }
            else if (!TryNumber(part, out numbers[i]))
            {
                throw Invalid(field, original);
            }
        }

        return Checked(new Vector3D(numbers[0], numbers[1], numbers[2]), field, original);
    }

    private static bool TryNumber(object? part, out double value)
    {
        value = double.NaN;
        switch (part)
        {
            case double or float or decimal or int or long or short or byte:
                value = Convert.ToDouble(part, CultureInfo.InvariantCulture);
                return Finite.Is(value);
            case string s:
                return double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && Finite.Is(value);
            default:
                return false;
        }
    }

    private static Vector3D? AxisNamed(string text) => text.Trim().ToLowerInvariant() switch
    {
        "x" or "+x" => Vector3D.UnitX,
        "-x" => -Vector3D.UnitX,
        "y" or "+y" => Vector3D.UnitY,
        "-y" => -Vector3D.UnitY,
        "z" or "+z" => Vector3D.UnitZ,
        "-z" => -Vector3D.UnitZ,
        _ => null,
    };

    private static Vector3D Checked(Vector3D v, string field, object? original) =>
        v.IsFinite ? v : throw Invalid(field, original);

    private static InvalidInputException Invalid(string field, object? original) =>
        new(field, "expected three numbers x,y,z (for example 0,0,1) or an axis ('z', '-x'); got '"
            + (original is IEnumerable e && original is not string ? string.Join(",", e.Cast<object>()) : original) + "'");
}
