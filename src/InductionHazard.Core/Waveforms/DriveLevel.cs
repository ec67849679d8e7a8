using System;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>A value of a drive with what it measures: 3 T, 40 kA, or a bare 2.</summary>
public readonly struct DriveLevel : IEquatable<DriveLevel>
{
    /// <summary>Creates the level.</summary>
    public DriveLevel(double value, DriveKind kind)
    {
        Value = value;
        Kind = kind;
    }

    /// <summary>The value in tesla, amperes, or unspecified units.</summary>
    public double Value { get; }

    /// <summary>What the value measures.</summary>
    public DriveKind Kind { get; }

    /// <summary>Equality of value and kind.</summary>
    public static bool operator ==(DriveLevel a, DriveLevel b) => a.Equals(b);

    /// <summary>Inequality of value or kind.</summary>
    public static bool operator !=(DriveLevel a, DriveLevel b) => !a.Equals(b);

    /// <summary>Reads a level: a flux density ('3 T', '150 G'), a current ('40 kA'), a bare number, or a level.</summary>
    /// <exception cref="Errors.QuantityFormatException">The value is neither.</exception>
    public static DriveLevel Parse(object? input)
    {
        if (input is DriveLevel level)
        {
            return level;
        }

        (double value, QuantityKind? kind) = QuantityParser.ParseOneOf(input, QuantityKind.MagneticFluxDensity, QuantityKind.ElectricCurrent);
        return new DriveLevel(value, kind switch
        {
            QuantityKind.MagneticFluxDensity => DriveKind.FluxDensity,
            QuantityKind.ElectricCurrent => DriveKind.Current,
            _ => DriveKind.Unspecified,
        });
    }

    /// <summary>The kind shared by two levels (a bare number takes the other's kind); null when they disagree.</summary>
    public static DriveKind? Common(DriveLevel a, DriveLevel b)
    {
        if (a.Kind == DriveKind.Unspecified)
        {
            return b.Kind;
        }

        return b.Kind == DriveKind.Unspecified || b.Kind == a.Kind ? a.Kind : null;
    }

    /// <inheritdoc />
    public bool Equals(DriveLevel other) => Value.Equals(other.Value) && Kind == other.Kind;

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is DriveLevel other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (Value.GetHashCode() * 397) ^ (int)Kind;

    /// <summary>"3 T", "40 kA".</summary>
    public override string ToString() => SiFormat.Format(Value, Kind switch
    {
        DriveKind.FluxDensity => "T",
        DriveKind.Current => "A",
        _ => string.Empty,
    }).Trim();
}
