using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The modes of a path set: with path currents i = W z, the circuit L i' + s R0 i = e becomes
/// lambda_k z_k' + s z_k = (W^T e)_k, one RL circuit per mode with inductance lambda_k and resistance s, and the power
/// i^T R i = s z^T z. W = R0^(-1/2) Q, or C^-T Q where R0 = C C^T is not diagonal (mesh currents).
/// </summary>
/// <param name="Lambdas">Each mode's inductance lambda_k at the reference resistivity (its time constant at s = 1), s.</param>
/// <param name="Weights">W, paths x modes: path current per unit modal amplitude.</param>
public sealed record PathModes(double[] Lambdas, double[,] Weights)
{
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
    /// is sum_k a_k z_k).
    /// </summary>
    public ModalCircuit Drive(double[,] pathCoupling, Vector3D[,]? pathGradient, double[]? pathAreas)
    {
        int paths = Weights.GetLength(0), modes = Count, terms = pathCoupling.GetLength(1);
        var c = new double[modes, terms];
        var total = new double[modes];
        for (int k = 0; k < modes; k++)
        {
            for (int i = 0; i < paths; i++)
            {
                total[k] += (CurrentWeights?[i] ?? 1) * Weights[i, k];
                for (int j = 0; j < terms; j++)
                {
                    c[k, j] += Weights[i, k] * pathCoupling[i, j];
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
                        sum += Weights[i, k] * pathGradient[i, j];
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
                    moment[k] += Weights[i, k] * pathAreas[i];
                }
            }
        }

        return new ModalCircuit(Lambdas, c, total) { ForceCoupling = force, MomentWeights = moment };
    }
}
