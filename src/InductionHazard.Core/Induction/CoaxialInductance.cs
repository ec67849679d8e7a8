using System;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>Inductances of coaxial circular filaments and of the cells of a filament mesh.</summary>
public static class CoaxialInductance
{
    /// <summary>
    /// The mutual inductance of two coaxial circular filaments of radii a and b, d apart along the axis (Maxwell;
    /// Grover 1946), H: <see cref="CircularCoil.CoaxialMutualInductance"/>, its closed form or, where the closed form
    /// cancels (k^2 below 0.05), its series.
    /// </summary>
    public static double MutualHenries(double a, double b, double d) => CircularCoil.CoaxialMutualInductance(a, b, d);

    /// <summary>
    /// Rectangular cells whose centres lie further from the axis than this many times their longest side take the
    /// closed-form GMD correction; nearer the axis, sub-cells.
    /// </summary>
    private const double GmdFromRadiusOverSide = 1.5;

    /// <summary>How far past a boundary between kinds of pair a figure may lie by rounding alone, as a share of it.</summary>
    private const double BoundaryRounding = 1e-9;

    /// <summary>
    /// The mutual inductance of two cells carrying uniform current densities. Far apart (centres further than six
    /// times the larger side for rectangles off the axis, where the correction below falls under 1e-3 of the log,
    /// twice for others): the Maxwell formula at the centroids. Near: for rectangular cells well off the axis, the
    /// Maxwell formula at the centroids plus the log singularity's correction mu0 sqrt(r_p r_q) ln(d / GMD), with
    /// d the centroids' distance and the GMD of the two rectangles in closed form (<see cref="RectangleGmd"/>): the
    /// ring kernel is mu0 sqrt(ab)(ln(8 sqrt(ab)/d) - 2) plus a part smooth over the cells; otherwise the Maxwell
    /// formula averaged over near-square sub-filaments of each cell. A pair on the boundary within rounding counts as
    /// near: a mesh's evenly spaced cells sit on it (every other cell along a column), and which side of it rounding put
    /// them on made a cell's term and its mirror image's differ by up to 9 %.
    /// </summary>
    public static double MutualHenries(in Filament p, in Filament q)
    {
        double dr = p.RadiusMeters - q.RadiusMeters, dz = p.AxialMeters - q.AxialMeters;
        double side = Math.Max(p.LargestSideMeters, q.LargestSideMeters);
        double distanceSquared = (dr * dr) + (dz * dz);
        bool rectangles = OffAxisRectangle(p, q.LargestSideMeters) && OffAxisRectangle(q, p.LargestSideMeters);
        if (distanceSquared > (rectangles ? 36 : 4) * side * side * (1 + BoundaryRounding))
        {
            return MutualHenries(p.RadiusMeters, q.RadiusMeters, dz);
        }

        if (rectangles)
        {
            double logGmd = RectangleGmd.LogGmd(
                p.RadiusMeters - (p.WidthMeters / 2), p.RadiusMeters + (p.WidthMeters / 2), p.AxialMeters - (p.HeightMeters / 2), p.AxialMeters + (p.HeightMeters / 2),
                q.RadiusMeters - (q.WidthMeters / 2), q.RadiusMeters + (q.WidthMeters / 2), q.AxialMeters - (q.HeightMeters / 2), q.AxialMeters + (q.HeightMeters / 2));
            double d = Math.Sqrt((dr * dr) + (dz * dz));
            return MutualHenries(p.RadiusMeters, q.RadiusMeters, dz) + (PhysicalConstants.VacuumPermeability * Math.Sqrt(p.RadiusMeters * q.RadiusMeters) * (Math.Log(d) - logGmd));
        }

        if (AlongOneSpacing(p, q) is { } spacing)
        {
            return AveragedAlongRows(p, q, spacing);
        }

        SubCell[] a = SubCells(p), b = SubCells(q);
        double sum = 0;
        for (int i = 0; i < a.Length; i++)
        {
            for (int j = 0; j < b.Length; j++)
            {
                sum += MutualHenries(a[i].R, b[j].R, a[i].Z - b[j].Z);
            }
        }

        return sum / (a.Length * b.Length);
    }

    /// <summary>
    /// The axial spacing of two rectangular cells' sub-filaments when it is the same for both (to 1e-12 of it): cells of
    /// one row of a mesh, or of rows of one height; null otherwise.
    /// </summary>
    private static double? AlongOneSpacing(in Filament p, in Filament q)
    {
        if (p.SectorRadians != 0 || p.AngleRadians != 0 || q.SectorRadians != 0 || q.AngleRadians != 0)
        {
            return null;
        }

        double sp = p.HeightMeters / SubCellCounts(p).Along, sq = q.HeightMeters / SubCellCounts(q).Along;
        return Math.Abs(sp - sq) <= 1e-12 * Math.Max(sp, sq) ? sp : null;
    }

