using System.Collections.Generic;

namespace InductionHazard.Errors;

/// <summary>A material name that is neither built in nor among the materials supplied.</summary>
public sealed class UnknownMaterialException : InductionHazardException
{
    /// <summary>Creates the exception.</summary>
    public UnknownMaterialException(string name, IReadOnlyList<string> knownNames)
        : base("unknown material '" + name + "'; known materials: " + string.Join(", ", knownNames)
            + " (or define one from a hashtable: see Get-ConductorMaterial -Definition)")
    {
        Name = name;
        KnownNames = knownNames;
    }

    /// <summary>The name as given.</summary>
    public string Name { get; }

    /// <summary>The names that would have been recognised.</summary>
    public IReadOnlyList<string> KnownNames { get; }

    /// <inheritdoc />
    public override string ErrorId => "UnknownMaterial";
}
