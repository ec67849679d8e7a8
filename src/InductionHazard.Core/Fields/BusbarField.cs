using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A long bar of rectangular section w x h carrying a uniform current: the line-current field integrated over the
/// section by 8 x 8 Gauss-Legendre quadrature, the section split into quarters until each part is more than five
/// of its half-diagonals from the point (an adaptive cubature; the rule's error is then below about 1e-10). Far away it is the line current's field. Drive: the current in amperes, along the axis.
/// </summary>
public sealed class BusbarField : IFieldGeometry
{
    private const int Order = 8;
    private const int MaxDepth = 7;

    /// <summary>Creates the bar.</summary>
    /// <param name="axis">The bar's centre line; positive current flows along it.</param>
    /// <param name="widthMeters">The section's width, along <see cref="WidthDirection"/>.</param>
    /// <param name="thicknessMeters">The section's thickness, perpendicular to the width and the axis.</param>
    /// <exception cref="InvalidInputException">A size is out of range.</exception>
    public BusbarField(Axis axis, double widthMeters, double thicknessMeters)
    {
        PhysicalRanges.ItemDimension.For("Width").Check(widthMeters);
        PhysicalRanges.ItemDimension.For("Thickness").Check(thicknessMeters);
        Axis = axis;
        WidthMeters = widthMeters;
        ThicknessMeters = thicknessMeters;
        WidthDirection = axis.Perpendicular;
        ThicknessDirection = axis.Direction.Cross(WidthDirection);
    }

    /// <summary>The bar's centre line.</summary>
    public Axis Axis { get; }

    /// <summary>The section's width, m.</summary>
    public double WidthMeters { get; }

    /// <summary>The section's thickness, m.</summary>
    public double ThicknessMeters { get; }

    /// <summary>The unit direction of the width (x projected off the axis).</summary>
    public Vector3D WidthDirection { get; }

    /// <summary>The unit direction of the thickness (axis x width).</summary>
    public Vector3D ThicknessDirection { get; }

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.Current;

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point)
    {
        (_, Vector3D radial) = Axis.Local(point);
        double x = radial.Dot(WidthDirection), y = radial.Dot(ThicknessDirection);
        if (Math.Abs(x) <= WidthMeters / 2 && Math.Abs(y) <= ThicknessMeters / 2)
        {
            throw new FieldEvaluationException("the point " + point + " m is inside the bar " + Describe());
        }

        Vector3D sum = Cell(point, -WidthMeters / 2, WidthMeters / 2, -ThicknessMeters / 2, ThicknessMeters / 2, 0);
        return (1.0 / (WidthMeters * ThicknessMeters)) * sum;
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() =>
        "bar " + SiFormat.Format(WidthMeters, "m") + " x " + SiFormat.Format(ThicknessMeters, "m") + " " + Axis.Describe();

    /// <summary>The integral of the 1 A line field over a rectangle of the section (in width, thickness coordinates).</summary>
    private Vector3D Cell(Vector3D point, double x0, double x1, double y0, double y1, int depth)
    {
        double cx = 0.5 * (x0 + x1), cy = 0.5 * (y0 + y1);
        double halfDiagonal = 0.5 * Math.Sqrt(((x1 - x0) * (x1 - x0)) + ((y1 - y0) * (y1 - y0)));
        (_, Vector3D radial) = Axis.Local(point);
        double px = radial.Dot(WidthDirection), py = radial.Dot(ThicknessDirection);
        double distance = Math.Sqrt(((px - cx) * (px - cx)) + ((py - cy) * (py - cy)));
        if (distance < 5 * halfDiagonal && depth < MaxDepth)
        {
            return Cell(point, x0, cx, y0, cy, depth + 1) + Cell(point, cx, x1, y0, cy, depth + 1)
                + Cell(point, x0, cx, cy, y1, depth + 1) + Cell(point, cx, x1, cy, y1, depth + 1);
        }

        GaussLegendre.Rule rule = GaussLegendre.Of(Order);
        Vector3D sum = Vector3D.Zero;
        for (int i = 0; i < Order; i++)
        {
            double x = cx + (0.5 * (x1 - x0) * rule.Nodes[i]);
            for (int j = 0; j < Order; j++)
            {
                double y = cy + (0.5 * (y1 - y0) * rule.Nodes[j]);
                var filament = new Axis(Axis.Centre + (x * WidthDirection) + (y * ThicknessDirection), Axis.Direction);
                sum += rule.Weights[i] * rule.Weights[j] * LineConductor.Field(filament, point);
            }
        }

        return 0.25 * (x1 - x0) * (y1 - y0) * sum;
    }
}
