using System;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Turns an argument into a <see cref="Vector3D"/>: three numbers (0,0,1 or @(0,0,1)), a string "0,0,1", or an
/// axis name ('z', '+x', '-y'); for a position, three lengths with units ('300 mm, 0, 0'; bare numbers in metres).
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class VectorAttribute : ArgumentTransformationAttribute
{
    /// <summary>A direction: plain numbers.</summary>
    public VectorAttribute()
    {
    }

    /// <summary>A vector whose components are quantities of a kind (Length for a position).</summary>
    public VectorAttribute(QuantityKind componentKind)
    {
        ComponentKind = componentKind;
    }

    /// <summary>The quantity of each component, or null for plain numbers.</summary>
    public QuantityKind? ComponentKind { get; }

    /// <summary>True for a parameter that takes several vectors: each element of an array is then one vector, unless the array is three plain numbers.</summary>
    public bool Many { get; set; }

    private static readonly char[] Separators = { ',', ';' };

    private static object? Unwrap(object? o) => QuantityAttribute.Unwrap(o);

    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        object? value = QuantityAttribute.Unwrap(inputData);
        if (value is null)
        {
            return null;
        }

        try
        {
            if (Many && value is System.Collections.IEnumerable items && value is not string)
            {
                object?[] elements = System.Linq.Enumerable.ToArray(System.Linq.Enumerable.Select(System.Linq.Enumerable.Cast<object?>(items), Unwrap));
                bool oneVector = elements.Length == 3 && System.Linq.Enumerable.All(elements, e => e is not string s || s.IndexOfAny(Separators) < 0) && System.Linq.Enumerable.All(elements, e => e is not Vector3D and not System.Collections.IEnumerable || e is string);
                return oneVector
                    ? new[] { VectorParser.Parse(elements, "vector", ComponentKind) }
                    : System.Linq.Enumerable.ToArray(System.Linq.Enumerable.Select(elements, e => VectorParser.Parse(e, "vector", ComponentKind)));
            }

            return VectorParser.Parse(value, "vector", ComponentKind);
        }
        catch (InvalidInputException ex)
        {
            throw new ArgumentTransformationMetadataException(ex.Reason, ex);
        }
    }
}
