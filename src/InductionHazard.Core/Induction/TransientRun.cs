using System.Collections.Generic;
using InductionHazard.Thermal;

namespace InductionHazard.Induction;

/// <summary>What <see cref="TransientPathSolver"/> found.</summary>
public sealed class TransientRun
{
    /// <summary>The electrical time series (thinned to what a chart needs; peaks are exact, not sampled).</summary>
    public IReadOnlyList<CircuitSample> Circuit { get; init; } = System.Array.Empty<CircuitSample>();

    /// <summary>The temperature history.</summary>
    public IReadOnlyList<HeatingSample> Heating { get; init; } = System.Array.Empty<HeatingSample>();

    /// <summary>The total current around the loop or axis of largest magnitude (signed), A.</summary>
    public double PeakCurrentAmperes { get; init; }

    /// <summary>When the peak current occurs, s.</summary>
    public double PeakCurrentSeconds { get; init; }

    /// <summary>The energy dissipated in the loop, J.</summary>
    public double EnergyJoules { get; init; }

    /// <summary>The temperature at the end, °C.</summary>
    public double FinalCelsius { get; init; }

    /// <summary>When the item passed its melting point and the run stopped, s; null when it did not.</summary>
    public double? MeltedAtSeconds { get; init; }

    /// <summary>The modal amplitudes z at the end (path currents i = W z).</summary>
    public double[] FinalModalAmplitudes { get; init; } = System.Array.Empty<double>();

    /// <summary>The force of largest magnitude on the item at a step's end, N (zero when forces were not followed).</summary>
    public Quantities.Vector3D PeakForce { get; init; }

    /// <summary>When the peak force occurs, s.</summary>
    public double PeakForceSeconds { get; init; }

    /// <summary>The impulse, the integral of the force over the run, N s.</summary>
    public Quantities.Vector3D Impulse { get; init; }

    /// <summary>The largest torque on the item's moment, N m.</summary>
    public double PeakTorqueNewtonMeters { get; init; }

    /// <summary>The largest |m| |B| over the run, bounded step by step, N m, when the run was asked for it (<see cref="TransientPathSolver.CentreField"/>); 0 otherwise.</summary>
    public double PeakMomentField { get; init; }

    /// <summary>The steps taken.</summary>
    public int Steps { get; init; }

    /// <summary>True when the step budget ran out, or time stopped advancing, before the end (the result is then incomplete).</summary>
    public bool BudgetExceeded { get; init; }
}
