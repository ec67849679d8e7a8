using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>A uniform field along a fixed direction; its drive is the flux density in tesla.</summary>
public sealed class UniformField : IFieldGeometry
{
    /// <summary>Creates the geometry along a direction (normalised here).</summary>
    /// <exception cref="InvalidInputException">The direction is zero or not finite.</exception>
    public UniformField(Vector3D direction)
    {
        Direction = Require.Direction("Direction", direction);
    }

    /// <summary>The unit direction of the field for a positive drive.</summary>
    public Vector3D Direction { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.FluxDensity;

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point) => Direction;

    /// <summary>Uniform field: flux = pi r^2 (b . n), exactly.</summary>
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        Math.PI * radius * radius * Direction.Dot(normal);

    /// <inheritdoc />
    public string Describe() => "uniform field along " + Directions.Describe(Direction);
}
