using System;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class RectangleInductanceTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    /// <summary>
    /// Neumann's formula, M = (mu0 / 4 pi) double integral of dl1 . dl2 / r, for two parallel straight filaments of
    /// length l a distance d apart, by the midpoint rule on pieces much shorter than d (no closed form used).
    /// </summary>
    private static double ParallelFilaments(double l, double d)
    {
        int n = (int)Math.Ceiling(l / (d / 8));
        double h = l / n, sum = 0;
        for (int i = 0; i < n; i++)
        {
            double x1 = (i + 0.5) * h;
            for (int j = 0; j < n; j++)
            {
                double dx = x1 - ((j + 0.5) * h);
                sum += h * h / Math.Sqrt((dx * dx) + (d * d));
            }
        }

        return Mu0 / (4 * Math.PI) * sum;
    }

    /// <summary>
    /// The rectangle as four straight sides (Maxwell's GMD method, as Grover builds it): each side's self-inductance
    /// is the Neumann mutual of two parallel filaments one GMD (the wire radius, for a surface current) apart; the
    /// opposite sides, carrying opposite currents, subtract their Neumann mutuals; perpendicular sides do not couple.
    /// </summary>
    private static double Neumann(double a, double b, double g) =>
        (2 * ParallelFilaments(a, g)) + (2 * ParallelFilaments(b, g)) - (2 * ParallelFilaments(a, b)) - (2 * ParallelFilaments(b, a));

    [Validates("rectangle L against Neumann's integrals over the sides; against Grover's truncated formula", "Neumann (independent); Grover (1946)", "1e-4; 8 rho/a")]
    [Theory]
    [InlineData(0.4, 0.3, 0.005)]
    [InlineData(0.2, 0.2, 0.001)]
    public void TheRectangleInductanceAgreesWithNeumannsIntegral(double a, double b, double wireRadius)
    {
        // Grover's closed forms (1946) for the sides against Neumann's double line integrals over them, summed by the
        // midpoint rule (the GMD of a thin tube from itself is its radius).
        double grover = RectangleInductance.ExternalHenries(a, b, wireRadius);
        Within.Relative(Neumann(a, b, wireRadius), grover, 1e-4, "rectangle inductance");
        // Grover's truncated thin-wire formula, (mu0 / pi)[a ln(2ab / (rho (a + d))) + b ln(2ab / (rho (b + d)))
        // - 2(a + b) + 2d], differs only by the dropped terms of order rho / a.
        double d = Math.Sqrt((a * a) + (b * b));
        double truncated = Mu0 / Math.PI * ((a * Math.Log(2 * a * b / (wireRadius * (a + d)))) + (b * Math.Log(2 * a * b / (wireRadius * (b + d)))) - (2 * (a + b)) + (2 * d));
        Within.Relative(truncated, grover, 8 * wireRadius / Math.Min(a, b), "against the truncated formula");
    }

    [Validates("mu0 h ln(b/a) / (2 pi)", "Ampere's law integrated over the loop", "1e-7")]
    [Fact]
    public void ARectangleCoplanarWithALongWireLinksMu0HLnBOverAOverTwoPi()
    {
        // A rectangle with sides parallel to a long wire, from a = 0.1 m to b = 0.4 m away, h = 0.3 m along it:
        // M = mu0 h ln(b / a) / (2 pi) (Ampere's law integrated across the loop; any electromagnetism text).
        var line = new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ));
        double flux = RectangleQuadrature.Flux(line.FieldPerUnitDrive, new Vector3D(0.25, 0, 0), Vector3D.UnitY, Vector3D.UnitX, 0.3, 0.3);
        // The loop's height lies along n x u = y x x = -z; its flux sign follows the normal.
        Within.Relative(Mu0 * 0.3 * Math.Log(0.4 / 0.1) / (2 * Math.PI), Math.Abs(flux), 1e-7, "mutual inductance with the wire");
    }
}
