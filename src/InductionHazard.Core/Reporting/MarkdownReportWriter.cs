using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Reporting;

/// <summary>
/// Writes a report as Markdown (CommonMark with pipe tables): the HTML report's content as text and tables, for
/// wikis and change tickets. Every text from the inputs is escaped so that it reads as written and can neither
/// break a table nor bring in markup: HTML's special characters become entities, Markdown's are backslashed.
/// </summary>
public static class MarkdownReportWriter
{
    /// <summary>Writes the report.</summary>
    public static void Write(HazardReport report, TextWriter w)
    {
        w.Write("# " + M(report.Title) + "\n\n");
        w.Write((report.Site.Length > 0 ? "Site: " + M(report.Site) + ". " : string.Empty) + report.Assessments.Count.ToString(CultureInfo.InvariantCulture)
            + " items assessed. Report made " + M(report.GeneratedUtc) + " with InductionHazard " + M(report.ModuleVersion) + ".\n\n");
        w.Write("## Read first\n\n");
        foreach (string c in report.Cautions)
        {
            w.Write("- " + M(c) + "\n");
        }

        w.Write("- Limits were taken from the standards and sources listed under Provenance; a limit marked \"site policy\" is the site's own.\n\n## Summary\n\n");
        w.Write("| " + string.Join(" | ", HazardReport.VerdictsBySeverity) + " |\n|" + string.Concat(HazardReport.VerdictsBySeverity.Select(_ => "---:|")) + "\n| "
            + string.Join(" | ", HazardReport.VerdictsBySeverity.Select(v => report.Count(v).ToString(CultureInfo.InvariantCulture))) + " |\n\n");
        if (report.NotAssessed.Count > 0)
        {
            w.Write("**" + report.NotAssessed.Count.ToString(CultureInfo.InvariantCulture) + " inventory rows could not be assessed** and have no verdict: treat those items as unsafe until their rows are corrected and assessed.\n\n"
                + string.Concat(report.NotAssessed.Select(n => "- " + M(n) + "\n")) + "\n");
        }

        if (report.Stations.Any(s => s.Length > 0))
        {
            w.Write("| Station | " + string.Join(" | ", HazardReport.VerdictsBySeverity) + " |\n|---|" + string.Concat(HazardReport.VerdictsBySeverity.Select(_ => "---:|")) + "\n");
            foreach (string station in report.Stations)
            {
                w.Write("| " + (station.Length > 0 ? M(station) : "(no station)") + " | " + string.Join(" | ", HazardReport.VerdictsBySeverity.Select(v => report.Count(v, station).ToString(CultureInfo.InvariantCulture))) + " |\n");
            }

            w.Write("\n");
        }

        IReadOnlyList<(string Mechanism, int Count)> governing = report.GoverningCounts();
        if (governing.Count > 0)
        {
            w.Write("What governs the items that are not Clear: " + string.Join(", ", governing.Select(g => M(g.Mechanism) + " " + g.Count.ToString(CultureInfo.InvariantCulture))) + ".\n\n");
        }

        w.Write("### Actions, the most urgent first\n\n");
        InductionAssessment[] flagged = report.Worst.Where(a => a.Verdict != Verdict.Clear).ToArray();
        if (flagged.Length == 0)
        {
            w.Write("Every item is Clear at its place.\n\n");
        }
        else
        {
            w.Write("| Row | Item | Station | Verdict | Governing | Margin | Action |\n|---:|---|---|---|---|---:|---|\n");
            foreach (InductionAssessment a in flagged)
            {
                w.Write("| " + HazardReport.RowText(a) + " | " + M(a.ItemName) + " | " + M(a.StationName) + " | **" + a.Verdict + "** | " + a.GoverningMechanism + " | " + M(SiFormat.Margin(a.MinimumMargin)) + " | " + M(a.Action) + " |\n");
            }

            w.Write("\n");
        }

        w.Write("## Items\n\n");
        foreach (InductionAssessment a in report.Assessments)
        {
            WriteItem(a, w);
        }

        w.Write("## Provenance\n\n");
        w.Write("- Report made " + M(report.GeneratedUtc) + " by InductionHazard " + M(report.ModuleVersion) + "; assessments made by InductionHazard " + M(string.Join(", ", report.ModuleVersions)) + ".\n");
        foreach (PolicyUsed p in report.Policies)
        {
            w.Write("- Policy: " + M(p.Name) + ", safety factor " + SiFormat.Plain(p.SafetyFactor) + p.GroupWords + ", SHA-256 `" + p.Fingerprint + "`.\n");
        }

        w.Write("- Inputs: SHA-256 `" + report.InputsHash + "` over every item's inputs in order.\n- Limits from:\n");
        foreach (string s in report.Standards)
        {
            w.Write("  - " + M(s) + "\n");
        }
    }

