using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// Modes driven by source terms: mode k obeys lambda_k z_k' + s(T) z_k = sum_j C_kj u_j(t), where u_j is the emf
/// per unit flux coupling of term j (minus the rate of its drive); the total current around the axis is t . z.
/// </summary>
/// <param name="Lambdas">Each mode's inductance at s = 1.</param>
/// <param name="Coupling">C, modes x terms.</param>
/// <param name="TotalWeights">t: the total current sum_i i_i per unit modal amplitude.</param>
public sealed record ModalCircuit(double[] Lambdas, double[,] Coupling, double[] TotalWeights)
{
    /// <summary>The number of modes.</summary>
    public int Count => Lambdas.Length;

    /// <summary>The number of source terms.</summary>
    public int Terms => Coupling.GetLength(1);

    /// <summary>G, modes x terms: the force is sum_j d_j(t) sum_k G_kj z_k, N; null when not asked for.</summary>
    public Vector3D[,]? ForceCoupling { get; init; }

    /// <summary>a_k: the magnetic moment along the item's normal is sum_k a_k z_k, A m^2; null when not asked for.</summary>
    public double[]? MomentWeights { get; init; }

    /// <summary>
    /// W, paths x these modes: path i's current is sum_k W_ik z_k. The circuit's own, as it may hold fewer modes than
    /// its paths' <see cref="PathModes"/> (those a drive leaves undriven are left out); null for a circuit not made
    /// from paths.
    /// </summary>
    public double[,]? PathWeights { get; init; }

    /// <summary>One mode for one loop of inductance L and resistance R0 coupled with M to one term (z = sqrt(R0) i).</summary>
    public static ModalCircuit OneLoop(double inductanceHenries, double resistanceOhms, double coupling = 1) =>
        new(new[] { inductanceHenries / resistanceOhms }, new[,] { { coupling / Math.Sqrt(resistanceOhms) } }, new[] { 1 / Math.Sqrt(resistanceOhms) });
}
