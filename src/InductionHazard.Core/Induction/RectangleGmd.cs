using System;

namespace InductionHazard.Induction;

/// <summary>
/// The geometric mean distance (GMD) between two rectangles with sides along the same axes: ln GMD is the mean of
/// ln |p - q| over p in one and q in the other. Closed form by four-fold integration of ln r: with
/// F(u, v) = -u^4 ln(u^2 + v^2)/48 + u^3 v atan(v/u)/6 + u v^3 atan(u/v)/6 + u^2 v^2 ln(u^2 + v^2)/8 - 25 u^2 v^2/48
/// - v^4 ln(u^2 + v^2)/48, whose fourth mixed derivative d^4 F / du^2 dv^2 is ln sqrt(u^2 + v^2) (and which is smooth
/// enough across u = 0 and v = 0 for the corner sums), the integral is the sum over the corner differences
/// of F with signs. Derived for this module and checked against Grover's values (a square: 0.44705 a; a thin strip:
/// e^(-3/2) w) and the far-field limit ln d.
/// </summary>
public static class RectangleGmd
{
    /// <summary>
    /// ln GMD between the rectangles [r1a, r1b] x [z1a, z1b] and [r2a, r2b] x [z2a, z2b] (the same rectangle twice
    /// gives its GMD from itself), ln m.
    /// </summary>
    public static double LogGmd(double r1a, double r1b, double z1a, double z1b, double r2a, double r2b, double z2a, double z2b)
    {
        double sum = 0;
        for (int i = 0; i < 4; i++)
        {
            (double u, double su) = Corner(r1a, r1b, r2a, r2b, i);
            for (int j = 0; j < 4; j++)
            {
                (double v, double sv) = Corner(z1a, z1b, z2a, z2b, j);
                sum += su * sv * F(u, v);
            }
        }

        return sum / ((r1b - r1a) * (z1b - z1a) * (r2b - r2a) * (z2b - z2a));
    }

    /// <summary>The corner differences of one axis and their signs: b1 - a2 and a1 - b2 positive, a1 - a2 and b1 - b2 negative.</summary>
    private static (double Difference, double Sign) Corner(double a1, double b1, double a2, double b2, int which) => which switch
    {
        0 => (b1 - a2, 1.0),
        1 => (a1 - b2, 1.0),
        2 => (a1 - a2, -1.0),
        _ => (b1 - b2, -1.0),
    };

    private static double F(double u, double v)
    {
        double r2 = (u * u) + (v * v);
        if (r2 == 0)
        {
            return 0;
        }

        double log = Math.Log(r2);
        double u2 = u * u, v2 = v * v;
        double angular = u == 0 || v == 0 ? 0 : ((u2 * u * v * Math.Atan(v / u)) + (u * v2 * v * Math.Atan(u / v))) / 6;
        return (-u2 * u2 * log / 48) + angular + (u2 * v2 * log / 8) - (25 * u2 * v2 / 48) - (v2 * v2 * log / 48);
    }
}
