using System;
using System.Collections.Generic;
using System.Threading;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Induction;

/// <summary>
/// Any path set in time: L i' + s(T) R0 i = M u(t), coupled to lumped heating, solved in the modes of the (L, R)
/// pencil (<see cref="ModalCircuit"/>), where it is one RL circuit per mode. Because every path of an item shares
/// its temperature, R(T) = s(T) R0 scales all paths alike and the modes do not change as the item heats. Each step is
/// the exact exponential update (<see cref="RlStep"/>) of every mode for drives linear over the step, exact for
/// piecewise-linear drives since steps land on every breakpoint; s(T) is taken at the mid-step temperature
/// (predicted from the last step's power, corrected when the step's own energy says otherwise), and steps are halved until the temperature changes by no more than a set amount. A thin
/// loop is the one-mode case.
/// </summary>
public sealed class TransientPathSolver
{
    private const double Growth = 1.25;

    /// <summary>
    /// The growth before the mode settles for one path on which no force or torque is read at the steps' ends (<see
    /// cref="StepMechanics.Inert"/>): each step is exact for its drive and finds the current's peak within itself
    /// exactly, and a chart reads the points within it from the step's own solution (<see cref="SteppedCircuitSeries"/>),
    /// so only the heating bounds it: the steps before the current settles stay short beside the cooling time constant,
    /// so that the heat of the current's first rise is not spread over a long step. Where a force or torque is
    /// read at the ends the growth stays 1.25 (with 1.5 the demo's peak forces fell by up to 7e-5, a peak between two
    /// ends missed), and for a set of paths too, whose peak within a step is interpolated, not exact.
    /// </summary>
    private const double InertGrowth = 4;

    /// <summary>
    /// The same growth while the drive is curved (each step reads it as a line, up to <see cref="MaxStepSeconds"/>) or
    /// the item heats (<see cref="CoolKelvin"/>): 1.5, so that a curved drive's heating is sampled as finely as the
    /// steps' own accuracy asks (with 4, the burn margin of a ring in a magnet's quench came out 2e-6 above that of
    /// steps eight times finer, where 1.5 gives 1e-6 below it).
    /// </summary>
    private const double CurvedInertGrowth = 1.5;

    /// <summary>The first steps of a segment one inert path on a linear drive tries, in its L/R, the longest first (<see cref="FreshStep"/>).</summary>
    private static readonly double[] FreshMultiples = { 8, 0.5 };

    /// <summary>
    /// The most a step of one inert path may heat it, K, by the larger of the power its current carries now and the
    /// power its emf would drive at the step's end (<see cref="StaysCool"/>), for the step to start a segment at eight
    /// times or half its L/R (<see cref="FreshStep"/>) or grow by <see cref="InertGrowth"/>; else it starts at an eighth
    /// and grows by <see cref="CurvedInertGrowth"/>. A step is exact for R fixed at its mid-step temperature: where the
    /// item heats, a long step takes the R of its middle for a current that peaks early in it (a worn gold ring 50 mm
    /// across in 3 T in 10 ms, heated by 2.4 K, had its peak current 4e-4 below that of steps starting at a 64th of L/R
    /// and growing by 1.05, against 3e-5 with the shorter steps). 5 mK moves a metal's R by some 2e-5. And the history
    /// records a step's ends: where the heating falls below the cooling within a step, the item is warmest inside it,
    /// above its start by no more than the step heats it, under 5 mK on this path (in a sweep of 224 rings, 1.5e-4 K at
    /// most below the peak of steps starting at a 64th of L/R and growing by 1.05, where the shorter steps were 4e-5 K
    /// below it).
    /// </summary>
    private const double CoolKelvin = 0.005;

    /// <summary>
    /// The growth of a step once it is eight times the slowest mode's time constant: every mode has then decayed to
    /// e^-8 of what a change of drive started within one step, and the step is exact for a drive linear over it,
    /// so only the temperature (0.5 K a step) and the longest step bound it.
    /// </summary>
    private const double SettledGrowth = 4;

    /// <summary>
    /// A step that moved the current of one path on which no force or torque is read by less than this share of the
    /// run's peak so far is one a chart on the peak's scale cannot show (a small change of drive after a large one, the
    /// current settled on a plateau): the next may grow by <see cref="UnseenGrowth"/>. Each step is exact for its
    /// drive and finds its own peak exactly, so only the chart's resolution, the temperature's step limit and the
    /// longest step bound it. Not once the item only cools, where the cooling curve's chords set the step.
    /// </summary>
    private const double UnseenChange = 0.01;
    private const double UnseenGrowth = 16;

