using System;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class ConductorFieldTests
{
    private const double Mu0 = 4e-7 * Math.PI;
    private static readonly Axis AlongZ = new(Vector3D.Zero, Vector3D.UnitZ);

    [Validates("mu0 I / (2 pi rho)", "Ampere's law", "1e-12")]
    [Theory]
    [InlineData(0.01)]
    [InlineData(0.3)]
    [InlineData(2.0)]
    public void ALineCurrentsFieldIsAmperesLaw(double rho)
    {
        // B = mu0 I / (2 pi rho), azimuthal (Ampere's law): at (rho, 0, 0) along +y for current along +z.
        Vector3D b = new LineConductor(AlongZ).FieldPerUnitDrive(new Vector3D(rho, 0, 0));
        Within.Relative(Mu0 / (2 * Math.PI * rho), b.Y, 1e-12, "B at " + rho + " m");
        Within.Absolute(0, b.X, 1e-20, "no radial part");
    }

    [Validates("segment field against mu0 I L / (2 pi rho sqrt(L^2 + rho^2)) and the line", "Biot-Savart law", "1e-12, 1e-5")]
    [Fact]
    public void ALongSegmentTendsToTheInfiniteLine()
    {
        // A segment 2 L long seen from its middle at rho: B = mu0 I / (2 pi rho) L / sqrt(L^2 + rho^2) -> the line as L grows.
        var p = new Vector3D(0.2, 0, 0);
        double line = new LineConductor(AlongZ).FieldPerUnitDrive(p).Y;
        foreach (double half in new[] { 10.0, 50.0 })
        {
            double segment = new SegmentConductor(new Vector3D(0, 0, -half), new Vector3D(0, 0, half)).FieldPerUnitDrive(p).Y;
            Within.Relative(line * half / Math.Sqrt((half * half) + 0.04), segment, 1e-12, "segment of half-length " + half);
        }

        double longest = new SegmentConductor(new Vector3D(0, 0, -50), new Vector3D(0, 0, 50)).FieldPerUnitDrive(p).Y;
        Within.Relative(line, longest, 1e-5, "a 100 m segment against the infinite line");
    }

    [Validates("bar far field against the line's", "Ampere's law", "1e-3, 1e-4")]
    [Theory]
    [InlineData(1.0, 1e-4)]
    [InlineData(3.0, 1e-5)]
    public void ABusbarsFarFieldTendsToTheLineCurrents(double distance, double tolerance)
    {
        // A 100 mm x 10 mm bar: its field far away is that of a line current (Ampere's law); the difference falls
        // as (size / distance)^2, about 1e-3 at 1 m for this bar's quadrupole term.
        var bar = new BusbarField(AlongZ, 0.1, 0.01);
        var p = new Vector3D(0, distance, 0);
        double line = new LineConductor(AlongZ).FieldPerUnitDrive(p).Length;
        Within.Relative(line, bar.FieldPerUnitDrive(p).Length, tolerance * 10, "at " + distance + " m");
    }

    [Validates("bar near field (closed form) against 16,000 filaments", "midpoint rule (independent)", "1e-5")]
    [Fact]
    public void ABusbarsNearFieldMatchesAFineSumOfFilaments()
    {
        // Independent check of the near field: the section as 400 x 40 line currents (midpoint rule).
        var bar = new BusbarField(AlongZ, 0.1, 0.01);
        var p = new Vector3D(0.07, 0.02, 0.3);
        Vector3D sum = Vector3D.Zero;
        int nx = 400, ny = 40;
        for (int i = 0; i < nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                double x = -0.05 + ((i + 0.5) * 0.1 / nx), y = -0.005 + ((j + 0.5) * 0.01 / ny);
                sum += LineConductor.Field(new Axis(new Vector3D(x, y, 0), Vector3D.UnitZ), p);
            }
        }

        Vector3D expected = (1.0 / (nx * ny)) * sum;
        Within.Relative(expected.Length, bar.FieldPerUnitDrive(p).Length, 1e-5, "near field of the bar");
    }

    [Validates("bar field near the section in closed form, both components, at faces, corners and beyond", "the section as line currents by MathNet's 2-D Gauss-Legendre rule on 100 x 100 panels (independent)", "1e-8")]
    [Theory]
    [InlineData(0.0, 0.006)]
    [InlineData(0.051, 0.0)]
    [InlineData(0.0505, 0.0055)]
    [InlineData(-0.03, -0.008)]
    [InlineData(0.2, 0.15)]
    [InlineData(0.0, 0.9)]
    public void ABusbarsFieldNearItIsTheSumOfItsLineCurrents(double x, double y)
    {
        // A 100 mm x 10 mm bar; the points lie 0.5-1 mm from a face or a corner, and out to 18 half-diagonals (the closed
        // form's reach is 20). Each panel of the section takes 8 x 8 Gauss points of the line current's field.
        var bar = new BusbarField(AlongZ, 0.1, 0.01);
        var p = new Vector3D(x, y, 0.2);
        var rule = new MathNet.Numerics.Integration.GaussLegendreRule(-1, 1, 8);
        const int Panels = 100;
        double dx = 0.1 / Panels, dy = 0.01 / Panels;
        Vector3D sum = Vector3D.Zero;
        for (int i = 0; i < Panels; i++)
        {
            for (int j = 0; j < Panels; j++)
            {
                for (int a = 0; a < rule.Order; a++)
                {
                    for (int b = 0; b < rule.Order; b++)
                    {
                        double fx = -0.05 + ((i + 0.5 + (0.5 * rule.Abscissas[a])) * dx), fy = -0.005 + ((j + 0.5 + (0.5 * rule.Abscissas[b])) * dy);
                        sum += (rule.Weights[a] * rule.Weights[b] * 0.25) * LineConductor.Field(new Axis(new Vector3D(fx, fy, 0), Vector3D.UnitZ), p);
                    }
                }
            }
        }

        Vector3D expected = (1.0 / (Panels * Panels)) * sum, got = bar.FieldPerUnitDrive(p);
        Assert.True((got - expected).Length <= 1e-8 * expected.Length, $"B {got} against the line currents' {expected}");
    }

    [Validates("a bar's field around it: the line integral of B is mu0 I", "Ampere's law", "1e-12")]
    [Theory]
    [InlineData(0.06)]
    [InlineData(0.3)]
    [InlineData(5.0)]
    public void AroundABusbarTheFieldsLineIntegralIsMu0I(double radius)
    {
        // A circle about the bar's centre, within and beyond the closed form's reach (1 m for this bar), by the
        // trapezoid rule (spectral for the periodic integrand once it has enough points).
        var bar = new BusbarField(AlongZ, 0.1, 0.01);
        const int Points = 4096;
        double sum = 0;
        for (int k = 0; k < Points; k++)
        {
            double phi = 2 * Math.PI * k / Points;
            var tangent = new Vector3D(-Math.Sin(phi), Math.Cos(phi), 0);
            sum += bar.FieldPerUnitDrive(new Vector3D(radius * Math.Cos(phi), radius * Math.Sin(phi), 0.1)).Dot(tangent);
        }

        Within.Relative(PhysicalConstants.VacuumPermeability, sum * 2 * Math.PI * radius / Points, 1e-12, "line integral of B at r = " + radius);
    }

    [Fact]
    public void APointInsideTheBarOrOnTheLineIsRefused()
    {
        Assert.Throws<FieldEvaluationException>(() => new BusbarField(AlongZ, 0.1, 0.01).FieldPerUnitDrive(new Vector3D(0.02, 0.001, 0)));
        Assert.Throws<FieldEvaluationException>(() => new LineConductor(AlongZ).FieldPerUnitDrive(new Vector3D(0, 0, 5)));
    }

    [Validates("mu0 I (d - sqrt(d^2 - r^2))", "integral of Ampere's field over the disc", "1e-7")]
    [Theory]
    [InlineData(0.1, 0.05)]
    [InlineData(0.3, 0.02)]
    [InlineData(0.05, 0.045)]
    public void TheFluxOfALineThroughACoplanarDiscIsTheClosedForm(double d, double r)
    {
        // A disc of radius r whose centre is d from a long wire in its plane: flux = mu0 I (d - sqrt(d^2 - r^2))
        // (integral of mu0 I / (2 pi x) over the disc), the coplanar case of the rectangular loop's mu0 h ln(b/a) / 2 pi.
        double flux = new LineConductor(AlongZ).FluxThroughDisc(new Vector3D(d, 0, 0), Vector3D.UnitY, r);
        Within.Relative(Mu0 * (d - Math.Sqrt((d * d) - (r * r))), flux, 1e-7, "flux through the disc");
    }
}
