using System;
using System.Numerics;
using InductionHazard.Induction;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class SkinEffectTests
{
    [Theory]
    [InlineData(50, 9.35e-3)]
    [InlineData(60, 8.53e-3)]
    public void CoppersSkinDepthMatchesTheTextbookValue(double frequency, double expected)
    {
        // delta = sqrt(rho / (pi f mu0)) for annealed copper (1.7241e-8 ohm m): 9.35 mm at 50 Hz, 8.53 mm at 60 Hz.
        Within.Absolute(expected, SkinEffect.SkinDepthMeters(1.7241e-8, frequency), 0.005e-3, "skin depth of copper");
    }

    [Theory]
    [InlineData(1.0, 1.020)]
    [InlineData(2.0, 1.265)]
    [InlineData(3.0, 1.768)]
    public void TheAcResistanceRatioMatchesThePublishedTable(double radiusOverDepth, double expected)
    {
        // Ramo, Whinnery and Van Duzer (Kelvin-function formula); values as tabulated to three decimals.
        Within.Absolute(expected, SkinEffect.RoundWireImpedanceRatio(radiusOverDepth, 1.0).Real, 0.0006, "R_ac / R_dc at a/delta = " + radiusOverDepth);
    }

    [Fact]
    public void AThinWireKeepsItsDcResistanceAndInternalInductance()
    {
        // For a << delta: R_ac -> R_dc and omega L_int / R_dc -> x^2 / 8 (L_int = mu0 / (8 pi) per metre).
        double a = 0.05, delta = 1.0, x = Math.Sqrt(2) * a / delta;
        Complex ratio = SkinEffect.RoundWireImpedanceRatio(a, delta);
        Within.Relative(1.0, ratio.Real, 1e-6, "R_ac / R_dc");
        Within.Relative(x * x / 8, ratio.Imaginary, 1e-3, "omega L_int / R_dc");
    }

    [Theory]
    [InlineData(10.0)]
    [InlineData(25.0)]
    public void AThickWireTendsToTheSurfaceLayerResult(double radiusOverDepth)
    {
        // Large-argument expansion of the Bessel-function ratio (Ramo, Whinnery and Van Duzer):
        // R / R_dc = a/(2 delta) + 1/4 + 3 delta/(32 a), omega L_int / R_dc = a/(2 delta) - 3 delta/(32 a).
        Complex ratio = SkinEffect.RoundWireImpedanceRatio(radiusOverDepth, 1.0);
        double u = radiusOverDepth;
        Within.Relative((u / 2) + 0.25 + (3 / (32 * u)), ratio.Real, 2e-4, "R_ac / R_dc");
        Within.Relative((u / 2) - (3 / (32 * u)), ratio.Imaginary, 2e-4, "omega L_int / R_dc");
    }

    [Fact]
    public void TheSwitchToTheAsymptoticSeriesIsSeamless()
    {
        double justBelow = 39.999 / Math.Sqrt(2), justAbove = 40.001 / Math.Sqrt(2);
        Complex below = SkinEffect.RoundWireImpedanceRatio(justBelow, 1.0);
        Complex above = SkinEffect.RoundWireImpedanceRatio(justAbove, 1.0);
        Within.Relative(below.Real, above.Real, 1e-4, "real part across the switch");
        Within.Relative(below.Imaginary, above.Imaginary, 1e-4, "imaginary part across the switch");
    }
}