    /// <summary>
    /// A step of one inert path whose current moved by more than this share is filled, when its series is read, with
    /// points of its own exact solution (<see cref="SteppedCircuitSeries"/>); the series records such a step's end too.
    /// </summary>
    private const double ChartChange = 0.02;

    /// <summary>
    /// A step is at most this share of the one over which the last step's rate of heating would move the item by <see
    /// cref="MaxStepKelvin"/>: a strongly heated item then steps near the limit instead of growing past it and
    /// throwing the step away (halving it), about every fourth step at a growth of 1.25.
    /// </summary>
    private const double HeatedStep = 0.9;
    private const int MaxRecordedSamples = 4000;
    private const int InitialSampleCapacity = 64;

    /// <summary>Room for a ring's ramp's steps to fill (some three a segment) from the start.</summary>
    private const int InitialFillCapacity = 12;

    private readonly ModalCircuit _circuit;
    private readonly Func<double, double> _scaleAt;
    private readonly LumpedThermalModel _thermal;
    private readonly double _leadTimeConstant;
    private readonly double _slowestTimeConstant;

    /// <summary><see cref="CoolKelvin"/> times the item's heat capacity, J.</summary>
    private readonly double _coolJoules;

    /// <summary>1 / lambda of each mode, so that a step's time constants and ratios are products.</summary>
    private readonly double[] _inverseLambdas;

    /// <summary>Creates the solver.</summary>
    /// <param name="circuit">The modes and their coupling to the drives.</param>
    /// <param name="scaleAtCelsius">s(T) = rho(T) / rho_ref: the resistance of every path relative to the one the modes were found at.</param>
    /// <param name="thermal">The lumped heating of the item.</param>
    public TransientPathSolver(ModalCircuit circuit, Func<double, double> scaleAtCelsius, LumpedThermalModel thermal)
    {
        _circuit = circuit;
        _scaleAt = scaleAtCelsius;
        _thermal = thermal;
        _coolJoules = CoolKelvin * thermal.HeatCapacityJoulesPerKelvin;
        _inverseLambdas = new double[circuit.Count];
        for (int k = 0; k < circuit.Count; k++)
        {
            _inverseLambdas[k] = 1 / circuit.Lambdas[k];
        }

        // The time constant of the mode that stores most energy for a sudden unit drive (sum_j C_kj^2 lambda_k); where no
        // mode is driven (a body whose flux along its axis is nil, heated only by the field across it), the slowest
        // mode's: a mode that is not driven sets no time scale, and the first of them may be some 1e-17 s, from which the
        // steps took some 150 a segment to grow and a run out of its budget before its end.
        for (int k = 0; k < circuit.Count; k++)
        {
            _slowestTimeConstant = Math.Max(_slowestTimeConstant, circuit.Lambdas[k]);
        }

        _leadTimeConstant = _slowestTimeConstant;
        double best = 0;
        for (int k = 0; k < circuit.Count; k++)
        {
            double weight = 0;
            for (int j = 0; j < circuit.Terms; j++)
            {
                weight += circuit.Coupling[k, j] * circuit.Coupling[k, j];
            }

            if (weight * circuit.Lambdas[k] > best)
            {
                best = weight * circuit.Lambdas[k];
                _leadTimeConstant = circuit.Lambdas[k];
            }
        }
    }

    /// <summary>The largest temperature change in one step, K.</summary>
    public double MaxStepKelvin { get; init; } = HeatingIntegrator.DefaultMaxStepKelvin;

    /// <summary>
    /// The largest step, s (for drives that are not piecewise linear), while the drive is curved. Infinite (the
    /// default) says every drive is linear between the breakpoints: each drive's line is then read at a segment's first
    /// step and serves the rest of it.
    /// </summary>
    public double MaxStepSeconds { get; init; } = double.PositiveInfinity;

    /// <summary>
    /// The largest step from a time on, s, where the drive is smoother in some parts than in its most curved (<see
    /// cref="Waveforms.FieldWaveform.MaxStepAt"/>): never below <see cref="MaxStepSeconds"/>; null for that step
    /// throughout. Read at each step's start (steps land on every breakpoint, where it may change).
    /// </summary>
    public Func<double, double>? MaxStepAt { get; init; }

