using System;
using System.Collections.Generic;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// A rectangular block with its axis along its depth: a Plate (-Width -Height -Thickness, axis along its normal) or
/// a Bar (-Width -Height -Length, axis along its length: a tool head or a rail). Its eddy currents circulate in its
/// W x H section, solved as mesh currents over a grid of cells (<see cref="PlateMesh"/>). In the placement's frame
/// the width lies along x projected onto the plane normal to the axis, as for a rectangular loop.
/// </summary>
public sealed class PrismBody : BodyGeometry
{
    private readonly string _word;

    /// <summary>Creates the body.</summary>
    public PrismBody(double widthMeters, double heightMeters, double depthMeters, string word)
        : base(0.5 * Math.Sqrt((widthMeters * widthMeters) + (heightMeters * heightMeters)), new BodySection(Math.Min(widthMeters, heightMeters) / 2, depthMeters, widthMeters * depthMeters, "solid, " + SiFormat.Format(depthMeters, "m") + (word == "plate" ? " thick" : " long")))
    {
        WidthMeters = widthMeters;
        HeightMeters = heightMeters;
        DepthMeters = depthMeters;
        _word = word;
    }

    /// <summary>The side along the width direction, m.</summary>
    public double WidthMeters { get; }

    /// <summary>The side across it, m.</summary>
    public double HeightMeters { get; }

    /// <summary>The extent along the axis (a plate's thickness, a bar's length), m.</summary>
    public double DepthMeters { get; }

    /// <summary>The face's area W H, m^2: the outline whose emf is reported.</summary>
    public override double LoopAreaSquareMeters => WidthMeters * HeightMeters;

    /// <summary>The face's perimeter, m.</summary>
    public override double PathLengthMeters => 2 * (WidthMeters + HeightMeters);

    /// <summary>Half the shorter side of the face.</summary>
    public override double HalfSpanMeters => Math.Min(WidthMeters, HeightMeters) / 2;

    /// <inheritdoc />
    public override double LargestDimensionMeters => Math.Sqrt((WidthMeters * WidthMeters) + (HeightMeters * HeightMeters) + (DepthMeters * DepthMeters));

    /// <inheritdoc />
    public override double VolumeCubicMeters => WidthMeters * HeightMeters * DepthMeters;

    /// <inheritdoc />
    public override double SurfaceSquareMeters => 2 * ((WidthMeters * HeightMeters) + (WidthMeters * DepthMeters) + (HeightMeters * DepthMeters));

    /// <summary>Across: the larger of integral x^2 dV = W^3 H D / 12 and y^2 (the worst field direction across the axis); along: W H D^3 / 12.</summary>
    public override (double Across, double Along) SecondMoments =>
        (Math.Max(WidthMeters * WidthMeters, HeightMeters * HeightMeters) * VolumeCubicMeters / 12, DepthMeters * DepthMeters * VolumeCubicMeters / 12);

    /// <summary>Not a body of revolution: its paths are the mesh currents of <see cref="Mesh"/>.</summary>
    public override IReadOnlyList<Filament>? Filaments(double surfaceCellMeters, int refinement = 1) => null;

    /// <summary>The grid of cells and branches its eddy currents are solved on.</summary>
    public PlateMesh Mesh(double surfaceCellMeters, int refinement = 1) => PlateMesh.Build(WidthMeters, HeightMeters, DepthMeters, surfaceCellMeters, refinement);

    /// <inheritdoc />
    public override string Describe() => _word + " " + SiFormat.Format(WidthMeters, "m") + " x " + SiFormat.Format(HeightMeters, "m");
}
