namespace InductionHazard.Items;

/// <summary>The geometric form of a conductive item.</summary>
public enum ItemShape
{
    /// <summary>A circular loop of round wire or of a rectangular band: rings, bands, bracelets, bangles; closed or split.</summary>
    Ring,

    /// <summary>A rectangular loop of round wire: a frame, a ladder section, a tool that closes a loop; closed or open.</summary>
    RectangularLoop,
}
