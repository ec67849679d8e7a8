namespace InductionHazard.Induction;

/// <summary>
/// The Kelvin functions ber, bei and their derivatives of order zero by their power series (Abramowitz and Stegun
/// 9.9.10): ber x = sum (-1)^k (x/2)^(4k) / ((2k)!)^2, bei x = sum (-1)^k (x/2)^(4k+2) / ((2k+1)!)^2, differentiated
/// term by term. For x up to <see cref="MaxX"/> the series converges in a few terms with no allocation, which the
/// general complex-Bessel route in MathNet.Numerics does not; the two are checked against each other.
/// </summary>
internal static class KelvinSeries
{
    /// <summary>The largest x for which the series is used: the terms then stay below about 1e3 times the result.</summary>
    public const double MaxX = 8.0;

    private const int Terms = 60;

    /// <summary>1 / ((2k + 1)(2k + 2))^2: term k + 1 of ber over term k, less the factor -h^4.</summary>
    private static readonly double[] BerRatios = Ratios(1);

    /// <summary>1 / ((2k + 2)(2k + 3))^2: the same for bei.</summary>
    private static readonly double[] BeiRatios = Ratios(2);

    private static double[] Ratios(int offset)
    {
        var ratios = new double[Terms];
        for (int k = 0; k < Terms; k++)
        {
            double a = (2.0 * k) + offset, b = a + 1;
            ratios[k] = 1 / (a * b * a * b);
        }

        return ratios;
    }

    /// <summary>ber x, bei x, ber' x and bei' x at once.</summary>
    public static (double Ber, double Bei, double BerPrime, double BeiPrime) Evaluate(double x)
    {
        double h = x / 2, q = h * h * h * h;
        double ber = 0, bei = 0, berP = 0, beiP = 0;

        // term_k of ber: (-1)^k h^(4k) / ((2k)!)^2; of bei: (-1)^k h^(4k+2) / ((2k+1)!)^2. Each term from the last by
        // a table of the reciprocal factors; the derivatives' sums (k times the term, and so on) divided by x once.
        double berTerm = 1, beiTerm = h * h;
        for (int k = 0; k < Terms; k++)
        {
            ber += berTerm;
            bei += beiTerm;
            berP += 4 * k * berTerm;
            beiP += ((4 * k) + 2) * beiTerm;
            berTerm *= -q * BerRatios[k];
            beiTerm *= -q * BeiRatios[k];
            if (System.Math.Abs(berTerm) < 1e-17 * System.Math.Abs(ber) && System.Math.Abs(beiTerm) < 1e-17 * System.Math.Abs(bei))
            {
                break;
            }
        }

        berP /= x;
        beiP /= x;
        return (ber, bei, berP, beiP);
    }
}
