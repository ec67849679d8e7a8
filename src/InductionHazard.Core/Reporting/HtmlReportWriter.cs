using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Net;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Reporting;

/// <summary>
/// Writes a report as one self-contained HTML page: inline style and SVG, no script (a content security policy
/// forbids any), nothing fetched from a network. Readable on screen and printed on A4 or Letter: each item starts
/// a page. Every text from the inputs is HTML-escaped.
/// </summary>
public static class HtmlReportWriter
{
    private const string Style = @"
:root { --ink: #1d232b; --muted: #5d6673; --rule: #d5dae1; --paper: #ffffff; --band: #f3f5f8; }
* { box-sizing: border-box; }
body { margin: 0; padding: 24px 32px 48px; font: 14px/1.45 'Segoe UI', Helvetica, Arial, sans-serif; color: var(--ink); background: var(--paper); max-width: 1100px; }
h1 { font-size: 24px; margin: 0 0 4px; }
h2 { font-size: 19px; margin: 28px 0 8px; padding-bottom: 4px; border-bottom: 2px solid var(--ink); }
h3 { font-size: 15px; margin: 18px 0 6px; }
p.meta { color: var(--muted); margin: 0 0 16px; }
.cautions { border: 2px solid var(--ink); padding: 10px 16px; margin: 16px 0; background: var(--band); }
.cautions h2 { border: 0; margin: 0 0 4px; font-size: 16px; }
.cautions ul { margin: 4px 0; padding-left: 20px; }
.tiles { display: flex; gap: 12px; flex-wrap: wrap; margin: 8px 0 16px; }
.tile { flex: 1 1 140px; border: 1px solid var(--rule); border-top: 6px solid var(--c); padding: 8px 12px; }
.tile b { display: block; font-size: 26px; }
table { border-collapse: collapse; width: 100%; margin: 6px 0 14px; break-inside: auto; }
th, td { border: 1px solid var(--rule); padding: 4px 7px; text-align: left; vertical-align: top; }
th { background: var(--band); font-weight: 600; }
table.figures { width: auto; min-width: 50%; }
td.n { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
tr { break-inside: avoid; }
.verdict { display: inline-block; padding: 1px 8px; border-radius: 3px; color: #fff; background: var(--c); font-weight: 600; font-size: 12px; letter-spacing: .02em; }
.item { break-before: page; }
.item > h2 { display: flex; justify-content: space-between; align-items: baseline; gap: 12px; }
.action { border-left: 6px solid var(--c); padding: 6px 12px; background: var(--band); margin: 8px 0; }
dl.inputs { display: grid; grid-template-columns: 190px 1fr; gap: 2px 12px; margin: 6px 0 12px; }
dl.inputs dt { color: var(--muted); }
dl.inputs dd { margin: 0; }
figure { margin: 8px 0 14px; break-inside: avoid; }
figure svg { max-width: 100%; height: auto; display: block; }
figcaption { color: var(--muted); font-size: 12px; }
.hash { font-family: Consolas, 'DejaVu Sans Mono', monospace; font-size: 12px; word-break: break-all; }
.small { font-size: 12px; color: var(--muted); }
a { color: inherit; }
@page { margin: 14mm 12mm; }
@media print { body { padding: 0; max-width: none; font-size: 11.5px; } h2 { break-after: avoid; } a { text-decoration: none; } }
";

    /// <summary>Writes the page.</summary>
    public static void Write(HazardReport report, TextWriter w)
    {
        w.Write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        w.Write("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'; img-src data:\">\n");
        w.Write("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        w.Write("<meta name=\"generator\" content=\"InductionHazard " + E(report.ModuleVersion) + "\">\n");
        w.Write("<title>" + E(report.Title) + "</title>\n<style>" + Style + "</style>\n</head>\n<body>\n");
        w.Write("<header>\n<h1>" + E(report.Title) + "</h1>\n<p class=\"meta\">" + (report.Site.Length > 0 ? "Site: " + E(report.Site) + " · " : string.Empty)
            + report.Assessments.Count.ToString(CultureInfo.InvariantCulture) + " items assessed · report made " + E(report.GeneratedUtc) + " with InductionHazard " + E(report.ModuleVersion) + "</p>\n</header>\n");
        WriteCautions(report, w);
        WriteSummary(report, w);
        w.Write("<figure>" + ReportCharts.MarginChart(report, "margins") + "<figcaption>Each item's smallest margin, by input order, on a log scale. Margins beyond 0.001 and 1000 are drawn at the edge; "
            + report.Count(Verdict.Indeterminate).ToString(CultureInfo.InvariantCulture) + " Indeterminate items have no margin and are not drawn.</figcaption></figure>\n");
        HashSet<int> charted = Charted(report);
        for (int i = 0; i < report.Assessments.Count; i++)
        {
            WriteItem(report.Assessments[i], i, w, charted.Contains(i));
        }

        WriteProvenance(report, w);
        w.Write("</body>\n</html>\n");
    }

    /// <summary>HTML-escapes a text (element content and quoted attributes alike).</summary>
    public static string E(string? text) => WebUtility.HtmlEncode(text ?? string.Empty);

    private static void WriteCautions(HazardReport report, TextWriter w)
    {
        w.Write("<section class=\"cautions\"><h2>Read first</h2><ul>\n");
        foreach (string c in report.Cautions)
        {
            w.Write("<li>" + E(c) + "</li>\n");
        }

        w.Write("<li>Limits were taken from the standards and sources listed under Provenance; a limit marked \"site policy\" is the site's own.</li>\n</ul></section>\n");
    }

    private static void WriteSummary(HazardReport report, TextWriter w)
    {
        w.Write("<section class=\"summary\"><h2>Summary</h2>\n<div class=\"tiles\">");
        foreach (Verdict v in HazardReport.VerdictsBySeverity)
        {
            w.Write("<div class=\"tile\" style=\"--c:" + ReportCharts.Colour(v) + "\"><b>" + report.Count(v).ToString(CultureInfo.InvariantCulture) + "</b>" + v + "</div>");
        }

        w.Write("</div>\n");
        WriteNotAssessed(report, w);
        if (report.Stations.Any(s => s.Length > 0))
        {
            w.Write("<h3>By station</h3>\n<table><thead><tr><th>Station</th>" + string.Concat(HazardReport.VerdictsBySeverity.Select(v => "<th>" + v + "</th>")) + "</tr></thead><tbody>\n");
            foreach (string station in report.Stations)
            {
                w.Write("<tr><td>" + (station.Length > 0 ? E(station) : "(no station)") + "</td>"
                    + string.Concat(HazardReport.VerdictsBySeverity.Select(v => "<td class=\"n\">" + report.Count(v, station).ToString(CultureInfo.InvariantCulture) + "</td>")) + "</tr>\n");
            }

            w.Write("</tbody></table>\n");
        }

        IReadOnlyList<(string Mechanism, int Count)> governing = report.GoverningCounts();
        if (governing.Count > 0)
        {
            w.Write("<h3>What governs the items that are not Clear</h3>\n<p>" + string.Join(" · ", governing.Select(g => E(g.Mechanism) + ": " + g.Count.ToString(CultureInfo.InvariantCulture))) + "</p>\n");
        }

        InductionAssessment[] flagged = report.Worst.Where(a => a.Verdict != Verdict.Clear).ToArray();
        w.Write("<h3>Actions, the most urgent first</h3>\n");
        if (flagged.Length == 0)
        {
            w.Write("<p>Every item is Clear at its place.</p>\n");
        }
        else
        {
            w.Write("<table><thead><tr><th>Row</th><th>Item</th><th>Station</th><th>Verdict</th><th>Governing</th><th>Margin</th><th>Action</th></tr></thead><tbody>\n");
            foreach (InductionAssessment a in flagged)
            {
                int index = report.IndexOf(a);
                w.Write("<tr><td class=\"n\">" + E(HazardReport.RowText(a)) + "</td><td><a href=\"#item-" + index.ToString(CultureInfo.InvariantCulture) + "\">" + E(a.ItemName) + "</a></td><td>" + E(a.StationName)
                    + "</td><td>" + Badge(a.Verdict) + "</td><td>" + E(a.GoverningMechanism?.ToString()) + "</td><td class=\"n\">" + E(SiFormat.Margin(a.MinimumMargin)) + "</td><td>" + E(a.Action) + "</td></tr>\n");
            }

            w.Write("</tbody></table>\n");
        }

        w.Write("</section>\n");
    }

    /// <summary>
    /// How many Clear items get their own charts, the first in input order: a chart weighs some 20 kB, and an inventory
    /// of thousands would otherwise make a page no browser opens. Every item keeps its tables.
    /// </summary>
    public const int ChartedClearItems = 200;

    /// <summary>
    /// How many items that are not Clear get their own charts, the most urgent first (the order of the actions table): an
    /// audit of thousands of items at a place where all are Hazard made a page of hundreds of megabytes. Every item
    /// keeps its tables.
    /// </summary>
    public const int ChartedNotClearItems = 400;

    /// <summary>The positions of the items that get charts: the most urgent that are not Clear, and the first Clear ones.</summary>
    private static HashSet<int> Charted(HazardReport report)
    {
        IReadOnlyList<InductionAssessment> all = report.Assessments;
        var charted = new HashSet<int>(report.WorstRows.Where(i => all[i].Verdict != Verdict.Clear).Take(ChartedNotClearItems));
        charted.UnionWith(Enumerable.Range(0, all.Count).Where(i => all[i].Verdict == Verdict.Clear).Take(ChartedClearItems));
        return charted;
    }

    private static void WriteItem(InductionAssessment a, int index, TextWriter w, bool charts)
    {
        string id = "item-" + index.ToString(CultureInfo.InvariantCulture);
        w.Write("<section class=\"item\" id=\"" + id + "\" style=\"--c:" + ReportCharts.Colour(a.Verdict) + "\">\n<h2><span>" + E(ReportLines.Heading(a)) + "</span>" + Badge(a.Verdict) + "</h2>\n");
        w.Write("<p>" + E(a.Summary) + "</p>\n<div class=\"action\"><b>Action:</b> " + E(a.Action) + "</div>\n");
        if (a.Reasons.Count > 0)
        {
            w.Write("<h3>" + (a.Verdict == Verdict.Indeterminate ? "Why it could not be judged" : "Findings") + "</h3>\n<ul>" + string.Concat(a.Reasons.Select(r => "<li>" + E(r) + "</li>")) + "</ul>\n");
        }

        w.Write("<h3>Inputs, placement and source</h3>\n<dl class=\"inputs\">");
        foreach ((string label, string text) in ReportLines.Inputs(a))
        {
            w.Write("<dt>" + E(label) + "</dt><dd>" + E(text) + "</dd>");
        }

        w.Write("</dl>\n<h3>Model</h3>\n<ul>" + string.Concat(ReportLines.Model(a).Select(l => "<li>" + E(l) + "</li>")) + "</ul>\n");
        w.Write("<h3>Mechanisms</h3>\n<table><thead><tr><th>Mechanism</th><th>Verdict</th><th>Compared</th><th>Predicted</th><th>Limit</th><th>Margin</th><th>Finding, and the limit's source</th></tr></thead><tbody>\n");
        foreach (MechanismResult m in a.Mechanisms.Where(m => m.Applies))
        {
            var row = ReportLines.Row(m);
            w.Write("<tr><td>" + E(row.Mechanism) + "</td><td>" + (m.Verdict is { } v ? Badge(v) : E(row.Verdict)) + "</td><td>" + E(row.Quantity) + "</td><td class=\"n\">" + E(row.Predicted)
                + "</td><td class=\"n\">" + E(row.Limit) + "</td><td class=\"n\">" + E(row.Margin) + "</td><td>" + E(row.Detail) + (row.Basis.Length > 0 ? "<div class=\"small\">Limit: " + E(row.Basis) + "</div>" : string.Empty) + "</td></tr>\n");
        }

        w.Write("</tbody></table>\n");
        MechanismResult[] notApplying = a.Mechanisms.Where(m => !m.Applies).ToArray();
        if (notApplying.Length > 0)
        {
            w.Write("<p class=\"small\">Do not apply: " + string.Join("; ", notApplying.Select(m => E(m.Mechanism.ToString()) + " (" + E(m.Detail) + ")")) + ".</p>\n");
        }

        w.Write("<h3>Figures</h3>\n<table class=\"figures\"><tbody>");
        foreach ((string label, string text) in ReportLines.Figures(a))
        {
            w.Write("<tr><th>" + E(label) + "</th><td class=\"n\">" + E(text) + "</td></tr>");
        }

        w.Write("</tbody></table>\n");
        if (!charts)
        {
            w.Write("<p class=\"small\">Charts are drawn for the " + ChartedNotClearItems.ToString(CultureInfo.InvariantCulture) + " most urgent items that are not Clear and for the first "
                + ChartedClearItems.ToString(CultureInfo.InvariantCulture) + " Clear ones; this item's figures are in the tables above.</p>\n");
        }
        else if (ReportCharts.DriveAndCurrent(a, id + "-current") is { } current)
        {
            w.Write("<figure>" + current + "<figcaption>The drive of the source (dashed, right axis) and the current induced around the item (left axis)." + E(DrawnFor(a, a.CurrentCharted, "current")) + "</figcaption></figure>\n");
        }

        if (charts && ReportCharts.Temperature(a, id + "-temperature") is { } temperature)
        {
            w.Write("<figure>" + temperature + "<figcaption>The item's temperature while in the field and after, against the limit it is judged by." + E(DrawnFor(a, a.HeatingCharted, "peak temperature")) + "</figcaption></figure>\n");
        }

        w.Write("<p class=\"small\">Assessed " + E(a.AssessedUtc) + " · policy " + E(a.PolicyName + HazardReport.GroupNote(a)) + " · inputs SHA-256 <span class=\"hash\">" + E(a.InputHash) + "</span></p>\n</section>\n");
    }

    private static void WriteProvenance(HazardReport report, TextWriter w)
    {
        w.Write("<section class=\"provenance\"><h2>Provenance</h2>\n<table><tbody>\n");
        w.Write("<tr><th>Report made</th><td>" + E(report.GeneratedUtc) + " by InductionHazard " + E(report.ModuleVersion) + "</td></tr>\n");
        w.Write("<tr><th>Assessments made by</th><td>InductionHazard " + E(string.Join(", ", report.ModuleVersions)) + "</td></tr>\n");
        foreach (PolicyUsed p in report.Policies)
        {
            w.Write("<tr><th>Policy</th><td>" + E(p.Name) + ", safety factor " + E(SiFormat.Plain(p.SafetyFactor)) + E(p.GroupWords) + "<br><span class=\"hash\">SHA-256 " + E(p.Fingerprint) + "</span></td></tr>\n");
        }

        w.Write("<tr><th>Inputs</th><td><span class=\"hash\">SHA-256 " + E(report.InputsHash) + "</span><br><span class=\"small\">over every item's inputs in order; the same inventory, site and policy give the same value</span></td></tr>\n");
        w.Write("<tr><th>Limits from</th><td><ul>" + string.Concat(report.Standards.Select(s => "<li>" + E(s) + "</li>")) + "</ul></td></tr>\n");
        w.Write("</tbody></table>\n<p class=\"small\">" + string.Join(" ", report.Cautions.Take(2).Select(E)) + "</p>\n</section>\n");
    }

    private static void WriteNotAssessed(HazardReport report, TextWriter w)
    {
        if (report.NotAssessed.Count == 0)
        {
            return;
        }

        w.Write("<div class=\"action\" style=\"--c:" + ReportCharts.Colour(Verdict.Indeterminate) + "\"><b>" + report.NotAssessed.Count.ToString(CultureInfo.InvariantCulture)
            + " inventory rows could not be assessed</b> and have no verdict: treat those items as unsafe until their rows are corrected and assessed.<ul>"
            + string.Concat(report.NotAssessed.Select(n => "<li>" + E(n) + "</li>")) + "</ul></div>\n");
    }

    /// <summary>Where a chart draws another orientation or stay than the one kept for the verdict (the one whose figure the tables show), what it draws.</summary>
    private static string DrawnFor(InductionAssessment a, InductionResponse drawn, string figure) =>
        ReferenceEquals(drawn, a.Response) ? string.Empty
        : drawn.Normal.Equals(a.Response.Normal)
            ? " Drawn for the stay judged where the " + figure + " is largest, leaving after " + SiFormat.Format(drawn.ExposureSeconds, "s") + ", as the figures above are; the one kept for the verdict leaves after " + SiFormat.Format(a.Response.ExposureSeconds, "s") + "."
            : " Drawn for the orientation judged where the " + figure + " is largest, normal " + drawn.Normal + ", as the figures above are; the one kept for the verdict is normal " + a.Response.Normal + ".";

    private static string Badge(Verdict v) => "<span class=\"verdict\" style=\"--c:" + ReportCharts.Colour(v) + "\">" + v + "</span>";
}
