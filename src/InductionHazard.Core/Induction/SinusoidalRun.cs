using System.Collections.Generic;
using System.Numerics;
using InductionHazard.Thermal;

namespace InductionHazard.Induction;

/// <summary>What <see cref="SinusoidalPathSolver"/> found.</summary>
public sealed class SinusoidalRun
{
    /// <summary>The total current phasor at the start temperature (peak value; i(t) = Im(I e^(j omega t))), A.</summary>
    public Complex CurrentPhasor { get; init; }

    /// <summary>The emf around the outline over the total current at the start temperature, ohm: the loop impedance of one path, an equivalent for a set.</summary>
    public Complex Impedance { get; init; }

    /// <summary>The largest current amplitude over the heating history, A.</summary>
    public double PeakCurrentAmperes { get; init; }

    /// <summary>One period of emf and current at the start temperature.</summary>
    public IReadOnlyList<CircuitSample> Circuit { get; init; } = System.Array.Empty<CircuitSample>();

    /// <summary>The temperature history with the cycle-averaged power.</summary>
    public IReadOnlyList<HeatingSample> Heating { get; init; } = System.Array.Empty<HeatingSample>();

    /// <summary>The energy dissipated while the field runs, J.</summary>
    public double EnergyJoules { get; init; }

    /// <summary>The temperature at the end of the exposure, °C.</summary>
    public double FinalCelsius { get; init; }

    /// <summary>When the item passed its melting point and the run stopped, s; null when it did not.</summary>
    public double? MeltedAtSeconds { get; init; }

    /// <summary>True when the heating ran out of steps before the end (the result is then incomplete).</summary>
    public bool BudgetExceeded { get; init; }
}

/// <summary>The periodic steady state of a path set at one temperature.</summary>
/// <param name="PowerWatts">The cycle-averaged power dissipated, W.</param>
/// <param name="CurrentPhasor">The total current phasor (peak), A.</param>
public readonly record struct SteadyState(double PowerWatts, Complex CurrentPhasor);
