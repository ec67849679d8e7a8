using System.Collections;
using System.Collections.Generic;
using System.Linq;
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

    /// <summary>A piped row's named values, or null for a point piped as itself (text or a vector).</summary>
    /// <param name="input">The piped object.</param>
    public static IReadOnlyList<KeyValuePair<string, object?>>? RecordOf(PSObject input) =>
        input.BaseObject is string or Vector3D ? null : Records.From(input).ToList();

    /// <summary>The name a survey's row gives its point (a Name, Point or Location column), or null.</summary>
    /// <param name="record">The row's named values, or null.</param>
    public static string? NameOf(IReadOnlyList<KeyValuePair<string, object?>>? record) =>
        record is not null && new RecordFields(record).Text("Name", false, NameAliases) is { Length: > 0 } name ? name : null;

    /// <summary>The point, in metres.</summary>
    /// <param name="input">The piped object.</param>
    /// <param name="label">How the row is named in messages ("row 3").</param>
    /// <param name="unit">The unit of bare numbers in the rows' columns where the headers do not name it (-Unit).</param>
    /// <exception cref="InductionHazardException">The point is malformed, or a row gives none.</exception>
    public static Vector3D Of(PSObject input, string label, Hashtable? unit) => Of(input, RecordOf(input), label, unit);

    /// <summary>The point, in metres, of a piped object whose row has been read.</summary>
    /// <param name="input">The piped object.</param>
    /// <param name="record">Its named values (<see cref="RecordOf"/>).</param>
    /// <param name="label">How the row is named in messages ("row 3").</param>
    /// <param name="unit">The unit of bare numbers in the rows' columns where the headers do not name it (-Unit).</param>
    /// <exception cref="InductionHazardException">The point is malformed, or a row gives none.</exception>
    public static Vector3D Of(PSObject input, IReadOnlyList<KeyValuePair<string, object?>>? record, string label, Hashtable? unit)
    {
        Vector3D? position = record is null
            ? VectorParser.Parse(input.BaseObject, "Position", QuantityKind.Length)
            : PlacementRecordReader.Read(record, label, ItemInput.UnitsOf(unit)).Position;
        return position ?? throw new RecordException(label, new[] { new FieldError("X", "is missing: give the point as X, Y, Z or as one Position column", "InvalidInput") });
    }
}
