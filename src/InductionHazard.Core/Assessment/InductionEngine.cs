using System;
using System.Collections.Generic;
using System.Linq;
using System.Numerics;
using System.Threading;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;
using InductionHazard.Waveforms;

namespace InductionHazard.Assessment;

/// <summary>
/// Solves a scenario: flux linkage per unit drive of each source term, the emf -sum M_k d_k'(t), the loop's
/// circuit response (phasors for a sinusoidal drive, exact exponential steps for a transient one), heating with
/// rho(T) and cooling, and the checks of every model assumption.
/// </summary>
public static class InductionEngine
{
    /// <summary>Solves the scenario. Never returns a safe-looking number for a broken assumption: it records the issue.</summary>
    public static InductionResponse Respond(Scenario scenario, CancellationToken cancellation = default)
    {
        var c = new EngineContext(scenario);
        InductionResponse response;
        if (c.FieldFailed)
        {
            response = new InductionResponse
            {
                Context = c,
                Model = "not solved: the source's field cannot be evaluated over the item",
                PeakEmfVolts = double.NaN,
                PeakCurrentAmperes = double.NaN,
                EnergyDissipatedJoules = double.NaN,
                PeakTemperatureCelsius = double.NaN,
                FinalTemperatureCelsius = double.NaN,
            };
            CheckFinite(response, c.Issues);
            return response;
        }

        bool thin = ModelValidity.Check(scenario.Item, c.Frequency, scenario.Source.IsSinusoidal, c.Start, c.Thermal, c.Issues, c.Notes);
        // A ferromagnetic item's currents are not solved: the induction model does not apply to it (see ModelValidity).
        if (!scenario.Item.IsSplit && !scenario.Item.Material.IsFerromagnetic)
        {
            c.BuildPaths(thin);
        }

        response = scenario.Source.IsSinusoidal ? Sinusoidal(c, cancellation) : Transient(c, cancellation);
        if (scenario.Item.Material.IsFerromagnetic)
        {
            response = EngineMechanics.Magnetised(response, c);
        }

        if (scenario.Placement.Velocity is not null)
        {
            response = EngineMechanics.Moving(response, c);
        }

        CheckFinite(response, c.Issues);
        return ShorterStay(AxisAcross(response, c, cancellation), c, cancellation);
    }

    /// <summary>
    /// An item carried out of a transient field whose stay (as given, or by default the drive's span) lasts past the time
    /// the field at it first reaches its largest and holds (<see cref="HeldPeak"/>): also solved leaving then, which an assessment judges
    /// beside the stay as given, keeping the worse (<see cref="HazardAssessor.Assess"/>). Leaving is a flux change of its
    /// own: where the drive ends holding flux (a ramp up to a magnet's field) and the stay outlasts it, leaving as soon as
    /// the drive stops changing, whose heat adds to the drive's before the item has shed it, while a longer stay lets it
    /// cool in between (a ring whose ramp and leaving heat it alike is left with up to half the rise after a long stay);
    /// where the drive holds its peak and falls again (a magnet's cycle up, held and down), leaving while it holds, which
    /// the stay through to the end never does (a 150 mm copper loop at a 3 T cycle held 10 min: its torque margin 1.1
    /// staying to the end, 0.018 carried out at the field). A stay given is read as the longest an item stays, so a
    /// shorter one is no milder. A drive whose peak does not hold for the whole of a leaving (a pulse, a fault) is not
    /// searched for an earlier leaving: its own change outpaces a person's.
    /// </summary>
    private static InductionResponse ShorterStay(InductionResponse response, EngineContext c, CancellationToken cancellation)
    {
        Scenario scenario = response.Scenario;
        FieldSource source = scenario.Source;
        if (source.IsSinusoidal || !scenario.Leaves || scenario.Item.IsSplit || scenario.Item.Material.IsFerromagnetic || scenario.Placement.Velocity is not null
            || double.IsInfinity(source.EndSeconds))
        {
            return response;
        }

        double runs = source.EndSeconds - source.StartSeconds;
        double stay = scenario.ExposureSeconds ?? runs;
        if (!(runs > 0) || HeldPeak(c, stay) is not { } peak)
        {
            return response;
        }

        // Leaving once the drive has stopped changing is the default stay (however short the drive); leaving while it
        // holds a peak, a stay of its own, no shorter than anyone gives.
        bool atEnd = peak >= runs * (1 - 1e-12);
        double after = atEnd ? runs : Math.Max(peak, PhysicalRanges.ExposureTime.Minimum);
        if (!(after < stay * (1 - 1e-9)))
        {
            return response;
        }

        InductionResponse shorter = Respond(atEnd ? scenario.LeavingAtOnce() : scenario.LeavingAfter(after), cancellation);
        string asGiven = scenario.ExposureSeconds is { } given ? SiFormat.Format(given, "s") : "by default the drive's span, " + SiFormat.Format(runs, "s");
        string Note(bool kept) => "stay: judged as given (" + asGiven + ") and " + shorter.Scenario.LeavingWords + " (" + SiFormat.Format(after, "s") + "), "
            + (atEnd ? "whose leaving heats the item before it has shed the drive's heat" : "carrying out the flux it links at the drive's peak") + "; the worse is kept, and this is the "
            + (kept ? "stay as given" : "shorter stay");
        return WithNote(response, Note(true)) with { ShorterStay = WithNote(shorter, Note(false)) };
    }

    /// <summary>Within 1 % of its largest: the field a leaving carries the item out of where the drive holds its peak (a measured plateau's noise included).</summary>
    private const double HeldShare = 0.99;

