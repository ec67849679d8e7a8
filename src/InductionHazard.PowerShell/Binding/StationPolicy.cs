using InductionHazard.Assessment;
using InductionHazard.Criteria;

namespace InductionHazard.PowerShell.Binding;

/// <summary>What a command's -Policy does to a site's station that has a policy of its own.</summary>
internal static class StationPolicy
{
    /// <summary>
    /// The warning that -Policy replaces the station's own policy (which a visitors' station would otherwise lose
    /// unseen), or null when the station has none.
    /// </summary>
    /// <param name="station">The station.</param>
    /// <param name="replacement">The policy given with -Policy.</param>
    public static string? Replaced(Station station, HazardPolicy replacement) =>
        station.Policy is not { } own ? null
        : "-Policy replaces the own policy of station '" + station.Name + "' ('" + own.Name + "'"
            + (own.ExposureGroup == ExposureGroup.Public ? ", which judges the public's exposure" : string.Empty)
            + "): it is judged by '" + replacement.Name + "' alone.";
}
