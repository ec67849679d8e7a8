using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The mutual inductance of two parallel straight filaments d apart, one over [a1, b1] and the other over [a2, b2]
/// along their common direction (Neumann's integral; Grover 1946): M = (mu0 / 4 pi) [G(b1 - a2) + G(a1 - b2)
/// - G(a1 - a2) - G(b1 - b2)], G(u) = u asinh(u/d) - sqrt(u^2 + d^2). With d the GMD of a bar's section from itself
/// and the same interval twice it is the bar's partial self-inductance (mu0 / 2 pi)[l asinh(l/g) - sqrt(l^2 + g^2) + g].
/// </summary>
public static class ParallelSegments
{
    /// <summary>The mutual inductance, H.</summary>
    public static double MutualHenries(double a1, double b1, double a2, double b2, double d) =>
        PhysicalConstants.VacuumPermeability / (4 * Math.PI) * (G(b1 - a2, d) + G(a1 - b2, d) - G(a1 - a2, d) - G(b1 - b2, d));

    private static double G(double u, double d)
    {
        double r = Math.Sqrt((u * u) + (d * d));
        // u asinh(u/d) with asinh written as ln((|u| + r)/d), odd in u.
        return (u == 0 ? 0 : u * Math.Sign(u) * Math.Log((Math.Abs(u) + r) / d)) - r;
    }
}