    /// <summary>
    /// The time from the drive's start, within the stay, at which the field at the item's centre (each term's field per
    /// unit drive times its drive, summed) first reaches its largest size, where it stays within 1 % of that for the
    /// whole of a leaving after it, or after the shortest stay anyone can give (0.1 s) where that is later. Null where
    /// it never holds so, or is nothing. The field's size, not the flux along the item's axis: a body's leaving moves
    /// the field across it too, which heats it. Read at the drives' breakpoints, the stay's end and a leaving after it,
    /// between which a drive that can hold a peak (a ramp, a trapezoid, samples) runs straight.
    /// </summary>
    private static double? HeldPeak(EngineContext c, double stay)
    {
        Scenario scenario = c.Scenario;
        FieldSource source = scenario.Source;
        Vector3D[] perUnitDrive = c.CentreField;
        if (perUnitDrive.Length != source.Terms.Count)
        {
            return null;
        }

        double begin = source.StartSeconds, leave = scenario.LeaveSeconds;
        double FieldSize(double t)
        {
            Vector3D sum = Vector3D.Zero;
            for (int k = 0; k < perUnitDrive.Length; k++)
            {
                sum += source.Terms[k].Waveform.Value(t) * perUnitDrive[k];
            }

            return sum.Length;
        }

        // The largest at the start, the breakpoints within the stay and the stay's end; then the earliest of those within
        // rounding of it (a plateau read an ulp higher at its far end, as a drive shifted in time can be, is still left
        // at its start).
        double stayEnd = begin + stay;
        IReadOnlyList<double> breakpoints = source.BreakpointsBetween(begin, stayEnd + leave);
        double largest = Math.Max(FieldSize(begin), FieldSize(stayEnd));
        for (int i = 0; i < breakpoints.Count && breakpoints[i] <= stayEnd; i++)
        {
            largest = Math.Max(largest, FieldSize(breakpoints[i]));
        }

        if (!(largest > 0) || !Finite.Is(largest))
        {
            return null;
        }

        double at = stayEnd;
        if (FieldSize(begin) >= (1 - 1e-9) * largest)
        {
            at = begin;
        }
        else
        {
            for (int i = 0; i < breakpoints.Count && breakpoints[i] <= stayEnd; i++)
            {
                if (FieldSize(breakpoints[i]) >= (1 - 1e-9) * largest)
                {
                    at = breakpoints[i];
                    break;
                }
            }
        }

        // Held from there through a leaving that starts no sooner than the shortest stay anyone gives.
        double until = Math.Max(at, begin + PhysicalRanges.ExposureTime.Minimum) + leave;
        for (int i = 0; i < breakpoints.Count; i++)
        {
            if (breakpoints[i] >= at && breakpoints[i] <= until && !(FieldSize(breakpoints[i]) >= HeldShare * largest))
            {
                return null;
            }
        }

        return FieldSize(until) >= HeldShare * largest ? at - begin : null;
    }

    /// <summary>A response and its orientations with one more model note.</summary>
    private static InductionResponse WithNote(InductionResponse response, string note)
    {
        var across = new InductionResponse[response.AcrossAxis.Count];
        for (int k = 0; k < across.Length; k++)
        {
            across[k] = response.AcrossAxis[k] with { ModelNotes = response.AcrossAxis[k].ModelNotes.Concat(new[] { note }).ToArray() };
        }

        return response with { ModelNotes = response.ModelNotes.Concat(new[] { note }).ToArray(), AcrossAxis = across };
    }

    /// <summary>
    /// A body with an axis (a rod, a tube, a bar, a disc, a plate) placed without a normal or a tilt: besides its axis
    /// along the largest flux change, the two orientations with its axis across it, each solved in full. The flux
    /// change along the axis drives the coaxial currents; one across it drives currents along the body's length and
    /// back, which in a rod or a tube heat it more (a long cylinder's low-frequency loss across its axis is twice that
    /// along it). Which orientation is worst depends on the mechanism, so the assessment judges all three and keeps the
    /// worst (<see cref="HazardAssessor.Assess"/>). A sphere has no axis; a ferromagnetic body's currents are not
    /// solved, and its pull is largest with its axis along the field.
    /// </summary>
    private static InductionResponse AxisAcross(InductionResponse response, EngineContext c, CancellationToken cancellation)
    {
        Scenario scenario = c.Scenario;
        if (scenario.Placement.Normal is not null || (scenario.Placement.TiltDegrees ?? 0) != 0 || c.FieldFailed
            || scenario.Item.Loop is not BodyGeometry || scenario.Item.Loop is SphereBody || scenario.Item.IsSplit || scenario.Item.Material.IsFerromagnetic)
        {
            return response;
        }

        Vector3D along = c.Normal;
        Vector3D first = RectangularLoopGeometry.WidthDirection(along);
        Vector3D[] across = { first, along.Cross(first).Normalized() };
        var others = new InductionResponse[across.Length];
        for (int k = 0; k < across.Length; k++)
        {
            // The torque turned from the orientation the engine chose is the body's whichever of the three is kept: its
            // orientation was not given, and turning it is what the figure covers.
            others[k] = Respond(scenario.With(Placement.AcrossAxis(scenario.Placement, across[k], along)), cancellation) with
            {
                PeakTorqueTurnedNewtonMeters = response.PeakTorqueTurnedNewtonMeters,
            };
        }

        // Where the field varies through the body, an orientation between these (its length turned toward the source)
        // may take more: a search on a low-frequency model fitted to the three looks for it, and one it finds worse is
        // solved and judged too. The search is not every orientation solved: where the field varies by more than a tenth,
        // or the search found one, said beside whichever the assessment keeps.
        double variation = CrossAxisField.Variation(scenario.Source, scenario.Placement.Centre, along, (BodyGeometry)scenario.Item.Loop);
        var turned = new List<InductionResponse>();
        bool searched = false;
        ValidityIssue? withinReach = null;
        if (!(variation <= VariationSearched))
        {
            // Where a conductor of the source lies within the body's reach, how it sits decides its heating more than a
            // search can follow (the search's model then misses orientations that heat it several times more): its
            // heating is not judged without a normal, and nothing is searched.
            Complex[] weights = DriveWeights(scenario.Source);
            double reach = CrossAxisField.ReachRatio(scenario.Source, scenario.Placement.Centre, scenario.Item.Loop.LargestDimensionMeters / 2, weights);
            if (!(reach <= ReachLimit))
            {
                withinReach = new ValidityIssue(
                    "turned, the body reaches where the field is " + (Finite.Is(reach) ? SiFormat.Plain(reach) + " times its rms" : "beyond evaluation, against its rms")
                    + " over the sphere it sweeps about its centre (a conductor of the source within its reach): how it sits then decides its heating more than a search of its orientations can follow, so its heating is not judged without its orientation; give its normal (-Normal or a Normal column)",
                    AffectedResults.Heating);
                response = response with { ValidityIssues = response.ValidityIssues.Concat(new[] { withinReach }).ToArray() };
                for (int k = 0; k < others.Length; k++)
                {
                    others[k] = others[k] with { ValidityIssues = others[k].ValidityIssues.Concat(new[] { withinReach }).ToArray() };
                }
            }
            else
            {
                (turned, searched) = TurnedBySearch(response, others, c, weights, cancellation);
                others = others.Concat(turned).ToArray();
            }
        }

        response = response with { AcrossAxis = others };
        if (!(variation <= VariationNoted) || turned.Count > 0)
        {
            string note = "orientation: the field varies through the body (" + (double.IsNaN(variation) ? "it cannot be evaluated everywhere in it" : "by " + SiFormat.Plain(100 * variation) + " % rms of its value at the centre")
                + "): judged are its axis along the largest flux change, across it"
                + (turned.Count > 0 ? string.Empty
                    : withinReach is not null ? " (no search for one between them was made: a conductor of the source lies within its reach, and its heating is not judged)"
                    : searched ? " (a search on a low-frequency model of its heating found no orientation worse)"
                    : " (no search for one between them could be made: the heating of fewer than two of them was found)")
                + (turned.Count == 0 ? string.Empty : ", and turned as a search on a low-frequency model of its heating found worse, normal " + string.Join(" and ", turned.Select(t => t.Scenario.Placement.Normal)))
                + (withinReach is not null
                    ? "; for its heating to be judged, give how it sits (-Normal or a Normal column)"
                    : "; the search solves a model, not every orientation, so where how it sits is known, give it (-Normal or a Normal column)");
            response = WithNote(response, note);
        }

        return response with
        {
            Orientation = response.Orientation + " (an assessment judges its axis across it too, normals " + across[0] + " and " + across[1]
                + (turned.Count == 0 ? string.Empty : ", and turned to normal " + string.Join(" and ", turned.Select(t => t.Scenario.Placement.Normal)) + " as a search found worse") + ", and keeps the worst)",
        };
    }

