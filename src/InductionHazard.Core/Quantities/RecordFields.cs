using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InductionHazard.Errors;

namespace InductionHazard.Quantities;

/// <summary>
/// Reads the fields of one data record (a CSV row, a hashtable) by name, matching names without regard to case,
/// spaces, hyphens, underscores or dots, and through each field's aliases. Collects every problem as a
/// <see cref="FieldError"/> instead of stopping at the first, so one message can list them all.
/// </summary>
public sealed class RecordFields
{
    // Each field's value with its name as given and its place among the fields, by its normalized name; whether a read
    // has used it, by that place (made once the record is read: a row's reader asks a few of its few columns).
    private readonly Dictionary<string, (string Name, object? Value, int Index)> _values;
    private readonly bool[] _used;

    // Made when first needed: most records have no errors, no second spelling of a field and no units in their names,
    // and a row is read by several readers (its name, the item, its placement), each with its own fields.
    private List<FieldError>? _errors;
    private List<KeyValuePair<string, object?>>? _shadowed;
    private HashSet<string>? _conflictsReported;
    private Dictionary<string, string>? _unitByKey;
    private Dictionary<string, string>? _defaultUnits;

    // The quantities read, which a reader's plausibility check reads again: each read once, and its text offered once to
    // the parser's store, which keeps a text from its second sight on (a row's own size is not a repeat).
    private (string Field, string[] Aliases, QuantityKind Kind, double Value)[]? _quantities;
    private int _quantityCount;

    /// <summary>The units a name may carry after an underscore ("Diameter_mm"): a short list, so that "Holder_A" stays a name.</summary>
    private static readonly HashSet<string> UnderscoreUnits = new(StringComparer.Ordinal) { "mm", "cm", "um", "µm", "m", "in", "ms", "us", "s", "min", "degC", "mT", "uT", "kA", "Hz", "kHz" };

    private static readonly System.Text.RegularExpressions.Regex UnitInName = new(
        @"^\s*(?<name>[^\(\[]+?)\s*[\(\[]\s*(?<unit>[^\)\]]+?)\s*[\)\]]\s*$", System.Text.RegularExpressions.RegexOptions.CultureInvariant);

    /// <summary>Reads a record given as name-value pairs.</summary>
    /// <param name="record">The named values. A name may carry the unit of its bare numbers: "Diameter (mm)", "Diameter [mm]", "Diameter_mm".</param>
    /// <param name="defaultUnits">The unit of each field's bare numbers where the names do not say (a -Unit table), by field name.</param>
    public RecordFields(IEnumerable<KeyValuePair<string, object?>> record, IReadOnlyDictionary<string, string>? defaultUnits = null)
    {
        if (defaultUnits is not null)
        {
            foreach (KeyValuePair<string, string> unit in defaultUnits)
            {
                (_defaultUnits ??= new(StringComparer.Ordinal))[Normalize(unit.Key)] = unit.Value;
            }
        }

        // Sized for the record's columns where it says how many: a row's reader made its table grow twice.
        _values = new(record is IReadOnlyCollection<KeyValuePair<string, object?>> sized ? sized.Count : record is ICollection<KeyValuePair<string, object?>> counted ? counted.Count : 0, StringComparer.Ordinal);
        foreach (KeyValuePair<string, object?> given in record)
        {
            (string name, string? unitOfName) = SplitUnit(given.Key);
            var pair = new KeyValuePair<string, object?>(name, given.Value);
            string key = Normalize(pair.Key);
            if (unitOfName is not null && !(_unitByKey?.ContainsKey(key) ?? false))
            {
                (_unitByKey ??= new(StringComparer.Ordinal))[key] = unitOfName;
            }

            if (!_values.ContainsKey(key))
            {
                _values[key] = (pair.Key, pair.Value, _values.Count);
            }
            else
            {
                // A second column that means the same field ("WireDiameter" and "Wire Diameter"): kept to be checked.
                (_shadowed ??= new()).Add(pair);
            }
        }

        _used = new bool[_values.Count];
    }

    /// <summary>The problems found so far.</summary>
    public IReadOnlyList<FieldError> Errors => (IReadOnlyList<FieldError>?)_errors ?? Array.Empty<FieldError>();

    /// <summary>True when a field (or one of its aliases) holds a non-empty value.</summary>
    public bool Has(string field, params string[] aliases) => Find(field, aliases) is not null;

