using System;
using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Shock: the voltage across the gap of a split ring, which a finger or hand can bridge, against the
/// extra-low-voltage limits of IEC 61140 (50 V a.c. rms; 120 V ripple-free d.c. for a unidirectional pulse). A
/// pulse of at most 10 ms is also judged by what it can drive through a person's body resistance: within the
/// charge (or, above 15 kV, the energy) that IEC 60335-1 lets a person take from a discharge, it passes even above
/// the d.c. limit, which is a limit for steady voltages.
/// </summary>
public sealed class ShockCheck : IHazardCheck
{
    /// <summary>The longest pulse judged as an impulse, s: the upper end of the impulse durations of IEC 60479-2.</summary>
    public const double LongestImpulseSeconds = 10e-3;

    /// <summary>The peak voltage above which a discharge is judged by its energy, V (IEC 60335-1 clause 8.1.4).</summary>
    public const double EnergyRuleVolts = 15e3;

    /// <summary>The energy a discharge above 15 kV may deliver, J (IEC 60335-1 clause 8.1.4).</summary>
    public const double ImpulseEnergyLimitJoules = 0.35;

    /// <summary>The largest capacitance whose discharge a person may take at peaks up to 450 V, F (IEC 60335-1 clause 8.1.4: 0.1 µF).</summary>
    public const double ImpulseCapacitanceLimitFarads = 0.1e-6;

    private static string[] SourcesOf(HazardPolicy policy, bool alternating) =>
        new[] { policy.SourceOf(alternating ? "AlternatingVoltageLimit" : "DirectVoltageLimit") };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Shock;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (!response.Item.IsSplit)
        {
            return MechanismResult.NotApplicable(Mechanism, "closed loop: no gap for a person to bridge");
        }

