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
        Assert.Equal("999", SiFormat.Margin(999.97));
        Assert.Equal("not judged", SiFormat.Margin(double.NaN));
    }

    [Fact]
    public void AMarginIsCutNeverRoundedUpAcrossALimit()
    {
        // A Hazard's margin just below 1 must not read 1.00, nor a Caution's just below the safety factor 2 read 2.00.
        Assert.Equal("0.999", SiFormat.Margin(0.99990013));
        Assert.Equal("1.99", SiFormat.Margin(1.9996));
        Assert.Equal("2.58", SiFormat.Margin(2.5894));
        Assert.Equal("1", SiFormat.Margin(1.0));
        Assert.Equal("2", SiFormat.Margin(2.0));
        // Figures with no more digits than shown keep them all, though their products with a power of ten fall a
        // rounding short (0.29 * 100 = 28.999999999999996).
        Assert.Equal("0.29", SiFormat.Margin(0.29));
        Assert.Equal("0.57", SiFormat.Margin(0.57));
        Assert.Equal("0.0111", SiFormat.Margin(0.0111630711));
        Assert.Equal("1.51", SiFormat.Margin(1.51720973));
        Assert.Equal("not judged", SiFormat.Margin(double.NaN));
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

    /// <summary>A quantity with its prefix as first written: the scaled value by .NET's "0.##" after rounding away from zero.</summary>
    private static string FormatByTheFormatter(double v, string unit, int digits)
    {
        string[] prefixes = { "y", "z", "a", "f", "p", "n", "µ", "m", string.Empty, "k", "M", "G", "T", "P", "E", "Z", "Y" };
        int index = (int)System.Math.Floor(System.Math.Log10(System.Math.Abs(v)) / 3.0) + 8;
        double scaled = v / System.Math.Pow(10, 3 * (index - 8));
        if (System.Math.Abs(System.Math.Round(scaled, System.Math.Max(0, System.Math.Min(15, digits - ((int)System.Math.Floor(System.Math.Log10(System.Math.Abs(scaled))) + 1))), System.MidpointRounding.AwayFromZero)) >= 1000 && index < prefixes.Length - 1)
        {
            index++;
            scaled = v / System.Math.Pow(10, 3 * (index - 8));
        }

        return ByTheFormatter(scaled, digits) + " " + prefixes[index] + unit;
    }

    [Validates("quantities with SI prefixes to 1-6 significant figures, 200,000 random values from 1e-23 to 1e26 and rounding edges", ".NET's custom numeric format \"0.##\" of the value scaled by Math.Pow (general-purpose reference library)", "the same text")]
    [Fact]
    public void QuantitiesReadAsTheRuntimesOwnFormatterWritesThem()
    {
        var random = new System.Random(20261204);
        for (int trial = 0; trial < 200_000; trial++)
        {
            int digits = 1 + random.Next(6);
            double value = (random.Next(2) == 0 ? -1 : 1) * System.Math.Pow(10, -23 + (49 * random.NextDouble()));
            if (trial % 3 == 0)
            {
                value = OnEdge(value, digits);
            }

            Assert.Equal(FormatByTheFormatter(value, "V", digits), SiFormat.Format(value, "V", digits));
        }

        foreach (double edge in new[] { 999.5, 999.4999, 0.0015, 1e-3, 1, 1000, 999999.5, 1.005, 2.675e-6, -0.1, 123456.5, 1e24 * 0.9995 })
        {
            Assert.Equal(FormatByTheFormatter(edge, "A", 3), SiFormat.Format(edge, "A"));
        }
    }

    [Validates("temperatures to one decimal, 300,000 random values of either sign up to 3e7 degC, halves, near-halves and negative zeros", ".NET's custom numeric format \"0.0\" (general-purpose reference library)", "the same text")]
    [Fact]
    public void TemperaturesReadAsTheRuntimesOwnFormatterWritesThem()
    {
        var random = new System.Random(20261203);
        var culture = System.Globalization.CultureInfo.InvariantCulture;
        for (int trial = 0; trial < 300_000; trial++)
        {
            double value = Drawn(random, trial % 4, 1);
            Assert.Equal(value.ToString("0.0", culture) + " °C", SiFormat.Celsius(value));
        }

        foreach (double edge in new[] { 0.0, -0.0, -0.04, 0.05, -0.05, 47.15, 36.45, 740.95, 99.95, 999999.95, 1e6, -1e18 })
        {
            Assert.Equal(edge.ToString("0.0", culture) + " °C", SiFormat.Celsius(edge));
        }
    }

    [Validates("fixed decimals written by integer arithmetic, 400,000 values with rounding edges", ".NET's custom numeric formats \"0\", \"0.0\", \"0.#\", \"0.##\" (the reference formatter)", "exact text")]
    [Fact]
    public void FixedDecimalsAreWrittenAsTheCustomFormatsWriteThem()
    {
        var random = new System.Random(20261204);
        var culture = System.Globalization.CultureInfo.InvariantCulture;
        for (int trial = 0; trial < 400_000; trial++)
        {
            int decimals = trial % 3;
            bool keepZeros = trial % 2 == 0;
            double value = Drawn(random, (trial / 6) % 4, decimals);
            Assert.Equal(value.ToString(Pattern(decimals, keepZeros), culture), SiFormat.Fixed(value, decimals, keepZeros));
        }

        foreach (double edge in new[] { 0.0, -0.0, -0.04, -0.4, 0.5, -0.5, 1.5, 2.5, 0.05, 89.5, 999999.5, 1e6, -1e18 })
        {
            foreach ((int decimals, bool keepZeros) in new[] { (0, true), (1, true), (1, false), (2, false) })
            {
                Assert.Equal(edge.ToString(Pattern(decimals, keepZeros), culture), SiFormat.Fixed(edge, decimals, keepZeros));
            }
        }
    }

    [Validates("figures one to four ulps either side of every power of ten from 1e-23 to 1e25, 1-6 significant figures, with and without a prefix", ".NET's custom numeric format \"0.##\" after rounding away from zero, with the decade by Math.Log10 (general-purpose reference library)", "the same text")]
    [Fact]
    public void ValuesAnUlpAroundAPowerOfTenReadAsTheFormatterWritesThem()
    {
        // The decade of a figure is found by comparison with the powers of ten, not by a logarithm, which rounds up to
        // the power's exponent for values an ulp or two below it: either way the same text, at every power from 1e-23
        // to 1e25, one to four ulps either side, one to six significant figures, against the references above.
        for (int k = -23; k <= 25; k++)
        {
            double power = double.Parse("1e" + k, System.Globalization.CultureInfo.InvariantCulture);
            foreach (int ulps in new[] { -4, -2, -1, 0, 1, 2, 4 })
            {
                double value = Ulps(power, ulps);

                for (int digits = 1; digits <= 6; digits++)
                {
                    Assert.Equal(FormatByTheFormatter(value, "V", digits), SiFormat.Format(value, "V", digits));
                    Assert.Equal(FormatByTheFormatter(-value, "V", digits), SiFormat.Format(-value, "V", digits));
                    if (value >= 1e-3 && value < 1e6)
                    {
                        Assert.Equal(ByTheFormatter(value, digits), SiFormat.Plain(value, digits));
                    }
                }
            }
        }
    }

    [Validates("very small and very large numbers to 1-9 significant figures, 400,000 random values and rounding edges", ".NET's standard numeric format \"G\" (the reference formatter)", "the same text")]
    [Fact]
    public void VerySmallAndLargeNumbersReadAsTheGeneralFormatWritesThem()
    {
        // Plain numbers below 1e-3 or from 1e6 up are written as .NET's "G" format writes them: fixed point down to
        // 1e-4, "8.65E-06" and "1.23E+06" beyond. Values from 1e-33 to 1e-3 and from 1e6 to 1e33, a third of them on
        // a rounding edge (the digits kept and then a 5), some within a few ulps of one.
        var random = new System.Random(20261206);
        var culture = System.Globalization.CultureInfo.InvariantCulture;
        for (int trial = 0; trial < 400_000; trial++)
        {
            int digits = 1 + random.Next(9);
            double value = (random.Next(2) == 0 ? -1 : 1) * (random.Next(2) == 0 ? System.Math.Pow(10, -33 + (30 * random.NextDouble())) : System.Math.Pow(10, 6 + (27 * random.NextDouble())));
            if (trial % 3 == 0)
            {
                value = Ulps(OnEdge(value, digits), random.Next(-3, 4));
            }

            if (System.Math.Abs(value) >= 1e6 || System.Math.Abs(value) < 1e-3)
            {
                Assert.Equal(value.ToString("G" + digits, culture), SiFormat.Plain(value, digits));
            }
        }

        foreach (double edge in new[] { 8.65e-6, 0.000442, 0.0009995, 0.00099949, 1e-4, 9.9995e-5, 1e-5, 1234567.0, 9995000.0, 9999999.0, 1e6, 1e25, 1e-25, -3.3e-7 })
        {
            Assert.Equal(edge.ToString("G3", culture), SiFormat.Plain(edge, 3));
        }
    }

    /// <summary>The value moved by a number of units in the last place, up for a positive count and down for a negative one.</summary>
    private static double Ulps(double value, int count)
    {
        for (int step = count; step != 0; step -= System.Math.Sign(step))
        {
            value = step > 0 ? System.Math.BitIncrement(value) : System.Math.BitDecrement(value);
        }

        return value;
    }

    /// <summary>
    /// A value for the fixed-decimal checks: from -300 to 3000; by kind, on a rounding edge of the last decimal kept (a
    /// whole number there and a half, as the nearest double has it), within a few ulps of one, or scaled down or up.
    /// </summary>
    private static double Drawn(System.Random random, int kind, int decimals)
    {
        double value = -300 + (3300 * random.NextDouble());
        double half = 0.5 / System.Math.Pow(10, decimals);
        return kind switch
        {
            0 => System.Math.Round(value, decimals) + half,
            1 => Ulps(System.Math.Round(value, decimals) + half, random.Next(-4, 5)),
            2 => value / System.Math.Pow(10, random.Next(8)),
            _ => value * System.Math.Pow(10, random.Next(5)),
        };
    }

    /// <summary>The value moved onto a rounding edge at its own decade: the digits kept and then a 5 (999.5, 1.235 and the like).</summary>
    private static double OnEdge(double value, int digits)
    {
        double decade = System.Math.Pow(10, System.Math.Floor(System.Math.Log10(System.Math.Abs(value))));
        double mantissa = value / decade;
        return (System.Math.Round(mantissa, digits - 1) + (System.Math.Sign(mantissa) * 0.5 * System.Math.Pow(10, 1 - digits))) * decade;
    }

    /// <summary>.NET's custom format for a count of decimals: "0", "0.0", "0.#" and so on.</summary>
    private static string Pattern(int decimals, bool keepZeros) => decimals == 0 ? "0" : "0." + new string(keepZeros ? '0' : '#', decimals);
}
