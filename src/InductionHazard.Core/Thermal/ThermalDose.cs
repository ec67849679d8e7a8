using System;
using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Thermal;

/// <summary>
/// Cumulative equivalent minutes at 43 °C: CEM43 = sum R^(43 - T) dt (minutes), R = 0.5 at or above 43 °C and
/// 0.25 below (Sapareto and Dewey, Int J Radiat Oncol Biol Phys 10:787, 1984).
/// </summary>
public static class ThermalDose
{
    /// <summary>The breakpoint temperature of the dose model, °C.</summary>
    public const double BreakpointCelsius = 43.0;

    /// <summary>R at or above the breakpoint.</summary>
    public const double RateAbove = 0.5;

    /// <summary>R below the breakpoint.</summary>
    public const double RateBelow = 0.25;

    /// <summary>
    /// The dose of a temperature history taken as linear between samples, minutes. Each piece is integrated
    /// exactly (split where it crosses 43 °C), so the result does not depend on how finely a plateau is sampled.
    /// </summary>
    public static double Cem43Minutes(IReadOnlyList<HeatingSample> history)
    {
        double minutes = 0;
        for (int k = 1; k < history.Count; k++)
        {
            minutes += Segment(history[k - 1].TimeSeconds, history[k - 1].TemperatureCelsius, history[k].TimeSeconds, history[k].TemperatureCelsius);
        }

        return minutes;
    }

    /// <summary>
    /// The highest temperature of the range the dose relation was fitted on, °C: about 40-57 °C (from memory;
    /// Sapareto and Dewey 1984 and the data behind it). Above it the relation is extrapolation, and the contact
    /// temperature criterion governs instead.
    /// </summary>
    public const double FittedUpToCelsius = 57.0;

    private static readonly double LogRateAbove = Math.Log(RateAbove);

    private static readonly double LogRateBelow = Math.Log(RateBelow);

    /// <summary>
    /// The dose the heating adds over its baseline: CEM43 of the history less CEM43 of the item held at its
    /// starting temperature for the same time, minutes.
    /// </summary>
    public static double AddedCem43Minutes(IReadOnlyList<HeatingSample> history, double startCelsius) =>
        Added(new Pieces(history, startCelsius), startCelsius);

    private static double Added(Pieces pieces, double startCelsius) =>
        Scaled(pieces, startCelsius, 1) - Scaled(pieces, startCelsius, 0);

    /// <summary>
    /// The margin on the rise for a dose limit: the factor k on the temperature rise the field adds (T' = start +
    /// k (T - start)) at which the added dose reaches the limit, by Newton's steps kept inside a bracket on the
    /// exactly integrated dose (which grows with k). Infinity when nothing is added. Null when that factor would take the history above
    /// <see cref="FittedUpToCelsius"/>, where the relation does not hold: the dose cannot then be the criterion.
    /// </summary>
    public static double? RiseMargin(IReadOnlyList<HeatingSample> history, double startCelsius, double limitMinutes) =>
        RiseMargin(history, startCelsius, limitMinutes, out _);

