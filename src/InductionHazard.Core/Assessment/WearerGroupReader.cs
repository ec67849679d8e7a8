using System.Collections.Generic;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// The group an inventory row names for the person who wears or holds its item (its ExposureGroup column): Public for a
/// visitor among workers, judged at the public's limits under any policy; Occupational, or no value, leaves the
/// policy's group.
/// </summary>
public static class WearerGroupReader
{
    /// <summary>The column's name.</summary>
    public const string Field = "ExposureGroup";

    private static readonly string[] AliasArray = { "WearerGroup" };

    /// <summary>Other names the column may have.</summary>
    public static IReadOnlyList<string> Aliases => AliasArray;

    /// <summary>The group the record names, or null where it names none.</summary>
    /// <param name="record">The row's named values.</param>
    /// <param name="label">How the row is named in messages ("row 7 ('Visitor badge')").</param>
    /// <exception cref="RecordException">The value is not one of the groups.</exception>
    public static ExposureGroup? Read(IEnumerable<KeyValuePair<string, object?>> record, string label)
    {
        // Most rows have no such column: a reader of the whole record is made only for one that has it.
        if (!RecordFields.HasColumn(record, Keys))
        {
            return null;
        }

        var fields = new RecordFields(record);
        ExposureGroup? group = fields.Choice<ExposureGroup>(Field, required: false, AliasArray);
        if (fields.Errors.Count > 0)
        {
            throw new RecordException(label, fields.Errors);
        }

        return group;
    }

    private static readonly string[] Keys = { RecordFields.Normalize(Field), RecordFields.Normalize(AliasArray[0]) };
}
