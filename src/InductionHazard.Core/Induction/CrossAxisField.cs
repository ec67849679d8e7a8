using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using MathNet.Numerics.LinearAlgebra;

namespace InductionHazard.Induction;

/// <summary>
/// The field across a body's axis, for the heating by the eddy currents it drives, which the coaxial paths do not
/// carry. That heating is sigma I_1 I_2 / (I_1 + I_2) times the mean square of the rate of the field across the axis
/// over the body's volume: for a uniform field its value anywhere, and where the field varies along a long body the
/// sum of each slice's loss by its own field (a slice of a long body loses in proportion to the square of the field
/// it is in). The mean square of the sum of the terms is u^T G u, G_jk the mean over the volume of b_j . b_k (b_j the
/// field across the axis per unit drive of term j); G is returned factored, as a vector per term whose sum weighted
/// by the drives has G's square length.
/// </summary>
internal static class CrossAxisField
{
    /// <summary>The most the mean square may move between the quadrature and one twice as fine, relative.</summary>
    private const double Agreement = 0.02;

    /// <summary>The vector of each term: |sum_j u_j v_j|^2 is the mean square over the body of the field rate across its axis.</summary>
    /// <param name="source">The source.</param>
    /// <param name="centre">The body's centre, m.</param>
    /// <param name="axis">The body's unit axis (the placement's normal).</param>
    /// <param name="width">For a plate or a bar, the direction of its width; null for the usual one.</param>
    /// <param name="body">The body.</param>
    /// <exception cref="FieldEvaluationException">The field cannot be evaluated in the body, or varies too sharply across it for its mean square to be found.</exception>
    public static double[][] Couplings(FieldSource source, Vector3D centre, Vector3D axis, Vector3D? width, BodyGeometry body)
    {
        Vector3D u = RectangularLoopGeometry.WidthDirection(axis, width);
        Vector3D v = axis.Cross(u);
        double[,] coarse = Gram(source, centre, axis, u, v, body, 2);
        double[,] fine = Gram(source, centre, axis, u, v, body, 4);
        double traceCoarse = 0, traceFine = 0;
        for (int j = 0; j < fine.GetLength(0); j++)
        {
            traceCoarse += coarse[j, j];
            traceFine += fine[j, j];
        }

        if (!Finite.Is(traceFine) || !(Math.Abs(traceFine - traceCoarse) <= Agreement * traceFine))
        {
            throw new FieldEvaluationException(
                "the field across the body's axis varies too sharply through the body (a conductor of the source is too close to it) for the heating it drives to be found: "
                + "its mean square moved by " + SiFormat.Plain(Math.Abs(traceFine - traceCoarse) / traceFine * 100) + " % between quadratures, more than " + SiFormat.Plain(Agreement * 100) + " %");
        }

        return Factored(fine);
    }

    /// <summary>
    /// How much the field varies through the body: the root mean square over its volume of the field less the field at
    /// its centre, relative to the field at its centre (per unit drive, summed over the terms); 0 in a uniform field,
    /// NaN where the field cannot be evaluated.
    /// </summary>
    public static double Variation(FieldSource source, Vector3D centre, Vector3D axis, BodyGeometry body)
    {
        try
        {
            Vector3D u = RectangularLoopGeometry.WidthDirection(axis, null);
            Vector3D v = axis.Cross(u);
            Vector3D[] atCentre = source.FieldPerUnitDrive(centre);
            double deviation = 0, reference = 0;
            foreach (Vector3D b in atCentre)
            {
                reference += b.Dot(b);
            }

            foreach ((double x, double y, double z, double weight, _) in Points(body, 2))
            {
                Vector3D[] b = source.FieldPerUnitDrive(centre + (x * u) + (y * v) + (z * axis));
                for (int j = 0; j < b.Length; j++)
                {
                    Vector3D d = b[j] - atCentre[j];
                    deviation += weight * d.Dot(d);
                }
            }

            return Math.Sqrt(deviation / reference);
        }
        catch (FieldEvaluationException)
        {
            return double.NaN;
        }
    }

