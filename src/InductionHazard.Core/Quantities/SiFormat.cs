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

        int exponent3 = (int)Math.Floor(Decade(Math.Abs(v)) / 3.0);
        int index = exponent3 + UnitPrefixIndex;
        if (index < 0 || index >= Prefixes.Length)
        {
            return v.ToString("G" + significantDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " " + unit;
        }

        string digits = Round(v / Scales[index], significantDigits, out double shown, Prefixes[index], unit);
        if (Math.Abs(shown) >= 1000 && index < Prefixes.Length - 1)
        {
            index++;
            digits = Round(v / Scales[index], significantDigits, out _, Prefixes[index], unit);
        }

        return digits;
    }

    /// <summary>How a margin that could not be judged reads.</summary>
    public const string NotJudged = "not judged";

    /// <summary>
    /// A margin as a person reads it: "> 1000" when it is at least a thousand (so large that its figure says nothing
    /// more), "&lt; 0.001" when below a thousandth, "not judged" for NaN (a mechanism or an item that could not be
    /// judged: never a number), otherwise three significant digits, cut rather than rounded: a margin is never shown
    /// above what it is, so a Hazard's 0.9996 reads 0.999, not 1.00, and a Caution's 1.9996 reads 1.99, not the safety
    /// factor 2.00. The property keeps the number.
    /// </summary>
    public static string Margin(double? margin)
    {
        if (margin is { } nan && double.IsNaN(nan))
        {
            return NotJudged;
        }

        if (margin is { } m)
        {
            if (m >= 1000)
            {
                return "> 1000";
            }

            if (m < 1e-3)
            {
                return "< 0.001";
            }

            if (Finite.Is(m))
            {
                // Three significant digits cut toward zero; the factor 1 + 1e-12 keeps a margin such as 0.29, whose
                // product with 100 falls a rounding short of 29, from losing its last digit.
                double scale = Math.Pow(10, 2 - Math.Floor(Math.Log10(m)));
                return Plain(Math.Floor(m * scale * (1 + 1e-12)) / scale, 3);
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
            ? General(v, significantDigits)
            : Round(v, significantDigits);
    }

    /// <summary>
    /// A number as .NET's "G" format writes it to a number of significant digits (1 to 15): fixed-point notation when its
    /// decimal exponent lies above -5 and below that number, else "d.ddE+XX", trailing zeros dropped. Written out by
    /// integer arithmetic, except where its digits lie within rounding noise of a half in the last place kept or its
    /// exponent beyond 25 either way, which are left to the formatter.
    /// </summary>
    private static string General(double value, int significantDigits)
    {
        double a = Math.Abs(value);
        int exponent = Decade(a);
        int shift = significantDigits - 1 - exponent;
        if (significantDigits < 1 || significantDigits > 15 || Math.Abs(exponent) > 25 || Math.Abs(shift) > 30)
        {
            return Formatted(value, significantDigits);
        }

        // The digits kept, as a whole number: a times 10^shift, by one multiplication or division by a power of ten.
        double scaled = shift >= 0 ? a * Pow10(shift) : a / Pow10(-shift);
        double fromHalf = Math.Abs(scaled - Math.Floor(scaled) - 0.5);
        if (fromHalf <= (1e-12 * scaled) + 1e-9)
        {
            return Formatted(value, significantDigits);
        }

        long digits = (long)Math.Round(scaled);
        long top = (long)Pow10(significantDigits);
        if (digits >= top)
        {
            // Rounded up to the next decade: 9.995e-5 to three digits is 1.00e-4.
            digits /= 10;
            exponent++;
        }

        if (exponent > -5 && exponent < significantDigits)
        {
            // Fixed point: the same digits placed by the exponent.
            return Round(value, significantDigits);
        }

        // d.ddd without trailing zeros, E, the exponent's sign and at least two of its digits.
        long whole = digits / (long)Pow10(significantDigits - 1);
        long fraction = digits % (long)Pow10(significantDigits - 1);
        int places = significantDigits - 1;
        while (places > 0 && fraction % 10 == 0)
        {
            fraction /= 10;
            places--;
        }

        string mantissa = Compose(value < 0, whole, fraction, places, null, null);
        int size = Math.Abs(exponent);
        return mantissa + (exponent < 0 ? "E-" : "E+") + (size < 10 ? "0" : string.Empty) + size.ToString(CultureInfo.InvariantCulture);
    }

    private static string Formatted(double value, int significantDigits) =>
        value.ToString("G" + significantDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>Formats a temperature in degrees Celsius to one decimal ("36.4 °C").</summary>
    public static string Celsius(double? value)
    {
        if (value is null)
        {
            return string.Empty;
        }

        return Finite.Is(value.Value) ? OneDecimal(value.Value) : Plain(value);
    }

    /// <summary>The powers of ten from 1e-30 to 1e30, each the double nearest it (as the runtime parses "1e-5").</summary>
    private static readonly double[] Decades = BuildDecades();

    private const int LeastDecade = -30;

    /// <summary>10^k for k from -30 to 30 (exact from 1 to 1e22).</summary>
    private static double Pow10(int k) => Decades[k - LeastDecade];

    private static double[] BuildDecades()
    {
        var decades = new double[61];
        for (int k = 0; k < decades.Length; k++)
        {
            decades[k] = double.Parse("1e" + (k + LeastDecade).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        }

        return decades;
    }

    /// <summary>
    /// floor(log10 a) for a positive finite a, by comparison with the powers of ten (a logarithm's cost saved on every
    /// figure written); outside 1e-30 to 1e30, by the logarithm. Where the logarithm of a value an ulp below a power of ten
    /// rounds up to the power's exponent, this gives one less, and the figure written is the same either way (the value
    /// rounds to the power at either count of decimals).
    /// </summary>
    private static int Decade(double a)
    {
        if (!(a >= Decades[0] && a < Decades[Decades.Length - 1]))
        {
            return (int)Math.Floor(Math.Log10(a));
        }

        // Decades[low] <= a < Decades[high].
        int low = 0, high = Decades.Length - 1;
        while (high - low > 1)
        {
            int middle = (low + high) >> 1;
            if (Decades[middle] <= a)
            {
                low = middle;
            }
            else
            {
                high = middle;
            }
        }

        return low + LeastDecade;
    }

    private static string Round(double value, int significantDigits) => Round(value, significantDigits, out _, null, null);

    /// <summary>
    /// A temperature to one decimal, followed by " °C", as .NET's custom format "0.0" writes it. That format first takes
    /// the value to 15 significant digits and then rounds half away from zero, so a value within a few units of the
    /// fifteenth digit of a half-tenth can round up where the value itself is below the half: those, and values of a
    /// million or more, are left to the formatter; every other value rounds the same either way and is written out by
    /// integer arithmetic.
    /// </summary>
    private static string OneDecimal(double value) => Fixed(value, 1, keepZeros: true, "°C");

    /// <summary>
    /// A number to a fixed count of decimals (at most 6), as .NET's custom format writes it: "0", "0.0" and so on with
    /// <paramref name="keepZeros"/>, "0.#" and so on without. Written out by integer arithmetic except where the
    /// formatter's own rounding could differ (within a few units of the fifteenth digit of a half in the last place) and
    /// for a million or more, which are left to the formatter, as for <see cref="Celsius"/>.
    /// </summary>
    internal static string Fixed(double value, int decimals, bool keepZeros) => Fixed(value, decimals, keepZeros, null);

    /// <summary>The same, followed by " " and a unit when one is given.</summary>
    private static string Fixed(double value, int decimals, bool keepZeros, string? unit)
    {
        double scaled = value * Pow10(decimals);
        double fromHalf = Math.Abs(scaled - Math.Floor(scaled) - 0.5);
        if (!(Math.Abs(value) < 1e6) || fromHalf <= (1e-13 * Math.Abs(scaled)) + 1e-9)
        {
            string pattern = decimals == 0 ? "0" : "0." + new string(keepZeros ? '0' : '#', decimals);
            return value.ToString(pattern, CultureInfo.InvariantCulture) + (unit is null ? string.Empty : " " + unit);
        }

        return Digits(value, decimals, keepZeros, out _, null, unit);
    }

    /// <summary>
    /// The value to a number of significant digits, without trailing zeros ("0.##" in .NET's custom format), and the
    /// rounded value itself; with a prefix and unit, " " + prefix + unit follows. Written out by integer arithmetic:
    /// the formatter's custom patterns cost most of a report's time, and this gives the same text.
    /// </summary>
    private static string Round(double value, int significantDigits, out double rounded, string? prefix, string? unit)
    {
        if (value == 0)
        {
            rounded = 0;
            return unit is null ? "0" : "0 " + prefix + unit;
        }

        int magnitude = Decade(Math.Abs(value)) + 1;
        return Digits(value, Math.Max(0, Math.Min(15, significantDigits - magnitude)), keepZeros: false, out rounded, prefix, unit);
    }

    /// <summary>
    /// The value rounded half away from zero to a number of decimals, written without trailing zeros ("0.##") or with
    /// them ("0.00"), then " " + prefix + unit when a unit is given; and the rounded value.
    /// </summary>
    private static string Digits(double value, int decimals, bool keepZeros, out double rounded, string? prefix, string? unit)
    {
        rounded = Math.Round(value, decimals, MidpointRounding.AwayFromZero);
        double scale = Pow10(decimals);
        double units = Math.Abs(rounded) * scale;
        if (!(units < 1e15))
        {
            string pattern = keepZeros ? "0." + new string('0', Math.Max(1, decimals)) : Patterns[Math.Max(1, decimals)];
            return rounded.ToString(pattern, CultureInfo.InvariantCulture) + (unit is null ? string.Empty : " " + prefix + unit);
        }

        // The rounded value is the nearest double to a decimal of this many places: its digits are those of
        // round(|rounded| 10^decimals), an integer below 10^15 and so exact.
        long digits = (long)Math.Round(units);
        long whole = decimals == 0 ? digits : digits / (long)scale;
        long fraction = decimals == 0 ? 0 : digits % (long)scale;
        int places = decimals;
        while (!keepZeros && places > 0 && fraction % 10 == 0)
        {
            fraction /= 10;
            places--;
        }

        bool negative = rounded < 0 || (rounded == 0 && BitConverter.DoubleToInt64Bits(rounded) < 0);
        return Compose(negative, whole, fraction, places, prefix, unit);
    }

    /// <summary>Writes [-]whole[.fraction to its places][ prefix unit] into one string.</summary>
    private static string Compose(bool negative, long whole, long fraction, int places, string? prefix, string? unit)
    {
        int wholeDigits = 1;
        for (long w = whole; w >= 10; w /= 10)
        {
            wholeDigits++;
        }

        int length = (negative ? 1 : 0) + wholeDigits + (places > 0 ? places + 1 : 0) + (unit is null ? 0 : 1 + (prefix?.Length ?? 0) + unit.Length);
        char[] text = length <= 64 ? (Buffer ??= new char[64]) : new char[length];
        int n = 0;
        if (negative)
        {
            text[n++] = '-';
        }

        for (int i = wholeDigits - 1; i >= 0; i--, whole /= 10)
        {
            text[n + i] = (char)('0' + (whole % 10));
        }

        n += wholeDigits;
        if (places > 0)
        {
            text[n++] = '.';
            for (int i = places - 1; i >= 0; i--, fraction /= 10)
            {
                text[n + i] = (char)('0' + (fraction % 10));
            }

            n += places;
        }

        if (unit is not null)
        {
            text[n++] = ' ';
            prefix?.CopyTo(0, text, n, prefix.Length);
            n += prefix?.Length ?? 0;
            unit.CopyTo(0, text, n, unit.Length);
            n += unit.Length;
        }

        return new string(text, 0, n);
    }

    /// <summary>Each thread's buffer for composing a figure.</summary>
    [ThreadStatic]
    private static char[]? Buffer;

    /// <summary>10^(3 (k - 8)) for each prefix index k, from the runtime's own power so that every scaled value is as before.</summary>
    private static readonly double[] Scales = BuildScales();

    private static double[] BuildScales()
    {
        var scales = new double[Prefixes.Length];
        for (int k = 0; k < scales.Length; k++)
        {
            scales[k] = Math.Pow(10, 3 * (k - UnitPrefixIndex));
        }

        return scales;
    }

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
