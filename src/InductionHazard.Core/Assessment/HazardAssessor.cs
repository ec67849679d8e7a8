using System;
using System.Collections.Generic;
using System.Linq;
using System.Reflection;
using InductionHazard.Assessment.Checks;
using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>Turns a response into an assessment: each mechanism's check, the combined verdict, the cautions.</summary>
public static class HazardAssessor
{
    private static readonly IHazardCheck[] Checks = { new ShockCheck(), new ArcCheck(), new BurnCheck(), new OverheatCheck(), new ForceCheck(), new TorqueCheck(), new AttractionCheck(), new ExposureCheck() };

    /// <summary>The module's version, as recorded in assessments.</summary>
    public static string ModuleVersion { get; } =
        typeof(HazardAssessor).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0]
        ?? typeof(HazardAssessor).Assembly.GetName().Version?.ToString() ?? "unknown";

    /// <summary>Assesses a response against a policy.</summary>
    /// <param name="response">The physics.</param>
    /// <param name="policy">The limits and safety factor.</param>
    /// <param name="rowNumber">The record's position in its input, if any.</param>
    /// <param name="now">The time to record (UTC); default now.</param>
    /// <remarks>
    /// A body placed without a normal is judged with its axis along the largest flux change and across it (see
    /// <see cref="InductionResponse.AcrossAxis"/>), and the worst of these is the assessment: the most severe verdict
    /// (Hazard, then Indeterminate, Caution, Clear, as <see cref="VerdictRules.Combine"/> ranks them), then the smaller
    /// judged margins in turn, smallest first. Its orientation says which it is. An item given a stay longer than its
    /// drive changes is judged leaving as soon as the drive stops changing too, and one whose drive holds its peak before
    /// the stay ends, leaving then (<see cref="InductionResponse.ShorterStay"/>), and the worse kept the same way; its model
    /// notes say which stay it is.
    /// </remarks>
    public static InductionAssessment Assess(InductionResponse response, HazardPolicy policy, int? rowNumber = null, DateTime? now = null)
    {
        if (response.AcrossAxis.Count == 0 && response.ShorterStay is null)
        {
            return AssessOne(response, policy, rowNumber, now);
        }

        InductionAssessment[] given = AssessOrientations(response, policy, rowNumber, now, out InductionAssessment assessed);
        InductionAssessment[] other = Array.Empty<InductionAssessment>();
        bool shorterKept = false, midDrive = false;
        string otherStay = string.Empty;
        if (response.ShorterStay is { } shorter)
        {
            // Leaving while the drive holds its peak differs from the stay given in its leaving (emf, current, force,
            // torque), not in its heating alone, as leaving once the drive has stopped does.
            midDrive = shorter.Scenario.ExposureSeconds is not null;
            other = AssessOrientations(shorter, policy, rowNumber, now, out InductionAssessment early);
            if (Worse(early, assessed, HeatingFirst))
            {
                (assessed, shorterKept) = (early, true);
                (given, other) = (other, given);
            }

            otherStay = shorterKept ? "staying as given" : shorter.Scenario.LeavingWords;
        }

        // Each mechanism at the orientation worst for it (the orientation is not known), and between the stays the
        // heating (where the other leaves once the drive has stopped, they differ in nothing else) or every mechanism
        // (where it leaves while the drive holds its peak): the verdict is the same as the worst alternative's, but a
        // mechanism that does not govern is no longer shown milder than another orientation or stay makes it.
        MechanismResult[]? envelope = null;
        for (int m = 0; m < assessed.Mechanisms.Count; m++)
        {
            MechanismResult worst = assessed.Mechanisms[m];
            foreach (InductionAssessment a in given)
            {
                worst = WorseOf(worst, a, m, assessed, stay: null);
            }

            if (midDrive || Array.IndexOf(HeatingFirst, worst.Mechanism) >= 0)
            {
                foreach (InductionAssessment a in other)
                {
                    worst = WorseOf(worst, a, m, assessed, otherStay);
                }
            }

            if (!ReferenceEquals(worst, assessed.Mechanisms[m]))
            {
                envelope ??= assessed.Mechanisms.ToArray();
                envelope[m] = worst;
            }
        }

        if (envelope is not null)
        {
            int across = assessed.AcrossIndex;
            assessed = AssessOne(assessed.Response, policy, rowNumber, now, envelope);
            assessed.AcrossIndex = across;
        }

        // Each figure too the largest over all judged: the orientation is not known, and the one kept for its verdict
        // (a body with its axis across the field) may link no flux around its axis, its emf and current zero.
        var judged = new List<InductionAssessment>(given.Length + other.Length);
        judged.AddRange(given);
        judged.AddRange(other);
        assessed = assessed.WithLargestFigures(judged);
        assessed.ShorterStayKept = shorterKept;
        return assessed;
    }

    /// <summary>
    /// The worse for mechanism <paramref name="m"/> of <paramref name="worst"/> and <paramref name="other"/>'s, led by
    /// which orientation or stay it is when it is the other's: one that cannot be judged over one that is (fail closed),
    /// else the smaller margin.
    /// </summary>
    private static MechanismResult WorseOf(MechanismResult worst, InductionAssessment other, int m, InductionAssessment kept, string? stay)
    {
        MechanismResult candidate = other.Mechanisms[m];
        if (ReferenceEquals(other, kept) || !candidate.Applies || !worst.Applies || worst.Verdict == Verdict.Indeterminate)
        {
            return worst;
        }

        bool worse = candidate.Verdict == Verdict.Indeterminate || candidate.Margin < worst.Margin;
        if (!worse)
        {
            return worst;
        }

        Vector3D normal = other.Response.Normal;
        string turned = normal.Equals(kept.Response.Normal) ? string.Empty : "with normal " + normal;
        string where = stay is null ? (turned.Length == 0 ? "in another of its orientations" : turned) : turned.Length == 0 ? stay : stay + ", " + turned;
        return candidate.Elsewhere(where);
    }

    /// <summary>The assessments of a response and its orientations with a body's axis across the field, and the worst of them.</summary>
    private static InductionAssessment[] AssessOrientations(InductionResponse response, HazardPolicy policy, int? rowNumber, DateTime? now, out InductionAssessment worst)
    {
        var all = new InductionAssessment[1 + response.AcrossAxis.Count];
        worst = all[0] = AssessOne(response, policy, rowNumber, now);
        for (int k = 0; k < response.AcrossAxis.Count; k++)
        {
            InductionAssessment other = all[k + 1] = AssessOne(response.AcrossAxis[k], policy, rowNumber, now);
            other.AcrossIndex = k;
            if (Worse(other, worst))
            {
                worst = other;
            }
        }

        return all;
    }

    /// <summary>
    /// The mechanisms two stays differ in: their drive, leaving, force and torque are the same, and only the heating
    /// moves with the time the item has to cool between the drive and leaving (their steps differ, which moves the
    /// others in the fifth figure, not by the physics).
    /// </summary>
    private static readonly HazardMechanism[] HeatingFirst = { HazardMechanism.Burn, HazardMechanism.Overheat };

    /// <summary>
    /// Whether <paramref name="a"/> is judged worse than <paramref name="b"/>: its verdict more severe, or as severe with
    /// smaller judged margins, compared smallest first; those of <paramref name="first"/> compared before the rest, where given.
    /// </summary>
    internal static bool Worse(InductionAssessment a, InductionAssessment b, HazardMechanism[]? first = null)
    {
        int severityA = Severity(a.Verdict), severityB = Severity(b.Verdict);
        if (severityA != severityB)
        {
            return severityA > severityB;
        }

        if (first is not null)
        {
            double[] firstA = JudgedMargins(a, first), firstB = JudgedMargins(b, first);
            for (int k = 0; k < Math.Min(firstA.Length, firstB.Length); k++)
            {
                if (firstA[k] != firstB[k])
                {
                    return firstA[k] < firstB[k];
                }
            }
        }

        double[] marginsA = JudgedMargins(a), marginsB = JudgedMargins(b);
        for (int k = 0; k < Math.Min(marginsA.Length, marginsB.Length); k++)
        {
            if (marginsA[k] != marginsB[k])
            {
                return marginsA[k] < marginsB[k];
            }
        }

        return false;
    }

    private static int Severity(Verdict verdict) => verdict switch
    {
        Verdict.Hazard => 3,
        Verdict.Indeterminate => 2,
        Verdict.Caution => 1,
        _ => 0,
    };

    private static double[] JudgedMargins(InductionAssessment a, HazardMechanism[]? only = null)
    {
        var margins = new List<double>(a.Mechanisms.Count);
        foreach (MechanismResult m in a.Mechanisms)
        {
            if (m.Applies && m.Verdict != Verdict.Indeterminate && !double.IsNaN(m.Margin) && (only is null || Array.IndexOf(only, m.Mechanism) >= 0))
            {
                margins.Add(m.Margin);
            }
        }

        margins.Sort();
        return margins.ToArray();
    }

    /// <summary>Assesses one response; <paramref name="given"/>, where given, are its mechanisms' results (each mechanism at the orientation worst for it) in place of its own.</summary>
    private static InductionAssessment AssessOne(InductionResponse response, HazardPolicy policy, int? rowNumber, DateTime? now, MechanismResult[]? given = null)
    {
        policy.Validated();
        // A visitor named by the inventory row is judged at the public's limits whatever the policy's group.
        policy = policy.For(response.Scenario.WearerGroup);
        // Loops rather than queries: an assessment is made hundreds of thousands of times in an audit.
        var results = given ?? new MechanismResult[Checks.Length];
        int applying = 0;
        bool anyIndeterminate = false;
        for (int k = 0; k < Checks.Length; k++)
        {
            if (given is null)
            {
                results[k] = Checks[k].Evaluate(response, policy);
            }

            if (results[k].Applies)
            {
                applying++;
                anyIndeterminate |= results[k].Verdict == Verdict.Indeterminate;
            }
        }

        var applicable = new MechanismResult[applying];
        for (int k = 0, next = 0; next < applying; k++)
        {
            if (results[k].Applies)
            {
                applicable[next++] = results[k];
            }
        }
        Verdict verdict = VerdictRules.Combine(VerdictsOf(applicable));
        MechanismResult? governing = Governing(applicable, verdict);
        // A Hazard stands even beside mechanisms that could not be judged: its smallest judged margin is the minimum.
        double minimum = verdict == Verdict.Indeterminate || applicable.Length == 0 ? double.NaN : SmallestJudgedMargin(applicable);

        // A mechanism's reason is its finding, written when first read (see LaterText); a broken assumption's is text already.
        var reasons = new TextList();
        if (applicable.Length == 0)
        {
            reasons.Add("no mechanism applies that this version can check");
        }

        // Each broken assumption once, however many mechanisms it stops; then the findings of judged mechanisms.
        if (anyIndeterminate)
        {
            foreach (ValidityIssue issue in response.ValidityIssues)
            {
                if (!reasons.Contains(issue.Reason))
                {
                    reasons.Add(issue.Reason);
                }
            }

            // A mechanism stopped by a reason of its own (not one of the response's), such as an exposure the
            // weighted-peak method cannot judge.
            foreach (MechanismResult r in applicable)
            {
                if (r.Verdict == Verdict.Indeterminate && !response.ValidityIssues.Any(i => r.Detail.Contains(i.Reason)))
                {
                    reasons.Add(r, Finding);
                }
            }
        }

        foreach (MechanismResult r in applicable)
        {
            if (r.Verdict is Verdict.Caution or Verdict.Hazard)
            {
                reasons.Add(r, Finding);
            }
        }

        // Room for the sources of a ring's mechanisms and the safety factor's without growing.
        var standardList = new List<string>(12);
        foreach (MechanismResult r in applicable)
        {
            for (int k = 0; k < r.Sources.Count; k++)
            {
                AddOnce(standardList, r.Sources[k]);
            }
        }

        AddOnce(standardList, Standards.SafetyFactorOf(policy));
        string[] standards = standardList.ToArray();

        return new InductionAssessment
        {
            ItemName = response.ItemName,
            RowNumber = rowNumber,
            SourceName = response.SourceName,
            Orientation = response.Orientation,
            Verdict = verdict,
            GoverningMechanism = governing?.Mechanism,
            MinimumMargin = minimum,
            LaterSummary = LaterText.From((verdict, governing, policy.SafetyFactor), static f => Summarize(f.verdict, f.governing, f.SafetyFactor)),
            LaterAction = LaterText.From((verdict, governing, policy, response.Item.Contact, applicable), static f => Act(f.verdict, f.governing, f.policy, f.Contact, f.applicable)),
            ActionBrief = RecommendedAction.Brief(verdict, governing, response.Item.Contact, applicable),
            Mechanisms = new MechanismList(results),
            ShockMargin = MarginOf(results, HazardMechanism.Shock),
            ArcMargin = MarginOf(results, HazardMechanism.Arc),
            BurnMargin = MarginOf(results, HazardMechanism.Burn),
            OverheatMargin = MarginOf(results, HazardMechanism.Overheat),
            ForceMargin = MarginOf(results, HazardMechanism.Force),
            TorqueMargin = MarginOf(results, HazardMechanism.Torque),
            AttractionMargin = MarginOf(results, HazardMechanism.Attraction),
            ExposureMargin = MarginOf(results, HazardMechanism.Exposure),
            // The field at the item is the source's, whatever the item's own model: shown even where the emf is not trusted.
            PeakFluxDensityTesla = response.PeakFluxDensityTesla,
            PeakFluxWebers = Trusted(response, AffectedResults.Emf, response.PeakFluxWebers),
            PeakForceNewtons = Trusted(response, AffectedResults.Current, response.PeakForceNewtons),
            PeakEmfVolts = Trusted(response, AffectedResults.Emf, response.PeakEmfVolts),
            RmsEmfVolts = response.RmsEmfVolts is { } rms ? Trusted(response, AffectedResults.Emf, rms) : null,
            GapVoltageVolts = response.GapVoltageVolts is { } gap ? Trusted(response, AffectedResults.Emf, gap) : null,
            PeakCurrentAmperes = Trusted(response, AffectedResults.Current, response.PeakCurrentAmperes),
            PeakTemperatureCelsius = Trusted(response, AffectedResults.Current | AffectedResults.Heating, response.PeakTemperatureCelsius),
            EnergyDissipatedJoules = Trusted(response, AffectedResults.Current | AffectedResults.Heating, response.EnergyDissipatedJoules),
            Reasons = reasons,
            Standards = new TextList(standards),
            Cautions = new TextList(Criteria.Cautions.For(standards)),
            PolicyName = policy.Name,
            PolicyHash = policy.Fingerprint,
            SafetyFactor = policy.SafetyFactor,
            ExposureGroup = policy.ExposureGroup,
            ModuleVersion = ModuleVersion,
            AssessedUtc = Stamp((now ?? DateTime.UtcNow).ToUniversalTime()),
            StationName = response.Scenario.StationName ?? string.Empty,
            Inventory = response.Scenario.Inventory,
            Response = response,
        };
    }

    /// <summary>What to do, in plain words: the action for the verdict, then what the item itself, the mechanisms not judged and the place ask.</summary>
    private static string Act(Verdict verdict, MechanismResult? governing, HazardPolicy policy, Items.ContactKind contact, MechanismResult[] applicable)
    {
        string unjudged = RecommendedAction.Unjudged(verdict, applicable, governing, contact);
        return RecommendedAction.For(verdict, governing, policy, contact, unjudged.Length > 0) + RecommendedAction.ItemItself(applicable, governing, policy, contact) + unjudged + RecommendedAction.PlaceItself(applicable, governing);
    }

    private static Verdict[] VerdictsOf(MechanismResult[] applicable)
    {
        var verdicts = new Verdict[applicable.Length];
        for (int k = 0; k < applicable.Length; k++)
        {
            verdicts[k] = applicable[k].Verdict!.Value;
        }

        return verdicts;
    }

    /// <summary>The smallest margin of the judged mechanisms (NaN if any is NaN), as <see cref="Enumerable.Min(IEnumerable{double})"/> gives it.</summary>
    private static double SmallestJudgedMargin(MechanismResult[] applicable)
    {
        double minimum = double.PositiveInfinity;
        foreach (MechanismResult r in applicable)
        {
            if (r.Verdict != Verdict.Indeterminate)
            {
                if (double.IsNaN(r.Margin))
                {
                    return double.NaN;
                }

                minimum = Math.Min(minimum, r.Margin);
            }
        }

        return minimum;
    }

    /// <summary>"Burn: skin in contact: ...": a mechanism's finding as a reason.</summary>
    private static string Finding(MechanismResult r) => r.Mechanism + ": " + r.Detail;

    /// <summary>Adds a text not yet in the list (the list keeps the order of first appearance).</summary>
    private static void AddOnce(List<string> list, string text)
    {
        if (!list.Contains(text))
        {
            list.Add(text);
        }
    }

    /// <summary>The time as recorded, to the second; the last one written is kept, as a run writes the same second many times.</summary>
    internal static string Stamp(DateTime utc)
    {
        long second = utc.Ticks / TimeSpan.TicksPerSecond;
        if (LastStamp is { } last && last.Second == second)
        {
            return last.Text;
        }

        string text = utc.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", System.Globalization.CultureInfo.InvariantCulture);
        LastStamp = new StampText(second, text);
        return text;
    }

    private static StampText? LastStamp;

    private sealed record StampText(long Second, string Text);

    /// <summary>A value the assessment shows only when no broken assumption affects it: never a safe-looking number.</summary>
    private static double Trusted(InductionResponse response, AffectedResults needs, double value) =>
        response.ValidityIssues.Count == 0 || response.Trusts(needs) ? value : double.NaN;

    private static MechanismResult? Governing(MechanismResult[] applicable, Verdict verdict)
    {
        if (applicable.Length == 0)
        {
            return null;
        }

        if (verdict == Verdict.Indeterminate)
        {
            return applicable.First(r => r.Verdict == Verdict.Indeterminate);
        }

        // The judged mechanism of smallest margin, the first on a tie (see MechanismResult.MarginBelow).
        MechanismResult? best = null;
        foreach (MechanismResult r in applicable)
        {
            if (r.Verdict != Verdict.Indeterminate && r.MarginBelow(best))
            {
                best = r;
            }
        }

        return best!;
    }

    private static double? MarginOf(MechanismResult[] results, HazardMechanism mechanism)
    {
        foreach (MechanismResult r in results)
        {
            if (r.Mechanism == mechanism)
            {
                return r.Applies ? r.Margin : null;
            }
        }

        return null;
    }

    private static string Summarize(Verdict verdict, MechanismResult? governing, double safetyFactor)
    {
        if (governing is null)
        {
            return "Indeterminate: no mechanism could be checked.";
        }

        return verdict switch
        {
            Verdict.Clear => "Clear: every margin is at least " + SiFormat.Plain(safetyFactor) + "; the lowest is " + governing.Mechanism + " at " + SiFormat.Margin(governing.Margin) + " (" + governing.Detail + ").",
            Verdict.Caution => "Caution: " + governing.Mechanism + " margin " + SiFormat.Margin(governing.Margin) + " is below the safety factor " + SiFormat.Plain(safetyFactor) + " (" + governing.Detail + ").",
            Verdict.Hazard => "Hazard: " + governing.Mechanism + " margin " + SiFormat.Margin(governing.Margin) + " (" + governing.Detail + ").",
            _ => "Indeterminate: " + governing.Mechanism + " " + governing.Detail + ".",
        };
    }
}