    /// <summary>
    /// The average over two rectangular cells' sub-filaments (<see cref="SubCells"/>) where both are spaced s apart along
    /// the axis: the axial distances between them are the centres' distance plus (k + (v_q - v_p) / 2) s for
    /// k = b - d, each taken as many times as pairs (b, d) give it, so that a pair of columns of v_p and v_q sub-filaments
    /// takes v_p + v_q - 1 terms instead of v_p v_q (the same sum, in another order).
    /// </summary>
    private static double AveragedAlongRows(in Filament p, in Filament q, double spacing)
    {
        (double[] rp, int vp) = RadiiAcross(p);
        (double[] rq, int vq) = RadiiAcross(q);
        double centres = p.AxialMeters - q.AxialMeters, shift = 0.5 * (vq - vp);
        double sum = 0;
        for (int k = 1 - vq; k < vp; k++)
        {
            int count = Math.Min(vp, vq + k) - Math.Max(0, k);
            double dz = centres + ((k + shift) * spacing);
            double row = 0;
            foreach (double a in rp)
            {
                foreach (double b in rq)
                {
                    row += MutualHenries(a, b, dz);
                }
            }

            sum += count * row;
        }

        return sum / (rp.Length * vp * rq.Length * vq);
    }

    /// <summary>The radii of a rectangular cell's columns of sub-filaments (<see cref="SubCells"/>), and how many lie along each.</summary>
    private static (double[] Radii, int Along) RadiiAcross(in Filament f)
    {
        (int u, int v) = SubCellCounts(f);
        SubCell[] subs = SubCells(f);
        var radii = new double[u];
        for (int i = 0; i < u; i++)
        {
            radii[i] = subs[i * v].R;
        }

        return (radii, v);
    }

    /// <summary>How many near-square sub-cells a cell is split into across and along it: two across its shorter side.</summary>
    private static (int Across, int Along) SubCellCounts(in Filament f)
    {
        double shorter = Math.Min(f.WidthMeters, f.HeightMeters);
        return (Math.Max(2, (int)Math.Round(2 * f.WidthMeters / shorter)), Math.Max(2, (int)Math.Round(2 * f.HeightMeters / shorter)));
    }

    /// <summary>
    /// The self-inductance of a cell carrying a uniform current density, on the same model as its mutual terms (so
    /// that the matrix is consistent): off the axis, Grover's ring formula mu0 r (ln(8r/g) - 2) with the rectangle's
    /// exact GMD g; near the axis or for a polar cell, each near-square sub-cell's own ring inductance (Grover, with its
    /// GMD) plus the Maxwell mutual terms between sub-cells, weighted by the square of the current each carries.
    /// </summary>
    public static double SelfHenries(in Filament p)
    {
        if (OffAxisRectangle(p, 0))
        {
            // Grover's ring formula with the rectangle's exact GMD from itself (the same closed form as its neighbours').
            double logGmd = RectangleGmd.LogGmd(0, p.WidthMeters, 0, p.HeightMeters, 0, p.WidthMeters, 0, p.HeightMeters);
            return PhysicalConstants.VacuumPermeability * p.RadiusMeters * (Math.Log(8 * p.RadiusMeters) - logGmd - 2);
        }

        SubCell[] subs = SubCells(p);
        double sum = 0;
        for (int a = 0; a < subs.Length; a++)
        {
            // A sub-cell at the axis (r below its own GMD) has no ring inductance to speak of; it carries almost no current.
            sum += Math.Max(RingInductance.UniformCurrentHenries(subs[a].R, subs[a].Gmd), 0);
            for (int b = a + 1; b < subs.Length; b++)
            {
                sum += 2 * MutualHenries(subs[a].R, subs[b].R, subs[a].Z - subs[b].Z);
            }
        }

        return sum / (subs.Length * subs.Length);
    }

    /// <summary>A rectangular (not polar) cell whose centre is further from the axis than 1.5 times its own and its neighbour's longest side (beyond rounding).</summary>
    private static bool OffAxisRectangle(in Filament f, double neighbourSide) =>
        f.SectorRadians == 0 && f.AngleRadians == 0 && f.RadiusMeters > GmdFromRadiusOverSide * Math.Max(f.LargestSideMeters, neighbourSide) * (1 + BoundaryRounding);

    /// <summary>A cell split into near-square sub-cells (two across its shorter side), each at its centre.</summary>
    private static SubCell[] SubCells(in Filament f)
    {
        (int u, int v) = SubCellCounts(f);
        double gmd = RectangularBand.GmdFactor * ((f.WidthMeters / u) + (f.HeightMeters / v));
        var subs = new SubCell[u * v];
        for (int i = 0; i < u; i++)
        {
            for (int j = 0; j < v; j++)
            {
                (double r, double z) = f.PointAt(((i + 0.5) / u) - 0.5, ((j + 0.5) / v) - 0.5);
                // A polar cell drawn as a rectangle can reach past the axis near it: keep its points on the near side.
                subs[(i * v) + j] = new SubCell(Math.Max(r, 0.5 * gmd), z, gmd);
            }
        }

        return subs;
    }

    private readonly record struct SubCell(double R, double Z, double Gmd);
}