    /// <summary>
    /// The same, and the dose the heating adds as it is (<see cref="AddedCem43Minutes"/>), which the search finds on its
    /// way: it starts from the history as it is, k = 1.
    /// </summary>
    public static double? RiseMargin(IReadOnlyList<HeatingSample> history, double startCelsius, double limitMinutes, out double addedMinutes)
    {
        // The history's times and rises read once, for the passes over it; the largest rise is the peak's (subtracting
        // the start keeps the order), NaN if any is.
        var pieces = new Pieces(history, startCelsius);
        double rise = double.NegativeInfinity;
        foreach (double r in pieces.Rises)
        {
            rise = Math.Max(rise, r);
        }

        double inRange = (FittedUpToCelsius - startCelsius) / rise;
        if (!(rise > 0) || !(inRange > 0))
        {
            addedMinutes = Added(pieces, startCelsius);
            return rise > 0 ? null : double.PositiveInfinity;
        }

        double baseline = Scaled(pieces, startCelsius, 0);
        addedMinutes = double.NaN;

        // G(k) = ln(added dose / limit) and its slope, in one pass. A scaled history far beyond the range overflows
        // the exponential: that dose is beyond any limit.
        double G(double k, out double slope, out double added)
        {
            added = Scaled(pieces, startCelsius, k, out double derivative, slope: true) - baseline;
            if (double.IsNaN(added) || double.IsPositiveInfinity(added))
            {
                slope = double.NaN;
                return double.PositiveInfinity;
            }

            slope = derivative / added;
            return added > 0 ? Math.Log(added / limitMinutes) : double.NegativeInfinity;
        }

        // The added dose grows with k from 0 at k = 0, close to exponentially (the CEM43 rate is 2 per kelvin above
        // 43 degC), so its logarithm G is nearly linear in k: Newton's steps on G from the history as it is (k = 1, or
        // the range's end if nearer), kept inside the bracket [0, inRange] (a bisection step wherever Newton's would
        // leave it, or G or its slope is not finite). The range's end is looked at only when a step would pass it or
        // the root lies far off: there G below zero means the limit is not reached within the range. The first step
        // from k = 1 goes where an exponentially growing dose with G's value and slope there would meet the limit
        // (ExponentialGuess). Three to five passes over the history besides the baseline's (which takes no
        // exponential), the first giving the added dose as it is.
        double low = 0, high = inRange;
        double x = Math.Min(1, inRange);
        double gx = G(x, out double gSlope, out double addedAtX);
        if (x == 1)
        {
            addedMinutes = addedAtX;
        }

        bool highKnown = x == inRange, unreached = false;
        if (highKnown && gx < 0)
        {
            addedMinutes = Added(pieces, startCelsius);
            return null;
        }

        for (int i = 0; i < 200 && high - low > 1e-12 * high; i++)
        {
            if (Math.Abs(gx) < 1e-13)
            {
                // The dose at x is the limit to 1e-13 relative: x is the root to about that, over the log's slope.
                break;
            }

            if (gx < 0)
            {
                low = x;
            }
            else
            {
                (high, highKnown) = (x, true);
            }

            double newton = x - (gx / gSlope);
            bool inside = Finite.Is(gx) && gSlope > 0 && newton > low && newton < high;
            if (inside && Math.Abs(newton - x) <= 1e-7 * x)
            {
                // A step this small lands within about its square of the root, relative to the factor (G is smooth, its
                // curvature over its slope about 1/k or less): some 1e-14, with no need to evaluate there.
                x = newton;
                gx = 0;
                break;
            }

            if (i == 0 && x == 1 && Finite.Is(gx) && gSlope > 0 && ExponentialGuess(gx, gSlope) is var guess && guess > low && guess < high)
            {
                // The first step from the history as it is: where a dose growing as C (e^(a k) - 1) with G's value and
                // slope at k = 1 meets the limit. Exact for a plateau, close for most histories (Newton's step on G alone
                // undershoots where the dose is still nearly linear in k, and creeps up on a far root); Newton's steps
                // go on from there as before, so the root found is the same.
                x = guess;
                gx = G(x, out gSlope, out _);
                continue;
            }

            if (!highKnown && (!inside || newton > 8 * x))
            {
                // The step leaves the part known to hold the root, or the root lies far off (where the dose still
                // grows about linearly in k and Newton's steps on its log would creep up on it): first whether the
                // range's end reaches the limit, then on from there.
                (x, highKnown) = (inRange, true);
                gx = G(x, out gSlope, out _);
                if (gx < 0)
                {
                    unreached = true;
                    break;
                }

                continue;
            }

            x = inside ? newton : 0.5 * (low + high);
            gx = G(x, out gSlope, out _);
        }

        if (double.IsNaN(addedMinutes))
        {
            addedMinutes = Added(pieces, startCelsius);
        }

        if (unreached)
        {
            return null;
        }

        if (Math.Abs(gx) < 1e-13)
        {
            return x;
        }

        // The bracket has closed: the root lies in it, once the range's end is known to reach the limit.
        if (!highKnown && G(inRange, out _, out _) < 0)
        {
            return null;
        }

        return 0.5 * (low + high);
    }

    /// <summary>
    /// The factor at which a dose D(k) = C (e^(a k) - 1) meets the limit, given G(1) = ln(D(1) / limit) and G'(1) =
    /// a e^a / (e^a - 1): a from the slope (by Newton's steps; the slope is at least 1, the linear dose's), then
    /// k = ln(1 + e^(-G(1)) (e^a - 1)) / a. Only a first step: the caller takes it only inside the bracket.
    /// </summary>
    private static double ExponentialGuess(double g1, double slope)
    {
        if (!(slope > 1 + 1e-9))
        {
            // A dose linear in k (a rise far too small for the weight to curve): k = limit / D(1).
            return Math.Exp(-g1);
        }

        // h(a) = a / (1 - e^(-a)) = slope: h runs from 1 (a = 0) up, about 1 + a/2 near 0 and a + a e^(-a) far off.
        double a = slope > 2 ? slope : 2 * (slope - 1);
        for (int i = 0; i < 30; i++)
        {
            double e = Math.Exp(-a), q = 1 - e;
            double h = a / q, dh = (q - (a * e)) / (q * q);
            double next = a - ((h - slope) / dh);
            next = next > 0 ? next : 0.5 * a;
            if (Math.Abs(next - a) <= 1e-12 * a)
            {
                a = next;
                break;
            }

            a = next;
        }

        // ln(1 + y) with y = e^(-G(1)) (e^a - 1), taken in logarithms where y would overflow.
        double logY = -g1 + Math.Log(Exponential.Minus1(a));
        double log1PlusY = logY > 36 ? logY : Math.Log(1 + Math.Exp(logY));
        return log1PlusY / a;
    }

