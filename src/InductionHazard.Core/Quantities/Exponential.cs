using System;

namespace InductionHazard.Quantities;

/// <summary>Exponential functions the inner loops need, without allocation.</summary>
public static class Exponential
{
    private static readonly double[] Reciprocals = BuildReciprocals(19);

    /// <summary>Below this |x| the Taylor series is summed (18 terms leave a relative error under 1e-21).</summary>
    private const double SeriesBelow = 0.5;

    /// <summary>
    /// e^x - 1 without the cancellation of Math.Exp(x) - 1 for small x: for |x| below 1/2 its Taylor series by
    /// Horner's rule (no transcendental call); above, Math.Exp(x) - 1 itself, whose subtraction there loses at most a
    /// bit or two (e^x is between 0.6 and 1.65 at |x| = 1/2, where the subtraction is exact by Sterbenz's lemma).
    /// It replaces the library's series, which allocates on every call.
    /// </summary>
    public static double Minus1(double x)
    {
        if (Math.Abs(x) < SeriesBelow)
        {
            // x (1 + x/2 (1 + x/3 (1 + ... (1 + x/N)))), with as many terms as |x| needs for a relative error under 1e-17.
            double a = Math.Abs(x);
            int terms = a < 1e-4 ? 5 : a < 1e-2 ? 8 : a < 0.1 ? 12 : 18;
            double p = 1;
            for (int n = terms; n >= 2; n--)
            {
                p = 1 + (x * p * Reciprocals[n]);
            }

            return x * p;
        }

        // Above 1/2 the subtraction loses at most a bit or two: e^x - 1 is within a few units in the last place.
        return Math.Exp(x) - 1.0;
    }

    private static double[] BuildReciprocals(int count)
    {
        var r = new double[count];
        for (int n = 1; n < count; n++)
        {
            r[n] = 1.0 / n;
        }

        return r;
    }
}
