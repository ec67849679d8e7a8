using System;
using System.Collections;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Assessment;

/// <summary>
/// Builds a site from its data (a PowerShell data file read as data): Site (the name) and Stations, each a table
/// with Name, Sources (tables of a source's values with a Waveform table), and optionally the rest of <see
/// cref="StationKeys"/> (Position, Normal or Tilt, Velocity, ExposureTime, LeaveTime, AmbientTemperature, Description,
/// and Policy: the station's own policy values, merged over the site's); and
/// optionally the site's Policy (a table of policy values, read by <see cref="Criteria.PolicyReader"/>). Every problem
/// names the station and the value.
/// </summary>
public static class SiteReader
{
    /// <summary>The error id of a site file that cannot be used.</summary>
    public const string ErrorId = "InvalidSiteFile";

    /// <summary>The values a station table may give, each by its name (the about topic of the site file names every one).</summary>
    public static IReadOnlyList<string> StationKeys { get; } = new[] { "Name", "Sources", "Position", "Normal", "Tilt", "Velocity", "ExposureTime", "LeaveTime", "AmbientTemperature", "Description", "Policy" };

    /// <summary>Reads the site.</summary>
    /// <param name="data">The file's top-level table.</param>
    /// <param name="path">The file, for messages and to resolve relative capture and map paths.</param>
    /// <exception cref="DataFileException">Something in the file cannot be used; the message names the station and value.</exception>
    public static HazardSite Read(IDictionary data, string path)
    {
        string directory = System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(path)) ?? ".";
        try
        {
            var top = new RecordFields(Pairs(data));
            string name = top.Text("Site", required: true, "Name") ?? "site";
            object? rawStations = top.Raw("Stations", required: true);
            object? rawPolicy = top.Raw("Policy", required: false);
            top.RejectUnused("is not a value of a site file (it has Site, Stations and Policy)");
            if (rawPolicy is not null and not IDictionary)
            {
                top.AddError("Policy", "must be a table of policy values (@{ Name = ...; SafetyFactor = ... }) or the path of a policy file");
            }

            if (top.Errors.Count > 0)
            {
                throw new RecordException("site file", top.Errors);
            }

            Criteria.HazardPolicy? sitePolicy = rawPolicy is IDictionary policy ? Criteria.PolicyReader.Read(policy, "its Policy", defaultName: System.IO.Path.GetFileNameWithoutExtension(path)) : null;
            var stations = new List<Station>();
            int n = 0;
            foreach (object? entry in List(rawStations))
            {
                n++;
                stations.Add(ReadStation(entry, n, directory, sitePolicy));
            }

            return new HazardSite(name, stations, path) { Policy = sitePolicy };
        }
        catch (Exception ex) when (ex is RecordException or InvalidInputException or QuantityFormatException or UnknownMaterialException)
        {
            throw new DataFileException(path, null, ex.Message, ErrorId);
        }
        catch (DataFileException ex) when (ex.ErrorId != ErrorId)
        {
            throw new DataFileException(path, null, ex.Message, ErrorId);
        }
    }

    private static Station ReadStation(object? entry, int n, string directory, Criteria.HazardPolicy? sitePolicy)
    {
        if (entry is not IDictionary table)
        {
            throw new InvalidInputException("Stations", "entry " + n + " is not a table (@{ Name = ...; Sources = ... })");
        }

        var fields = new RecordFields(Pairs(table));
        string label = "station " + n;
        string? name = fields.Text("Name", required: true);
        if (name is not null)
        {
            label = "station '" + name + "'";
        }

        object? rawSources = fields.Raw("Sources", required: true, "Source");
        Vector3D position = Vector(fields, "Position", QuantityKind.Length, label) ?? Vector3D.Zero;
        Vector3D? normal = Vector(fields, "Normal", null, label);
        double? tilt = PlacementRecordReader.Tilt(fields, normal is not null, "Normal");

        Vector3D? velocity = Vector(fields, "Velocity", QuantityKind.Speed, label);
        double? exposure = fields.Quantity("ExposureTime", QuantityKind.Time, required: false);
        double? leave = fields.Quantity("LeaveTime", QuantityKind.Time, required: false);
        double? ambient = fields.Quantity("AmbientTemperature", QuantityKind.Temperature, required: false, "Ambient");
        if (ambient is { } air && PhysicalRanges.Ambient.Problem(air) is { } airProblem)
        {
            fields.AddError("AmbientTemperature", airProblem);
        }

        string description = fields.Text("Description", required: false, "Why") ?? string.Empty;
        object? rawPolicy = fields.Raw("Policy", required: false);
        fields.RejectUnused("is not a value of " + label + " (a station has " + string.Join(", ", StationKeys) + ")");
        if (rawPolicy is not null and not IDictionary)
        {
            fields.AddError("Policy", "must be a table of policy values (@{ ExposureGroup = 'Public' }) or the path of a policy file");
        }

        if (fields.Errors.Count > 0 || name is null || rawSources is null)
        {
            throw new RecordException(label, fields.Errors);
        }

        var sources = new List<FieldSource>();
        int k = 0;
        foreach (object? s in List(rawSources))
        {
            k++;
            string sourceLabel = label + " source " + k;
            if (s is not IDictionary sourceTable)
            {
                throw new InvalidInputException("Sources", sourceLabel + " is not a table (@{ Form = 'Busbar'; ...; Waveform = @{ ... } })");
            }

            List<KeyValuePair<string, object?>> values = Pairs(sourceTable).ToList();
            KeyValuePair<string, object?> waveformPair = values.FirstOrDefault(p => RecordFields.Normalize(p.Key) == "waveform");
            if (waveformPair.Value is not IDictionary waveformTable)
            {
                throw new InvalidInputException("Waveform", sourceLabel + " needs a Waveform table (@{ Form = 'Fault'; Current = '40 kA'; ... })");
            }

            values.Remove(waveformPair);
            FieldWaveform waveform = WaveformRecordReader.Read(Pairs(waveformTable), directory, sourceLabel + " waveform");
            if (!values.Any(p => RecordFields.Normalize(p.Key) == "name"))
            {
                values.Add(new KeyValuePair<string, object?>("Name", name));
            }

            sources.Add(SourceRecordReader.Read(values, waveform, directory, sourceLabel));
        }

        Scenario.ValidateExposure(exposure);
        Scenario.ValidateLeave(leave);
        FieldSource source = FieldSource.Combine(sources, sources.Count == 1 ? sources[0].Name : name);
        // The station's values over the site's (or the published ones), named after both unless it names itself.
        Criteria.HazardPolicy? own = rawPolicy is IDictionary policyValues
            ? Criteria.PolicyReader.Read(policyValues, label + ", its Policy", sitePolicy, (sitePolicy?.Name ?? "published limits") + " at " + name)
            : null;
        return new Station(name, source, new Placement(position, normal, velocity, tilt), exposure, leave, description) { Policy = own, AmbientCelsius = ambient };
    }

    private static Vector3D? Vector(RecordFields fields, string name, QuantityKind? kind, string label)
    {
        object? raw = fields.Raw(name, required: false);
        if (raw is null)
        {
            return null;
        }

        try
        {
            return VectorParser.Parse(raw, name, kind);
        }
        catch (InvalidInputException ex)
        {
            fields.AddError(name, ex.Reason);
            return null;
        }
    }

    private static IEnumerable<object?> List(object? value) => value switch
    {
        null => Array.Empty<object?>(),
        IDictionary single => new object?[] { single },
        IEnumerable many when value is not string => many.Cast<object?>(),
        _ => new[] { value },
    };

    private static IEnumerable<KeyValuePair<string, object?>> Pairs(IDictionary table) => RecordFields.FromTable(table);
}