    /// <summary>The dose of the history with its rise over the start scaled by k, minutes.</summary>
    /// <remarks>
    /// Each piece integrates exactly as <see cref="Segment"/> does, written as the logarithmic mean of the weights
    /// R^(43 - T) at its ends, (w1 - w0) / ln(w1 / w0) times its length, so that each sample's weight is one
    /// exponential shared by the two pieces beside it; a piece whose weights differ by less than 0.1 % takes the
    /// series of e^x - 1 instead (no cancellation). The root search for the margin calls this five or six times.
    /// </remarks>
    private static double Scaled(Pieces pieces, double startCelsius, double k) => Scaled(pieces, startCelsius, k, out _, slope: false);

    /// <summary>A history's sample times and rises over the start, read once for several passes.</summary>
    private readonly struct Pieces
    {
        public Pieces(IReadOnlyList<HeatingSample> history, double startCelsius)
        {
            Times = new double[history.Count];
            Rises = new double[history.Count];
            for (int i = 0; i < Times.Length; i++)
            {
                Times[i] = history[i].TimeSeconds;
                Rises[i] = history[i].TemperatureCelsius - startCelsius;
            }
        }

        public double[] Times { get; }

        public double[] Rises { get; }
    }

    /// <summary>The same, and with <paramref name="slope"/> its derivative in k, minutes per unit k (for Newton's steps).</summary>
    private static double Scaled(Pieces pieces, double startCelsius, double k, out double derivative, bool slope)
    {
        double[] times = pieces.Times, rises = pieces.Rises;
        derivative = 0;
        if (k == 0 && !slope)
        {
            // Held at the start throughout: one weight over the whole span.
            double seconds = 0;
            for (int i = 1; i < times.Length; i++)
            {
                seconds += Math.Max(0, times[i] - times[i - 1]);
            }

            return Weight(startCelsius) * seconds / 60.0;
        }

        // Summed as weight times seconds and turned into minutes once at the end.
        double weighted = 0, perK = 0;
        double ta = times[0];
        double ra = rises[0];
        double ca = startCelsius + (k * ra);
        double wa = Weight(ca);
        int chained = 0;
        for (int i = 1; i < times.Length; i++)
        {
            double tb = times[i];
            double rb = rises[i];
            double cb = startCelsius + (k * rb);
            // A sample at the same rise as the last (a plateau's, which the heating samples hourly) has its weight.
            double wb = rb == ra ? wa : NextWeight(wa, ca, cb, ref chained);
            double span = tb - ta;
            if (span > 0)
            {
                if ((ca - BreakpointCelsius) * (cb - BreakpointCelsius) < 0)
                {
                    // Split where it crosses 43 degC, where the weight is 1 at either rate (so the split's own motion
                    // with k adds nothing to the derivative).
                    double before = span * (BreakpointCelsius - ca) / (cb - ca);
                    double rc = ra + ((rb - ra) * (before / span));
                    (double first, double firstPerK) = LogMean(wa, 1, ca, BreakpointCelsius, ra, rc, LogRate(ca), before, slope);
                    (double second, double secondPerK) = LogMean(1, wb, BreakpointCelsius, cb, rc, rb, LogRate(cb), span - before, slope);
                    weighted += first + second;
                    perK += firstPerK + secondPerK;
                }
                else
                {
                    (double piece, double piecePerK) = LogMean(wa, wb, ca, cb, ra, rb, LogRate(0.5 * (ca + cb)), span, slope);
                    weighted += piece;
                    perK += piecePerK;
                }
            }

            (ta, ra, ca, wa) = (tb, rb, cb, wb);
        }

        derivative = perK / 60.0;
        return weighted / 60.0;
    }

    /// <summary>ln R for a temperature's side of 43 degC.</summary>
    private static double LogRate(double celsius) => celsius >= BreakpointCelsius ? LogRateAbove : LogRateBelow;

