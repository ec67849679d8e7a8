namespace InductionHazard.Criteria;

/// <summary>
/// Limits on a person's own exposure to magnetic flux density: the ICNIRP 2010 reference levels for time-varying
/// fields (rms, 1 Hz to 10 MHz; Health Phys 99:818, tables 3 and 4), the ICNIRP 2009 limits for static fields
/// (Health Phys 96:504), and the action levels of Directive 2013/35/EU for implanted devices and projectiles.
/// </summary>
public static class ExposureLimits
{
    /// <summary>The lowest frequency of the time-varying reference levels, Hz; below it a field counts as static.</summary>
    public const double LowestHertz = 1;

    /// <summary>
    /// True when a frequency counts as static: below <see cref="LowestHertz"/> by more than rounding. A frequency at
    /// 1 Hz to within rounding (the knee of a 0.35 s rise read as "350 ms" is 0.9999999999999999 Hz) takes the
    /// time-varying levels, the stricter side, so that how a value was written cannot move it across the line.
    /// </summary>
    public static bool CountsAsStatic(double f) => Below(f, LowestHertz);

    /// <summary>
    /// True when a frequency lies below a corner of the reference levels by more than rounding: a frequency within
    /// rounding of a corner is read as the corner itself, which belongs to the band above it, as in the tables. A
    /// record's harmonic at 25 Hz is then weighted alike whether its window came out as 1.4 s or 1.4000000000000001 s.
    /// </summary>
    /// <param name="f">The frequency, Hz.</param>
    /// <param name="corner">The corner, Hz.</param>
    public static bool Below(double f, double corner) => f < corner * (1 - 1e-9);

    /// <summary>The highest frequency of the reference levels used here, Hz.</summary>
    public const double HighestHertz = 10e6;

    /// <summary>Static field, occupational, head and trunk, T (ICNIRP 2009).</summary>
    public const double StaticOccupationalTesla = 2;

    /// <summary>Static field, occupational, limbs, T (ICNIRP 2009).</summary>
    public const double StaticLimbsTesla = 8;

    /// <summary>Static field, general public, T (ICNIRP 2009).</summary>
    public const double StaticPublicTesla = 0.4;

    /// <summary>Interference with active implanted devices (pacemakers), T (Directive 2013/35/EU annex II; from memory).</summary>
    public const double ImplantTesla = 0.5e-3;

    /// <summary>Attraction and projectile risk near sources above 100 mT, T (Directive 2013/35/EU annex II; from memory).</summary>
    public const double ProjectileTesla = 3e-3;

    /// <summary>The source of the time-varying reference levels.</summary>
    public const string TimeVaryingSource = "ICNIRP 2010, Health Phys 99:818 (reference levels for magnetic flux density, tables 3 and 4)";

    /// <summary>The source of the weighted-peak method for pulsed and complex fields.</summary>
    public const string WeightedPeakSource = "ICNIRP 2010 and ICNIRP 2003, Health Phys 84:383 (the weighted-peak method for pulsed and non-sinusoidal fields)";

    /// <summary>The source of the static limits.</summary>
    public const string StaticSource = "ICNIRP 2009, Health Phys 96:504 (static magnetic fields)";

    /// <summary>The source of the implant and projectile lines.</summary>
    public const string ActionLevelSource = "Directive 2013/35/EU annex II (action levels for implanted devices and projectiles; from memory)";

    /// <summary>
    /// The occupational reference level at a frequency, T rms: 0.2/f^2 (1-8 Hz), 2.5e-2/f (8-25 Hz), 1e-3 (25-300 Hz),
    /// 0.3/f (300 Hz-3 kHz), 1e-4 (3 kHz-10 MHz); NaN outside 1 Hz-10 MHz.
    /// </summary>
    public static double OccupationalTesla(double f) =>
        CountsAsStatic(f) || f > HighestHertz ? double.NaN
        : Below(f, 8) ? 0.2 / (f * f)
        : Below(f, 25) ? 2.5e-2 / f
        : Below(f, 300) ? 1e-3
        : Below(f, 3000) ? 0.3 / f
        : 1e-4;

    /// <summary>
    /// The general-public reference level at a frequency, T rms: 4e-2/f^2 (1-8 Hz), 5e-3/f (8-25 Hz), 2e-4 (25-400 Hz),
    /// 8e-2/f (400 Hz-3 kHz), 2.7e-5 (3 kHz-10 MHz); NaN outside 1 Hz-10 MHz.
    /// </summary>
    public static double PublicTesla(double f) =>
        CountsAsStatic(f) || f > HighestHertz ? double.NaN
        : Below(f, 8) ? 4e-2 / (f * f)
        : Below(f, 25) ? 5e-3 / f
        : Below(f, 400) ? 2e-4
        : Below(f, 3000) ? 8e-2 / f
        : 2.7e-5;
}
