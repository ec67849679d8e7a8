using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Text.RegularExpressions;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Induction;
using InductionHazard.Quantities;
using InductionHazard.Thermal;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace InductionHazard.Reporting;

/// <summary>
/// The report's charts as inline SVG, drawn by OxyPlot (managed code, no native renderer): every item's smallest
/// margin against the Caution and Clear lines, and for one item its drive with the induced current, and its
/// temperature against the burn or overheat limit. Long series are thinned to their extremes per bucket, so peaks
/// survive. Each SVG's internal ids carry a prefix of their own, so several can share one page.
/// </summary>
public static class ReportCharts
{
    /// <summary>The most points a line keeps after thinning.</summary>
    public const int MaxPoints = 400;

    private const double MarginFloor = 1e-3, MarginCeiling = 1e3;
    private static readonly Regex SvgId = new("(id=\"|url\\(#|href=\"#)([A-Za-z][A-Za-z0-9_]*)", RegexOptions.CultureInvariant);

    /// <summary>The colour of a verdict in charts and the page (chosen for this module; told apart by marker shape too).</summary>
    public static string Colour(Verdict v) => v switch
    {
        Verdict.Clear => "#2f7d5b",
        Verdict.Caution => "#b7791f",
        Verdict.Hazard => "#b3261e",
        _ => "#5b5f97",
    };