    /// <summary>
    /// The two parts of a low-frequency model of how a body's heating turns with it, for a search over its orientations
    /// (<see cref="Assessment.InductionEngine"/>): with its axis along <paramref name="axis"/>, the square of the field
    /// along the axis meaned over each slice across it (what the flux through the slice drives round the axis), meaned
    /// over the slices; and the mean square over the volume of the field across the axis (what drives currents along
    /// the body and back). The field is the sum of the terms' fields per unit drive, each weighted as given (a sine's by
    /// its phasor). Coarser than the heating's own quadrature (a search compares orientations; the one it finds is then
    /// solved in full). NaN where the field cannot be evaluated.
    /// </summary>
    public static (double Along, double Across) Parts(FieldSource source, Vector3D centre, Vector3D axis, BodyGeometry body, System.Numerics.Complex[] weights)
    {
        Vector3D u = RectangularLoopGeometry.WidthDirection(axis, null);
        Vector3D v = axis.Cross(u);
        const int Refinement = 1;
        var sliceWeight = new double[4 * Refinement];
        var sliceReal = new double[sliceWeight.Length];
        var sliceImaginary = new double[sliceWeight.Length];
        double across = 0;
        try
        {
            foreach ((double x, double y, double z, double weight, int slice) in Points(body, Refinement))
            {
                Vector3D[] b = source.FieldPerUnitDrive(centre + (x * u) + (y * v) + (z * axis));
                Vector3D real = Vector3D.Zero, imaginary = Vector3D.Zero;
                for (int j = 0; j < b.Length; j++)
                {
                    real += weights[j].Real * b[j];
                    imaginary += weights[j].Imaginary * b[j];
                }

                double realAlong = real.Dot(axis), imaginaryAlong = imaginary.Dot(axis);
                sliceWeight[slice] += weight;
                sliceReal[slice] += weight * realAlong;
                sliceImaginary[slice] += weight * imaginaryAlong;
                across += weight * (real.Dot(real) - (realAlong * realAlong) + imaginary.Dot(imaginary) - (imaginaryAlong * imaginaryAlong));
            }
        }
        catch (FieldEvaluationException)
        {
            return (double.NaN, double.NaN);
        }

        double along = 0;
        for (int s = 0; s < sliceWeight.Length; s++)
        {
            if (sliceWeight[s] > 0)
            {
                along += ((sliceReal[s] * sliceReal[s]) + (sliceImaginary[s] * sliceImaginary[s])) / sliceWeight[s];
            }
        }

        return (along, across);
    }

    /// <summary>
    /// How far the field within a body's reach stands above its level there: the largest size over a sphere of radius
    /// <paramref name="reach"/> about the centre (where the body, turned, can reach) over the rms size on it, of the sum
    /// of the terms' fields per unit drive, each weighted as given. 1 in a uniform field; large where a conductor of the
    /// source passes within reach. Infinite where the field cannot be evaluated on the sphere, NaN where it is not
    /// finite. The rms is over 200 points spread evenly over the sphere (a Fibonacci lattice); the largest is theirs,
    /// refined about the largest by steps over the sphere that halve from 0.2 rad to 0.0125 rad.
    /// </summary>
    public static double ReachRatio(FieldSource source, Vector3D centre, double reach, System.Numerics.Complex[] weights)
    {
        const int Count = 200;
        double squares = 0;
        (Vector3D direction, double size) largest = (Vector3D.UnitZ, 0);
        double SizeAt(Vector3D direction)
        {
            Vector3D[] b = source.FieldPerUnitDrive(centre + (reach * direction));
            Vector3D real = Vector3D.Zero, imaginary = Vector3D.Zero;
            for (int j = 0; j < b.Length; j++)
            {
                real += weights[j].Real * b[j];
                imaginary += weights[j].Imaginary * b[j];
            }

            return real.Dot(real) + imaginary.Dot(imaginary);
        }

        try
        {
            foreach (Vector3D direction in SphereSearch.Spread(Count, half: false))
            {
                double size = SizeAt(direction);
                if (double.IsNaN(size))
                {
                    return double.NaN;
                }

                squares += size;
                largest = size > largest.size ? (direction, size) : largest;
            }

            largest = SphereSearch.Climb(SizeAt, largest.direction, largest.size);
        }
        catch (FieldEvaluationException)
        {
            return double.PositiveInfinity;
        }

        return squares > 0 ? Math.Sqrt(largest.size / (squares / Count)) : 1;
    }

    /// <summary>G_jk: the mean over the body's volume of b_j . b_k, b_j the field across the axis per unit drive of term j.</summary>
    private static double[,] Gram(FieldSource source, Vector3D centre, Vector3D axis, Vector3D u, Vector3D v, BodyGeometry body, int refinement)
    {
        int terms = source.Terms.Count;
        var gram = new double[terms, terms];
        var across = new Vector3D[terms];
        foreach ((double x, double y, double z, double weight, _) in Points(body, refinement))
        {
            Vector3D[] b = source.FieldPerUnitDrive(centre + (x * u) + (y * v) + (z * axis));
            for (int j = 0; j < terms; j++)
            {
                across[j] = b[j] - (b[j].Dot(axis) * axis);
            }

            for (int j = 0; j < terms; j++)
            {
                for (int k = 0; k <= j; k++)
                {
                    gram[j, k] += weight * across[j].Dot(across[k]);
                }
            }
        }

        for (int j = 0; j < terms; j++)
        {
            for (int k = 0; k < j; k++)
            {
                gram[k, j] = gram[j, k];
            }
        }

        return gram;
    }

