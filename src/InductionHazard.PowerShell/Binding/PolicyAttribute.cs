using System;
using System.Collections;
using System.Management.Automation;
using InductionHazard.Criteria;
using InductionHazard.Errors;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Turns an argument into a <see cref="HazardPolicy"/>: a policy (from Get-HazardPolicy), the path of a policy file
/// (read as data: no code runs), or a table of policy values (@{ SafetyFactor = 3 }).
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class PolicyAttribute : ArgumentTransformationAttribute
{
    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        object? value = QuantityAttribute.Unwrap(inputData);
        try
        {
            return value switch
            {
                null => null,
                HazardPolicy policy => policy,
                IDictionary table => PolicyReader.Read(table, "the policy table"),
                string path => PolicyFile.Read(engineIntrinsics.SessionState.Path.GetUnresolvedProviderPathFromPSPath(path)),
                _ => throw new ArgumentTransformationMetadataException("expected a policy from Get-HazardPolicy, the path of a policy file or a table of policy values; got a " + value.GetType().Name),
            };
        }
        catch (InductionHazardException ex)
        {
            throw new ArgumentTransformationMetadataException(ex.Message, ex);
        }
    }
}

/// <summary>Reads a policy file: a PowerShell data file, read as data.</summary>
internal static class PolicyFile
{
    /// <summary>The policy a file holds.</summary>
    /// <exception cref="DataFileException">The file is missing, holds code, or a key or value is wrong.</exception>
    public static HazardPolicy Read(string path) => PolicyReader.Read(DataFile.Read(path, PolicyReader.ErrorId), path);
}
