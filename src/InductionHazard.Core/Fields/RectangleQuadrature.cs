using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Fields;

/// <summary>
/// The flux of a field through a flat rectangle, integral of b . n dA, by Gauss-Legendre quadrature in both sides;
/// the order doubles until two successive orders agree to within a fraction of the integral of |b| (as for
/// <see cref="DiscQuadrature"/>). A uniform field is exact at any order.
/// </summary>
public static class RectangleQuadrature
{
    private const int FirstOrder = 4;
    private const int LastOrder = 128;

    /// <summary>The flux through the rectangle centred at <paramref name="centre"/> with sides along u (width) and n x u (height).</summary>
    /// <exception cref="FieldEvaluationException">The quadrature does not converge, or the field cannot be evaluated on the rectangle.</exception>
    public static double Flux(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, Vector3D widthDirection, double width, double height)
    {
        Vector3D v = normal.Cross(widthDirection);
        (double previous, _) = Integrate(field, centre, normal, widthDirection, v, width, height, FirstOrder);
        for (int order = 2 * FirstOrder; order <= LastOrder; order *= 2)
        {
            (double next, double magnitude) = Integrate(field, centre, normal, widthDirection, v, width, height, order);
            if (Math.Abs(next - previous) <= DiscQuadrature.Tolerance * magnitude || magnitude == 0)
            {
                return next;
            }

            previous = next;
        }

        throw new FieldEvaluationException(
            "the flux through the rectangular loop (" + SiFormat.Format(width, "m") + " x " + SiFormat.Format(height, "m") + ") does not converge: the loop is too close to a conductor of the source for the field over it to be integrated");
    }

    private static (double Flux, double Magnitude) Integrate(Func<Vector3D, Vector3D> field, Vector3D centre, Vector3D normal, Vector3D u, Vector3D v, double width, double height, int order)
    {
        GaussLegendre.Rule rule = GaussLegendre.Of(order);
        double sum = 0, magnitude = 0;
        for (int i = 0; i < order; i++)
        {
            Vector3D row = centre + (0.5 * width * rule.Nodes[i] * u);
            for (int j = 0; j < order; j++)
            {
                Vector3D b = field(row + (0.5 * height * rule.Nodes[j] * v));
                double w = rule.Weights[i] * rule.Weights[j];
                sum += w * b.Dot(normal);
                magnitude += w * b.Length;
            }
        }

        double scale = 0.25 * width * height;
        return (sum * scale, magnitude * scale);
    }
}
