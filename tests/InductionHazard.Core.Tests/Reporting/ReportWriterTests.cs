using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text.Json;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Reporting;
using Xunit;

namespace InductionHazard.Tests.Reporting;

/// <summary>The report writers: escaping for each format, the JSON against an independent parser, and the file written whole or not at all.</summary>
public sealed class ReportWriterTests
{
    private const string Hostile = "<script>alert(1)</script> | *x* [a](b) `c` & =HYPERLINK(\"x\")";

    private static InductionAssessment Assess(ConductiveItem item, double tesla, double hertz, int row, Dictionary<string, object?>? inventory = null) =>
        HazardAssessor.Assess(
            InductionEngine.Respond(new Scenario(item, Fixtures.UniformSine(tesla, hertz), null, 60) { StationName = "Bay <1>", Inventory = InventoryFields.Of(inventory ?? new Dictionary<string, object?>()) }),
            HazardPolicy.Default,
            row);

    private static ConductiveItem Named(string name) =>
        ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = name, ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002, ["Contact"] = "Skin" }, MaterialLibrary.BuiltIn);

    private static HazardReport Report(params InductionAssessment[] assessments) =>
        new(assessments, null, "Test site", new DateTime(2026, 12, 2, 9, 30, 0, DateTimeKind.Utc), new[] { "=cmd|' /C calc'!A0 (a hostile row): Diameter is missing" });

    [Fact]
    public void AnItemGivenNoNormalShowsItsTorqueTurnedAmongItsFiguresAndInTheJson()
    {
        // Facing the field its torque is nil; the Torque check judges it turned, and the figures say what was judged.
        var ramp = InductionHazard.Fields.FieldSource.Uniform("ramp", new InductionHazard.Waveforms.RampWaveform(0, 1, 0.01, drive: InductionHazard.Waveforms.DriveKind.FluxDensity), InductionHazard.Quantities.Vector3D.UnitZ);
        InductionAssessment chosen = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(Fixtures.Ring(contact: "Free"), ramp)), HazardPolicy.Default);
        double turned = chosen.Response.PeakTorqueTurnedNewtonMeters!.Value;
        string figure = InductionHazard.Quantities.SiFormat.Format(turned, "N·m");
        Assert.Contains("| Peak torque, the item turned (its orientation not given) | " + figure + " |", Write(Report(chosen), (r, w) => MarkdownReportWriter.Write(r, w)), StringComparison.Ordinal);
        using JsonDocument doc = JsonDocument.Parse(Write(Report(chosen), (r, w) => JsonReportWriter.Write(r, w, includeSeries: false)));
        Assert.Contains(turned.ToString("R", CultureInfo.InvariantCulture), doc.RootElement.GetRawText(), StringComparison.Ordinal);

        InductionAssessment given = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(Fixtures.Ring(contact: "Free"), ramp, new Placement(InductionHazard.Quantities.Vector3D.Zero, InductionHazard.Quantities.Vector3D.UnitZ))), HazardPolicy.Default);
        Assert.DoesNotContain("the item turned", Write(Report(given), (r, w) => MarkdownReportWriter.Write(r, w)), StringComparison.Ordinal);
    }

    private static string Write(HazardReport report, Action<HazardReport, TextWriter> write)
    {
        using var w = new StringWriter(CultureInfo.InvariantCulture);
        write(report, w);
        return w.ToString();
    }

    private static readonly InductionAssessment Clear = Assess(Named("plain ring"), 0.4e-3, 50, 1, new() { ["AssetTag"] = "T-1", ["Location"] = "store", ["Diameter (mm)"] = "20" });
    private static readonly InductionAssessment HostileName = Assess(Named(Hostile), 0.4e-3, 50, 2, new() { ["Notes"] = "=HYPERLINK(\"x\")" });
    private static readonly InductionAssessment Hot = Assess(Named("hot ring"), 0.05, 10000, 3);

    [Fact]
    public void HtmlEscapesEveryInputTextAndCarriesNoScript()
    {
        string html = Write(Report(Clear, HostileName, Hot), HtmlReportWriter.Write);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html, StringComparison.Ordinal);
        Assert.Contains("Bay &lt;1&gt;", html, StringComparison.Ordinal);
        Assert.Contains("Content-Security-Policy", html, StringComparison.Ordinal);
        Assert.DoesNotContain("http://", html.Replace("http://www.w3.org/", string.Empty, StringComparison.Ordinal), StringComparison.Ordinal);
        Assert.Equal(3, CountOf(html, "<section class=\"item\""));
    }

    [Fact]
    public void AWornItemsTemperatureIsDrawnAgainstTheBurnThreshold()
    {
        string? chart = ReportCharts.Temperature(Hot, "t");
        Assert.NotNull(chart);
        Assert.Contains("burn threshold", chart, StringComparison.Ordinal);
        Assert.Contains("id=\"t-", chart, StringComparison.Ordinal); // the chart's own ids, so that two charts on a page do not clash
        Assert.DoesNotMatch("id=\"(?!t-)", chart);
    }

    [Fact]
    public void ALargeInventoryKeepsEverySectionButChartsOnlyWhatNeedsThem()
    {
        // 250 Clear items and a Hazard: every item has its section; charts for the Hazard and the first 200 Clear ones.
        var many = Enumerable.Repeat(Clear, 250).Append(Hot).ToArray();
        string html = Write(Report(many), HtmlReportWriter.Write);
        Assert.Equal(251, CountOf(html, "<section class=\"item\""));
        Assert.Equal(HtmlReportWriter.ChartedClearItems + 1, CountOf(html, "The item's temperature while in the field"));
        Assert.Contains("id=\"item-250-temperature-", html, StringComparison.Ordinal);
        Assert.Equal(50, CountOf(html, "Charts are drawn for the"));
    }

    [Fact]
    public void AnAuditOfManyItemsThatAreNotClearChartsOnlyTheMostUrgent()
    {
        // 400 Hazard items with the larger margin, then five with the smaller: charts for the 400 most urgent, which are
        // the five last in input order and the first 395 of the others (the actions table's order: margin, then row).
        InductionAssessment warm = Assess(Named("warm ring"), 0.02, 10000, 4);
        Assert.Equal(Verdict.Hazard, warm.Verdict);
        Assert.Equal(Verdict.Hazard, Hot.Verdict);
        Assert.True(Hot.MinimumMargin < warm.MinimumMargin);
        InductionAssessment[] many = Enumerable.Range(1, 400).Select(row => warm.For(warm.Response, row))
            .Concat(Enumerable.Range(401, 5).Select(row => Hot.For(Hot.Response, row))).ToArray();
        string html = Write(Report(many), HtmlReportWriter.Write);
        Assert.Equal(405, CountOf(html, "<section class=\"item\""));
        Assert.Equal(HtmlReportWriter.ChartedNotClearItems, CountOf(html, "The item's temperature while in the field"));
        Assert.Equal(5, CountOf(html, "Charts are drawn for the"));
        for (int i = 400; i < 405; i++)
        {
            Assert.Contains("id=\"item-" + i.ToString(CultureInfo.InvariantCulture) + "-temperature-", html, StringComparison.Ordinal);
        }

        Assert.Contains("id=\"item-394-temperature-", html, StringComparison.Ordinal);
        Assert.DoesNotContain("id=\"item-395-temperature-", html, StringComparison.Ordinal);
        Assert.DoesNotContain("id=\"item-399-temperature-", html, StringComparison.Ordinal);
    }

    [Fact]
    public void MarkdownEscapesMarkupAndKeepsTablesWhole()
    {
        string md = Write(Report(Clear, HostileName, Hot), MarkdownReportWriter.Write);
        Assert.DoesNotContain("<script", md, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", md, StringComparison.Ordinal);
        Assert.Equal("a \\| b \\*c\\* &lt;d&gt; &amp; \\[e\\]", MarkdownReportWriter.M("a | b *c* <d> & [e]"));
        // Every table row has as many unescaped bars as its header row.
        foreach (string[] table in Tables(md))
        {
            int columns = Bars(table[0]);
            Assert.All(table, line => Assert.Equal(columns, Bars(line)));
        }
    }

    [Fact]
    public void TheModelAndItsNotesAreListedOneALineEachAsASentence()
    {
        // Common practice for a report read by people: a list of findings, each opening with a capital, in place of a
        // run of lower-case "topic: finding" fragments; an abbreviation written with points (d.c.) keeps its case,
        // and a figure opens a line as it is.
        IReadOnlyList<string> lines = ReportLines.Model(Hot);
        Assert.Equal(Hot.Response.ModelNotes.Count + (Hot.Response.Regime.Length > 0 ? 2 : 1), lines.Count);
        Assert.All(lines, l => Assert.True(char.IsUpper(l[0]) || char.IsDigit(l[0]) || l.StartsWith("d.c.", StringComparison.Ordinal) || l.StartsWith("a.c.", StringComparison.Ordinal), l));
        Assert.Contains(lines, l => l.StartsWith("Lumped heating", StringComparison.Ordinal));

        string md = Write(Report(Hot), MarkdownReportWriter.Write);
        int model = md.IndexOf("Model:\n\n", StringComparison.Ordinal);
        Assert.True(model >= 0, "a Model section");
        string[] listed = md.Substring(model + 8).Split('\n').TakeWhile(l => l.Length > 0).ToArray();
        Assert.Equal(lines.Select(l => "- " + MarkdownReportWriter.M(l)), listed);
    }

    [Theory]
    [InlineData("=HYPERLINK(\"x\")", "'=HYPERLINK(\"x\")")]
    [InlineData("+1", "'+1")]
    [InlineData("-2+3", "'-2+3")]
    [InlineData("@SUM(A1)", "'@SUM(A1)")]
    [InlineData("\tx", "'\tx")]
    [InlineData("\rx", "'\rx")]
    [InlineData("plain", "plain")]
    [InlineData("", "")]
    public void CsvNeutralisesCellsThatStartAFormula(string cell, string written) => Assert.Equal(written, CsvReportWriter.Text(cell));

    [Fact]
    public void CsvHasOneRowPerItemWithTheInventoryColumnsAndNumbersAsNumbers()
    {
        string csv = Write(Report(Clear, HostileName, Hot), CsvReportWriter.Write);
        using var reader = new CsvHelper.CsvReader(new StringReader(csv), CultureInfo.InvariantCulture);
        List<dynamic> rows = reader.GetRecords<dynamic>().ToList();
        Assert.Equal(4, rows.Count); // three items and the row that could not be assessed
        var first = (IDictionary<string, object>)rows[0];
        Assert.Equal("T-1", first["AssetTag"]);
        Assert.Equal("store", first["Location"]);
        Assert.False(first.ContainsKey("Diameter (mm)"), "an item field is not an inventory column");
        Assert.Equal(Clear.PeakCurrentAmperes, double.Parse((string)first["PeakCurrent (A)"], CultureInfo.InvariantCulture));
        Assert.StartsWith("'", (string)((IDictionary<string, object>)rows[1])["Notes"], StringComparison.Ordinal);
        Assert.Equal("NotAssessed", ((IDictionary<string, object>)rows[3])["Verdict"]);
        Assert.StartsWith("'=", (string)((IDictionary<string, object>)rows[3])["Reasons"], StringComparison.Ordinal);
    }

    [Fact]
    public void JsonParsesWithAnIndependentParserAndGivesVerdictsAsWords()
    {
        // Checked with System.Text.Json (the runtime's own parser), not the library that wrote it.
        string json = Write(Report(Clear, HostileName, Hot), (r, w) => JsonReportWriter.Write(r, w, includeSeries: false));
        using JsonDocument doc = JsonDocument.Parse(json);
        JsonElement[] items = doc.RootElement.GetProperty("assessments").EnumerateArray().ToArray();
        Assert.Equal(new[] { Clear.Verdict, HostileName.Verdict, Hot.Verdict }.Select(v => v.ToString()), items.Select(i => i.GetProperty("verdict").GetString()));
        Assert.Equal(Hostile, items[1].GetProperty("item").GetString());
        Assert.Equal("T-1", items[0].GetProperty("inventory").GetProperty("AssetTag").GetString());
        Assert.Equal(JsonValueKind.Null, items[0].GetProperty("mechanisms")[0].GetProperty("margin").ValueKind); // Shock does not apply to a closed ring: NaN written as null
        Assert.Equal(Clear.PolicyHash, doc.RootElement.GetProperty("report").GetProperty("policies")[0].GetProperty("sha256").GetString());
        Assert.False(items[2].GetProperty("series").GetProperty("heating").TryGetProperty("values", out _));

        string full = Write(Report(Hot), (r, w) => JsonReportWriter.Write(r, w, includeSeries: true));
        using JsonDocument withSeries = JsonDocument.Parse(full);
        JsonElement heating = withSeries.RootElement.GetProperty("assessments")[0].GetProperty("series").GetProperty("heating");
        Assert.Equal(Hot.Response.HeatingSeries.Count, heating.GetProperty("values").GetArrayLength());
    }

    [Fact]
    public void EveryFormatSaysWhichItemsWereJudgedAtThePublicsLimits()
    {
        // A visitor named by the row beside a worker with the same item: the report says whose limits judged each.
        InductionAssessment visitor = HazardAssessor.Assess(
            InductionEngine.Respond(new Scenario(Named("visitor's ring"), Fixtures.UniformSine(0.4e-3, 50), null, 60) { WearerGroup = ExposureGroup.Public }),
            HazardPolicy.Default,
            4);
        HazardReport report = Report(Clear, visitor);
        using var reader = new CsvHelper.CsvReader(new StringReader(Write(report, CsvReportWriter.Write)), CultureInfo.InvariantCulture);
        List<IDictionary<string, object>> rows = reader.GetRecords<dynamic>().Cast<IDictionary<string, object>>().ToList();
        Assert.Equal(new[] { "Occupational", "Public", string.Empty }, rows.Select(r => (string)r["ExposureGroup"]));
        Assert.Equal(rows[0]["Policy"], rows[1]["Policy"]);

        using JsonDocument doc = JsonDocument.Parse(Write(report, (r, w) => JsonReportWriter.Write(r, w, includeSeries: false)));
        Assert.Equal(new[] { "Occupational", "Public" }, doc.RootElement.GetProperty("assessments").EnumerateArray().Select(i => i.GetProperty("exposureGroup").GetString()));
        Assert.Equal(2, doc.RootElement.GetProperty("report").GetProperty("policies").GetArrayLength());

        foreach (string text in new[] { Write(report, MarkdownReportWriter.Write), Write(report, (r, w) => HtmlReportWriter.Write(r, w)) })
        {
            Assert.Equal(1, CountOf(text, "(judged at the general public"));
        }
    }

    [Fact]
    public void EveryFormatCarriesTheCautionsAndTheProvenance()
    {
        HazardReport report = Report(Clear, Hot);
        foreach (string text in new[]
        {
            Write(report, HtmlReportWriter.Write),
            Write(report, MarkdownReportWriter.Write),
            Write(report, (r, w) => JsonReportWriter.Write(r, w, false)),
        })
        {
            Assert.Contains("engineering estimates", text, StringComparison.Ordinal);
            Assert.Contains(report.InputsHash, text, StringComparison.Ordinal);
            Assert.Contains(Clear.PolicyHash, text, StringComparison.Ordinal);
            Assert.Contains(HazardAssessor.ModuleVersion, text, StringComparison.Ordinal);
        }

        string csv = Write(report, CsvReportWriter.Write);
        Assert.Contains(report.InputsHash, csv, StringComparison.Ordinal);
        Assert.Contains("engineering estimates", csv, StringComparison.Ordinal);
        Assert.Contains(Clear.PolicyHash, csv, StringComparison.Ordinal);
    }

    [Fact]
    public void TheWorstItemComesFirstAndTheInputsFingerprintFollowsTheInputs()
    {
        HazardReport report = Report(Clear, Hot);
        Assert.Same(Hot, report.Worst[0]);
        Assert.Equal(report.InputsHash, Report(Clear, Hot).InputsHash);
        InductionAssessment nudged = Assess(ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "plain ring", ["Material"] = "Copper", ["Diameter"] = 0.02 * (1 + 1e-12), ["WireDiameter"] = 0.002, ["Contact"] = "Skin" }, MaterialLibrary.BuiltIn), 0.4e-3, 50, 1, new() { ["AssetTag"] = "T-1", ["Location"] = "store", ["Diameter (mm)"] = "20" });
        Assert.NotEqual(Clear.InputHash, nudged.InputHash);
    }

    [Fact]
    public void AFailurePartWayLeavesNoFileAndNoTemporaryOne()
    {
        string folder = Path.Combine(Path.GetTempPath(), "ih-report-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            string path = Path.Combine(folder, "audit.html");
            Assert.Throws<InvalidOperationException>(() => ReportFile.WriteAtomically(path, overwrite: false, byteOrderMark: false, w =>
            {
                w.Write(new string('x', 100_000));
                throw new InvalidOperationException("failed part-way");
            }));
            Assert.Empty(Directory.GetFileSystemEntries(folder));

            File.WriteAllText(path, "earlier report");
            Assert.Throws<Errors.InvalidInputException>(() => ReportFile.Write(Report(Clear), ReportFormat.Html, path, overwrite: false));
            Assert.Equal("earlier report", File.ReadAllText(path));
            Assert.Throws<InvalidOperationException>(() => ReportFile.WriteAtomically(path, overwrite: true, byteOrderMark: false, _ => throw new InvalidOperationException("failed")));
            Assert.Equal("earlier report", File.ReadAllText(path));

            ReportFile.Write(Report(Clear), ReportFormat.Markdown, path, overwrite: true);
            Assert.StartsWith("# Induction hazard assessment", File.ReadAllText(path), StringComparison.Ordinal);
            Assert.Single(Directory.GetFileSystemEntries(folder));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void ThinningKeepsEachPeakOfALongSeries()
    {
        // A 100,000-point sine with one spike: the thinned line keeps the spike and both extremes exactly.
        var points = Enumerable.Range(0, 100_000).Select(i => new OxyPlot.DataPoint(i * 1e-5, Math.Sin(i * 1e-3) + (i == 61_234 ? 5 : 0))).ToArray();
        IReadOnlyList<OxyPlot.DataPoint> thin = ReportCharts.Thin(points);
        Assert.True(thin.Count <= ReportCharts.MaxPoints);
        Assert.Equal(points.Max(p => p.Y), thin.Max(p => p.Y));
        Assert.Equal(points.Min(p => p.Y), thin.Min(p => p.Y));
        Assert.True(thin.Zip(thin.Skip(1), (a, b) => b.X > a.X).All(x => x), "in time order");
    }

    [Fact]
    public void InventoryColumnsAreTheRowsOwnNotItemPlacementOrStationFields()
    {
        InventoryFields f = InventoryFields.Of(new Dictionary<string, object?>
        {
            ["AssetTag"] = "MH-1", ["Wire Diameter"] = "2 mm", ["Diameter (mm)"] = 20, ["Station"] = "Bay", ["X"] = 0, ["Location"] = "Store B", ["Holder"] = null, ["contact"] = "Worn",
        });
        Assert.Equal(new[] { "AssetTag", "Location", "Holder" }, f.Keys);
        Assert.Equal("MH-1", f["assettag"]);
        Assert.Equal("AssetTag: MH-1; Location: Store B", f.ToString());
    }

    private static int CountOf(string text, string part) => (text.Length - text.Replace(part, string.Empty, StringComparison.Ordinal).Length) / part.Length;

    private static int Bars(string line) => line.Replace("\\|", string.Empty, StringComparison.Ordinal).Count(c => c == '|');

    private static IEnumerable<string[]> Tables(string markdown)
    {
        var current = new List<string>();
        foreach (string line in markdown.Split('\n'))
        {
            if (line.StartsWith('|'))
            {
                current.Add(line);
            }
            else if (current.Count > 0)
            {
                yield return current.ToArray();
                current.Clear();
            }
        }
    }
}
