using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// Self-inductance of a rectangular loop, sides a and b, by Maxwell's GMD method as Grover builds it (Inductance
/// Calculations, 1946): the four straight sides, each side's self-inductance the mutual inductance of two parallel
/// filaments of its length one GMD apart, less the mutual inductances of the opposite sides (which carry opposite
/// currents); perpendicular sides do not couple. L = 2 M(a, g) + 2 M(b, g) - 2 M(a, b) - 2 M(b, a), with
/// M(l, d) = (mu0 / 2 pi) [l asinh(l / d) - sqrt(l^2 + d^2) + d] for parallel filaments (Grover). Keeping the
/// "+ d" terms, this is Grover's rectangle formula without its thin-wire truncation.
/// </summary>
public static class RectangleInductance
{
    /// <summary>The inductance for a uniform current: g is the section's geometric-mean radius (a e^(-1/4) for a round wire), H.</summary>
    public static double UniformCurrentHenries(double a, double b, double gmdRadiusMeters) => Loop(a, b, gmdRadiusMeters);

    /// <summary>The external inductance of round wire of radius rho (surface current, the high-frequency limit), H.</summary>
    public static double ExternalHenries(double a, double b, double wireRadiusMeters) => Loop(a, b, wireRadiusMeters);

    /// <summary>Mutual inductance of two parallel straight filaments of length l, d apart, side by side (Grover 1946), H.</summary>
    public static double ParallelFilamentsHenries(double l, double d) => ParallelSegments.MutualHenries(0, l, 0, l, d);

    /// <summary>The inductance of the loop for a conductor whose section has geometric-mean distance g to itself or to another (Grover's GMD method), H.</summary>
    public static double WithGmdHenries(double a, double b, double g) => Loop(a, b, g);

    private static double Loop(double a, double b, double g) =>
        (2 * ParallelFilamentsHenries(a, g)) + (2 * ParallelFilamentsHenries(b, g)) - (2 * ParallelFilamentsHenries(a, b)) - (2 * ParallelFilamentsHenries(b, a));
}
