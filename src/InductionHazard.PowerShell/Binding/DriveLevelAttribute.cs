using System;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Turns an argument into a <see cref="DriveLevel"/>: a flux density ('3 T', '150 G') or a current ('40 kA');
/// a bare number takes its unit from the source that uses the waveform.
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class DriveLevelAttribute : ArgumentTransformationAttribute
{
    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        object? value = QuantityAttribute.Unwrap(inputData);
        if (value is null or DriveLevel)
        {
            return value;
        }

        try
        {
            (double level, QuantityKind? kind) = QuantityParser.ParseOneOf(value, QuantityKind.MagneticFluxDensity, QuantityKind.ElectricCurrent);
            return new DriveLevel(level, kind switch
            {
                QuantityKind.MagneticFluxDensity => DriveKind.FluxDensity,
                QuantityKind.ElectricCurrent => DriveKind.Current,
                _ => DriveKind.Unspecified,
            });
        }
        catch (QuantityFormatException ex)
        {
            throw new ArgumentTransformationMetadataException(ex.Message, ex);
        }
    }
}