    /// <summary>
    /// Where the field varies through a body given no normal, the orientations that heat it most by a low-frequency
    /// model fitted to those solved, each solved in full: in rounds, each fitting the model to every orientation solved
    /// so far whose heating was found (the three, then what earlier rounds found) and solving the one it puts highest,
    /// until it puts none above them by more than <see cref="SearchedAbove"/>, finds one already solved, or cannot be
    /// fitted (fewer than two heatings found, or nothing heated), or after <see cref="SearchRounds"/> rounds. The model:
    /// the temperature rise is a A + b X, with A the field along the axis and X the field across it in the mean squares
    /// <see cref="CrossAxisField.Parts"/> gives, a and b (not negative) fitted by least squares to the rises solved, so
    /// that what the frequency, the body's inductance and its cooling do to each part is the engine's. (The rise, not
    /// the energy: an item that melts stops taking energy there, and one held just below it takes energy all along.)
    /// Where the heat lost grows in proportion to the rise and the item does not melt, the model is exact in a uniform
    /// field, whose largest value is at one of the three. Searched over 64 axes spread evenly over the half sphere (an
    /// axis and its reverse heat alike), then refined about the best. Also whether a search was made.
    /// </summary>
    private static (List<InductionResponse> Found, bool Searched) TurnedBySearch(InductionResponse along, InductionResponse[] across, EngineContext c, Complex[] weights, CancellationToken cancellation)
    {
        Scenario scenario = c.Scenario;
        var body = (BodyGeometry)scenario.Item.Loop;
        FieldSource source = scenario.Source;
        Vector3D centre = scenario.Placement.Centre;
        var solved = new List<(Vector3D Axis, double Along, double Across, InductionResponse Response)>();
        foreach (InductionResponse r in new[] { along }.Concat(across))
        {
            Vector3D axis = r.Scenario.Placement.Normal ?? c.Normal;
            (double a, double x) = CrossAxisField.Parts(source, centre, axis, body, weights);
            solved.Add((axis, a, x, r));
        }

        var found = new List<InductionResponse>();
        for (int round = 0; round < SearchRounds; round++)
        {
            // Fitted to the orientations whose heating was found (at least two): one not found is judged as it is
            // (Indeterminate unless another is worse), and a search among the rest may still find one worse.
            double saa = 0, sxx = 0, sax = 0, sae = 0, sxe = 0;
            int fitted = 0;
            foreach ((_, double a, double x, InductionResponse r) in solved)
            {
                double rise = r.TemperatureRiseKelvin;
                if (r.IsValid && Finite.Is(rise) && Finite.Is(a) && Finite.Is(x))
                {
                    (saa, sxx, sax, sae, sxe) = (saa + (a * a), sxx + (x * x), sax + (a * x), sae + (a * rise), sxe + (x * rise));
                    fitted++;
                }
            }

            if (fitted < 2)
            {
                return (found, round > 0);
            }

            (double alongFactor, double acrossFactor) = NonNegativeFit(saa, sxx, sax, sae, sxe);
            if (!(alongFactor + acrossFactor > 0))
            {
                return (found, round > 0);
            }

            double Model(Vector3D axis)
            {
                (double a, double x) = CrossAxisField.Parts(source, centre, axis, body, weights);
                return (alongFactor * a) + (acrossFactor * x);
            }

            double known = double.NegativeInfinity;
            foreach ((_, double a, double x, InductionResponse r) in solved)
            {
                known = r.IsValid ? Math.Max(known, (alongFactor * a) + (acrossFactor * x)) : known;
            }

            (Vector3D best, double bestValue) = Highest(Model, c.Normal, cancellation);
            if (!(bestValue > (1 + SearchedAbove) * known) || solved.Any(s => Math.Abs(s.Axis.Dot(best)) > SameAxisCosine))
            {
                return (found, true);
            }

            InductionResponse turned = Respond(scenario.With(Placement.TurnedBySearch(scenario.Placement, best, c.Normal)), cancellation) with
            {
                PeakTorqueTurnedNewtonMeters = along.PeakTorqueTurnedNewtonMeters,
            };
            found.Add(turned);
            (double turnedAlong, double turnedAcross) = CrossAxisField.Parts(source, centre, best, body, weights);
            solved.Add((best, turnedAlong, turnedAcross, turned));
        }

        return (found, true);
    }