    /// <summary>Reads a quantity; null when absent (and an error when required).</summary>
    public double? Quantity(string field, QuantityKind kind, bool required, params string[] aliases)
    {
        for (int i = 0; i < _quantityCount; i++)
        {
            var read = _quantities![i];
            if (read.Kind == kind && string.Equals(read.Field, field, StringComparison.Ordinal)
                && (ReferenceEquals(read.Aliases, aliases) || read.Aliases.SequenceEqual(aliases, StringComparer.Ordinal)))
            {
                return _quantities[i].Value;
            }
        }

        object? raw = Raw(field, required, aliases);
        if (raw is null)
        {
            return null;
        }

        raw = WithColumnUnit(raw, field, kind, aliases, null);
        if (raw is null)
        {
            return null;
        }

        if (QuantityParser.TryParse(raw, kind, out double value, out string? error))
        {
            if (_quantityCount == (_quantities ??= new (string, string[], QuantityKind, double)[4]).Length)
            {
                Array.Resize(ref _quantities, 2 * _quantities.Length);
            }

            _quantities[_quantityCount++] = (field, aliases, kind, value);
            return value;
        }

        (_errors ??= new()).Add(new FieldError(field, error!, "InvalidQuantity"));
        return null;
    }

    /// <summary>
    /// A text that is a bare number with the unit its column names, or the -Unit table's, added: a spreadsheet's bare
    /// number is never taken to be SI. Null, with the error recorded (both fixes named), where neither names one or the
    /// unit named is not one of the kind. Anything else is returned as it is.
    /// </summary>
    /// <param name="raw">The value as given.</param>
    /// <param name="field">The field, for the unit's lookup and the message.</param>
    /// <param name="kind">The quantity the value must be.</param>
    /// <param name="aliases">The field's aliases.</param>
    /// <param name="example">How the whole field would be written with its unit, where the value is one part of it (a vector's component); null for the value itself.</param>
    private object? WithColumnUnit(object raw, string field, QuantityKind kind, string[] aliases, string? example)
    {
        if (raw is not string text || !QuantityParser.IsBareNumber(text) || IsZero(text))
        {
            return raw;
        }

        string? unit = UnitOf(field, aliases);
        if (unit is null)
        {
            (_errors ??= new()).Add(new FieldError(
                field,
                "'" + text.Trim() + "' has no unit; write it with its unit (for example '" + (example ?? text.Trim() + " " + Example(kind)) + "'), name the unit in the column header ('" + field + " (" + Example(kind) + ")'), or give -Unit @{ " + field + " = '" + Example(kind) + "' }",
                "MissingUnit"));
            return null;
        }

        if (!QuantityParser.IsUnitOf(unit, kind))
        {
            (_errors ??= new()).Add(new FieldError(field, "the unit '" + unit + "' named for this column is not a unit of " + QuantityKindInfo.Of(kind).Description.Substring(QuantityKindInfo.Of(kind).Description.IndexOf(' ') + 1), "InvalidQuantity"));
            return null;
        }

        return text.Trim() + " " + unit;
    }

    /// <summary>
    /// Reads a vector given whole in one field: a text of three components separated by commas or semicolons
    /// ("0.3 m, 0, 1.2 m"), three values, or a <see cref="Vector3D"/>; for a direction
    /// (<paramref name="kind"/> null) also an axis name ('z', '-x') or three numbers separated by spaces. Each
    /// component of a quantity follows the field's rules: a bare number in a text takes the unit the column names or
    /// the -Unit table's (a zero needs none), a number that is not text is in SI units. Null when absent or malformed
    /// (with the error recorded).
    /// </summary>
    /// <param name="field">The field.</param>
    /// <param name="kind">The quantity of each component, or null for plain numbers (a direction).</param>
    /// <param name="aliases">The field's aliases.</param>
    public Vector3D? Vector(string field, QuantityKind? kind, params string[] aliases)
    {
        object? raw = Raw(field, false, aliases);
        if (raw is null)
        {
            return null;
        }

        if (raw is not string text || kind is not { } k)
        {
            // A vector object or three values as they are; a direction's text by the parameter's own rules.
            try
            {
                return VectorParser.Parse(raw, field, kind);
            }
            catch (InvalidInputException ex)
            {
                AddError(field, ex.Reason, "InvalidQuantity");
                return null;
            }
        }

        // Semicolons, where the text has them, separate the components alone: a decimal comma in one ("0,3 m; 0; 0") is
        // then refused as the quantity's reader refuses it, naming it, rather than splitting the component in two.
        string inner = text.Trim().Trim('(', ')', '[', ']');
        string[] parts = inner.IndexOf(';') >= 0 ? inner.Split(';') : inner.Split(',');
        string example = k == QuantityKind.Length ? "0, 300 mm, 0" : "0, 0, 1.5 " + Example(k);
        if (parts.Length != 3)
        {
            AddError(field, "'" + text.Trim() + "' is not three components x, y, z separated by commas (for example '" + example + "')", "InvalidQuantity");
            return null;
        }

        var components = new double[3];
        for (int i = 0; i < 3; i++)
        {
            object? part = WithColumnUnit(parts[i].Trim(), field, k, aliases, example);
            if (part is null)
            {
                return null;
            }

            if (!QuantityParser.TryParse(part, k, out components[i], out string? error))
            {
                AddError(field, "component " + (i + 1) + " of '" + text.Trim() + "': " + error, "InvalidQuantity");
                return null;
            }
        }

        return new Vector3D(components[0], components[1], components[2]);
    }

