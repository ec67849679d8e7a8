using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>A site as data: its name and its stations, the places where items are assessed.</summary>
public sealed class HazardSite
{
    private readonly Dictionary<string, Station> _byName;

    /// <summary>Creates the site.</summary>
    /// <exception cref="InvalidInputException">No stations, or two stations with one name.</exception>
    public HazardSite(string name, IReadOnlyList<Station> stations, string path)
    {
        if (stations.Count == 0)
        {
            throw new InvalidInputException("Stations", "a site needs at least one station");
        }

        _byName = new Dictionary<string, Station>(StringComparer.Ordinal);
        foreach (Station s in stations)
        {
            string key = RecordFields.Normalize(s.Name);
            if (_byName.ContainsKey(key))
            {
                throw new InvalidInputException("Stations", "two stations are named '" + s.Name + "'");
            }

            _byName[key] = s;
        }

        Name = name;
        Stations = stations;
        Path = path;
    }

    /// <summary>The site's name.</summary>
    public string Name { get; }

    /// <summary>The stations, in the file's order.</summary>
    public IReadOnlyList<Station> Stations { get; }

    /// <summary>The site's own policy, from its file; null when the site keeps the published limits.</summary>
    public Criteria.HazardPolicy? Policy { get; init; }

    /// <summary>
    /// The policy that applies at a station: the station's own (its file's values merged over the site's), else the
    /// site's; null when neither sets one and the published limits apply.
    /// </summary>
    /// <exception cref="InvalidInputException">No station has that name.</exception>
    public Criteria.HazardPolicy? PolicyAt(string station) => Find(station).Policy ?? Policy;

    /// <summary>The file the site was read from.</summary>
    public string Path { get; }

    /// <summary>Finds a station by name (case, spaces and punctuation aside).</summary>
    /// <exception cref="InvalidInputException">No station has that name; the message lists the stations.</exception>
    public Station Find(string name) =>
        _byName.TryGetValue(RecordFields.Normalize(name), out Station? s)
            ? s
            : throw new InvalidInputException("Station", "'" + name + "' is not a station of " + Name + " (its stations: " + string.Join(", ", Stations.Select(x => x.Name)) + ")");

    /// <summary>The other names a Station column may have. Not "Location": inventories keep an asset's location of their own.</summary>
    public static IReadOnlyList<string> StationAliases { get; } = new[] { "Place", "StationName" };

    /// <summary>The station a data record names in its Station column (aliases Place, StationName).</summary>
    /// <exception cref="RecordException">The record names no station.</exception>
    /// <exception cref="InvalidInputException">It names one the site does not have.</exception>
    public Station StationOf(IEnumerable<KeyValuePair<string, object?>> record, string label)
    {
        string? name = new RecordFields(record).Text("Station", required: false, StationAliases.ToArray());
        return name is null
            ? throw new RecordException(label, new[]
            {
                new FieldError("Station", "is missing: name one of the stations of " + Name + " (" + string.Join(", ", Stations.Select(s => s.Name)) + "), or give -Station", "InvalidInput"),
            })
            : Find(name);
    }

    /// <inheritdoc />
    public override string ToString() => Name;
}

/// <summary>
/// A place on a site: the source whose field is there, where an item sits in it and how it faces, how long it
/// stays, and why the station is assessed.
/// </summary>
/// <param name="Name">The station's name, as inventory rows name it.</param>
/// <param name="Source">The field there (several sources summed).</param>
/// <param name="Placement">Where an item's loop is centred and how it faces (null normal: the worst orientation, turned by its tilt where it gives one).</param>
/// <param name="ExposureSeconds">How long an item stays, s; null for the default.</param>
/// <param name="LeaveSeconds">How long carrying an item out takes, s; null for the default.</param>
/// <param name="Description">Why the station is assessed, in a sentence.</param>
public sealed record Station(string Name, FieldSource Source, Placement Placement, double? ExposureSeconds, double? LeaveSeconds, string Description)
{
    /// <summary>
    /// The station's own policy (a visitors' gallery judging the public's exposure, a controlled magnet hall with a
    /// higher static limit), merged over the site's; null when the site's applies.
    /// </summary>
    public Criteria.HazardPolicy? Policy { get; init; }

    /// <summary>
    /// The temperature of the air around the station, °C (the warm air at a furnace's mouth), for the items assessed
    /// there; null for the run's.
    /// </summary>
    public double? AmbientCelsius { get; init; }

    /// <inheritdoc />
    public override string ToString() => Name;
}
