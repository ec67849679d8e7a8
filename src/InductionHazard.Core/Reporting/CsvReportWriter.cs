using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using CsvHelper;
using CsvHelper.Configuration;
using InductionHazard.Assessment;
using InductionHazard.Criteria;

namespace InductionHazard.Reporting;

/// <summary>
/// Writes a report as CSV: one row per item, the inventory's own columns beside the results, numbers in SI with the
/// unit in the header, what each item was assessed under (its source, placement, time in the field and air), and the
/// report's provenance and cautions in the last columns. A text cell that a spreadsheet would take
/// for a formula (it starts with =, +, -, @, a tab or a carriage return) is neutralised with a leading apostrophe;
/// numbers are written as numbers. A figure the engine does not trust is an empty cell (the Reasons column says why).
/// </summary>
public static class CsvReportWriter
{
    private static readonly (string Header, Func<InductionAssessment, double?> Value)[] Numbers =
    {
        ("MinimumMargin", a => a.MinimumMargin),
        ("ShockMargin", a => a.ShockMargin),
        ("ArcMargin", a => a.ArcMargin),
        ("BurnMargin", a => a.BurnMargin),
        ("OverheatMargin", a => a.OverheatMargin),
        ("ForceMargin", a => a.ForceMargin),
        ("TorqueMargin", a => a.TorqueMargin),
        ("AttractionMargin", a => a.AttractionMargin),
        ("ExposureMargin", a => a.ExposureMargin),
        ("PeakFluxDensity (T)", a => a.PeakFluxDensityTesla),
        ("PeakEmf (V)", a => a.PeakEmfVolts),
        ("GapVoltage (V)", a => a.GapVoltageVolts),
        ("PeakCurrent (A)", a => a.PeakCurrentAmperes),
        ("PeakTemperature (°C)", a => a.PeakTemperatureCelsius),
        ("EnergyDissipated (J)", a => a.EnergyDissipatedJoules),
        ("PeakForce (N)", a => a.PeakForceNewtons),
        ("Mass (kg)", a => a.Response.MassKilograms),
        ("SafetyFactor", a => a.SafetyFactor),
    };

    private static readonly string[] VerdictHeaders = { "Verdict", "GoverningMechanism" };

    private static readonly string[] TextHeaders = { "Action", "Summary", "Reasons", "Shape", "Material", "Contact", "Source", "Placement", "TimeInField (s)", "AmbientTemperature (°C)", "Model", "PathCount", "Policy", "ExposureGroup", "PolicySha256", "InputSha256", "ModuleVersion", "AssessedUtc", "ReportInputsSha256", "Cautions" };

    /// <summary>Writes the rows.</summary>
    public static void Write(HazardReport report, TextWriter w)
    {
        var config = new CsvConfiguration(CultureInfo.InvariantCulture) { InjectionOptions = InjectionOptions.None, NewLine = "\r\n" };
        using var csv = new CsvWriter(w, config, leaveOpen: true);
        var headers = new List<string> { "Row", "Station", "Item" };
        headers.AddRange(report.InventoryColumns);
        headers.AddRange(VerdictHeaders);
        headers.AddRange(Numbers.Select(n => n.Header));
        headers.AddRange(TextHeaders);
        foreach (string h in headers)
        {
            csv.WriteField(Text(h));
        }

        csv.NextRecord();
        foreach (InductionAssessment a in report.Assessments)
        {
            csv.WriteField(HazardReport.RowText(a));
            csv.WriteField(Text(a.StationName));
            csv.WriteField(Text(a.ItemName));
            foreach (string column in report.InventoryColumns)
            {
                csv.WriteField(Text(a.Inventory.TryGetValue(column, out string? v) ? v : string.Empty));
            }

            csv.WriteField(a.Verdict.ToString());
            csv.WriteField(a.GoverningMechanism?.ToString() ?? string.Empty);
            foreach ((_, Func<InductionAssessment, double?> value) in Numbers)
            {
                csv.WriteField(Number(value(a)));
            }

            csv.WriteField(Text(a.Action));
            csv.WriteField(Text(a.Summary));
            csv.WriteField(Text(a.Reasons.ToString()));
            csv.WriteField(a.Response.Item.Shape.ToString());
            csv.WriteField(Text(a.Response.Item.Material.Name));
            csv.WriteField(a.Response.Item.Contact.ToString());
            csv.WriteField(Text(a.Response.Scenario.Source.Describe()));
            csv.WriteField(Text(ReportLines.Placement(a)));
            csv.WriteField(Number(a.Response.ExposureSeconds));
            csv.WriteField(Number(a.Response.Scenario.Environment.AmbientCelsius));
            csv.WriteField(Text(a.Response.Model));
            csv.WriteField(a.Response.PathCount.ToString(CultureInfo.InvariantCulture));
            csv.WriteField(Text(a.PolicyName));
            csv.WriteField(a.ExposureGroup.ToString());
            csv.WriteField(a.PolicyHash);
            csv.WriteField(a.InputHash);
            csv.WriteField(Text(a.ModuleVersion));
            csv.WriteField(a.AssessedUtc);
            csv.WriteField(report.InputsHash);
            csv.WriteField(Text(string.Join(" ", report.Cautions)));
            csv.NextRecord();
        }

        foreach (string failure in report.NotAssessed)
        {
            // A row that could not be assessed keeps its place in the file, with no verdict and the reason.
            csv.WriteField(string.Empty);
            csv.WriteField(string.Empty);
            csv.WriteField(Text(failure));
            foreach (string unused in report.InventoryColumns)
            {
                csv.WriteField(string.Empty);
            }

            csv.WriteField("NotAssessed");
            csv.WriteField(string.Empty);
            foreach (var unused in Numbers)
            {
                csv.WriteField(string.Empty);
            }

            csv.WriteField("Treat the item as unsafe until its row is corrected and assessed.");
            csv.WriteField("The row could not be assessed.");
            csv.WriteField(Text(failure));
            for (int i = 3; i < TextHeaders.Length; i++)
            {
                csv.WriteField(string.Empty);
            }

            csv.NextRecord();
        }

        csv.Flush();
    }

    /// <summary>A text cell a spreadsheet will not run: one starting with =, +, -, @, a tab or a carriage return gets a leading apostrophe.</summary>
    public static string Text(string? text)
    {
        string t = text ?? string.Empty;
        return t.Length > 0 && t[0] is '=' or '+' or '-' or '@' or '\t' or '\r' ? "'" + t : t;
    }

    /// <summary>A number cell: round-trip digits; empty for NaN or none; "Infinity" spelled out.</summary>
    public static string Number(double? value) => value switch
    {
        null => string.Empty,
        { } v when double.IsNaN(v) => string.Empty,
        { } v when double.IsPositiveInfinity(v) => "Infinity",
        { } v when double.IsNegativeInfinity(v) => "-Infinity",
        { } v => v.ToString("R", CultureInfo.InvariantCulture),
    };
}