    /// <summary>Escapes a text for Markdown: one line, HTML's &amp;, &lt; and &gt; as entities, Markdown's punctuation and the table's bar backslashed.</summary>
    public static string M(string? text)
    {
        var sb = new StringBuilder();
        foreach (char c in text ?? string.Empty)
        {
            switch (c)
            {
                case '&': sb.Append("&amp;"); break;
                case '<': sb.Append("&lt;"); break;
                case '>': sb.Append("&gt;"); break;
                case '\r':
                case '\n':
                case '\t': sb.Append(' '); break;
                case '\\':
                case '|':
                case '*':
                case '_':
                case '`':
                case '[':
                case ']':
                case '#':
                case '!':
                case '~': sb.Append('\\').Append(c); break;
                default: sb.Append(c); break;
            }
        }

        return sb.ToString();
    }

    private static void WriteItem(InductionAssessment a, TextWriter w)
    {
        w.Write("### " + M(ReportLines.Heading(a)) + ": " + a.Verdict + "\n\n" + M(a.Summary) + "\n\n**Action:** " + M(a.Action) + "\n\n");
        if (a.Reasons.Count > 0)
        {
            w.Write((a.Verdict == Verdict.Indeterminate ? "Why it could not be judged:" : "Findings:") + "\n\n" + string.Concat(a.Reasons.Select(r => "- " + M(r) + "\n")) + "\n");
        }

        w.Write("| Input | Value |\n|---|---|\n" + string.Concat(ReportLines.Inputs(a).Select(l => "| " + M(l.Label) + " | " + M(l.Text) + " |\n")) + "\n");
        w.Write("Model:\n\n" + string.Concat(ReportLines.Model(a).Select(l => "- " + M(l) + "\n")) + "\n");
        w.Write("| Mechanism | Verdict | Compared | Predicted | Limit | Margin | Finding | Limit's source |\n|---|---|---|---:|---:|---:|---|---|\n");
        foreach (MechanismResult m in a.Mechanisms.Where(m => m.Applies))
        {
            var row = ReportLines.Row(m);
            w.Write("| " + row.Mechanism + " | " + M(row.Verdict) + " | " + M(row.Quantity) + " | " + M(row.Predicted) + " | " + M(row.Limit) + " | " + M(row.Margin) + " | " + M(row.Detail) + " | " + M(row.Basis) + " |\n");
        }

        MechanismResult[] notApplying = a.Mechanisms.Where(m => !m.Applies).ToArray();
        if (notApplying.Length > 0)
        {
            w.Write("\nDo not apply: " + string.Join("; ", notApplying.Select(m => m.Mechanism + " (" + M(m.Detail) + ")")) + ".\n");
        }

        w.Write("\n| Figure | Value |\n|---|---:|\n" + string.Concat(ReportLines.Figures(a).Select(l => "| " + M(l.Label) + " | " + M(l.Text) + " |\n")) + "\n");
        w.Write("Assessed " + M(a.AssessedUtc) + ", policy " + M(a.PolicyName) + HazardReport.GroupNote(a) + ", inputs SHA-256 `" + a.InputHash + "`.\n\n");
    }
}
