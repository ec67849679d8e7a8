using System.Collections.Generic;
using System.IO;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Induction;
using InductionHazard.Thermal;
using Newtonsoft.Json;

namespace InductionHazard.Reporting;

/// <summary>
/// Writes a report as JSON for other tools: the provenance, the counts, and every assessment with its inputs, its
/// inventory columns, each mechanism (verdicts and mechanisms as words), the figures in SI and the model notes.
/// Time series are summarised (points, span, peaks) unless they are asked for in full. A number that is not finite
/// is null, and the assessment's reasons say why.
/// </summary>
public static class JsonReportWriter
{
    private static readonly string[] CircuitColumns = { "timeSeconds", "emfVolts", "currentAmperes", "temperatureCelsius" };

    private static readonly string[] HeatingColumns = { "timeSeconds", "temperatureCelsius", "powerWatts" };

    /// <summary>Writes the document.</summary>
    /// <param name="report">The report.</param>
    /// <param name="w">Where to write.</param>
    /// <param name="includeSeries">Whether to write every point of each time series.</param>
    public static void Write(HazardReport report, TextWriter w, bool includeSeries)
    {
        using var j = new JsonTextWriter(w) { Formatting = Formatting.Indented, CloseOutput = false };
        j.WriteStartObject();
        j.WritePropertyName("report");
        j.WriteStartObject();
        Text(j, "title", report.Title);
        Text(j, "site", report.Site);
        Text(j, "generatedUtc", report.GeneratedUtc);
        Text(j, "moduleVersion", report.ModuleVersion);
        Texts(j, "assessedWithModuleVersions", report.ModuleVersions);
        j.WritePropertyName("policies");
        j.WriteStartArray();
        foreach (PolicyUsed p in report.Policies)
        {
            j.WriteStartObject();
            Text(j, "name", p.Name);
            Number(j, "safetyFactor", p.SafetyFactor);
            Text(j, "sha256", p.Fingerprint);
            Text(j, "exposureGroup", p.ExposureGroup.ToString());
            j.WriteEndObject();
        }

        j.WriteEndArray();
        Text(j, "inputsSha256", report.InputsHash);
        Texts(j, "cautions", report.Cautions);
        Texts(j, "standards", report.Standards);
        j.WritePropertyName("counts");
        j.WriteStartObject();
        foreach (Criteria.Verdict v in HazardReport.VerdictsBySeverity)
        {
            j.WritePropertyName(v.ToString());
            j.WriteValue(report.Count(v));
        }

        j.WriteEndObject();
        j.WriteEndObject();
        j.WritePropertyName("assessments");
        j.WriteStartArray();
        foreach (InductionAssessment a in report.Assessments)
        {
            WriteAssessment(j, a, includeSeries);
        }

        j.WriteEndArray();
        Texts(j, "notAssessed", report.NotAssessed);
        j.WriteEndObject();
    }

