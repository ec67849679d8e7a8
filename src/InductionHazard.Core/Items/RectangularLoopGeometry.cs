using System;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// A rectangular loop of round wire: a frame, a ladder section, or a tool that closes a loop (a wrench across a
/// bar). Width and height are the sides of the centre line. In its plane the width lies along x projected onto
/// the plane (y when the loop's normal is along x), the height across it.
/// </summary>
public sealed class RectangularLoopGeometry : LoopGeometry
{
    /// <summary>Creates the geometry.</summary>
    public RectangularLoopGeometry(double widthMeters, double heightMeters, CrossSection section)
        : base(section)
    {
        WidthMeters = widthMeters;
        HeightMeters = heightMeters;
    }

    /// <summary>The side along the width direction, m.</summary>
    public double WidthMeters { get; }

    /// <summary>The side across it, m.</summary>
    public double HeightMeters { get; }

    /// <inheritdoc />
    public override double LoopAreaSquareMeters => WidthMeters * HeightMeters;

    /// <inheritdoc />
    public override double PathLengthMeters => 2 * (WidthMeters + HeightMeters);

    /// <inheritdoc />
    public override double HalfSpanMeters => Math.Min(WidthMeters, HeightMeters) / 2;

    /// <inheritdoc />
    public override double LargestDimensionMeters =>
        Math.Sqrt((WidthMeters * WidthMeters) + (HeightMeters * HeightMeters)) + Section.RadialExtentMeters;

    /// <summary>The unit direction of the width in a loop of a given normal (x projected onto the plane).</summary>
    public static Vector3D WidthDirection(Vector3D normal)
    {
        Vector3D helper = Math.Abs(normal.X) < 0.9 ? Vector3D.UnitX : Vector3D.UnitY;
        return (helper - (helper.Dot(normal) * normal)).Normalized();
    }

    /// <summary>The unit direction of the width for a normal: a given direction projected onto the plane, or without one the usual (<see cref="WidthDirection(Vector3D)"/>).</summary>
    public static Vector3D WidthDirection(Vector3D normal, Vector3D? width) =>
        width is { } w ? (w - (w.Dot(normal) * normal)).Normalized() : WidthDirection(normal);

    /// <inheritdoc />
    public override string Describe() => "rectangle " + SiFormat.Format(WidthMeters, "m") + " x " + SiFormat.Format(HeightMeters, "m");
}
