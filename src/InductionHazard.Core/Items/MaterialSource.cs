namespace InductionHazard.Items;

/// <summary>The wording of material value sources, so that their status reads the same everywhere.</summary>
internal static class MaterialSource
{
    /// <summary>A value seen in the named source.</summary>
    public static string Confirmed(string source) => source;

    /// <summary>A value recalled from the named source and not yet checked against a printed copy.</summary>
    public static string FromMemory(string source) => source + " (from memory; not yet checked against a printed copy)";

    public const string Iec60028 = "IEC 60028, international standard of resistance for copper";
    public const string Iec60949 = "IEC 60949 / IEC 60364-5-54 Annex A (rho20 and beta of aluminium)";
    public const string Its90 = "ITS-90 defining fixed point";
    public const string Crc = "CRC Handbook of Chemistry and Physics";
    public const string Asm = "ASM Handbook / ASM material data sheet";
    public const string Iec60751 = "IEC 60751 (industrial platinum resistance thermometers, alpha = 0.00385)";
    public const string NoAlpha = "no confirmed value: resistivity held at its 20 °C value (overstates heating of an emf-driven loop, understates it in the inductive limit)";
}
