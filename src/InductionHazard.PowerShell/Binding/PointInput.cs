using System.Collections;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// The point a piped input gives to the commands that judge the field at points (Get-FieldStrength,
/// Test-FieldExposure): a point itself ('0, 300 mm, 0' or a vector), or a row's X, Y, Z or Position column.
/// </summary>
internal static class PointInput
{
    private static readonly string[] NameAliases = { "Point", "Location" };

    /// <summary>The name a survey's row gives its point (a Name, Point or Location column), or null.</summary>
    /// <param name="input">The piped object.</param>
    public static string? NameOf(PSObject input) =>
        input.BaseObject is string or Vector3D ? null
        : new RecordFields(Records.From(input)).Text("Name", false, NameAliases) is { Length: > 0 } name ? name : null;

    /// <summary>The point, in metres.</summary>
    /// <param name="input">The piped object.</param>
    /// <param name="label">How the row is named in messages ("row 3").</param>
    /// <param name="unit">The unit of bare numbers in the rows' columns where the headers do not name it (-Unit).</param>
    /// <exception cref="InductionHazardException">The point is malformed, or a row gives none.</exception>
    public static Vector3D Of(PSObject input, string label, Hashtable? unit)
    {
        Vector3D? position = input.BaseObject is string or Vector3D
            ? VectorParser.Parse(input.BaseObject, "Position", QuantityKind.Length)
            : PlacementRecordReader.Read(Records.From(input), label, ItemInput.UnitsOf(unit)).Position;
        return position ?? throw new RecordException(label, new[] { new FieldError("X", "is missing: give the point as X, Y, Z or as one Position column", "InvalidInput") });
    }
}
