using System;
using MathNet.Numerics;
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

    /// <summary>The current after s seconds.</summary>
    public static double Current(double l, double r, double i0, double e0, double slope, double s)
    {
        double tau = l / r;
        double x = s / tau;
        double phi1 = -SpecialFunctions.Expm1(-x);               // 1 - e^(-x)
        double phi2 = x < 1e-4 ? tau * x * x * (0.5 - (x / 6) + (x * x / 24)) : s - (tau * phi1); // s - tau (1 - e^(-x)), without cancellation
        return (i0 * (1 - phi1)) + (e0 / r * phi1) + (slope / r * phi2);
    }

    /// <summary>
    /// The energy R times the integral of i^2 over [0, h], J. With i(s) = a + b s + c e^(-s/tau) (a = (e0 - g tau)/R,
    /// b = g/R, c = i0 - a): the closed form a^2 h + a b h^2 + b^2 h^3/3 + 2 a c tau (1 - e^-x) + 2 b c tau^2 (1 - e^-x (1 + x))
    /// + c^2 tau (1 - e^-2x)/2 for x = h/tau above a quarter; 4-point Gauss-Legendre on the exact current below it,
    /// where the closed form's terms cancel (its error there is below 1e-9 of the energy).
    /// </summary>
    public static double Energy(double l, double r, double i0, double e0, double slope, double h)
    {
        double tau = l / r;
        double x = h / tau;
        if (x <= QuadratureUpToX)
        {
            double sum = 0;
            for (int k = 0; k < Nodes.Length; k++)
            {
                double i = Current(l, r, i0, e0, slope, Nodes[k] * h);
                sum += Weights[k] * i * i;
            }

            return r * sum * h;
        }

        return Advance(l, r, i0, e0, slope, h).Energy;
    }

    /// <summary>The current at the end of a step of h and the step's energy R times the integral of i^2, J, sharing one exponential where the energy is in closed form.</summary>
    public static (double Current, double Energy) Advance(double l, double r, double i0, double e0, double slope, double h)
    {
        double tau = l / r;
        double x = h / tau;
        if (x <= QuadratureUpToX)
        {
            return (Current(l, r, i0, e0, slope, h), Energy(l, r, i0, e0, slope, h));
        }

        double a = (e0 - (slope * tau)) / r, b = slope / r, c = i0 - a;
        double decay = Math.Exp(-x);
        double integral = (a * a * h) + (a * b * h * h) + (b * b * h * h * h / 3)
            + (2 * a * c * tau * (1 - decay)) + (2 * b * c * tau * tau * (1 - (decay * (1 + x)))) + (c * c * tau * 0.5 * (1 - (decay * decay)));
        return (a + (b * h) + (c * decay), r * integral);
    }

    /// <summary>The largest |i| over [0, h] and where it occurs: the ends or the one interior extremum of i(s).</summary>
    public static (double Current, double At) Peak(double l, double r, double i0, double e0, double slope, double h)
    {
        double end = Current(l, r, i0, e0, slope, h);
        (double current, double at) best = Math.Abs(end) > Math.Abs(i0) ? (end, h) : (i0, 0.0);

        // i(s) = a + b s + c e^(-s/tau); di/ds = 0 where e^(-s/tau) = b tau / c.
        double tau = l / r;
        double b = slope / r;
        double c = i0 - (e0 / r) + (slope * tau / r);
        if (b != 0 && c != 0)
        {
            double ratio = b * tau / c;
            if (ratio > 0 && ratio < 1)
            {
                double s = -tau * Math.Log(ratio);
                if (s > 0 && s < h)
                {
                    double i = Current(l, r, i0, e0, slope, s);
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
