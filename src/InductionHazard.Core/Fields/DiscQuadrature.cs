using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Fields;

/// <summary>
/// The flux of a field through a flat disc, integral of b . n dA, by Gauss-Legendre quadrature in the radius and
/// the trapezoid rule in the angle (spectrally accurate for a periodic integrand). The order doubles until two
/// successive orders agree to within a fraction of the integral of |b| over the disc (so a flux that cancels to
/// nearly zero converges too); a disc too close to a conductor for that to happen is refused, not given a number.
/// </summary>
public static class DiscQuadrature
{
    /// <summary>The relative agreement of successive orders taken as converged.</summary>
    public const double Tolerance = 1e-7;

    private const int FirstOrder = 4;
    private const int LastOrder = 128;

    /// <summary>Two unit vectors perpendicular to n and to each other (u, v, n right-handed).</summary>
    public static (Vector3D U, Vector3D V) Basis(Vector3D n)
    {
        Vector3D helper = Math.Abs(n.X) < 0.9 ? Vector3D.UnitX : Vector3D.UnitY;
        Vector3D u = helper.Cross(n).Normalized();
        return (u, n.Cross(u));
    }

    /// <summary>The flux through the disc, converged in the quadrature order.</summary>
    /// <exception cref="FieldEvaluationException">The quadrature does not converge (the disc is too close to a conductor), or the field cannot be evaluated on it.</exception>
    public static double Flux(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double radius)
    {
        (double previous, _) = Integrate(field, centre, normal, radius, FirstOrder);
        for (int order = 2 * FirstOrder; order <= LastOrder; order *= 2)
        {
            (double next, double magnitude) = Integrate(field, centre, normal, radius, order);
            if (Math.Abs(next - previous) <= Tolerance * magnitude || magnitude == 0)
            {
                return next;
            }

            previous = next;
        }

        throw new FieldEvaluationException(
            "the flux through the loop (radius " + SiFormat.Format(radius, "m") + ") does not converge: the loop is too close to a conductor of the source for the field over it to be integrated");
    }

    /// <summary>
    /// The fluxes through coaxial discs of one plane (one centre and normal, several radii), each converged as
    /// <see cref="Flux(Func{Vector3D, Vector3D}, Vector3D, Vector3D, double)"/> converges one: the innermost disc, then
    /// each annulus between successive radii, summed outward. The field is integrated over the plane once instead of
    /// once per disc, which is what a body's filaments (dozens of radii per plane) need.
    /// </summary>
    /// <param name="field">The field.</param>
    /// <param name="centre">The discs' common centre.</param>
    /// <param name="normal">Their common normal.</param>
    /// <param name="radii">The radii, m, in any order (0 gives 0).</param>
    /// <returns>The flux through each disc, in the order of <paramref name="radii"/>.</returns>
    /// <exception cref="FieldEvaluationException">An annulus does not converge (a conductor of the source is too near), or the field cannot be evaluated on it.</exception>
    public static double[] NestedFluxes(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, IReadOnlyList<double> radii)
    {
        double[] sorted = radii.Where(r => r > 0).Distinct().OrderBy(r => r).ToArray();
        var cumulative = new Dictionary<double, double> { [0.0] = 0.0 };
        double inner = 0, total = 0;
        foreach (double outer in sorted)
        {
            total += Annulus(field, centre, normal, inner, outer);
            cumulative[outer] = total;
            inner = outer;
        }

        var fluxes = new double[radii.Count];
        for (int k = 0; k < radii.Count; k++)
        {
            fluxes[k] = radii[k] > 0 ? cumulative[radii[k]] : 0.0;
        }

        return fluxes;
    }

    /// <summary>The flux through an annulus, converged in the order as a disc's is.</summary>
    private static double Annulus(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double inner, double outer)
    {
        (double previous, _) = IntegrateAnnulus(field, centre, normal, inner, outer, FirstOrder);
        for (int order = 2 * FirstOrder; order <= LastOrder; order *= 2)
        {
            (double next, double magnitude) = IntegrateAnnulus(field, centre, normal, inner, outer, order);
            if (Math.Abs(next - previous) <= Tolerance * magnitude || magnitude == 0)
            {
                return next;
            }

            previous = next;
        }

        throw new FieldEvaluationException(
            "the flux through the loop (radius " + SiFormat.Format(outer, "m") + ") does not converge: the loop is too close to a conductor of the source for the field over it to be integrated");
    }

    /// <summary>The flux and the integral of |b| over the annulus inner &lt; r &lt; outer at one order (a disc when inner is 0).</summary>
    private static (double Flux, double Magnitude) IntegrateAnnulus(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double inner, double outer, int order)
    {
        (Vector3D u, Vector3D v) = Basis(normal);
        GaussLegendre.Rule rule = GaussLegendre.Of(order);
        int angles = 2 * order;
        double half = 0.5 * (outer - inner), mid = 0.5 * (outer + inner);
        double sum = 0, magnitude = 0;
        double[] trig = Angles(angles);
        for (int i = 0; i < rule.Nodes.Length; i++)
        {
            double r = mid + (half * rule.Nodes[i]);
            double ring = 0, ringMagnitude = 0;
            for (int j = 0; j < angles; j++)
            {
                Vector3D p = centre + (r * trig[2 * j] * u) + (r * trig[(2 * j) + 1] * v);
                Vector3D b = field(p);
                ring += b.Dot(normal);
                ringMagnitude += b.Length;
            }

            sum += rule.Weights[i] * r * ring;
            magnitude += rule.Weights[i] * r * ringMagnitude;
        }

        double area = half * 2 * Math.PI / angles;
        return (sum * area, magnitude * area);
    }

    /// <summary>
    /// The cosines and sines of the trapezoid rule's angles 2 pi (j + 1/2) / n, interleaved (cos, sin for each j), found
    /// once for each n and shared by every radius and disc (they were found again at every point: a tenth of a filament
    /// body's flux quadrature). One array, so that a thread reading its slot sees either nothing or the whole table.
    /// </summary>
    private static double[] Angles(int n)
    {
        if (n < AngleTables.Length && AngleTables[n] is { } known)
        {
            return known;
        }

        var table = new double[2 * n];
        for (int j = 0; j < n; j++)
        {
            double theta = 2 * Math.PI * (j + 0.5) / n;
            table[2 * j] = Math.Cos(theta);
            table[(2 * j) + 1] = Math.Sin(theta);
        }

        if (n < AngleTables.Length)
        {
            AngleTables[n] = table;
        }

        return table;
    }

    /// <summary>The angle tables by their count (up to twice the last order), filled as first needed.</summary>
    private static readonly double[]?[] AngleTables = new double[]?[(2 * LastOrder) + 1];

    /// <summary>The flux at one quadrature order: order Gauss-Legendre radii times 2 x order angles.</summary>
    public static double Flux(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double radius, int order) =>
        Integrate(field, centre, normal, radius, order).Flux;

    /// <summary>The flux and the integral of |b| over the disc at one order.</summary>
    private static (double Flux, double Magnitude) Integrate(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double radius, int order) =>
        IntegrateAnnulus(field, centre, normal, 0, radius, order);
}
