using System.Collections.Generic;
using System.Management.Automation;

namespace InductionHazard.PowerShell.Binding;

/// <summary>A cmdlet's bound parameters as named values for the core's readers, without the common parameters and the named switches.</summary>
internal static class BoundValues
{
    /// <summary>The bound parameters, less the shell's common parameters and the given names; switches as booleans.</summary>
    public static Dictionary<string, object?> Of(InvocationInfo invocation, params string[] leaveOut)
    {
        var skip = new HashSet<string>(Cmdlet.CommonParameters, System.StringComparer.OrdinalIgnoreCase);
        skip.UnionWith(Cmdlet.OptionalCommonParameters);
        skip.UnionWith(leaveOut);
        var values = new Dictionary<string, object?>();
        foreach (KeyValuePair<string, object> pair in invocation.BoundParameters)
        {
            if (!skip.Contains(pair.Key))
            {
                values[pair.Key] = pair.Value is SwitchParameter s ? s.IsPresent : QuantityAttribute.Unwrap(pair.Value);
            }
        }

        return values;
    }
}
