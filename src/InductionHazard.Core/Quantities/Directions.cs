using System;

namespace InductionHazard.Quantities;

/// <summary>Directions in words: "+z" for an axis, "(0.6, 0, 0.8)" otherwise.</summary>
public static class Directions
{
    /// <summary>Describes a unit vector.</summary>
    public static string Describe(Vector3D direction)
    {
        const double Tolerance = 1e-9;
        if (Math.Abs(direction.Y) < Tolerance && Math.Abs(direction.Z) < Tolerance)
        {
            return direction.X > 0 ? "+x" : "-x";
        }

        if (Math.Abs(direction.X) < Tolerance && Math.Abs(direction.Z) < Tolerance)
        {
            return direction.Y > 0 ? "+y" : "-y";
        }

        if (Math.Abs(direction.X) < Tolerance && Math.Abs(direction.Y) < Tolerance)
        {
            return direction.Z > 0 ? "+z" : "-z";
        }

        return direction.ToString();
    }
}
