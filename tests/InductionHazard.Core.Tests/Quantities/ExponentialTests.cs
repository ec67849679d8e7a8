using System;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Quantities;

public class ExponentialTests
{
    [Validates("e^x - 1 over 2,000 arguments from 1e-300 to 700, both signs", "Taylor series of e^x below |x| = 1/2, Math.Exp(x) - 1 above (no cancellation there)", "1e-14")]
    [Fact]
    public void MinusOneHasNoCancellationForSmallArguments()
    {
        var random = new Random(20261202);
        for (int k = 0; k < 2000; k++)
        {
            double x = Math.Min(Math.Pow(10, -300 + (random.NextDouble() * 302.8)) * (random.Next(2) == 0 ? -1 : 1), 700);
            Within.Relative(Reference(x), Exponential.Minus1(x), 1e-14, "e^x - 1 at x = " + x.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
        }

        Assert.Equal(-1.0, Exponential.Minus1(-800));
        Assert.Equal(0.0, Exponential.Minus1(0));
    }

    [Fact]
    public void MinusOneFarBelowZeroIsExactlyWhatTheSubtractionGives()
    {
        // Below x = -40 the series is not summed and the exponential not asked: e^x - 1 rounds to -1 there, which is
        // what Math.Exp(x) - 1 gives to the last bit, down to the underflow and beyond.
        var random = new Random(20261203);
        for (int k = 0; k < 2000; k++)
        {
            double x = -30 - (random.NextDouble() * 1000);
            Assert.Equal(Math.Exp(x) - 1, Exponential.Minus1(x));
        }

        Assert.Equal(Math.Exp(-40.0) - 1, Exponential.Minus1(-40.0));
        Assert.Equal(Math.Exp(-38.0) - 1, Exponential.Minus1(-38.0));
        Assert.Equal(-1.0, Exponential.Minus1(double.NegativeInfinity));
        Assert.True(double.IsNaN(Exponential.Minus1(double.NaN)));
    }

    private static double Reference(double x)
    {
        if (Math.Abs(x) >= 0.5)
        {
            return Math.Exp(x) - 1;
        }

        double term = x, sum = x;
        for (int n = 2; n < 40; n++)
        {
            term *= x / n;
            sum += term;
        }

        return sum;
    }
}
