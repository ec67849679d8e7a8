using System;
using System.Collections;
using System.Collections.Generic;
using System.Linq;
using System.Management.Automation;
using System.Management.Automation.Language;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Completes material names from the built-in table.</summary>
public sealed class MaterialCompleter : IArgumentCompleter
{
    /// <inheritdoc />
    public IEnumerable<CompletionResult> CompleteArgument(string commandName, string parameterName, string wordToComplete, CommandAst commandAst, IDictionary fakeBoundParameters)
    {
        string typed = (wordToComplete ?? string.Empty).Trim('\'', '"');
        foreach (ConductorMaterial material in MaterialLibrary.BuiltIn.Materials.Where(m => m.Name.StartsWith(typed, StringComparison.OrdinalIgnoreCase)))
        {
            string text = material.Name.IndexOf(' ') >= 0 ? "'" + material.Name + "'" : material.Name;
            yield return new CompletionResult(text, material.Name, CompletionResultType.ParameterValue, material.Name + ": rho20 " + material.ResistivityOhmMeters.ToString("G4", System.Globalization.CultureInfo.InvariantCulture) + " ohm m");
        }
    }
}