    /// <summary>Every judged item's smallest margin (log scale, by row) against the Caution line (1) and the Clear line (the safety factor).</summary>
    public static string MarginChart(HazardReport report, string idPrefix)
    {
        var model = Model("Smallest margin of each item");
        model.Axes.Add(new LogarithmicAxis { Position = AxisPosition.Left, Minimum = MarginFloor / 2, Maximum = MarginCeiling * 2, Title = "smallest margin", MajorGridlineStyle = LineStyle.Dot, MajorGridlineColor = OxyColor.FromRgb(220, 220, 220) });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "item (input order)", Minimum = 0, Maximum = Math.Max(2, report.Assessments.Count + 1), MinimumMajorStep = 1 });
        double factor = report.Policies.Count > 0 ? report.Policies.Max(p => p.SafetyFactor) : 2.0;
        model.Annotations.Add(new LineAnnotation { Type = LineAnnotationType.Horizontal, Y = 1, Color = Colour(Verdict.Hazard).ToOxy(), LineStyle = LineStyle.Dash, Text = "margin 1: below is Hazard", TextColor = Colour(Verdict.Hazard).ToOxy(), TextHorizontalAlignment = HorizontalAlignment.Left, TextVerticalAlignment = VerticalAlignment.Top, TextPosition = new DataPoint(0.2, 1) });
        model.Annotations.Add(new LineAnnotation { Type = LineAnnotationType.Horizontal, Y = factor, Color = Colour(Verdict.Clear).ToOxy(), LineStyle = LineStyle.Dash, Text = "safety factor " + SiFormat.Plain(factor) + ": at or above is Clear", TextColor = Colour(Verdict.Clear).ToOxy(), TextHorizontalAlignment = HorizontalAlignment.Left, TextVerticalAlignment = VerticalAlignment.Bottom, TextPosition = new DataPoint(0.2, factor) });
        foreach (Verdict verdict in new[] { Verdict.Clear, Verdict.Caution, Verdict.Hazard })
        {
            var series = new ScatterSeries { Title = verdict.ToString(), MarkerType = Marker(verdict), MarkerSize = 4, MarkerFill = Colour(verdict).ToOxy() };
            for (int i = 0; i < report.Assessments.Count; i++)
            {
                InductionAssessment a = report.Assessments[i];
                if (a.Verdict == verdict && !double.IsNaN(a.MinimumMargin))
                {
                    series.Points.Add(new ScatterPoint(i + 1, Math.Min(MarginCeiling, Math.Max(MarginFloor, a.MinimumMargin))));
                }
            }

            if (series.Points.Count > 0)
            {
                model.Series.Add(series);
            }
        }

        return Svg(model, 760, 300, idPrefix);
    }

    /// <summary>The drive of each source term and the induced current against time; null when the item has no circuit history.</summary>
    public static string? DriveAndCurrent(InductionAssessment a, string idPrefix)
    {
        IReadOnlyList<CircuitSample> samples = a.CurrentCharted.CircuitSeries;
        if (samples.Count < 2 || samples.All(s => !Finite.Is(s.CurrentAmperes)))
        {
            return null;
        }

        var model = Model("Drive and induced current");
        model.Axes.Add(TimeAxis());
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Key = "current", Title = "current", LabelFormatter = v => SiFormat.Format(v, "A", 2) });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Right, Key = "drive", Title = "drive", LabelFormatter = v => SiFormat.Format(v, string.Empty, 2) });
        int k = 0;
        foreach (Fields.SourceTerm term in a.CurrentCharted.Scenario.Source.Terms.Take(3))
        {
            var drive = new LineSeries { Title = "drive " + (++k).ToString(CultureInfo.InvariantCulture) + " (" + term.Waveform.Form + ")", YAxisKey = "drive", Color = OxyColor.FromRgb(120, 120, 120), LineStyle = LineStyle.Dash, StrokeThickness = 1.2 };
            drive.Points.AddRange(Thin(samples.Select(s => new DataPoint(s.TimeSeconds, term.Waveform.Value(s.TimeSeconds)))));
            model.Series.Add(drive);
        }

        var current = new LineSeries { Title = "induced current", YAxisKey = "current", Color = Colour(a.Verdict).ToOxy(), StrokeThickness = 1.6 };
        current.Points.AddRange(Thin(samples.Select(s => new DataPoint(s.TimeSeconds, s.CurrentAmperes))));
        model.Series.Add(current);
        return Svg(model, 760, 260, idPrefix);
    }

    /// <summary>The item's temperature against time with the limit it is judged against (burn for skin, else overheat); null without a heating history.</summary>
    public static string? Temperature(InductionAssessment a, string idPrefix)
    {
        IReadOnlyList<HeatingSample> samples = a.HeatingCharted.HeatingSeries;
        if (samples.Count < 2 || samples.All(s => !Finite.Is(s.TemperatureCelsius)))
        {
            return null;
        }

        var model = Model("Temperature of the item");
        model.Axes.Add(TimeAxis());
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "°C", LabelFormatter = v => v.ToString("0.#", CultureInfo.InvariantCulture) });
        var line = new LineSeries { Title = "item temperature", Color = Colour(a.Verdict).ToOxy(), StrokeThickness = 1.6 };
        line.Points.AddRange(Thin(samples.Select(s => new DataPoint(s.TimeSeconds, s.TemperatureCelsius))));
        model.Series.Add(line);
        (double Celsius, string Text)? limit = LimitLine(a);
        if (limit is { } threshold)
        {
            model.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Horizontal,
                Y = threshold.Celsius,
                Color = Colour(Verdict.Hazard).ToOxy(),
                LineStyle = LineStyle.Dash,
                Text = threshold.Text,
                TextColor = Colour(Verdict.Hazard).ToOxy(),
            });
        }

        return Svg(model, 760, 240, idPrefix);
    }

    /// <summary>
    /// The temperature the item's curve is drawn against: the burn threshold the Burn check compared (a contact
    /// temperature), or, where the thermal dose governed, the standard's threshold for the longest contact (from the
    /// default policy only, whose curve is known here); for an item no one touches, its overheat limit.
    /// </summary>
    private static (double Celsius, string Text)? LimitLine(InductionAssessment a)
    {
        MechanismResult? burn = a.Mechanisms.FirstOrDefault(m => m.Applies && m.Mechanism == HazardMechanism.Burn);
        if (burn is { Unit: "°C" } && Finite.Is(burn.Limit))
        {
            return (burn.Limit, "burn threshold " + SiFormat.Celsius(burn.Limit) + " for the contact time judged");
        }

        if (burn is not null && a.PolicyHash == HazardPolicy.Default.Fingerprint)
        {
            ContactBurnThreshold curve = HazardPolicy.Default.ContactBurn;
            double celsius = curve.CelsiusFor(curve.LongestSeconds);
            return (celsius, "burn threshold " + SiFormat.Celsius(celsius) + " for " + SiFormat.Format(curve.LongestSeconds / 3600, "h") + " of contact (the dose governed)");
        }

        MechanismResult? overheat = a.Mechanisms.FirstOrDefault(m => m.Applies && m.Mechanism == HazardMechanism.Overheat && m.Unit == "°C" && Finite.Is(m.Limit));
        return overheat is null ? null : (overheat.Limit, "overheat limit " + SiFormat.Celsius(overheat.Limit));
    }

    /// <summary>Keeps the first and last point and, per bucket, the lowest and highest, in time order: at most <see cref="MaxPoints"/>.</summary>
    public static IReadOnlyList<DataPoint> Thin(IEnumerable<DataPoint> points)
    {
        DataPoint[] all = points.Where(p => Finite.Is(p.X) && Finite.Is(p.Y)).ToArray();
        if (all.Length <= MaxPoints)
        {
            return all;
        }

        int buckets = (MaxPoints - 2) / 2;
        var kept = new List<DataPoint>(MaxPoints) { all[0] };
        for (int b = 0; b < buckets; b++)
        {
            int from = 1 + (int)((long)b * (all.Length - 2) / buckets), to = 1 + (int)((long)(b + 1) * (all.Length - 2) / buckets);
            if (to <= from)
            {
                continue;
            }

            int lo = from, hi = from;
            for (int i = from; i < to; i++)
            {
                lo = all[i].Y < all[lo].Y ? i : lo;
                hi = all[i].Y > all[hi].Y ? i : hi;
            }

            kept.Add(all[Math.Min(lo, hi)]);
            if (lo != hi)
            {
                kept.Add(all[Math.Max(lo, hi)]);
            }
        }

        kept.Add(all[all.Length - 1]);
        return kept;
    }

    private static PlotModel Model(string title) => new()
    {
        Title = title,
        TitleFontSize = 13,
        TitleFontWeight = FontWeights.Normal,
        DefaultFont = "Helvetica, Arial, sans-serif",
        DefaultFontSize = 11,
        PlotAreaBorderColor = OxyColor.FromRgb(160, 160, 160),
        Background = OxyColors.White,
        IsLegendVisible = true,
        Legends = { new OxyPlot.Legends.Legend { LegendPlacement = OxyPlot.Legends.LegendPlacement.Outside, LegendPosition = OxyPlot.Legends.LegendPosition.BottomCenter, LegendOrientation = OxyPlot.Legends.LegendOrientation.Horizontal, LegendFontSize = 10, LegendItemSpacing = 24 } },
    };

    private static LinearAxis TimeAxis() =>
        new() { Position = AxisPosition.Bottom, Title = "time", LabelFormatter = v => SiFormat.Format(v, "s", 2) };

    private static MarkerType Marker(Verdict v) => v switch
    {
        Verdict.Clear => MarkerType.Circle,
        Verdict.Caution => MarkerType.Diamond,
        _ => MarkerType.Triangle,
    };

    private static OxyColor ToOxy(this string hex) => OxyColor.Parse(hex);

    private static string Svg(PlotModel model, double width, double height, string idPrefix)
    {
        string svg = SvgExporter.ExportToString(model, width, height, false);
        // Ids in one SVG (clip paths) would clash with the next SVG's on the same page: give them this chart's prefix.
        return SvgId.Replace(svg, m => m.Groups[1].Value + idPrefix + "-" + m.Groups[2].Value);
    }
}