    /// <summary>The unit the record's names or the -Unit table give a field's bare numbers, or null.</summary>
    private string? UnitOf(string field, string[] aliases)
    {
        foreach (string name in new[] { field }.Concat(aliases))
        {
            string key = Normalize(name);
            if (_values.TryGetValue(key, out var v) && !IsEmpty(v.Value) && _unitByKey is not null && _unitByKey.TryGetValue(key, out string? unit))
            {
                return unit;
            }
        }

        foreach (string name in new[] { field }.Concat(aliases))
        {
            if (_defaultUnits is not null && _defaultUnits.TryGetValue(Normalize(name), out string? unit))
            {
                return unit;
            }
        }

        return null;
    }

    private static bool IsZero(string text) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && v == 0;

    private static string Example(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "mm",
        QuantityKind.Time => "s",
        QuantityKind.Temperature => "degC",
        _ => QuantityKindInfo.Of(kind).CanonicalSymbol,
    };

    /// <summary>The named values of a table (a data file's hashtable), its keys as text.</summary>
    public static IEnumerable<KeyValuePair<string, object?>> FromTable(System.Collections.IDictionary table) =>
        table.Keys.Cast<object>().Select(k => new KeyValuePair<string, object?>(Convert.ToString(k, CultureInfo.InvariantCulture) ?? string.Empty, table[k]));

    /// <summary>
    /// Whether a record has a column for any of the fields (by <see cref="FieldKey"/>), found without making a reader of
    /// the whole record: a reader of a field most rows lack looks first.
    /// </summary>
    /// <param name="record">The named values.</param>
    /// <param name="fieldKeys">The fields' keys, normalized (a few in an array; a reader of many fields and aliases, a set).</param>
    public static bool HasColumn(IEnumerable<KeyValuePair<string, object?>> record, ICollection<string> fieldKeys)
    {
        foreach (KeyValuePair<string, object?> pair in record)
        {
            if (pair.Key is not null && fieldKeys.Contains(FieldKey(pair.Key)))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The key a column name matches fields by: normalized, without a unit ("Diameter (mm)" gives "diameter").</summary>
    public static string FieldKey(string column) => Normalize(SplitUnit(column).Name);

    /// <summary>"Diameter (mm)", "Diameter [mm]" and "Diameter_mm" are the field Diameter with bare numbers in mm.</summary>
    private static (string Name, string? Unit) SplitUnit(string name)
    {
        // Every row of a file has the same column names: each is split once.
        return SplitNames.TryGet(name, out (string Name, string? Unit) known) ? known : SplitNames.Add(name, SplitUnitOnce(name));
    }

    private static readonly BoundedCache<string, (string Name, string? Unit)> SplitNames = new(4096, StringComparer.Ordinal);

    private static (string Name, string? Unit) SplitUnitOnce(string name)
    {
        System.Text.RegularExpressions.Match m = UnitInName.Match(name);
        if (m.Success)
        {
            return (m.Groups["name"].Value, m.Groups["unit"].Value);
        }

        int underscore = name.LastIndexOf('_');
        if (underscore > 0 && underscore < name.Length - 1)
        {
            string suffix = name.Substring(underscore + 1);
            if (UnderscoreUnits.Contains(suffix))
            {
                return (name.Substring(0, underscore), suffix);
            }
        }

        return (name, null);
    }

    /// <summary>Reads a plain number (dimensionless or in a stated unit); null when absent.</summary>
    public double? Number(string field, bool required, params string[] aliases)
    {
        object? raw = Raw(field, required, aliases);
        if (raw is null)
        {
            return null;
        }

        string text = Convert.ToString(raw, CultureInfo.InvariantCulture)?.Trim() ?? string.Empty;
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) && Finite.Is(value))
        {
            return value;
        }

        (_errors ??= new()).Add(new FieldError(field, "'" + text + "' is not a finite number", "InvalidQuantity"));
        return null;
    }

