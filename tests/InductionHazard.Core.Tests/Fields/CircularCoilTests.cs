using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class CircularCoilTests
{
    private const double Mu0 = 4e-7 * Math.PI;
    private const double A = 0.1;

    private static readonly CircularCoil Coil = new(new Axis(Vector3D.Zero, Vector3D.UnitZ), A, 5);

    public static IEnumerable<object[]> Points()
    {
        // 20 points inside and outside the winding, above, below and in its plane.
        double[] rho = { 0.02, 0.06, 0.09, 0.11, 0.15, 0.3 };
        double[] z = { -0.08, 0.01, 0.05 };
        int n = 0;
        foreach (double r in rho)
        {
            foreach (double h in z)
            {
                if (n++ < 18)
                {
                    yield return new object[] { r, h };
                }
            }
        }

        yield return new object[] { 0.05, 0.0 };
        yield return new object[] { 0.2, 0.0 };
    }

    [Validates("coil field at 20 points inside and outside the winding", "Biot-Savart law summed over 200,000 pieces (independent)", "1e-7")]
    [Theory]
    [MemberData(nameof(Points))]
    public void TheOffAxisFieldMatchesADirectBiotSavartIntegration(double rho, double z)
    {
        // Elliptic-integral closed form (Smythe 7.10) against the Biot-Savart law summed over 200,000 pieces.
        var p = new Vector3D(rho * Math.Cos(0.7), rho * Math.Sin(0.7), z);
        Vector3D expected = 5 * BiotSavart.Circle(A, 0, p);
        Vector3D actual = Coil.FieldPerUnitDrive(p);
        double error = (actual - expected).Length / expected.Length;
        Assert.True(error < 1e-7, "field at rho " + rho + ", z " + z + ": off by " + error.ToString("G3", System.Globalization.CultureInfo.InvariantCulture));
    }

    [Validates("mu0 N I a^2 / (2 (a^2 + z^2)^1.5)", "textbook closed form", "1e-12")]
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.05)]
    [InlineData(-0.2)]
    public void OnTheAxisTheFieldIsTheTextbookFormula(double z)
    {
        // Bz = mu0 N I a^2 / (2 (a^2 + z^2)^1.5) (any electromagnetism text).
        double expected = Mu0 * 5 * A * A / (2 * Math.Pow((A * A) + (z * z), 1.5));
        Within.Relative(expected, Coil.FieldPerUnitDrive(new Vector3D(0, 0, z)).Z, 1e-12, "axial field at z = " + z);
        Within.Relative(expected, Coil.FieldPerUnitDrive(new Vector3D(1e-4 * A, 0, z)).Z, 1e-8, "just off the axis");
    }

    [Fact]
    public void APointOnTheWindingIsRefused()
    {
        Assert.Throws<FieldEvaluationException>(() => Coil.FieldPerUnitDrive(new Vector3D(A, 0, 0)));
    }

    [Validates("disc quadrature of the coil field against M = mu0 sqrt(ab)[(2/k - k)K - (2/k)E]", "Maxwell; Grover (1946), K and E by Simpson's rule", "1e-6")]
    [Theory]
    [InlineData(0.02, 0.0)]
    [InlineData(0.05, 0.03)]
    [InlineData(0.08, 0.1)]
    public void TheFluxThroughACoaxialLoopIsMaxwellsMutualInductance(double b, double d)
    {
        // Maxwell's formula for coaxial circles (Grover 1946): M = mu0 sqrt(ab) [(2/k - k) K(k) - (2/k) E(k)],
        // k^2 = 4ab / ((a + b)^2 + d^2), here with K and E from their defining integrals (Simpson's rule), not the AGM.
        double k2 = 4 * A * b / (((A + b) * (A + b)) + (d * d)), k = Math.Sqrt(k2);
        double kk = Simpson(t => 1 / Math.Sqrt(1 - (k2 * Math.Sin(t) * Math.Sin(t))));
        double ee = Simpson(t => Math.Sqrt(1 - (k2 * Math.Sin(t) * Math.Sin(t))));
        double maxwell = Mu0 * Math.Sqrt(A * b) * ((((2 / k) - k) * kk) - (2 / k * ee));
        double flux = Coil.FluxThroughDisc(new Vector3D(0, 0, d), Vector3D.UnitZ, b) / 5;
        Within.Relative(maxwell, flux, 1e-6, "mutual inductance per turn");
    }

    [Validates("K(m), E(m) by the AGM", "Abramowitz and Stegun 17.3, by Simpson's rule", "1e-9")]
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.3)]
    [InlineData(0.9)]
    [InlineData(0.999)]
    public void TheEllipticIntegralsMatchTheirDefiningIntegrals(double m)
    {
        // K(m) and E(m) by the AGM against Simpson's rule on the defining integrals (Abramowitz and Stegun 17.3).
        (double k, double e) = EllipticIntegrals.Both(m);
        Within.Relative(Simpson(t => 1 / Math.Sqrt(1 - (m * Math.Sin(t) * Math.Sin(t)))), k, 1e-9, "K(" + m + ")");
        Within.Relative(Simpson(t => Math.Sqrt(1 - (m * Math.Sin(t) * Math.Sin(t)))), e, 1e-9, "E(" + m + ")");
    }

    private static double Simpson(Func<double, double> f, int n = 200_000)
    {
        double h = Math.PI / 2 / n, sum = f(0) + f(Math.PI / 2);
        for (int i = 1; i < n; i++)
        {
            sum += (i % 2 == 1 ? 4 : 2) * f(i * h);
        }

        return sum * h / 3;
    }
}
