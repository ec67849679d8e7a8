using System;
using System.Collections.Generic;
using InductionHazard.Items;
using MathNet.Numerics.LinearAlgebra;

namespace InductionHazard.Induction;

/// <summary>
/// An item as N coupled current paths: the N x N inductance matrix L, and for each path the ratio of its length
/// to its section (so that R_i(T) = rho(T) l_i / S_i). One path for a thin loop; coaxial filaments over the
/// section of a thick ring or a body of revolution. The solvers never ask which shape built it.
/// </summary>
public sealed class PathSet
{
    private PathSet(double[,] inductance, double[] lengthOverArea, IReadOnlyList<Filament>? filaments, string description, PlateMesh? plate = null, double[,]? resistanceShape = null)
    {
        InductanceHenries = inductance;
        LengthOverArea = lengthOverArea;
        Filaments = filaments;
        Description = description;
        Plate = plate;
        ResistanceShape = resistanceShape;
    }

    /// <summary>The mesh of a block whose paths are mesh currents; null otherwise.</summary>
    public PlateMesh? Plate { get; }

    /// <summary>
    /// For mesh currents, the resistance matrix per unit resistivity, 1/m (R0 = rho times it; not diagonal, as
    /// neighbouring cells share branches); null when each path has its own resistance (<see cref="LengthOverArea"/>).
    /// </summary>
    public double[,]? ResistanceShape { get; }

    /// <summary>
    /// Mesh currents over a block's grid (partial-element method): the branch inductances by Neumann's integral for
    /// parallel straight bars (<see cref="ParallelSegments"/>; perpendicular bars do not couple), with neighbouring
    /// bars' distance their sections' closed-form GMD (<see cref="RectangleGmd"/>) and each bar's own its GMD from
    /// itself; the mesh matrices L = B^T L_b B and R = B^T R_b B, B the signs with which each cell's current runs in
    /// each branch.
    /// </summary>
    public static PathSet Mesh(PlateMesh mesh, string description)
    {
        int n = mesh.Count;
        IReadOnlyList<MeshBranch> branches = mesh.Branches;
        var l = new double[n, n];
        var r = new double[n, n];
        var diagonal = new double[n];
        for (int a = 0; a < branches.Count; a++)
        {
            MeshBranch p = branches[a];
            double own = p.Length / (p.Width * p.Thickness);
            AddBoth(r, p, p, own);
            for (int b = a; b < branches.Count; b++)
            {
                MeshBranch q = branches[b];
                if (q.AlongX != p.AlongX)
                {
                    continue;
                }

                double m = BranchMutual(p, q);
                AddBoth(l, p, q, m);
                if (b != a)
                {
                    AddBoth(l, q, p, m);
                }
            }
        }

        for (int i = 0; i < n; i++)
        {
            diagonal[i] = r[i, i];
        }

        return new PathSet(l, diagonal, null, description, mesh, r);
    }

    /// <summary>Adds value s_p s_q to the entries of the cells the two branches belong to.</summary>
    private static void AddBoth(double[,] matrix, in MeshBranch p, in MeshBranch q, double value)
    {
        foreach ((int i, double si) in new[] { (p.Plus, 1.0), (p.Minus, -1.0) })
        {
            if (i < 0)
            {
                continue;
            }

            foreach ((int j, double sj) in new[] { (q.Plus, 1.0), (q.Minus, -1.0) })
            {
                if (j >= 0)
                {
                    matrix[i, j] += si * sj * value;
                }
            }
        }
    }

    private static double BranchMutual(in MeshBranch p, in MeshBranch q)
    {
        double da = p.Across - q.Across, dz = p.Axial - q.Axial;
        double distance = Math.Sqrt((da * da) + (dz * dz));
        double side = Math.Max(Math.Max(p.Width, p.Thickness), Math.Max(q.Width, q.Thickness));
        double d = distance > 6 * side
            ? distance
            : Math.Exp(RectangleGmd.LogGmd(
                p.Across - (p.Width / 2), p.Across + (p.Width / 2), p.Axial - (p.Thickness / 2), p.Axial + (p.Thickness / 2),
                q.Across - (q.Width / 2), q.Across + (q.Width / 2), q.Axial - (q.Thickness / 2), q.Axial + (q.Thickness / 2)));
        return ParallelSegments.MutualHenries(p.From, p.To, q.From, q.To, d);
    }

    /// <summary>The number of paths.</summary>
    public int Count => LengthOverArea.Length;

    /// <summary>The inductance matrix, self terms on the diagonal, H.</summary>
    public double[,] InductanceHenries { get; }

    /// <summary>Each path's length over its conducting section, 1/m: R_i = rho l_i / S_i.</summary>
    public double[] LengthOverArea { get; }

    /// <summary>The filaments, for a coaxial set; null for a single path of another outline.</summary>
    public IReadOnlyList<Filament>? Filaments { get; }

    /// <summary>How the set was built, for the model notes.</summary>
    public string Description { get; }

    /// <summary>One path: a thin loop with inductance L and resistance rho l / S.</summary>
    public static PathSet OnePath(double inductanceHenries, double lengthOverArea, string description) =>
        new(new[,] { { inductanceHenries } }, new[] { lengthOverArea }, null, description);

