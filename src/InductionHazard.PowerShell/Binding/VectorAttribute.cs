using System;
using System.Collections;
using System.Globalization;
using System.Linq;
using System.Management.Automation;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Turns an argument into a <see cref="Vector3D"/>: three numbers (0,0,1 or @(0,0,1)), a string "0,0,1", or an
/// axis name ('z', '+x', '-y').
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class VectorAttribute : ArgumentTransformationAttribute
{
    private static readonly char[] Separators = { ',', ' ', ';' };

    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        object? value = QuantityAttribute.Unwrap(inputData);
        switch (value)
        {
            case null:
            case Vector3D:
                return value;
            case string text:
                return Parse(text);
            case IEnumerable items:
                double[] numbers = items.Cast<object?>().Select(o => Number(QuantityAttribute.Unwrap(o))).ToArray();
                return FromNumbers(numbers, value);
            default:
                throw Invalid(value);
        }
    }

    private static Vector3D Parse(string text)
    {
        string t = text.Trim().ToLowerInvariant();
        switch (t)
        {
            case "x" or "+x": return Vector3D.UnitX;
            case "-x": return -Vector3D.UnitX;
            case "y" or "+y": return Vector3D.UnitY;
            case "-y": return -Vector3D.UnitY;
            case "z" or "+z": return Vector3D.UnitZ;
            case "-z": return -Vector3D.UnitZ;
        }

        string[] parts = t.Trim('(', ')', '[', ']').Split(Separators, StringSplitOptions.RemoveEmptyEntries);
        return FromNumbers(parts.Select(p => Number(p)).ToArray(), text);
    }

    private static Vector3D FromNumbers(double[] numbers, object original)
    {
        if (numbers.Length != 3 || numbers.Any(double.IsNaN))
        {
            throw Invalid(original);
        }

        return new Vector3D(numbers[0], numbers[1], numbers[2]);
    }

    private static double Number(object? value) => value switch
    {
        double d => d,
        int i => i,
        long l => l,
        float f => f,
        decimal m => (double)m,
        string s when double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double parsed) => parsed,
        _ => double.NaN,
    };

    private static ArgumentTransformationMetadataException Invalid(object original) =>
        new("expected a direction as three numbers x,y,z (for example 0,0,1) or an axis ('z', '-x'); got '"
            + (original is IEnumerable e && original is not string ? string.Join(",", e.Cast<object>()) : original) + "'");
}
