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

    [Validates("coaxial circles' mutual inductance, closed form and its small-k series", "Maxwell; Grover (1946), its bracket as one integral of K's and E's integrands by Simpson's rule", "1e-9")]
    [Theory]
    [InlineData(0.1, 0.02, 0.0)]
    [InlineData(0.1, 0.02, 0.05)]
    [InlineData(0.1, 0.1, 0.05)]
    [InlineData(0.1, 0.3, 0.08)]
    [InlineData(0.1, 0.01, 0.15)]
    [InlineData(0.1, 0.0112, 0.1)]
    [InlineData(0.1, 0.0115, 0.1)]
    [InlineData(0.1, 0.005, 0.4)]
    public void TheClosedFormIsMaxwellsMutualInductanceOnEitherSideOfItsSeries(double a, double b, double d)
    {
        // Maxwell's formula with K and E from their defining integrals, taken as one integral so that its bracket does
        // not cancel: (2/k - k) K - (2/k) E = k integral over 0..pi/2 of (2 sin^2 t - 1) / sqrt(1 - k^2 sin^2 t) dt
        // (Simpson's rule; what cancels is then only a factor k^2, some two digits here). The module takes a series
        // below k^2 = 0.05: the cases with b = 0.0112 and 0.0115 m lie just either side of it (k^2 0.0494 and 0.0507).
        double k2 = 4 * a * b / (((a + b) * (a + b)) + (d * d)), k = Math.Sqrt(k2);
        double bracket = k * Simpson(t => ((2 * Math.Sin(t) * Math.Sin(t)) - 1) / Math.Sqrt(1 - (k2 * Math.Sin(t) * Math.Sin(t))));
        double maxwell = Mu0 * Math.Sqrt(a * b) * bracket;
        Within.Relative(maxwell, CircularCoil.CoaxialMutualInductance(a, b, d), 1e-9, "M at k^2 = " + k2);
    }

    [Validates("coaxial circles far apart: mutual inductance of two dipoles, mu0 pi a^2 b^2 / (2 d^3)", "magnetic dipole field (any electromagnetism text)", "1e-6")]
    [Theory]
    [InlineData(0.1, 1e-3, 30.0)]
    [InlineData(0.1, 1e-5, 3.0)]
    [InlineData(1e-3, 0.1, 50.0)]
    public void CirclesFarApartCoupleAsDipoles(double a, double b, double d)
    {
        // Far apart the bracket is pi k^3 / 16 (1 + 3 k^2 / 4 + ...) and M tends to mu0 pi a^2 b^2 / (2 ((a + b)^2 + d^2)^1.5):
        // here k^2 is at most 4.4e-7, so the dipoles hold to 4e-7; the plain closed form would lose all its digits.
        double dipoles = Mu0 * Math.PI * a * a * b * b / (2 * Math.Pow(((a + b) * (a + b)) + (d * d), 1.5));
        Within.Relative(dipoles, CircularCoil.CoaxialMutualInductance(a, b, d), 1e-6, "far apart");
    }

    [Validates("a coil's flux through discs on its axis in closed form, against the disc quadrature of its field", "Gauss-Legendre and trapezoid quadrature of the Biot-Savart field over the disc (independent of Maxwell's formula)", "1e-6")]
    [Theory]
    [InlineData(0.02, 0.0)]
    [InlineData(0.02, 0.649)]
    [InlineData(0.05, -0.03)]
    [InlineData(0.2, 0.08)]
    [InlineData(0.001, 2.0)]
    public void TheFluxThroughADiscOnTheAxisIsTheQuadratureOfTheField(double radius, double z)
    {
        Vector3D centre = new(0, 0, z);
        double quadrature = DiscQuadrature.Flux(Coil.FieldPerUnitDrive, centre, Vector3D.UnitZ, radius);
        Within.Relative(quadrature, Coil.FluxThroughDisc(centre, Vector3D.UnitZ, radius), 1e-6, "flux through the disc");
        Within.Relative(-quadrature, Coil.FluxThroughDisc(centre, -Vector3D.UnitZ, radius), 1e-6, "the normal reversed");
        double[] nested = Coil.ClosedFormFluxes(centre, Vector3D.UnitZ, new[] { radius, 0, radius / 2 })!;
        Assert.Equal(Coil.FluxThroughDisc(centre, Vector3D.UnitZ, radius), nested[0]);
        Assert.Equal(0, nested[1]);
        Within.Relative(DiscQuadrature.Flux(Coil.FieldPerUnitDrive, centre, Vector3D.UnitZ, radius / 2), nested[2], 1e-6, "the inner disc");

        // Just off the axis (1e-7 of the radius, beyond the closed form's 1e-9) the quadrature answers: the same flux.
        Within.Relative(Coil.FluxThroughDisc(centre, Vector3D.UnitZ, radius), Coil.FluxThroughDisc(centre + new Vector3D(1e-8, 0, 0), Vector3D.UnitZ, radius), 1e-6, "just off the axis");
        Assert.Null(Coil.ClosedFormFluxes(centre + new Vector3D(1e-8, 0, 0), Vector3D.UnitZ, new[] { radius }));
        Assert.Null(Coil.ClosedFormFluxes(centre, new Vector3D(1e-7, 0, 1).Normalized(), new[] { radius }));
    }

    [Validates("the force on a circle on a coil's axis, -2 pi r B_rho, against the derivative of Maxwell's mutual inductance", "F = I grad Phi (virtual work), d M / dz by central differences", "1e-7")]
    [Theory]
    [InlineData(0.02, 0.05)]
    [InlineData(0.02, -0.2)]
    [InlineData(0.3, 0.1)]
    [InlineData(0.001, 1.5)]
    public void TheForceOnACircleOnTheAxisIsTheDerivativeOfTheMutualInductance(double radius, double z)
    {
        double h = 1e-5 * Math.Max(Math.Abs(z), A);
        double derivative = 5 * (CircularCoil.CoaxialMutualInductance(A, radius, z + h) - CircularCoil.CoaxialMutualInductance(A, radius, z - h)) / (2 * h);
        Vector3D up = Coil.ClosedFormRimForce(new Vector3D(0, 0, z), Vector3D.UnitZ, radius)!.Value;
        Vector3D down = Coil.ClosedFormRimForce(new Vector3D(0, 0, z), -Vector3D.UnitZ, radius)!.Value;
        Within.Relative(derivative, up.Z, 1e-7, "axial force per ampere, rim counter-clockwise about +z");
        Within.Relative(-derivative, down.Z, 1e-7, "the rim reversed");
        Assert.Equal(0, up.X);
        Assert.Equal(0, up.Y);
        Assert.Null(Coil.ClosedFormRimForce(new Vector3D(1e-8, 0, z), Vector3D.UnitZ, radius));
    }

    [Theory]
    [InlineData(0.13, 0.0)]
    [InlineData(0.2, 0.01)]
    [InlineData(0.0997, 0.0)]
    public void ADiscOnTheAxisNearTheWindingIsStillLeftToTheQuadratureWhichRefusesIt(double radius, double z)
    {
        // The winding passes through the disc or within a few millimetres of it: no closed form, and the quadrature
        // cannot integrate the field there.
        Assert.Null(Coil.ClosedFormFluxes(new Vector3D(0, 0, z), Vector3D.UnitZ, new[] { 0.01, radius }));
        Assert.Throws<FieldEvaluationException>(() => Coil.FluxThroughDisc(new Vector3D(0, 0, z), Vector3D.UnitZ, radius));
    }

    [Validates("K(m), E(m) by the AGM", "Abramowitz and Stegun 17.3, by Simpson's rule", "1e-9")]
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.3)]
    [InlineData(0.5)]
    [InlineData(0.123456789)]
    [InlineData(0.9)]
    [InlineData(0.999)]
    public void TheEllipticIntegralsMatchTheirDefiningIntegrals(double m)
    {
        // K(m) and E(m) by the AGM against Simpson's rule on the defining integrals (Abramowitz and Stegun 17.3).
        (double k, double e) = EllipticIntegrals.Both(m);
        Within.Relative(Simpson(t => 1 / Math.Sqrt(1 - (m * Math.Sin(t) * Math.Sin(t)))), k, 1e-9, "K(" + m + ")");
        Within.Relative(Simpson(t => Math.Sqrt(1 - (m * Math.Sin(t) * Math.Sin(t)))), e, 1e-9, "E(" + m + ")");
    }

    [Validates("K(m), E(m) by the AGM to full precision", "Legendre's relation E K' + E' K - K K' = pi / 2 (Abramowitz and Stegun 17.3.13)", "4e-16 of the terms")]
    [Fact]
    public void TheEllipticIntegralsKeepLegendresRelation()
    {
        // An identity between K and E at m and at m' = 1 - m that holds exactly: it tests both to the last digits, where
        // Simpson's rule above stops at 1e-9. Every m of a fine grid, among them those whose means settle one unit in
        // the last place apart (m = 0.5, 0.123456789), and m near 0 and 1 (m' taken as 1 - m, so that both are exact).
        // The three terms cancel to pi / 2: the sum is good to a few units in the last place of the largest of them.
        var ms = new System.Collections.Generic.List<double> { 0.5, 0.123456789, 0.5 - 1e-9, Math.Pow(2, -40), 1 - Math.Pow(2, -40) };
        for (int i = 1; i < 1000; i++)
        {
            ms.Add(i / 1000.0);
        }

        foreach (double m in ms)
        {
            (double k, double e) = EllipticIntegrals.Both(m);
            (double kc, double ec) = EllipticIntegrals.Both(1 - m);
            double relation = (e * kc) + (ec * k) - (k * kc);
            double scale = Math.Abs(e * kc) + Math.Abs(ec * k) + Math.Abs(k * kc);
            Assert.True(Math.Abs(relation - (Math.PI / 2)) <= 4e-16 * scale, "Legendre's relation at m = " + m + ": " + relation.ToString("R") + " against pi / 2, terms " + scale.ToString("R"));
        }
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