    /// <summary>Until when <see cref="MaxStepSeconds"/> applies, s: after it the emf is piecewise linear (leaving, cooling).</summary>
    public double CurvedUntilSeconds { get; init; } = double.PositiveInfinity;

    /// <summary>
    /// From when every drive is zero, s: the item only cools (its currents die away within a few steps of their time
    /// constant), and a step may be as long as the cooling time constant instead of a tenth of it. The temperature
    /// then falls along a convex curve, which the history's straight pieces lie above: on the safe side.
    /// </summary>
    public double CoolingFromSeconds { get; init; } = double.PositiveInfinity;

    /// <summary>The most steps before the run gives up and says so.</summary>
    public int MaxSteps { get; init; } = HeatingIntegrator.DefaultMaxSteps;

    /// <summary>The run stops at the first step that ends above this temperature, °C: the melting point, where a molten loop opens.</summary>
    public double StopAboveCelsius { get; init; } = double.PositiveInfinity;

    /// <summary>
    /// Heating besides the modes' own, from eddy currents the paths do not carry (a field across a body's axis):
    /// power = <see cref="CrossPowerFactor"/> |sum_j CrossCoupling_j u_j(t)|^2 / s(T), W (the vectors of
    /// <see cref="CrossAxisField.Couplings"/>, all of one length).
    /// </summary>
    public double[][]? CrossCoupling { get; init; }

    /// <summary>The factor of the cross-axis heating at s = 1, W per (T/s)^2.</summary>
    public double CrossPowerFactor { get; init; }

    /// <summary>
    /// d_j(t): each term's drive as the item sees it (falling to zero while it is carried out), for the force
    /// sum_j d_j sum_k G_kj z_k and the torque; no force is followed without it and the circuit's force coupling.
    /// </summary>
    public Func<double, double>[]? DriveValues { get; init; }

    /// <summary>n x b_j: the item's normal crossed with each term's field per unit drive at its centre; the torque on the moment m n is m n x B.</summary>
    public Vector3D[]? TorqueField { get; init; }

    /// <summary>b_j, each term's field per unit drive at the centre, when the run is to find the largest |m| |B| (an item whose orientation the engine chose); null otherwise.</summary>
    public Vector3D[]? CentreField { get; init; }

    /// <summary>Runs one loop driven by one emf (coupling 1): the thin-loop case.</summary>
    public TransientRun Run(Func<double, double> emf, IEnumerable<double> breakpoints, double tStart, double tEnd, double celsius0, CancellationToken cancellation) =>
        Run(new[] { emf }, emf, breakpoints, tStart, tEnd, celsius0, cancellation);

