using System;
using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// The sizes of things people wear, carry or install, by shape (common practice): a value outside is far more
/// likely a unit slip ('20 m' for '20 mm', a bare number taken as metres) than a real item, so it is refused,
/// naming the field and the value it would be in millimetres, unless it is accepted deliberately.
/// </summary>
public static class PlausibleSizes
{
    /// <summary>An item's overall size (a loop's diameter or side, a body's diameter or length), by shape, m.</summary>
    private static readonly Dictionary<ItemShape, (double Min, double Max, string What)> Overall = new()
    {
        [ItemShape.Ring] = (3e-3, 30.0, "a ring, band or cable loop: from a small earring to a loop of cable 30 m across"),
        [ItemShape.RectangularLoop] = (5e-3, 30.0, "a frame, ladder or cable loop: up to 30 m a side"),
        [ItemShape.Disc] = (1e-3, 10.0, "a disc or plate up to 10 m across"),
        [ItemShape.Cylinder] = (1e-3, 10.0, "a rod, shaft or pin up to 10 m"),
        [ItemShape.Tube] = (1e-3, 10.0, "a pipe or gas cylinder up to 10 m"),
        [ItemShape.Sphere] = (1e-3, 2.0, "a ball or float up to 2 m across"),
        [ItemShape.Plate] = (1e-3, 10.0, "a plate or sheet up to 10 m"),
        [ItemShape.Bar] = (1e-3, 10.0, "a bar, rail or tool head up to 10 m"),
    };

    /// <summary>The thinnest dimension of a conductor's section (a wire, a band's thickness, a wall), m.</summary>
    private const double ThinnestSection = 50e-6;

    /// <summary>The largest a worn item is: a belt, a collar or a bangle, m.</summary>
    public const double LargestWorn = 0.5;

    /// <summary>The fields that give an item's overall size, by shape.</summary>
    public static IReadOnlyList<string> OverallFields(ItemShape shape) => shape switch
    {
        ItemShape.Ring => new[] { "Diameter", "InnerDiameter" },
        ItemShape.RectangularLoop => new[] { "Width", "Height" },
        ItemShape.Plate => new[] { "Width", "Height" },
        ItemShape.Bar => new[] { "Width", "Height", "Length" },
        ItemShape.Cylinder or ItemShape.Tube => new[] { "Diameter", "Length" },
        _ => new[] { "Diameter" },
    };

    /// <summary>The fields that give the thickness of an item's conductor, by shape.</summary>
    public static IReadOnlyList<string> SectionFields(ItemShape shape) => shape switch
    {
        ItemShape.Ring => new[] { "WireDiameter", "Width", "Thickness" },
        ItemShape.RectangularLoop => new[] { "WireDiameter" },
        ItemShape.Plate or ItemShape.Disc => new[] { "Thickness" },
        ItemShape.Tube => new[] { "WallThickness" },
        _ => Array.Empty<string>(),
    };

    /// <summary>What is wrong with an overall size for a shape, after the field's name; null when plausible.</summary>
    public static string? OverallProblem(ItemShape shape, double meters)
    {
        (double min, double max, string what) = Overall[shape];
        return meters >= min && meters <= max ? null : Unusual(meters, min, max, what);
    }

    /// <summary>What is wrong with a section dimension for a shape, after the field's name; null when plausible.</summary>
    public static string? SectionProblem(ItemShape shape, double meters)
    {
        (_, double max, _) = Overall[shape];
        return meters >= ThinnestSection && meters <= max / 2 ? null : Unusual(meters, ThinnestSection, max / 2, "the conductor of " + Article(shape));
    }

    private static string Article(ItemShape shape) => shape switch
    {
        ItemShape.RectangularLoop => "a loop",
        _ => "a " + shape.ToString().ToLowerInvariant(),
    };

    private static string Unusual(double meters, double min, double max, string what)
    {
        string hint = meters > max && meters / 1000 >= min && meters / 1000 <= max
            ? "; did you mean " + SiFormat.Format(meters / 1000, "m") + " (the number in mm)?"
            : string.Empty;
        return SiFormat.Format(meters, "m") + " is outside the sizes of " + what + " (" + SiFormat.Format(min, "m") + " to " + SiFormat.Format(max, "m") + ")" + hint
            + ". Check the unit, or accept the size deliberately (-AcceptUnusualSize, or an AcceptUnusualSize column set to true)";
    }
}
