using System;
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

    /// <summary>The flux at one quadrature order: order Gauss-Legendre radii times 2 x order angles.</summary>
    public static double Flux(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double radius, int order) =>
        Integrate(field, centre, normal, radius, order).Flux;

    /// <summary>The flux and the integral of |b| over the disc at one order.</summary>
    private static (double Flux, double Magnitude) Integrate(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, double radius, int order)
    {
        (Vector3D u, Vector3D v) = Basis(normal);
        GaussLegendre.Rule rule = GaussLegendre.Of(order);
        int angles = 2 * order;
        double sum = 0, magnitude = 0;
        for (int i = 0; i < rule.Nodes.Length; i++)
        {
            double r = 0.5 * radius * (rule.Nodes[i] + 1);
            double ring = 0, ringMagnitude = 0;
            for (int j = 0; j < angles; j++)
            {
                double theta = 2 * Math.PI * (j + 0.5) / angles;
                Vector3D p = centre + (r * Math.Cos(theta) * u) + (r * Math.Sin(theta) * v);
                Vector3D b = field(p);
                ring += b.Dot(normal);
                ringMagnitude += b.Length;
            }

            sum += rule.Weights[i] * r * ring;
            magnitude += rule.Weights[i] * r * ringMagnitude;
        }

        // dA = r dr dtheta: dr = radius/2 dx on [-1, 1], dtheta = 2 pi / angles.
        double area = 0.5 * radius * 2 * Math.PI / angles;
        return (sum * area, magnitude * area);
    }
}
