using InductionHazard.Assessment;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// The warning that -AmbientTemperature replaces the air a site's station gives (a furnace's warm air would otherwise be
/// lost unseen, and with it the skin's smaller rise to its burn threshold).
/// </summary>
internal static class StationAir
{
    /// <summary>The warning, or null when the station gives no air of its own or the same as the one given.</summary>
    /// <param name="station">The station.</param>
    /// <param name="givenCelsius">The temperature given with -AmbientTemperature, °C.</param>
    public static string? Replaced(Station station, double givenCelsius) =>
        station.AmbientCelsius is not { } own || own == givenCelsius ? null
        : "-AmbientTemperature replaces the air of station '" + station.Name + "' (" + SiFormat.Celsius(own) + "): its items are assessed in air at "
            + SiFormat.Celsius(givenCelsius) + ", unless a row gives its own.";
}
