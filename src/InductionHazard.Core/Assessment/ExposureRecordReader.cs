using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// The times and surroundings an inventory row gives for its own item, over the run's: ExposureTime, how long the
/// item stays in the field (a cleaner's ring for 5 min beside a technician's for 8 h), and LeaveTime, how long
/// carrying it out takes, each from 0.1 s to 8 h; AmbientTemperature, the air around it (a furnace hall's warmer
/// air), from -50 to 60 °C. Each with its unit, as every spreadsheet value is ("10 min", "35 degC"; a bare number
/// takes the unit its column or the -Unit table names, or is refused).
/// </summary>
public static class ExposureRecordReader
{
    /// <summary>The columns, each by its name (and no other).</summary>
    public static IReadOnlyList<string> Fields { get; } = new[] { "ExposureTime", "LeaveTime", "AmbientTemperature" };

    private static readonly string[] NoAliases = Array.Empty<string>();
    private static readonly string[] Keys = { RecordFields.Normalize("ExposureTime"), RecordFields.Normalize("LeaveTime"), RecordFields.Normalize("AmbientTemperature") };

    /// <summary>The exposure and leave times the record gives, s, and its air temperature, °C, each null where it gives none.</summary>
    /// <param name="record">The row's named values.</param>
    /// <param name="label">How the row is named in messages.</param>
    /// <param name="units">The unit of each field's bare numbers where the column names do not say (a -Unit table).</param>
    /// <exception cref="RecordException">A value is malformed, has no unit, or is out of its range.</exception>
    public static (double? ExposureSeconds, double? LeaveSeconds, double? AmbientCelsius) Read(IEnumerable<KeyValuePair<string, object?>> record, string label, IReadOnlyDictionary<string, string>? units = null)
    {
        // Most rows have neither column: a reader of the whole record is made only for one that has one.
        if (!RecordFields.HasColumn(record, Keys))
        {
            return (null, null, null);
        }

        var fields = new RecordFields(record, units);
        double? exposure = fields.Quantity("ExposureTime", QuantityKind.Time, required: false, NoAliases);
        double? leave = fields.Quantity("LeaveTime", QuantityKind.Time, required: false, NoAliases);
        double? ambient = fields.Quantity("AmbientTemperature", QuantityKind.Temperature, required: false, NoAliases);
        if (exposure is { } e && PhysicalRanges.ExposureTime.Problem(e) is { } exposureProblem)
        {
            fields.AddError("ExposureTime", exposureProblem);
        }

        if (leave is { } l && PhysicalRanges.ExposureTime.For("LeaveTime").Problem(l) is { } leaveProblem)
        {
            fields.AddError("LeaveTime", leaveProblem);
        }

        if (ambient is { } air && PhysicalRanges.Ambient.Problem(air) is { } airProblem)
        {
            fields.AddError("AmbientTemperature", airProblem);
        }

        if (fields.Errors.Count > 0)
        {
            throw new RecordException(label, fields.Errors);
        }

        return (exposure, leave, ambient);
    }
}
