using System.Collections;
using System.Collections.Generic;
using System.Linq;
using System.Management.Automation;
using System.Management.Automation.Language;
using InductionHazard.Assessment;

namespace InductionHazard.PowerShell.Binding;

/// <summary>Completes -Station with the stations of the site given to -Site (a variable holding the site, already imported).</summary>
public sealed class StationCompleter : IArgumentCompleter
{
    /// <inheritdoc />
    public IEnumerable<CompletionResult> CompleteArgument(string commandName, string parameterName, string wordToComplete, CommandAst commandAst, IDictionary fakeBoundParameters)
    {
        object? site = fakeBoundParameters["Site"];
        if (site is PSObject ps)
        {
            site = ps.BaseObject;
        }

        if (site is not HazardSite hazardSite)
        {
            return Enumerable.Empty<CompletionResult>();
        }

        string typed = wordToComplete.Trim('\'', '"');
        return hazardSite.Stations
            .Where(s => s.Name.StartsWith(typed, System.StringComparison.OrdinalIgnoreCase))
            .Select(s => new CompletionResult("'" + s.Name.Replace("'", "''") + "'", s.Name, CompletionResultType.ParameterValue, s.Description.Length > 0 ? s.Description : s.Source.Describe()));
    }
}
