using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>Self-inductance of a circular loop (Grover, Inductance Calculations, 1946).</summary>
public static class RingInductance
{
    /// <summary>
    /// Ring of loop radius R whose section has geometric mean distance g, current uniform over the section:
    /// L = mu0 R (ln(8 R / g) - 2) (Grover 1946). For a round wire of radius a, g = a e^(-1/4) and this is
    /// mu0 R (ln(8 R / a) - 7/4). Thin-ring formula: corrections are of order (a / R)^2.
    /// </summary>
    public static double UniformCurrentHenries(double loopRadiusMeters, double gmdRadiusMeters) =>
        PhysicalConstants.VacuumPermeability * loopRadiusMeters * (Math.Log(8 * loopRadiusMeters / gmdRadiusMeters) - 2);

    /// <summary>
    /// External inductance of a ring of round wire, radius a, current on the wire's surface (the high-frequency
    /// limit): L = mu0 R (ln(8 R / a) - 2) (Grover 1946, Y = 0). The internal part is added from the wire's
    /// internal impedance.
    /// </summary>
    public static double ExternalHenries(double loopRadiusMeters, double wireRadiusMeters) =>
        PhysicalConstants.VacuumPermeability * loopRadiusMeters * (Math.Log(8 * loopRadiusMeters / wireRadiusMeters) - 2);
}
