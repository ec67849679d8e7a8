namespace InductionHazard.Thermal;

/// <summary>Facts about skin that set the starting point of a worn or held item.</summary>
public static class SkinContact
{
    /// <summary>
    /// The surface temperature of skin, about 33 °C: an item worn or held starts there (common practice; mean skin
    /// temperature of a resting person in a comfortable room is 32-34 °C).
    /// </summary>
    public const double SurfaceCelsius = 33.0;
}
