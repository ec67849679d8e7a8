using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Assessment.Checks;

/// <summary>
/// Burn: skin against the heated item, assuming the skin reaches the item's temperature (perfect contact, no
/// cooling by blood flow: the safe side). A worn or held item is in contact throughout: for every contact time d
/// the highest temperature the item holds for d is compared with the ISO 13732-1 threshold for d, and the
/// thermal dose CEM43 with its limit. An item that is not worn or held is judged for a brief touch: its peak
/// temperature against the threshold for the policy's touch time. Temperature margins are the allowed rise over
/// the predicted rise from the starting temperature.
/// </summary>
public sealed class BurnCheck : IHazardCheck
{
    private const int DurationsPerDecade = 12;

    /// <inheritdoc />
    public HazardMechanism Mechanism => HazardMechanism.Burn;

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
            return MechanismResult.Indeterminate(Mechanism, SourcesOf(policy), issues);
        }

        return response.Item.Contact is ContactKind.Skin or ContactKind.Held
            ? Continuous(response, policy)
            : Touch(response, policy);
    }

    private MechanismResult Touch(InductionResponse response, HazardPolicy policy)
    {
        double start = response.InitialTemperatureCelsius;
        double peak = response.PeakTemperatureCelsius;
        double threshold = policy.ContactBurn.CelsiusFor(policy.TouchSeconds);
        double margin = RiseMargin(threshold, peak, start);
        return MechanismResult.Judged(
            Mechanism, "peak surface temperature, brief touch", peak, threshold, "°C", margin, policy.SafetyFactor, new[] { policy.ContactBurn.Source, policy.SourceOf("TouchTime") },
            (policy.TouchSeconds, peak, threshold, response.Item.Contact),
            static f => "a " + SiFormat.Format(f.TouchSeconds, "s") + " touch of the item at its peak " + SiFormat.Celsius(f.peak)
                + " against the burn threshold " + SiFormat.Celsius(f.threshold) + " (" + f.Contact + " item: not worn or held)");
    }

    private MechanismResult Continuous(InductionResponse response, HazardPolicy policy)
    {
        IReadOnlyList<HeatingSample> history = response.HeatingSeries;
        double start = response.InitialTemperatureCelsius;
        ContactBurnThreshold curve = policy.ContactBurn;
        double span = history[history.Count - 1].TimeSeconds - history[0].TimeSeconds;

        // The contact-time threshold: the worst contact duration over the curve's range. A contact time whose threshold
        // the surroundings alone reach (the item starts at or above it) is the place's own hazard, not the field's: it is
        // said, and what the field adds there is judged by the dose it adds.
        (double margin, double seconds, double held, double threshold) worst = (double.PositiveInfinity, curve.ShortestSeconds, start, curve.CelsiusFor(curve.ShortestSeconds));
        (double[] durations, double[] durationThresholds, double? placeSeconds) = Judged(Durations(curve, span), start);

        // The dose the field adds over the baseline (the item held at its starting temperature), judged by the factor
        // on the rise that brings it to the limit, found by solving; only inside the range the dose relation was
        // fitted on, beyond which the contact-temperature criterion above governs alone.
        double? doseMargin = ThermalDose.RiseMargin(history, start, policy.ThermalDoseLimitMinutes, out double dose);
        IReadOnlyList<string> basis = SourcesOf(policy);
        if (durations.Length > 0 && doseMargin is { } first && first < ContactMarginBound(history, durationThresholds, start))
        {
            // The dose governs whatever the contact times hold: no level held for any of them exceeds the peak, so no
            // contact margin is below the bound. What they hold is swept only if the finding is read.
            var deferred = new ContactFindings(doseMargin, dose, policy.ThermalDoseLimitMinutes, true, double.NaN, double.NaN, double.NaN, double.NaN, start, placeSeconds)
            {
                PeakCelsius = response.PeakTemperatureCelsius,
                Sweep = new ContactSweep(history, durations, durationThresholds),
            };
            return MechanismResult.Judged(Mechanism, DoseQuantity(response), dose, policy.ThermalDoseLimitMinutes, "CEM43 min", first, policy.SafetyFactor, basis,
                deferred, static f => "skin in contact: " + f.Dose() + "; " + f.Contact() + f.Place());
        }

        if (durations.Length > 0)
        {
            worst = WorstOver(history, durations, durationThresholds, start);
        }

        if (span < curve.ShortestSeconds && curve.CelsiusFor(curve.ShortestSeconds) > start)
        {
            // Shorter than the standard covers: the peak against the shortest contact's threshold (thresholds rise for shorter contacts).
            double peak = response.PeakTemperatureCelsius;
            worst = (RiseMargin(worst.threshold, peak, start), span, peak, worst.threshold);
        }

        bool contactJudged = durations.Length > 0 || (span < curve.ShortestSeconds && curve.CelsiusFor(curve.ShortestSeconds) > start);
        var found = new ContactFindings(doseMargin, dose, policy.ThermalDoseLimitMinutes, contactJudged, worst.held, worst.seconds, worst.threshold, worst.margin, start, placeSeconds)
        {
            PeakCelsius = response.PeakTemperatureCelsius,
        };
        if (!contactJudged && doseMargin is null)
        {
            // Neither criterion can judge what the field adds: fail closed.
            return MechanismResult.Judged(Mechanism, "what the field adds to skin already at the burn threshold", double.NaN, double.NaN, "°C", double.NaN, policy.SafetyFactor, basis,
                found, static f => "cannot be judged: " + f.Dose() + "; " + f.Contact() + f.Place());
        }

        if (doseMargin is { } byDose && (double.IsNaN(byDose) || byDose < worst.margin || !contactJudged))
        {
            return MechanismResult.Judged(Mechanism, DoseQuantity(response), dose, policy.ThermalDoseLimitMinutes, "CEM43 min", byDose, policy.SafetyFactor, basis,
                found, static f => "skin in contact: " + f.Dose() + "; " + f.Contact() + f.Place());
        }

        return MechanismResult.Judged(Mechanism, "skin contact temperature held for " + SiFormat.Format(worst.seconds, "s"), worst.held, worst.threshold, "°C", worst.margin, policy.SafetyFactor, basis,
            found, static f => "skin in contact: " + f.Contact() + "; " + f.Dose() + f.Place());
    }

    /// <summary>
    /// What the dose criterion names as its quantity: past <see cref="ThermalDose.FittedUpToCelsius"/> the dose is the
    /// relation's extrapolation, a figure with no meaning of its own (the margin on the rise still holds), and a table
    /// that shows it says so beside it.
    /// </summary>
    private static string DoseQuantity(InductionResponse response) =>
        response.PeakTemperatureCelsius > ThermalDose.FittedUpToCelsius
            ? "thermal dose added, extrapolated (the item passes " + SiFormat.Celsius(ThermalDose.FittedUpToCelsius) + ")"
            : "thermal dose added";

    /// <summary>What a worn or held item's burn check found, for its finding's text (written when first read).</summary>
    private sealed record ContactFindings(
        double? DoseMargin, double DoseMinutes, double DoseLimitMinutes, bool ContactJudged, double Held, double Seconds, double Threshold, double ContactMargin, double Start, double? PlaceSeconds)
    {
        /// <summary>Where the dose governed before the contact times were swept: what to sweep for the finding.</summary>
        public ContactSweep? Sweep { get; init; }

        /// <summary>The history's peak, °C: past the range the dose relation was fitted on, the dose as it is is not a number to print.</summary>
        public double PeakCelsius { get; init; } = double.NaN;

        public string Dose() => DoseMargin is { } dm
            ? PeakCelsius > ThermalDose.FittedUpToCelsius
                ? "thermal dose added beyond the range its relation was fitted on (the item passes " + SiFormat.Celsius(ThermalDose.FittedUpToCelsius) + "), its limit reached at a rise " + SiFormat.Margin(dm) + " of this one (the margin on the rise)"
                : "thermal dose added " + SiFormat.Plain(DoseMinutes) + " CEM43 against " + SiFormat.Plain(DoseLimitMinutes) + " (margin on the rise " + SiFormat.Margin(dm) + ")"
            : "thermal dose not the criterion: its limit lies above " + SiFormat.Celsius(ThermalDose.FittedUpToCelsius) + ", beyond the range the dose relation was fitted on";

        public string Contact()
        {
            if (!ContactJudged)
            {
                return "contact temperature not the criterion: the surroundings alone reach its threshold";
            }

            (double margin, double seconds, double held, double threshold) = Sweep is { } sweep
                ? WorstOver(sweep.History, sweep.Durations, sweep.Thresholds, Start)
                : (ContactMargin, Seconds, Held, Threshold);
            return "held " + SiFormat.Celsius(held) + " for " + SiFormat.Format(seconds, "s") + " against the threshold " + SiFormat.Celsius(threshold) + " for that contact time (margin " + SiFormat.Margin(margin) + ")";
        }

        public string Place() => PlaceSeconds is { } p
            ? "; the surroundings alone hold the skin at " + SiFormat.Celsius(Start) + ", at or above the burn threshold for contact of " + SiFormat.Format(p, "s")
              + " or longer: a hazard of the place itself, apart from the field, which this check does not judge (judged is what the field adds)"
            : string.Empty;
    }

    /// <summary>A history and the contact times to sweep it for (the history is the response's, which does not change).</summary>
    private sealed record ContactSweep(IReadOnlyList<HeatingSample> History, double[] Durations, double[] Thresholds);

    /// <summary>
    /// The contact time with the smallest margin, what the history holds for it and its threshold: every contact time
    /// at once by a sweep through the levels; for a history with many peaks, one window sweep per contact time,
    /// skipping those that cannot be the worst.
    /// </summary>
    private static (double Margin, double Seconds, double Held, double Threshold) WorstOver(IReadOnlyList<HeatingSample> history, double[] durations, double[] thresholds, double start)
    {
        var levels = new TemperatureHistory.SustainedLevels(history);
        double[]? everyLevel = levels.ForAll(durations);
        double heldThere, marginThere;
        int at = everyLevel is null
            ? WorstContact(k => levels.For(durations[k]), TemperatureHistory.Peak(history), durations, thresholds, start, out heldThere, out marginThere)
            : Smallest(everyLevel, thresholds, start, out heldThere, out marginThere);
        return (marginThere, durations[at], heldThere, thresholds[at]);
    }

    /// <summary>
    /// A bound below every contact time's margin: no level held for a contact time exceeds the history's peak, so each
    /// margin is at least that of the peak against the lowest threshold. The peak is taken a part in 1e12 higher, so
    /// that a level interpolated a few units in its last place above it stays under the bound. NaN (no bound) if the
    /// history holds a NaN.
    /// </summary>
    internal static double ContactMarginBound(IReadOnlyList<HeatingSample> history, double[] thresholds, double start)
    {
        double lowest = double.PositiveInfinity;
        foreach (double threshold in thresholds)
        {
            lowest = Math.Min(lowest, threshold);
        }

        double peak = TemperatureHistory.Peak(history);
        return RiseMargin(lowest, peak + (Math.Abs(peak) * 1e-12), start);
    }

    /// <summary>
    /// The contact time whose margin is smallest (on a tie the shortest; if any margin is NaN, the shortest whose
    /// margin is NaN), with what is held for it and its margin. Exact: the same answer as sweeping every contact time.
    /// </summary>
    /// <remarks>
    /// What is held for a contact never rises with its length (a longer window contains a shorter one), so the
    /// level held for a shorter contact (or the peak) bounds it from above, and the margin from below. The longest
    /// contact time is swept first, then every fourth, then the rest, each only when that bound does not already put
    /// its margin above the smallest found.
    /// </remarks>
    /// <param name="held">What the history holds for the contact time of an index (an exact sweep).</param>
    /// <param name="peak">The history's peak, which bounds what is held for any contact time.</param>
    /// <param name="durations">The contact times, ascending.</param>
    /// <param name="thresholds">The threshold for each.</param>
    /// <param name="start">The starting temperature, °C.</param>
    /// <param name="heldThere">What is held for the contact time returned.</param>
    /// <param name="margin">Its margin.</param>
    /// <returns>The index of the contact time.</returns>
    internal static int WorstContact(Func<int, double> held, double peak, IReadOnlyList<double> durations, IReadOnlyList<double> thresholds, double start, out double heldThere, out double margin)
    {
        const int Stride = 4;
        int n = durations.Count;
        var levels = new double[n];
        var swept = new bool[n];
        int worst = -1;
        bool anyNaN = false;
        void Sweep(int k)
        {
            levels[k] = held(k);
            swept[k] = true;
            double m = RiseMargin(thresholds[k], levels[k], start);
            if (double.IsNaN(m))
            {
                anyNaN = true;
            }
            else if (worst < 0 || m < Margin(worst) || (m == Margin(worst) && k < worst))
            {
                worst = k;
            }
        }

        double Margin(int k) => RiseMargin(thresholds[k], levels[k], start);

        // The longest contact first (its threshold is the lowest), then every fourth, then the rest: each skipped
        // when the level held for the nearest shorter contact swept (or the peak) bounds its margin above the smallest.
        Sweep(n - 1);
        for (int pass = 0; pass < 2 && !anyNaN; pass++)
        {
            double bound = peak;
            for (int k = 0; k < n - 1 && !anyNaN; k++)
            {
                if (!swept[k] && (pass == 1 || k % Stride == 0) && !(RiseMargin(thresholds[k], bound, start) > Margin(worst)))
                {
                    Sweep(k);
                }

                bound = swept[k] ? Math.Min(bound, levels[k]) : bound;
            }
        }

        if (anyNaN)
        {
            // Not judged somewhere: the shortest such contact time is the answer, so every one is swept.
            for (int k = 0; k < n; k++)
            {
                if (!swept[k])
                {
                    Sweep(k);
                }

                if (double.IsNaN(Margin(k)))
                {
                    worst = k;
                    break;
                }
            }
        }

        heldThere = levels[worst];
        margin = Margin(worst);
        return worst;
    }

    /// <summary>
    /// With every contact time's level known, the one whose margin is smallest (on a tie the shortest; if any margin is
    /// NaN, the shortest whose margin is NaN), as <see cref="WorstContact"/> finds it.
    /// </summary>
    internal static int Smallest(IReadOnlyList<double> levels, IReadOnlyList<double> thresholds, double start, out double heldThere, out double margin)
    {
        int worst = 0;
        margin = double.NaN;
        for (int k = 0; k < levels.Count; k++)
        {
            double m = RiseMargin(thresholds[k], levels[k], start);
            if (double.IsNaN(m))
            {
                (worst, margin) = (k, m);
                break;
            }

            if (k == 0 || m < margin)
            {
                (worst, margin) = (k, m);
            }
        }

        heldThere = levels[worst];
        return worst;
    }

    /// <summary>
    /// The check's sources under a policy, made once for the last policy seen (a policy does not change); read-only,
    /// as every result under that policy shares them.
    /// </summary>
    private static IReadOnlyList<string> SourcesOf(HazardPolicy policy)
    {
        if (LastSources is { } known && ReferenceEquals(known.Policy, policy))
        {
            return known.Sources;
        }

        var made = new PolicySources(policy, Array.AsReadOnly(new[] { policy.ContactBurn.Source, Standards.ThermalDoseModel, policy.SourceOf("ThermalDoseLimit") }));
        LastSources = made;
        return made.Sources;
    }

    /// <summary>The sources made for the last policy seen (read and replaced whole, so any thread may).</summary>
    private static PolicySources? LastSources;

    private sealed record PolicySources(HazardPolicy Policy, IReadOnlyList<string> Sources);

    /// <summary>Allowed rise over predicted rise; a start already at the threshold has no margin at all.</summary>
    private static double RiseMargin(double threshold, double predicted, double start)
    {
        if (double.IsNaN(predicted) || double.IsNaN(threshold))
        {
            return double.NaN;
        }

        if (threshold <= start)
        {
            return 0;
        }

        return VerdictRules.Margin(threshold - start, Math.Max(0, predicted - start));
    }

    /// <summary>
    /// The contact times judged, ascending and distinct: 12 a decade from the curve's shortest to the longer of its
    /// longest and the history's span, with the curve's own points among them; and the threshold of each.
    /// </summary>
    internal static (double[] Seconds, double[] Celsius) Durations(ContactBurnThreshold curve, double span)
    {
        double first = curve.ShortestSeconds, last = Math.Min(curve.LongestSeconds, span);
        if (last < first)
        {
            return (Array.Empty<double>(), Array.Empty<double>());
        }

        // Every run as long as the curve's longest contact has the same grid: it is made once per curve.
        if (LastGrid is { } known && ReferenceEquals(known.Curve, curve) && known.Last == last)
        {
            return (known.Seconds, known.Celsius);
        }

        (double[] Seconds, double[] Celsius) grid = Grid(curve, first, last);
        LastGrid = new DurationGrid(curve, last, grid.Seconds, grid.Celsius);
        return grid;
    }

    /// <summary>
    /// The contact times whose threshold lies above the starting temperature, with their thresholds, and the shortest
    /// whose threshold the start already reaches (the place's own hazard); remembered for the last grid and start, as
    /// most items start at the skin's temperature.
    /// </summary>
    internal static (double[] Seconds, double[] Celsius, double? Place) Judged((double[] Seconds, double[] Celsius) grid, double start)
    {
        if (LastJudged is { } known && ReferenceEquals(known.Grid, grid.Seconds) && known.Start.Equals(start))
        {
            return (known.Seconds, known.Celsius, known.Place);
        }

        // Where every threshold lies above the start (the usual case), the grid itself.
        int above = 0;
        double? place = null;
        for (int k = 0; k < grid.Seconds.Length; k++)
        {
            if (grid.Celsius[k] > start)
            {
                above++;
            }
            else
            {
                place ??= grid.Seconds[k];
            }
        }

        double[] seconds = grid.Seconds, celsius = grid.Celsius;
        if (above < grid.Seconds.Length)
        {
            (seconds, celsius) = (new double[above], new double[above]);
            for (int k = 0, j = 0; k < grid.Seconds.Length; k++)
            {
                if (grid.Celsius[k] > start)
                {
                    (seconds[j], celsius[j]) = (grid.Seconds[k], grid.Celsius[k]);
                    j++;
                }
            }
        }

        var judged = new JudgedTimes(grid.Seconds, start, seconds, celsius, place);
        LastJudged = judged;
        return (judged.Seconds, judged.Celsius, judged.Place);
    }

    /// <summary>The last contact times judged, with the grid and start they came from (read and replaced whole, so any thread may).</summary>
    private static JudgedTimes? LastJudged;

    private sealed record JudgedTimes(double[] Grid, double Start, double[] Seconds, double[] Celsius, double? Place);

    /// <summary>The last grid made, with its curve and its longest contact time (read and replaced whole, so any thread may).</summary>
    private static DurationGrid? LastGrid;

    private sealed record DurationGrid(ContactBurnThreshold Curve, double Last, double[] Seconds, double[] Celsius);

    /// <summary>
    /// The grid from <paramref name="first"/> to <paramref name="last"/>: count + 1 times spaced evenly in their
    /// logarithm (12 a decade), each found from its logarithm, which gives its threshold with no logarithm taken; the
    /// curve's own points merged in where they fall (with their own temperatures), a time met twice kept once.
    /// </summary>
    private static (double[] Seconds, double[] Celsius) Grid(ContactBurnThreshold curve, double first, double last)
    {
        int count = (int)Math.Ceiling(Math.Log10(last / first) * DurationsPerDecade);
        IReadOnlyList<(double Seconds, double Celsius)> points = curve.Points;
        var seconds = new double[count + 1 + points.Count];
        var celsius = new double[seconds.Length];
        double logFirst = Math.Log(first), logRatio = Math.Log(last / first);
        int n = 0, p = 0;
        void Add(double t, double c)
        {
            if (n == 0 || t > seconds[n - 1])
            {
                seconds[n] = t;
                celsius[n++] = c;
            }
        }

        for (int k = 0; k <= count; k++)
        {
            double logT = count == 0 ? logFirst : logFirst + (logRatio * k / count);
            double t = k == 0 ? first : k == count ? last : Math.Exp(logT);
            for (; p < points.Count && points[p].Seconds <= t; p++)
            {
                Add(points[p].Seconds, points[p].Celsius);
            }

            Add(t, curve.CelsiusForLogSeconds(logT));
        }

        if (n < seconds.Length)
        {
            Array.Resize(ref seconds, n);
            Array.Resize(ref celsius, n);
        }

        return (seconds, celsius);
    }
}
