using System;
using System.Numerics;
using System.Threading;
using InductionHazard.Induction;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class SinusoidalPathSolverTests
{
    [Validates("|I| = |E|/|Z|, i(t), energy |I|^2 Re Z / 2", "phasor analysis", "1e-12, 1e-9")]
    [Fact]
    public void TheCurrentIsThePhasorQuotientOfEmfAndImpedance()
    {
        var z = new Complex(3.6e-4, 2e-3);
        var thermal = new LumpedThermalModel(1e15, 1e-4, new ThermalEnvironment(20, 0, 0));
        var emf = new Complex(0, -0.05);
        SinusoidalRun run = new SinusoidalPathSolver(SinusoidalPathSolver.Loop(_ => z, emf), thermal).Run(emf, 10000, 0, 1, 1, 20, CancellationToken.None);
        Within.Relative(emf.Magnitude / z.Magnitude, run.PeakCurrentAmperes, 1e-12, "|I| = |E| / |Z|");
        Within.Relative(0.5 * Math.Pow(emf.Magnitude / z.Magnitude, 2) * z.Real, run.EnergyJoules, 1e-9, "energy = |I|^2 Re Z / 2 over 1 s");
        double lag = Math.Atan2(z.Imaginary, z.Real);
        foreach (CircuitSample s in run.Circuit)
        {
            double t = s.TimeSeconds;
            Within.Absolute(emf.Magnitude / z.Magnitude * Math.Sin((2 * Math.PI * 10000 * t) + Math.Atan2(emf.Imaginary, emf.Real) - lag), s.CurrentAmperes, 1e-9, "i(t)");
        }
    }

    [Validates("T(t) = Ta + (P/hA)(1 - e^(-t/tau))", "Newton's law of cooling", "1e-4")]
    [Fact]
    public void HeatingApproachesNewtonsSteadyState()
    {
        // Newton cooling with constant power: T(t) = Ta + (P / hA)(1 - exp(-t / tau)), tau = m c / (h A).
        const double H = 10, Area = 4e-4, Capacity = 0.7;
        var thermal = new LumpedThermalModel(Capacity, Area, new ThermalEnvironment(20, H, 0));
        var z = new Complex(1e-3, 0);
        var emf = new Complex(0.01, 0);
        double power = 0.5 * 0.01 * 0.01 / 1e-3, tau = Capacity / (H * Area);
        SinusoidalRun run = new SinusoidalPathSolver(SinusoidalPathSolver.Loop(_ => z, emf), thermal).Run(emf, 50, 0, 3 * tau, 3 * tau, 20, CancellationToken.None);
        Within.Relative(20 + (power / (H * Area) * (1 - Math.Exp(-3))), run.FinalCelsius, 1e-4, "temperature after 3 time constants");
    }
}