    /// <summary>
    /// The weight at <paramref name="cb"/> from <paramref name="wa"/> at <paramref name="ca"/> beside it: where both
    /// lie on one side of 43 degC and the exponent between them, x, is below 1e-3, wa (1 + x (e^x - 1) / x) by the
    /// series <see cref="LogMean"/> takes for the piece (no exponential: the samples of a current settling, a few
    /// microkelvin apart, take most of a margin's passes); else R^(43 - T) afresh. A run of such steps restarts from
    /// an exponential every 64 samples, so that their rounding (an ulp or two each) stays below some 1e-14.
    /// </summary>
    private static double NextWeight(double wa, double ca, double cb, ref int chained)
    {
        double logRate = LogRate(cb);
        if (chained < 64 && LogRate(ca) == logRate)
        {
            double x = -logRate * (cb - ca);
            if (Math.Abs(x) < 1e-3)
            {
                chained++;
                return wa + (wa * x * ExpMinus1OverX(x));
            }
        }

        chained = 0;
        return Weight(cb);
    }

    /// <summary>(e^x - 1) / x for |x| below 1e-3, to five terms: the next is below x^5 / 720, under 2e-18.</summary>
    private static double ExpMinus1OverX(double x) => 1 + (x * 0.5 * (1 + (x * (1.0 / 3) * (1 + (x * 0.25 * (1 + (x * 0.2)))))));

    /// <summary>R^(43 - T) at a temperature, with R for that temperature's side of 43 degC (1 at 43 degC on either).</summary>
    private static double Weight(double celsius) =>
        Math.Exp((celsius >= BreakpointCelsius ? LogRateAbove : LogRateBelow) * (BreakpointCelsius - celsius));

    /// <summary>
    /// The integral of r^(43 - T) over a piece where T runs linearly from c0 to c1 and the weights are w0 and w1,
    /// seconds (weight times time); with <paramref name="slope"/>, also its derivative in k when T = start + k rise, the
    /// rise running from rise0 to rise1: -ln r times the integral of rise times the weight (zero without).
    /// </summary>
    /// <remarks>
    /// The series multiply by their coefficients' reciprocals rather than divide (the compiler keeps x / 3 a division),
    /// and the derivative is returned rather than added through a reference, which kept the running sum in memory:
    /// together some 4 % of the margin's time.
    /// </remarks>
    private static (double Weighted, double PerK) LogMean(double w0, double w1, double c0, double c1, double rise0, double rise1, double logRate, double seconds, bool slope)
    {
        double x = -logRate * (c1 - c0);  // ln(w1 / w0)
        double mean, inverse = 0;
        if (Math.Abs(x) < 1e-3)
        {
            mean = w0 * ExpMinus1OverX(x);
        }
        else
        {
            inverse = 1 / x;
            mean = (w1 - w0) * inverse;
        }

        if (!slope)
        {
            return (seconds * mean, 0);
        }

        // w0 times the integral of u e^(x u) over [0, 1]: (e^x (x - 1) + 1) / x^2, or its series for small x (for a
        // Newton step, whose accuracy only sets how fast the root is reached).
        double firstMoment = Math.Abs(x) < 1e-2
            ? w0 * (0.5 + (x * ((1.0 / 3) + (x * (0.125 + (x * ((1.0 / 30) + (x * (1.0 / 144)))))))))
            : ((w1 * (x - 1)) + w0) * inverse * inverse;
        return (seconds * mean, -logRate * seconds * ((rise0 * mean) + ((rise1 - rise0) * firstMoment)));
    }

    /// <summary>The dose of a constant temperature held for a time, minutes.</summary>
    public static double Cem43Minutes(double celsius, double seconds) =>
        Math.Pow(Rate(celsius), BreakpointCelsius - celsius) * seconds / 60.0;

    private static double Rate(double celsius) => celsius >= BreakpointCelsius ? RateAbove : RateBelow;

    private static double Segment(double t0, double c0, double t1, double c1)
    {
        if (!(t1 > t0))
        {
            return 0;
        }

        bool crosses = (c0 - BreakpointCelsius) * (c1 - BreakpointCelsius) < 0;
        if (crosses)
        {
            double tc = t0 + ((t1 - t0) * (BreakpointCelsius - c0) / (c1 - c0));
            return Piece(t0, c0, tc, BreakpointCelsius, Rate(c0)) + Piece(tc, BreakpointCelsius, t1, c1, Rate(c1));
        }

        return Piece(t0, c0, t1, c1, Rate(0.5 * (c0 + c1)));
    }

    /// <summary>The integral of r^(43 - T) over a piece where T is linear and r fixed, minutes.</summary>
    private static double Piece(double t0, double c0, double t1, double c1, double r)
    {
        double minutes = (t1 - t0) / 60.0;
        double logRate = r == RateAbove ? LogRateAbove : r == RateBelow ? LogRateBelow : Math.Log(r);
        double k = -logRate * (c1 - c0);  // exponent change over the piece
        double start = Math.Exp(logRate * (BreakpointCelsius - c0));
        double factor = Math.Abs(k) < 1e-12 ? 1.0 : Quantities.Exponential.Minus1(k) / k;
        return start * minutes * factor;
    }
}
