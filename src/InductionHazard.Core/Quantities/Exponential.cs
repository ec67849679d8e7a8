using System;

namespace InductionHazard.Quantities;

/// <summary>Exponential functions the inner loops need, without allocation.</summary>
public static class Exponential
{
    /// <summary>1/(n + 1)! for n = 0..15: the coefficients of (e^x - 1) / x.</summary>
    private static readonly double[] C = BuildCoefficients(16);

    /// <summary>Below this |x| the Taylor series is summed (16 terms leave a relative error under 1e-19 there).</summary>
    private const double SeriesBelow = 0.5;

    /// <summary>
    /// e^x - 1 without the cancellation of Math.Exp(x) - 1 for small x: for |x| below 1/2 its Taylor series, x times
    /// sum x^n / (n + 1)!, with as many terms as |x| needs for a relative error under 1e-17 (5 below 1e-4, 8 below 1e-2,
    /// 16 up to 1/2), summed by Estrin's scheme (pairs of terms, then pairs of pairs: a short chain of dependent
    /// operations instead of one per term); above, Math.Exp(x) - 1 itself, whose subtraction there loses at most a bit
    /// or two (e^x is between 0.6 and 1.65 at |x| = 1/2, where the subtraction is exact by Sterbenz's lemma). No
    /// transcendental call and no allocation below 1/2.
    /// </summary>
    public static double Minus1(double x)
    {
        if (x < -40)
        {
            // e^x is below 5e-18, under half a unit in the last place of 1: the difference rounds to -1 exactly, and
            // the exponential is not asked (far below, it would take the runtime's underflow path).
            return -1.0;
        }

        double a = Math.Abs(x);
        if (!(a < SeriesBelow))
        {
            // Above 1/2 the subtraction loses at most a bit or two: e^x - 1 is within a few units in the last place.
            return Math.Exp(x) - 1.0;
        }

        // x + x^2 (1/2 + x/6 + ...): the leading term exact, the rest a correction at most a quarter of it, so its
        // rounding weighs little.
        double[] c = C;
        double x2 = x * x;
        if (a < 1e-4)
        {
            // The next term is below x^5 / 720 relative, under 2e-23.
            return x + (x2 * (c[1] + (x * (c[2] + (x * (c[3] + (x * c[4])))))));
        }

        double x4 = x2 * x2;
        if (a < 1e-2)
        {
            // Eight terms: the next is below x^8 / 9!, under 3e-22 relative.
            double low = (c[1] + (c[2] * x)) + ((c[3] + (c[4] * x)) * x2);
            double high = (c[5] + (c[6] * x)) + (c[7] * x2);
            return x + (x2 * (low + (high * x4)));
        }

        // Sixteen terms: the next is below x^16 / 17!, under 5e-20 relative at |x| = 1/2.
        double q0 = (c[1] + (c[2] * x)) + ((c[3] + (c[4] * x)) * x2);
        double q1 = (c[5] + (c[6] * x)) + ((c[7] + (c[8] * x)) * x2);
        double q2 = (c[9] + (c[10] * x)) + ((c[11] + (c[12] * x)) * x2);
        double q3 = (c[13] + (c[14] * x)) + (c[15] * x2);
        return x + (x2 * ((q0 + (q1 * x4)) + ((q2 + (q3 * x4)) * (x4 * x4))));
    }

    private static double[] BuildCoefficients(int count)
    {
        var c = new double[count];
        double factorial = 1;
        for (int n = 0; n < count; n++)
        {
            factorial *= n + 1;   // (n + 1)!, exact in a double up to 18!
            c[n] = 1.0 / factorial;
        }

        return c;
    }
}
