using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Fields;

/// <summary>
/// A line in space, a point and a unit direction, with the cylindrical coordinates of a point about it: the
/// frame of every source with an axis (a conductor, a bar, a coil, a solenoid).
/// </summary>
public readonly struct Axis
{
    /// <summary>Creates the axis through a point along a direction (normalised here).</summary>
    /// <exception cref="InvalidInputException">The point is not finite or the direction is zero or not finite.</exception>
    public Axis(Vector3D centre, Vector3D direction)
    {
        if (!centre.IsFinite)
        {
            throw new InvalidInputException("Center", "must be finite; got " + centre);
        }

        Centre = centre;
        Direction = Require.Direction("Axis", direction);
    }

    /// <summary>A point on the axis, m.</summary>
    public Vector3D Centre { get; }

    /// <summary>The unit direction.</summary>
    public Vector3D Direction { get; }

    /// <summary>A unit vector perpendicular to the axis: x projected off the axis (y when the axis is along x).</summary>
    public Vector3D Perpendicular
    {
        get
        {
            Vector3D helper = Math.Abs(Direction.X) < 0.9 ? Vector3D.UnitX : Vector3D.UnitY;
            return (helper - (helper.Dot(Direction) * Direction)).Normalized();
        }
    }

    /// <summary>The point's distance along the axis from the centre, z, and its offset from the axis, rho vector.</summary>
    public (double Z, Vector3D Radial) Local(Vector3D point)
    {
        Vector3D d = point - Centre;
        double z = d.Dot(Direction);
        return (z, d - (z * Direction));
    }

    /// <summary>"through (0, 0, 0) along +z".</summary>
    public string Describe() => "through " + Centre + " m along " + Directions.Describe(Direction);
}
