using System;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>Inductances of coaxial circular filaments and of the cells of a filament mesh.</summary>
public static class CoaxialInductance
{
    /// <summary>Below this modulus k the series replaces the elliptic form, whose terms cancel there.</summary>
    private const double SeriesBelowK = 0.05;

    /// <summary>
    /// The mutual inductance of two coaxial circular filaments of radii a and b, d apart along the axis (Maxwell;
    /// Grover 1946): M = mu0 sqrt(ab) [(2/k - k) K(k) - (2/k) E(k)], k^2 = 4ab / ((a + b)^2 + d^2), H. For small k the
    /// series mu0 sqrt(ab) pi k^3 / 16 (1 + 3k^2/4 + 75k^4/128), which the elliptic form loses to cancellation.
    /// </summary>
    public static double MutualHenries(double a, double b, double d)
    {
        double m = 4 * a * b / (((a + b) * (a + b)) + (d * d));
        double k = Math.Sqrt(m);
        double scale = PhysicalConstants.VacuumPermeability * Math.Sqrt(a * b);
        if (k < SeriesBelowK)
        {
            return scale * Math.PI * k * m / 16 * (1 + (0.75 * m) + (75.0 / 128 * m * m));
        }

        (double kk, double ee) = EllipticIntegrals.Both(Math.Min(m, 1 - 1e-16));
        return scale * ((((2 / k) - k) * kk) - (2 / k * ee));
    }

    /// <summary>
    /// The mutual inductance of two cells carrying uniform current densities: the Maxwell formula averaged over the
    /// near-square sub-filaments of each cell when the cells are near (centres closer than twice the larger side),
    /// where a filament at each centroid would misplace the current; at the centroids otherwise.
    /// </summary>
    public static double MutualHenries(in Filament p, in Filament q)
    {
        double dr = p.RadiusMeters - q.RadiusMeters, dz = p.AxialMeters - q.AxialMeters;
        double near = 2 * Math.Max(p.LargestSideMeters, q.LargestSideMeters);
        if ((dr * dr) + (dz * dz) > near * near)
        {
            return MutualHenries(p.RadiusMeters, q.RadiusMeters, dz);
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
    /// The self-inductance of a cell carrying a uniform current density, on the same sub-filaments as its mutual
    /// terms (so that the matrix is built from one consistent model): each near-square sub-cell's own ring inductance
    /// by Grover's formula mu0 r (ln(8r/g) - 2) with its GMD, plus the Maxwell mutual terms between sub-cells, weighted
    /// by the square of the current each carries.
    /// </summary>
    public static double SelfHenries(in Filament p)
    {
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

    /// <summary>A cell split into near-square sub-cells (two across its shorter side), each at its centre.</summary>
    private static SubCell[] SubCells(in Filament f)
    {
        double shorter = Math.Min(f.WidthMeters, f.HeightMeters);
        int u = Math.Max(2, (int)Math.Round(2 * f.WidthMeters / shorter));
        int v = Math.Max(2, (int)Math.Round(2 * f.HeightMeters / shorter));
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
