using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Criteria;

/// <summary>
/// The limits and the safety factor an assessment applies. The defaults come from published standards (each
/// cited in <see cref="Standards"/>); a site policy may override any of them.
/// </summary>
public sealed class HazardPolicy
{
    private string? _fingerprint;
    private HazardPolicy? _forPublic;

    // Set on the copy that judges a row's wearer as one of the public under a policy that judges workers (see For).
    private string? _groupSetBy;

    /// <summary>
    /// The policy this one was merged over (a station's own over its site's), whose source a value this one does not set
    /// itself keeps; null for a policy read on its own.
    /// </summary>
    internal HazardPolicy? Basis { get; init; }

    /// <summary>The keys (and "ExposureGroup") this policy's own table sets, where it was merged over <see cref="Basis"/>.</summary>
    internal System.Collections.Generic.IReadOnlyCollection<string>? OwnKeys { get; init; }

    /// <summary>Whether a value comes from <see cref="Basis"/>: this policy's table does not set it.</summary>
    private bool Inherits(string key) => Basis is not null && OwnKeys is not null && !System.Linq.Enumerable.Contains(OwnKeys, key);

    /// <summary>The default policy: published limits and a safety factor of 2.</summary>
    public static HazardPolicy Default { get; } = new();

    /// <summary>The policy's name, shown in every assessment.</summary>
    public string Name { get; init; } = "default (published limits)";

    /// <summary>The factor between Clear and Caution: a margin at or above it is Clear (site policy; default 2).</summary>
    public double SafetyFactor { get; init; } = 2.0;

    /// <summary>The largest alternating voltage a person may bridge, V rms (IEC 61140 ELV).</summary>
    public double AlternatingVoltageLimitRms { get; init; } = 50.0;

    /// <summary>The largest unidirectional voltage a person may bridge, V (IEC 61140 ELV, ripple-free d.c.).</summary>
    public double DirectVoltageLimit { get; init; } = 120.0;

    /// <summary>
    /// The largest charge a short unidirectional pulse across a gap may drive through a person, C (IEC 60335-1
    /// clause 8.1.4: 45 µC). A pulse within it passes even above the d.c. voltage limit.
    /// </summary>
    public double ImpulseChargeLimit { get; init; } = 45e-6;

    /// <summary>The body resistance through which a pulse's charge and energy are reckoned, ohm (IEC TS 60479-1: 500 ohm).</summary>
    public double BodyResistanceOhms { get; init; } = 500.0;

    /// <summary>
    /// The largest static field a worker's head and trunk may be in, T (ICNIRP 2009: 2 T; up to 8 T where the
    /// environment is controlled and work practices fit it, which is a site's decision).
    /// </summary>
    public double StaticExposureLimitTesla { get; init; } = ExposureLimits.StaticOccupationalTesla;

    /// <summary>
    /// Whose exposure the person's own field is judged for: workers (the occupational limits, the default) or the
    /// general public (ICNIRP 2009's 400 mT static limit and ICNIRP 2010's public reference levels), for a place where
    /// visitors or untrained people wear or hold items.
    /// </summary>
    public ExposureGroup ExposureGroup { get; init; } = ExposureGroup.Occupational;

    /// <summary>The contact burn threshold against contact time (ISO 13732-1).</summary>
    public ContactBurnThreshold ContactBurn { get; init; } = ContactBurnThreshold.UncoatedMetal;

    /// <summary>The largest thermal dose for skin, CEM43 minutes (van Rhoon et al. 2013).</summary>
    public double ThermalDoseLimitMinutes { get; init; } = 2.0;

    /// <summary>
    /// The fastest a loose item may be launched by the field, m/s: a site's own value (no standard gives one); NaN,
    /// the default, when the site sets none and only the force against the weight is judged.
    /// </summary>
    public double LaunchSpeedLimit { get; init; } = double.NaN;

    /// <summary>How long a person touches an item that is not worn or held (a brief touch), s.</summary>
    public double TouchSeconds { get; init; } = 1.0;

