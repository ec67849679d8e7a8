using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Quantities;

public class SiFormatTests
{
    [Theory]
    [InlineData(0.0014, "V", "1.4 mV")]
    [InlineData(35000, "A", "35 kA")]
    [InlineData(0.02, "m", "20 mm")]
    [InlineData(999.96, "V", "1 kV")]
    [InlineData(-2.5e-6, "T", "-2.5 µT")]
    [InlineData(0, "A", "0 A")]
    [InlineData(1e300, "T", "1E+300 T")]
    public void FormatsWithSiPrefixes(double value, string unit, string expected)
    {
        Assert.Equal(expected, SiFormat.Format(value, unit));
    }

    [Fact]
    public void ShowsNonFiniteValuesForWhatTheyAre()
    {
        Assert.Equal("NaN", SiFormat.Format(double.NaN, "V"));
        Assert.Equal("∞ V", SiFormat.Format(double.PositiveInfinity, "V"));
        Assert.Equal("NaN", SiFormat.Plain(double.NaN));
        Assert.Equal(string.Empty, SiFormat.Format(null, "V"));
    }

    [Fact]
    public void MarginsAreShownAsBoundsWhenVeryLargeOrSmall()
    {
        Assert.Equal("> 1000", SiFormat.Margin(1000));
        Assert.Equal("> 1000", SiFormat.Margin(3.99e228));
        Assert.Equal("> 1000", SiFormat.Margin(double.PositiveInfinity));
        Assert.Equal("< 0.001", SiFormat.Margin(8.9e-5));
        Assert.Equal("999", SiFormat.Margin(999.4));
        Assert.Equal("2.59", SiFormat.Margin(2.5894));
        Assert.Equal("NaN", SiFormat.Margin(double.NaN));
        Assert.Equal(string.Empty, SiFormat.Margin(null));
    }
}
