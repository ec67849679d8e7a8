using System;
using System.Threading;
using BenchmarkDotNet.Attributes;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Thermal;

namespace InductionHazard.Benchmarks;

/// <summary>
/// The path-set solver in time: a 64-path disc (8 x 8 filaments of a copper disc 40 mm across and 20 mm thick)
/// through one period of a 1 kHz sinusoidal pulse in 2,000 steps, against the one-path thin ring through the same
/// steps as the baseline in the same run. The modes are found once per item (outside the timing, as the engine
/// does per scenario); what is timed is the run. A uniform axial field links a filament and its mirror image alike and
/// drives only the 32 modes even about the disc's mid-plane (the odd ones are left out of the circuit); the same disc
/// in a field that grows along the axis drives all 64.
/// </summary>
[MemoryDiagnoser]
public class PathSetBenchmarks
{
    private const double Period = 1e-3;
    private const int Steps = 2000;
    private ModalCircuit _disc = null!;
    private ModalCircuit _discGradient = null!;
    private ModalCircuit _ring = null!;
    private LumpedThermalModel _thermal = null!;
    private Func<double, double>[] _drive = null!;

    /// <summary>Builds the disc's 64 filaments, their modes and coupling to a uniform axial field, and the ring.</summary>
    [GlobalSetup]
    public void Setup()
    {
        // 8 x 8 equal cells over the disc's (r, z) section, written out: the mesher itself now takes fewer cells along a
        // body's axis, and this benchmark is of the solver's cost for 64 paths.
        var cells = new System.Collections.Generic.List<Filament>(64);
        const double Radius = 0.02, Thickness = 0.02;
        for (int i = 0; i < 8; i++)
        {
            for (int j = 0; j < 8; j++)
            {
                double dr = Radius / 8, dz = Thickness / 8;
                cells.Add(new Filament((i + 0.5) * dr, (-Thickness / 2) + ((j + 0.5) * dz), dr, dz, dr * dz));
            }
        }

        PathSet set = PathSet.Coaxial(cells, "disc");
        PathModes modes = set.Modes(1.7241e-8) ?? throw new InvalidOperationException("modes not found");
        var coupling = new double[cells.Count, 1];
        for (int i = 0; i < cells.Count; i++)
        {
            coupling[i, 0] = Math.PI * cells[i].RadiusMeters * cells[i].RadiusMeters;
        }

        _disc = modes.Drive(coupling);
        var graded = new double[cells.Count, 1];
        for (int i = 0; i < cells.Count; i++)
        {
            // The field 20 % stronger at one face than at the other.
            graded[i, 0] = coupling[i, 0] * (1 + (10 * cells[i].AxialMeters));
        }

        _discGradient = modes.Drive(graded);
        if (_disc.Count != 32 || _discGradient.Count != 64)
        {
            throw new InvalidOperationException("expected 32 and 64 driven modes, got " + _disc.Count + " and " + _discGradient.Count);
        }
        _ring = ModalCircuit.OneLoop(3.3e-8, 3.4e-4, Math.PI * 1e-4);
        _thermal = new LumpedThermalModel(1e3, 1e-3, new ThermalEnvironment(20, 10, 0));
        double omega = 2 * Math.PI / Period;
        _drive = new Func<double, double>[] { t => -0.1 * omega * Math.Cos(omega * t) };
    }

    /// <summary>One path through the 2,000 steps.</summary>
    [Benchmark(Baseline = true)]
    public double OnePathRing() => Run(_ring);

    /// <summary>64 paths through the same 2,000 steps, in a uniform field (32 modes driven).</summary>
    [Benchmark]
    public double Disc64Paths() => Run(_disc);

    /// <summary>64 paths through the same 2,000 steps, in a field that grows along the axis (all 64 modes driven).</summary>
    [Benchmark]
    public double Disc64PathsEveryModeDriven() => Run(_discGradient);

    private double Run(ModalCircuit circuit)
    {
        TransientRun run = new TransientPathSolver(circuit, _ => 1, _thermal) { MaxStepSeconds = Period / Steps }
            .Run(_drive, _drive[0], Array.Empty<double>(), 0, Period, 20, CancellationToken.None);
        return run.EnergyJoules + run.Steps;
    }
}
