using System;
using System.Globalization;

namespace InductionHazard.Quantities;

/// <summary>Formats SI values for people: three significant figures and an SI prefix ("1.4 mV", "35 kA").</summary>
public static class SiFormat
{
    private static readonly string[] Prefixes = { "y", "z", "a", "f", "p", "n", "µ", "m", string.Empty, "k", "M", "G", "T", "P", "E", "Z", "Y" };
    private const int UnitPrefixIndex = 8;

    /// <summary>Formats a value in an SI unit with a prefix. NaN shows as "NaN", infinities as "∞"; null as an empty string.</summary>
    /// <param name="value">The value in the unprefixed SI unit.</param>
    /// <param name="unit">The unit symbol, for example "V".</param>
    /// <param name="significantDigits">How many significant digits to keep (1 to 15).</param>
    public static string Format(double? value, string unit, int significantDigits = 3)
    {
        if (value is null)
        {
            return string.Empty;
        }

        double v = value.Value;
        if (double.IsNaN(v))
        {
            return "NaN";
        }

        if (double.IsInfinity(v))
        {
            return (v < 0 ? "-∞ " : "∞ ") + unit;
        }

        if (v == 0)
        {
            return "0 " + unit;
        }

        int exponent3 = (int)Math.Floor(Math.Log10(Math.Abs(v)) / 3.0);
        int index = exponent3 + UnitPrefixIndex;
        if (index < 0 || index >= Prefixes.Length)
        {
            return v.ToString("G" + significantDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " " + unit;
        }

        double scaled = v / Math.Pow(10, 3 * (index - UnitPrefixIndex));
        string digits = Round(scaled, significantDigits, out double shown);
        if (Math.Abs(shown) >= 1000 && index < Prefixes.Length - 1)
        {
            index++;
            digits = Round(v / Math.Pow(10, 3 * (index - UnitPrefixIndex)), significantDigits);
        }

        return digits + " " + Prefixes[index] + unit;
    }

    /// <summary>
    /// A margin as a person reads it: "> 1000" when it is at least a thousand (so large that its figure says nothing
    /// more), "&lt; 0.001" when below a thousandth, otherwise three significant digits; the property keeps the number.
    /// </summary>
    public static string Margin(double? margin)
    {
        if (margin is { } m && !double.IsNaN(m))
        {
            if (m >= 1000)
            {
                return "> 1000";
            }

            if (m < 1e-3)
            {
                return "< 0.001";
            }
        }

        return Plain(margin, 3);
    }

    /// <summary>Formats a dimensionless number to three significant figures; "∞" for infinity, "NaN" for NaN.</summary>
    public static string Plain(double? value, int significantDigits = 3)
    {
        if (value is null)
        {
            return string.Empty;
        }

        double v = value.Value;
        if (double.IsNaN(v))
        {
            return "NaN";
        }

        if (double.IsInfinity(v))
        {
            return v < 0 ? "-∞" : "∞";
        }

        return Math.Abs(v) >= 1e6 || (v != 0 && Math.Abs(v) < 1e-3)
            ? v.ToString("G" + significantDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture)
            : Round(v, significantDigits);
    }

    /// <summary>Formats a temperature in degrees Celsius to one decimal ("36.4 °C").</summary>
    public static string Celsius(double? value)
    {
        if (value is null)
        {
            return string.Empty;
        }

        return Finite.Is(value.Value)
            ? value.Value.ToString("0.0", CultureInfo.InvariantCulture) + " °C"
            : Plain(value);
    }

    private static string Round(double value, int significantDigits) => Round(value, significantDigits, out _);

    /// <summary>
    /// The value to a number of significant digits, without trailing zeros ("0.##" in .NET's custom format), and the
    /// rounded value itself. Written out by integer arithmetic: the formatter's custom patterns cost most of a report's
    /// time, and this gives the same text.
    /// </summary>
    private static string Round(double value, int significantDigits, out double rounded)
    {
        if (value == 0)
        {
            rounded = 0;
            return "0";
        }

        int magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value))) + 1;
        int decimals = Math.Max(0, Math.Min(15, significantDigits - magnitude));
        rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        double scale = Powers[decimals];
        double units = Math.Abs(rounded) * scale;
        if (!(units < 1e15))
        {
            return rounded.ToString(Patterns[Math.Max(1, decimals)], CultureInfo.InvariantCulture);
        }

        // The rounded value is the nearest double to a decimal of this many places: its digits are those of
        // round(|rounded| 10^decimals), an integer below 10^15 and so exact.
        long digits = (long)Math.Round(units);
        long whole = decimals == 0 ? digits : digits / (long)scale;
        long fraction = decimals == 0 ? 0 : digits % (long)scale;
        int places = decimals;
        while (places > 0 && fraction % 10 == 0)
        {
            fraction /= 10;
            places--;
        }

        string sign = rounded < 0 || (rounded == 0 && BitConverter.DoubleToInt64Bits(rounded) < 0) ? "-" : string.Empty;
        return places == 0
            ? sign + whole.ToString(CultureInfo.InvariantCulture)
            : sign + whole.ToString(CultureInfo.InvariantCulture) + "." + fraction.ToString(CultureInfo.InvariantCulture).PadLeft(places, '0');
    }

    private static readonly double[] Powers = { 1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15 };

    private static readonly string[] Patterns = Build();

    private static string[] Build()
    {
        var patterns = new string[16];
        for (int k = 1; k < patterns.Length; k++)
        {
            patterns[k] = "0." + new string('#', k);
        }

        return patterns;
    }
}