    /// <summary>Runs from tStart to tEnd with every current zero at the start.</summary>
    /// <param name="drives">u_j(t): the emf per unit flux coupling of each term (minus the rate of its drive), 1/s or V/Wb.</param>
    /// <param name="outlineEmf">The emf around the item's outline, recorded beside the current for charts, V.</param>
    /// <param name="breakpoints">Times where a drive's slope may jump; steps land on each.</param>
    /// <param name="tStart">Start time, s.</param>
    /// <param name="tEnd">End time, s.</param>
    /// <param name="celsius0">The item's temperature at the start, °C.</param>
    /// <param name="cancellation">Stops the run.</param>
    /// <remarks>The run stops early, and says so, when the step budget runs out, when time stops advancing, or when the item passes <see cref="StopAboveCelsius"/>.</remarks>
    public TransientRun Run(Func<double, double>[] drives, Func<double, double> outlineEmf, IEnumerable<double> breakpoints, double tStart, double tEnd, double celsius0, CancellationToken cancellation)
    {
        int modes = _circuit.Count, terms = drives.Length;
        double[] edges = EdgesWithin(breakpoints, tStart, tEnd);
        // Room for a typical run's samples from the start (a ring's ramp records some 40), rather than growing from four.
        var last = new CircuitSample(tStart, outlineEmf(tStart), 0, celsius0);
        var circuit = new List<CircuitSample>(InitialSampleCapacity) { last };
        var heating = new List<HeatingSample>(InitialSampleCapacity) { new(tStart, celsius0, 0) };
        double recordSpacing = (tEnd - tStart) / MaxRecordedSamples;
        var z = new double[modes];
        var work = new StepWork(modes, terms);
        double t = tStart, temperature = celsius0, energy = 0, total = 0, lastPower = 0;
        (double current, double at) peak = (0, tStart);
        var mechanics = new StepMechanics(_circuit, DriveValues, TorqueField, terms, CentreField);
        double[]? momentWeights = CentreField is null ? null : _circuit.MomentWeights;
        mechanics.StartAt(tStart);
        StepMechanics.StepEnds? ends = mechanics.FollowsForce ? new StepMechanics.StepEnds(modes, terms) : null;
        bool onePathInert = modes == 1 && mechanics.Inert;
        int steps = 0;
        bool budgetExceeded = false;
        double? melted = null;
        List<SteppedCircuitSeries.Fill>? fills = null;

        // G at the item's temperature, found again only when the temperature moves (each step's start, and its time constant).
        double conductance = _thermal.Conductance(temperature);
        foreach (double edge in edges)
        {
            double h = FreshStep(temperature, conductance, edge - t, t, onePathInert && LinearAt(t) ? z : null, drives);
            bool lineKnown = false;
            while (t < edge)
            {
                if (++steps > MaxSteps)
                {
                    budgetExceeded = true;
                    break;
                }

                if ((steps & 1023) == 0)
                {
                    cancellation.ThrowIfCancellationRequested();
                }

                h = Math.Min(h, edge - t);
                if (edge - t - h < 1e-12 * Math.Max(1, Math.Abs(edge)))
                {
                    h = edge - t;
                }

                // A step to the edge ends on it exactly: t + (edge - t) can fall an ulp short, which left a sliver step
                // whose sample took the emf after the edge's jump in place of the one before it.
                bool toEdge = h == edge - t;

                if (!(t + h > t))
                {
                    // Time no longer advances at this magnitude: stop and say so rather than loop.
                    budgetExceeded = true;
                    break;
                }

                // Each drive over the step as a line through its values at h/4 and 3h/4: exact for linear drives. Where
                // every drive is linear up to the edge (past the curved part, or none is curved), the line read at the
                // segment's first step serves its later steps (a piecewise-constant emf, a ramp's, the same values).
                bool linear = LinearAt(t);
                if (linear && lineKnown)
                {
                    double a = t + (h / 4) - work.LineFrom, b = t + (3 * h / 4) - work.LineFrom;
                    for (int j = 0; j < terms; j++)
                    {
                        work.DriveA[j] = work.LineAt[j] + (work.LineSlope[j] * a);
                        work.DriveB[j] = work.LineAt[j] + (work.LineSlope[j] * b);
                    }
                }
                else
                {
                    for (int j = 0; j < terms; j++)
                    {
                        work.DriveA[j] = drives[j](t + (h / 4));
                        work.DriveB[j] = drives[j](t + (3 * h / 4));
                    }

                    if (linear)
                    {
                        work.LineFrom = t + (h / 4);
                        for (int j = 0; j < terms; j++)
                        {
                            work.LineAt[j] = work.DriveA[j];
                            work.LineSlope[j] = (work.DriveB[j] - work.DriveA[j]) / (h / 2);
                        }

                        lineKnown = true;
                    }
                }

                double inverseH = 1 / h, twoOverH = 2 * inverseH;

                for (int k = 0; k < modes; k++)
                {
                    double ea = 0, eb = 0;
                    for (int j = 0; j < terms; j++)
                    {
                        ea += _circuit.Coupling[k, j] * work.DriveA[j];
                        eb += _circuit.Coupling[k, j] * work.DriveB[j];
                    }

                    work.Slope[k] = (eb - ea) * twoOverH;
                    work.Start[k] = ea - (work.Slope[k] * h / 4);
                }

                double cross = CrossCoupling is null ? 0 : CrossEnergyAtUnitScale(work, h);

                // s(T) at the mid-step temperature: predicted with the last step's power, then corrected once more
                // only when the step's own energy moves the end temperature by more than a hundredth of the step limit.
                var heat = new LumpedThermalModel.Step(_thermal, h, conductance);
                double predicted = heat.Advance(temperature, lastPower);
                double s = _scaleAt(0.5 * (temperature + predicted));
                double stepEnergy = Sweep(z, work, s, h, cross);
                double power = stepEnergy * inverseH;
                double next = heat.Advance(temperature, power);
                if (Math.Abs(next - predicted) > 0.01 * MaxStepKelvin)
                {
                    s = _scaleAt(0.5 * (temperature + next));
                    stepEnergy = Sweep(z, work, s, h, cross);
                    power = stepEnergy * inverseH;
                    next = heat.Advance(temperature, power);
                }

                if (Math.Abs(next - temperature) > MaxStepKelvin && h > 1e-15 * Math.Max(1, Math.Abs(t)))
                {
                    h /= 2;
                    continue;
                }

                (double stepPeak, double stepPeakAt) = PeakWithin(z, work, s, h, total);
                // The moment's largest size within the step, for the torque were the item turned (ends and interior alike).
                double momentPeak = momentWeights is null ? double.NaN
                    : modes == 1 ? Math.Abs(stepPeak * momentWeights[0] / _circuit.TotalWeights[0])
                    : Math.Abs(PeakWithin(z, work, s, h, Weighted(z, momentWeights), momentWeights).Current);
                if (ends is not null)
                {
                    StepEndsOf(ends, z, work, s, h);
                }

                double amplitude0 = z[0], stepStart = t, startCelsius = temperature;
                for (int k = 0; k < modes; k++)
                {
                    z[k] = work.Next[k];
                }

                double before = total;
                total = Total(z);
                // A step of one inert path whose current moved visibly is filled from its own solution when the series is read.
                bool fill = onePathInert && Math.Abs(total - before) > ChartChange * Math.Max(Math.Abs(total), Math.Abs(before));
                if (Math.Abs(stepPeak) > Math.Abs(peak.current))
                {
                    peak = (stepPeak, t + stepPeakAt);
                }

                t = toEdge ? edge : t + h;
                energy += stepEnergy;
                lastPower = power;
                mechanics.Record(z, Math.Min(t, edge - (1e-9 * h)), t, h, momentPeak, ends);
                double moved = Math.Abs(next - temperature);
                temperature = next;
                conductance = _thermal.Conductance(temperature);
                bool melting = temperature > StopAboveCelsius;
                if (fill || melting || t >= edge || t - last.TimeSeconds >= recordSpacing || Changed(last, total, temperature))
                {
                    if (fill)
                    {
                        (fills ??= new List<SteppedCircuitSeries.Fill>(InitialFillCapacity)).Add(new SteppedCircuitSeries.Fill(circuit.Count, stepStart, amplitude0, work.Start[0], work.Slope[0], s, startCelsius));
                    }

                    last = new CircuitSample(t, outlineEmf(Math.Min(t, edge - (1e-9 * h))), total, temperature);
                    circuit.Add(last);
                    heating.Add(new HeatingSample(t, temperature, power));
                }

                if (!Finite.Is(total) || !Finite.Is(temperature))
                {
                    break;
                }

                if (melting)
                {
                    melted = t;
                    break;
                }

                bool settled = h * s >= 8 * _slowestTimeConstant;
                bool cooled = settled && t >= CoolingFromSeconds;
                bool unseen = !cooled && onePathInert && Math.Abs(total - before) < UnseenChange * Math.Abs(peak.current);
                double grown = h * (unseen ? UnseenGrowth : settled ? SettledGrowth : !onePathInert ? Growth : LinearAt(t) && StaysCool(z[0], s, work.Start[0] + (work.Slope[0] * h), work.Slope[0], InertGrowth * h) ? InertGrowth : CurvedInertGrowth);
                h = Math.Min(moved > 0 ? Math.Min(grown, HeatedStep * MaxStepKelvin * h / moved) : grown, MaxStep(conductance, t));
                if (cooled)
                {
                    // Every drive is zero and the currents have died away (to e^-8 of what they were when the drive
                    // stopped, their heating to e^-16): the item only cools, and the step may go straight to a tenth of
                    // the cooling time constant, or the step over which cooling moves it by the step's limit, rather
                    // than grow there from the currents' time scale through steps that change nothing.
                    double tauCooling = _thermal.TimeConstantFor(conductance);
                    double cooling = Math.Min(tauCooling / 10, tauCooling * MaxStepKelvin / Math.Abs(temperature - _thermal.Environment.AmbientCelsius));
                    h = Math.Min(Math.Max(h, cooling), MaxStep(conductance, t));
                }
            }

            if (budgetExceeded || melted is not null || !Finite.Is(total) || !Finite.Is(temperature))
            {
                break;
            }
        }

        return new TransientRun
        {
            Circuit = fills is null ? circuit : new SteppedCircuitSeries(circuit, fills, _circuit.Lambdas[0], _inverseLambdas[0], _circuit.TotalWeights[0], outlineEmf),
            Heating = heating,
            PeakCurrentAmperes = peak.current,
            PeakCurrentSeconds = peak.at,
            EnergyJoules = energy,
            FinalCelsius = temperature,
            FinalModalAmplitudes = z,
            PeakForce = mechanics.PeakForce,
            PeakForceSeconds = mechanics.PeakForceAt,
            Impulse = mechanics.Impulse,
            PeakTorqueNewtonMeters = mechanics.PeakTorque,
            PeakMomentField = mechanics.PeakMomentField,
            Steps = steps,
            BudgetExceeded = budgetExceeded,
            MeltedAtSeconds = melted,
        };
    }

