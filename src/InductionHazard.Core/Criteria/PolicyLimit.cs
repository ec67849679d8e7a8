using System;
using InductionHazard.Quantities;

namespace InductionHazard.Criteria;

/// <summary>One value a policy sets: its key, its value in SI with the unit, where it comes from, and what it means.</summary>
/// <param name="Key">The key, as a policy file names it.</param>
/// <param name="Value">The value, in <paramref name="Unit"/>.</param>
/// <param name="Unit">The unit ("V", "s", "CEM43 min"; empty for a plain number).</param>
/// <param name="Source">The published source, or "site policy '...'" where the site set it.</param>
/// <param name="Description">What the value limits.</param>
public sealed record PolicyLimit(string Key, double Value, string Unit, string Source, string Description)
{
    /// <summary>The value with its unit, for people: "50 V", "2", "2 CEM43 min".</summary>
    public string ValueText => double.IsNaN(Value) ? "not set" : Unit.Length == 0 ? SiFormat.Plain(Value) : Unit.Contains(" ") ? SiFormat.Plain(Value) + " " + Unit : SiFormat.Format(Value, Unit);

    /// <summary>"AlternatingVoltageLimit = 50 V (IEC 61140 ...)".</summary>
    public override string ToString() => Key + " = " + ValueText + " (" + Source + ")";
}

/// <summary>A key a policy file may set: its name, its kind of quantity, how to read it from a policy and its published source.</summary>
/// <param name="Name">The key.</param>
/// <param name="Kind">The kind of quantity; null for a plain number.</param>
/// <param name="Unit">The SI unit the value is held in.</param>
/// <param name="Value">Reads the value from a policy.</param>
/// <param name="Published">Where the default comes from.</param>
/// <param name="Description">What it limits.</param>
/// <param name="Optional">True for a value no standard gives, NaN (not applied) unless a site sets it.</param>
public sealed record PolicyKey(string Name, QuantityKind? Kind, string Unit, Func<HazardPolicy, double> Value, string Published, string Description, bool Optional = false);
