using System;
using System.Collections.Generic;
using InductionHazard.Items;
using MathNet.Numerics.LinearAlgebra;

namespace InductionHazard.Induction;

/// <summary>
/// The mirror symmetry of a coaxial filament set about its mid-plane z = 0 (a rod, disc, tube, sphere or thick ring is
/// meshed symmetrically): each filament's image, with which it shares every inductance term (M_ij = M_i'j') and its
/// resistance. The symmetry halves what must be computed: the mutual inductances are found for one of each image pair,
/// and the modes of the (L, R) pencil split into those even about the plane and those odd, two problems of half the
/// size (a quarter of the work each, as an eigenvalue problem costs the cube of its size): the same modes, found apart.
/// </summary>
internal sealed class AxialMirror
{
    /// <summary>
    /// How near an image must lie, as a share of the set's extent: the meshes place a cell and its image within a few
    /// units in the last place (sums of the same sizes taken from either end), and a set that is not symmetric misses by
    /// far more.
    /// </summary>
    private const double Tolerance = 1e-12;

    private readonly int[] _image;

    private AxialMirror(int[] image)
    {
        _image = image;
    }

    /// <summary>The image of path i (i itself for a filament on the plane).</summary>
    public int ImageOf(int i) => _image[i];

    /// <summary>
    /// The images of a set's filaments, or null when some filament has none: the same radius, section, area and sector
    /// at the opposite axial position, its side's angle mirrored, every figure within <see cref="Tolerance"/> of the
    /// set's extent (angles within that of a turn).
    /// </summary>
    public static AxialMirror? Of(IReadOnlyList<Filament> cells)
    {
        int n = cells.Count;
        if (n < 2)
        {
            return null;
        }

        double extent = 0;
        foreach (Filament f in cells)
        {
            extent = Math.Max(extent, Math.Max(Math.Abs(f.RadiusMeters) + f.LargestSideMeters, Math.Abs(f.AxialMeters) + f.LargestSideMeters));
        }

        // Candidates by axial position: each filament's image is searched for among those near minus its own.
        var byAxial = new int[n];
        var axial = new double[n];
        for (int i = 0; i < n; i++)
        {
            byAxial[i] = i;
            axial[i] = cells[i].AxialMeters;
        }

        Array.Sort(axial, byAxial);
        double near = Tolerance * extent;
        var image = new int[n];
        for (int i = 0; i < n; i++)
        {
            image[i] = -1;
        }

        for (int i = 0; i < n; i++)
        {
            if (image[i] >= 0)
            {
                continue;
            }

            Filament p = cells[i];
            int from = LowerBound(axial, -p.AxialMeters - near);
            for (int k = from; k < n && axial[k] <= -p.AxialMeters + near; k++)
            {
                int j = byAxial[k];
                if (image[j] < 0 && Mirrors(p, cells[j], near))
                {
                    image[i] = j;
                    image[j] = i;
                    break;
                }
            }

            if (image[i] < 0)
            {
                return null;
            }
        }

        return new AxialMirror(image);
    }

    /// <summary>Whether q is p's image: the same cell reflected in z = 0.</summary>
    private static bool Mirrors(in Filament p, in Filament q, double near) =>
        Math.Abs(p.RadiusMeters - q.RadiusMeters) <= near
        && Math.Abs(p.AxialMeters + q.AxialMeters) <= near
        && Math.Abs(p.WidthMeters - q.WidthMeters) <= near
        && Math.Abs(p.HeightMeters - q.HeightMeters) <= near
        && Math.Abs(p.PolarRadiusMeters - q.PolarRadiusMeters) <= near
        && Math.Abs(p.AreaSquareMeters - q.AreaSquareMeters) <= near * (p.WidthMeters + p.HeightMeters)
        && Math.Abs(p.SectorRadians - q.SectorRadians) <= Tolerance * 2 * Math.PI
        && OppositeAngles(p.AngleRadians, q.AngleRadians);

    /// <summary>Whether b is -a as a direction: a + b a whole number of turns, within the tolerance.</summary>
    private static bool OppositeAngles(double a, double b)
    {
        double turns = (a + b) / (2 * Math.PI);
        return Math.Abs(turns - Math.Round(turns)) <= Tolerance;
    }

    /// <summary>The first index whose value is at least the bound.</summary>
    private static int LowerBound(double[] sorted, double bound)
    {
        int low = 0, high = sorted.Length;
        while (low < high)
        {
            int mid = (low + high) >> 1;
            if (sorted[mid] < bound)
            {
                low = mid + 1;
            }
            else
            {
                high = mid;
            }
        }

        return low;
    }

    /// <summary>
    /// Whether the pair (i, j) is the one of its images (i', j') whose term is computed: the lesser of the two pairs,
    /// each taken in ascending order; the other takes its value.
    /// </summary>
    public bool Computes(int i, int j)
    {
        (int a, int b) = i <= j ? (i, j) : (j, i);
        int ia = _image[a], ib = _image[b];
        (int c, int d) = ia <= ib ? (ia, ib) : (ib, ia);
        return a < c || (a == c && b <= d);
    }

