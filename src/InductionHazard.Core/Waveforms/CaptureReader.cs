using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using CsvHelper;
using CsvHelper.Configuration;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// Reads a sampled drive (an oscilloscope or logger export) from a delimited text file into a piecewise-linear
/// waveform: by default the first column is the time in seconds and the second the value. Lines before the first
/// numeric row (a scope's metadata and the header) are skipped; the header names the columns. Streams the file,
/// holding only the samples (two doubles each).
/// </summary>
public static class CaptureReader
{
    /// <summary>The error id of a capture that cannot be read.</summary>
    public const string ErrorId = "InvalidCapture";

    /// <summary>Reads the capture.</summary>
    /// <param name="path">The file.</param>
    /// <param name="timeColumn">The time column: a header name or a 1-based number; null for the first.</param>
    /// <param name="valueColumn">The value column: a header name or a 1-based number; null for the second.</param>
    /// <param name="valueScale">What one unit of the value column is in SI (1e-3 for mT, 1e3 for kA).</param>
    /// <param name="drive">What the values measure.</param>
    /// <param name="unitText">The unit of the values as given, for the description.</param>
    /// <exception cref="DataFileException">The file is missing, empty, or a line holds a bad time or value.</exception>
    public static PiecewiseLinearWaveform Read(string path, string? timeColumn, string? valueColumn, double valueScale, DriveKind drive, string unitText)
    {
        if (!File.Exists(path))
        {
            throw new DataFileException(path, null, "the file does not exist", ErrorId);
        }

        var times = new List<double>(1024);
        var values = new List<double>(1024);
        CsvConfiguration config = DelimitedText.Configuration();
        using var reader = new StreamReader(path);
        using var parser = new CsvParser(reader, config);
        string[]? header = null;
        int timeIndex = -1, valueIndex = -1;
        while (parser.Read())
        {
            int line = parser.RawRow;
            string[] cells = parser.Record ?? Array.Empty<string>();
            if (timeIndex < 0)
            {
                int t = Index(timeColumn, header, 0), v = Index(valueColumn, header, 1);
                if (t < cells.Length && v < cells.Length && t >= 0 && v >= 0 && IsNumber(cells[t]) && IsNumber(cells[v]))
                {
                    timeIndex = t;
                    valueIndex = v;
                }
                else
                {
                    header = cells;
                    continue;
                }
            }

            double time = Cell(path, line, cells, timeIndex, "time");
            double value = Cell(path, line, cells, valueIndex, "value") * valueScale;
            if (!Finite.Is(value))
            {
                throw new DataFileException(path, line, "the value is too large to be finite in SI", ErrorId);
            }

            if (times.Count > 0 && !(time > times[times.Count - 1]))
            {
                throw new DataFileException(path, line, "times must be strictly increasing: " + Show(time) + " s follows " + Show(times[times.Count - 1]) + " s", ErrorId);
            }

            times.Add(time);
            values.Add(value);
        }

        if (timeIndex < 0)
        {
            string wanted = (timeColumn ?? "1") + " and " + (valueColumn ?? "2");
            throw new DataFileException(path, null, "no row has numbers in the columns " + wanted + (header is null ? string.Empty : " (the last header read: " + string.Join(", ", header) + ")"), ErrorId);
        }

        if (times.Count < 2)
        {
            throw new DataFileException(path, null, "a capture needs at least two samples; found " + times.Count, ErrorId);
        }

        try
        {
            return new PiecewiseLinearWaveform(
                "Samples",
                times,
                values,
                drive,
                "capture " + Path.GetFileName(path) + ": " + times.Count.ToString("N0", CultureInfo.InvariantCulture) + " samples from " + SiFormat.Format(times[0], "s")
                + " to " + SiFormat.Format(times[times.Count - 1], "s") + (unitText.Length > 0 ? ", values in " + unitText : string.Empty));
        }
        catch (InvalidInputException ex)
        {
            throw new DataFileException(path, null, ex.Reason, ErrorId);
        }
    }

    private static int Index(string? column, string[]? header, int fallback)
    {
        if (column is null)
        {
            return fallback;
        }

        if (int.TryParse(column, NumberStyles.Integer, CultureInfo.InvariantCulture, out int number))
        {
            return number - 1;
        }

        if (header is null)
        {
            return -1;
        }

        string wanted = RecordFields.Normalize(column);
        for (int k = 0; k < header.Length; k++)
        {
            if (RecordFields.Normalize(header[k]) == wanted)
            {
                return k;
            }
        }

        return -1;
    }

    private static bool IsNumber(string cell) => double.TryParse(cell, NumberStyles.Float, CultureInfo.InvariantCulture, out _);

    private static double Cell(string path, int line, string[] cells, int index, string what)
    {
        if (index >= cells.Length)
        {
            throw new DataFileException(path, line, "the row has no " + what + " (column " + (index + 1) + ")", ErrorId);
        }

        if (!double.TryParse(cells[index], NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !Finite.Is(value))
        {
            throw new DataFileException(path, line, "the " + what + " '" + cells[index] + "' is not a finite number", ErrorId);
        }

        return value;
    }

    private static string Show(double value) => value.ToString("G9", CultureInfo.InvariantCulture);
}
