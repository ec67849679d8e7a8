using System;
using System.Linq;
using System.Threading;
using InductionHazard.Induction;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class TransientPathSolverTests
{
    private const double L = 3.3e-8, R = 3.6e-4;
    private static readonly double Tau = L / R;

    /// <summary>A solver whose loop does not heat (an enormous heat capacity), so R stays fixed.</summary>
    private static TransientPathSolver FixedResistance(double maxStep = double.PositiveInfinity) =>
        new(ModalCircuit.OneLoop(L, R), _ => 1, new LumpedThermalModel(1e15, 1e-4, new ThermalEnvironment(20, 0, 0))) { MaxStepSeconds = maxStep };

    /// <summary>
    /// One classical fourth-order Runge-Kutta step of a loop's current i and temperature T, with the energy dissipated
    /// alongside, from their rates (di/dt, dT/dt, power) at (i, T): the changes of all three over h.
    /// </summary>
    private static (double Di, double DT, double DW) Rk4(Func<double, double, (double Di, double DT, double DW)> rates, double i, double celsius, double h)
    {
        var k1 = rates(i, celsius);
        var k2 = rates(i + (h / 2 * k1.Di), celsius + (h / 2 * k1.DT));
        var k3 = rates(i + (h / 2 * k2.Di), celsius + (h / 2 * k2.DT));
        var k4 = rates(i + (h * k3.Di), celsius + (h * k3.DT));
        return (h / 6 * (k1.Di + (2 * k2.Di) + (2 * k3.Di) + k4.Di), h / 6 * (k1.DT + (2 * k2.DT) + (2 * k3.DT) + k4.DT), h / 6 * (k1.DW + (2 * k2.DW) + (2 * k3.DW) + k4.DW));
    }

    [Validates("i(t) = (e/R)(1 - exp(-tR/L))", "RL circuit theory (closed form)", "1e-9")]
    [Fact]
    public void ARampGivesTheExponentialRiseOfAnRlCircuit()
    {
        // Constant emf e switched on at t = 0: i(t) = (e/R)(1 - exp(-t R / L)) (RL circuit theory, any circuits textbook).
        double e = 1e-3, ramp = 20 * Tau;
        TransientRun run = FixedResistance().Run(t => t < ramp ? e : 0, new[] { ramp }, 0, ramp, 20, CancellationToken.None);
        Assert.True(run.Circuit.Count > 10, "the series resolves the rise");
        foreach (CircuitSample s in run.Circuit.Skip(1))
        {
            Within.Relative(e / R * (1 - Math.Exp(-s.TimeSeconds / Tau)), s.CurrentAmperes, 1e-9, "i at t = " + s.TimeSeconds);
        }

        Within.Relative(e / R * (1 - Math.Exp(-20)), run.PeakCurrentAmperes, 1e-9, "peak current at the end of the ramp");
    }

    [Validates("i(t) = (g/R)(t - tau (1 - exp(-t/tau))) for an emf rising as g t", "RL circuit theory (closed form)", "1e-9")]
    [Fact]
    public void AnEmfRisingLinearlyGivesTheClosedFormCurrent()
    {
        // A linear emf e = g t (a field rising as t^2), linear between its breakpoints, so each segment's line is read
        // once: i(t) = (g/R)(t - tau (1 - exp(-t/tau))) with tau = L/R (RL circuit theory), then a constant emf g t1
        // from t1 = 10 L/R: i = (g t1/R) + (i(t1) - g t1/R) exp(-(t - t1)/tau).
        double g = 5.0, t1 = 10 * Tau;
        double Exact(double t) => t <= t1
            ? g / R * (t - (Tau * (1 - Math.Exp(-t / Tau))))
            : (g * t1 / R) + ((g / R * (t1 - (Tau * (1 - Math.Exp(-t1 / Tau))))) - (g * t1 / R)) * Math.Exp(-(t - t1) / Tau);
        TransientRun run = FixedResistance().Run(t => t < t1 ? g * t : g * t1, new[] { t1 }, 0, 30 * Tau, 20, CancellationToken.None);
        Assert.True(run.Circuit.Count > 10, "the series resolves the rise");
        foreach (CircuitSample s in run.Circuit.Skip(1))
        {
            Within.Relative(Exact(s.TimeSeconds), s.CurrentAmperes, 1e-9, "i at t = " + s.TimeSeconds);
        }
    }

    [Validates("i(t) = (e/R)(1 - exp(-tR/L)) and its decay, drawn as straight lines between the series' points", "RL circuit theory (closed form)", "1e-2 of the peak")]
    [Fact]
    public void TheSeriesDrawnAsLinesFollowsTheCurrentThoughTheStepsAreLong()
    {
        // A constant emf e for 20 L/R, then none: i = (e/R)(1 - exp(-t/tau)), then its decay from t1 (RL circuit
        // theory). One loop in a uniform field takes steps of the circuit's exact solution as long as its heating
        // allows (here no heating: a handful a segment), and the series a chart reads is filled with points of each
        // step's own solution: drawn as straight lines it must stay within 1 % of the peak of the closed form at every
        // chord's quarter, middle and three quarters. Without the points within the steps it strays by 2 % of the peak at
        // the first chord already.
        double e = 1e-3, t1 = 20 * Tau, end = 40 * Tau, peak = e / R;
        double Exact(double t) => t <= t1 ? peak * (1 - Math.Exp(-t / Tau)) : peak * (1 - Math.Exp(-t1 / Tau)) * Math.Exp(-(t - t1) / Tau);
        TransientRun run = FixedResistance().Run(t => t < t1 ? e : 0, new[] { t1 }, 0, end, 20, CancellationToken.None);
        Assert.True(run.Steps < 16, "the run took " + run.Steps + " steps");
        for (int k = 1; k < run.Circuit.Count; k++)
        {
            CircuitSample a = run.Circuit[k - 1], b = run.Circuit[k];
            Assert.True(b.TimeSeconds > a.TimeSeconds, "the series runs forward in time at point " + k);
            foreach (double u in new[] { 0.25, 0.5, 0.75 })
            {
                double t = a.TimeSeconds + (u * (b.TimeSeconds - a.TimeSeconds));
                double drawn = a.CurrentAmperes + (u * (b.CurrentAmperes - a.CurrentAmperes));
                Assert.True(Math.Abs(drawn - Exact(t)) <= 0.01 * peak, "at t = " + t + " s the chart draws " + drawn + " A against " + Exact(t) + " A");
            }
        }

        Assert.Equal(run.Circuit.Count, run.Circuit.ToArray().Length);
        Assert.Equal(end, run.Circuit[run.Circuit.Count - 1].TimeSeconds);
    }

    [Validates("exponential decay after the ramp", "RL circuit theory", "1e-8")]
    [Fact]
    public void AfterTheRampTheCurrentDecaysWithTimeConstantLOverR()
    {
        double e = 1e-3, ramp = 2 * Tau;
        TransientRun run = FixedResistance().Run(t => t < ramp ? e : 0, new[] { ramp }, 0, 12 * Tau, 20, CancellationToken.None);
        double atEnd = e / R * (1 - Math.Exp(-2));
        foreach (CircuitSample s in run.Circuit.Where(s => s.TimeSeconds > ramp))
        {
            Within.Relative(atEnd * Math.Exp(-(s.TimeSeconds - ramp) / Tau), s.CurrentAmperes, 1e-8, "decay at t = " + s.TimeSeconds);
        }
    }

    [Validates("peak current against Delta Phi / L", "inductive limit of an RL circuit", "1e-3")]
    [Fact]
    public void ARampMuchFasterThanLOverRDrivesTheFluxChangeOverL()
    {
        // The inductive limit: for a change much faster than L/R the current tends to Delta Phi / L, not e / R.
        double deltaPhi = 3e-4, ramp = Tau / 1000, e = deltaPhi / ramp;
        TransientRun run = FixedResistance().Run(t => t < ramp ? e : 0, new[] { ramp }, 0, 5 * Tau, 20, CancellationToken.None);
        Within.Relative(deltaPhi / L, run.PeakCurrentAmperes, 1e-3, "peak current against Delta Phi / L");
        Assert.True(run.PeakCurrentAmperes < 0.01 * e / R, "the naive e/R overstates the current a thousandfold");
    }

    [Validates("energy balance, (e^2/R)(T - tau(1 - e^(-T/tau)))", "RL circuit theory", "1e-9")]
    [Fact]
    public void EnergyDissipatedEqualsEnergyDeliveredByTheEmf()
    {
        // Energy balance of an RL circuit: integral of e i dt = integral of R i^2 dt + L i^2 / 2 at the end. For a constant
        // emf over [0, T] followed by a full decay: dissipated = (e^2 / R)(T - tau (1 - exp(-T/tau))).
        double e = 2e-3, ramp = 3 * Tau;
        TransientRun run = FixedResistance().Run(t => t < ramp ? e : 0, new[] { ramp }, 0, ramp + (60 * Tau), 20, CancellationToken.None);
        double delivered = e * e / R * (ramp - (Tau * (1 - Math.Exp(-ramp / Tau))));
        Within.Relative(delivered, run.EnergyJoules, 1e-9, "energy dissipated");
    }

    [Validates("stepped solution against E/sqrt(R^2 + (wL)^2)", "phasor analysis", "2e-3")]
    [Fact]
    public void ASinusoidalEmfSettlesToThePhasorAmplitude()
    {
        // Steady state of L di/dt + R i = E sin(wt): amplitude E / sqrt(R^2 + (wL)^2) (phasor analysis).
        double f = 5000, omega = 2 * Math.PI * f, e = 1e-3, period = 1 / f, end = (40 * Tau) + (3 * period);
        TransientRun run = FixedResistance(period / 400).Run(t => e * Math.Sin(omega * t), Array.Empty<double>(), 0, end, 20, CancellationToken.None);
        double lastPeriodPeak = run.Circuit.Where(s => s.TimeSeconds > end - period).Max(s => Math.Abs(s.CurrentAmperes));
        Within.Relative(e / Math.Sqrt((R * R) + (omega * L * omega * L)), lastPeriodPeak, 2e-3, "steady-state amplitude");
    }

    [Fact]
    public void HeatingRaisesTheResistanceWhileTheCurrentFlows()
    {
        // A loop whose resistance follows rho(T) carries less current as it heats under a constant emf.
        var thermal = new LumpedThermalModel(1e-3, 1e-4, new ThermalEnvironment(20, 0, 0));
        var solver = new TransientPathSolver(ModalCircuit.OneLoop(L, R), t => 1 + (0.00393 * (t - 20)), thermal);
        double e = 0.05, ramp = 0.05;
        TransientRun run = solver.Run(t => t < ramp ? e : 0, new[] { ramp }, 0, ramp, 20, CancellationToken.None);
        Assert.True(run.FinalCelsius > 100, "the loop heats");
        double expectedEnd = e / (R * (1 + (0.00393 * (run.FinalCelsius - 20))));
        Within.Relative(expectedEnd, run.Circuit[run.Circuit.Count - 1].CurrentAmperes, 1e-3, "current at the end follows e / R(T)");
    }

    [Fact]
    public void CoolingInLongStepsAfterTheDriveKeepsTheHistoryAtOrAboveTheFineOne()
    {
        // A ring heated by a 1 s pulse, then left to cool for 10 min: once every drive is zero the steps may reach the
        // cooling time constant. The coarse history must end where the fine one does (to 0.01 K), and its straight
        // pieces must lie at or above the fine history (the cooling curve is convex): never a cooler-looking item.
        var thermal = new LumpedThermalModel(0.21, 2e-4, new ThermalEnvironment(20, 10, 0.1));
        Func<double, double> emf = t => t < 1 ? 0.03 : 0;
        TransientRun Run(double coolingFrom) =>
            new TransientPathSolver(ModalCircuit.OneLoop(L, R), _ => 1, thermal) { CoolingFromSeconds = coolingFrom }
                .Run(emf, new[] { 1.0 }, 0, 600, 20, CancellationToken.None);
        TransientRun fine = Run(double.PositiveInfinity), coarse = Run(1.0);
        Assert.True(fine.Heating.Max(h => h.TemperatureCelsius) > 30, "the pulse heats the ring by more than 10 K");
        Assert.True(coarse.Steps < fine.Steps, "the cooling takes fewer steps (" + coarse.Steps + " against " + fine.Steps + ")");
        Within.Absolute(fine.FinalCelsius, coarse.FinalCelsius, 0.01, "the temperature after 10 min");
        Within.Relative(fine.EnergyJoules, coarse.EnergyJoules, 1e-9, "the energy of the pulse");
        foreach (HeatingSample f in fine.Heating.Where(h => h.TimeSeconds > 1))
        {
            int k = coarse.Heating.ToList().FindIndex(h => h.TimeSeconds >= f.TimeSeconds);
            HeatingSample b = coarse.Heating[k], a = coarse.Heating[Math.Max(0, k - 1)];
            double onChord = b.TimeSeconds == a.TimeSeconds ? b.TemperatureCelsius
                : a.TemperatureCelsius + ((b.TemperatureCelsius - a.TemperatureCelsius) * (f.TimeSeconds - a.TimeSeconds) / (b.TimeSeconds - a.TimeSeconds));
            Assert.True(onChord >= f.TemperatureCelsius - 1e-3, "at t = " + f.TimeSeconds + " s the coarse history reads " + onChord + " against " + f.TemperatureCelsius);
        }
    }

    [Validates("cooling after a pulse: T = Ta + (T1 - Ta) exp(-G t / m c)", "Newton's law of cooling (closed form, convection only)", "1e-9")]
    [Fact]
    public void AfterThePulseTheLongCoolingStepsLieOnNewtonsCoolingCurve()
    {
        // Convection only (no radiation), so G is fixed and the cooling is an exact exponential. Once the currents have
        // died the steps jump to a tenth of the cooling time constant (or less, by the step's 0.5 K limit): every sample
        // from there must lie on the closed form to 1e-9 of the rise, and the straight pieces between samples above it
        // (the curve is convex).
        const double HeatCapacity = 0.21, Surface = 2e-4, Convection = 10, Ambient = 20;
        var thermal = new LumpedThermalModel(HeatCapacity, Surface, new ThermalEnvironment(Ambient, Convection, 0));
        double tauCooling = HeatCapacity / (Convection * Surface);
        Func<double, double> emf = t => t < 1 ? 0.03 : 0;
        TransientRun run = new TransientPathSolver(ModalCircuit.OneLoop(L, R), _ => 1, thermal) { CoolingFromSeconds = 1.0 }
            .Run(emf, new[] { 1.0 }, 0, 3 * tauCooling, 20, CancellationToken.None);
        // The tail starts at the sample where the steps leave the currents' time scale (the first longer than 1000 L/R).
        int first = Enumerable.Range(1, run.Heating.Count - 1).First(k => run.Heating[k].TimeSeconds > 1 && run.Heating[k].TimeSeconds - run.Heating[k - 1].TimeSeconds > 1000 * Tau) - 1;
        HeatingSample settled = run.Heating[first];
        Assert.True(settled.TimeSeconds < 1 + (100 * Tau), "the currents' steps end " + ((settled.TimeSeconds - 1) / Tau) + " L/R after the pulse");
        double rise = settled.TemperatureCelsius - Ambient;
        Assert.True(rise > 5, "the pulse heats the ring by " + rise + " K");
        double Exact(double t) => Ambient + (rise * Math.Exp(-(t - settled.TimeSeconds) / tauCooling));
        var tail = run.Heating.Where(h => h.TimeSeconds >= settled.TimeSeconds).ToList();
        // The first cooling step: a tenth of the time constant, or the step in which cooling moves the item by the
        // step limit of 0.5 K (halved at most once where the curve's start is steeper than that estimate).
        double expected = Math.Min(tauCooling / 10, tauCooling * 0.5 / rise);
        Assert.True(tail[1].TimeSeconds - tail[0].TimeSeconds >= expected / 2.01, "the first cooling step, " + (tail[1].TimeSeconds - tail[0].TimeSeconds) + " s, against " + expected + " s");
        for (int k = 0; k < tail.Count; k++)
        {
            Within.Absolute(Exact(tail[k].TimeSeconds), tail[k].TemperatureCelsius, 1e-9 * rise, "T at t = " + tail[k].TimeSeconds + " s");
            if (k > 0)
            {
                double middle = 0.5 * (tail[k - 1].TimeSeconds + tail[k].TimeSeconds);
                double chord = 0.5 * (tail[k - 1].TemperatureCelsius + tail[k].TemperatureCelsius);
                Assert.True(chord >= Exact(middle), "at t = " + middle + " s the history reads " + chord + " K, below the cooling curve's " + Exact(middle));
            }
        }
    }

    [Validates("i(t) after a change of emf too small to see beside the peak, stepped over in long steps", "RL circuit theory (closed form)", "1e-9")]
    [Fact]
    public void AChangeTooSmallToSeeBesideThePeakIsSteppedOverInLongStepsAndStaysExact()
    {
        // A constant emf e for 2,000 L/R, then 0.4 % more for 2,000 L/R: i = e'/R + (i(t1) - e'/R) exp(-(t - t1)/tau)
        // after t1 (RL circuit theory). The change moves the current by under 1 % of its peak, which a chart on the
        // peak's scale cannot show, so its steps grow sixteenfold from the first where a visible change's grow fourfold
        // until its current settles: exact all the same (each step is the exact exponential update), in fewer steps
        // than the first segment's rise takes (as many without the sixteenfold growth).
        double e = 1e-3, bumped = 1.004 * e, t1 = 2000 * Tau, t2 = 4000 * Tau;
        double atT1 = e / R * (1 - Math.Exp(-2000));
        double Exact(double t) => t <= t1 ? e / R * (1 - Math.Exp(-t / Tau)) : (bumped / R) + ((atT1 - (bumped / R)) * Math.Exp(-(t - t1) / Tau));
        TransientRun run = FixedResistance().Run(t => t < t1 ? e : bumped, new[] { t1 }, 0, t2, 20, CancellationToken.None);
        TransientRun rise = FixedResistance().Run(t => e, new[] { t1 }, 0, t1, 20, CancellationToken.None);
        foreach (CircuitSample s in run.Circuit.Skip(1))
        {
            Within.Relative(Exact(s.TimeSeconds), s.CurrentAmperes, 1e-9, "i at t = " + s.TimeSeconds);
        }

        Within.Relative(Exact(t2), run.PeakCurrentAmperes, 1e-9, "the peak current, at the end");
        int after = run.Steps - rise.Steps;
        Assert.True(after > 0 && after < rise.Steps, "the small change took " + after + " steps, the rise " + rise.Steps);
    }

    [Validates("temperature of an uncooled loop under a constant emf: T0 + (e^2/R)(t - 2 tau (1 - e^(-t/tau)) + (tau/2)(1 - e^(-2t/tau))) / m c", "RL circuit theory and the heat balance (closed form)", "1e-9")]
    [Fact]
    public void AStronglyHeatedLoopStepsAtTheTemperatureLimitWithoutStepsThrownAway()
    {
        // A fixed resistance in a loop with no cooling: its temperature is T0 + W(t) / (m c), W the integral of R i^2 with
        // i = (e/R)(1 - e^(-t/tau)) (RL circuit theory), (e^2/R)(t - 2 tau (1 - e^(-t/tau)) + (tau/2)(1 - e^(-2t/tau))). Heated by 40 K, its steps are bounded by the 0.5 K a step: each step after the first is sized from
        // the last one's rate of heating (to nine tenths of the limit) rather than grown past it and halved, so the run
        // takes about 40 / 0.45 steps besides the current's rise, and no more than a tenth above that.
        const double HeatCapacity = 1e-3, Start = 20;
        double e = 1e-3, end = 40 * HeatCapacity * R / (e * e);
        var thermal = new LumpedThermalModel(HeatCapacity, 1e-4, new ThermalEnvironment(Start, 0, 0));
        TransientRun run = new TransientPathSolver(ModalCircuit.OneLoop(L, R), _ => 1, thermal).Run(t => e, Array.Empty<double>(), 0, end, Start, CancellationToken.None);
        double energy = e * e / R * (end - (2 * Tau * (1 - Math.Exp(-end / Tau))) + (Tau / 2 * (1 - Math.Exp(-2 * end / Tau))));
        Within.Relative(energy, run.EnergyJoules, 1e-9, "the energy");
        Within.Relative(Start + (energy / HeatCapacity), run.FinalCelsius, 1e-9, "the final temperature");
        TransientRun rise = new TransientPathSolver(ModalCircuit.OneLoop(L, R), _ => 1, thermal).Run(t => e, Array.Empty<double>(), 0, 20 * Tau, Start, CancellationToken.None);
        double least = (run.FinalCelsius - Start) / (0.9 * 0.5);
        Assert.True(run.Steps <= rise.Steps + (1.1 * least), run.Steps + " steps, against " + least + " at nine tenths of the limit and " + rise.Steps + " for the current's rise");
    }

    [Validates("the peak current of a loop whose resistance rises as it heats by 2.7 K while its current rises (the peak early in the run, where R is still low)", "an independent fourth-order Runge-Kutta integration of L di/dt = e - R(T) i, m c dT/dt = R(T) i^2 in steps of L/R / 400 (copper's alpha = 0.00393/K, IEC 60028)", "3e-5")]
    [Fact]
    public void ALoopHeatedAsItsCurrentRisesPeaksAsTheCoupledEquationsSay()
    {
        // The 20 mm copper ring above (m c = 0.68 J/K, not cooled) under a constant emf of 0.5 V for 30 L/R: some 1.4 kA,
        // heating it by about 2.7 K, so that e / R(T) falls while the current rises to it and the peak comes at some
        // 5 L/R. The solver's step holds R at its mid-step temperature; where its steps grow fourfold regardless of
        // the heating, a step spanning the peak takes a later, higher R, and the peak came out 2.6e-4 low.
        const double HeatCapacity = 0.68, Alpha = 0.00393, Start = 20;
        double e = 0.5, end = 30 * Tau;
        double Scale(double celsius) => 1 + (Alpha * (celsius - 20));
        var thermal = new LumpedThermalModel(HeatCapacity, 1e-4, new ThermalEnvironment(Start, 0, 0));
        TransientRun run = new TransientPathSolver(ModalCircuit.OneLoop(L, R), Scale, thermal).Run(t => e, new[] { end }, 0, end, Start, CancellationToken.None);

        double current = 0, celsius = Start, energy = 0, peak = 0;
        (double Di, double DT, double DW) Rates(double i, double c) => ((e - (R * Scale(c) * i)) / L, R * Scale(c) * i * i / HeatCapacity, R * Scale(c) * i * i);
        int n = 12000;
        double h = end / n;
        for (int k = 0; k < n; k++)
        {
            (double di, double dT, double dW) = Rk4(Rates, current, celsius, h);
            (current, celsius, energy) = (current + di, celsius + dT, energy + dW);
            peak = Math.Max(peak, current);
        }

        Assert.InRange(celsius - Start, 1, 3);
        Within.Relative(peak, run.PeakCurrentAmperes, 3e-5, "the peak current");
        Within.Relative(energy, run.EnergyJoules, 3e-5, "the energy");
        Within.Relative(celsius - Start, run.FinalCelsius - Start, 3e-5, "the rise");
    }

    [Validates("a loop heated by 180 K in a pulse, its resistance rising with temperature, then cooled by convection and radiation: temperatures, peak current and energy", "an independent fourth-order Runge-Kutta integration of L di/dt = e - R(T) i, m c dT/dt = R(T) i^2 - h A (T - Ta) - eps sigma A (T^4 - Ta^4) with fine fixed steps (Stefan-Boltzmann law unlinearised; copper's alpha = 0.00393/K, IEC 60028)", "0.05 K every sample; 1e-3 the peak current (alpha times half the 0.5 K step limit); 1e-4 the energy")]
    [Fact]
    public void AStronglyHeatedLoopFollowsTheCoupledEquationsIntegratedIndependently()
    {
        // A 20 mm copper ring of 2 mm wire (L and R as above; m c = 0.68 J/K, surface 3.95 cm^2), a 0.78 V emf for
        // 0.1 s: some 2 kA, heating it by about 180 K while its resistance rises by 70 % and the current falls, then 30 s of
        // cooling in air with a dark surface (h = 10 W/(m^2 K), eps = 0.8), where radiation takes more than convection.
        // The solver holds R at each step's mid-step temperature and the radiation linearised about its starting
        // temperature; the reference integrates the equations as they stand, with the T^4 law, by RK4 in steps of
        // L/R / 50 while the current flows and 1 ms once it has died away.
        const double HeatCapacity = 0.68, Surface = 3.95e-4, Alpha = 0.00393, Ambient = 20, H = 10, Eps = 0.8, Pulse = 0.1, End = 30;
        double e = 0.78;
        double Emf(double t) => t < Pulse ? e : 0;
        double Scale(double celsius) => 1 + (Alpha * (celsius - 20));
        var thermal = new LumpedThermalModel(HeatCapacity, Surface, new ThermalEnvironment(Ambient, H, Eps));
        TransientRun run = new TransientPathSolver(ModalCircuit.OneLoop(L, R), Scale, thermal).Run(Emf, new[] { Pulse }, 0, End, Ambient, CancellationToken.None);

        // The reference: state (i, T), the energy dissipated alongside; its temperatures kept at every step for reading
        // between them.
        double Kelvin(double c) => c + 273.15;
        (double Di, double DT, double DW) Rates(double t, double i, double c)
        {
            double r = R * Scale(c), power = r * i * i;
            double cooling = Surface * ((H * (c - Ambient)) + (Eps * 5.670374419e-8 * (Math.Pow(Kelvin(c), 4) - Math.Pow(Kelvin(Ambient), 4))));
            return ((Emf(t) - (r * i)) / L, (power - cooling) / HeatCapacity, power);
        }

        var times = new System.Collections.Generic.List<double> { 0 };
        var temps = new System.Collections.Generic.List<double> { Ambient };
        double ti = 0, current = 0, celsius = Ambient, energy = 0, peakCurrent = 0;
        void Integrate(double until, double step)
        {
            int n = (int)Math.Ceiling((until - ti) / step);
            double h = (until - ti) / n;
            for (int k = 0; k < n; k++)
            {
                // The emf is constant within each phase and the steps land on the pulse's end: every stage reads the
                // step's own side of it, at mid-step.
                double mid = ti + (h / 2);
                (double di, double dT, double dW) = Rk4((i, c) => Rates(mid, i, c), current, celsius, h);
                (current, celsius, energy) = (current + di, celsius + dT, energy + dW);
                ti += h;
                peakCurrent = Math.Max(peakCurrent, Math.Abs(current));
                times.Add(ti);
                temps.Add(celsius);
            }
        }

        Integrate(Pulse, Tau / 50);
        Integrate(Pulse + (60 * Tau), Tau / 50);
        // The current, now e^-60 of what it was, is set to zero for the cooling: an explicit step ten times L/R long
        // would amplify it instead of letting it decay.
        current = 0;
        Integrate(End, 1e-3);
        double ReferenceAt(double t)
        {
            int j = times.BinarySearch(t);
            if (j >= 0)
            {
                return temps[j];
            }

            j = ~j;
            if (j >= times.Count)
            {
                return temps[^1];
            }

            double u = (t - times[j - 1]) / (times[j] - times[j - 1]);
            return temps[j - 1] + (u * (temps[j] - temps[j - 1]));
        }

        double peak = run.Heating.Max(s => s.TemperatureCelsius), referencePeak = temps.Max();
        Assert.True(referencePeak - Ambient > 150, "the pulse heats the loop by " + (referencePeak - Ambient) + " K");
        Assert.True(Math.Abs(peak - referencePeak) <= 0.05, "peak temperature " + peak + " against " + referencePeak);
        foreach (HeatingSample s in run.Heating)
        {
            Assert.True(Math.Abs(s.TemperatureCelsius - ReferenceAt(s.TimeSeconds)) <= 0.05, "at t = " + s.TimeSeconds + " s: " + s.TemperatureCelsius + " against " + ReferenceAt(s.TimeSeconds));
        }

        Assert.Equal(End, run.Heating[^1].TimeSeconds);
        // R is held at each step's mid-step temperature, and steps move the loop by at most 0.5 K: the current can be off
        // by alpha times a quarter kelvin, 1e-3 (1.2e-4 here, low, in the step holding the peak).
        Within.Relative(peakCurrent, run.PeakCurrentAmperes, 1e-3, "the peak current");
        Within.Relative(energy, run.EnergyJoules, 1e-4, "the energy dissipated");
    }
}
