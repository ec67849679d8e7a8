using System;
using System.Numerics;
using InductionHazard.Induction;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class SkinEffectTests
{
    [Validates("skin depth of annealed copper, 9.35 mm at 50 Hz, 8.53 mm at 60 Hz", "delta = sqrt(rho/(pi f mu0)), rho = 1.7241e-8 ohm m (IEC 60028)", "±0.005 mm")]
    [Theory]
    [InlineData(50, 9.35e-3)]
    [InlineData(60, 8.53e-3)]
    public void CoppersSkinDepthMatchesTheTextbookValue(double frequency, double expected)
    {
        // delta = sqrt(rho / (pi f mu0)) for annealed copper (1.7241e-8 ohm m): 9.35 mm at 50 Hz, 8.53 mm at 60 Hz.
        Within.Absolute(expected, SkinEffect.SkinDepthMeters(1.7241e-8, frequency), 0.005e-3, "skin depth of copper");
    }

    [Validates("R_ac/R_dc of a round wire: 1.020, 1.265, 1.768 at a/delta = 1, 2, 3", "Ramo, Whinnery and Van Duzer (Kelvin-function formula), tabulated values", "±0.0006")]
    [Theory]
    [InlineData(1.0, 1.020)]
    [InlineData(2.0, 1.265)]
    [InlineData(3.0, 1.768)]
    public void TheAcResistanceRatioMatchesThePublishedTable(double radiusOverDepth, double expected)
    {
        // Ramo, Whinnery and Van Duzer (Kelvin-function formula); values as tabulated to three decimals.
        Within.Absolute(expected, SkinEffect.RoundWireImpedanceRatio(radiusOverDepth, 1.0).Real, 0.0006, "R_ac / R_dc at a/delta = " + radiusOverDepth);
    }

    [Validates("low-frequency limit 1 + j x^2/8", "d.c. internal inductance mu0/(8 pi) per metre (textbook)", "1e-6, 1e-3")]
    [Fact]
    public void AThinWireKeepsItsDcResistanceAndInternalInductance()
    {
        // For a << delta: R_ac -> R_dc and omega L_int / R_dc -> x^2 / 8 (L_int = mu0 / (8 pi) per metre).
        double a = 0.05, delta = 1.0, x = Math.Sqrt(2) * a / delta;
        Complex ratio = SkinEffect.RoundWireImpedanceRatio(a, delta);
        Within.Relative(1.0, ratio.Real, 1e-6, "R_ac / R_dc");
        Within.Relative(x * x / 8, ratio.Imaginary, 1e-3, "omega L_int / R_dc");
    }

    [Validates("high-frequency limit a/(2 delta) + 1/4 + 3 delta/(32 a)", "large-argument expansion of I0/I1", "2e-4")]
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
