using System;
using System.Numerics;
using InductionHazard.Quantities;
using MathNet.Numerics;

namespace InductionHazard.Induction;

/// <summary>Skin depth and the internal impedance of round wires.</summary>
public static class SkinEffect
{
    /// <summary>Above this x = sqrt2 a / delta the asymptotic series replaces the Kelvin functions (they grow as e^(x/sqrt2)).</summary>
    private const double AsymptoticFromX = 40.0;

    /// <summary>
    /// Skin depth delta = sqrt(2 rho / (omega mu)) = sqrt(rho / (pi f mu0 mu_r)), m (classical result; e.g. Ramo,
    /// Whinnery and Van Duzer, Fields and Waves in Communication Electronics).
    /// </summary>
    public static double SkinDepthMeters(double resistivityOhmMeters, double frequencyHertz, double relativePermeability = 1.0) =>
        Math.Sqrt(resistivityOhmMeters / (Math.PI * frequencyHertz * PhysicalConstants.VacuumPermeability * relativePermeability));

    /// <summary>
    /// The internal impedance per unit length of a straight round wire, relative to its d.c. resistance:
    /// (R + j omega L_int) / R_dc. With x = sqrt2 a / delta (Ramo, Whinnery and Van Duzer):
    /// R / R_dc = (x/2)(ber x bei' x - bei x ber' x) / (ber'^2 x + bei'^2 x),
    /// omega L_int / R_dc = (x/2)(ber x ber' x + bei x bei' x) / (ber'^2 x + bei'^2 x).
    /// Tends to 1 + j x^2/8 for a &lt;&lt; delta (the d.c. internal inductance mu0/(8 pi) per metre) and to
    /// a/(2 delta) + 1/4 + j a/(2 delta) for a &gt;&gt; delta. Kelvin functions by their power series up to x = 8
    /// (<see cref="KelvinSeries"/>), from MathNet.Numerics above.
    /// </summary>
    public static Complex RoundWireImpedanceRatio(double wireRadiusMeters, double skinDepthMeters)
    {
        double x = Math.Sqrt(2) * wireRadiusMeters / skinDepthMeters;
        if (x >= AsymptoticFromX)
        {
            // Z/R_dc = qa/2 + 1/4 + 3/(16 qa), qa = (1 + j) a / delta: the large-argument expansion of I0/I1.
            double u = wireRadiusMeters / skinDepthMeters;
            return new Complex((u / 2) + 0.25 + (3.0 / (32 * u)), (u / 2) - (3.0 / (32 * u)));
        }

        if (x < 1e-3)
        {
            return new Complex(1.0, x * x / 8);
        }

        (double ber, double bei, double berP, double beiP) = x <= KelvinSeries.MaxX
            ? KelvinSeries.Evaluate(x)
            : (SpecialFunctions.KelvinBer(x), SpecialFunctions.KelvinBei(x), SpecialFunctions.KelvinBerPrime(x), SpecialFunctions.KelvinBeiPrime(x));
        double scale = x / 2 / ((berP * berP) + (beiP * beiP));
        return new Complex(scale * ((ber * beiP) - (bei * berP)), scale * ((ber * berP) + (bei * beiP)));
    }
}
