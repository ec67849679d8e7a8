using System;
using System.Collections.Generic;
using System.Linq;
using System.Numerics;
using System.Threading;
using InductionHazard.Fields;
using InductionHazard.Induction;
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
        var notes = new List<string>();
        var issues = new List<ValidityIssue>();
        var item = scenario.Item;
        var source = scenario.Source;
        Vector3D normal = scenario.Placement.ResolveNormal(source);
        Vector3D centre = scenario.Placement.Centre;
        double radius = item.Ring.LoopRadiusMeters;
        double[] coupling = source.Terms.Select(t => t.Geometry.FluxThroughDisc(centre, normal, radius)).ToArray();
        double[] normalField = source.Terms.Select(t => t.Geometry.FieldPerUnitDrive(centre).Dot(normal)).ToArray();
        Vector3D fieldDirection = FieldDirection(source, centre, normal);

        double start = scenario.InitialCelsius;
        var circuit = new RingCircuit(item);
        var thermal = new LumpedThermalModel(item.MassKilograms * item.Material.SpecificHeatJoulesPerKilogramKelvin, item.Ring.SurfaceSquareMeters, scenario.Environment);
        double frequency = source.SignificantFrequencyHertz;
        ModelValidity.Check(item, frequency, source.IsSinusoidal, start, thermal, issues, notes);

        double rdc = circuit.DcResistanceOhms(start);
        double ldc = circuit.DcInductanceHenries;
        var common = new Common(scenario, normal, fieldDirection, coupling, normalField, circuit, thermal, start, rdc, ldc, frequency, notes, issues);

        InductionResponse response;
        if (source.IsSinusoidal)
        {
            response = Sinusoidal(common, cancellation);
        }
        else if (source.Terms.All(t => !t.Waveform.IsPeriodic))
        {
            response = Transient(common, cancellation);
        }
        else
        {
            issues.Add(new ValidityIssue("the source mixes alternating and transient terms, which this model does not solve", AffectedResults.All));
            response = Unsolved(common);
        }

        return CheckFinite(response, issues);
    }

    private static InductionResponse Sinusoidal(Common c, CancellationToken cancellation)
    {
        var terms = c.Scenario.Source.Terms;
        var first = (SineWaveform)terms[0].Waveform;
        double f = first.FrequencyHertz, omega = first.AngularFrequency;

        // d_k(t) = A_k sin(omega (t - S_k) + phi_k) = Im(A_k e^(j(phi_k - omega S_k)) e^(j omega t)); e = -sum M_k d_k'.
        Complex flux = Complex.Zero, field = Complex.Zero;
        for (int k = 0; k < terms.Count; k++)
        {
            var sine = (SineWaveform)terms[k].Waveform;
            Complex drive = Complex.FromPolarCoordinates(sine.Amplitude, sine.PhaseRadians - (omega * sine.StartSeconds));
            flux += c.Coupling[k] * drive;
            field += c.NormalField[k] * drive;
        }

        Complex emf = -Complex.ImaginaryOne * omega * flux;
        double on = c.Scenario.Source.StartSeconds;
        double runs = c.Scenario.Source.EndSeconds - on;
        double inField = c.Scenario.ExposureSeconds ?? Math.Min(runs, Scenario.LongestExposureSeconds);
        double off = on + Math.Min(inField, runs);
        double end = on + inField + CoolingTail(c);
        double delta = SkinEffect.SkinDepthMeters(c.Scenario.Item.Material.ResistivityAt(c.Start), f, c.Scenario.Item.Material.RelativePermeability);
        c.Notes.Add("alternating drive at " + SiFormat.Format(f, "Hz") + ", periodic steady state (switch-on transients not modelled); the item is in the field for " + SiFormat.Format(off - on, "s") + ", then cools to " + SiFormat.Format(end - on, "s"));

        if (c.Scenario.Item.IsSplit)
        {
            return Open(c, emf.Magnitude, emf.Magnitude / Math.Sqrt(2), EmfKind.Alternating, flux.Magnitude, field.Magnitude, null, delta, off - on, OnePeriodOpen(emf, f, on, c.Start), on, end);
        }

        var solver = new SinusoidalLoopSolver(t => c.Circuit.ImpedanceOhms(f, t), c.Thermal);
        SinusoidalRun run = solver.Run(emf, f, on, off, end, c.Start, cancellation);
        Complex z = run.Impedance;
        double qualityRatio = z.Imaginary / z.Real;
        return new InductionResponse
        {
            Scenario = c.Scenario,
            Model = "thin ring (Grover 1946) in periodic steady state: phasor current with skin effect (Kelvin functions); lumped heating with rho(T) and cooling, cycle-averaged",
            ModelNotes = c.Notes,
            ValidityIssues = c.Issues,
            Normal = c.Normal,
            LoopAreaSquareMeters = c.Scenario.Item.Ring.LoopAreaSquareMeters,
            PeakFluxDensityTesla = field.Magnitude,
            PeakFluxWebers = flux.Magnitude,
            FrequencyHertz = f,
            EmfKind = EmfKind.Alternating,
            PeakEmfVolts = emf.Magnitude,
            RmsEmfVolts = emf.Magnitude / Math.Sqrt(2),
            ResistanceOhms = c.Rdc,
            AcResistanceOhms = z.Real,
            InductanceHenries = z.Imaginary / omega,
            TimeConstantSeconds = z.Imaginary / omega / z.Real,
            SkinDepthMeters = delta,
            Regime = Regime(qualityRatio, "omega L / R"),
            PeakCurrentAmperes = run.PeakCurrentAmperes,
            NaiveCurrentAmperes = emf.Magnitude / c.Rdc,
            CurrentSense = LenzSense.Alternating(f, Math.Atan2(z.Imaginary, z.Real), c.Normal, c.FieldDirection),
            EnergyDissipatedJoules = run.EnergyJoules,
            InitialTemperatureCelsius = c.Start,
            PeakTemperatureCelsius = TemperatureHistory.Peak(run.Heating),
            FinalTemperatureCelsius = run.FinalCelsius,
            MeltingReachedSeconds = TemperatureHistory.FirstReaching(run.Heating, c.Scenario.Item.Material.MeltingCelsius),
            ExposureSeconds = off - on,
            AssessedSeconds = end - on,
            CircuitSeries = run.Circuit,
            HeatingSeries = run.Heating,
        };
    }

    /// <summary>
    /// How long the cooling after the exposure is followed: three cooling time constants, and at least ten L/R
    /// so that the current has died away. The item is still worn or held while it cools.
    /// </summary>
    private static double CoolingTail(Common c) => Math.Max(10 * c.Ldc / c.Rdc, 3 * c.Thermal.TimeConstantSeconds(c.Start));

    private static InductionResponse Transient(Common c, CancellationToken cancellation)
    {
        var source = c.Scenario.Source;
        var terms = source.Terms;
        double begin = source.StartSeconds;
        double fieldEnd = source.EndSeconds;
        double tauElectric = c.Ldc / c.Rdc;
        double leave = begin + (c.Scenario.ExposureSeconds ?? (fieldEnd - begin));
        double end = leave + CoolingTail(c);
        double Emf(double t)
        {
            if (t >= leave)
            {
                return 0;
            }

            double sum = 0;
            for (int k = 0; k < terms.Count; k++)
            {
                sum -= c.Coupling[k] * terms[k].Waveform.Rate(t);
            }

            return sum;
        }

        double Linked(double[] perUnitDrive, double t)
        {
            double sum = 0;
            for (int k = 0; k < terms.Count; k++)
            {
                sum += perUnitDrive[k] * terms[k].Waveform.Value(t);
            }

            return sum;
        }

        double stop = Math.Min(leave, fieldEnd);
        double[] breakpoints = source.BreakpointsBetween(begin, end).Append(leave).Where(t => t < end).Distinct().OrderBy(t => t).ToArray();
        double[] times = new[] { begin }.Concat(breakpoints.Where(t => t < stop)).Append(stop).Distinct().OrderBy(t => t).ToArray();
        double peakFlux = times.Max(t => Math.Abs(Linked(c.Coupling, t)));
        double peakField = times.Max(t => Math.Abs(Linked(c.NormalField, t)));
        double peakEmf = times.Zip(times.Skip(1), (a, b) => Math.Abs(Emf(0.5 * (a + b)))).DefaultIfEmpty(0).Max();
        double fluxChange = Linked(c.Coupling, stop) - Linked(c.Coupling, begin);
        double delta = SkinEffect.SkinDepthMeters(c.Scenario.Item.Material.ResistivityAt(c.Start), c.Frequency, c.Scenario.Item.Material.RelativePermeability);
        double rampTime = terms.Select(t => t.Waveform.TimeScales[0].Seconds).Min();
        c.Notes.Add("transient drive from " + SiFormat.Format(begin, "s") + " to " + SiFormat.Format(fieldEnd, "s") + "; the item is in the field for " + SiFormat.Format(leave - begin, "s") + ", then cools to " + SiFormat.Format(end - begin, "s"));
        if (leave < fieldEnd)
        {
            c.Notes.Add("the item leaves before the drive ends: the drive is taken to stop for it then; the flux change of moving out of the field is not modelled");
        }

        if (c.Scenario.Item.IsSplit)
        {
            var series = times.SelectMany(t => new[] { new CircuitSample(t, Emf(t), 0, c.Start) }).ToArray();
            return Open(c, peakEmf, null, EmfKind.Unidirectional, peakFlux, peakField, fluxChange, delta, leave - begin, series, begin, end);
        }

        var solver = new TransientLoopSolver(c.Ldc, c.Circuit.DcResistanceOhms, c.Thermal);
        TransientRun run = solver.Run(Emf, breakpoints, begin, end, c.Start, cancellation);
        if (run.BudgetExceeded)
        {
            c.Issues.Add(new ValidityIssue("the circuit solver ran out of steps before the end of the exposure", AffectedResults.Current | AffectedResults.Heating));
        }

        c.Notes.Add("circuit: " + run.Steps + " exact exponential steps, L = " + SiFormat.Format(c.Ldc, "H") + ", L/R = " + SiFormat.Format(tauElectric, "s"));
        return new InductionResponse
        {
            Scenario = c.Scenario,
            Model = "thin ring (Grover 1946) as an RL circuit, exact exponential steps with R(T); lumped heating with rho(T) and cooling",
            ModelNotes = c.Notes,
            ValidityIssues = c.Issues,
            Normal = c.Normal,
            LoopAreaSquareMeters = c.Scenario.Item.Ring.LoopAreaSquareMeters,
            PeakFluxDensityTesla = peakField,
            PeakFluxWebers = peakFlux,
            FluxChangeWebers = fluxChange,
            FrequencyHertz = c.Frequency,
            EmfKind = EmfKind.Unidirectional,
            PeakEmfVolts = peakEmf,
            ResistanceOhms = c.Rdc,
            InductanceHenries = c.Ldc,
            TimeConstantSeconds = tauElectric,
            SkinDepthMeters = delta,
            Regime = Regime(tauElectric / rampTime, "L/R / ramp time"),
            PeakCurrentAmperes = Math.Abs(run.PeakCurrentAmperes),
            NaiveCurrentAmperes = peakEmf / c.Rdc,
            InductiveLimitCurrentAmperes = Math.Abs(fluxChange) / c.Ldc,
            CurrentSense = LenzSense.Transient(run.PeakCurrentAmperes, c.Normal, c.FieldDirection),
            EnergyDissipatedJoules = run.EnergyJoules,
            InitialTemperatureCelsius = c.Start,
            PeakTemperatureCelsius = TemperatureHistory.Peak(run.Heating),
            FinalTemperatureCelsius = run.FinalCelsius,
            MeltingReachedSeconds = TemperatureHistory.FirstReaching(run.Heating, c.Scenario.Item.Material.MeltingCelsius),
            ExposureSeconds = leave - begin,
            AssessedSeconds = end - begin,
            CircuitSeries = run.Circuit,
            HeatingSeries = run.Heating,
        };
    }

    /// <summary>A split ring: the emf appears across the gap, no current flows (gap capacitance neglected), nothing heats.</summary>
    private static InductionResponse Open(Common c, double peakEmf, double? rmsEmf, EmfKind kind, double peakFlux, double peakField, double? fluxChange, double delta, double exposure, IReadOnlyList<CircuitSample> series, double begin, double end)
    {
        c.Notes.Add("split ring: open circuit, the emf appears across the gap; the gap's capacitance is neglected");
        return new InductionResponse
        {
            Scenario = c.Scenario,
            Model = "split ring: open-circuit emf -dPhi/dt across the gap (no current; gap capacitance neglected)",
            ModelNotes = c.Notes,
            ValidityIssues = c.Issues,
            Normal = c.Normal,
            LoopAreaSquareMeters = c.Scenario.Item.Ring.LoopAreaSquareMeters,
            PeakFluxDensityTesla = peakField,
            PeakFluxWebers = peakFlux,
            FluxChangeWebers = fluxChange,
            FrequencyHertz = c.Frequency,
            EmfKind = kind,
            PeakEmfVolts = peakEmf,
            RmsEmfVolts = rmsEmf,
            GapVoltageVolts = peakEmf,
            ResistanceOhms = c.Rdc,
            InductanceHenries = c.Ldc,
            TimeConstantSeconds = c.Ldc / c.Rdc,
            SkinDepthMeters = delta,
            Regime = "open circuit",
            PeakCurrentAmperes = 0,
            CurrentSense = "no current: the loop is open; the emf appears across the gap",
            InitialTemperatureCelsius = c.Start,
            PeakTemperatureCelsius = c.Start,
            FinalTemperatureCelsius = c.Start,
            ExposureSeconds = exposure,
            AssessedSeconds = end - begin,
            CircuitSeries = series,
            HeatingSeries = new[] { new HeatingSample(begin, c.Start, 0), new HeatingSample(end, c.Start, 0) },
        };
    }

    private static InductionResponse Unsolved(Common c) => new()
    {
        Scenario = c.Scenario,
        Model = "not solved",
        ModelNotes = c.Notes,
        ValidityIssues = c.Issues,
        Normal = c.Normal,
        PeakEmfVolts = double.NaN,
        PeakCurrentAmperes = double.NaN,
        EnergyDissipatedJoules = double.NaN,
        InitialTemperatureCelsius = c.Start,
        PeakTemperatureCelsius = double.NaN,
        FinalTemperatureCelsius = double.NaN,
        ResistanceOhms = c.Rdc,
        InductanceHenries = c.Ldc,
    };

    private static CircuitSample[] OnePeriodOpen(Complex emf, double frequencyHertz, double t0, double celsius)
    {
        const int N = 128;
        var samples = new CircuitSample[N + 1];
        for (int k = 0; k <= N; k++)
        {
            double t = k / (N * frequencyHertz);
            samples[k] = new CircuitSample(t0 + t, (emf * Complex.FromPolarCoordinates(1, 2 * Math.PI * frequencyHertz * t)).Imaginary, 0, celsius);
        }

        return samples;
    }

    /// <summary>
    /// Any result that is not a finite number makes the response Indeterminate, with the reason. The issues list
    /// is the one the response holds, so the issue appears in it.
    /// </summary>
    private static InductionResponse CheckFinite(InductionResponse r, List<ValidityIssue> issues)
    {
        var failures = new List<string>();
        void Check(string name, double? value)
        {
            if (value is { } v && !Finite.Is(v))
            {
                failures.Add(name + " is " + v.ToString(System.Globalization.CultureInfo.InvariantCulture));
            }
        }

        Check("the peak emf", r.PeakEmfVolts);
        Check("the rms emf", r.RmsEmfVolts);
        Check("the peak current", r.PeakCurrentAmperes);
        Check("the energy", r.EnergyDissipatedJoules);
        Check("the peak temperature", r.PeakTemperatureCelsius);
        Check("the final temperature", r.FinalTemperatureCelsius);
        if (failures.Count > 0 && !issues.Any(i => i.Affects == AffectedResults.All))
        {
            issues.Add(new ValidityIssue("numerical failure: " + string.Join(", ", failures) + " (are the inputs physically sensible?)", AffectedResults.All));
        }

        return r;
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

    private static Vector3D FieldDirection(FieldSource source, Vector3D centre, Vector3D normal)
    {
        Vector3D b = source.Terms[0].Geometry.FieldPerUnitDrive(centre);
        return b.Length > 0 && b.IsFinite ? b.Normalized() : normal;
    }

    /// <summary>What every branch of the engine needs.</summary>
    private sealed class Common
    {
        public Common(Scenario scenario, Vector3D normal, Vector3D fieldDirection, double[] coupling, double[] normalField, RingCircuit circuit, LumpedThermalModel thermal, double start, double rdc, double ldc, double frequency, List<string> notes, List<ValidityIssue> issues)
        {
            Scenario = scenario;
            Normal = normal;
            FieldDirection = fieldDirection;
            Coupling = coupling;
            NormalField = normalField;
            Circuit = circuit;
            Thermal = thermal;
            Start = start;
            Rdc = rdc;
            Ldc = ldc;
            Frequency = frequency;
            Notes = notes;
            Issues = issues;
        }

        public Scenario Scenario { get; }

        public Vector3D Normal { get; }

        public Vector3D FieldDirection { get; }

        public double[] Coupling { get; }

        public double[] NormalField { get; }

        public RingCircuit Circuit { get; }

        public LumpedThermalModel Thermal { get; }

        public double Start { get; }

        public double Rdc { get; }

        public double Ldc { get; }

        public double Frequency { get; }

        public List<string> Notes { get; }

        public List<ValidityIssue> Issues { get; }
    }
}
