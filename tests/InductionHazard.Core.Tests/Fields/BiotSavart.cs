using System;
using InductionHazard.Quantities;

namespace InductionHazard.Tests.Fields;

/// <summary>
/// An independent model for the tests: the Biot-Savart law, dB = (mu0 / 4 pi) I dl x r / r^3, summed over many
/// short straight pieces of a circle (midpoint rule), with no elliptic integrals.
/// </summary>
internal static class BiotSavart
{
    private const double Mu0 = 4e-7 * Math.PI;

    /// <summary>The field at p of a circle of radius a in the plane z = z0 centred on the z axis, carrying 1 A anticlockwise seen from +z.</summary>
    public static Vector3D Circle(double a, double z0, Vector3D p, int pieces = 200_000)
    {
        Vector3D sum = Vector3D.Zero;
        double dphi = 2 * Math.PI / pieces;
        for (int k = 0; k < pieces; k++)
        {
            double phi = (k + 0.5) * dphi;
            var at = new Vector3D(a * Math.Cos(phi), a * Math.Sin(phi), z0);
            var dl = new Vector3D(-a * Math.Sin(phi) * dphi, a * Math.Cos(phi) * dphi, 0);
            Vector3D r = p - at;
            double d = r.Length;
            sum += (1.0 / (d * d * d)) * dl.Cross(r);
        }

        return Mu0 / (4 * Math.PI) * sum;
    }
}
