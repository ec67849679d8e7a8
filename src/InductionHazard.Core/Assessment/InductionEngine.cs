using System;
using System.Collections.Generic;
using System.Linq;
using System.Numerics;
using System.Threading;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Mechanics;
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
        var c = new Common(scenario);
        InductionResponse response;
        if (c.FieldFailed)
        {
            response = Base(c) with
            {
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
            response = Magnetised(response, c);
        }

        if (scenario.Placement.Velocity is not null)
        {
            response = Moving(response, c);
        }

        CheckFinite(response, c.Issues);
        return response;
    }

    /// <summary>
    /// An item moved at a velocity v through the source's field, held at its peak drive: the motional emf around
    /// its outline, |sum_j d_j v . grad M_j|, which a split ring carries across its gap; and for a closed item the
    /// braking force in the resistive limit, F = -sum_k (v . g_k) g_k / s with g_k = sum_j G_kj d_j (each mode carrying
    /// its steady current (v . g_k) / s), an upper bound on the force at any speed, and the speed at which it
    /// equals the item's weight.
    /// </summary>
    private static InductionResponse Moving(InductionResponse response, Common c)
    {
        Vector3D v = c.Scenario.Placement.Velocity!.Value;
        var terms = c.Scenario.Source.Terms;
        var peak = new double[terms.Count];
        for (int j = 0; j < peak.Length; j++)
        {
            peak[j] = terms[j].Waveform.PeakValue;
        }

        try
        {
            ItemPaths outline = ItemPaths.For(c.Scenario.Item, c.Frequency, c.Start, thinLoop: true);
            Vector3D[,] gradient = outline.CouplingGradient(c.Scenario.Source, c.Scenario.Placement.Centre, c.Normal);
            double rate = 0;
            for (int j = 0; j < peak.Length; j++)
            {
                rate += peak[j] * v.Dot(gradient[0, j]);
            }

            double motional = Math.Abs(rate);
            c.Notes.Add("moved at " + SiFormat.Format(v.Length, "m/s") + " along " + v.Normalized() + " through the field at its peak drive: motional emf " + SiFormat.Format(motional, "V"));
            response = response with
            {
                MotionalEmfVolts = motional,
                GapVoltageVolts = response.GapVoltageVolts is { } gap ? Math.Max(gap, motional) : null,
            };
        }
        catch (FieldEvaluationException ex)
        {
            c.Issues.Add(new ValidityIssue("the motional emf cannot be found along the item's outline: " + ex.Message, AffectedResults.Emf | AffectedResults.Current));
            return response;
        }

        if (c.Modal?.ForceCoupling is not { } g)
        {
            return response;
        }

        double s = c.Paths!.ScaleAt(c.Start);
        Vector3D unit = v.Normalized(), perSpeed = Vector3D.Zero;
        for (int k = 0; k < c.Modal.Count; k++)
        {
            Vector3D gk = Vector3D.Zero;
            for (int j = 0; j < peak.Length; j++)
            {
                gk += peak[j] * g[k, j];
            }

            perSpeed += (-unit.Dot(gk) / s) * gk;
        }

        double braking = perSpeed.Length * v.Length;
        double weight = c.Scenario.Item.MassKilograms * PhysicalConstants.StandardGravity;
        c.Notes.Add("braking in the resistive limit (an upper bound): " + SiFormat.Format(braking, "N") + " at " + SiFormat.Format(v.Length, "m/s") + ", equal to the weight at " + SiFormat.Format(perSpeed.Length > 0 ? weight / perSpeed.Length : double.PositiveInfinity, "m/s"));
        return response with
        {
            BrakingForceNewtons = braking,
            SpeedForWeightMetersPerSecond = perSpeed.Length > 0 ? weight / perSpeed.Length : null,
        };
    }

    /// <summary>
    /// A ferromagnetic item: its pull toward stronger field and the bound on its twist, from its magnetisation in the
    /// source's field (the induced-current results do not apply to it; the validity issue says so).
    /// </summary>
    private static InductionResponse Magnetised(InductionResponse response, Common c)
    {
        try
        {
            FerromagneticAttraction pull = FerromagneticAttraction.At(c.Scenario.Source, c.Scenario.Placement.Centre, c.Scenario.Item);
            c.Notes.Add("magnetisation: mu0 M = " + SiFormat.Format(pull.MagnetisationTesla, "T") + " in " + SiFormat.Format(pull.FieldTesla, "T") + " (demagnetising factor " + SiFormat.Plain(pull.DemagnetisingFactor)
                + ", the smallest over orientations), grad |B| = " + SiFormat.Format(pull.GradientTeslaPerMeter, "T/m"));
            return response with { Attraction = pull, PeakTorqueNewtonMeters = pull.TorqueNewtonMeters };
        }
        catch (FieldEvaluationException ex)
        {
            c.Issues.Add(new ValidityIssue("the field and its gradient at the item cannot be evaluated for its magnetisation: " + ex.Message, AffectedResults.Field));
            return response with { PeakTorqueNewtonMeters = double.NaN };
        }
    }

    private static InductionResponse Sinusoidal(Common c, CancellationToken cancellation)
    {
        var terms = c.Scenario.Source.Terms;
        double f = c.Frequency, omega = 2 * Math.PI * f;

        // d_k(t) = A_k sin(omega (t - S_k) + phi_k) = Im(A_k e^(j(phi_k - omega S_k)) e^(j omega t)); e = -sum M_k d_k'.
        Complex flux = Complex.Zero, field = Complex.Zero;
        for (int k = 0; k < terms.Count; k++)
        {
            var sine = (SineWaveform)terms[k].Waveform;
            Complex phasor = Complex.FromPolarCoordinates(sine.Amplitude, sine.PhaseRadians - (omega * sine.StartSeconds));
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
        c.Notes.Add("alternating drive at " + SiFormat.Format(f, "Hz") + ", periodic steady state (switch-on transients not modelled); the item is in the field for " + SiFormat.Format(off - on, "s") + ", then cools to " + SiFormat.Format(end - on, "s"));
        if (leaving > 0)
        {
            c.Notes.Add("leaving the field takes " + SiFormat.Format(leaving, "s") + ", counted at the full field (the field falls as the item is carried out, so this overstates)");
        }

        InductionResponse drive = Base(c) with
        {
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
            return Open(drive, c, OnePeriod(t => (emf * Complex.FromPolarCoordinates(1, omega * t)).Imaginary, f, on, c.Start), on, end);
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
            Vector3D crossRe = Vector3D.Zero, crossIm = Vector3D.Zero;
            for (int k = 0; k < terms.Count; k++)
            {
                var sine = (SineWaveform)terms[k].Waveform;
                // u_k = -d_k' has the phasor -j omega D_k.
                drives[k] = -Complex.ImaginaryOne * omega * Complex.FromPolarCoordinates(sine.Amplitude, sine.PhaseRadians - (omega * sine.StartSeconds));
                crossRe += drives[k].Real * c.CrossCoupling[k];
                crossIm += drives[k].Imaginary * c.CrossCoupling[k];
            }

            double crossAtUnitScale = 0.5 * c.CrossPowerFactor * (crossRe.Dot(crossRe) + crossIm.Dot(crossIm));
            steady = ItemPaths.Steady(c.Modal!, drives, omega, c.Paths.ScaleAt, crossAtUnitScale);
        }

        SinusoidalRun run = new SinusoidalPathSolver(steady, c.Thermal).Run(emf, f, on, off, end, c.Start, cancellation, c.MeltingCelsius);
        SteadyMechanics mechanics = SteadyForces(c, run.CurrentPhasor, omega);
        NoteHowItEnded(c, run.MeltedAtSeconds, run.BudgetExceeded, "the heating integrator");
        Complex z = run.Impedance;
        bool single = c.Paths.IsSingle;
        return (Heated(drive, c, run.Heating, run.FinalCelsius, run.EnergyJoules) with
        {
            Model = single
                ? "thin ring (Grover 1946) in periodic steady state: phasor current with skin effect (Kelvin functions); lumped heating with rho(T) and cooling, cycle-averaged"
                : c.Paths.Description + " (Maxwell mutual inductances), in periodic steady state by phasors over the modes of the (L, R) pencil" + CrossWords(c) + "; lumped heating with rho(T) and cooling, cycle-averaged",
            AcResistanceOhms = single ? z.Real : null,
            InductanceHenries = single ? z.Imaginary / omega : c.Ldc,
            TimeConstantSeconds = single ? z.Imaginary / omega / z.Real : c.Ldc / c.Rdc,
            Regime = Regime(z.Imaginary / z.Real, single ? "omega L / R" : "omega L / R of the whole"),
            PeakCurrentAmperes = run.PeakCurrentAmperes,
            NaiveCurrentAmperes = emf.Magnitude / c.Rdc,
            CurrentSense = LenzSense.Alternating(f, Math.Atan2(z.Imaginary, z.Real), c.Normal, c.FieldDirection),
            CircuitSeries = run.Circuit,
            PathCount = c.Paths.Paths!.Count,
        }).WithForces(mechanics.PeakForce, null, mechanics.PeakTorqueNewtonMeters, mechanics.MeanForce);
    }

    private static InductionResponse Transient(Common c, CancellationToken cancellation)
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
        double Linked(double[] perUnitDrive, double t) => Sum(perUnitDrive, k => terms[k].Waveform.Value(t));
        double fluxAtLeave = Linked(c.Coupling, leave);

        // Leaving is a flux change of its own: the flux the loop holds falls linearly to zero while it is carried out.
        double Emf(double t) => t < leave ? -Sum(c.Coupling, k => terms[k].Waveform.Rate(t)) : t < outside ? fluxAtLeave / leaving : 0;

        double[] breakpoints = source.BreakpointsBetween(begin, end).Where(t => t < leave).Append(leave).Append(outside).Where(t => t < end).Distinct().OrderBy(t => t).ToArray();
        double[] times = DriveSampling.Times(terms.Select(t => t.Waveform).ToArray()).Where(t => t < leave).Append(begin).Append(leave).Distinct().OrderBy(t => t).ToArray();
        double peakEmf = times.Max(t => Math.Abs(Emf(t)));
        if (leaving > 0)
        {
            peakEmf = Math.Max(peakEmf, Math.Abs(fluxAtLeave / leaving));
        }

        double flux0 = Linked(c.Coupling, begin);
        double swingAt = times.OrderByDescending(t => Math.Abs(Linked(c.Coupling, t) - flux0)).First();
        double fluxSwing = Math.Abs(Linked(c.Coupling, swingAt) - flux0);
        double[] driveSwing = terms.Select(term => term.Waveform.Value(swingAt) - term.Waveform.Value(begin)).ToArray();
        if (leaving > 0 && Math.Abs(flux0) > fluxSwing)
        {
            fluxSwing = Math.Abs(flux0);
            driveSwing = terms.Select(term => -term.Waveform.Value(begin)).ToArray();
        }
        double fluxChange = (leaving > 0 ? 0 : fluxAtLeave) - flux0;
        c.Notes.Add("transient drive from " + SiFormat.Format(begin, "s") + " to " + SiFormat.Format(fieldEnd, "s") + "; the item is in the field for " + SiFormat.Format(leave - begin, "s")
            + (leaving > 0 ? ", is carried out over " + SiFormat.Format(leaving, "s") + " (the flux it holds, " + SiFormat.Format(fluxAtLeave, "Wb") + ", falling to zero)" : ", stays in place (fixed)")
            + ", then cools to " + SiFormat.Format(end - begin, "s"));

        InductionResponse drive = Base(c) with
        {
            PeakFluxDensityTesla = times.Max(t => Math.Abs(Linked(c.NormalField, t))),
            PeakFluxWebers = times.Max(t => Math.Abs(Linked(c.Coupling, t))),
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
            return Open(drive, c, shown.Where((_, i) => i % stride == 0).Select(t => new CircuitSample(t, Emf(t), 0, c.Start)).ToArray(), begin, end);
        }

        if (c.PathProblem(drive) is { } unsolved)
        {
            return unsolved;
        }

        double maxStep = terms.Min(t => t.Waveform.MaxStepSeconds);
        int budget = HeatingIntegrator.DefaultMaxSteps + (4 * breakpoints.Length);
        double curvedUntil = Math.Min(leave, fieldEnd);
        bool overBudget = !double.IsInfinity(maxStep) && (curvedUntil - begin) / maxStep > budget;
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
                CurvedUntilSeconds = curvedUntil,
                MaxSteps = budget,
                CrossCoupling = c.CrossCoupling,
                CrossPowerFactor = c.CrossPowerFactor,
                DriveValues = values,
                TorqueField = c.TorqueField,
            }.Run(drives, Emf, breakpoints, begin, end, c.Start, cancellation);
        NoteHowItEnded(c, run.MeltedAtSeconds, run.BudgetExceeded, "the circuit solver");

        double tau = c.Ldc / c.Rdc;
        double rampTime = terms.Min(t => t.Waveform.TimeScales[0].Seconds);
        bool single = c.Paths!.IsSingle;
        c.Notes.Add("circuit: " + run.Steps + " exact exponential steps over " + c.Modal!.Count + (single ? " mode" : " modes") + ", L = " + SiFormat.Format(c.Ldc, "H") + ", L/R = " + SiFormat.Format(tau, "s") + (single ? string.Empty : " (the leading mode's)"));
        return (Heated(drive, c, run.Heating, run.FinalCelsius, run.EnergyJoules) with
        {
            Model = single
                ? "thin ring (Grover 1946) as an RL circuit, exact exponential steps with R(T); lumped heating with rho(T) and cooling"
                : c.Paths.Description + " (Maxwell mutual inductances), exact exponential steps over the modes of the (L, R) pencil with R(T)" + CrossWords(c) + "; lumped heating with rho(T) and cooling",
            Regime = Regime(tau / rampTime, "L/R / ramp time"),
            PeakCurrentAmperes = Math.Abs(run.PeakCurrentAmperes),
            NaiveCurrentAmperes = peakEmf / c.Rdc,
            InductiveLimitCurrentAmperes = single ? fluxSwing / c.Ldc : InductiveLimit(c.Modal, driveSwing),
            PeriodicSteadyStateCelsius = PeriodicSteadyState(c, run.EnergyJoules),
            CurrentSense = LenzSense.Transient(run.PeakCurrentAmperes, c.Normal, c.FieldDirection),
            CircuitSeries = run.Circuit,
            PathCount = c.Paths.Paths!.Count,
        }).WithForces(run.PeakForce, run.Impulse, run.PeakTorqueNewtonMeters, null);
    }

    /// <summary>
    /// The force and torque over one cycle at the starting temperature: the modal amplitudes from the steady state
    /// (one path: the total current over its weight), the drive phasors D_k of d_k(t) = Im(D_k e^(j omega t)).
    /// </summary>
    private static SteadyMechanics SteadyForces(Common c, Complex totalCurrent, double omega)
    {
        var terms = c.Scenario.Source.Terms;
        ModalCircuit modal = c.Modal!;
        var drives = new Complex[terms.Count];
        var rates = new Complex[terms.Count];
        for (int k = 0; k < terms.Count; k++)
        {
            var sine = (SineWaveform)terms[k].Waveform;
            drives[k] = Complex.FromPolarCoordinates(sine.Amplitude, sine.PhaseRadians - (omega * sine.StartSeconds));
            rates[k] = -Complex.ImaginaryOne * omega * drives[k];
        }

        var amplitudes = new Complex[modal.Count];
        if (modal.Count == 1)
        {
            amplitudes[0] = totalCurrent / modal.TotalWeights[0];
        }
        else
        {
            double s = c.Paths!.ScaleAt(c.Start);
            for (int k = 0; k < modal.Count; k++)
            {
                Complex forcing = Complex.Zero;
                for (int j = 0; j < terms.Count; j++)
                {
                    forcing += modal.Coupling[k, j] * rates[j];
                }

                amplitudes[k] = forcing / new Complex(s, omega * modal.Lambdas[k]);
            }
        }

        return SteadyMechanics.Of(modal, amplitudes, drives, c.TorqueField);
    }

    /// <summary>
    /// The total current of a path set when its resistance is negligible against the change (the inductive limit):
    /// each mode then carries z_k = -(C Delta d)_k / lambda_k, and the total is t . z. For one path, Delta Phi / L.
    /// </summary>
    private static double InductiveLimit(ModalCircuit modal, double[] driveSwing)
    {
        double total = 0;
        for (int k = 0; k < modal.Count; k++)
        {
            double forcing = 0;
            for (int j = 0; j < driveSwing.Length; j++)
            {
                forcing += modal.Coupling[k, j] * driveSwing[j];
            }

            total += modal.TotalWeights[k] * forcing / modal.Lambdas[k];
        }

        return Math.Abs(total);
    }

    /// <summary>
    /// For a train of pulses (every term repeated with one period P and count n): the temperature the item would
    /// settle at just after each pulse if the train went on, T0 + (E1 / C) / (1 - e^(-P / tau)), with E1 the energy of
    /// one pulse (the run's energy over n; pulses short against P) and tau = C / (h A) the cooling time (the sum of a
    /// geometric series of pulses each decaying by e^(-P/tau) before the next). Null for a single pulse, or when
    /// nothing cools the item (it then has no steady state and heats with every pulse).
    /// </summary>
    private static double? PeriodicSteadyState(Common c, double energyJoules)
    {
        var terms = c.Scenario.Source.Terms;
        if (!terms.All(t => t.Waveform is RepeatedWaveform r && r.Count > 1) || terms.Select(t => t.Waveform.PeriodSeconds).Distinct().Count() != 1)
        {
            return null;
        }

        var first = (RepeatedWaveform)terms[0].Waveform;
        double tau = c.Thermal.TimeConstantSeconds(c.Start);
        if (double.IsInfinity(tau) || !Finite.Is(energyJoules))
        {
            c.Notes.Add("pulse train: nothing cools the item, so it has no periodic steady state and heats with every pulse");
            return null;
        }

        double perPulse = energyJoules / first.Count / c.Thermal.HeatCapacityJoulesPerKelvin;
        double settled = c.Start + (perPulse / -Exponential.Minus1(-first.PeriodSeconds / tau));
        c.Notes.Add("pulse train: if it went on, the item would settle near " + SiFormat.Celsius(settled) + " just after each pulse (each pulse adds " + SiFormat.Format(perPulse, "K") + ", cooling time " + SiFormat.Format(tau, "s") + ")");
        return settled;
    }

    /// <summary>The words for the cross-axis heating, when the field has a part across a body's axis.</summary>
    private static string CrossWords(Common c) => c.CrossPowerFactor > 0 && c.CrossCoupling.Any(v => v.Length > 0)
        ? ", plus the heating by the field across the axis bounded from above at its low-frequency value (Thomson's minimum-dissipation principle)"
        : string.Empty;

    /// <summary>
    /// A run that melted the item stops there (a molten loop opens, and nothing after it is modelled); one that ran
    /// out of steps is incomplete, so what it would have shown is not known.
    /// </summary>
    private static void NoteHowItEnded(Common c, double? meltedAt, bool budgetExceeded, string solver)
    {
        if (meltedAt is { } t)
        {
            c.Notes.Add("the item passed its melting point (" + SiFormat.Celsius(c.MeltingCelsius) + ") at t = " + SiFormat.Format(t, "s") + "; the model stops there, as a molten loop opens");
        }

        if (budgetExceeded)
        {
            c.Issues.Add(new ValidityIssue(solver + " ran out of steps (or time stopped advancing) before the end of the exposure, so the result is incomplete", AffectedResults.Current | AffectedResults.Heating));
        }
    }

    /// <summary>What every response has: the scenario, the notes and issues, the loop, and the item at its starting temperature.</summary>
    private static InductionResponse Base(Common c) => new()
    {
        Scenario = c.Scenario,
        ModelNotes = c.Notes,
        ValidityIssues = c.Issues,
        Normal = c.Normal,
        Orientation = c.Orientation,
        LoopAreaSquareMeters = c.Scenario.Item.Loop.LoopAreaSquareMeters,
        FrequencyHertz = c.Frequency,
        ResistanceOhms = c.Rdc,
        InductanceHenries = c.Ldc,
        TimeConstantSeconds = c.Ldc / c.Rdc,
        SkinDepthMeters = SkinEffect.SkinDepthMeters(c.Scenario.Item.Material.ResistivityAt(c.Start), c.Frequency, c.Scenario.Item.Material.RelativePermeability),
        InitialTemperatureCelsius = c.Start,
        PeakTemperatureCelsius = c.Start,
        FinalTemperatureCelsius = c.Start,
    };

    /// <summary>A closed loop's heating history and what follows from it.</summary>
    private static InductionResponse Heated(InductionResponse r, Common c, IReadOnlyList<HeatingSample> heating, double finalCelsius, double energy) => r with
    {
        EnergyDissipatedJoules = energy,
        PeakTemperatureCelsius = TemperatureHistory.Peak(heating),
        FinalTemperatureCelsius = finalCelsius,
        MeltingReachedSeconds = TemperatureHistory.FirstReaching(heating, c.Scenario.Item.Material.MeltingCelsius),
        HeatingSeries = heating,
    };

    /// <summary>A split ring: the emf appears across the gap, no current flows (gap capacitance neglected), nothing heats.</summary>
    private static InductionResponse Open(InductionResponse r, Common c, IReadOnlyList<CircuitSample> series, double begin, double end)
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
    private static double CoolingTail(Common c)
    {
        double cooling = c.Thermal.TimeConstantSeconds(c.Start);
        return Math.Max(10 * c.Ldc / c.Rdc, double.IsInfinity(cooling) ? 0 : 3 * cooling);
    }

    private static double Sum(double[] perUnitDrive, Func<int, double> drive)
    {
        double sum = 0;
        for (int k = 0; k < perUnitDrive.Length; k++)
        {
            sum += perUnitDrive[k] * drive(k);
        }

        return sum;
    }

    private static CircuitSample[] OnePeriod(Func<double, double> emf, double frequencyHertz, double t0, double celsius)
    {
        const int N = 128;
        return Enumerable.Range(0, N + 1)
            .Select(k => k / (N * frequencyHertz))
            .Select(t => new CircuitSample(t0 + t, emf(t), 0, celsius))
            .ToArray();
    }

    /// <summary>
    /// Any result that is not a finite number, and that no recorded issue already covers, makes the response
    /// Indeterminate with the reason (added to the response's own list).
    /// </summary>
    private static void CheckFinite(InductionResponse r, List<ValidityIssue> issues)
    {
        var failures = new (string Name, double? Value, AffectedResults Needs)[]
            {
                ("the peak emf", r.PeakEmfVolts, AffectedResults.Emf), ("the rms emf", r.RmsEmfVolts, AffectedResults.Emf),
                ("the peak current", r.PeakCurrentAmperes, AffectedResults.Current), ("the energy", r.EnergyDissipatedJoules, AffectedResults.Current | AffectedResults.Heating),
                ("the peak temperature", r.PeakTemperatureCelsius, AffectedResults.Heating), ("the final temperature", r.FinalTemperatureCelsius, AffectedResults.Heating),
            }
            .Where(f => f.Value is { } v && !Finite.Is(v) && !issues.Any(i => (i.Affects & f.Needs) == f.Needs))
            .Select(f => f.Name + " is " + f.Value!.Value.ToString(System.Globalization.CultureInfo.InvariantCulture))
            .ToArray();
        if (failures.Length > 0)
        {
            issues.Add(new ValidityIssue("numerical failure: " + string.Join(", ", failures) + " (are the inputs physically sensible?)", AffectedResults.All));
        }
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

    /// <summary>What every branch of the engine needs: the coupling of each term, the circuit, the heating model and the start.</summary>
    private sealed class Common
    {
        public Common(Scenario scenario)
        {
            Scenario = scenario;
            FieldSource source = scenario.Source;
            Vector3D centre = scenario.Placement.Centre;
            LoopGeometry loop = scenario.Item.Loop;
            Circuit = new RingCircuit(scenario.Item);
            // A worn or held item sits on skin that blood flow holds near 33 °C: it cannot cool below its starting
            // temperature, so it exchanges heat with surroundings at that temperature (less cooling than room air:
            // the safe side). A loose or fixed item starts at, and cools to, the room.
            ThermalEnvironment surroundings = scenario.Environment;
            var cooling = new ThermalEnvironment(scenario.InitialCelsius, surroundings.ConvectionWattsPerSquareMeterKelvin, surroundings.Emissivity);
            Thermal = new LumpedThermalModel(scenario.Item.MassKilograms * scenario.Item.Material.SpecificHeatJoulesPerKilogramKelvin, scenario.Item.Loop.SurfaceSquareMeters, cooling);
            Start = scenario.InitialCelsius;
            Rdc = Circuit.DcResistanceOhms(Start);
            Ldc = Circuit.DcInductanceHenries;
            Frequency = source.SignificantFrequencyHertz;
            Normal = scenario.Placement.Normal ?? Vector3D.UnitZ;
            FieldDirection = Normal;
            Coupling = new double[source.Terms.Count];
            NormalField = new double[source.Terms.Count];
            CrossCoupling = new Vector3D[source.Terms.Count];
            TorqueField = new Vector3D[source.Terms.Count];
            try
            {
                if (scenario.Placement.Normal is null || loop is SphereBody)
                {
                    // A sphere has no axis of its own: its filaments' axis follows the largest flux change.
                    Normal = FluxCoupling.WorstNormal(source, centre, loop);
                    Orientation = (loop is SphereBody ? "axis " : string.Empty) + "facing the largest flux change, normal " + Normal;
                }
                else
                {
                    Orientation = "as given, normal " + Normal;
                }

                Coupling = FluxCoupling.PerUnitDrive(source, centre, Normal, loop);
                Vector3D[] b = source.FieldPerUnitDrive(centre);
                NormalField = b.Select(v => v.Dot(Normal)).ToArray();
                Vector3D facing = Normal;
                TorqueField = b.Select(v => facing.Cross(v)).ToArray();
                FieldDirection = b[0].Length > 0 && b[0].IsFinite ? b[0].Normalized() : Normal;
                if (loop is BodyGeometry)
                {
                    // The field across a body's axis drives eddies the coaxial filaments do not carry (section 5 of the methods).
                    Vector3D n = Normal;
                    CrossCoupling = b.Select(v => v - (v.Dot(n) * n)).ToArray();
                }
            }
            catch (FieldEvaluationException ex)
            {
                FieldFailed = true;
                Orientation = scenario.Placement.Normal is null ? "not found: the field cannot be evaluated" : "as given, normal " + Normal;
                Issues.Add(new ValidityIssue(ex.Message, AffectedResults.All));
            }

            Notes.Add("placement: loop centre at " + centre + " m, " + Orientation);
        }

        /// <summary>
        /// Builds the item's current paths for a closed item: one for a thin loop, filaments otherwise. A body's
        /// resistance and inductance are then the equivalents of its low-frequency loss and its leading mode.
        /// </summary>
        public void BuildPaths(bool thin)
        {
            Paths = ItemPaths.For(Scenario.Item, Frequency, Start, thin);
            Notes.Add("current paths: " + Paths.Description);
            if (Paths.Problem is not null || Paths.Modes is null || FieldFailed)
            {
                return;
            }

            try
            {
                double[,] pathCoupling = Paths.Coupling(Scenario.Source, Scenario.Placement.Centre, Normal);
                Vector3D[,] gradient = Paths.CouplingGradient(Scenario.Source, Scenario.Placement.Centre, Normal);
                Modal = Paths.Modes.Drive(pathCoupling, gradient, Paths.PathAreas());
            }
            catch (FieldEvaluationException ex)
            {
                Issues.Add(new ValidityIssue(ex.Message, AffectedResults.Current | AffectedResults.Heating));
                return;
            }

            if (Scenario.Item.Loop is BodyGeometry body)
            {
                (double across, double along) = body.SecondMoments;
                CrossPowerFactor = across * along / (across + along) / Paths.ReferenceResistivityOhmMeters;
                (Rdc, Ldc) = Equivalent(Paths, body);
            }
        }

        /// <summary>
        /// A body's equivalent single turn on its outline: R such that (pi R_out^2 B')^2 / R is the filaments'
        /// low-frequency loss in a uniform axial field, and L that with R gives the leading mode's time constant.
        /// </summary>
        private static (double R, double L) Equivalent(ItemPaths paths, BodyGeometry body)
        {
            // In a uniform axial field each path links its own area: the modes' low-frequency loss per B'^2 is sum_k C_k^2.
            double[] areas = paths.PathAreas();
            var uniform = new double[areas.Length, 1];
            for (int i = 0; i < areas.Length; i++)
            {
                uniform[i, 0] = areas[i];
            }

            ModalCircuit axial = paths.Modes!.Drive(uniform);
            double conductance = 0, lead = 0, best = -1;
            for (int k = 0; k < axial.Count; k++)
            {
                double c2 = axial.Coupling[k, 0] * axial.Coupling[k, 0];
                conductance += c2;
                if (c2 * axial.Lambdas[k] > best)
                {
                    (best, lead) = (c2 * axial.Lambdas[k], axial.Lambdas[k]);
                }
            }

            double outline = body.LoopAreaSquareMeters;
            double r = outline * outline / conductance;
            return (r, lead * r);
        }

        /// <summary>
        /// When the paths cannot be solved: the issue recorded and a response whose current and heating are not
        /// numbers; null when they can.
        /// </summary>
        public InductionResponse? PathProblem(InductionResponse drive)
        {
            if (Modal is not null)
            {
                return null;
            }

            if (Paths?.Problem is { } problem)
            {
                Issues.Add(new ValidityIssue(problem, AffectedResults.Current | AffectedResults.Heating));
            }

            string why = Paths?.Problem
                ?? (Scenario.Item.Material.IsFerromagnetic ? "the induction model does not apply to a ferromagnetic item" : "the item's current paths could not be coupled to the source");
            return drive with
            {
                Model = "not solved: " + why,
                PeakCurrentAmperes = double.NaN,
                EnergyDissipatedJoules = double.NaN,
                PeakTemperatureCelsius = double.NaN,
                FinalTemperatureCelsius = double.NaN,
            };
        }

        public ItemPaths? Paths { get; private set; }

        public ModalCircuit? Modal { get; private set; }

        /// <summary>n x b_j: the normal crossed with each term's field per unit drive at the centre (the torque on the item's moment).</summary>
        public Vector3D[] TorqueField { get; } = Array.Empty<Vector3D>();

        /// <summary>The field across a body's axis at its centre per unit drive of each term (zero for a loop).</summary>
        public Vector3D[] CrossCoupling { get; }

        /// <summary>The cross-axis low-frequency loss factor at the reference resistivity, W per (T/s)^2 (zero for a loop).</summary>
        public double CrossPowerFactor { get; private set; }

        public bool FieldFailed { get; }

        public string Orientation { get; } = string.Empty;

        public Scenario Scenario { get; }

        public Vector3D Normal { get; }

        public Vector3D FieldDirection { get; }

        /// <summary>Flux through the loop per unit drive of each term, Wb per drive unit.</summary>
        public double[] Coupling { get; }

        /// <summary>The field normal to the loop at its centre per unit drive of each term.</summary>
        public double[] NormalField { get; }

        public RingCircuit Circuit { get; }

        public LumpedThermalModel Thermal { get; }

        public double Start { get; }

        public double Rdc { get; private set; }

        public double Ldc { get; private set; }

        public double Frequency { get; }

        public double MeltingCelsius => Scenario.Item.Material.MeltingCelsius;

        public List<string> Notes { get; } = new();

        public List<ValidityIssue> Issues { get; } = new();
    }
}
