using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Text.RegularExpressions;
using InductionHazard.Errors;
using UnitsNet;

namespace InductionHazard.Quantities;

/// <summary>
/// Reads a quantity from a number (taken in the kind's canonical unit) or from a string with a unit
/// ("20 mm", "1.5 T", "2 ms", "150 G"), using UnitsNet for units and conversions. Accepts the ASCII
/// spellings people type in a shell where UnitsNet wants a symbol: "us" and "uT" for micro, "ohm" and
/// "kohm" for the ohm, "degC" for degrees Celsius, "mm2" for square millimetres.
/// </summary>
public static class QuantityParser
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>
    /// What <see cref="TryNumberAndUnit"/> reads, as a regular expression: a number (digits 0-9, an optional point and
    /// exponent) and whatever follows it as its unit, spaces around either left out.
    /// </summary>
    internal const string NumberAndUnitPattern = @"^\s*(?<number>[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\s*(?<unit>.*?)\s*$";

    private static readonly Regex DecimalComma = new(@"^[+-]?[0-9]+,[0-9]+(\s*[^0-9,].*)?$", RegexOptions.CultureInvariant);

    private static readonly Regex Fraction = new(@"^(?<whole>[0-9]+)?(?:\s+|-)?(?<num>[0-9]+)/(?<den>[0-9]+)\s*(?<unit>.*?)\s*$", RegexOptions.CultureInvariant);

    /// <summary>Gauss with an SI prefix, which UnitsNet does not know ("15 kG" is kilogauss, not kilograms): factor to gauss.</summary>
    private static readonly System.Collections.Generic.Dictionary<string, double> PrefixedGauss = new(StringComparer.Ordinal)
    {
        ["kG"] = 1e3, ["mG"] = 1e-3, ["uG"] = 1e-6, ["µG"] = 1e-6, ["μG"] = 1e-6,
    };

    private static readonly Regex Ohm = new(@"(?i:ohms?)(?![a-z])", RegexOptions.CultureInvariant);

    private static readonly Regex OhmMetre = new(@"Ω\s*[\*\.\-·× ]?\s*(?<len>c?m)$", RegexOptions.CultureInvariant);

    private static readonly Regex PowerSuffix = new(@"(?<=[a-zA-Zµ])\^?(?<pow>[23])(?![0-9])", RegexOptions.CultureInvariant);

    /// <summary>
    /// The commonest unit symbols of the kinds an inventory and a source are written in, with the factor the units
    /// library multiplies a value by to take it to the kind's canonical unit (a test checks every entry against the
    /// library, to the last bit). They are read without the library, whose unit tables take a third of a second or
    /// more to build: a shell's first command need not wait for them. Every other spelling goes to the library.
    /// </summary>
    internal static readonly IReadOnlyDictionary<(QuantityKind Kind, string Symbol), double> Common = new Dictionary<(QuantityKind Kind, string Symbol), double>
    {
        [(QuantityKind.Length, "m")] = 1,
        [(QuantityKind.Length, "cm")] = 1e-2,
        [(QuantityKind.Length, "mm")] = 1e-3,
        [(QuantityKind.Length, "µm")] = 1e-6,
        [(QuantityKind.Time, "s")] = 1,
        [(QuantityKind.Time, "ms")] = 1e-3,
        [(QuantityKind.Time, "µs")] = 1e-6,
        [(QuantityKind.Time, "min")] = 60,
        [(QuantityKind.Time, "h")] = 3600,
        [(QuantityKind.Frequency, "Hz")] = 1,
        [(QuantityKind.Frequency, "kHz")] = 1e3,
        [(QuantityKind.Frequency, "MHz")] = 1e6,
        [(QuantityKind.MagneticFluxDensity, "T")] = 1,
        [(QuantityKind.MagneticFluxDensity, "mT")] = 1e-3,
        [(QuantityKind.MagneticFluxDensity, "µT")] = 1e-6,
        [(QuantityKind.ElectricCurrent, "A")] = 1,
        [(QuantityKind.ElectricCurrent, "kA")] = 1e3,
        [(QuantityKind.ElectricCurrent, "mA")] = 1e-3,
        [(QuantityKind.Voltage, "V")] = 1,
        [(QuantityKind.Voltage, "kV")] = 1e3,
        [(QuantityKind.Voltage, "mV")] = 1e-3,
    };

    /// <summary>Parses a value of the given kind into the kind's canonical unit, or throws.</summary>
    /// <exception cref="QuantityFormatException">The value is empty, not a number, not finite, or not of the kind.</exception>
    public static double Parse(object? input, QuantityKind kind)
    {
        if (TryParse(input, kind, out double value, out string? error))
        {
            return value;
        }

        throw new QuantityFormatException(error!, Display(input), kind);
    }

    /// <summary>Strings already read, by text and kind (successes only: a refusal is worked out again, with its reason).</summary>
    private static readonly BoundedCache<(string Text, QuantityKind Kind), double> Parsed = new(ParsedCapacity);

    /// <summary>How many read strings are kept before the store is emptied.</summary>
    private const int ParsedCapacity = 4096;

    /// <summary>Parses a value of the given kind; on failure gives the reason instead of throwing.</summary>
    public static bool TryParse(object? input, QuantityKind kind, out double value, out string? error)
    {
        QuantityKindInfo info = QuantityKindInfo.Of(kind);
        value = double.NaN;
        error = null;
        switch (input)
        {
            case null:
                error = "no value given; expected " + Expectation(info);
                return false;
            case double or float or decimal or int or long or short or byte or sbyte or uint or ulong or ushort:
                value = Convert.ToDouble(input, Invariant);
                return CheckFinite(value, Display(input), out error);
            case string text:
                if (Parsed.TryGet((text, kind), out value))
                {
                    return true;
                }

                if (!TryParseText(text, info, out value, out error))
                {
                    return false;
                }

                // Inventories repeat their unit strings; the unit library's parse is slow (tens of microseconds). A text
                // is kept from its second sight on: an inventory of every size its own would otherwise carry each row's
                // texts into the runtime's older generation (docs/performance.md).
                Parsed.AddOnRepeat((text, kind), value);
                return true;
            default:
                error = "got a " + input.GetType().Name + " ('" + Display(input) + "'); expected " + Expectation(info);
                return false;
        }
    }

    /// <summary>
    /// Parses a value that may be any one of several kinds (a drive may be a flux density or a current).
    /// Returns the kind found; a bare number returns null for the kind.
    /// </summary>
    public static (double Value, QuantityKind? Kind) ParseOneOf(object? input, params QuantityKind[] kinds)
    {
        if ((input is string text && IsBareNumber(text)) || (input is not string && input is not null))
        {
            return (Parse(input, kinds[0]), null);
        }

        string? firstError = null;
        foreach (QuantityKind kind in kinds)
        {
            if (TryParse(input, kind, out double value, out string? error))
            {
                return (value, kind);
            }

            firstError ??= error;
        }

        string expected = string.Join(" or ", kinds.Select(k => QuantityKindInfo.Of(k).Description + " such as " + QuantityKindInfo.Of(k).Example));
        string found = input is string s ? DimensionOf(s) : null ?? string.Empty;
        // A text that is no known quantity at all (a decimal comma, other digits, a unit in the wrong case): say why, as for one kind.
        string why = found.Length == 0 && firstError is not null && firstError.Contains(";") ? firstError.Substring(0, firstError.IndexOf(';')) + "; " : string.Empty;
        throw new QuantityFormatException(
            why + "expected " + expected + "; got '" + Display(input) + "'" + (found.Length > 0 ? ", which is " + found : string.Empty),
            Display(input),
            kinds[0]);
    }

    /// <summary>True when the text is a number with no unit ("18", " 0.5 ").</summary>
    public static bool IsBareNumber(string text)
    {
        if (Bare.TryGet(text, out bool bare))
        {
            return bare;
        }

        return Bare.AddOnRepeat(text, TryNumberAndUnit(text, out _, out string unit) && unit.Length == 0);
    }

    /// <summary>Texts already asked whether they are bare numbers (inventories repeat them).</summary>
    private static readonly BoundedCache<string, bool> Bare = new(ParsedCapacity, StringComparer.Ordinal);

    private static bool TryParseText(string text, QuantityKindInfo info, out double value, out string? error)
    {
        value = double.NaN;
        error = null;
        string trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            error = "no value given (the field is empty); expected " + Expectation(info);
            return false;
        }

        if (trimmed.Equals("NaN", StringComparison.OrdinalIgnoreCase) || trimmed.IndexOf("Infinity", StringComparison.OrdinalIgnoreCase) >= 0 || trimmed.Contains("∞"))
        {
            error = "'" + trimmed + "' is not a finite number; expected " + Expectation(info);
            return false;
        }

        // Neither a decimal comma nor a fraction can match without its comma or its slash.
        if (trimmed.IndexOf(',') >= 0 && DecimalComma.IsMatch(trimmed))
        {
            error = "'" + trimmed + "' has a decimal comma, which could also be a thousands separator; write a decimal point ('" + trimmed.Replace(',', '.') + "'); expected " + Expectation(info);
            return false;
        }

        Match? fraction = trimmed.IndexOf('/') >= 0 ? Fraction.Match(trimmed) : null;
        if (fraction is { Success: true })
        {
            // Fractions as jewellers and fitters write them: '3/4 in', '1 3/4 in', '1-3/4 in'.
            double den = double.Parse(fraction.Groups["den"].Value, CultureInfo.InvariantCulture);
            if (den == 0)
            {
                error = "'" + trimmed + "' divides by zero; expected " + Expectation(info);
                return false;
            }

            double whole = fraction.Groups["whole"].Success ? double.Parse(fraction.Groups["whole"].Value, CultureInfo.InvariantCulture) : 0;
            double sum = whole + (double.Parse(fraction.Groups["num"].Value, CultureInfo.InvariantCulture) / den);
            return TryParseText(sum.ToString("R", CultureInfo.InvariantCulture) + " " + fraction.Groups["unit"].Value, info, out value, out error);
        }

        if (HasOtherDigits(trimmed))
        {
            error = "'" + trimmed + "' has digits other than 0-9 (write the number with the digits 0-9); expected " + Expectation(info);
            return false;
        }

        if (!TryNumberAndUnit(trimmed, out string numberText, out string unitText))
        {
            error = "'" + trimmed + "' is not a number with a unit; expected " + Expectation(info);
            return false;
        }

        if (!double.TryParse(numberText, NumberStyles.Float, Invariant, out double number) || !Finite.Is(number))
        {
            error = "'" + trimmed + "' is too large to be a finite number; expected " + Expectation(info);
            return false;
        }

        if (unitText.Length == 0)
        {
            value = number;
            return CheckFinite(value, trimmed, out error);
        }

        if (Common.TryGetValue((info.Kind, unitText), out double factor))
        {
            value = number * factor;
            return CheckFinite(value, trimmed, out error);
        }

        if (info.Kind == QuantityKind.MagneticFluxDensity && PrefixedGauss.TryGetValue(unitText.Trim(), out double gauss))
        {
            value = number * gauss * 1e-4;
            return CheckFinite(value, trimmed, out error);
        }

        // The units library reads a bare "A" as a length in angstrom; in an inventory it is an ampere in the wrong column.
        if (info.Kind == QuantityKind.Length && unitText.Trim() == "A")
        {
            error = "expected " + Expectation(info) + "; got '" + trimmed + "', which is a current in amperes (for angstrom write 'Å')";
            return false;
        }

        if (TryUnit(unitText, info, out Enum? unit))
        {
            try
            {
                value = UnitsNet.Quantity.From(number, unit!).As(info.CanonicalUnit);
            }
            catch (Exception ex) when (ex is ArgumentException or OverflowException)
            {
                // UnitsNet refuses a value that its conversion takes past the range of a double.
                value = double.NaN;
            }

            if (!Finite.Is(value))
            {
                error = "'" + trimmed + "' is too large to be a number in " + info.CanonicalSymbol + "; expected " + Expectation(info);
                return false;
            }

            return true;
        }

        string dimension = DimensionOf(unitText);
        string? meant = CaseInsensitiveMatch(unitText, info);
        if (meant is not null)
        {
            error = "'" + unitText + "' is not a unit: unit symbols are case-sensitive (m is milli, M mega); did you mean '" + meant + "'? expected " + Expectation(info);
            return false;
        }

        error = dimension.Length > 0
            ? "expected " + Expectation(info) + "; got '" + trimmed + "', which is " + dimension
            : "'" + unitText + "' is not a unit of " + info.Description.Substring(info.Description.IndexOf(' ') + 1)
                + "; expected " + Expectation(info);
        return false;
    }

    /// <summary>
    /// Splits a text into its number and its unit exactly as <see cref="NumberAndUnitPattern"/> matches it, with no
    /// regular expression (an inventory's every row has a size of its own to read): spaces (char.IsWhiteSpace, which
    /// is the pattern's \s), a sign, digits 0-9 with an optional point, an exponent only when digits follow its e, then
    /// the rest as the unit with the spaces around it left out. False where the pattern fails: no digit where the
    /// number must be, or a line break inside the unit (the pattern's '.' takes anything but a line feed).
    /// </summary>
    internal static bool TryNumberAndUnit(string text, out string number, out string unit)
    {
        number = unit = string.Empty;
        int n = text.Length, i = 0;
        while (i < n && char.IsWhiteSpace(text[i]))
        {
            i++;
        }

        int start = i;
        if (i < n && (text[i] == '+' || text[i] == '-'))
        {
            i++;
        }

        int digits = i;
        i = SkipDigits(text, i);
        if (i > digits)
        {
            if (i < n && text[i] == '.')
            {
                i = SkipDigits(text, i + 1);
            }
        }
        else if (i + 1 < n && text[i] == '.' && IsDigit(text[i + 1]))
        {
            i = SkipDigits(text, i + 1);
        }
        else
        {
            return false;
        }

        if (i < n && (text[i] == 'e' || text[i] == 'E'))
        {
            int j = i + 1;
            if (j < n && (text[j] == '+' || text[j] == '-'))
            {
                j++;
            }

            int exponent = j;
            j = SkipDigits(text, j);
            if (j > exponent)
            {
                i = j;
            }
        }

        int end = i, first = i, last = n;
        while (first < n && char.IsWhiteSpace(text[first]))
        {
            first++;
        }

        while (last > first && char.IsWhiteSpace(text[last - 1]))
        {
            last--;
        }

        if (text.IndexOf('\n', first, last - first) >= 0)
        {
            return false;
        }

        number = text.Substring(start, end - start);
        unit = text.Substring(first, last - first);
        return true;
    }

    private static bool IsDigit(char c) => c >= '0' && c <= '9';

    private static int SkipDigits(string text, int i)
    {
        while (i < text.Length && IsDigit(text[i]))
        {
            i++;
        }

        return i;
    }

    /// <summary>True when the text holds a decimal digit outside 0-9 (Arabic-Indic, Devanagari, full-width...), which the module does not read.</summary>
    private static bool HasOtherDigits(string text)
    {
        foreach (char c in text)
        {
            if (char.IsDigit(c) && (c < '0' || c > '9'))
            {
                return true;
            }
        }

        return false;
    }

    private static bool CheckFinite(double value, string shown, out string? error)
    {
        error = Finite.Is(value) ? null : "'" + shown + "' is not a finite number";
        return error is null;
    }

    private static string Expectation(QuantityKindInfo info) =>
        info.Description + " such as " + info.Example + " or a number in " + info.CanonicalSymbol;

    /// <summary>
    /// Tries the unit as typed, then its ASCII spellings normalised to UnitsNet symbols. A symbol must match in case
    /// ('MM' is not 'mm', '10 MS' is not milliseconds): UnitsNet also matches regardless of case, and such a
    /// match is refused here rather than silently reinterpreted.
    /// </summary>
    private static bool TryUnit(string unitText, QuantityKindInfo info, out Enum? unit)
    {
        foreach (string candidate in Spellings(unitText, info.Kind))
        {
            if (UnitParser.Default.TryParse(candidate, info.UnitType, Invariant, out Enum? parsed) && ExactSymbol(candidate, info, parsed!))
            {
                unit = parsed;
                return true;
            }
        }

        unit = null;
        return false;
    }

    private static bool ExactSymbol(string candidate, QuantityKindInfo info, Enum parsed) =>
        UnitsNet.UnitAbbreviationsCache.Default.GetUnitAbbreviations(info.UnitType, Convert.ToInt32(parsed, Invariant), Invariant)
            .Any(a => string.Equals(a, candidate, StringComparison.Ordinal));

    /// <summary>The symbol a unit matches only when case is ignored ('ms' for 'MS'), or null.</summary>
    private static string? CaseInsensitiveMatch(string unitText, QuantityKindInfo info)
    {
        foreach (string candidate in Spellings(unitText, info.Kind))
        {
            if (UnitParser.Default.TryParse(candidate, info.UnitType, Invariant, out Enum? parsed))
            {
                return UnitsNet.UnitAbbreviationsCache.Default.GetDefaultAbbreviation(info.UnitType, Convert.ToInt32(parsed, Invariant), Invariant);
            }
        }

        return null;
    }

    private static string[] Spellings(string unitText, QuantityKind kind)
    {
        string s = unitText.Trim()
            .Replace('\u03BC', '\u00B5')   // Greek mu to the micro sign UnitsNet uses
            .Replace('\u00BA', '\u00B0');  // ordinal indicator typed for a degree sign
        s = Ohm.Replace(s, "Ω");
        s = OhmMetre.Replace(s, "Ω·${len}");
        s = PowerSuffix.Replace(s, m => m.Groups["pow"].Value == "2" ? "²" : "³");
        if (kind is QuantityKind.Temperature or QuantityKind.TemperatureDifference)
        {
            s = Regex.Replace(s, @"^(?i:deg(?:rees?)?\.?\s*)?C$", "°C", RegexOptions.CultureInvariant);
            s = Regex.Replace(s, @"^(?i:deg(?:rees?)?\.?\s*)F$", "°F", RegexOptions.CultureInvariant);
        }

        string micro = s.Length > 1 && s[0] == 'u' ? "µ" + s.Substring(1) : s;
        string words = s.ToLowerInvariant() switch
        {
            "gauss" => "G",
            "tesla" => "T",
            "hz" => "Hz",
            "khz" => "kHz",
            "sec" or "secs" or "second" or "seconds" => "s",
            "hrs" or "hour" or "hours" => "h",
            "mins" or "minute" or "minutes" => "min",
            "amp" or "amps" => "A",
            "kiloamp" or "kiloamps" or "kamp" or "kamps" => "kA",
            _ => s,
        };
        return new[] { unitText.Trim(), s, micro, words };
    }

    /// <summary>True when the text is a unit of the kind ("mm" for a length), as a column header may name it.</summary>
    public static bool IsUnitOf(string unitText, QuantityKind kind) => TryUnit(unitText, QuantityKindInfo.Of(kind), out _);

    /// <summary>Names the dimension of a unit string when UnitsNet knows the unit, else an empty string.</summary>
    private static string DimensionOf(string unitOrQuantity)
    {
        string unitText = TryNumberAndUnit(unitOrQuantity, out _, out string unit) && unit.Length > 0 ? unit : unitOrQuantity;
        foreach (QuantityKindInfo other in QuantityKindInfo.All)
        {
            if (TryUnit(unitText, other, out _))
            {
                return other.Description;
            }
        }

        return string.Empty;
    }

    private static string Display(object? input) => input switch
    {
        null => "(nothing)",
        IFormattable f => f.ToString(null, Invariant),
        _ => input.ToString() ?? string.Empty,
    };
}