    /// <summary>Vectors v_j with v_j . v_k = G_jk: from G's eigenvectors, each scaled by the root of its eigenvalue (a negative one, rounding's, as zero).</summary>
    private static double[][] Factored(double[,] gram)
    {
        int terms = gram.GetLength(0);
        var vectors = new double[terms][];
        if (terms == 1)
        {
            vectors[0] = new[] { Math.Sqrt(Math.Max(0, gram[0, 0])) };
            return vectors;
        }

        var evd = Matrix<double>.Build.DenseOfArray(gram).Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric);
        for (int j = 0; j < terms; j++)
        {
            vectors[j] = new double[terms];
            for (int m = 0; m < terms; m++)
            {
                vectors[j][m] = Math.Sqrt(Math.Max(0, evd.EigenValues[m].Real)) * evd.EigenVectors[j, m];
            }
        }

        return vectors;
    }

    /// <summary>
    /// Quadrature points over the body's volume in its frame (x along the width direction, y across both, z along the
    /// axis), with weights summing to 1: Gauss-Legendre in the square of the radius (the volume's own measure), equal
    /// steps round the axis and Gauss-Legendre along it for a body of revolution; Gauss-Legendre in the cube of the
    /// radius and the cosine of the polar angle for a sphere; Gauss-Legendre along each side for a plate or a bar.
    /// A tube's closed ends are left out (its wall holds nearly all of it). Each point says which slice across the axis
    /// it lies in (its node along the axis; for a sphere, its polar node), numbered from 0 to fewer than 4 times the refinement.
    /// </summary>
    private static IEnumerable<(double X, double Y, double Z, double Weight, int Slice)> Points(BodyGeometry body, int refinement)
    {
        switch (body)
        {
            case PrismBody prism:
            {
                GaussLegendre.Rule a = GaussLegendre.Of(3 * refinement), c = GaussLegendre.Of(2 * refinement);
                for (int i = 0; i < a.Nodes.Length; i++)
                    for (int j = 0; j < a.Nodes.Length; j++)
                        for (int k = 0; k < c.Nodes.Length; k++)
                        {
                            yield return (0.5 * prism.WidthMeters * a.Nodes[i], 0.5 * prism.HeightMeters * a.Nodes[j], 0.5 * prism.DepthMeters * c.Nodes[k], a.Weights[i] * a.Weights[j] * c.Weights[k] / 8, k);
                        }

                yield break;
            }

            case SphereBody sphere:
            {
                GaussLegendre.Rule radial = GaussLegendre.Of(2 * refinement), polar = GaussLegendre.Of(3 * refinement);
                int round = 6 * refinement;
                double r = sphere.OuterRadiusMeters;
                for (int i = 0; i < radial.Nodes.Length; i++)
                {
                    double radius = r * Math.Pow(0.5 * (1 + radial.Nodes[i]), 1.0 / 3);
                    for (int j = 0; j < polar.Nodes.Length; j++)
                    {
                        double cos = polar.Nodes[j], sin = Math.Sqrt(1 - (cos * cos));
                        for (int k = 0; k < round; k++)
                        {
                            double phi = 2 * Math.PI * (k + 0.5) / round;
                            yield return (radius * sin * Math.Cos(phi), radius * sin * Math.Sin(phi), radius * cos, radial.Weights[i] * polar.Weights[j] / 4 / round, j);
                        }
                    }
                }

                yield break;
            }

            default:
            {
                (double inner, double length) = body switch
                {
                    TubeBody tube => (tube.InnerRadiusMeters, tube.LengthMeters),
                    CylinderBody cylinder => (0.0, cylinder.LengthMeters),
                    _ => throw new ArgumentException("no quadrature for " + body.GetType().Name, nameof(body)),
                };
                GaussLegendre.Rule radial = GaussLegendre.Of(2 * refinement), along = GaussLegendre.Of(4 * refinement);
                int round = 6 * refinement;
                double outer2 = body.OuterRadiusMeters * body.OuterRadiusMeters, inner2 = inner * inner;
                for (int i = 0; i < radial.Nodes.Length; i++)
                {
                    double radius = Math.Sqrt(inner2 + ((outer2 - inner2) * 0.5 * (1 + radial.Nodes[i])));
                    for (int k = 0; k < round; k++)
                    {
                        double phi = 2 * Math.PI * (k + 0.5) / round;
                        for (int j = 0; j < along.Nodes.Length; j++)
                        {
                            yield return (radius * Math.Cos(phi), radius * Math.Sin(phi), 0.5 * length * along.Nodes[j], radial.Weights[i] * along.Weights[j] / 4 / round, j);
                        }
                    }
                }

                yield break;
            }
        }
    }
}