    /// <summary>
    /// The energy of one step over every mode at scale s (plus the cross-axis heating), J; the modal amplitudes at
    /// the end of the step go to the work's Next.
    /// </summary>
    private double Sweep(double[] z, StepWork work, double s, double h, double crossAtUnitScale)
    {
        double inverseS = 1 / s;
        work.InverseScale = inverseS;
        double energy = crossAtUnitScale * inverseS;
        for (int k = 0; k < z.Length; k++)
        {
            (double end, double stepEnergy) = RlStep.Advance(new RlStep.Circuit(_circuit.Lambdas[k], _inverseLambdas[k], s, inverseS), s, z[k], work.Start[k], work.Slope[k], h);
            work.Next[k] = end;
            energy += stepEnergy;
        }

        return energy;
    }

    /// <summary>
    /// The largest total current within the step and where: exact for one mode (the ends or the one interior
    /// extremum); for several, the ends or the extremum of the cubic through the total current and its rate at both
    /// ends (each mode's rate from its equation, lambda z' = e - s z), which is within the step's own smoothness.
    /// </summary>
    private (double Current, double At) PeakWithin(double[] z, StepWork work, double s, double h, double total0) =>
        PeakWithin(z, work, s, h, total0, _circuit.TotalWeights);

    /// <summary>The same for any weighted sum of the modes (the total current, or the moment with the moment weights), its value at the step's start given.</summary>
    private (double Current, double At) PeakWithin(double[] z, StepWork work, double s, double h, double total0, double[] weights)
    {
        if (z.Length == 1)
        {
            double w = weights[0];
            (double peak, double at) = RlStep.Peak(new RlStep.Circuit(_circuit.Lambdas[0], _inverseLambdas[0], s, work.InverseScale), z[0], work.Start[0], work.Slope[0], h, work.Next[0]);
            return (w * peak, at);
        }

        double end = 0, rate0 = 0, rate1 = 0;
        double[] inverseLambdas = _inverseLambdas;
        for (int k = 0; k < z.Length; k++)
        {
            double next = work.Next[k];
            end += weights[k] * next;
            rate0 += weights[k] * (work.Start[k] - (s * z[k])) * inverseLambdas[k];
            rate1 += weights[k] * (work.Start[k] + (work.Slope[k] * h) - (s * next)) * inverseLambdas[k];
        }

        (double best, double bestAt) = Math.Abs(end) > Math.Abs(total0) ? (end, h) : (total0, 0.0);

        // Hermite cubic on u in [0, 1]: p(u) = total0 h00 + h rate0 h10 + end h01 + h rate1 h11; its extrema from p'(u) = 0.
        double m0 = h * rate0, m1 = h * rate1;
        double a = (6 * total0) + (3 * m0) - (6 * end) + (3 * m1);
        double b = (-6 * total0) - (4 * m0) + (6 * end) - (2 * m1);
        double c = m0;
        (double first, double second) = QuadraticRoots(a, b, c);
        for (int root = 0; root < 2; root++)
        {
            double u = root == 0 ? first : second;
            if (u > 0 && u < 1)
            {
                double u2 = u * u, u3 = u2 * u;
                double p = (total0 * ((2 * u3) - (3 * u2) + 1)) + (m0 * (u3 - (2 * u2) + u)) + (end * ((-2 * u3) + (3 * u2))) + (m1 * (u3 - u2));
                if (Math.Abs(p) > Math.Abs(best))
                {
                    (best, bestAt) = (p, u * h);
                }
            }
        }

        return (best, bestAt);
    }

