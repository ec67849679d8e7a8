using System.Management.Automation;
using System.Threading.Tasks;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell;

/// <summary>
/// Runs when the module is imported: starts the unit library's set-up (its unit tables take about a second to
/// build on first use) on a background thread, so that a person's first command does not wait for it.
/// </summary>
public sealed class ModuleInitializer : IModuleAssemblyInitializer
{
    /// <inheritdoc />
    public void OnImport() => Task.Run(() => QuantityParser.TryParse("1 mm", QuantityKind.Length, out _, out _));
}