    /// <summary>Reads text; null when absent (and an error when required).</summary>
    public string? Text(string field, bool required, params string[] aliases)
    {
        object? raw = Raw(field, required, aliases);
        return raw is null ? null : Convert.ToString(raw, CultureInfo.InvariantCulture)?.Trim();
    }

    /// <summary>Reads the raw value of a field; null when absent (and an error when required).</summary>
    public object? Raw(string field, bool required, params string[] aliases)
    {
        string? key = Find(field, aliases);
        if (key is null)
        {
            if (required)
            {
                (_errors ??= new()).Add(new FieldError(field, "is missing", "InvalidInput"));
            }

            return null;
        }

        (string _, object? value, int index) = _values[key];
        _used[index] = true;
        return value;
    }

    /// <summary>Reads a value of an enumeration by name (case-insensitive); null when absent.</summary>
    public TEnum? Choice<TEnum>(string field, bool required, params string[] aliases)
        where TEnum : struct, Enum
    {
        object? raw = Raw(field, required, aliases);
        if (raw is null)
        {
            return null;
        }

        if (raw is TEnum typed)
        {
            return typed;
        }

        string text = Convert.ToString(raw, CultureInfo.InvariantCulture)?.Trim() ?? string.Empty;
        foreach (string name in Enum.GetNames(typeof(TEnum)))
        {
            if (string.Equals(name, text, StringComparison.OrdinalIgnoreCase))
            {
                return (TEnum)Enum.Parse(typeof(TEnum), name);
            }
        }

        AddError(field, "'" + text + "' is not one of " + string.Join(", ", Enum.GetNames(typeof(TEnum))), "InvalidInput");
        return null;
    }

    /// <summary>Records a problem found by the caller.</summary>
    public void AddError(string field, string message, string errorId = "InvalidInput") =>
        (_errors ??= new()).Add(new FieldError(field, message, errorId));

    /// <summary>The form a record names: a Form value (aliases Kind, Type), or exactly one true switch named after a form.</summary>
    /// <exception cref="RecordException">No form, an unknown one, or more than one.</exception>
    public string Form(IReadOnlyList<string> forms, string label)
    {
        string? named = Text("Form", required: false, "Kind", "Type");
        if (named is not null)
        {
            string? match = forms.FirstOrDefault(f => string.Equals(f, named, StringComparison.OrdinalIgnoreCase));
            return match ?? throw new RecordException(label, new[] { new FieldError("Form", "'" + named + "' is not one of " + string.Join(", ", forms), "InvalidInput") });
        }

        string[] switched = forms.Where(f => Raw(f, required: false) is { } v && IsTrue(v)).ToArray();
        if (switched.Length != 1)
        {
            throw new RecordException(label, new[] { new FieldError("Form", (switched.Length == 0 ? "is missing" : "names more than one form") + ": give one of " + string.Join(", ", forms), "InvalidInput") });
        }

        return switched[0];
    }

    /// <summary>Records an error for every value no read has used, so that a misspelt name does not pass silently.</summary>
    /// <param name="message">What is wrong with such a value, after its name.</param>
    public void RejectUnused(string message)
    {
        foreach (string name in UnusedNames().ToArray())
        {
            AddError(name, message);
        }
    }

    /// <summary>True for a switch's value: true, "true" or "1".</summary>
    public static bool IsTrue(object value) => value switch
    {
        bool b => b,
        string s => string.Equals(s.Trim(), "true", StringComparison.OrdinalIgnoreCase) || s.Trim() == "1",
        _ => string.Equals(value.ToString(), "True", StringComparison.OrdinalIgnoreCase),
    };

    /// <summary>The record's field names (as given) that no read has used.</summary>
    public IEnumerable<string> UnusedNames() =>
        _values.Where(p => !_used[p.Value.Index] && !IsEmpty(p.Value.Value)).Select(p => p.Value.Name);

    /// <summary>Lower case, without spaces, hyphens, underscores and dots: "Wire Diameter" and "wire_diameter" match.</summary>
    public static string Normalize(string name)
    {
        // The same name objects come back on every row (the code's field names, a file's header): each is worked out
        // once. A value read from each row (a material's or a station's name) is a new string with the same text: found
        // by its text, and not kept by object, where it would crowd out the names that do come back.
        if (Normalized.TryGet(name, out string known) || NormalizedText.TryGet(name, out known))
        {
            return known;
        }

        known = NormalizeOnce(name);
        NormalizedText.Add(name, known);
        return Normalized.Add(name, known);
    }