    private static void WriteAssessment(JsonTextWriter j, InductionAssessment a, bool includeSeries)
    {
        InductionResponse r = a.Response;
        j.WriteStartObject();
        j.WritePropertyName("row");
        j.WriteValue(a.RowNumber);
        Text(j, "item", a.ItemName);
        Text(j, "station", a.StationName);
        j.WritePropertyName("inventory");
        j.WriteStartObject();
        foreach (KeyValuePair<string, string> p in a.Inventory)
        {
            Text(j, p.Key, p.Value);
        }

        j.WriteEndObject();
        Text(j, "verdict", a.Verdict.ToString());
        Text(j, "governingMechanism", a.GoverningMechanism?.ToString());
        Number(j, "minimumMargin", a.MinimumMargin);
        Text(j, "summary", a.Summary);
        Text(j, "action", a.Action);
        Texts(j, "reasons", a.Reasons);
        j.WritePropertyName("mechanisms");
        j.WriteStartArray();
        foreach (MechanismResult m in a.Mechanisms)
        {
            j.WriteStartObject();
            Text(j, "mechanism", m.Mechanism.ToString());
            j.WritePropertyName("applies");
            j.WriteValue(m.Applies);
            Text(j, "verdict", m.Verdict?.ToString());
            Text(j, "quantity", m.Quantity);
            Number(j, "predicted", m.Predicted);
            Number(j, "limit", m.Limit);
            Text(j, "unit", m.Unit);
            Number(j, "margin", m.Margin);
            Texts(j, "sources", m.Sources);
            Text(j, "detail", m.Detail);
            j.WriteEndObject();
        }

        j.WriteEndArray();
        j.WritePropertyName("figures");
        j.WriteStartObject();
        Number(j, "peakFluxDensityTesla", a.PeakFluxDensityTesla);
        Number(j, "peakEmfVolts", a.PeakEmfVolts);
        Number(j, "gapVoltageVolts", a.GapVoltageVolts);
        Number(j, "peakCurrentAmperes", a.PeakCurrentAmperes);
        Number(j, "peakTemperatureCelsius", a.PeakTemperatureCelsius);
        Number(j, "energyDissipatedJoules", a.EnergyDissipatedJoules);
        Number(j, "peakForceNewtons", a.PeakForceNewtons);
        Number(j, "peakTorqueNewtonMeters", r.PeakTorqueNewtonMeters);
        Number(j, "peakTorqueTurnedNewtonMeters", r.PeakTorqueTurnedNewtonMeters);
        Number(j, "resistanceOhms", r.ResistanceOhms);
        Number(j, "inductanceHenries", r.InductanceHenries);
        Number(j, "massKilograms", r.MassKilograms);
        j.WriteEndObject();
        j.WritePropertyName("inputs");
        j.WriteStartObject();
        Text(j, "item", r.Item.Describe());
        Text(j, "shape", r.Item.Shape.ToString());
        Text(j, "material", r.Item.Material.Name);
        Text(j, "contact", r.Item.Contact.ToString());
        Text(j, "source", r.Scenario.Source.Describe());
        Text(j, "placement", r.Scenario.Placement.Centre.ToString());
        Text(j, "orientation", a.Orientation);
        Text(j, "velocityMetersPerSecond", r.Scenario.Placement.Velocity?.ToString());
        Number(j, "exposureSeconds", r.ExposureSeconds);
        Number(j, "ambientCelsius", r.Scenario.Environment.AmbientCelsius);
        j.WriteEndObject();
        Text(j, "model", r.Model);
        j.WritePropertyName("pathCount");
        j.WriteValue(r.PathCount);
        Texts(j, "modelNotes", r.ModelNotes);
        Text(j, "policy", a.PolicyName);
        Text(j, "exposureGroup", a.ExposureGroup.ToString());
        Text(j, "policySha256", a.PolicyHash);
        Text(j, "inputSha256", a.InputHash);
        Text(j, "moduleVersion", a.ModuleVersion);
        Text(j, "assessedUtc", a.AssessedUtc);
        j.WritePropertyName("series");
        j.WriteStartObject();
        Series(j, "circuit", r.CircuitSeries, s => new[] { s.TimeSeconds, s.EmfVolts, s.CurrentAmperes, s.TemperatureCelsius }, CircuitColumns, includeSeries);
        Series(j, "heating", r.HeatingSeries, s => new[] { s.TimeSeconds, s.TemperatureCelsius, s.PowerWatts }, HeatingColumns, includeSeries);
        j.WriteEndObject();
        j.WriteEndObject();
    }

    private static void Series<T>(JsonTextWriter j, string name, IReadOnlyList<T> samples, System.Func<T, double[]> values, string[] columns, bool full)
    {
        j.WritePropertyName(name);
        j.WriteStartObject();
        j.WritePropertyName("points");
        j.WriteValue(samples.Count);
        Texts(j, "columns", columns);
        if (full)
        {
            j.WritePropertyName("values");
            j.WriteStartArray();
            foreach (T s in samples)
            {
                j.WriteStartArray();
                foreach (double v in values(s))
                {
                    Value(j, v);
                }

                j.WriteEndArray();
            }

            j.WriteEndArray();
        }
        else if (samples.Count > 0)
        {
            double[][] rows = samples.Select(values).ToArray();
            for (int c = 0; c < columns.Length; c++)
            {
                double[] column = rows.Select(row => row[c]).Where(Quantities.Finite.Is).ToArray();
                j.WritePropertyName(columns[c]);
                j.WriteStartObject();
                Number(j, "min", column.Length > 0 ? column.Min() : double.NaN);
                Number(j, "max", column.Length > 0 ? column.Max() : double.NaN);
                j.WriteEndObject();
            }
        }

        j.WriteEndObject();
    }

    private static void Text(JsonTextWriter j, string name, string? value)
    {
        j.WritePropertyName(name);
        j.WriteValue(value);
    }

    private static void Texts(JsonTextWriter j, string name, IEnumerable<string> values)
    {
        j.WritePropertyName(name);
        j.WriteStartArray();
        foreach (string v in values)
        {
            j.WriteValue(v);
        }

        j.WriteEndArray();
    }

    private static void Number(JsonTextWriter j, string name, double? value)
    {
        j.WritePropertyName(name);
        Value(j, value);
    }

    private static void Value(JsonTextWriter j, double? value)
    {
        if (value is { } v && Quantities.Finite.Is(v))
        {
            j.WriteValue(v);
        }
        else
        {
            j.WriteNull();
        }
    }
}