    /// <summary>
    /// The step's two ends for the impulse (<see cref="StepMechanics.StepEnds"/>): the amplitudes at its start (z, before
    /// the step is taken); for each mode the step does not outlast, its rate (e - s z) / lambda at both ends (the modal
    /// emf e(x) = Start + Slope x), and for each it outlasts, its exact form over the step; and each drive's value at
    /// both ends on the step's line through its values at h/4 and 3h/4.
    /// </summary>
    private void StepEndsOf(StepMechanics.StepEnds ends, double[] z, StepWork work, double s, double h)
    {
        double inverseS = 1 / s;
        bool anyStiff = false;
        for (int k = 0; k < z.Length; k++)
        {
            ends.Start[k] = z[k];
            double tau = _circuit.Lambdas[k] * inverseS;
            bool stiff = h > tau;
            ends.Stiff[k] = stiff;
            anyStiff |= stiff;
            if (stiff)
            {
                double a = (work.Start[k] - (work.Slope[k] * tau)) * inverseS;
                ends.A[k] = a;
                ends.B[k] = work.Slope[k] * inverseS;
                ends.C[k] = z[k] - a;
                ends.Tau[k] = tau;
                continue;
            }

            ends.RateStart[k] = (work.Start[k] - (s * z[k])) * _inverseLambdas[k];
            ends.RateEnd[k] = (work.Start[k] + (work.Slope[k] * h) - (s * work.Next[k])) * _inverseLambdas[k];
        }

        ends.AnyStiff = anyStiff;
        for (int j = 0; j < ends.DriveStart.Length; j++)
        {
            double rise = work.DriveB[j] - work.DriveA[j];
            ends.DriveStart[j] = work.DriveA[j] - (0.5 * rise);
            ends.DriveEnd[j] = work.DriveA[j] + (1.5 * rise);
        }
    }

