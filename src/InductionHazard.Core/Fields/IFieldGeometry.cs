using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// The spatial part of a source term: the field per unit drive b(p), so that B(p, t) = b(p) d(t). Linear in its
/// drive because the source sits in air.
/// </summary>
public interface IFieldGeometry
{
    /// <summary>What the drive of this geometry is (tesla for a uniform field, amperes for a conductor).</summary>
    DriveKind Drive { get; }

    /// <summary>The field per unit drive at a point (T per drive unit).</summary>
    Vector3D FieldPerUnitDrive(Vector3D point);

    /// <summary>
    /// The flux per unit drive through a flat disc (Wb per drive unit): the integral of b . n over the disc
    /// of the given radius centred at <paramref name="centre"/> with unit normal <paramref name="normal"/>.
    /// </summary>
    double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius);

    /// <summary>A one-line description of the geometry.</summary>
    string Describe();
}
