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
}