        var issues = response.IssuesAffecting(AffectedResults.Emf);
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, SourcesOf(policy, response.EmfKind == EmfKind.Alternating), issues);
        }

        bool alternating = response.EmfKind == EmfKind.Alternating;
        double predicted = alternating ? response.RmsEmfVolts ?? double.NaN : response.PeakEmfVolts;
        double limit = alternating ? policy.AlternatingVoltageLimitRms : policy.DirectVoltageLimit;
        string quantity = alternating ? "gap voltage, rms" : "gap voltage, peak of a unidirectional pulse";
        double margin = VerdictRules.Margin(limit, predicted);

        // A short pulse may pass by the charge it drives even above the d.c. limit: the better of the two judges it.
        MechanismResult? byCharge = !alternating && response.GapImpulse is { } impulse && Impulse(impulse, response.PeakEmfVolts, policy) is { } judged && judged.Margin > margin
            ? judged
            : null;

        // Moving the item gives a steady (unidirectional) gap voltage of its own: judged against the d.c. limit when it
        // is the worse, whatever the pulse.
        if (response.MotionalEmfVolts is { } motional && VerdictRules.Margin(policy.DirectVoltageLimit, motional) < (byCharge?.Margin ?? margin))
        {
            (predicted, limit, quantity) = (motional, policy.DirectVoltageLimit, "gap voltage from moving the item");
            margin = VerdictRules.Margin(limit, predicted);
            alternating = false;
        }
        else if (byCharge is not null)
        {
            return byCharge;
        }

        return MechanismResult.Judged(
            Mechanism, quantity, predicted, limit, "V", margin, policy.SafetyFactor, SourcesOf(policy, alternating), (quantity, predicted, limit, alternating),
            static f => f.quantity + " " + SiFormat.Format(f.predicted, "V") + " against the extra-low-voltage limit " + SiFormat.Format(f.limit, "V") + (f.alternating ? " rms" : " d.c."));
    }

    /// <summary>
    /// A pulse of at most 10 ms judged by the charge it drives through the body resistance (at most the policy's
    /// charge, and no more than 0.1 µF charged to the peak) up to 15 kV, and by the energy it delivers above; null
    /// where the rule does not apply (a longer pulse, a charge too large for the peak, a value not finite).
    /// </summary>
    /// <remarks>
    /// The margin is the factor on the drive: the charge and the peak grow with it, the energy with its square. The
    /// charge rule holds up to the factor at which the charge reaches its limit or the peak reaches 15 kV; beyond
    /// 15 kV the energy rule takes over, up to the factor at which the energy reaches its limit. The whole
    /// exposure's charge is counted, not the impulse's alone, unless the emf outside the impulse stays within the
    /// d.c. limit (a slow tail, or the small emf of carrying the item out), which that limit judges on its own.
    /// </remarks>
    internal static MechanismResult? Impulse(EmfImpulse impulse, double peakVolts, HazardPolicy policy)
    {
        // Outside the impulse the emf is a steady voltage: where it stays within the d.c. limit it is judged as one
        // (and passes), and only the impulse's own charge counts; otherwise the whole exposure's charge counts.
        bool steadyTail = impulse.OutsidePeakVolts <= policy.DirectVoltageLimit;
        double r = policy.BodyResistanceOhms;
        double charge = (steadyTail ? impulse.VoltSeconds : impulse.TotalVoltSeconds) / r;
        double energy = (steadyTail ? impulse.VoltSquaredSeconds : impulse.TotalVoltSquaredSeconds) / r;
        if (!Finite.All(charge, energy, impulse.WidthSeconds, impulse.OutsidePeakVolts, peakVolts) || !(peakVolts > 0) || !(charge > 0)
            || impulse.WidthSeconds > LongestImpulseSeconds || charge > ImpulseCapacitanceLimitFarads * peakVolts)
        {
            return null;
        }

        string[] sources = { policy.SourceOf("ImpulseChargeLimit"), policy.SourceOf("BodyResistance") };
        var pulse = new PulseFigures(impulse.WidthSeconds, peakVolts, policy.DirectVoltageLimit, r, charge, energy, policy.ImpulseChargeLimit);
        double chargeMargin = policy.ImpulseChargeLimit / charge, switchMargin = EnergyRuleVolts / peakVolts;
        if (chargeMargin <= switchMargin)
        {
            return MechanismResult.Judged(
                HazardMechanism.Shock, "charge of a pulse of at most 10 ms through the body", charge, policy.ImpulseChargeLimit, "C", chargeMargin, policy.SafetyFactor, sources, pulse,
                static f => f.Pulse() + SiFormat.Format(f.Charge, "C") + " through a body of " + SiFormat.Format(f.BodyOhms, "Ω") + ", against the " + SiFormat.Format(f.ChargeLimit, "C")
                    + " a person may take from a discharge" + f.Steady());
        }

        double energyMargin = Math.Sqrt(ImpulseEnergyLimitJoules / energy);
        if (energyMargin > switchMargin)
        {
            return MechanismResult.Judged(
                HazardMechanism.Shock, "energy of a pulse of at most 10 ms in the body", energy, ImpulseEnergyLimitJoules, "J", energyMargin, policy.SafetyFactor, sources, pulse,
                static f => f.Pulse() + SiFormat.Format(f.Energy, "J") + " into a body of " + SiFormat.Format(f.BodyOhms, "Ω") + ", against the " + SiFormat.Format(ImpulseEnergyLimitJoules, "J")
                    + " a person may take from a discharge above 15 kV (the margin is on the drive: the energy grows with its square)" + f.Steady());
        }

        return MechanismResult.Judged(
            HazardMechanism.Shock, "peak of a pulse of at most 10 ms, within its charge limit", peakVolts, EnergyRuleVolts, "V", switchMargin, policy.SafetyFactor, sources, pulse,
            static f => f.Pulse() + SiFormat.Format(f.Charge, "C") + ", within its charge limit up to a peak of 15 kV, above which its energy would exceed " + SiFormat.Format(ImpulseEnergyLimitJoules, "J") + f.Steady());
    }

    /// <summary>What the impulse rule found, for its finding's text (written when first read).</summary>
    private sealed record PulseFigures(double WidthSeconds, double PeakVolts, double DirectLimitVolts, double BodyOhms, double Charge, double Energy, double ChargeLimit)
    {
        public string Pulse() => "a " + SiFormat.Format(WidthSeconds, "s") + " pulse of peak " + SiFormat.Format(PeakVolts, "V") + " across the gap drives ";

        public string Steady() => "; the " + SiFormat.Format(DirectLimitVolts, "V") + " d.c. limit is for steady voltages";
    }
}
