using System;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Turns a parameter's argument into a number in the quantity's canonical unit: numbers pass through, strings
/// with units are parsed ('20 mm', '3 T', '10 us'). A wrong dimension is an error that says what was expected.
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class QuantityAttribute : ArgumentTransformationAttribute
{
    /// <summary>Creates the transformation for a kind of quantity.</summary>
    public QuantityAttribute(QuantityKind kind)
    {
        Kind = kind;
    }

    /// <summary>The kind of quantity the parameter expects.</summary>
    public QuantityKind Kind { get; }

    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        object? value = Unwrap(inputData);
        if (value is null)
        {
            return null;
        }

        try
        {
            return QuantityParser.Parse(value, Kind);
        }
        catch (QuantityFormatException ex)
        {
            throw new ArgumentTransformationMetadataException(ex.Message, ex);
        }
    }

    /// <summary>The base object of a PSObject.</summary>
    internal static object? Unwrap(object? input) => input is PSObject ps ? ps.BaseObject : input;
}
