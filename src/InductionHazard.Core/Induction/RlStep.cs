using System;
using InductionHazard.Quantities;
using MathNet.Numerics.Integration;

namespace InductionHazard.Induction;

/// <summary>
/// The exact solution of L di/ds + R i = e0 + g s over one step with L and R fixed (an exponential integrator):
/// i(s) = i0 e^(-s/tau) + (e0/R)(1 - e^(-s/tau)) + (g/R)(s - tau (1 - e^(-s/tau))), tau = L/R.
/// Exact for an emf that is piecewise linear in time (a ramp's emf is piecewise constant).
/// </summary>
internal static class RlStep
{
    /// <summary>The 4-point Gauss-Legendre rule on [0, 1], read once (the library's getters copy the arrays on every read).</summary>
    private static readonly double[] Nodes = new GaussLegendreRule(0, 1, 4).Abscissas;

    private static readonly double[] Weights = new GaussLegendreRule(0, 1, 4).Weights;

    /// <summary>Up to this h / tau the energy is integrated by Gauss-Legendre (the closed form cancels there); beyond it, in closed form.</summary>
    private const double QuadratureUpToX = 0.25;

    /// <summary>Below this h / tau the step is a Taylor series of nine terms (the first left out is under 1e-18 of the current).</summary>
    private const double SeriesBelowX = 0.04;

    /// <summary>The current after s seconds.</summary>
    internal static double Current(Circuit rl, double i0, double e0, double slope, double s)
    {
        double tau = rl.Tau;
        double x = s * rl.InverseTau;
        double phi1 = -Exponential.Minus1(-x);              // 1 - e^(-x)
        double phi2 = x < 1e-4 ? tau * x * x * (0.5 - (x / 6) + (x * x / 24)) : s - (tau * phi1); // s - tau (1 - e^(-x)), without cancellation
        return (i0 * (1 - phi1)) + (e0 * rl.InverseR * phi1) + (slope * rl.InverseR * phi2);
    }

    /// <summary>
    /// One circuit's constants for a step: tau = L / R, 1 / tau and 1 / R, found once (a step's arithmetic then
    /// multiplies where it divided; divisions were much of a step's time).
    /// </summary>
    internal readonly struct Circuit
    {
        /// <summary>From a mode's time constant lambda at unit scale, its reciprocal, and 1 / s: tau = lambda / s, R = s.</summary>
        public Circuit(double lambda, double inverseLambda, double s, double inverseS)
        {
            InverseR = inverseS;
            Tau = lambda * inverseS;
            InverseTau = s * inverseLambda;
        }

        public double Tau { get; }

        public double InverseTau { get; }

        public double InverseR { get; }
    }

    /// <summary>
    /// The energy R times the integral of i^2 over [0, h], J. With i(s) = a + b s + c e^(-s/tau) (a = (e0 - g tau)/R,
    /// b = g/R, c = i0 - a): the closed form a^2 h + a b h^2 + b^2 h^3/3 + 2 a c tau (1 - e^-x) + 2 b c tau^2 (1 - e^-x (1 + x))
    /// + c^2 tau (1 - e^-2x)/2 for x = h/tau above a quarter; 4-point Gauss-Legendre on the exact current below it,
    /// where the closed form's terms cancel (its error there is below 1e-9 of the energy).
    /// </summary>
    private static double Energy(Circuit rl, double r, double i0, double e0, double slope, double h)
    {
        double x = h * rl.InverseTau;
        if (x >= SeriesBelowX && x <= QuadratureUpToX)
        {
            double sum = 0;
            for (int k = 0; k < Nodes.Length; k++)
            {
                double i = Current(rl, i0, e0, slope, Nodes[k] * h);
                sum += Weights[k] * i * i;
            }

            return r * sum * h;
        }

        return Advance(rl, r, i0, e0, slope, h).Energy;
    }

