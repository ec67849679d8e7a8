using System;
using System.Collections.Generic;

namespace InductionHazard.Items;

/// <summary>
/// Meshes of an item's meridional section into filaments: cells no thicker than a set size at each surface (a
/// third of the skin depth, so the current's decay into the metal is resolved) and growing geometrically inward,
/// where the current is weak, so that a thick section needs tens of paths rather than thousands.
/// </summary>
public static class FilamentMesh
{
    /// <summary>The growth of cell thickness from one layer to the next, away from a surface.</summary>
    public const double Growth = 1.3;

    /// <summary>The fewest cells across any dimension, so that low-frequency current distributions are resolved too.</summary>
    public const int MinimumCells = 4;

    /// <summary>
    /// The largest ratio of a cell's sides. Neighbouring cells' mutual inductances are averaged over near-square
    /// sub-filaments, which holds the inductance matrix positive definite only while cells are not much longer than wide.
    /// </summary>
    public const double MaxAspect = 6;

    /// <summary>
    /// Cell edges across [0, length]: the first cell at each graded end no thicker than <paramref name="first"/>, each
    /// next cell <see cref="Growth"/> times thicker, none thicker than <paramref name="largest"/> (and every cell of an
    /// ungraded span at most that).
    /// </summary>
    public static double[] Divide(double length, double first, double largest, bool gradedAtStart, bool gradedAtEnd)
    {
        first = Math.Min(first, largest);
        if (!gradedAtStart && !gradedAtEnd)
        {
            int n = Math.Max(1, (int)Math.Ceiling(length / largest * (1 - 1e-12)));
            var uniform = new double[n + 1];
            for (int k = 0; k <= n; k++)
            {
                uniform[k] = length * k / n;
            }

            return uniform;
        }

        if (gradedAtStart && gradedAtEnd)
        {
            List<double> half = Sizes(length / 2, first, largest);
            var both = new List<double>(half);
            for (int k = half.Count - 1; k >= 0; k--)
            {
                both.Add(half[k]);
            }

            return Edges(both);
        }

        List<double> sizes = Sizes(length, first, largest);
        if (gradedAtStart)
        {
            return Edges(sizes);
        }

        sizes.Reverse();
        return Edges(sizes);
    }

    /// <summary>
    /// Rectangular cells over [r0, r1] x [z0, z1], graded toward the named surfaces. The smallest cell is the surface
    /// cell (or less, so that r has at least <paramref name="minimumCells"/> cells and z two); across r no cell is longer
    /// than <see cref="MaxAspect"/> times it. Along z, where a body's current varies slowly, cells may be longer: up to
    /// a third of the inner radius for a hollow section (every cell then lies well off the axis, where neighbours'
    /// inductances take the closed-form GMD), and for a solid one up to <see cref="MaxAspect"/> times the cell at the
    /// axis and half the outer radius.
    /// </summary>
    public static List<Filament> Rectangle(double r0, double r1, double z0, double z1, double surfaceCell, bool innerSurface, bool outerSurface, bool endSurfaces, int minimumCells = MinimumCells)
    {
        double lr = r1 - r0, lz = z1 - z0;
        // At low frequency the eddy current varies across r (as r in a body), not along z: r takes the fewest cells.
        double smallest = Math.Min(surfaceCell, Math.Min(lr / minimumCells, lz / 2));
        double largestAcross = Math.Max(smallest, Math.Min(MaxAspect * smallest, lr / minimumCells));
        double[] r = Divide(lr, smallest, largestAcross, innerSurface, outerSurface);
        double first = r[1] - r[0];
        double along = r0 > 0 ? r0 / 3 : Math.Min(MaxAspect * first, 0.5 * (r1 - smallest));
        double largestAlong = Math.Max(smallest, Math.Min(Math.Max(MaxAspect * smallest, along), Math.Max(lz / minimumCells, MaxAspect * smallest)));
        double[] z = Divide(lz, smallest, largestAlong, endSurfaces, endSurfaces);
        var cells = new List<Filament>((r.Length - 1) * (z.Length - 1));
        for (int i = 0; i + 1 < r.Length; i++)
        {
            double ra = r0 + r[i], rb = r0 + r[i + 1];
            // The centroid of an annular cell weighted by area in (r, z) is its mid-radius.
            double rc = 0.5 * (ra + rb);
            for (int j = 0; j + 1 < z.Length; j++)
            {
                double za = z0 + z[j], zb = z0 + z[j + 1];
                cells.Add(new Filament(rc, 0.5 * (za + zb), rb - ra, zb - za, (rb - ra) * (zb - za)));
            }
        }

        return cells;
    }

    /// <summary>
    /// Polar cells of a disc of <paramref name="radius"/> about (<paramref name="centreR"/>, 0) in the (r, z) plane, over
    /// polar angles [<paramref name="from"/>, <paramref name="to"/>] measured from r toward z: the section of a round
    /// wire (a full turn about the wire's centre) or the meridional half-disc of a sphere (about the centre, -pi/2 to
    /// pi/2). Graded toward the circumference; each ring of cells has as many sectors as keep its cells within
    /// <see cref="MaxAspect"/>, and at least <paramref name="minimumCells"/> rings.
    /// </summary>
    public static List<Filament> Polar(double centreR, double radius, double from, double to, double surfaceCell, int minimumCells = MinimumCells)
    {
        double largest = radius / minimumCells;
        double[] rho = Divide(radius, Math.Min(surfaceCell, largest), largest, gradedAtStart: false, gradedAtEnd: true);
        var cells = new List<Filament>();
        double span = to - from;
        for (int i = 0; i + 1 < rho.Length; i++)
        {
            double ra = rho[i], rb = rho[i + 1];
            double rc = 0.5 * (ra + rb);
            double thickness = rb - ra;
            int sectors = Math.Max(span > Math.PI + 1e-9 ? 16 : 8, (int)Math.Ceiling(span * rc / (MaxAspect * thickness)));
            if (ra == 0)
            {
                // The centre: wedges meet at a point; few of them, as they carry little current.
                sectors = span > Math.PI + 1e-9 ? 4 : 2;
            }

            double dphi = span / sectors;
            double reach = Filament.Centroid(ra, rb, dphi);
            for (int k = 0; k < sectors; k++)
            {
                double phi = from + ((k + 0.5) * dphi);
                double area = 0.5 * dphi * ((rb * rb) - (ra * ra));
                double r = centreR + (reach * Math.Cos(phi)), z = reach * Math.Sin(phi);
                // The filament sits at the area centroid; its sub-points and samples map about the ring's mid-radius.
                cells.Add(new Filament(r, z, thickness, area / thickness, area, phi, 0.5 * (ra + rb), dphi));
            }
        }

        return cells;
    }

    private static List<double> Sizes(double length, double first, double largest)
    {
        var sizes = new List<double>();
        double total = 0, size = first;
        while (total < length * (1 - 1e-12))
        {
            sizes.Add(size);
            total += size;
            size = Math.Min(size * Growth, largest);
        }

        // Scale down so the cells fill the length exactly (every cell stays within its bound).
        double scale = length / total;
        for (int k = 0; k < sizes.Count; k++)
        {
            sizes[k] *= scale;
        }

        return sizes;
    }

    private static double[] Edges(List<double> sizes)
    {
        var edges = new double[sizes.Count + 1];
        for (int k = 0; k < sizes.Count; k++)
        {
            edges[k + 1] = edges[k] + sizes[k];
        }

        return edges;
    }
}
