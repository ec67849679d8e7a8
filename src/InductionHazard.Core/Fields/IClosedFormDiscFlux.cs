using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Fields;

/// <summary>
/// A field geometry that has the flux through some discs in closed form (a coil's through discs on its axis), and the
/// force on their rims, so that those need no quadrature over the disc or around its rim.
/// </summary>
public interface IClosedFormDiscFlux
{
    /// <summary>
    /// The flux per unit drive through each coaxial disc of one plane (one centre and normal, several radii), Wb per
    /// drive unit, in closed form; null where the geometry has no closed form for every one of them, which are then
    /// integrated (<see cref="DiscQuadrature.NestedFluxes"/>).
    /// </summary>
    double[]? ClosedFormFluxes(Vector3D centre, Vector3D normal, IReadOnlyList<double> radii);

    /// <summary>
    /// The line integral of dl x b around a disc's rim (counter-clockwise about the normal) per unit drive, N/(A drive
    /// unit), which is the gradient of the flux through it; in closed form, or null where the geometry has none.
    /// </summary>
    Vector3D? ClosedFormRimForce(Vector3D centre, Vector3D normal, double radius);
}