    /// <summary>
    /// A SHA-256 fingerprint of every value the policy applies (its name, factor, limits and the burn threshold's
    /// points, and the exposure group where it is the public's), so that a report shows which policy produced it and an
    /// auditor can tell two policies apart. The group is added only where it is not the default, so that a policy that
    /// judges workers keeps the fingerprint it had before policies could name a group.
    /// </summary>
    public string Fingerprint => _fingerprint ??= TextHash.Sha256(string.Join(
        "|",
        Name,
        TextHash.Exact(SafetyFactor),
        TextHash.Exact(AlternatingVoltageLimitRms),
        TextHash.Exact(DirectVoltageLimit),
        TextHash.Exact(ImpulseChargeLimit),
        TextHash.Exact(BodyResistanceOhms),
        TextHash.Exact(StaticExposureLimitTesla),
        TextHash.Exact(ThermalDoseLimitMinutes),
        TextHash.Exact(TouchSeconds),
        TextHash.Exact(LaunchSpeedLimit),
        ContactBurn.Source,
        string.Join(";", System.Linq.Enumerable.Select(ContactBurn.Points, p => TextHash.Exact(p.Seconds) + "s=" + TextHash.Exact(p.Celsius))))
        + (ExposureGroup == ExposureGroup.Occupational ? string.Empty : "|ExposureGroup=" + ExposureGroup));

    /// <summary>The keys a site policy may set, each with its kind, unit and published source.</summary>
    public static System.Collections.Generic.IReadOnlyList<PolicyKey> Keys { get; } = new[]
    {
        new PolicyKey("SafetyFactor", null, string.Empty, p => p.SafetyFactor, Standards.SafetyFactor, "the factor between Clear and Caution: a margin at or above it is Clear"),
        new PolicyKey("AlternatingVoltageLimit", QuantityKind.Voltage, "V", p => p.AlternatingVoltageLimitRms, Standards.ExtraLowVoltage, "the largest alternating voltage (rms) a person may bridge across a gap"),
        new PolicyKey("DirectVoltageLimit", QuantityKind.Voltage, "V", p => p.DirectVoltageLimit, Standards.ExtraLowVoltage, "the largest unidirectional voltage a person may bridge across a gap"),
        new PolicyKey("ImpulseChargeLimit", QuantityKind.ElectricCharge, "C", p => p.ImpulseChargeLimit, Standards.ImpulseCharge, "the largest charge a pulse of at most 10 ms across a gap may drive through a person"),
        new PolicyKey("BodyResistance", QuantityKind.Resistance, "Ω", p => p.BodyResistanceOhms, Standards.BodyResistance, "the body resistance through which a pulse's charge and energy are reckoned"),
        new PolicyKey("StaticExposureLimit", QuantityKind.MagneticFluxDensity, "T", p => p.StaticExposureLimitTesla, ExposureLimits.StaticSource, "the largest static field a worker's head and trunk may be in (occupational)"),
        new PolicyKey("ThermalDoseLimit", null, "CEM43 min", p => p.ThermalDoseLimitMinutes, Standards.ThermalDoseLimit, "the largest thermal dose the field may add to skin in contact, CEM43 minutes"),
        new PolicyKey("TouchTime", QuantityKind.Time, "s", p => p.TouchSeconds, Standards.BriefTouch, "how long a person touches an item that is not worn or held"),
        new PolicyKey("LaunchSpeedLimit", QuantityKind.Speed, "m/s", p => p.LaunchSpeedLimit, "not set: no standard gives one; a site may", "the fastest a loose item may be launched by the field (judged only where a site sets it)", Optional: true),
    };

    /// <summary>Every value the policy sets, with its source: the published one, or "site policy" where this policy departs from it.</summary>
    public System.Collections.Generic.IReadOnlyList<PolicyLimit> Limits =>
        System.Linq.Enumerable.ToArray(System.Linq.Enumerable.Select(Keys, k => new PolicyLimit(k.Name, k.Value(this), k.Unit, SourceOf(k.Name), k.Description)));

    /// <summary>
    /// Where a value comes from: its published source where the policy keeps the default value, otherwise the site
    /// policy by name, with the value ("site policy 'Bay rules': AlternatingVoltageLimit = 25 V").
    /// </summary>
    /// <exception cref="System.ArgumentException">The key is not one of <see cref="Keys"/>.</exception>
    public string SourceOf(string key)
    {
        PolicyKey k = System.Linq.Enumerable.FirstOrDefault(Keys, x => x.Name == key) ?? throw new System.ArgumentException("not a policy key: " + key, nameof(key));
        double value = k.Value(this);
        return value.Equals(k.Value(Default))
            ? k.Published
            : Inherits(k.Name) ? Basis!.SourceOf(key)
            : "site policy '" + Name + "': " + k.Name + " = " + (k.Unit.Length > 0 ? SiFormat.Format(value, k.Unit) : SiFormat.Plain(value));
    }

    /// <summary>True when any value departs from the published defaults, or the policy judges the public's exposure.</summary>
    public bool IsSitePolicy => ExposureGroup != Default.ExposureGroup || System.Linq.Enumerable.Any(Keys, k => !k.Value(this).Equals(k.Value(Default)));

