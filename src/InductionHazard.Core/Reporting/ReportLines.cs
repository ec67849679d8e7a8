using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Reporting;

/// <summary>
/// The words and figures of one item's section, as label and text, shared by the HTML and Markdown reports so that
/// both say the same thing: its inputs, placement and source, the model and why, the figures with units, and each
/// mechanism's row. Numbers a broken assumption makes untrustworthy read "not trusted", never a figure.
/// </summary>
public static class ReportLines
{
    /// <summary>Shown for a figure the engine does not trust (NaN).</summary>
    public const string NotTrusted = "not trusted (see reasons)";

    /// <summary>The item's inputs: what it is, its inventory columns, where it was and in what field.</summary>
    public static IReadOnlyList<(string Label, string Text)> Inputs(InductionAssessment a)
    {
        InductionResponse r = a.Response;
        ConductiveItem item = r.Item;
        Scenario s = r.Scenario;
        var lines = new List<(string, string)>
        {
            ("Item", item.Describe()),
            ("Material", item.Material.Name + ", resistivity " + SiFormat.Format(item.Material.ResistivityOhmMeters, "Ω·m") + (item.Material.IsFerromagnetic ? ", ferromagnetic" : string.Empty)),
            ("Mass", SiFormat.Format(item.MassKilograms * 1000.0, "g")),
        };
        lines.AddRange(a.Inventory.Where(p => p.Value.Length > 0).Select(p => (p.Key, p.Value)));
        if (a.StationName.Length > 0)
        {
            lines.Add(("Station", a.StationName));
        }

        lines.Add(("Source", s.Source.Describe()));
        lines.Add(("Placement", Placement(a)));
        lines.Add(("Time in the field", SiFormat.Format(r.ExposureSeconds, "s")
            + (r.Scenario.Shortened ? ", " + r.Scenario.LeavingWords + ", judged worse than " + (r.Scenario.StayGiven is { } given ? "the stay given (" + SiFormat.Format(given, "s") + ")" : "staying through the drive (the default stay)") : string.Empty)
            + " (assessed over " + SiFormat.Format(r.AssessedSeconds, "s") + ", with the cooling after it)"));
        lines.Add(("Surroundings", SiFormat.Celsius(s.Environment.AmbientCelsius) + " air"));
        return lines;
    }

    /// <summary>Where the item was and how it faced and moved: "centred at (0 m, 250 mm, 0 m); normal ...; moving at (...)".</summary>
    public static string Placement(InductionAssessment a)
    {
        Placement p = a.Response.Scenario.Placement;
        return "centred at " + Vector(p.Centre, "m") + "; " + (a.Orientation.Length > 0 ? a.Orientation : "oriented as given")
            + (p.Velocity is { } v ? "; moving at " + Vector(v, "m/s") : string.Empty);
    }

    /// <summary>The model that ran and why, with its notes, one line each, each starting with a capital.</summary>
    public static IReadOnlyList<string> Model(InductionAssessment a)
    {
        InductionResponse r = a.Response;
        var lines = new List<string> { AsLine(r.Model + (r.PathCount > 1 ? " (" + r.PathCount.ToString(CultureInfo.InvariantCulture) + " current paths)" : string.Empty)) };
        if (r.Regime.Length > 0)
        {
            lines.Add("Regime: " + r.Regime);
        }

        foreach (string note in r.ModelNotes)
        {
            lines.Add(AsLine(note));
        }

        return lines;
    }

    /// <summary>
    /// A note ("topic: what was found") as a line of its own in a report: its first letter a capital, unless it opens
    /// an abbreviation written with points (d.c., a.c.), which keeps its case.
    /// </summary>
    private static string AsLine(string note) =>
        note.Length > 0 && char.IsLower(note[0]) && !(note.Length > 1 && note[1] == '.')
            ? char.ToUpperInvariant(note[0]) + note.Substring(1)
            : note;

