namespace InductionHazard.Criteria;

/// <summary>The published sources of the module's limits, cited the same way everywhere.</summary>
public static class Standards
{
    /// <summary>Extra-low voltage limits.</summary>
    public const string ExtraLowVoltage = "IEC 61140 / IEC 60364-4-41 section 414 (extra-low voltage: 50 V a.c. rms, 120 V ripple-free d.c.)";

    /// <summary>The charge a person may take from a short pulse across a gap.</summary>
    public const string ImpulseCharge = "IEC 60335-1 clause 8.1.4 (a discharge a person may take from an accessible part: up to 15 kV peak, at most 45 µC and no more than 0.1 µF charged to the peak; above 15 kV, at most 350 mJ)";

    /// <summary>The body resistance through which a pulse's charge is reckoned.</summary>
    public const string BodyResistance = "IEC TS 60479-1 (the body's initial resistance, hand to hand, about 500 Ω, below the 5 % total impedance at any touch voltage; from memory)";

    /// <summary>Contact burn thresholds of hot surfaces.</summary>
    public const string ContactBurn = "ISO 13732-1:2006 (burn thresholds for skin contact with hot surfaces, uncoated metal)";

    /// <summary>The thermal dose model.</summary>
    public const string ThermalDoseModel = "Sapareto and Dewey, Int J Radiat Oncol Biol Phys 10:787 (1984) (CEM43)";

    /// <summary>The thermal dose limit.</summary>
    public const string ThermalDoseLimit = "van Rhoon et al., Eur Radiol 23:2215 (2013) (2 CEM43 for uncontrolled exposure)";

    /// <summary>Melting points and solidus temperatures of the materials.</summary>
    public const string Melting = "material melting point or solidus (see Get-ConductorMaterial for each value's source)";

    /// <summary>The force criterion.</summary>
    public const string ForceAgainstWeight = "ASTM F2052 criterion (magnetically induced force below the item's weight)";

    /// <summary>The torque criterion.</summary>
    public const string TorqueAgainstGravity = "ASTM F2213 criterion (magnetically induced torque below the worst-case gravitational torque, taken as m g L/2)";

    /// <summary>The breakdown of a gap in air.</summary>
    public const string GapBreakdown = "Paschen's law for air (Raizer, Gas Discharge Physics, 1991; measured minimum 327 V as a floor) and the measured uniform-field fit of Kuffel, Zaengl and Kuffel (2000), the lower of the two";

    /// <summary>The attraction criterion.</summary>
    public const string AttractionAgainstWeight = "ASTM F2052 criterion (magnetic pull on a ferromagnetic item below its weight)";

    /// <summary>The demagnetising factors of the magnetisation model.</summary>
    public const string Demagnetisation = "Osborn, Phys. Rev. 67:351 (1945) (demagnetising factors of spheroids)";

    /// <summary>The safety factor between Clear and Caution when no site policy sets one.</summary>
    public const string SafetyFactor = "common practice: a safety factor of 2 between Clear and Caution";

    /// <summary>How long a brief touch lasts when an item is not worn or held.</summary>
    public const string BriefTouch = "common practice: a brief touch of 1 s for an item that is not worn or held";

    /// <summary>Where a policy's safety factor comes from: common practice for the default, the site policy where it sets another.</summary>
    public static string SafetyFactorOf(HazardPolicy policy) => policy.SourceOf("SafetyFactor");
}
