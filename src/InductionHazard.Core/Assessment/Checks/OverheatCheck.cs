using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Overheat: the item's own peak temperature against its melting point (or solidus). The margin is the allowed
/// rise over the predicted rise from the starting temperature.
/// </summary>
public sealed class OverheatCheck : IHazardCheck
{
    private static readonly string[] Sources = { Standards.Melting };

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Overheat;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (response.Item.IsSplit)
        {
            return MechanismResult.NotApplicable(Mechanism, "open loop: no current flows, so the item does not heat");
        }

        var issues = response.IssuesAffecting(AffectedResults.Current | AffectedResults.Heating);
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, Sources, issues);
        }

        double melting = response.Item.Material.MeltingCelsius;
        double start = response.InitialTemperatureCelsius;
        double peak = response.PeakTemperatureCelsius;
        double margin = VerdictRules.Margin(melting - start, peak - start);
        return MechanismResult.Judged(Mechanism, "peak temperature", peak, melting, "°C", margin, policy.SafetyFactor, Sources, response, Detail);
    }

    private static string Detail(InductionResponse response)
    {
        double melting = response.Item.Material.MeltingCelsius;
        return "peak temperature " + SiFormat.Celsius(response.PeakTemperatureCelsius) + " against the melting point of " + response.Item.Material.Name
            + " " + SiFormat.Celsius(melting) + " (margin on the rise from " + SiFormat.Celsius(response.InitialTemperatureCelsius) + ")"
            + (response.MeltingReachedSeconds is { } t ? "; melting reached at t = " + SiFormat.Format(t, "s") + ", beyond which the model is notional" : string.Empty)
            + (response.MeltThroughSeconds is { } through
                ? "; its latent heat (" + SiFormat.Format(response.Item.Material.LatentHeatJoulesPerKilogram, "J/kg") + ") would take " + SiFormat.Format(through, "s")
                  + " more to melt it through if the power there held, and the loop would then open"
                : string.Empty);
    }
}