    /// <summary>
    /// The axis at which a function of it is highest, and its value there: 64 axes spread evenly over the half sphere,
    /// then a climb from the best (<see cref="SphereSearch"/>).
    /// </summary>
    private static (Vector3D Axis, double Value) Highest(Func<Vector3D, double> value, Vector3D start, CancellationToken cancellation)
    {
        (Vector3D best, double bestValue) = (start, value(start));
        foreach (Vector3D axis in SphereSearch.Spread(64, half: true))
        {
            double v = value(axis);
            if (v > bestValue)
            {
                (best, bestValue) = (axis, v);
            }
        }

        return SphereSearch.Climb(value, best, bestValue, cancellation);
    }

    /// <summary>The most orientations a search solves beyond the three.</summary>
    private const int SearchRounds = 3;

    /// <summary>The cosine above which an axis the search finds is one already solved (2 degrees).</summary>
    private static readonly double SameAxisCosine = Math.Cos(2 * Math.PI / 180);

    /// <summary>How far above the three orientations solved the model must put the one a search finds for it to be solved too.</summary>
    private const double SearchedAbove = 0.02;

    /// <summary>
    /// a and b, neither negative, minimising the squares of a A_i + b X_i - E_i, from the sums of the products: the
    /// normal equations' solution where both come out not negative, else the better of a alone and b alone.
    /// </summary>
    private static (double A, double B) NonNegativeFit(double saa, double sxx, double sax, double sae, double sxe)
    {
        double determinant = (saa * sxx) - (sax * sax);
        if (determinant > 1e-12 * saa * sxx)
        {
            double a = ((sae * sxx) - (sxe * sax)) / determinant, b = ((saa * sxe) - (sax * sae)) / determinant;
            if (a >= 0 && b >= 0)
            {
                return (a, b);
            }
        }

        // Alone, each reduces the sum of squares by (s_e)^2 / s: the larger reduction is the better fit.
        double alone = saa > 0 ? Math.Max(0, sae / saa) : 0, acrossAlone = sxx > 0 ? Math.Max(0, sxe / sxx) : 0;
        return alone * sae >= acrossAlone * sxe ? (alone, 0) : (0, acrossAlone);
    }

    /// <summary>
    /// Each term's weight in the field a search compares orientations by: a sine's phasor, else the drive's value of
    /// largest size over the source's drive times (its sign kept).
    /// </summary>
    private static Complex[] DriveWeights(FieldSource source)
    {
        var weights = new Complex[source.Terms.Count];
        for (int j = 0; j < weights.Length; j++)
        {
            FieldWaveform waveform = source.Terms[j].Waveform;
            if (waveform is SineWaveform sine)
            {
                weights[j] = sine.Phasor;
                continue;
            }

            double largest = 0;
            foreach (double t in source.DriveTimes)
            {
                double value = waveform.Value(t);
                largest = Math.Abs(value) > Math.Abs(largest) ? value : largest;
            }

            weights[j] = largest;
        }

        return weights;
    }

    /// <summary>The rms variation of the field through a body, relative to its centre's, above which the three orientations judged are said not to cover every one.</summary>
    private const double VariationNoted = 0.1;

    /// <summary>
    /// The rms variation of the field through a body above which a search looks for an orientation between the three
    /// that heats it more (1 %): below, the three hold the most to within a small part of that variation, and nothing
    /// is searched in a uniform field. Searching well below the note's tenth keeps a safe-distance search from passing
    /// into Clear where the search stops.
    /// </summary>
    private const double VariationSearched = 0.01;

    /// <summary>
    /// The largest field over the sphere a body sweeps, relative to its rms there, above which a conductor of the source
    /// is taken to lie within the body's reach (4). Checked against orientations solved as given near a coil and a line:
    /// where the ratio was at most 3.3 the orientations judged reached the most of 60 to 100 solved to within 2 %; where it
    /// was 8 or more (the body, turned, reaching to within a few mm of a winding or a line) some orientation heated the
    /// body 1.2 to 5.6 times more than any judged, but for two bodies at their melting point in every orientation.
    /// </summary>
    private const double ReachLimit = 4;

