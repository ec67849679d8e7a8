using System;
using InductionHazard.Items;

namespace InductionHazard.Mechanics;

/// <summary>
/// Demagnetising factors of the ellipsoids that stand for the item's shapes (Osborn, Phys. Rev. 67:351, 1945; the
/// spheroid formulas, from memory). The magnetisation model takes the smallest factor over orientations: the
/// direction in which the item magnetises most, the worst case for its pull.
/// </summary>
public static class Demagnetisation
{
    /// <summary>
    /// The factor along the symmetry axis of a spheroid whose length along the axis over its diameter across it is m:
    /// prolate (m &gt; 1) N = (m / sqrt(m^2 - 1) ln(m + sqrt(m^2 - 1)) - 1) / (m^2 - 1); oblate (m &lt; 1)
    /// N = (1 - m / sqrt(1 - m^2) arccos m) / (1 - m^2); a sphere 1/3. Across the axis, (1 - N) / 2.
    /// </summary>
    public static double SpheroidAxial(double m)
    {
        if (Math.Abs(m - 1) < 1e-6)
        {
            return 1.0 / 3;
        }

        if (m > 1)
        {
            double root = Math.Sqrt((m * m) - 1);
            return ((m / root * Math.Log(m + root)) - 1) / ((m * m) - 1);
        }

        double r = Math.Sqrt(1 - (m * m));
        return (1 - (m / r * Math.Acos(m))) / (1 - (m * m));
    }

    /// <summary>A block as the spheroid of its longest side over the geometric mean of the other two.</summary>
    private static double Elongation(double a, double b, double c)
    {
        double longest = Math.Max(a, Math.Max(b, c));
        return longest / Math.Sqrt(a * b * c / longest);
    }

    /// <summary>
    /// The smallest demagnetising factor of an item over orientations. A sphere: 1/3. A disc or cylinder: the spheroid
    /// of its length over its diameter (along the axis when longer than wide, across it when flatter). A tube: its
    /// outer cylinder. A ring or loop: its wire or band as a rod as long as the path (nearly 0: it magnetises easily
    /// along itself).
    /// </summary>
    public static double Smallest(LoopGeometry geometry)
    {
        double aspect = geometry switch
        {
            SphereBody => 1,
            CylinderBody c => c.LengthMeters / (2 * c.OuterRadiusMeters),
            TubeBody t => t.LengthMeters / (2 * t.OuterRadiusMeters),
            PrismBody p => Elongation(p.WidthMeters, p.HeightMeters, p.DepthMeters),
            _ => geometry.PathLengthMeters / geometry.Section.LargestDimensionMeters,
        };
        double axial = SpheroidAxial(aspect);
        return Math.Min(axial, (1 - axial) / 2);
    }
}
