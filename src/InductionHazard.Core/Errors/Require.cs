using System.Globalization;
using InductionHazard.Quantities;

namespace InductionHazard.Errors;

/// <summary>Range checks on named inputs; each failure is an <see cref="InvalidInputException"/> naming the input.</summary>
public static class Require
{
    /// <summary>The value must be finite.</summary>
    public static double Finite(string field, double value)
    {
        if (!Quantities.Finite.Is(value))
        {
            throw new InvalidInputException(field, "must be a finite number; got " + Show(value));
        }

        return value;
    }

    /// <summary>The value must be finite and greater than zero.</summary>
    public static double Positive(string field, double value)
    {
        if (!Quantities.Finite.Is(value) || !(value > 0))
        {
            throw new InvalidInputException(field, "must be greater than zero; got " + Show(value));
        }

        return value;
    }

    /// <summary>The value must be finite and zero or more.</summary>
    public static double NonNegative(string field, double value)
    {
        if (!Quantities.Finite.Is(value) || value < 0)
        {
            throw new InvalidInputException(field, "must be zero or more; got " + Show(value));
        }

        return value;
    }

    /// <summary>The vector must be finite and non-zero.</summary>
    public static Vector3D Direction(string field, Vector3D value)
    {
        if (!value.IsFinite || (value.X == 0 && value.Y == 0 && value.Z == 0))
        {
            throw new InvalidInputException(field, "must be a finite, non-zero direction x,y,z; got " + value);
        }

        return value.Normalized();
    }

    private static string Show(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