    private static InductionResponse Sinusoidal(EngineContext c, CancellationToken cancellation)
    {
        var terms = c.Scenario.Source.Terms;
        double f = c.Frequency, omega = 2 * Math.PI * f;

        // d_k(t) = A_k sin(omega (t - S_k) + phi_k) = Im(A_k e^(j(phi_k - omega S_k)) e^(j omega t)); e = -sum M_k d_k'.
        Complex flux = Complex.Zero, field = Complex.Zero;
        for (int k = 0; k < terms.Count; k++)
        {
            Complex phasor = ((SineWaveform)terms[k].Waveform).Phasor;
            flux += c.Coupling[k] * phasor;
            field += c.NormalField[k] * phasor;
        }

        Complex emf = -Complex.ImaginaryOne * omega * flux;
        double on = c.Scenario.Source.StartSeconds;
        double runs = c.Scenario.Source.EndSeconds - on;
        double inField = c.Scenario.ExposureSeconds ?? Math.Min(runs, Scenario.LongestExposureSeconds);
        double leaving = c.Scenario.Leaves && inField < runs ? c.Scenario.LeaveSeconds : 0;
        double off = on + Math.Min(inField + leaving, runs);
        double end = on + inField + leaving + CoolingTail(c);
        c.Notes.Add((f, inField: off - on, until: end - on), static n => "alternating drive at " + SiFormat.Format(n.f, "Hz") + ", periodic steady state (switch-on transients not modelled); the item is in the field for " + SiFormat.Format(n.inField, "s") + ", then cools to " + SiFormat.Format(n.until, "s"));
        if (leaving > 0)
        {
            c.Notes.Add(leaving, static s => "leaving the field takes " + SiFormat.Format(s, "s") + ", counted at the full field (the field falls as the item is carried out, so this overstates)");
        }

        InductionResponse drive = new()
        {
            Context = c,
            PeakFluxDensityTesla = field.Magnitude,
            PeakFluxWebers = flux.Magnitude,
            EmfKind = EmfKind.Alternating,
            PeakEmfVolts = emf.Magnitude,
            RmsEmfVolts = emf.Magnitude / Math.Sqrt(2),
            ExposureSeconds = off - on,
            AssessedSeconds = end - on,
        };
        if (c.Scenario.Item.IsSplit)
        {
            return Open(drive, c, new PeriodSamples(emf, Complex.Zero, f, on, c.Start, 128), on, end);
        }

        if (c.PathProblem(drive) is { } unsolved)
        {
            return unsolved;
        }

        Func<double, SteadyState> steady;
        if (c.Paths!.IsSingle && c.Scenario.Item.Loop is not BodyGeometry)
        {
            // One path keeps the round wire's own skin effect (Kelvin functions) in its impedance.
            steady = SinusoidalPathSolver.Loop(t => c.Circuit.ImpedanceOhms(f, t), emf);
        }
        else
        {
            var drives = new Complex[terms.Count];
            for (int k = 0; k < terms.Count; k++)
            {
                // u_k = -d_k' has the phasor -j omega D_k.
                drives[k] = -Complex.ImaginaryOne * omega * ((SineWaveform)terms[k].Waveform).Phasor;
            }

            // The cycle's mean of |sum_k u_k v_k|^2: half the square length of the phasor sum, part by part.
            double crossSquare = 0;
            for (int m = 0; m < c.CrossCoupling[0].Length; m++)
            {
                Complex part = Complex.Zero;
                for (int k = 0; k < terms.Count; k++)
                {
                    part += drives[k] * c.CrossCoupling[k][m];
                }

                crossSquare += (part.Real * part.Real) + (part.Imaginary * part.Imaginary);
            }

            double crossAtUnitScale = 0.5 * c.CrossPowerFactor * crossSquare;
            steady = ItemPaths.Steady(c.Modal!, drives, omega, c.Paths.ScaleAt, crossAtUnitScale);
        }

        SinusoidalRun run = new SinusoidalPathSolver(steady, c.Thermal).Run(emf, f, on, off, end, c.Start, cancellation, c.MeltingCelsius);
        SteadyMechanics mechanics = EngineMechanics.SteadyForces(c, run.CurrentPhasor, omega);
        NoteHowItEnded(c, run.MeltedAtSeconds, run.BudgetExceeded, "the heating integrator");
        Complex z = run.Impedance;
        bool single = c.Paths.IsSingle;
        return drive with
        {
            Heating = Heated(c, run.Heating, run.FinalCelsius, run.EnergyJoules),
            Model = single
                ? "thin ring (Grover 1946) in periodic steady state: phasor current with skin effect (Kelvin functions); lumped heating with rho(T) and cooling, cycle-averaged"
                : c.Paths.Description + " (" + c.Paths.Paths!.InductanceMethod + "), in periodic steady state by phasors over the modes of the (L, R) pencil" + CrossWords(c) + "; lumped heating with rho(T) and cooling, cycle-averaged",
            AcResistanceOhms = single ? z.Real : null,
            InductanceHenries = single ? z.Imaginary / omega : c.Ldc,
            TimeConstantSeconds = single ? z.Imaginary / omega / z.Real : c.Ldc / c.Rdc,
            LaterRegime = LaterText.From((ratio: z.Imaginary / z.Real, name: single ? "omega L / R" : "omega L / R of the whole"), static r => Regime(r.ratio, r.name)),
            PeakCurrentAmperes = run.PeakCurrentAmperes,
            NaiveCurrentAmperes = emf.Magnitude / c.Rdc,
            LaterCurrentSense = LaterText.From((f, phase: Math.Atan2(z.Imaginary, z.Real), c.Normal, c.FieldDirection), static s => LenzSense.Alternating(s.f, s.phase, s.Normal, s.FieldDirection)),
            CircuitSeries = run.Circuit,
            PathCount = c.Paths.Paths!.Count,
            Forces = (mechanics.PeakForce, null, mechanics.PeakTorqueNewtonMeters, mechanics.MeanForce),
            PeakTorqueTurnedNewtonMeters = c.TiltTorqueFactor > 0 ? c.TiltTorqueFactor * mechanics.PeakMomentField : null,
        };
    }