    /// <summary>
    /// Whether a drive is the same at every filament and its image, for every term, to 1e-12 of the term's largest:
    /// then the odd modes, whose coupling is the drive's odd part, are not driven. (A mesh places an image within a few
    /// units in the last place, and a uniform field's coupling, each filament's own area, differs as little; a drive
    /// that differs between the halves by more than that is kept whole.)
    /// </summary>
    public bool DrivesAlike(double[,] pathCoupling)
    {
        int terms = pathCoupling.GetLength(1);
        for (int j = 0; j < terms; j++)
        {
            double largest = 0;
            for (int i = 0; i < _image.Length; i++)
            {
                largest = Math.Max(largest, Math.Abs(pathCoupling[i, j]));
            }

            for (int i = 0; i < _image.Length; i++)
            {
                if (!(Math.Abs(pathCoupling[i, j] - pathCoupling[_image[i], j]) <= Tolerance * largest))
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>
    /// The modes of the symmetric matrix A = S L S (S the diagonal of <paramref name="scale"/>, the same for a path and its
    /// image), from its even and odd blocks: with e_a = (u_a + u_a') / sqrt 2 and o_a = (u_a - u_a') / sqrt 2 for each
    /// image pair and u_c for a filament on the plane, A is block-diagonal; the even block is A_ab + A_ab' over pairs
    /// (sqrt 2 A_ac beside a filament on the plane, A_cd between two), the odd block A_ab - A_ab'. Each block's
    /// eigenvectors, mapped back, are eigenvectors of A with the same eigenvalues. The even modes are solved here; the
    /// odd block is only checked to be positive definite (a Cholesky factor, a small part of an eigenproblem's work),
    /// and solved when the whole set is first asked for (<see cref="PathModes"/>). Null when either block is not positive
    /// definite: the mesh cannot represent the section.
    /// </summary>
    public PathModes? Modes(double[,] inductance, double[] scale)
    {
        int n = _image.Length;
        var pairs = new List<int>();
        var plane = new List<int>();
        for (int i = 0; i < n; i++)
        {
            if (_image[i] == i)
            {
                plane.Add(i);
            }
            else if (i < _image[i])
            {
                pairs.Add(i);
            }
        }

        int p = pairs.Count, even = p + plane.Count;
        double A(int i, int j) => scale[i] * inductance[i, j] * scale[j];
        Matrix<double> evenBlock = Matrix<double>.Build.Dense(even, even, (x, y) =>
        {
            bool xPair = x < p, yPair = y < p;
            int i = xPair ? pairs[x] : plane[x - p], j = yPair ? pairs[y] : plane[y - p];
            return xPair && yPair ? A(i, j) + A(i, _image[j])
                : xPair || yPair ? Math.Sqrt(2) * A(i, j)
                : A(i, j);
        });
        Matrix<double> oddBlock = Matrix<double>.Build.Dense(p, p, (x, y) => A(pairs[x], pairs[y]) - A(pairs[x], _image[pairs[y]]));
        if (PathSet.PositiveEigen(evenBlock) is not { } evenModes || (p > 0 && !PathSet.PositiveDefinite(oddBlock)))
        {
            return null;
        }

        var evenOnly = new PathModes(evenModes.Values, EvenWeights(evenModes.Vectors, evenModes.Values.Length));
        return new PathModes(evenOnly, this, () =>
        {
            (double[] Values, Matrix<double> Vectors) oddModes = p == 0 ? (Array.Empty<double>(), Matrix<double>.Build.Dense(0, 0))
                : PathSet.PositiveEigen(oddBlock) ?? throw new InvalidOperationException("the filament inductance matrix is not positive definite in its modes odd about the mid-plane (the mesh cannot represent this section)");

            // Both halves in one ascending order of their eigenvalues, as one problem gives them.
            var modes = new List<(double Lambda, bool Odd, int Column)>(n);
            for (int k = 0; k < evenModes.Values.Length; k++)
            {
                modes.Add((evenModes.Values[k], false, k));
            }

            for (int k = 0; k < oddModes.Values.Length; k++)
            {
                modes.Add((oddModes.Values[k], true, k));
            }

            modes.Sort((x, y) => x.Lambda.CompareTo(y.Lambda));
            var lambdas = new double[n];
            var w = new double[n, n];
            for (int mode = 0; mode < n; mode++)
            {
                (double lambda, bool odd, int k) = modes[mode];
                lambdas[mode] = lambda;
                Write(w, mode, odd ? oddModes.Vectors : evenModes.Vectors, k, odd);
            }

            return (lambdas, w);
        });

        // W = S Q for the columns of one half: a pair's two paths share v / sqrt 2 (with opposite signs in an odd mode),
        // a filament on the plane takes its own component (zero in an odd mode).
        void Write(double[,] w, int mode, Matrix<double> q, int k, bool odd)
        {
            double root = Math.Sqrt(0.5);
            for (int x = 0; x < p; x++)
            {
                int i = pairs[x], i2 = _image[i];
                double v = root * q[x, k];
                w[i, mode] = scale[i] * v;
                w[i2, mode] = scale[i2] * (odd ? -v : v);
            }

            if (!odd)
            {
                for (int x = p; x < even; x++)
                {
                    w[plane[x - p], mode] = scale[plane[x - p]] * q[x, k];
                }
            }
        }

        double[,] EvenWeights(Matrix<double> q, int count)
        {
            var w = new double[n, count];
            for (int k = 0; k < count; k++)
            {
                Write(w, k, q, k, odd: false);
            }

            return w;
        }
    }
}
