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

        return new PathSet(l, diagonal, null, description, mesh, r) { InductanceMethod = "partial inductances of the mesh's branches (Grover's parallel filaments)" };
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

    /// <summary>How its inductances were found, for the model notes.</summary>
    public string InductanceMethod { get; private init; } = "Grover's thin-loop formula";

    /// <summary>One path: a thin loop with inductance L and resistance rho l / S.</summary>
    public static PathSet OnePath(double inductanceHenries, double lengthOverArea, string description) =>
        new(new[,] { { inductanceHenries } }, new[] { lengthOverArea }, null, description);

    /// <summary>
    /// Concentric shells of a round wire bent into a rectangle, sides a and b: the wire's skin effect in time and in
    /// steady state where the loop is large against the wire (its proximity effect negligible). Each shell follows the
    /// loop's outline, so all link the same flux. By Grover's GMD method: the loop's external inductance (current on
    /// the wire's surface) plus (mu0 / 2 pi) P ln(r / g), with g a shell's own geometric-mean radius (Maxwell's for an
    /// annulus) for its self term, and for two shells the outer one's geometric-mean distance from any point inside
    /// it; R_i = rho P / A_i.
    /// </summary>
    /// <param name="a">One side of the loop, m.</param>
    /// <param name="b">The other side, m.</param>
    /// <param name="radii">The shells' boundaries from the axis out: 0 = r_0 &lt; r_1 &lt; ... &lt; r_n = the wire's radius, m.</param>
    /// <param name="description">What was built, for the notes.</param>
    public static PathSet Shells(double a, double b, IReadOnlyList<double> radii, string description)
    {
        int n = radii.Count - 1;
        var l = new double[n, n];
        var g = new double[n];
        double perimeter = 2 * (a + b), surface = radii[n];
        // The loop's inductance for a current on the wire's surface, plus the straight wire's log term for a GMD g
        // inside it: L(g) = L_ext + (mu0 / 2 pi) P ln(surface / g). (Only the log of the GMD is exact for a distribution
        // over the section; the filament formula's other terms in g are not, and would bend the internal inductance.)
        double external = RectangleInductance.ExternalHenries(a, b, surface);
        double perLog = Quantities.PhysicalConstants.VacuumPermeability / (2 * Math.PI) * perimeter;
        for (int i = 0; i < n; i++)
        {
            double inner = radii[i], outer = radii[i + 1];
            l[i, i] = external + (perLog * Math.Log(surface / AnnulusGmr(inner, outer)));
            g[i] = perimeter / (Math.PI * ((outer * outer) - (inner * inner)));
            for (int j = i + 1; j < n; j++)
            {
                // Shell j lies outside shell i: their GMD is shell j's GMD from any point inside it.
                double m = external + (perLog * Math.Log(surface / AnnulusGmdFromInside(radii[j], radii[j + 1])));
                l[i, j] = m;
                l[j, i] = m;
            }
        }

        return new PathSet(l, g, null, description) { SharesOutline = true, InductanceMethod = "Grover's GMD method" };
    }

    /// <summary>
    /// Maxwell's geometric-mean radius of an annulus r1 &lt; r &lt; r2 (Grover 1946):
    /// ln g = ln r2 - r1^4 ln(r2/r1) / (r2^2 - r1^2)^2 + (3 r1^2 - r2^2) / (4 (r2^2 - r1^2)); r2 e^(-1/4) for a disc.
    /// </summary>
    public static double AnnulusGmr(double r1, double r2)
    {
        double d = (r2 * r2) - (r1 * r1);
        double logRatio = r1 > 0 ? Math.Log(r2 / r1) : 0;
        return Math.Exp(Math.Log(r2) - (Math.Pow(r1, 4) * logRatio / (d * d)) + (((3 * r1 * r1) - (r2 * r2)) / (4 * d)));
    }

    /// <summary>
    /// The geometric-mean distance of an annulus r1 &lt; r &lt; r2 from any point inside r1 (the mean of ln r over its
    /// area, since the mean of ln|x - p| over a circle of radius r is ln r for |p| &lt; r):
    /// ln g = (r2^2 ln r2 - r1^2 ln r1) / (r2^2 - r1^2) - 1/2.
    /// </summary>
    public static double AnnulusGmdFromInside(double r1, double r2)
    {
        double inner = r1 > 0 ? r1 * r1 * Math.Log(r1) : 0;
        return Math.Exp((((r2 * r2 * Math.Log(r2)) - inner) / ((r2 * r2) - (r1 * r1))) - 0.5);
    }

    /// <summary>True when every path follows the item's own outline (concentric shells of a wire): they link the same flux and feel the same force per ampere.</summary>
    public bool SharesOutline { get; private init; }

    /// <summary>
    /// Coaxial filaments: self terms from each cell's section (<see cref="CoaxialInductance.SelfHenries"/>), mutual
    /// terms by Maxwell's formula (averaged over sub-filaments for neighbouring cells), R_i = rho 2 pi r_i / S_i. A set
    /// symmetric about its mid-plane (<see cref="AxialMirror"/>) computes each term once for a pair and its image, and
    /// gives its image's resistance to each filament.
    /// </summary>
    public static PathSet Coaxial(IReadOnlyList<Filament> cells, string description) => Coaxial(cells, description, AxialMirror.Of(cells));

    /// <summary>The same, with the set's mirror symmetry given (null: none used).</summary>
    internal static PathSet Coaxial(IReadOnlyList<Filament> cells, string description, AxialMirror? mirror)
    {
        int n = cells.Count;
        var l = new double[n, n];
        var g = new double[n];
        for (int i = 0; i < n; i++)
        {
            Filament p = cells[i];
            int image = mirror?.ImageOf(i) ?? i;
            if (image < i)
            {
                // The image's terms were found with its row.
                g[i] = g[image];
                l[i, i] = l[image, image];
            }
            else
            {
                g[i] = p.PathLengthMeters / p.AreaSquareMeters;
                l[i, i] = CoaxialInductance.SelfHenries(p);
            }

            for (int j = i + 1; j < n; j++)
            {
                if (mirror is not null && !mirror.Computes(i, j))
                {
                    continue;
                }

                double m = CoaxialInductance.MutualHenries(p, cells[j]);
                l[i, j] = m;
                l[j, i] = m;
                if (mirror is not null)
                {
                    int a = mirror.ImageOf(i), b = mirror.ImageOf(j);
                    l[a, b] = m;
                    l[b, a] = m;
                }
            }
        }

        return new PathSet(l, g, cells, description) { InductanceMethod = "Maxwell mutual inductances", Mirror = mirror };
    }

    /// <summary>The set's symmetry about its mid-plane, when it has one: its modes are found in its even and odd halves.</summary>
    internal AxialMirror? Mirror { get; private init; }

    /// <summary>
    /// The modes of the (L, R) pencil at a reference resistivity: with R0 = rho_ref diag(l/S), the symmetric matrix
    /// R0^(-1/2) L R0^(-1/2) = Q diag(lambda) Q^T. Null when L is not positive definite (a mesh too coarse for its
    /// inductances to be physical), which the caller reports rather than solves. A set symmetric about its mid-plane
    /// solves its even and odd halves apart, the odd one only when a drive reaches it (<see cref="AxialMirror.Modes"/>).
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

        if (Mirror is not null)
        {
            return Mirror.Modes(InductanceHenries, scale);
        }

        Matrix<double> a = Matrix<double>.Build.Dense(n, n, (i, j) => scale[i] * InductanceHenries[i, j] * scale[j]);
        if (PositiveEigen(a) is not { } solved)
        {
            return null;
        }

        var w = new double[n, n];
        for (int k = 0; k < n; k++)
        {
            for (int i = 0; i < n; i++)
            {
                w[i, k] = scale[i] * solved.Vectors[i, k];
            }
        }

        return new PathModes(solved.Values, w);
    }

    /// <summary>
    /// A symmetric matrix's eigenvalues (ascending) and eigenvectors, or null when one eigenvalue is not positive: the
    /// pencil of a mesh whose inductances are not physical.
    /// </summary>
    internal static (double[] Values, Matrix<double> Vectors)? PositiveEigen(Matrix<double> symmetric)
    {
        var evd = symmetric.Evd(Symmetricity.Symmetric);
        double[] values = evd.EigenValues.Real().ToArray();
        foreach (double value in values)
        {
            if (!(value > 0))
            {
                return null;
            }
        }

        return (values, evd.EigenVectors);
    }

    /// <summary>Whether a symmetric matrix is positive definite: its Cholesky factor exists.</summary>
    internal static bool PositiveDefinite(Matrix<double> symmetric) => CholeskyFactor(symmetric) is not null;

    /// <summary>The Cholesky factor of a symmetric matrix, or null when it is not positive definite.</summary>
    private static Matrix<double>? CholeskyFactor(Matrix<double> symmetric)
    {
        try
        {
            return symmetric.Cholesky().Factor;
        }
        catch (ArgumentException)
        {
            return null;
        }
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
        if (CholeskyFactor(r0) is not { } c)
        {
            return null;
        }

        Matrix<double> cInverse = c.Inverse();
        Matrix<double> a = cInverse * l * cInverse.Transpose();
        a = 0.5 * (a + a.Transpose());
        if (PositiveEigen(a) is not { } solved)
        {
            return null;
        }

        return new PathModes(solved.Values, (cInverse.Transpose() * solved.Vectors).ToArray());
    }
}
