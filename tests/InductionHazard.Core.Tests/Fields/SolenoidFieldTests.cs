using System;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class SolenoidFieldTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    [Validates("centre field of a 4 m solenoid", "Ampere's law, long-solenoid limit", "1e-4")]
    [Fact]
    public void ALongSolenoidsCentreFieldIsMu0NIOverL()
    {
        // The long-solenoid limit B = mu0 N I / l (Ampere's law); a 4 m solenoid of radius 20 mm differs from it by
        // (2a/l)^2 / 2 = 5e-5 at its centre.
        var s = new SolenoidField(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.02, 4.0, 1000);
        Within.Relative(Mu0 * 1000 / 4.0, s.FieldPerUnitDrive(Vector3D.Zero).Z, 1e-4, "centre field");
        Within.Relative(Mu0 * 1000 / 4.0, s.FieldPerUnitDrive(new Vector3D(0.01, 0, 0)).Z, 1e-4, "off the axis, inside");
        Within.Absolute(0, s.FieldPerUnitDrive(new Vector3D(0.01, 0, 0)).X, 1e-9, "no radial field at the centre plane");
    }

    [Validates("off-axis closed form just off the axis against the on-axis closed form", "textbook closed form", "1e-7")]
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.08)]
    [InlineData(0.3)]
    public void JustOffTheAxisTheFieldIsTheOnAxisClosedForm(double z)
    {
        // Just off the axis the field is Derby and Olbert's; on it (mu0 N I / 2l)[(z + l/2)/sqrt((z + l/2)^2 + a^2)
        // - (z - l/2)/sqrt((z - l/2)^2 + a^2)].
        var s = new SolenoidField(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.05, 0.2, 400);
        Within.Relative(s.AxialFieldPerAmpere(z), s.FieldPerUnitDrive(new Vector3D(1e-6, 0, z)).Z, 1e-7, "field at z = " + z);
    }

    /// <summary>Points inside the bore, near and beyond the ends, outside the winding and far away, for a short and a long solenoid.</summary>
    public static TheoryData<double, double, double, double> OffAxisPoints() => new()
    {
        { 0.2, 0.05, 0.0, 0.0 }, { 0.2, 0.05, 0.03, 0.09 }, { 0.2, 0.05, 0.049, 0.05 }, { 0.2, 0.05, 0.051, -0.099 },
        { 0.2, 0.05, 0.08, 0.12 }, { 0.2, 0.05, 0.3, 0.4 }, { 0.2, 0.05, 0.02, -0.5 }, { 1.6, 0.45, 0.1, 1.2 },
        { 1.6, 0.45, 0.44, 0.79 }, { 1.6, 0.45, 0.6, 0.0 }, { 1.6, 0.45, 2.0, 3.0 }, { 0.01, 0.3, 0.2, 0.001 },
    };

    [Validates("solenoid field off the axis (Bulirsch's C, Derby and Olbert 2010) at 12 points", "filament loops (Smythe's closed form) summed along the length by composite Gauss-Legendre quadrature (MathNet's rule), written in the test", "1e-9")]
    [Theory]
    [MemberData(nameof(OffAxisPoints))]
    public void OffTheAxisTheFieldIsTheSumOfItsLoops(double length, double radius, double rho, double z)
    {
        // The current sheet as loops of N/l turns per metre: B = (N / l) integral over the length of the loop field
        // (CircularCoil.LoopField) at z - z', by MathNet's 10-point Gauss-Legendre rule on 4,000 panels either side of
        // z' = z, where a point near the winding has its peak (panels a small part of the distance to the winding).
        const double Turns = 500;
        var s = new SolenoidField(new Axis(Vector3D.Zero, Vector3D.UnitZ), radius, length, Turns);
        var rule = new MathNet.Numerics.Integration.GaussLegendreRule(-1, 1, 10);
        double Part(Func<double, double> f)
        {
            double lo = -length / 2, hi = length / 2, cut = Math.Clamp(z, lo, hi);
            double sum = 0;
            foreach ((double from, double to) in new[] { (lo, cut), (cut, hi) })
            {
                const int Panels = 4000;
                double width = (to - from) / Panels;
                for (int k = 0; k < Panels && width > 0; k++)
                {
                    double mid = from + ((k + 0.5) * width);
                    for (int i = 0; i < rule.Order; i++)
                    {
                        sum += rule.Weights[i] * 0.5 * width * f(mid + (0.5 * width * rule.Abscissas[i]));
                    }
                }
            }

            return sum * Turns / length;
        }

        double br = Part(zp => CircularCoil.LoopField(radius, rho, z - zp).Radial);
        double bz = Part(zp => CircularCoil.LoopField(radius, rho, z - zp).Axial);
        Vector3D b = s.FieldPerUnitDrive(new Vector3D(rho, 0, z));
        double scale = Math.Sqrt((br * br) + (bz * bz));
        Assert.True(Math.Abs(b.X - br) <= 1e-9 * scale, $"Brho {b.X:E12} against the loops' {br:E12}");
        Assert.True(Math.Abs(b.Z - bz) <= 1e-9 * scale, $"Bz {b.Z:E12} against the loops' {bz:E12}");
        Assert.Equal(0, b.Y);
    }

    [Validates("Bulirsch's generalized complete elliptic integral C(kc, p, c, s)", "its defining integral by Simpson's rule; C(kc, 1, 1, 1) = K with k^2 = 1 - kc^2 (Abramowitz and Stegun 17.3)", "1e-12")]
    [Theory]
    [InlineData(0.3, 1.0, 1.0, -1.0)]
    [InlineData(0.9, 1.0, 1.0, -1.0)]
    [InlineData(0.05, 0.25, 1.0, 0.5)]
    [InlineData(0.7, 0.01, 1.0, 0.1)]
    [InlineData(0.2, 0.0, 1.0, 0.0)]
    [InlineData(1.0, 1.0, 1.0, 1.0)]
    public void BulirschsIntegralIsItsDefiningIntegral(double kc, double p, double c, double s)
    {
        double Integrand(double t)
        {
            double cos2 = Math.Cos(t) * Math.Cos(t), sin2 = Math.Sin(t) * Math.Sin(t);
            return ((c * cos2) + (s * sin2)) / ((cos2 + (p * sin2)) * Math.Sqrt(cos2 + (kc * kc * sin2)));
        }

        int n = 200_000;
        double h = Math.PI / 2 / n, sum = Integrand(0) + Integrand(Math.PI / 2);
        for (int i = 1; i < n; i++)
        {
            sum += (i % 2 == 1 ? 4 : 2) * Integrand(i * h);
        }

        Within.Relative(sum * h / 3, EllipticIntegrals.Cel(kc, p, c, s), 1e-12, $"C({kc}, {p}, {c}, {s})");
    }
}