    private static InductionResponse Transient(EngineContext c, CancellationToken cancellation)
    {
        var source = c.Scenario.Source;
        var terms = source.Terms;
        double begin = source.StartSeconds;
        double fieldEnd = source.EndSeconds;
        double runs = double.IsInfinity(fieldEnd) ? Scenario.LongestExposureSeconds : fieldEnd - begin;
        double leave = begin + (c.Scenario.ExposureSeconds ?? runs);
        double leaving = c.Scenario.Leaves ? c.Scenario.LeaveSeconds : 0;
        double outside = leave + leaving;
        double end = outside + CoolingTail(c);
        double Linked(double[] perUnitDrive, double t)
        {
            double sum = 0;
            for (int k = 0; k < perUnitDrive.Length; k++)
            {
                sum += perUnitDrive[k] * terms[k].Waveform.Value(t);
            }

            return sum;
        }

        double fluxAtLeave = Linked(c.Coupling, leave);

        // Leaving is a flux change of its own: the flux the loop holds falls linearly to zero while it is carried out.
        double Emf(double t)
        {
            if (!(t < leave))
            {
                return t < outside ? fluxAtLeave / leaving : 0;
            }

            double sum = 0;
            for (int k = 0; k < c.Coupling.Length; k++)
            {
                sum += c.Coupling[k] * terms[k].Waveform.Rate(t);
            }

            return -sum;
        }

        // Sorted and distinct, by loops: this runs for every transient assessment.
        var breakpointList = new List<double>();
        IReadOnlyList<double> between = source.BreakpointsBetween(begin, end);
        for (int i = 0; i < between.Count; i++)
        {
            if (between[i] < leave && between[i] < end)
            {
                breakpointList.Add(between[i]);
            }
        }

        AddBefore(breakpointList, leave, end);
        AddBefore(breakpointList, outside, end);
        double[] breakpoints = DriveSampling.SortedDistinct(breakpointList);
        var timeList = new List<double>();
        foreach (double t in source.DriveTimes)
        {
            if (t < leave)
            {
                timeList.Add(t);
            }
        }

        timeList.Add(begin);
        timeList.Add(leave);
        double[] times = DriveSampling.SortedDistinct(timeList);
        double peakEmf = Largest(times, t => Math.Abs(Emf(t)));
        if (leaving > 0)
        {
            peakEmf = Math.Max(peakEmf, Math.Abs(fluxAtLeave / leaving));
        }

        double flux0 = Linked(c.Coupling, begin);

        // The first time of the largest swing (a NaN swing counts as the smallest).
        double swingAt = times[0], largestSwing = Math.Abs(Linked(c.Coupling, times[0]) - flux0);
        for (int i = 1; i < times.Length; i++)
        {
            double swing = Math.Abs(Linked(c.Coupling, times[i]) - flux0);
            if (swing.CompareTo(largestSwing) > 0)
            {
                (swingAt, largestSwing) = (times[i], swing);
            }
        }

        double fluxSwing = Math.Abs(Linked(c.Coupling, swingAt) - flux0);
        var driveSwing = new double[terms.Count];
        for (int k = 0; k < terms.Count; k++)
        {
            driveSwing[k] = terms[k].Waveform.Value(swingAt) - terms[k].Waveform.Value(begin);
        }

        if (leaving > 0 && Math.Abs(flux0) > fluxSwing)
        {
            fluxSwing = Math.Abs(flux0);
            for (int k = 0; k < terms.Count; k++)
            {
                driveSwing[k] = -terms[k].Waveform.Value(begin);
            }
        }

        double fluxChange = (leaving > 0 ? 0 : fluxAtLeave) - flux0;
        c.Notes.Add(
            (begin, fieldEnd, inField: leave - begin, leaving, fluxAtLeave, until: end - begin),
            static n => "transient drive from " + SiFormat.Format(n.begin, "s") + " to " + SiFormat.Format(n.fieldEnd, "s") + "; the item is in the field for " + SiFormat.Format(n.inField, "s")
                + (n.leaving > 0 ? ", is carried out over " + SiFormat.Format(n.leaving, "s") + " (the flux it holds, " + SiFormat.Format(n.fluxAtLeave, "Wb") + ", falling to zero)" : ", stays in place (fixed)")
                + ", then cools to " + SiFormat.Format(n.until, "s"));

        InductionResponse drive = new()
        {
            Context = c,
            PeakFluxDensityTesla = Largest(times, t => Math.Abs(Linked(c.NormalField, t))),
            PeakFluxWebers = Largest(times, t => Math.Abs(Linked(c.Coupling, t))),
            FluxChangeWebers = fluxChange,
            EmfKind = EmfKind.Unidirectional,
            PeakEmfVolts = peakEmf,
            ExposureSeconds = leave - begin,
            AssessedSeconds = end - begin,
        };
        if (c.Scenario.Item.IsSplit)
        {
            double[] shown = times.Concat(new[] { outside, end }).Distinct().OrderBy(t => t).ToArray();
            int stride = Math.Max(1, shown.Length / 4000);
            double Flux(double t) => t < leave ? Linked(c.Coupling, t) : t < outside ? fluxAtLeave * (1 - ((t - leave) / leaving)) : leaving > 0 ? 0 : fluxAtLeave;
            double step = LeastMaxStep(terms);
            bool thinned = !double.IsInfinity(step) && (times[times.Length - 1] - times[0]) / step > DriveSampling.MaxTimes;
            return Open(drive, c, shown.Where((_, i) => i % stride == 0).Select(t => new CircuitSample(t, Emf(t), 0, c.Start)).ToArray(), begin, end) with
            {
                GapImpulse = thinned ? null : EmfImpulse.Measure(shown, Emf, Flux, peakEmf),
            };
        }

        if (c.PathProblem(drive) is { } unsolved)
        {
            return unsolved;
        }

        double maxStep = LeastMaxStep(terms);
        int budget = HeatingIntegrator.DefaultMaxSteps + (4 * breakpoints.Length);
        double curvedUntil = Math.Min(leave, fieldEnd);
        bool overBudget = !double.IsInfinity(maxStep) && CurvedSteps(terms, breakpoints, begin, curvedUntil) > budget;
        if (overBudget)
        {
            c.Issues.Add(new ValidityIssue(
                "the drive is curved (steps of at most " + SiFormat.Format(maxStep, "s") + ") over " + SiFormat.Format(curvedUntil - begin, "s") + ", more steps than the solver's budget of "
                + budget.ToString("N0", System.Globalization.CultureInfo.InvariantCulture) + "; give an -ExposureTime that covers the transient, or assess an alternating part on its own",
                AffectedResults.Current | AffectedResults.Heating));
        }

        // u_k(t): the emf per unit flux coupling of term k; while leaving, the flux each term put through falls linearly to zero.
        var drives = new Func<double, double>[terms.Count];
        for (int k = 0; k < terms.Count; k++)
        {
            FieldWaveform waveform = terms[k].Waveform;
            double heldAtLeave = waveform.Value(leave);
            drives[k] = t => t < leave ? -waveform.Rate(t) : t < outside ? heldAtLeave / leaving : 0;
        }

        // d_k(t) as the item sees it: the drive while in place, falling linearly to zero while carried out; held after
        // the exposure for a fixed item.
        var values = new Func<double, double>[terms.Count];
        for (int k = 0; k < terms.Count; k++)
        {
            FieldWaveform waveform = terms[k].Waveform;
            double heldAtLeave = waveform.Value(leave);
            values[k] = t => t < leave ? waveform.Value(t) : leaving <= 0 ? heldAtLeave : t < outside ? heldAtLeave * (1 - ((t - leave) / leaving)) : 0;
        }

        TransientRun run = overBudget
            ? new TransientRun { Heating = new[] { new HeatingSample(begin, double.NaN, 0) }, FinalCelsius = double.NaN, PeakCurrentAmperes = double.NaN, EnergyJoules = double.NaN }
            : new TransientPathSolver(c.Modal!, c.Paths!.ScaleAt, c.Thermal)
            {
                StopAboveCelsius = c.MeltingCelsius,
                MaxStepSeconds = maxStep,
                MaxStepAt = t => LeastMaxStepAt(terms, t),
                CurvedUntilSeconds = curvedUntil,
                CoolingFromSeconds = outside,
                MaxSteps = budget,
                CrossCoupling = c.CrossCoupling,
                CrossPowerFactor = c.CrossPowerFactor,
                DriveValues = values,
                TorqueField = c.TorqueField,
                CentreField = c.TiltTorqueFactor > 0 ? c.CentreField : null,
            }.Run(drives, Emf, breakpoints, begin, end, c.Start, cancellation);
        NoteHowItEnded(c, run.MeltedAtSeconds, run.BudgetExceeded, "the circuit solver");

        double tau = c.Ldc / c.Rdc;
        double rampTime = double.PositiveInfinity;
        for (int k = 0; k < terms.Count; k++)
        {
            rampTime = Math.Min(rampTime, terms[k].Waveform.TimeScales[0].Seconds);
        }

        bool single = c.Paths!.IsSingle;
        c.Notes.Add(
            (run.Steps, modes: c.Modal!.Count, undriven: c.Paths.Paths!.Count - c.Modal.Count, single, c.Ldc, tau),
            static n => "circuit: " + n.Steps + " exact exponential steps over " + n.modes + (n.single ? " mode" : " modes")
                + (n.undriven > 0 ? " (its other " + n.undriven + ", odd about its mid-plane, are not driven: the field links both halves alike)" : string.Empty)
                + ", L = " + SiFormat.Format(n.Ldc, "H") + ", L/R = " + SiFormat.Format(n.tau, "s") + (n.single ? string.Empty : " (the leading mode's)"));
        return drive with
        {
            Heating = Heated(c, run.Heating, run.FinalCelsius, run.EnergyJoules),
            Model = single
                ? "thin ring (Grover 1946) as an RL circuit, exact exponential steps with R(T); lumped heating with rho(T) and cooling"
                : c.Paths.Description + " (" + c.Paths.Paths!.InductanceMethod + "), exact exponential steps over the modes of the (L, R) pencil with R(T)" + CrossWords(c) + "; lumped heating with rho(T) and cooling",
            LaterRegime = LaterText.From(tau / rampTime, static ratio => Regime(ratio, "L/R / ramp time")),
            PeakCurrentAmperes = Math.Abs(run.PeakCurrentAmperes),
            NaiveCurrentAmperes = peakEmf / c.Rdc,
            InductiveLimitCurrentAmperes = single ? fluxSwing / c.Ldc : EngineMechanics.InductiveLimit(c.Modal, driveSwing),
            PeriodicSteadyStateCelsius = EngineMechanics.PeriodicSteadyState(c, run.EnergyJoules),
            LaterCurrentSense = LaterText.From((run.PeakCurrentAmperes, c.Normal, c.FieldDirection), static s => LenzSense.Transient(s.PeakCurrentAmperes, s.Normal, s.FieldDirection)),
            CircuitSeries = run.Circuit,
            PathCount = c.Paths.Paths!.Count,
            Forces = (run.PeakForce, run.Impulse, run.PeakTorqueNewtonMeters, null),
            PeakTorqueTurnedNewtonMeters = c.TiltTorqueFactor > 0 ? c.TiltTorqueFactor * run.PeakMomentField : null,
        };
    }

