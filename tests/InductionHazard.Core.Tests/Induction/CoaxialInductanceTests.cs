using System;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>The mutual inductance of two neighbouring cells near the axis, averaged over their sub-filaments.</summary>
public class CoaxialInductanceTests
{
    [Fact]
    public void CellsSpacedAlikeAlongTheAxisAverageAsEveryPairOfSubFilaments()
    {
        // Cells whose sub-filaments are spaced alike along the axis (a row of a mesh, or rows of one height) sum their
        // pairs by axial distance, each distance once with its count; against every pair of sub-filaments summed one by
        // one, placed here as the model places them (two across a cell's shorter side, at the centres of near-square
        // sub-cells), on random pairs of neighbouring cells near the axis.
        var random = new Random(20261203);
        int compared = 0;
        for (int trial = 0; trial < 800; trial++)
        {
            // p two sub-filaments across (width 2 s) and n along; q the same shape with m along, or wider than tall
            // (height 2 s, m across): both spaced s along the axis. Every fifth q spaced otherwise (the plain sum).
            double s = 1e-4 * (1 + (4 * random.NextDouble()));
            int n = 2 + random.Next(12), m = 2 + random.Next(12);
            Filament p = Cell(s * (1 + (10 * random.NextDouble())), 0, 2 * s, n * s);
            double qs = trial % 5 == 0 ? s * 1.37 : s;
            (double width, double height) = trial % 2 == 0 ? (2 * qs, m * qs) : (m * qs, 2 * qs);
            Filament q = Cell(p.RadiusMeters + ((random.NextDouble() - 0.5) * 6 * s), (random.NextDouble() - 0.5) * 2 * (n + m) * s, width, height);
            double side = Math.Max(p.LargestSideMeters, q.LargestSideMeters);
            double dr = p.RadiusMeters - q.RadiusMeters, dz = p.AxialMeters - q.AxialMeters;
            bool offAxis = p.RadiusMeters > 1.5 * side && q.RadiusMeters > 1.5 * side;
            if (q.RadiusMeters <= 0 || offAxis || (dr * dr) + (dz * dz) > 4 * side * side)
            {
                // Not a pair the sub-filaments average: off the axis (the closed-form GMD), or apart (the centroids).
                continue;
            }

            Within.Relative(EveryPair(p, q), CoaxialInductance.MutualHenries(p, q), 1e-12, "trial " + trial + ": cells " + p + " and " + q);
            compared++;
        }

        Assert.True(compared > 600, compared + " pairs compared");
    }

    private static Filament Cell(double radius, double axial, double width, double height) => new(radius, axial, width, height, width * height);

    private static double EveryPair(Filament p, Filament q)
    {
        (double R, double Z)[] a = Points(p), b = Points(q);
        double sum = 0;
        foreach ((double ra, double za) in a)
        {
            foreach ((double rb, double zb) in b)
            {
                sum += CircularCoil.CoaxialMutualInductance(ra, rb, za - zb);
            }
        }

        return sum / (a.Length * b.Length);
    }

    /// <summary>Sub-filaments at the centres of near-square sub-cells, two across the shorter side, kept off the axis by half their GMD.</summary>
    private static (double R, double Z)[] Points(Filament f)
    {
        double shorter = Math.Min(f.WidthMeters, f.HeightMeters);
        int u = Math.Max(2, (int)Math.Round(2 * f.WidthMeters / shorter)), v = Math.Max(2, (int)Math.Round(2 * f.HeightMeters / shorter));
        double gmd = RectangularBand.GmdFactor * ((f.WidthMeters / u) + (f.HeightMeters / v));
        var points = new (double R, double Z)[u * v];
        for (int i = 0; i < u; i++)
        {
            for (int j = 0; j < v; j++)
            {
                points[(i * v) + j] = (Math.Max(f.RadiusMeters + ((((i + 0.5) / u) - 0.5) * f.WidthMeters), 0.5 * gmd), f.AxialMeters + ((((j + 0.5) / v) - 0.5) * f.HeightMeters));
            }
        }

        return points;
    }
}
