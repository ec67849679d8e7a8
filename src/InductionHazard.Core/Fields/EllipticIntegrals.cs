using System;

namespace InductionHazard.Fields;

/// <summary>
/// Complete elliptic integrals of the first and second kind by the arithmetic-geometric mean (Abramowitz and
/// Stegun 17.6; Carlson). The argument is the parameter m = k^2 (scipy's ellipk and ellipe take m too). And
/// Bulirsch's generalized complete elliptic integral, which a solenoid's field takes.
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
    /// <remarks>
    /// The sequence stops once c_n, the last step of the means, is below 1e-15 of them: each c is c_(n-1)^2 / (4 a_n),
    /// so the next step would move the mean by less than 1e-30 and add less than that to the sum. (A bound below the
    /// precision of a double, as this had, is never met where the two means settle one unit in the last place apart, as
    /// they do for about a quarter of all m: those ran to the 40-step limit, eight times the work.)
    /// </remarks>
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
        for (int n = 0; n < 40 && Math.Abs(c) > 1e-15 * a; n++)
        {
            double an = 0.5 * (a + b);
            c = 0.5 * (a - b);
            power *= 2;
            sum += power * c * c;
            if (!(Math.Abs(c) > 1e-15 * an))
            {
                // The sequence ends here: the next geometric mean (a square root, a sixth of the work) would not be used.
                a = an;
                break;
            }

            b = Math.Sqrt(a * b);
            a = an;
        }

        double k = Math.PI / (2 * a);
        return (k, k * (1 - sum));
    }

    /// <summary>
    /// Bulirsch's generalized complete elliptic integral, C(kc, p, c, s) = integral over 0..pi/2 of
    /// (c cos^2 t + s sin^2 t) / ((cos^2 t + p sin^2 t) sqrt(cos^2 t + kc^2 sin^2 t)) dt (Bulirsch, Numer. Math. 13, 305,
    /// 1969), by his iteration, which converges quadratically: stopped where successive means agree to 1e-8, which
    /// leaves an error of about its square. NaN for kc = 0.
    /// </summary>
    public static double Cel(double kc, double p, double c, double s)
    {
        if (kc == 0)
        {
            return double.NaN;
        }

        double k = Math.Abs(kc), pp = p, cc = c, ss = s, em = 1, f, g;
        if (p > 0)
        {
            pp = Math.Sqrt(p);
            ss = s / pp;
        }
        else
        {
            f = kc * kc;
            double q = 1 - f;
            g = 1 - pp;
            f -= pp;
            q *= ss - (c * pp);
            pp = Math.Sqrt(f / g);
            cc = (c - ss) / g;
            ss = (-q / (g * g * pp)) + (cc * pp);
        }

        double kk = k;
        for (int i = 0; ; i++)
        {
            f = cc;
            cc += ss / pp;
            g = kk / pp;
            ss = 2 * (ss + (f * g));
            pp = g + pp;
            g = em;
            em = k + em;
            if (i == 60 || !(Math.Abs(g - k) > g * 1e-8))
            {
                return Math.PI / 2 * (ss + (cc * em)) / (em * (em + pp));
            }

            k = 2 * Math.Sqrt(kk);
            kk = k * em;
        }
    }
}
