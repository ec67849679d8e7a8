using System;

namespace InductionHazard.Fields;

/// <summary>
/// Complete elliptic integrals of the first and second kind by the arithmetic-geometric mean (Abramowitz and
/// Stegun 17.6; Carlson). The argument is the parameter m = k^2 (scipy's ellipk and ellipe take m too).
/// </summary>
public static class EllipticIntegrals
{
    /// <summary>K(m) = integral from 0 to pi/2 of (1 - m sin^2 t)^(-1/2) dt, for 0 &lt;= m &lt; 1.</summary>
    public static double K(double m)
    {
        (double k, _) = Both(m);
        return k;
    }

    /// <summary>E(m) = integral from 0 to pi/2 of (1 - m sin^2 t)^(1/2) dt, for 0 &lt;= m &lt;= 1.</summary>
    public static double E(double m)
    {
        (_, double e) = Both(m);
        return e;
    }

    /// <summary>K(m) and E(m) together from one AGM sequence: K = pi / (2 AGM(1, sqrt(1 - m))), E = K (1 - sum 2^(n-1) c_n^2).</summary>
    public static (double K, double E) Both(double m)
    {
        if (!(m >= 0 && m <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(m), m, "the parameter m = k^2 must lie in [0, 1]");
        }

        if (m == 1)
        {
            return (double.PositiveInfinity, 1.0);
        }

        double a = 1, b = Math.Sqrt(1 - m), c = Math.Sqrt(m);
        double sum = 0.5 * c * c, power = 0.5;
        for (int n = 0; n < 40 && Math.Abs(c) > 1e-17 * a; n++)
        {
            double an = 0.5 * (a + b);
            c = 0.5 * (a - b);
            b = Math.Sqrt(a * b);
            a = an;
            power *= 2;
            sum += power * c * c;
        }

        double k = Math.PI / (2 * a);
        return (k, k * (1 - sum));
    }
}