    /// <summary>
    /// Coaxial filaments: self terms from each cell's section (<see cref="CoaxialInductance.SelfHenries"/>), mutual
    /// terms by Maxwell's formula (averaged over sub-filaments for neighbouring cells), R_i = rho 2 pi r_i / S_i.
    /// </summary>
    public static PathSet Coaxial(IReadOnlyList<Filament> cells, string description)
    {
        int n = cells.Count;
        var l = new double[n, n];
        var g = new double[n];
        for (int i = 0; i < n; i++)
        {
            Filament p = cells[i];
            l[i, i] = CoaxialInductance.SelfHenries(p);
            g[i] = p.PathLengthMeters / p.AreaSquareMeters;
            for (int j = i + 1; j < n; j++)
            {
                Filament q = cells[j];
                double m = CoaxialInductance.MutualHenries(p, q);
                l[i, j] = m;
                l[j, i] = m;
            }
        }

        return new PathSet(l, g, cells, description);
    }

    /// <summary>
    /// The modes of the (L, R) pencil at a reference resistivity: with R0 = rho_ref diag(l/S), the symmetric matrix
    /// R0^(-1/2) L R0^(-1/2) = Q diag(lambda) Q^T. Null when L is not positive definite (a mesh too coarse for its
    /// inductances to be physical), which the caller reports rather than solves.
    /// </summary>
    public PathModes? Modes(double referenceResistivityOhmMeters)
    {
        int n = Count;
        if (ResistanceShape is { } shape)
        {
            return FullModes(shape, referenceResistivityOhmMeters);
        }

        var scale = new double[n];
        for (int i = 0; i < n; i++)
        {
            scale[i] = 1 / Math.Sqrt(referenceResistivityOhmMeters * LengthOverArea[i]);
        }

        if (n == 1)
        {
            double lambda = InductanceHenries[0, 0] * scale[0] * scale[0];
            return lambda > 0 ? new PathModes(new[] { lambda }, new[,] { { scale[0] } }) : null;
        }

        Matrix<double> a = Matrix<double>.Build.Dense(n, n, (i, j) => scale[i] * InductanceHenries[i, j] * scale[j]);
        var evd = a.Evd(Symmetricity.Symmetric);
        Vector<double> values = evd.EigenValues.Real();
        Matrix<double> q = evd.EigenVectors;
        var lambdas = new double[n];
        var w = new double[n, n];
        for (int k = 0; k < n; k++)
        {
            lambdas[k] = values[k];
            if (!(lambdas[k] > 0))
            {
                return null;
            }

            for (int i = 0; i < n; i++)
            {
                w[i, k] = scale[i] * q[i, k];
            }
        }

        return new PathModes(lambdas, w);
    }

    /// <summary>
    /// Modes with a full resistance matrix: R0 = C C^T (Cholesky), C^-1 L C^-T = Q diag(lambda) Q^T, W = C^-T Q; null when
    /// R0 or the pencil is not positive definite.
    /// </summary>
    private PathModes? FullModes(double[,] shape, double rho)
    {
        int n = Count;
        Matrix<double> r0 = Matrix<double>.Build.Dense(n, n, (i, j) => rho * shape[i, j]);
        Matrix<double> l = Matrix<double>.Build.DenseOfArray(InductanceHenries);
        Matrix<double> c;
        try
        {
            c = r0.Cholesky().Factor;
        }
        catch (ArgumentException)
        {
            return null;
        }

        Matrix<double> cInverse = c.Inverse();
        Matrix<double> a = cInverse * l * cInverse.Transpose();
        a = 0.5 * (a + a.Transpose());
        var evd = a.Evd(Symmetricity.Symmetric);
        Vector<double> values = evd.EigenValues.Real();
        Matrix<double> w = cInverse.Transpose() * evd.EigenVectors;
        var lambdas = new double[n];
        for (int k = 0; k < n; k++)
        {
            lambdas[k] = values[k];
            if (!(lambdas[k] > 0))
            {
                return null;
            }
        }

        return new PathModes(lambdas, w.ToArray());
    }
}

/// <summary>
/// The modes of a path set: with path currents i = W z, the circuit L i' + s R0 i = e becomes
/// lambda_k z_k' + s z_k = (W^T e)_k, one RL circuit per mode with inductance lambda_k and resistance s, and the power
/// i^T R i = s z^T z. W = R0^(-1/2) Q.
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
    public ModalCircuit Drive(double[,] pathCoupling, Quantities.Vector3D[,]? pathGradient, double[]? pathAreas)
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

        Quantities.Vector3D[,]? force = null;
        double[]? moment = null;
        if (pathGradient is not null)
        {
            force = new Quantities.Vector3D[modes, terms];
            for (int k = 0; k < modes; k++)
            {
                for (int j = 0; j < terms; j++)
                {
                    Quantities.Vector3D sum = Quantities.Vector3D.Zero;
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
    public Quantities.Vector3D[,]? ForceCoupling { get; init; }

    /// <summary>a_k: the magnetic moment along the item's normal is sum_k a_k z_k, A m^2; null when not asked for.</summary>
    public double[]? MomentWeights { get; init; }

    /// <summary>One mode for one loop of inductance L and resistance R0 coupled with M to one term (z = sqrt(R0) i).</summary>
    public static ModalCircuit OneLoop(double inductanceHenries, double resistanceOhms, double coupling = 1) =>
        new(new[] { inductanceHenries / resistanceOhms }, new[,] { { coupling / Math.Sqrt(resistanceOhms) } }, new[] { 1 / Math.Sqrt(resistanceOhms) });
}
