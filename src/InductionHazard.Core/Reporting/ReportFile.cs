using System;
using System.IO;
using System.Text;
using InductionHazard.Errors;

namespace InductionHazard.Reporting;

/// <summary>
/// Writes a report file safely: into a temporary file beside the target, renamed into place only when the whole
/// report has been written, so that a failure part-way leaves no partial file and no temporary one; an existing
/// file is replaced only when asked.
/// </summary>
public static class ReportFile
{
    /// <summary>The format a file's extension names: .html/.htm, .md/.markdown, .csv, .json; null for any other.</summary>
    public static ReportFormat? FormatOf(string path) => Path.GetExtension(path).ToUpperInvariant() switch
    {
        ".HTML" or ".HTM" => ReportFormat.Html,
        ".MD" or ".MARKDOWN" => ReportFormat.Markdown,
        ".CSV" => ReportFormat.Csv,
        ".JSON" => ReportFormat.Json,
        _ => null,
    };

    /// <summary>Writes the report in a format to a path.</summary>
    /// <param name="report">The report.</param>
    /// <param name="format">The format.</param>
    /// <param name="path">The full path of the file.</param>
    /// <param name="overwrite">Whether an existing file may be replaced.</param>
    /// <param name="includeSeries">JSON only: every point of each time series.</param>
    /// <exception cref="InvalidInputException">The file exists and <paramref name="overwrite"/> is false, or its folder does not exist.</exception>
    public static void Write(HazardReport report, ReportFormat format, string path, bool overwrite, bool includeSeries = false) =>
        WriteAtomically(path, overwrite, format == ReportFormat.Csv, w =>
        {
            switch (format)
            {
                case ReportFormat.Html:
                    HtmlReportWriter.Write(report, w);
                    break;
                case ReportFormat.Markdown:
                    MarkdownReportWriter.Write(report, w);
                    break;
                case ReportFormat.Csv:
                    CsvReportWriter.Write(report, w);
                    break;
                default:
                    JsonReportWriter.Write(report, w, includeSeries);
                    break;
            }
        });

    /// <summary>Writes text to a temporary file beside <paramref name="path"/>, then renames it into place.</summary>
    /// <param name="path">The full path of the file.</param>
    /// <param name="overwrite">Whether an existing file may be replaced.</param>
    /// <param name="byteOrderMark">Whether to start with a UTF-8 byte order mark (spreadsheets read the encoding from it).</param>
    /// <param name="write">Writes the content; if it throws, nothing is left behind.</param>
    public static void WriteAtomically(string path, bool overwrite, bool byteOrderMark, Action<TextWriter> write)
    {
        string full = Path.GetFullPath(path);
        string? folder = Path.GetDirectoryName(full);
        if (folder is null || !Directory.Exists(folder))
        {
            throw new InvalidInputException("Path", "the folder '" + folder + "' does not exist; create it first");
        }

        if (Directory.Exists(full))
        {
            throw new InvalidInputException("Path", "'" + full + "' is a folder; give a file name such as audit.html");
        }

        if (File.Exists(full) && !overwrite)
        {
            throw new InvalidInputException("Path", "'" + full + "' exists; give -Force to replace it, or another name");
        }

        string temporary = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N").Substring(0, 8) + ".tmp");
        try
        {
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            using (var writer = new StreamWriter(stream, new UTF8Encoding(byteOrderMark)))
            {
                writer.NewLine = "\n";
                write(writer);
            }

            if (File.Exists(full))
            {
                File.Replace(temporary, full, null);
            }
            else
            {
                File.Move(temporary, full);
            }
        }
        finally
        {
            if (File.Exists(temporary))
            {
                File.Delete(temporary);
            }
        }
    }
}
