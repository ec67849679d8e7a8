using System;
using System.Collections.Generic;

namespace InductionHazard.Items;

/// <summary>
/// A block's W x H x D volume as a grid of cells in layers along its axis, for mesh currents: each cell carries a
/// current circulating around its own edge (the discrete stream function of the eddy currents, zero outside the
/// block), and each branch between neighbouring cell centres (or a cell centre and the edge) carries the difference
/// of the two cells' currents. Cells are at most the surface cell wide at every face and grow inward (as in
/// <see cref="FilamentMesh"/>).
/// </summary>
public sealed class PlateMesh
{
    private PlateMesh(double[] x, double[] y, double[] z, List<MeshBranch> branches)
    {
        X = x;
        Y = y;
        Z = z;
        Branches = branches;
    }

    /// <summary>The cell edges across the width (centred on 0), m.</summary>
    public double[] X { get; }

    /// <summary>The cell edges across the height (centred on 0), m.</summary>
    public double[] Y { get; }

    /// <summary>The layer edges along the axis (centred on 0), m.</summary>
    public double[] Z { get; }

    /// <summary>The cells in a layer along x.</summary>
    public int Columns => X.Length - 1;

    /// <summary>The cells in a layer along y.</summary>
    public int Rows => Y.Length - 1;

    /// <summary>The layers.</summary>
    public int Layers => Z.Length - 1;

    /// <summary>The number of cells: the mesh currents.</summary>
    public int Count => Columns * Rows * Layers;

    /// <summary>The branches.</summary>
    public IReadOnlyList<MeshBranch> Branches { get; }

    /// <summary>The index of cell (i, j, k).</summary>
    public int Cell(int i, int j, int k) => (((k * Rows) + j) * Columns) + i;

    /// <summary>Builds the grid: in the face, cells of a sixteenth of the shorter side (over the refinement), coarser toward the middle of a long side, graded down to the surface cell at the edges where that is finer; along the axis, layers graded to the surface cell.</summary>
    public static PlateMesh Build(double width, double height, double depth, double surfaceCell, int refinement = 1)
    {
        // Across the shorter side, uniform cells of a sixteenth of it (the discrete Poisson problem is of second
        // order there); along the longer side the same at its ends, growing to a quarter of the shorter side in the
        // middle, where the current runs along it and hardly changes; graded down to a third of the skin depth at
        // the edges where that is finer.
        // A block no thicker along its axis than the skin depth (three surface cells) carries its current through
        // its whole depth: one layer, and in its face the current crowds toward the edges over the screening length
        // delta^2 / depth rather than delta (thin-sheet eddy currents), so the face is graded to a third of that.
        double delta = 3 * surfaceCell;
        bool thin = depth <= delta;
        double shorter = Math.Min(width, height);
        double cell = shorter / (4 * refinement * FilamentMesh.MinimumCells);
        double first = Math.Min(thin ? delta * delta / depth / 3 : surfaceCell, cell);
        double longest = Math.Max(cell, shorter / 4);
        double[] x = Centred(FilamentMesh.Divide(width, first, width > height ? longest : cell, true, true), width);
        double[] y = Centred(FilamentMesh.Divide(height, first, height > width ? longest : cell, true, true), height);
        double layer = Math.Min(surfaceCell, depth);
        // At low frequency (a skin depth beyond half the face's shorter side, the field reaching the middle from both
        // sides) a uniform axial field drives the same eddy currents in every section, and they meet every face's
        // condition: one layer is exact there too.
        bool sectional = delta >= shorter / 2;
        double[] z = thin || sectional || layer >= depth ? new[] { -depth / 2, depth / 2 } : Centred(FilamentMesh.Divide(depth, layer, Math.Max(layer, Math.Min(depth / 2, FilamentMesh.MaxAspect * layer)), true, true), depth);
        var mesh = new PlateMesh(x, y, z, new List<MeshBranch>());
        mesh.AddBranches();
        return mesh;
    }

    private static double[] Centred(double[] edges, double length)
    {
        for (int k = 0; k < edges.Length; k++)
        {
            edges[k] -= length / 2;
        }

        return edges;
    }

    private void AddBranches()
    {
        var branches = (List<MeshBranch>)Branches;
        for (int k = 0; k < Layers; k++)
        {
            double z = 0.5 * (Z[k] + Z[k + 1]), dz = Z[k + 1] - Z[k];

            // x-directed branches on each horizontal line j (0..Rows), along column i: +x current is I(i, j) - I(i, j - 1).
            for (int j = 0; j <= Rows; j++)
            {
                double below = j > 0 ? Centre(Y, j - 1) : Y[0], above = j < Rows ? Centre(Y, j) : Y[Rows];
                for (int i = 0; i < Columns; i++)
                {
                    int plus = j < Rows ? Cell(i, j, k) : -1, minus = j > 0 ? Cell(i, j - 1, k) : -1;
                    branches.Add(new MeshBranch(true, X[i], X[i + 1], 0.5 * (below + above), above - below, z, dz, plus, minus));
                }
            }

            // y-directed branches on each vertical line i (0..Columns), along row j: +y current is I(i - 1, j) - I(i, j).
            for (int i = 0; i <= Columns; i++)
            {
                double left = i > 0 ? Centre(X, i - 1) : X[0], right = i < Columns ? Centre(X, i) : X[Columns];
                for (int j = 0; j < Rows; j++)
                {
                    int plus = i > 0 ? Cell(i - 1, j, k) : -1, minus = i < Columns ? Cell(i, j, k) : -1;
                    branches.Add(new MeshBranch(false, Y[j], Y[j + 1], 0.5 * (left + right), right - left, z, dz, plus, minus));
                }
            }
        }
    }

    private static double Centre(double[] edges, int cell) => 0.5 * (edges[cell] + edges[cell + 1]);
}

/// <summary>
/// A straight branch of a plate mesh: along x (or y) from <paramref name="From"/> to <paramref name="To"/>, at
/// <paramref name="Across"/> in the other face direction and <paramref name="Axial"/> along the axis, with a
/// <paramref name="Width"/> x <paramref name="Thickness"/> section; its current in the positive direction is the
/// current of cell <paramref name="Plus"/> less that of cell <paramref name="Minus"/> (-1 for none: outside the block).
/// </summary>
public readonly record struct MeshBranch(bool AlongX, double From, double To, double Across, double Width, double Axial, double Thickness, int Plus, int Minus)
{
    /// <summary>The branch's length, m.</summary>
    public double Length => To - From;
}
