using System;
using System.Globalization;

namespace InductionHazard.Quantities;

/// <summary>A vector in three dimensions, in double precision (positions in metres, fields in tesla, directions unitless).</summary>
public readonly struct Vector3D : IEquatable<Vector3D>
{
    /// <summary>Creates a vector from its Cartesian components.</summary>
    public Vector3D(double x, double y, double z)
    {
        X = x;
        Y = y;
        Z = z;
    }

    /// <summary>The x component.</summary>
    public double X { get; }

    /// <summary>The y component.</summary>
    public double Y { get; }

    /// <summary>The z component.</summary>
    public double Z { get; }

    /// <summary>The zero vector.</summary>
    public static Vector3D Zero => new(0, 0, 0);

    /// <summary>The unit vector along +x.</summary>
    public static Vector3D UnitX => new(1, 0, 0);

    /// <summary>The unit vector along +y.</summary>
    public static Vector3D UnitY => new(0, 1, 0);

    /// <summary>The unit vector along +z.</summary>
    public static Vector3D UnitZ => new(0, 0, 1);

    /// <summary>The Euclidean length.</summary>
    public double Length => Math.Sqrt((X * X) + (Y * Y) + (Z * Z));

    /// <summary>True when every component is finite.</summary>
    public bool IsFinite => Finite.All(X, Y, Z);

    /// <summary>Adds two vectors.</summary>
    public static Vector3D operator +(Vector3D a, Vector3D b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    /// <summary>Subtracts two vectors.</summary>
    public static Vector3D operator -(Vector3D a, Vector3D b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    /// <summary>Negates a vector.</summary>
    public static Vector3D operator -(Vector3D a) => new(-a.X, -a.Y, -a.Z);

    /// <summary>Scales a vector.</summary>
    public static Vector3D operator *(double s, Vector3D a) => new(s * a.X, s * a.Y, s * a.Z);

    /// <summary>Scales a vector.</summary>
    public static Vector3D operator *(Vector3D a, double s) => s * a;

    /// <summary>Equality of components.</summary>
    public static bool operator ==(Vector3D a, Vector3D b) => a.Equals(b);

    /// <summary>Inequality of components.</summary>
    public static bool operator !=(Vector3D a, Vector3D b) => !a.Equals(b);

    /// <summary>Adds two vectors.</summary>
    public static Vector3D Add(Vector3D a, Vector3D b) => a + b;

    /// <summary>Subtracts two vectors.</summary>
    public static Vector3D Subtract(Vector3D a, Vector3D b) => a - b;

    /// <summary>Negates a vector.</summary>
    public static Vector3D Negate(Vector3D a) => -a;

    /// <summary>Scales a vector.</summary>
    public static Vector3D Multiply(double s, Vector3D a) => s * a;

    /// <summary>The scalar product.</summary>
    public double Dot(Vector3D other) => (X * other.X) + (Y * other.Y) + (Z * other.Z);

    /// <summary>The vector product.</summary>
    public Vector3D Cross(Vector3D other) =>
        new((Y * other.Z) - (Z * other.Y), (Z * other.X) - (X * other.Z), (X * other.Y) - (Y * other.X));

    /// <summary>
    /// The unit vector in the same direction; throws for a zero or non-finite vector. The components are scaled by
    /// the largest first, so that a direction given as 1e200,0,0 or 1e-200,0,0 neither overflows nor underflows.
    /// </summary>
    public Vector3D Normalized()
    {
        double largest = Math.Max(Math.Abs(X), Math.Max(Math.Abs(Y), Math.Abs(Z)));
        if (!(largest > 0) || !Finite.Is(largest))
        {
            throw new InvalidOperationException("A zero or non-finite vector has no direction.");
        }

        Vector3D scaled = (1.0 / largest) * this;
        return (1.0 / scaled.Length) * scaled;
    }

    /// <inheritdoc />
    public bool Equals(Vector3D other) => X.Equals(other.X) && Y.Equals(other.Y) && Z.Equals(other.Z);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Vector3D other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        unchecked
        {
            int hash = X.GetHashCode();
            hash = (hash * 397) ^ Y.GetHashCode();
            return (hash * 397) ^ Z.GetHashCode();
        }
    }

    /// <summary>
    /// "(x, y, z)" with invariant formatting, each component to four figures; a component below 1e-12 of the largest is
    /// rounding noise (a normal turned by 90 degrees has cos 90 = 6.1e-17, not 0) and is written as 0.
    /// </summary>
    public override string ToString()
    {
        double noise = 1e-12 * Math.Max(Math.Abs(X), Math.Max(Math.Abs(Y), Math.Abs(Z)));
        return "(" + Component(X, noise) + ", " + Component(Y, noise) + ", " + Component(Z, noise) + ")";
    }

    /// <summary>One component as "G4" writes it; the values every axis and origin is made of are written without the formatter.</summary>
    private static string Component(double value, double noise)
    {
        if (Math.Abs(value) < noise)
        {
            return "0";
        }

        long bits = BitConverter.DoubleToInt64Bits(value);
        return bits == 0 ? "0" : value == 1 ? "1" : value == -1 ? "-1" : value.ToString("G4", CultureInfo.InvariantCulture);
    }
}
