using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Columns named like a parameter that a row does not give per row (Policy, Source): such a column is kept as one of
/// the inventory's own, and would read in a report as if it had been applied. Each is named in a warning once a run,
/// with what the rows are assessed by instead.
/// </summary>
internal sealed class UnreadColumns
{
    private static readonly Dictionary<string, string> Hints = new()
    {
        [RecordFields.Normalize("Policy")] = "every row is judged by -Policy or its station's; an ExposureGroup column names a visitor among workers",
        [RecordFields.Normalize("Source")] = "every row is in -Source or its station's field; with -Site a Station column names the row's station",
    };

    private readonly HashSet<string> _warned = new(System.StringComparer.Ordinal);

    // The column names of the last row looked at: the rows of one file share their header's names, so a row whose
    // names are those very strings has nothing new to say (some 0.25 us a row saved over looking at each name again).
    private string?[] _lastColumns = System.Array.Empty<string?>();

    /// <summary>The warning for each column of the record that is named like a parameter not read per row, the first time it is seen; null when there is none.</summary>
    /// <param name="record">The row's named values.</param>
    public List<string>? NewIn(IReadOnlyList<KeyValuePair<string, object?>> record)
    {
        if (SameColumns(record))
        {
            return null;
        }

        var columns = new string?[record.Count];
        List<string>? warnings = null;
        for (int i = 0; i < record.Count; i++)
        {
            string? column = columns[i] = record[i].Key;
            if (string.IsNullOrWhiteSpace(column))
            {
                continue;
            }

            string key = RecordFields.FieldKey(column);
            if (Hints.TryGetValue(key, out string? hint) && _warned.Add(key))
            {
                (warnings ??= new()).Add("The column '" + column.Trim() + "' is not read per row: it is kept as one of the inventory's own columns, and " + hint + ".");
            }
        }

        _lastColumns = columns;
        return warnings;
    }

    private bool SameColumns(IReadOnlyList<KeyValuePair<string, object?>> record)
    {
        if (record.Count != _lastColumns.Length)
        {
            return false;
        }

        for (int i = 0; i < record.Count; i++)
        {
            if (!ReferenceEquals(record[i].Key, _lastColumns[i]))
            {
                return false;
            }
        }

        return true;
    }
}