    /// <summary>
    /// Where the exposure group comes from: the published occupational limits by default, or the site policy by name
    /// ("site policy 'Gallery rules': ExposureGroup = Public").
    /// </summary>
    public string ExposureGroupSource => _groupSetBy ?? (ExposureGroup == Default.ExposureGroup
        ? "occupational exposure (ICNIRP 2009, ICNIRP 2010)"
        : Inherits(nameof(ExposureGroup)) ? Basis!.ExposureGroupSource
        : "site policy '" + Name + "': ExposureGroup = " + ExposureGroup);

    /// <summary>
    /// The policy for a wearer or holder whose group an inventory row names (its ExposureGroup column): a visitor's
    /// item among workers' is judged at the public's limits, by a copy of this policy that differs from it in the group
    /// alone and says where that came from (its fingerprint differs too, so a report lists it as a policy of its own). A
    /// row can only make the judgement stricter: a worker named under a policy that judges the public, or no group, gives
    /// this policy unchanged.
    /// </summary>
    /// <param name="wearer">The group the row names, or null.</param>
    public HazardPolicy For(ExposureGroup? wearer)
    {
        if (wearer != ExposureGroup.Public || ExposureGroup == ExposureGroup.Public)
        {
            return this;
        }

        return _forPublic ??= new HazardPolicy
        {
            Name = Name,
            SafetyFactor = SafetyFactor,
            AlternatingVoltageLimitRms = AlternatingVoltageLimitRms,
            DirectVoltageLimit = DirectVoltageLimit,
            ImpulseChargeLimit = ImpulseChargeLimit,
            BodyResistanceOhms = BodyResistanceOhms,
            StaticExposureLimitTesla = StaticExposureLimitTesla,
            ExposureGroup = ExposureGroup.Public,
            ContactBurn = ContactBurn,
            ThermalDoseLimitMinutes = ThermalDoseLimitMinutes,
            LaunchSpeedLimit = LaunchSpeedLimit,
            TouchSeconds = TouchSeconds,
            Basis = Basis,
            OwnKeys = OwnKeys,
            _groupSetBy = "inventory row: ExposureGroup = Public (the policy '" + Name + "' judges workers)",
        };
    }

    /// <summary>The span each value may take: wide enough for any site's rules, narrow enough to catch a wrong unit.</summary>
    private static readonly PhysicalRange[] Ranges =
    {
        new("SafetyFactor", 1.0, 100.0, string.Empty, "a factor below 1 would call a breach Clear; above 100 it is no longer a margin but a ban"),
        new("AlternatingVoltageLimit", 1.0, 1000.0, "V", "a voltage a person may bridge, from a cautious 1 V to the 1 kV where low voltage ends"),
        new("DirectVoltageLimit", 1.0, 1500.0, "V", "a voltage a person may bridge, from a cautious 1 V to the 1.5 kV where low voltage d.c. ends"),
        new("ImpulseChargeLimit", 1e-7, 2e-4, "C", "from 0.1 µC, below perception, to 0.2 mC, still five times below the 1 mC that can fibrillate the heart in a 1 µs pulse"),
        new("BodyResistance", 100.0, 10_000.0, "Ω", "from the 100 ohm of a body's interior alone to the 10 kohm of dry skin at a low voltage"),
        new("StaticExposureLimit", 0.1, 8.0, "T", "from a cautious 0.1 T to the 8 T ICNIRP 2009 allows for specific work in a controlled environment"),
        new("ThermalDoseLimit", 0.01, 1000.0, "CEM43 min", "from a hundredth of a minute at 43 degC to the doses of thermal ablation"),
        new("TouchTime", 0.01, Scenario8Hours, "s", "from a 10 ms flick to the 8 h longest contact of ISO 13732-1"),
        new("LaunchSpeedLimit", 0.01, 30.0, "m/s", "from a creep to the speed of a thrown item"),
    };

    private const double Scenario8Hours = 8 * 3600.0;

    /// <summary>Checks the values; throws naming the first out of range.</summary>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public HazardPolicy Validated()
    {
        // A policy's values are fixed once it is made: one check is enough, however many items it judges.
        if (_validated)
        {
            return this;
        }

        if (!(SafetyFactor >= 1) || double.IsInfinity(SafetyFactor))
        {
            throw new InvalidInputException("SafetyFactor", "must be a finite number of at least 1; got " + SafetyFactor);
        }

        foreach (PhysicalRange range in Ranges)
        {
            PolicyKey key = System.Linq.Enumerable.First(Keys, k => k.Name == range.Field);
            double value = key.Value(this);
            if (!(key.Optional && double.IsNaN(value)))
            {
                range.Check(value);
            }
        }

        _validated = true;
        return this;
    }

    private bool _validated;
}
