namespace InductionHazard.Quantities;

/// <summary>Finite-number checks (netstandard2.0 has no double.IsFinite).</summary>
public static class Finite
{
    /// <summary>True when the value is neither NaN nor an infinity.</summary>
    public static bool Is(double value) => !double.IsNaN(value) && !double.IsInfinity(value);

    /// <summary>True when every value is finite.</summary>
    public static bool All(params double[] values)
    {
        foreach (double v in values)
        {
            if (!Is(v))
            {
                return false;
            }
        }

        return true;
    }
}