    private static double Weighted(double[] z, double[] weights)
    {
        double sum = 0;
        for (int k = 0; k < z.Length; k++)
        {
            sum += weights[k] * z[k];
        }

        return sum;
    }

    /// <summary>The real roots of a u^2 + b u + c = 0, NaN where there is none (the stable form q = -(b + sign(b) sqrt(d))/2).</summary>
    private static (double First, double Second) QuadraticRoots(double a, double b, double c)
    {
        if (Math.Abs(a) < 1e-300)
        {
            return (Math.Abs(b) < 1e-300 ? double.NaN : -c / b, double.NaN);
        }

        double d = (b * b) - (4 * a * c);
        if (d < 0)
        {
            return (double.NaN, double.NaN);
        }

        double q = -0.5 * (b + ((b < 0 ? -1 : 1) * Math.Sqrt(d)));
        return q == 0 ? (0.0, double.NaN) : (q / a, c / q);
    }

    /// <summary>The cross-axis heating energy of the step at s = 1: the factor times the integral of |v(t)|^2, v linear over the step.</summary>
    private double CrossEnergyAtUnitScale(StepWork work, double h)
    {
        if (CrossCoupling is null || CrossPowerFactor == 0)
        {
            return 0;
        }

        // Each component of v(x) = v0 + v1 x on [0, 1] through v(1/4) = va, v(3/4) = vb; the integral of |v|^2 is
        // |v0|^2 + v0.v1 + |v1|^2 / 3.
        double sum = 0;
        int length = CrossCoupling.Length == 0 ? 0 : CrossCoupling[0].Length;
        for (int m = 0; m < length; m++)
        {
            double va = 0, vb = 0;
            for (int j = 0; j < CrossCoupling.Length; j++)
            {
                va += work.DriveA[j] * CrossCoupling[j][m];
                vb += work.DriveB[j] * CrossCoupling[j][m];
            }

            double v1 = 2 * (vb - va);
            double v0 = va - (0.25 * v1);
            sum += (v0 * v0) + (v0 * v1) + (v1 * v1 / 3);
        }

        return CrossPowerFactor * h * sum;
    }

    private double Total(double[] z) => Weighted(z, _circuit.TotalWeights);

    private static bool Changed(CircuitSample last, double current, double temperature) =>
        Math.Abs(temperature - last.TemperatureCelsius) > 0.5
        || Math.Abs(current - last.CurrentAmperes) > 0.02 * Math.Max(Math.Abs(current), Math.Abs(last.CurrentAmperes));

