using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Linq;
using System.Runtime.CompilerServices;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Exposure: a worn or held item puts a person where it is, so the person's own field there is judged as
/// Test-FieldExposure judges it (ICNIRP 2009 static limits, ICNIRP 2010 reference levels, the weighted-peak method):
/// the occupational limits (the head and trunk's for a static field), or the general public's where the policy's
/// <see cref="HazardPolicy.ExposureGroup"/> says so. A loose or fixed item puts no one there by itself.
/// </summary>
/// <remarks>
/// The exposure depends only on the source and the place, so it is found once per source and place and shared by
/// every item assessed there (at most <see cref="PlacesPerSource"/> places are kept per source).
/// </remarks>
public sealed class ExposureCheck : IHazardCheck
{
    /// <summary>The most places whose exposure is kept for one source.</summary>
    public const int PlacesPerSource = 256;

    private static readonly ConditionalWeakTable<FieldSource, ConcurrentDictionary<(Vector3D Place, string Policy), FieldExposure>> Found = new();

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Exposure;

    /// <inheritdoc />
    public MechanismResult Evaluate(InductionResponse response, HazardPolicy policy)
    {
        if (response.Item.Contact is ContactKind.Free or ContactKind.Fixed)
        {
            return MechanismResult.NotApplicable(
                Mechanism,
                response.Item.Contact == ContactKind.Free
                    ? "a loose item puts no one at its place; judge a person's place with Test-FieldExposure"
                    : "a fixed item puts no one at its place; judge a person's place with Test-FieldExposure");
        }

        var issues = response.IssuesAffecting(AffectedResults.Field);
        string[] fallback = { ExposureLimits.StaticSource, ExposureLimits.TimeVaryingSource };
        if (issues.Count > 0)
        {
            return MechanismResult.Indeterminate(Mechanism, fallback, issues);
        }

        FieldExposure exposure;
        try
        {
            exposure = At(response.Scenario.Source, response.Scenario.Placement.Centre, policy);
        }
        catch (InductionHazardException ex)
        {
            return MechanismResult.Indeterminate(Mechanism, fallback, new[] { new ValidityIssue("the field at the wearer's place cannot be evaluated: " + ex.Message, AffectedResults.Field) });
        }

        var kept = new List<string>(exposure.Standards.Count);
        for (int k = 0; k < exposure.Standards.Count; k++)
        {
            if (exposure.Standards[k] != ExposureLimits.ActionLevelSource)
            {
                kept.Add(exposure.Standards[k]);
            }
        }

        if (policy.ExposureGroup != HazardPolicy.Default.ExposureGroup)
        {
            kept.Add(policy.ExposureGroupSource);
        }

        string[] sources = kept.ToArray();
        if (exposure.Verdict == Verdict.Indeterminate || !Finite.Is(exposure.Margin))
        {
            string reason = exposure.Finding.StartsWith("Indeterminate: ", StringComparison.Ordinal) ? exposure.Finding.Substring("Indeterminate: ".Length) : exposure.Finding;
            return MechanismResult.Indeterminate(Mechanism, sources, new[] { new ValidityIssue("the wearer's own exposure cannot be judged: " + reason, AffectedResults.Field) });
        }

        return MechanismResult.Judged(
            Mechanism, "a person's own field at the item", exposure.ComparedTesla, exposure.LimitTesla, "T", exposure.Margin, policy.SafetyFactor, sources, (exposure, response.Item.Contact, policy.ExposureGroup), static f => Detail(f.exposure, f.Contact, f.ExposureGroup));
    }

    private static string Detail(FieldExposure exposure, ContactKind contact, ExposureGroup group)
    {
        string who = contact == ContactKind.Skin ? "the wearer" : "the person holding it";
        bool workers = group == ExposureGroup.Occupational;
        return "the field " + who + " is in, " + exposure.Basis + ", " + SiFormat.Format(exposure.ComparedTesla, "T") + (workers ? " against the occupational limit " : " against the general public's limit ")
            + SiFormat.Format(exposure.LimitTesla, "T") + (workers && exposure.Basis.StartsWith("static", StringComparison.Ordinal) ? " for the head and trunk (the limbs alone may take 8 T; a site policy may set StaticExposureLimit up to 8 T where the environment is controlled)" : string.Empty)
            + "; it applies with or without the item";
    }

    /// <summary>The exposure at a place for the policy's group, found once per source, place and policy.</summary>
    private static FieldExposure At(FieldSource source, Vector3D place, HazardPolicy policy)
    {
        var key = (place, policy.Fingerprint);
        ConcurrentDictionary<(Vector3D Place, string Policy), FieldExposure> places = Found.GetValue(source, _ => new ConcurrentDictionary<(Vector3D Place, string Policy), FieldExposure>());
        if (places.TryGetValue(key, out FieldExposure? known))
        {
            return known;
        }

        FieldExposure found = FieldExposure.At(source, place, publicExposure: policy.ExposureGroup == ExposureGroup.Public, policy);
        if (places.Count >= PlacesPerSource)
        {
            places.Clear();
        }

        places[key] = found;
        return found;
    }
}
