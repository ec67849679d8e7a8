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

    /// <summary>The rounding as first written: .NET's own custom format ("0.##") of the value rounded away from zero.</summary>
    private static string ByTheFormatter(double value, int significantDigits)
    {
        if (value == 0)
        {
            return "0";
        }

        int magnitude = (int)System.Math.Floor(System.Math.Log10(System.Math.Abs(value))) + 1;
        int decimals = System.Math.Max(0, System.Math.Min(15, significantDigits - magnitude));
        double rounded = System.Math.Round(value, decimals, System.MidpointRounding.AwayFromZero);
        return rounded.ToString("0." + new string('#', System.Math.Max(1, decimals)), System.Globalization.CultureInfo.InvariantCulture);
    }

    [Validates("numbers to 1-15 significant figures without trailing zeros, 200,000 random values and rounding edges", ".NET's custom numeric format \"0.##\" after rounding away from zero (general-purpose reference library)", "the same text")]
    [Fact]
    public void PlainNumbersReadAsTheRuntimesOwnFormatterWritesThem()
    {
        var random = new System.Random(20261202);
        for (int trial = 0; trial < 200_000; trial++)
        {
            int digits = 1 + random.Next(15);
            double value = (random.Next(2) == 0 ? -1 : 1) * System.Math.Pow(10, -3 + (9 * random.NextDouble()));
            if (trial % 3 == 0)
            {
                // Values on a rounding edge: a few significant digits and a trailing 5.
                value = System.Math.Round(value, 3) + (0.5 * System.Math.Pow(10, -3));
            }

            if (System.Math.Abs(value) >= 1e6 || System.Math.Abs(value) < 1e-3)
            {
                continue;
            }

            Assert.Equal(ByTheFormatter(value, digits), SiFormat.Plain(value, digits));
        }

        foreach (double edge in new[] { 999.5, 999.4999, 0.0015, 0.00149999, 1.005, 2.675, 99.95, 0.1, 0.3, 123456.5 })
        {
            Assert.Equal(ByTheFormatter(edge, 3), SiFormat.Plain(edge, 3));
        }
    }
}
