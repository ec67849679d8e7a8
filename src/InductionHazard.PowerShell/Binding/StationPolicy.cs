using InductionHazard.Assessment;
using InductionHazard.Criteria;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// The warnings about which policy judges a row: -Policy over a site's station that has a policy of its own, and a row's
/// ExposureGroup that a policy for the public does not let it loosen.
/// </summary>
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

    /// <summary>
    /// The warning that a row's ExposureGroup 'Occupational' is not applied under a policy that judges the public (a row
    /// can only make the judgement stricter), or null when it is applied or the row names no group.
    /// </summary>
    /// <param name="itemName">The row's item name.</param>
    /// <param name="wearer">The group the row names.</param>
    /// <param name="judged">The group the row was judged for.</param>
    /// <param name="policyName">The policy the row was judged by.</param>
    public static string? WearerNotApplied(string itemName, ExposureGroup? wearer, ExposureGroup judged, string policyName) =>
        wearer == ExposureGroup.Occupational && judged == ExposureGroup.Public
            ? itemName + ": ExposureGroup 'Occupational' is not applied: the policy '" + policyName
                + "' judges the public's exposure, and a row can only make the judgement stricter (judge workers' items in a run of their own with -Policy)."
            : null;
}
