using System;
using System.Threading;

namespace InductionHazard.Quantities;

/// <summary>Directions spread over the sphere, and a climb over it from one of them: for searches over orientations and places within reach.</summary>
internal static class SphereSearch
{
    private static readonly double Golden = Math.PI * (3 - Math.Sqrt(5));

    /// <summary>
    /// <paramref name="count"/> unit directions spread evenly over the sphere, or over its half with z above 0 (where a
    /// direction and its reverse are the same axis): a Fibonacci lattice, equal areas in z, turned by the golden angle.
    /// </summary>
    public static Vector3D[] Spread(int count, bool half)
    {
        var directions = new Vector3D[count];
        for (int i = 0; i < count; i++)
        {
            double z = half ? 1 - ((i + 0.5) / count) : 1 - (2 * (i + 0.5) / count), r = Math.Sqrt(1 - (z * z)), phi = Golden * i;
            directions[i] = new Vector3D(r * Math.Cos(phi), r * Math.Sin(phi), z);
        }

        return directions;
    }

    /// <summary>
    /// The direction of the largest value near <paramref name="start"/>, and that value: steps across the direction
    /// (each way along two directions square to it), taken while one rises, halving from 0.2 rad to 0.0125 rad.
    /// </summary>
    public static (Vector3D Direction, double Value) Climb(Func<Vector3D, double> value, Vector3D start, double startValue, CancellationToken cancellation = default)
    {
        (Vector3D best, double bestValue) = (start, startValue);
        for (double step = 0.2; step > 0.01; step /= 2)
        {
            cancellation.ThrowIfCancellationRequested();
            Vector3D helper = Math.Abs(best.X) < 0.9 ? Vector3D.UnitX : Vector3D.UnitY;
            Vector3D u = (helper - (helper.Dot(best) * best)).Normalized(), w = best.Cross(u);
            bool moved = true;
            for (int round = 0; round < 8 && moved; round++)
            {
                moved = false;
                foreach (Vector3D tangent in new[] { u, -1 * u, w, -1 * w })
                {
                    Vector3D direction = (best + (step * tangent)).Normalized();
                    double v = value(direction);
                    if (v > bestValue)
                    {
                        (best, bestValue, moved) = (direction, v, true);
                    }
                }
            }
        }

        return (best, bestValue);
    }
}
