using System.Collections;
using System.Linq;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Items;
using InductionHazard.PowerShell.Binding;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Get-ConductorMaterial: the built-in materials with each value's source, or a material defined from a hashtable.</summary>
[Cmdlet(VerbsCommon.Get, "ConductorMaterial", DefaultParameterSetName = NameSet)]
[OutputType(typeof(ConductorMaterial))]
public sealed class GetConductorMaterialCommand : PSCmdlet
{
    private const string NameSet = "Name";
    private const string DefinitionSet = "Definition";

    /// <summary>Names or aliases to get (wildcards allowed); all materials when omitted.</summary>
    [Parameter(Position = 0, ValueFromPipeline = true, ParameterSetName = NameSet)]
    [ArgumentCompleter(typeof(MaterialCompleter))]
    [SupportsWildcards]
    public string[]? Name { get; set; }

    /// <summary>
    /// A hashtable defining a material: Name, Resistivity, Density, SpecificHeat, MeltingTemperature (required);
    /// TemperatureCoefficient, ThermalConductivity, RelativePermeability, LatentHeat, Source (optional). Values may carry units.
    /// </summary>
    [Parameter(Mandatory = true, ValueFromPipeline = true, ParameterSetName = DefinitionSet)]
    public Hashtable[] Definition { get; set; } = null!;

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        if (ParameterSetName == DefinitionSet)
        {
            foreach (Hashtable definition in Definition)
            {
                try
                {
                    WriteObject(MaterialLibrary.Define(Records.From((IDictionary)definition)));
                }
                catch (InductionHazardException ex)
                {
                    WriteError(ErrorRecords.From(ex, definition));
                }
            }

            return;
        }

        if (Name is null || Name.Length == 0)
        {
            WriteObject(MaterialLibrary.BuiltIn.Materials, enumerateCollection: true);
            return;
        }

        foreach (string name in Name)
        {
            if (WildcardPattern.ContainsWildcardCharacters(name))
            {
                var pattern = new WildcardPattern(name, WildcardOptions.IgnoreCase);
                WriteObject(MaterialLibrary.BuiltIn.Materials.Where(m => pattern.IsMatch(m.Name) || m.Aliases.Any(pattern.IsMatch)), enumerateCollection: true);
                continue;
            }

            try
            {
                WriteObject(MaterialLibrary.BuiltIn.Find(name));
            }
            catch (UnknownMaterialException ex)
            {
                WriteError(ErrorRecords.From(ex, name));
            }
        }
    }
}