    /// <summary>Names already normalized, by object: field names, their aliases and a file's columns come back on every row.</summary>
    private static readonly BoundedCache<string, string> Normalized = new(4096, SameObject<string>.Instance);

    /// <summary>Names already normalized, by text.</summary>
    private static readonly BoundedCache<string, string> NormalizedText = new(4096, System.StringComparer.Ordinal);

    private static string NormalizeOnce(string name)
    {
        var chars = new System.Text.StringBuilder(name.Length);
        foreach (char c in name)
        {
            if (!char.IsWhiteSpace(c) && c != '-' && c != '_' && c != '.')
            {
                chars.Append(c);
            }
        }

        return chars.ToString().ToLowerInvariant();
    }

    /// <summary>
    /// A field's name and aliases, normalized: found once per alias list (the readers pass the same list for a field
    /// on every row), or each time for a list seen with another field.
    /// </summary>
    private static string[] KeysOf(string field, string[] aliases)
    {
        if (KeysByAliases.TryGet(aliases, out (string Field, string[] Keys) known) && ReferenceEquals(known.Field, field))
        {
            return known.Keys;
        }

        var keys = new string[aliases.Length + 1];
        keys[0] = Normalize(field);
        for (int k = 0; k < aliases.Length; k++)
        {
            keys[k + 1] = Normalize(aliases[k]);
        }

        return KeysByAliases.Add(aliases, (field, keys)).Keys;
    }

    private static readonly BoundedCache<string[], (string Field, string[] Keys)> KeysByAliases = new(1024, SameObject<string[]>.Instance);

    private string? Find(string field, string[] aliases)
    {
        string? found = null;
        bool more = false;
        string[]? keys = aliases.Length == 0 ? null : KeysOf(field, aliases);
        for (int k = 0; k < (keys?.Length ?? 1); k++)
        {
            string key = keys is null ? Normalize(field) : keys[k];
            if (_values.TryGetValue(key, out var entry) && !IsEmpty(entry.Value))
            {
                more |= found is not null && found != key;
                found ??= key;
            }
        }

        // A field given by one column (and no second spelling of it) has nothing to compare.
        if (found is not null && (more || _shadowed is not null))
        {
            CheckOneValue(field, aliases);
        }

        return found;
    }

    /// <summary>
    /// Two columns that name the same field (through spelling or an alias) must agree: otherwise which one is meant
    /// cannot be known, and the record is refused for that field rather than the first silently winning.
    /// </summary>
    private void CheckOneValue(string field, string[] aliases)
    {
        if (_conflictsReported?.Contains(field) ?? false)
        {
            return;
        }

        // Most records give a field once: then there is nothing to compare.
        string? first = null;
        bool more = false;
        for (int k = -1; k < aliases.Length && !more; k++)
        {
            string key = Normalize(k < 0 ? field : aliases[k]);
            if (_values.TryGetValue(key, out var entry) && !IsEmpty(entry.Value))
            {
                more = first is not null && first != key;
                first ??= key;
            }
        }

        if (!more && _shadowed is null)
        {
            return;
        }

        var keys = new HashSet<string>(new[] { field }.Concat(aliases).Select(Normalize), StringComparer.Ordinal);
        var given = _values.Where(p => keys.Contains(p.Key) && !IsEmpty(p.Value.Value)).Select(p => new KeyValuePair<string, object?>(p.Value.Name, p.Value.Value))
            .Concat((_shadowed ?? Enumerable.Empty<KeyValuePair<string, object?>>()).Where(p => keys.Contains(Normalize(p.Key)) && !IsEmpty(p.Value)))
            .ToArray();
        string[] distinct = given.Select(p => Shown(p.Value)).Distinct(StringComparer.Ordinal).ToArray();
        if (distinct.Length > 1)
        {
            (_conflictsReported ??= new(StringComparer.Ordinal)).Add(field);
            (_errors ??= new()).Add(new FieldError(
                field,
                "is given by more than one column with different values (" + string.Join(", ", given.Select(p => "'" + p.Key + "' = '" + Shown(p.Value) + "'")) + "); keep one column",
                "InvalidInput"));
        }
    }

    private static string Shown(object? value) => Convert.ToString(value, CultureInfo.InvariantCulture)?.Trim() ?? string.Empty;

    private static bool IsEmpty(object? value) =>
        value is null || value is DBNull || (value is string s && s.Trim().Length == 0);
}
