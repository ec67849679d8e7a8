using System.Collections.Generic;
using System.Management.Automation;
using System.Threading.Tasks;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.PowerShell;

/// <summary>
/// Runs when the module is imported: starts, on two background threads, the unit library's set-up (its unit tables
/// take a third of a second or more to build on first use) and one assessment of a ring in a sinusoidal field given
/// in SI units (so that the engine's code is compiled), so that a person's or a script's first command waits for
/// neither.
/// </summary>
public sealed class ModuleInitializer : IModuleAssemblyInitializer
{
    /// <inheritdoc />
    public void OnImport()
    {
        Task.Run(() => QuantityParser.TryParse("1 mm", QuantityKind.Length, out _, out _));
        Task.Run(WarmUp);
    }

    /// <summary>One assessment whose result is dropped; any failure is left for the first real command to meet and report.</summary>
    private static void WarmUp()
    {
        try
        {
            ConductiveItem ring = ItemRecordReader.Read(
                new Dictionary<string, object?> { ["Name"] = "warm-up", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002 },
                MaterialLibrary.BuiltIn);
            FieldSource sine = FieldSource.Uniform("warm-up", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
            _ = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(ring, sine)), HazardPolicy.Default);
        }
        catch (InductionHazardException)
        {
        }
    }
}
