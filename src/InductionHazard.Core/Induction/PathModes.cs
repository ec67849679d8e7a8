using System;
using System.Threading;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The modes of a path set: with path currents i = W z, the circuit L i' + s R0 i = e becomes
/// lambda_k z_k' + s z_k = (W^T e)_k, one RL circuit per mode with inductance lambda_k and resistance s, and the power
/// i^T R i = s z^T z. W = R0^(-1/2) Q, or C^-T Q where R0 = C C^T is not diagonal (mesh currents).
/// </summary>
/// <remarks>
/// A set symmetric about its mid-plane (<see cref="AxialMirror"/>) has its modes even about the plane solved at once
/// and the odd ones only when first needed: a drive the same at a filament and its image (a uniform field along the
/// axis, a coil centred on the plane) gives the odd modes no coupling, so they carry no current, and
/// <see cref="Drive(double[,], Vector3D[,], double[])"/> leaves them out.
/// </remarks>
public sealed record PathModes
{
    private readonly double[]? _lambdas;
    private readonly double[,]? _weights;
    private readonly Lazy<(double[] Lambdas, double[,] Weights)>? _whole;
    private readonly PathModes? _even;
    private readonly AxialMirror? _mirror;

    /// <summary>The modes, all known.</summary>
    /// <param name="lambdas">Each mode's inductance lambda_k at the reference resistivity (its time constant at s = 1), s.</param>
    /// <param name="weights">W, paths x modes: path current per unit modal amplitude.</param>
    public PathModes(double[] lambdas, double[,] weights)
    {
        _lambdas = lambdas;
        _weights = weights;
    }

    /// <summary>The modes of a mirror-symmetric set: the even ones, and all of them (the odd ones solved) when first asked for.</summary>
    internal PathModes(PathModes even, AxialMirror mirror, Func<(double[] Lambdas, double[,] Weights)> whole)
    {
        _even = even;
        _mirror = mirror;
        _whole = new Lazy<(double[] Lambdas, double[,] Weights)>(whole, LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>Each mode's inductance lambda_k at the reference resistivity (its time constant at s = 1), s, ascending.</summary>
    public double[] Lambdas => _lambdas ?? _whole!.Value.Lambdas;

    /// <summary>W, paths x modes: path current per unit modal amplitude.</summary>
    public double[,] Weights => _weights ?? _whole!.Value.Weights;

    /// <summary>Each path's share in the reported total current (all 1 when null; for mesh currents, the centre cells: the current circulating about the centre).</summary>
    public double[]? CurrentWeights { get; init; }

    /// <summary>The number of modes.</summary>
    public int Count => Lambdas.Length;

    /// <summary>
    /// The circuit of the modes driven by source terms: modal coupling C = W^T M (modes x terms) from the paths'
    /// flux per unit drive M (paths x terms), and the weights of the total current sum_i i_i.
    /// </summary>
    public ModalCircuit Drive(double[,] pathCoupling) => Drive(pathCoupling, null, null);

    /// <summary>
    /// The circuit of the modes with, besides the coupling, the force coupling G_kj = sum_i W_ik grad M_ij (so that the
    /// force is sum_j d_j sum_k G_kj z_k) and the moment weights a_k = sum_i W_ik A_i (the magnetic moment per unit normal
    /// is sum_k a_k z_k). For a mirror-symmetric set driven alike at every filament and its image, the even modes alone:
    /// the odd ones' coupling is zero, and with it their currents, forces and moments. The circuit's modes are then not
    /// numbered as <see cref="Weights"/>' columns: path currents come from its own <see cref="ModalCircuit.PathWeights"/>.
    /// </summary>
    public ModalCircuit Drive(double[,] pathCoupling, Vector3D[,]? pathGradient, double[]? pathAreas) =>
        _even is not null && _mirror!.DrivesAlike(pathCoupling)
            ? (_even with { CurrentWeights = CurrentWeights }).Drive(pathCoupling, pathGradient, pathAreas)
            : Drive(Lambdas, Weights, CurrentWeights, pathCoupling, pathGradient, pathAreas);

    private static ModalCircuit Drive(double[] lambdas, double[,] weights, double[]? currentWeights, double[,] pathCoupling, Vector3D[,]? pathGradient, double[]? pathAreas)
    {
        int paths = weights.GetLength(0), modes = lambdas.Length, terms = pathCoupling.GetLength(1);
        var c = new double[modes, terms];
        var total = new double[modes];
        for (int k = 0; k < modes; k++)
        {
            for (int i = 0; i < paths; i++)
            {
                total[k] += (currentWeights?[i] ?? 1) * weights[i, k];
                for (int j = 0; j < terms; j++)
                {
                    c[k, j] += weights[i, k] * pathCoupling[i, j];
                }
            }
        }

        Vector3D[,]? force = null;
        double[]? moment = null;
        if (pathGradient is not null)
        {
            force = new Vector3D[modes, terms];
            for (int k = 0; k < modes; k++)
            {
                for (int j = 0; j < terms; j++)
                {
                    Vector3D sum = Vector3D.Zero;
                    for (int i = 0; i < paths; i++)
                    {
                        sum += weights[i, k] * pathGradient[i, j];
                    }

                    force[k, j] = sum;
                }
            }
        }

        if (pathAreas is not null)
        {
            moment = new double[modes];
            for (int k = 0; k < modes; k++)
            {
                for (int i = 0; i < paths; i++)
                {
                    moment[k] += weights[i, k] * pathAreas[i];
                }
            }
        }

        return new ModalCircuit(lambdas, c, total) { ForceCoupling = force, MomentWeights = moment, PathWeights = weights };
    }
}
