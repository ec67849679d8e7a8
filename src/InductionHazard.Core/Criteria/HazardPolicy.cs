using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Criteria;

/// <summary>
/// The limits and the safety factor an assessment applies. The defaults come from published standards (each
/// cited in <see cref="Standards"/>); a site policy may override any of them.
/// </summary>
public sealed class HazardPolicy
{
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

    /// <summary>The contact burn threshold against contact time (ISO 13732-1).</summary>
    public ContactBurnThreshold ContactBurn { get; init; } = ContactBurnThreshold.UncoatedMetal;

    /// <summary>The largest thermal dose for skin, CEM43 minutes (van Rhoon et al. 2013).</summary>
    public double ThermalDoseLimitMinutes { get; init; } = 2.0;

    /// <summary>How long a person touches an item that is not worn or held (a brief touch), s.</summary>
    public double TouchSeconds { get; init; } = 1.0;

    /// <summary>
    /// A SHA-256 fingerprint of every value the policy applies (its name, factor, limits and the burn threshold's
    /// points), so that a report shows which policy produced it and an auditor can tell two policies apart.
    /// </summary>
    public string Fingerprint => TextHash.Sha256(string.Join(
        "|",
        Name,
        TextHash.Exact(SafetyFactor),
        TextHash.Exact(AlternatingVoltageLimitRms),
        TextHash.Exact(DirectVoltageLimit),
        TextHash.Exact(ThermalDoseLimitMinutes),
        TextHash.Exact(TouchSeconds),
        ContactBurn.Source,
        string.Join(";", System.Linq.Enumerable.Select(ContactBurn.Points, p => TextHash.Exact(p.Seconds) + "s=" + TextHash.Exact(p.Celsius)))));

    /// <summary>Checks the values; throws naming the first out of range.</summary>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public HazardPolicy Validated()
    {
        if (!(SafetyFactor >= 1) || double.IsInfinity(SafetyFactor))
        {
            throw new InvalidInputException("SafetyFactor", "must be a finite number of at least 1; got " + SafetyFactor);
        }

        Require.Positive("AlternatingVoltageLimitRms", AlternatingVoltageLimitRms);
        Require.Positive("DirectVoltageLimit", DirectVoltageLimit);
        Require.Positive("ThermalDoseLimitMinutes", ThermalDoseLimitMinutes);
        Require.Positive("TouchSeconds", TouchSeconds);
        return this;
    }
}