    /// <summary>
    /// The figures that apply to the item, each with its unit. For an item judged in several orientations or stays (a body
    /// given no normal), the flux, emf, current, heating and force are each the largest over them, and a first line says
    /// so; the circuit's figures and the torques are those of the one kept.
    /// </summary>
    public static IReadOnlyList<(string Label, string Text)> Figures(InductionAssessment a)
    {
        InductionResponse r = a.Response;
        var lines = new List<(string, string)>();
        void Add(string label, double? value, string unit)
        {
            if (value is { } v)
            {
                lines.Add((label, Si(v, unit)));
            }
        }

        if (a.FiguresJudgedOver > 1)
        {
            lines.Add(("Figures shown", "flux, emf, current, heating and force: each the largest of the " + a.FiguresJudgedOver.ToString(CultureInfo.InvariantCulture)
                + " orientations or stays judged; the circuit's figures and the torques: those of the one kept (see Placement and Time in the field)"));
        }

        Add("Peak flux density normal to the item", a.PeakFluxDensityTesla, "T");
        Add("Peak flux through the item", a.PeakFluxWebers, "Wb");
        Add("Significant frequency", r.FrequencyHertz > 0 ? r.FrequencyHertz : null, "Hz");
        Add("Peak emf", a.PeakEmfVolts, "V");
        Add("Rms emf", a.RmsEmfVolts, "V");
        Add("Peak gap voltage", a.GapVoltageVolts, "V");
        Add("Motional emf", r.MotionalEmfVolts, "V");
        Add("Resistance", r.ResistanceOhms, "Ω");
        Add("A.c. resistance", r.AcResistanceOhms, "Ω");
        Add("Inductance", r.InductanceHenries, "H");
        Add("Time constant L/R", r.TimeConstantSeconds, "s");
        Add("Skin depth", r.SkinDepthMeters, "m");
        Add("Peak current", a.PeakCurrentAmperes, "A");
        Add("Energy dissipated", a.EnergyDissipatedJoules, "J");
        lines.Add(("Peak temperature", double.IsNaN(a.PeakTemperatureCelsius) ? NotTrusted : SiFormat.Celsius(a.PeakTemperatureCelsius) + " (from " + SiFormat.Celsius(r.InitialTemperatureCelsius) + ")"));
        Add("Peak force", a.PeakForceNewtons, "N");
        Add("Impulse", r.ImpulseNewtonSeconds, "N·s");
        Add("Launch speed if loose", r.LaunchSpeedMetersPerSecond, "m/s");
        Add("Peak torque", r.PeakTorqueNewtonMeters, "N·m");
        Add("Peak torque, the item turned (its orientation not given)", r.PeakTorqueTurnedNewtonMeters, "N·m");
        Add("Braking force", r.BrakingForceNewtons, "N");
        Add("Pull toward the source", r.AttractionForceNewtons, "N");
        return lines;
    }

    /// <summary>One mechanism as a row: mechanism, verdict, what was compared, predicted, limit, margin, the limit's source, the finding.</summary>
    public static (string Mechanism, string Verdict, string Quantity, string Predicted, string Limit, string Margin, string Basis, string Detail) Row(MechanismResult m) =>
        (m.Mechanism.ToString(),
         m.Applies ? m.Verdict?.ToString() ?? string.Empty : "does not apply",
         m.Quantity,
         m.Applies && m.Verdict != Verdict.Indeterminate ? Value(m.Predicted, m.Unit) : string.Empty,
         m.Applies && m.Verdict != Verdict.Indeterminate ? Value(m.Limit, m.Unit) : string.Empty,
         m.Applies && m.Verdict != Verdict.Indeterminate ? SiFormat.Margin(m.Margin) : string.Empty,
         m.Basis,
         m.Detail);

    /// <summary>The report's heading line for an item: "Row 7 · Wedding band".</summary>
    public static string Heading(InductionAssessment a) =>
        (a.RowNumber is { } row ? "Row " + row.ToString(CultureInfo.InvariantCulture) + " · " : string.Empty) + a.ItemName;

    private static readonly HashSet<string> PrefixedUnits = new(System.StringComparer.Ordinal) { "V", "A", "N", "N·m", "N·s", "T", "W", "J", "s", "m", "m/s", "Hz", "Ω", "H", "Wb" };

    private static string Value(double value, string unit) =>
        unit == "°C" ? SiFormat.Celsius(value)
        : PrefixedUnits.Contains(unit) ? Si(value, unit)
        : (SiFormat.Plain(value) + " " + unit).TrimEnd();

    private static string Si(double value, string unit) => double.IsNaN(value) ? NotTrusted : SiFormat.Format(value, unit);

    private static string Vector(Vector3D v, string unit) =>
        "(" + SiFormat.Format(v.X, unit) + ", " + SiFormat.Format(v.Y, unit) + ", " + SiFormat.Format(v.Z, unit) + ")";
}
