using System;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Assessment;

/// <summary>One item at one place in one source's field, for a stated time, in stated surroundings.</summary>
public sealed class Scenario
{
    /// <summary>The longest exposure the module assesses, s: 8 h, the longest contact time of ISO 13732-1.</summary>
    public const double LongestExposureSeconds = 8 * 3600.0;

    /// <summary>Creates the scenario.</summary>
    /// <param name="item">The item.</param>
    /// <param name="source">The field source.</param>
    /// <param name="placement">Where the item is and how it faces; null: at the origin facing the field.</param>
    /// <param name="exposureSeconds">How long the item stays in the field from the start of the drive; null: as long as the drive changes (a continuous drive: 8 h). The cooling that follows is assessed too, as the item is still worn or held.</param>
    /// <param name="environment">The surroundings; null: still air at 20 °C.</param>
    /// <exception cref="InvalidInputException">The exposure time is out of range.</exception>
    public Scenario(ConductiveItem item, FieldSource source, Placement? placement = null, double? exposureSeconds = null, ThermalEnvironment? environment = null)
    {
        ValidateExposure(exposureSeconds);
        Item = item;
        Source = source;
        Placement = placement ?? Placement.FacingField;
        ExposureSeconds = exposureSeconds;
        Environment = environment ?? ThermalEnvironment.StillAir;
    }

    /// <summary>The item.</summary>
    public ConductiveItem Item { get; }

    /// <summary>Checks an exposure time: from 0.1 s to 8 h (<see cref="PhysicalRanges.ExposureTime"/>).</summary>
    /// <exception cref="InvalidInputException">It is out of range.</exception>
    public static void ValidateExposure(double? exposureSeconds)
    {
        if (exposureSeconds is { } e)
        {
            PhysicalRanges.ExposureTime.Check(e);
        }
    }

    /// <summary>The source.</summary>
    public FieldSource Source { get; }

    /// <summary>The item's placement.</summary>
    public Placement Placement { get; }

    /// <summary>How long the item stays in the field from the start of the drive, s; null for the default.</summary>
    public double? ExposureSeconds { get; }

    /// <summary>The surroundings.</summary>
    public ThermalEnvironment Environment { get; }

    /// <summary>
    /// The item's temperature when the drive starts, °C: a worn or held item is at skin temperature (or ambient,
    /// if warmer); any other item at ambient.
    /// </summary>
    public double InitialCelsius => Item.Contact is ContactKind.Skin or ContactKind.Held
        ? Math.Max(Environment.AmbientCelsius, SkinContact.SurfaceCelsius)
        : Environment.AmbientCelsius;
}
