using System;

namespace InductionHazard.Items;

/// <summary>
/// One coaxial current path of an item: a circular filament through the centroid of a cell of the item's
/// meridional (r, z) section, the cell carrying a uniform current density around the axis. A cell is a rectangle
/// in the (r, z) plane whose first side makes <see cref="AngleRadians"/> with the r direction (0 for the cells of a
/// band or a disc; the radial direction of a polar cell of a round wire or a sphere).
/// </summary>
/// <param name="RadiusMeters">The filament's radius r (the cell centroid's distance from the axis), m.</param>
/// <param name="AxialMeters">The filament's position z along the axis, from the item's centre, m.</param>
/// <param name="WidthMeters">The cell's first side, m.</param>
/// <param name="HeightMeters">The cell's second side, m.</param>
/// <param name="AreaSquareMeters">The cell's area in the (r, z) plane, m^2: the path's conducting section.</param>
/// <param name="AngleRadians">The direction of the first side in the (r, z) plane, from r toward z.</param>
/// <param name="PolarRadiusMeters">For a polar cell, the mid-radius of its ring about the polar centre; 0 for a rectangle.</param>
/// <param name="SectorRadians">For a polar cell, the angle it spans; 0 for a rectangle.</param>
public readonly record struct Filament(double RadiusMeters, double AxialMeters, double WidthMeters, double HeightMeters, double AreaSquareMeters, double AngleRadians = 0, double PolarRadiusMeters = 0, double SectorRadians = 0)
{
    private static readonly double GaussPoint = 0.5 / Math.Sqrt(3);

    /// <summary>The cell's geometric mean distance from itself, about 0.2235 (w + h) for a rectangle (Grover 1946), m.</summary>
    public double GmdMeters => RectangularBand.GmdFactor * (WidthMeters + HeightMeters);

    /// <summary>The length of the path, 2 pi r, m.</summary>
    public double PathLengthMeters => 2 * Math.PI * RadiusMeters;

    /// <summary>The larger side of the cell, m.</summary>
    public double LargestSideMeters => Math.Max(WidthMeters, HeightMeters);

    /// <summary>
    /// The (r, z) point at fractions (u, v) in [-1/2, 1/2] of the cell's two sides from its centroid: the sub-filaments
    /// that mutual inductances between neighbouring cells are averaged over.
    /// </summary>
    public (double R, double Z) PointAt(double u, double v)
    {
        if (SectorRadians > 0)
        {
            // A polar cell: u across its ring, v around it, about the polar centre.
            double reach = Centroid(PolarRadiusMeters - (WidthMeters / 2), PolarRadiusMeters + (WidthMeters / 2), SectorRadians);
            double centreR = RadiusMeters - (reach * Math.Cos(AngleRadians)), centreZ = AxialMeters - (reach * Math.Sin(AngleRadians));
            double rho = PolarRadiusMeters + (u * WidthMeters), phi = AngleRadians + (v * SectorRadians);
            return (centreR + (rho * Math.Cos(phi)), centreZ + (rho * Math.Sin(phi)));
        }

        double c = Math.Cos(AngleRadians), s = Math.Sin(AngleRadians);
        double a = u * WidthMeters, b = v * HeightMeters;
        return (RadiusMeters + (a * c) - (b * s), AxialMeters + (a * s) + (b * c));
    }

    /// <summary>The distance of an annular sector's area centroid from its centre: (2/3)(b^3 - a^3)/(b^2 - a^2) sin(s/2)/(s/2).</summary>
    public static double Centroid(double inner, double outer, double sectorRadians) =>
        2.0 / 3 * ((outer * outer * outer) - (inner * inner * inner)) / ((outer * outer) - (inner * inner)) * Math.Sin(sectorRadians / 2) / (sectorRadians / 2);

    /// <summary>
    /// Four Gauss-Legendre points of the cell with weights summing to 1 (area-weighted for a polar cell): an
    /// average over the cell exact for quadratics in r and z.
    /// </summary>
    public (double R, double Z, double Weight)[] GaussSamples()
    {
        var samples = new (double R, double Z, double Weight)[4];
        double total = 0;
        int k = 0;
        foreach (double u in new[] { -GaussPoint, GaussPoint })
        {
            foreach (double v in new[] { -GaussPoint, GaussPoint })
            {
                (double r, double z) = PointAt(u, v);
                double w = SectorRadians > 0 ? PolarRadiusMeters + (u * WidthMeters) : 1;
                samples[k++] = (r, z, w);
                total += w;
            }
        }

        for (k = 0; k < 4; k++)
        {
            samples[k].Weight /= total;
        }

        return samples;
    }
}
