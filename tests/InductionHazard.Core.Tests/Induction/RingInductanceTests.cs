using System;
using InductionHazard.Induction;
using InductionHazard.Items;
using MathNet.Numerics;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class RingInductanceTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    [Validates("L = mu0 R (ln(8R/a) - 7/4)", "Grover, Inductance Calculations (1946)", "1e-12")]
    [Theory]
    [InlineData(0.02, 0.002)]
    [InlineData(0.065, 0.004)]
    [InlineData(0.2, 0.002)]
    public void ARoundWireRingMatchesGroversFormula(double diameter, double wire)
    {
        // Grover, Inductance Calculations (1946): L = mu0 R (ln(8R/a) - 7/4) for uniform current in a thin ring.
        double r = diameter / 2, a = wire / 2;
        double grover = Mu0 * r * (Math.Log(8 * r / a) - 1.75);
        ConductiveItem ring = Fixtures.Ring("Copper", diameter, wire);
        Within.Relative(grover, new RingCircuit(ring).DcInductanceHenries, 1e-12, "L of the ring");
    }

    [Fact]
    public void TheHighFrequencyLimitDropsTheInternalQuarter()
    {
        // Grover (1946): Y = 0 for surface current gives mu0 R (ln(8R/a) - 2).
        Within.Relative(Mu0 * 0.01 * (Math.Log(80) - 2), RingInductance.ExternalHenries(0.01, 0.001), 1e-12, "external L");
    }

    [Validates("thin-ring L against the mutual inductance of two filaments one GMD apart", "Maxwell's GMD method; Neumann's formula by independent quadrature", "2e-4")]
    [Theory]
    [InlineData(0.1, 0.0005)]
    [InlineData(0.01, 0.0002)]
    public void TheFormulaAgreesWithNeumannsIntegralForTwoFilamentsOneGmdApart(double r, double gmd)
    {
        // Maxwell's GMD method: the self-inductance of a thin ring equals the mutual inductance of two coaxial
        // filaments of its radius one GMD apart, M = mu0 R^2 times the integral of cos(phi) / sqrt(2R^2(1 - cos phi) + g^2)
        // over 0..pi (Neumann's formula, halved by symmetry), evaluated here by Gauss-Legendre quadrature on intervals
        // that widen geometrically away from the peak at phi = 0: independent of the module's code.
        double Integrand(double phi) => Math.Cos(phi) / Math.Sqrt((2 * r * r * (1 - Math.Cos(phi))) + (gmd * gmd));
        double integral = 0, from = 0, to = gmd / r;
        while (from < Math.PI)
        {
            integral += Integrate.GaussLegendre(Integrand, from, Math.Min(to, Math.PI), 32);
            from = to;
            to *= 2;
        }

        double neumann = Mu0 * r * r * integral;
        Within.Relative(neumann, RingInductance.UniformCurrentHenries(r, gmd), 2e-4, "L from the thin-ring formula against Neumann's integral");
    }

    [Validates("GMD 0.2235 (w + t); thin-strip limit e^(-3/2)", "Grover (1946)", "2e-3")]
    [Fact]
    public void ABandUsesTheGeometricMeanDistanceOfItsSection()
    {
        // Grover (1946): GMD of a rectangle w x t is about 0.2235 (w + t).
        ConductiveItem band = Fixtures.Band("Gold", 0.02, 0.005, 0.0015);
        double expected = Mu0 * 0.01 * (Math.Log(8 * 0.01 / (0.2235 * 0.0065)) - 2);
        Within.Relative(expected, new RingCircuit(band).DcInductanceHenries, 1e-12, "L of the band");
        Within.Relative(Math.Exp(-1.5), 0.2235, 2e-3, "0.2235 against the thin-strip GMD e^(-3/2)");
    }
}