    /// <summary>The words for the cross-axis heating, when the field has a part across a body's axis.</summary>
    private static string CrossWords(EngineContext c) => c.CrossPowerFactor > 0 && c.CrossCoupling.Any(v => v.Any(x => x != 0))
        ? ", plus the heating by the field across the axis bounded from above at its low-frequency value (Thomson's minimum-dissipation principle)"
        : string.Empty;

    /// <summary>
    /// A run that melted the item stops there (a molten loop opens, and nothing after it is modelled); one that ran
    /// out of steps is incomplete, so what it would have shown is not known.
    /// </summary>
    private static void NoteHowItEnded(EngineContext c, double? meltedAt, bool budgetExceeded, string solver)
    {
        if (meltedAt is { } t)
        {
            c.Notes.Add((c.MeltingCelsius, t), static n => "the item passed its melting point (" + SiFormat.Celsius(n.MeltingCelsius) + ") at t = " + SiFormat.Format(n.t, "s") + "; the model stops there, as a molten loop opens");
        }

        if (budgetExceeded)
        {
            c.Issues.Add(new ValidityIssue(solver + " ran out of steps (or time stopped advancing) before the end of the exposure, so the result is incomplete", AffectedResults.Current | AffectedResults.Heating));
        }
    }

    /// <summary>A closed loop's heating history and what follows from it.</summary>
    private static HeatingFindings Heated(EngineContext c, IReadOnlyList<HeatingSample> heating, double finalCelsius, double energy)
    {
        double? melted = TemperatureHistory.FirstReaching(heating, c.Scenario.Item.Material.MeltingCelsius);
        return new HeatingFindings(heating, energy, TemperatureHistory.Peak(heating), finalCelsius, melted, melted is { } t ? MeltThrough(c, heating, t) : null);
    }

    /// <summary>
    /// How long after reaching its melting point the item would take to melt through, if the power it takes in there
    /// held: its latent heat m L over that power less what it loses at the melting point. Null when the latent heat
    /// is not known or the losses there match the power (the item would stay partly molten).
    /// </summary>
    private static double? MeltThrough(EngineContext c, IReadOnlyList<HeatingSample> heating, double meltedAt)
    {
        double melting = c.Scenario.Item.Material.MeltingCelsius;
        double latent = c.Scenario.Item.MassKilograms * c.Scenario.Item.Material.LatentHeatJoulesPerKilogram;
        HeatingSample at = heating.FirstOrDefault(s => s.TimeSeconds >= meltedAt) ?? heating[heating.Count - 1];
        double lost = c.Thermal.TransferCoefficient(melting) * c.Thermal.SurfaceSquareMeters * (melting - c.Thermal.Environment.AmbientCelsius);
        double net = at.PowerWatts - lost;
        return net > 0 && Finite.Is(latent / net) ? latent / net : null;
    }

