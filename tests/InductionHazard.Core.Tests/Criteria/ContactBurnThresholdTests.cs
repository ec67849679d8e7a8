using InductionHazard.Criteria;
using Xunit;

namespace InductionHazard.Tests.Criteria;

public class ContactBurnThresholdTests
{
    // ISO 13732-1:2006: uncoated metal about 65 °C at 1 s and 55-56 °C at 10 s (figure 1, lower edge used);
    // all materials 51 °C at 1 min, 48 °C at 10 min, 43 °C at 8 h (table 2).
    [Validates("65, 55, 51, 48, 43 °C at 1 s, 10 s, 1 min, 10 min, 8 h", "ISO 13732-1:2006 (figure 1 lower edge, partly confirmed; table 2)", "exact")]
    [Theory]
    [InlineData(1, 65)]
    [InlineData(10, 55)]
    [InlineData(60, 51)]
    [InlineData(600, 48)]
    [InlineData(28800, 43)]
    public void TheCurveHoldsThePublishedPoints(double seconds, double celsius)
    {
        Assert.Equal(celsius, ContactBurnThreshold.UncoatedMetal.CelsiusFor(seconds), 9);
    }

    [Fact]
    public void TheThresholdFallsWithContactTimeAndIsFlatOutsideTheCurve()
    {
        ContactBurnThreshold curve = ContactBurnThreshold.UncoatedMetal;
        double previous = double.PositiveInfinity;
        for (double t = 0.5; t <= 28800; t *= 1.3)
        {
            double c = curve.CelsiusFor(t);
            Assert.True(c <= previous, "the threshold rises at " + t + " s");
            previous = c;
        }

        Assert.Equal(65, curve.CelsiusFor(0.1), 9);
        Assert.Equal(43, curve.CelsiusFor(1e6), 9);
    }
}