    /// <summary>
    /// The first step of a segment: an eighth of the leading mode's time constant, so that the exponential is resolved
    /// from its start. For one inert path on a linear drive (its amplitudes <paramref name="inertOnLine"/>), whose step
    /// is exact for any length and whose chart reads the points within it from its solution, eight times its L/R (the
    /// current then settled to e^-8 of its change) or else half of it, whichever first stays cool (<see
    /// cref="StaysCool"/>), its emf read as the step reads it, at a quarter and three quarters of the step.
    /// </summary>
    private double FreshStep(double celsius, double conductance, double segment, double t, double[]? inertOnLine, Func<double, double>[] drives)
    {
        double s = _scaleAt(celsius), tau = _leadTimeConstant / s, longest = Math.Min(segment, MaxStep(conductance, t));
        if (inertOnLine is { } z)
        {
            foreach (double multiple in FreshMultiples)
            {
                double h = Math.Min(multiple * tau, longest), ea = 0, eb = 0;
                for (int j = 0; j < drives.Length; j++)
                {
                    ea += _circuit.Coupling[0, j] * drives[j](t + (h / 4));
                    eb += _circuit.Coupling[0, j] * drives[j](t + (3 * h / 4));
                }

                double slope = (eb - ea) * 2 / h;
                if (StaysCool(z[0], s, ea - (slope * h / 4), slope, h))
                {
                    return h;
                }
            }
        }

        return Math.Min(tau / 8, longest);
    }

    /// <summary>
    /// Whether a step of <paramref name="seconds"/> would heat one path by less than <see cref="CoolKelvin"/> at the
    /// larger of the power of its amplitude z now and that of its steady current for the emf line e0 + g s at the
    /// step's end (e / R with R = s in the mode's units), as if nothing were lost to cooling.
    /// </summary>
    private bool StaysCool(double z, double s, double e0, double g, double seconds)
    {
        // max(s z^2, e^2 / s) t < dT C, multiplied through by s (s > 0): no division.
        double e = e0 + (g * seconds), sz = s * z;
        return Math.Max(sz * sz, e * e) * seconds < _coolJoules * s;
    }

    /// <summary>Whether every drive is linear between the breakpoints from t on (past the curved part, or none is curved).</summary>
    private bool LinearAt(double t) => t >= CurvedUntilSeconds || double.IsPositiveInfinity(MaxStepSeconds);

    /// <summary>The longest step at a time, with the conductance G at the item's temperature then.</summary>
    private double MaxStep(double conductance, double t) =>
        Math.Min(t >= CurvedUntilSeconds ? double.PositiveInfinity : MaxStepAt is { } at ? Math.Max(MaxStepSeconds, at(t)) : MaxStepSeconds, Math.Max(_thermal.TimeConstantFor(conductance) * (t >= CoolingFromSeconds ? 1 : 0.1), 1e-6));

    /// <summary>Per-step arrays, allocated once per run.</summary>
    private sealed class StepWork
    {
        public StepWork(int modes, int terms)
        {
            DriveA = new double[terms];
            DriveB = new double[terms];
            LineAt = new double[terms];
            LineSlope = new double[terms];
            Start = new double[modes];
            Slope = new double[modes];
            Next = new double[modes];
        }

        public double[] Next { get; }

        /// <summary>Each drive's value at <see cref="LineFrom"/> on a segment where it is linear.</summary>
        public double[] LineAt { get; }

        /// <summary>Each drive's rate on that segment.</summary>
        public double[] LineSlope { get; }

        /// <summary>Where the drives' lines were read, s.</summary>
        public double LineFrom { get; set; }

        /// <summary>1 / s of the last sweep, which the step's peak shares.</summary>
        public double InverseScale { get; set; }

        public double[] DriveA { get; }

        public double[] DriveB { get; }

        public double[] Start { get; }

        public double[] Slope { get; }
    }

    /// <summary>The breakpoints after the start and before the end, and the end: ascending, each once.</summary>
    private static double[] EdgesWithin(IEnumerable<double> breakpoints, double tStart, double tEnd)
    {
        var edges = new List<double>();
        foreach (double b in breakpoints)
        {
            if (b > tStart && b < tEnd)
            {
                edges.Add(b);
            }
        }

        edges.Add(tEnd);
        return Waveforms.DriveSampling.SortedDistinct(edges);
    }
}
