using InductionHazard.Induction;
using MathNet.Numerics;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class KelvinSeriesTests
{
    [Validates("ber, bei and their derivatives by power series, x from 0.01 to 8", "A&S 9.9.10 against MathNet.Numerics' Kelvin functions", "1e-11, 1e-10")]
    [Theory]
    [InlineData(0.01)]
    [InlineData(0.15)]
    [InlineData(1.0)]
    [InlineData(2.5)]
    [InlineData(4.0)]
    [InlineData(6.3)]
    [InlineData(8.0)]
    public void ThePowerSeriesMatchesMathNetsKelvinFunctions(double x)
    {
        // A&S 9.9.10 series against MathNet.Numerics' Kelvin functions (complex Bessel functions of argument x e^(3 pi i/4)).
        (double ber, double bei, double berP, double beiP) = KelvinSeries.Evaluate(x);
        Within.Relative(SpecialFunctions.KelvinBer(x), ber, 1e-11, "ber " + x);
        Within.Relative(SpecialFunctions.KelvinBei(x), bei, 1e-11, "bei " + x);
        Within.Relative(SpecialFunctions.KelvinBerPrime(x), berP, 1e-10, "ber' " + x);
        Within.Relative(SpecialFunctions.KelvinBeiPrime(x), beiP, 1e-10, "bei' " + x);
    }
}