    /// <summary>A split ring: the emf appears across the gap, no current flows (gap capacitance neglected), nothing heats.</summary>
    private static InductionResponse Open(InductionResponse r, EngineContext c, IReadOnlyList<CircuitSample> series, double begin, double end)
    {
        c.Notes.Add("split ring: open circuit, the emf appears across the gap; the gap's capacitance is neglected");
        return r with
        {
            Model = "split ring: open-circuit emf -dPhi/dt across the gap (no current; gap capacitance neglected)",
            GapVoltageVolts = r.PeakEmfVolts,
            Regime = "open circuit",
            CurrentSense = "no current: the loop is open; the emf appears across the gap",
            CircuitSeries = series,
            HeatingSeries = new[] { new HeatingSample(begin, c.Start, 0), new HeatingSample(end, c.Start, 0) },
        };
    }

    /// <summary>
    /// How long the cooling after the exposure is followed: three cooling time constants, and at least ten L/R
    /// so that the current has died away. The item is still worn or held while it cools.
    /// </summary>
    /// <remarks>
    /// With nothing to cool the item (no convection, no radiation) its cooling time is infinite and there is no
    /// cooling to follow: the tail is then only the current's decay, so the run ends.
    /// </remarks>
    private static double CoolingTail(EngineContext c)
    {
        double cooling = c.Thermal.TimeConstantSeconds(c.Start);
        return Math.Max(10 * c.Ldc / c.Rdc, double.IsInfinity(cooling) ? 0 : 3 * cooling);
    }

    /// <summary>Adds a time to the list when it is before the end.</summary>
    private static void AddBefore(List<double> times, double t, double end)
    {
        if (t < end)
        {
            times.Add(t);
        }
    }

    /// <summary>
    /// The steps the curved part of a run takes at least, from begin to curvedUntil: each stretch between breakpoints at
    /// the largest step from its start (<see cref="FieldWaveform.MaxStepAt"/>, which changes only at a breakpoint). A
    /// crowbarred discharge's long decay counts at its own step, not at the first peak's.
    /// </summary>
    private static double CurvedSteps(IReadOnlyList<Fields.SourceTerm> terms, double[] breakpoints, double begin, double curvedUntil)
    {
        double steps = 0, from = begin;
        foreach (double b in breakpoints.Append(curvedUntil))
        {
            if (b <= from)
            {
                continue;
            }

            double to = Math.Min(b, curvedUntil);
            steps += (to - from) / LeastMaxStepAt(terms, from);
            from = to;
            if (from >= curvedUntil)
            {
                break;
            }
        }

        return steps;
    }

    /// <summary>The least of the terms' largest steps from a time on (<see cref="FieldWaveform.MaxStepAt"/>), s.</summary>
    private static double LeastMaxStepAt(IReadOnlyList<Fields.SourceTerm> terms, double t)
    {
        double least = double.PositiveInfinity;
        for (int k = 0; k < terms.Count; k++)
        {
            least = Math.Min(least, terms[k].Waveform.MaxStepAt(t));
        }

        return least;
    }

    /// <summary>The shortest of the terms' longest steps, s (NaN if any is, as Enumerable.Min gives it).</summary>
    private static double LeastMaxStep(IReadOnlyList<Fields.SourceTerm> terms)
    {
        double least = double.PositiveInfinity;
        for (int k = 0; k < terms.Count; k++)
        {
            least = Math.Min(least, terms[k].Waveform.MaxStepSeconds);
        }

        return least;
    }

    /// <summary>The largest value of f over the times, NaN only when every value is NaN (as <see cref="Enumerable.Max(IEnumerable{double})"/> gives it).</summary>
    private static double Largest(double[] times, Func<double, double> f)
    {
        double largest = f(times[0]);
        for (int i = 1; i < times.Length; i++)
        {
            double value = f(times[i]);
            if (value > largest || double.IsNaN(largest))
            {
                largest = value;
            }
        }

        return largest;
    }

    /// <summary>
    /// Any result that is not a finite number, and that no recorded issue already covers, makes the response
    /// Indeterminate with the reason (added to the response's own list).
    /// </summary>
    private static void CheckFinite(InductionResponse r, List<ValidityIssue> issues)
    {
        List<string>? failures = null;
        void Check(string name, double? value, AffectedResults needs)
        {
            if (value is { } v && !Finite.Is(v) && !Covered(issues, needs))
            {
                (failures ??= new List<string>()).Add(name + " is " + v.ToString(System.Globalization.CultureInfo.InvariantCulture));
            }
        }

        Check("the peak emf", r.PeakEmfVolts, AffectedResults.Emf);
        Check("the rms emf", r.RmsEmfVolts, AffectedResults.Emf);
        Check("the peak current", r.PeakCurrentAmperes, AffectedResults.Current);
        Check("the energy", r.EnergyDissipatedJoules, AffectedResults.Current | AffectedResults.Heating);
        Check("the peak temperature", r.PeakTemperatureCelsius, AffectedResults.Heating);
        Check("the final temperature", r.FinalTemperatureCelsius, AffectedResults.Heating);
        if (failures is not null)
        {
            issues.Add(new ValidityIssue("numerical failure: " + string.Join(", ", failures) + " (are the inputs physically sensible?)", AffectedResults.All));
        }
    }

    /// <summary>True when a recorded issue already covers every result in <paramref name="needs"/>.</summary>
    private static bool Covered(List<ValidityIssue> issues, AffectedResults needs)
    {
        foreach (ValidityIssue issue in issues)
        {
            if ((issue.Affects & needs) == needs)
            {
                return true;
            }
        }

        return false;
    }

    private static string Regime(double ratio, string name)
    {
        string shown = name + " = " + SiFormat.Plain(ratio);
        if (ratio > 3)
        {
            return "inductive (" + shown + "): inductance limits the current";
        }

        return ratio < 1.0 / 3 ? "resistive (" + shown + "): resistance limits the current" : "mixed (" + shown + ")";
    }
}
