using System.Globalization;
using CsvHelper.Configuration;

namespace InductionHazard.Quantities;

/// <summary>How the module reads delimited data files (captures, field maps): CsvHelper, invariant culture, the delimiter detected among comma, semicolon and tab, cells trimmed, rows read without a fixed header.</summary>
internal static class DelimitedText
{
    /// <summary>A fresh configuration for one file.</summary>
    public static CsvConfiguration Configuration() => new(CultureInfo.InvariantCulture)
    {
        HasHeaderRecord = false,
        DetectDelimiter = true,
        DetectDelimiterValues = new[] { ",", ";", "\t" },
        IgnoreBlankLines = true,
        BadDataFound = null,
        MissingFieldFound = null,
        TrimOptions = TrimOptions.Trim,
    };
}
