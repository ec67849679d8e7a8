using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A long bar of rectangular section w x h carrying a uniform current. Within 20 half-diagonals of the section, the
/// line-current field integrated over the section in closed form: with u, v the point's offsets from the section's
/// points along the width and the thickness, Bw = -(mu0 I / 2 pi w h) [G(u, v)] and Bt = (mu0 I / 2 pi w h) [G(v, u)]
/// over the four corners, G(u, v) = v atan(u / v) + (u / 2) ln(u^2 + v^2) (the integral of v / (u^2 + v^2) over u and
/// v). Further away, where those terms cancel to the line current's field, the line-current field integrated by
/// 8 x 8 Gauss-Legendre quadrature, the section split into quarters until each part is more than five of its
/// half-diagonals from the point (there one part: the rule's error below about 1e-10). Drive: the current in
/// amperes, along the axis.
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
            throw new FieldEvaluationException("the point " + point + " m is inside the " + Describe());
        }

        double halfDiagonal = 0.5 * Math.Sqrt((WidthMeters * WidthMeters) + (ThicknessMeters * ThicknessMeters));
        if ((x * x) + (y * y) < ClosedFormWithin * ClosedFormWithin * halfDiagonal * halfDiagonal)
        {
            (double bw, double bt) = SectionField(x, y);
            return (bw * WidthDirection) + (bt * ThicknessDirection);
        }

        Vector3D sum = Cell(point, -WidthMeters / 2, WidthMeters / 2, -ThicknessMeters / 2, ThicknessMeters / 2, 0);
        return (1.0 / (WidthMeters * ThicknessMeters)) * sum;
    }

    /// <summary>Within this many half-diagonals of the section, the closed form; further, the cubature (its corner terms would cancel).</summary>
    private const double ClosedFormWithin = 20;

    /// <summary>The field of 1 A spread over the section at (x, y) of the section's frame, outside it: (along the width, along the thickness), T.</summary>
    private (double Width, double Thickness) SectionField(double x, double y)
    {
        double u0 = x - (WidthMeters / 2), u1 = x + (WidthMeters / 2), v0 = y - (ThicknessMeters / 2), v1 = y + (ThicknessMeters / 2);
        double scale = PhysicalConstants.VacuumPermeability / (2 * Math.PI * WidthMeters * ThicknessMeters);
        double alongWidth = G(u1, v1) - G(u0, v1) - G(u1, v0) + G(u0, v0);
        double alongThickness = G(v1, u1) - G(v1, u0) - G(v0, u1) + G(v0, u0);
        return (-scale * alongWidth, scale * alongThickness);
    }

    /// <summary>v atan(u / v) + (u / 2) ln(u^2 + v^2), each term 0 where its factor is (its limit there).</summary>
    private static double G(double u, double v) =>
        (v == 0 ? 0 : v * Math.Atan(u / v)) + (u == 0 ? 0 : 0.5 * u * Math.Log((u * u) + (v * v)));

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
