using System;

namespace InductionHazard.Waveforms;

/// <summary>Golden-section search for the maximum of a unimodal function on an interval (Kiefer 1953; any numerical-methods text).</summary>
internal static class GoldenSection
{
    private static readonly double InverseRatio = (Math.Sqrt(5) - 1) / 2;

    /// <summary>The argument in [a, b] at which f is largest, to within the tolerance.</summary>
    public static double Maximize(Func<double, double> f, double a, double b, double tolerance)
    {
        double c = b - (InverseRatio * (b - a));
        double d = a + (InverseRatio * (b - a));
        double fc = f(c), fd = f(d);
        for (int i = 0; i < 200 && b - a > tolerance; i++)
        {
            if (fc > fd)
            {
                b = d;
                d = c;
                fd = fc;
                c = b - (InverseRatio * (b - a));
                fc = f(c);
            }
            else
            {
                a = c;
                c = d;
                fc = fd;
                d = a + (InverseRatio * (b - a));
                fd = f(d);
            }
        }

        return 0.5 * (a + b);
    }
}