    /// <summary>
    /// The current at the end of a step of h and the step's energy R times the integral of i^2, J, sharing one
    /// exponential where the energy is in closed form. For h/tau below 0.04 (a step short against the circuit's time
    /// constant, the usual case for the slow modes of a body) the Taylor series of i in u = s/h: with sigma = x u the
    /// equation is di/dsigma + i = e0/R + (g tau/R) sigma, so i = sum b_n u^n with b_0 = i0, b_1 = (e0/R - i0) x,
    /// b_2 = (g tau/R - (e0/R - i0)) x^2 / 2, b_n = -b_(n-1) x / n; the end current is sum b_n and the energy
    /// R h sum_m sum_n b_m b_n / (m + n + 1), written out for the nine terms so that it runs in registers.
    /// </summary>
    internal static (double Current, double Energy) Advance(Circuit rl, double r, double i0, double e0, double slope, double h)
    {
        double tau = rl.Tau;
        double x = h * rl.InverseTau;
        if (x < SeriesBelowX)
        {
            double beta = e0 * rl.InverseR;
            double b0 = i0, b1 = (beta - i0) * x, b2 = ((slope * tau * rl.InverseR) - (beta - i0)) * x * x * 0.5;
            double b3 = -b2 * x * 0.3333333333333333;
            double b4 = -b3 * x * 0.25;
            double b5 = -b4 * x * 0.2;
            double b6 = -b5 * x * 0.16666666666666666;
            double b7 = -b6 * x * 0.14285714285714285;
            double b8 = -b7 * x * 0.125;
            double end = b0 + b1 + b2 + b3 + b4 + b5 + b6 + b7 + b8;

            // The constants are 1/(2m + 1) on the diagonal and 2/(m + n + 1) off it.
            double sum = (b0 * ((b0 * 1.0) + (b1 * 1.0) + (b2 * 0.6666666666666666) + (b3 * 0.5) + (b4 * 0.4) + (b5 * 0.3333333333333333) + (b6 * 0.2857142857142857) + (b7 * 0.25) + (b8 * 0.2222222222222222)))
                + (b1 * ((b1 * 0.3333333333333333) + (b2 * 0.5) + (b3 * 0.4) + (b4 * 0.3333333333333333) + (b5 * 0.2857142857142857) + (b6 * 0.25) + (b7 * 0.2222222222222222) + (b8 * 0.2)))
                + (b2 * ((b2 * 0.2) + (b3 * 0.3333333333333333) + (b4 * 0.2857142857142857) + (b5 * 0.25) + (b6 * 0.2222222222222222) + (b7 * 0.2) + (b8 * 0.18181818181818182)))
                + (b3 * ((b3 * 0.14285714285714285) + (b4 * 0.25) + (b5 * 0.2222222222222222) + (b6 * 0.2) + (b7 * 0.18181818181818182) + (b8 * 0.16666666666666666)))
                + (b4 * ((b4 * 0.1111111111111111) + (b5 * 0.2) + (b6 * 0.18181818181818182) + (b7 * 0.16666666666666666) + (b8 * 0.15384615384615385)))
                + (b5 * ((b5 * 0.09090909090909091) + (b6 * 0.16666666666666666) + (b7 * 0.15384615384615385) + (b8 * 0.14285714285714285)))
                + (b6 * ((b6 * 0.07692307692307693) + (b7 * 0.14285714285714285) + (b8 * 0.13333333333333333)))
                + (b7 * ((b7 * 0.06666666666666667) + (b8 * 0.125)))
                + (b8 * ((b8 * 0.058823529411764705)));

            return (end, r * h * sum);
        }

        if (x <= QuadratureUpToX)
        {
            return (Current(rl, i0, e0, slope, h), Energy(rl, r, i0, e0, slope, h));
        }

        double a = (e0 - (slope * tau)) * rl.InverseR, b = slope * rl.InverseR, c = i0 - a;
        // Beyond x = 746 e^-x is below half the smallest double and rounds to zero: not asked of the runtime's underflow path.
        double decay = x < 746 ? Math.Exp(-x) : 0;
        double integral = (a * a * h) + (a * b * h * h) + (b * b * h * h * h / 3)
            + (2 * a * c * tau * (1 - decay)) + (2 * b * c * tau * tau * (1 - (decay * (1 + x)))) + (c * c * tau * 0.5 * (1 - (decay * decay)));
        return (a + (b * h) + (c * decay), r * integral);
    }

    /// <summary>
    /// The largest |i| over [0, h] and where it occurs: the ends or the one interior extremum of i(s), with the current
    /// at the end as <see cref="Advance(Circuit, double, double, double, double, double)"/> found it (not found again).
    /// </summary>
    internal static (double Current, double At) Peak(Circuit rl, double i0, double e0, double slope, double h, double end)
    {
        (double current, double at) best = Math.Abs(end) > Math.Abs(i0) ? (end, h) : (i0, 0.0);

        // i(s) = a + b s + c e^(-s/tau); di/ds = 0 where e^(-s/tau) = b tau / c.
        double tau = rl.Tau;
        double b = slope * rl.InverseR;
        double c = i0 - (e0 * rl.InverseR) + (slope * tau * rl.InverseR);
        if (b != 0 && c != 0)
        {
            double ratio = b * tau / c;
            if (ratio > 0 && ratio < 1)
            {
                double s = -tau * Math.Log(ratio);
                if (s > 0 && s < h)
                {
                    double i = Current(rl, i0, e0, slope, s);
                    if (Math.Abs(i) > Math.Abs(best.current))
                    {
                        best = (i, s);
                    }
                }
            }
        }

        return best;
    }
}
