using System;
using System.Collections;
using System.Linq;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Turns an argument into a <see cref="ConductorMaterial"/>: a built-in name ('Copper', 'SS304'), a hashtable
/// defining a material, or a material object. Arrays are transformed element by element.
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class MaterialAttribute : ArgumentTransformationAttribute
{
    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        object? value = QuantityAttribute.Unwrap(inputData);
        if (value is object[] array)
        {
            return array.Select(One).ToArray();
        }

        return One(value);
    }

    private static ConductorMaterial? One(object? input)
    {
        object? value = QuantityAttribute.Unwrap(input);
        try
        {
            return value switch
            {
                null => null,
                ConductorMaterial material => material,
                IDictionary definition => MaterialLibrary.Define(Records.From(definition)),
                string name => MaterialLibrary.BuiltIn.Find(name),
                _ => throw new ArgumentTransformationMetadataException("expected a material name, a hashtable defining a material, or a material; got a " + value.GetType().Name),
            };
        }
        catch (InductionHazardException ex)
        {
            throw new ArgumentTransformationMetadataException(ex.Message, ex);
        }
    }
}
