using System;
using System.Collections.Generic;
using CsCheck;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>
/// The orientation the engine takes for a loop given no normal is the one that links the largest flux change, also
/// where the field varies across the loop and the flux is not linear in the normal: checked against a search over
/// every orientation by an independent model of the true geometry, the flux as a line integral around the loop's own
/// outline (Neumann's formula for a coil, the vector potential of a line current), with no disc quadrature.
/// </summary>
public class WorstOrientationTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    private static ConductiveItem Ring(string diameter, string wire) => ItemRecordReader.Read(
        new Dictionary<string, object?> { ["Name"] = "loop", ["Material"] = "Copper", ["Diameter"] = diameter, ["WireDiameter"] = wire, ["Contact"] = "Free" }, MaterialLibrary.BuiltIn);

    private static FieldSource Sine(IFieldGeometry geometry) =>
        new("source", new[] { new SourceTerm(geometry, new SineWaveform(1000, 50, drive: DriveKind.Current)) });

    /// <summary>Points and tangent steps around a circle of radius r centred at c square to n, in n's right-hand sense.</summary>
    private static (Vector3D[] Points, Vector3D[] Steps) Circle(Vector3D c, Vector3D n, double r, int segments)
    {
        Vector3D across = Math.Abs(n.X) < 0.9 ? Vector3D.UnitX : Vector3D.UnitY;
        Vector3D e1 = (across - (across.Dot(n) * n)).Normalized();
        Vector3D e2 = n.Cross(e1);
        var points = new Vector3D[segments];
        var steps = new Vector3D[segments];
        double dt = 2 * Math.PI / segments;
        for (int i = 0; i < segments; i++)
        {
            double t = i * dt;
            points[i] = c + (r * Math.Cos(t) * e1) + (r * Math.Sin(t) * e2);
            steps[i] = r * dt * ((-Math.Sin(t) * e1) + (Math.Cos(t) * e2));
        }

        return (points, steps);
    }

    /// <summary>
    /// Flux per ampere through a loop from a coil of N turns: N times Neumann's mutual inductance, mu0 / 4 pi times the
    /// double line integral of dl1 . dl2 / |r1 - r2| (trapezoid rule, which converges geometrically for the smooth
    /// periodic integrand of two separate circles).
    /// </summary>
    private static double CoilFlux((Vector3D[] Points, Vector3D[] Steps) coil, double turns, Vector3D c, Vector3D n, double r, int segments)
    {
        (Vector3D[] points, Vector3D[] steps) = Circle(c, n, r, segments);
        double sum = 0;
        for (int j = 0; j < points.Length; j++)
        {
            // Plain doubles in the inner loop: the search calls it some 10^8 times.
            double px = points[j].X, py = points[j].Y, pz = points[j].Z, sx = steps[j].X, sy = steps[j].Y, sz = steps[j].Z;
            for (int i = 0; i < coil.Points.Length; i++)
            {
                Vector3D q = coil.Points[i], d = coil.Steps[i];
                double dx = q.X - px, dy = q.Y - py, dz = q.Z - pz;
                sum += ((d.X * sx) + (d.Y * sy) + (d.Z * sz)) / Math.Sqrt((dx * dx) + (dy * dy) + (dz * dz));
            }
        }

        return turns * Mu0 / (4 * Math.PI) * sum;
    }

    /// <summary>Flux per ampere through a loop from a line current along z through the origin: the line integral of A = -(mu0 / 2 pi) ln(rho) z.</summary>
    private static double LineFlux(Vector3D c, Vector3D n, double r, int segments)
    {
        (Vector3D[] points, Vector3D[] steps) = Circle(c, n, r, segments);
        double sum = 0;
        for (int j = 0; j < points.Length; j++)
        {
            sum += -Math.Log(Math.Sqrt((points[j].X * points[j].X) + (points[j].Y * points[j].Y))) * steps[j].Z;
        }

        return Mu0 / (2 * Math.PI) * sum;
    }

    private static Vector3D Normal(double thetaDegrees, double phiDegrees)
    {
        double t = thetaDegrees * Math.PI / 180, p = phiDegrees * Math.PI / 180;
        return new Vector3D(Math.Sin(t) * Math.Cos(p), Math.Sin(t) * Math.Sin(p), Math.Cos(t));
    }

    /// <summary>
    /// The largest |flux| over every orientation: a grid over the half sphere (2 degrees by 4), then a grid a twentieth as
    /// fine about its best, over a step and a fifth of the grid each way (u and -u link the same flux).
    /// </summary>
    private static (double Flux, Vector3D Normal) LargestOverOrientations(Func<Vector3D, int, double> flux, int coarse, int fine)
    {
        (double best, double theta, double phi) = (-1, 0, 0);
        for (double t = 0; t <= 90; t += 2)
        {
            for (double p = 0; p < 360; p += t == 0 ? 360 : 4)
            {
                double f = Math.Abs(flux(Normal(t, p), coarse));
                if (f > best)
                {
                    (best, theta, phi) = (f, t, p);
                }
            }
        }

        (double fineBest, Vector3D normal) = (-1, Vector3D.UnitZ);
        for (double t = theta - 1.2; t <= theta + 1.2 + 1e-9; t += 0.2)
        {
            for (double p = phi - 2.4; p <= phi + 2.4 + 1e-9; p += 0.4)
            {
                Vector3D n = Normal(t, p);
                double f = Math.Abs(flux(n, fine));
                if (f > fineBest)
                {
                    (fineBest, normal) = (f, n);
                }
            }
        }

        return (fineBest, normal);
    }

    [Theory]
    [InlineData("300 mm", "4 mm", 0.0, 0.0, 0.05)]
    [InlineData("20 mm", "2 mm", 0.09, 0.0, 0.01)]
    [InlineData("20 mm", "2 mm", 0.1, 0.0, 0.015)]
    [Validates("the loop's flux at the orientation the engine takes for the worst, against the largest over every orientation, near a coil (a loop wider than the coil above it; a ring 10-15 mm from the winding)", "Neumann's formula for the mutual inductance of two circles at any orientation, by the trapezoid rule around both (independent of the disc quadrature), searched over the half sphere", "1e-4")]
    public void NearACoilTheLoopFacesTheOrientationThatLinksTheMostFlux(string diameter, string wire, double x, double y, double z)
    {
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        ConductiveItem loop = Ring(diameter, wire);
        var centre = new Vector3D(x, y, z);
        double r = loop.Loop.HalfSpanMeters;
        var coarseCoil = Circle(Vector3D.Zero, Vector3D.UnitZ, 0.1, 256);
        var fineCoil = Circle(Vector3D.Zero, Vector3D.UnitZ, 0.1, 1024);
        double Flux(Vector3D n, int segments) => CoilFlux(segments < 100 ? coarseCoil : fineCoil, 10, centre, n, r, segments);

        (double largest, Vector3D bestNormal) = LargestOverOrientations(Flux, 64, 256);
        Vector3D taken = FluxCoupling.WorstNormal(Sine(coil), centre, loop.Loop);
        double atTaken = Math.Abs(Flux(taken, 256));
        Assert.True(atTaken >= (1 - 1e-4) * largest, $"the orientation taken, {taken}, links {atTaken:G8} Wb/A; {bestNormal} links {largest:G8}");

        // The engine's own flux there, by its quadrature, is the line integral's.
        InductionResponse response = InductionEngine.Respond(new Scenario(loop, Sine(coil), new Placement(centre)));
        Within.Relative(1000 * atTaken, response.PeakFluxWebers, 1e-6, "peak flux at the orientation taken");
    }

    [Fact]
    [Validates("the loop's flux at the orientation the engine takes for the worst, against the largest over every orientation, for a 300 mm loop beside a line current", "the line integral of a line current's vector potential, A = -(mu0 I / 2 pi) ln(rho), around the loop (Stokes' theorem; independent of the disc quadrature), searched over the half sphere", "1e-4")]
    public void BesideALineTheLoopFacesTheOrientationThatLinksTheMostFlux()
    {
        var line = new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ));
        ConductiveItem loop = Ring("300 mm", "4 mm");
        var centre = new Vector3D(0.16, 0.05, 0.03);
        double r = loop.Loop.HalfSpanMeters;
        double Flux(Vector3D n, int segments) => LineFlux(centre, n, r, 8 * segments);

        (double largest, Vector3D bestNormal) = LargestOverOrientations(Flux, 64, 256);
        Vector3D taken = FluxCoupling.WorstNormal(Sine(line), centre, loop.Loop);
        double atTaken = Math.Abs(Flux(taken, 256));
        Assert.True(atTaken >= (1 - 1e-4) * largest, $"the orientation taken, {taken}, links {atTaken:G8} Wb/A; {bestNormal} links {largest:G8}");
    }

    /// <summary>Flux per ampere through a w x h rectangle (width along u, normal n) from a line current along z: the line integral of A around its sides (16-point Gauss-Legendre on each of a number of pieces a side).</summary>
    private static double LineFluxRectangle(Vector3D c, Vector3D n, Vector3D u, double w, double h, int pieces = 32)
    {
        Vector3D v = n.Cross(u);
        Vector3D[] corners = { c - (0.5 * w * u) - (0.5 * h * v), c + (0.5 * w * u) - (0.5 * h * v), c + (0.5 * w * u) + (0.5 * h * v), c - (0.5 * w * u) + (0.5 * h * v) };
        (double[] x, double[] wt) = (new[] { -0.9894009349916499, -0.9445750230732326, -0.8656312023878318, -0.7554044083550030, -0.6178762444026438, -0.4580167776572274, -0.2816035507792589, -0.0950125098376374, 0.0950125098376374, 0.2816035507792589, 0.4580167776572274, 0.6178762444026438, 0.7554044083550030, 0.8656312023878318, 0.9445750230732326, 0.9894009349916499 },
            new[] { 0.0271524594117541, 0.0622535239386479, 0.0951585116824928, 0.1246289712555339, 0.1495959888165767, 0.1691565193950025, 0.1826034150449236, 0.1894506104550685, 0.1894506104550685, 0.1826034150449236, 0.1691565193950025, 0.1495959888165767, 0.1246289712555339, 0.0951585116824928, 0.0622535239386479, 0.0271524594117541 });
        double sum = 0;
        for (int side = 0; side < 4; side++)
        {
            Vector3D from = corners[side], to = corners[(side + 1) % 4];
            for (int piece = 0; piece < pieces; piece++)
            {
                Vector3D a = from + (((double)piece / pieces) * (to - from)), b = from + (((double)(piece + 1) / pieces) * (to - from));
                Vector3D mid = 0.5 * (a + b), half = 0.5 * (b - a);
                for (int k = 0; k < x.Length; k++)
                {
                    Vector3D p = mid + (x[k] * half);
                    sum += wt[k] * -Math.Log(Math.Sqrt((p.X * p.X) + (p.Y * p.Y))) * half.Z;
                }
            }
        }

        return Mu0 / (2 * Math.PI) * sum;
    }

    [Fact]
    [Validates("a rectangular loop's flux at the orientation the engine takes for the worst (its normal and its turn within its plane), against the largest over every orientation, for a 400 mm x 600 mm loop beside a line current", "the line integral of a line current's vector potential, A = -(mu0 I / 2 pi) ln(rho), around the rectangle's sides (Stokes' theorem; independent of the rectangle quadrature), searched over the half sphere and a half turn within the plane", "1e-4")]
    public void BesideALineARectangleFacesAndTurnsTheWayThatLinksTheMostFlux()
    {
        var line = new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ));
        ConductiveItem frame = ItemRecordReader.Read(
            new Dictionary<string, object?> { ["Name"] = "frame", ["Shape"] = "RectangularLoop", ["Material"] = "Copper", ["Width"] = "400 mm", ["Height"] = "600 mm", ["WireDiameter"] = "4 mm", ["Contact"] = "Free" }, MaterialLibrary.BuiltIn);
        var rectangle = (RectangularLoopGeometry)frame.Loop;
        var centre = new Vector3D(0.4, 0.15, 0.05);
        double Flux(Vector3D n, double psiDegrees, int pieces)
        {
            Vector3D u0 = RectangularLoopGeometry.WidthDirection(n), v0 = n.Cross(u0);
            double psi = psiDegrees * Math.PI / 180;
            return Math.Abs(LineFluxRectangle(centre, n, (Math.Cos(psi) * u0) + (Math.Sin(psi) * v0), rectangle.WidthMeters, rectangle.HeightMeters, pieces));
        }

        (double best, double theta, double phi, double psiBest) = (-1, 0, 0, 0);
        for (double t = 0; t <= 90; t += 3)
        {
            for (double p = 0; p < 360; p += t == 0 ? 360 : 6)
            {
                for (double q = 0; q < 180; q += 6)
                {
                    double f = Flux(Normal(t, p), q, 2);
                    if (f > best)
                    {
                        (best, theta, phi, psiBest) = (f, t, p, q);
                    }
                }
            }
        }

        double largest = 0;
        for (double t = theta - 3; t <= theta + 3 + 1e-9; t += 0.5)
        {
            for (double p = phi - 6; p <= phi + 6 + 1e-9; p += 1)
            {
                for (double q = psiBest - 6; q <= psiBest + 6 + 1e-9; q += 1)
                {
                    largest = Math.Max(largest, Flux(Normal(t, p), q, 32));
                }
            }
        }

        (Vector3D normal, Vector3D? width) = FluxCoupling.WorstOrientation(Sine(line), centre, rectangle);
        double atTaken = Math.Abs(LineFluxRectangle(centre, normal, RectangularLoopGeometry.WidthDirection(normal, width), rectangle.WidthMeters, rectangle.HeightMeters));
        Assert.True(atTaken >= (1 - 1e-4) * largest, $"the orientation taken, {normal} width along {width}, links {atTaken:G8} Wb/A; the largest found {largest:G8}");

        // Its width's usual direction links less by more than the tolerance: the turn within the plane is what was needed.
        double usual = Math.Abs(LineFluxRectangle(centre, normal, RectangularLoopGeometry.WidthDirection(normal), rectangle.WidthMeters, rectangle.HeightMeters));
        Assert.True(usual < (1 - 1e-3) * largest, $"with its width the usual way it links {usual:G8} of {largest:G8}");

        // The engine's own flux there, by its quadrature, is the line integral's.
        InductionResponse response = InductionEngine.Respond(new Scenario(frame, Sine(line), new Placement(centre)));
        Within.Relative(1000 * atTaken, response.PeakFluxWebers, 1e-6, "peak flux at the orientation taken");
    }

    [Fact]
    public void ALoopThatReachesTheWindingTurnedIsNotJudgedByATopBelowOneBesideTheWinding()
    {
        // Found by the property below with a random seed: a 269 mm ring 23 mm above a 100 mm coil's plane, its centre
        // 86 mm outside the winding. The search reached 7.1E-08 Wb/A; beside the orientations that reach the winding
        // (where the field over the loop cannot be integrated, and the coarse spread found no footing) an orientation
        // links 1.0E-07. Now the orientation taken links no less than any of 150, or none is named (Indeterminate).
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        ConductiveItem ring = Ring("0.26860982782414683 m", "2 mm");
        var centre = new Vector3D(8.0 / 43, 0, 1.0 / 43);
        double largest = LargestOfASpread(coil, centre, ring);

        // 150 normals find 7.49E-08 there, above the 7.12E-08 the search reached before (2,000 find 9.96E-08).
        Assert.True(largest > 7.2e-8, "the top beside the winding, " + largest);
        TakenLinksAsMuchOrNoneIsNamed(coil, centre, ring, largest);
    }

    [Fact]
    public void ASearchThatRunsOutOfTrialsBeforeItSettlesNamesNoOrientation()
    {
        // Found by the property below with a random seed: a 244 mm ring 52 mm above a 100 mm coil's plane, its centre
        // 106 mm outside the winding. Its peak falls away sharply either way across a ridge as its rim nears the
        // winding; the search climbed along the ridge, ran out of its 300 trials while still turning by a degree, and
        // named where it stopped, 4.7617E-07 Wb/A, where turning a degree off the plane through the coil's axis links
        // 4.7743E-07 (and a degree and a half off, the loop reaches the winding). Now the orientation taken links no
        // less than any of 150, or none is named (Indeterminate): a search that has not settled names none.
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        ConductiveItem ring = Ring("0.2440057105166808 m", "2 mm");
        var centre = new Vector3D(0.2055151465171483, 0, 3.0 / 58);
        double largest = LargestOfASpread(coil, centre, ring);
        Assert.True(largest > 4.77e-7, "the top off the plane, " + largest);
        TakenLinksAsMuchOrNoneIsNamed(coil, centre, ring, largest);
    }

    /// <summary>The largest flux per ampere of 150 normals spread over the half sphere, those that can be integrated.</summary>
    private static double LargestOfASpread(CircularCoil coil, Vector3D centre, ConductiveItem ring)
    {
        double largest = 0;
        foreach (Vector3D n in SphereSearch.Spread(150, half: true))
        {
            try
            {
                largest = Math.Max(largest, Math.Abs(FluxCoupling.Flux(coil, centre, n, ring.Loop)));
            }
            catch (Errors.FieldEvaluationException)
            {
            }
        }

        return largest;
    }

    /// <summary>The orientation taken links no less than the largest given (to 1e-4), or the search names none, saying it cannot be found.</summary>
    private static void TakenLinksAsMuchOrNoneIsNamed(CircularCoil coil, Vector3D centre, ConductiveItem ring, double largest)
    {
        try
        {
            Vector3D taken = FluxCoupling.WorstNormal(Sine(coil), centre, ring.Loop);
            Assert.True(Math.Abs(FluxCoupling.Flux(coil, centre, taken, ring.Loop)) >= (1 - 1e-4) * largest, "the orientation taken " + taken);
        }
        catch (Errors.FieldEvaluationException ex)
        {
            Assert.StartsWith("the orientation that links the largest flux change cannot be found this near the source", ex.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void NoOrientationOfAHundredAndFiftyLinksMoreThanTheOneTakenForRandomLoopsNearACoil()
    {
        // For rings of 10 to 300 mm anywhere from the coil's axis to well beyond its winding, 20 to 150 mm above its
        // plane: the orientation taken links, by the engine's own flux, no less than any of 150 spread over the half
        // sphere (a Fibonacci lattice), or the response refuses to name one. A property of the search, not of the flux.
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        FieldSource source = Sine(coil);
        var spread = new Vector3D[150];
        for (int i = 0; i < spread.Length; i++)
        {
            double z = 1 - ((i + 0.5) / spread.Length), r = Math.Sqrt(1 - (z * z)), phi = i * Math.PI * (3 - Math.Sqrt(5));
            spread[i] = new Vector3D(r * Math.Cos(phi), r * Math.Sin(phi), z);
        }

        Gen.Select(Gen.Double[0.01, 0.3], Gen.Double[0, 0.25], Gen.Double[0.02, 0.15]).Sample((diameter, x, z) =>
        {
            ConductiveItem ring = Ring(diameter.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + " m", "2 mm");
            var centre = new Vector3D(x, 0, z);
            Vector3D taken;
            try
            {
                taken = FluxCoupling.WorstNormal(source, centre, ring.Loop);
            }
            catch (Errors.FieldEvaluationException)
            {
                // No orientation is named (the loop reaches the winding facing an axis, or turned toward it): Indeterminate.
                return;
            }

            double atTaken;
            try
            {
                atTaken = Math.Abs(FluxCoupling.Flux(coil, centre, taken, ring.Loop));
            }
            catch (Errors.FieldEvaluationException)
            {
                // The engine finds the flux again at the orientation taken and says it cannot: Indeterminate.
                return;
            }

            foreach (Vector3D n in spread)
            {
                double other;
                try
                {
                    other = Math.Abs(FluxCoupling.Flux(coil, centre, n, ring.Loop));
                }
                catch (Errors.FieldEvaluationException)
                {
                    continue;
                }

                Assert.True(atTaken >= (1 - 1e-4) * other, $"a {diameter:G4} m ring at {centre}: the orientation taken, {taken}, links {atTaken:G8}; {n} links {other:G8}");
            }
        }, seed: "0N0XIzNsQ0O2", iter: 30);
    }

    [Fact]
    public void ATransientDriveOfOneTermFacesTheWayASineDoes()
    {
        // One term's peak flux change is its coupling's magnitude times its drive's range, whatever the waveform: the
        // search on a ramp's flux over the drive's times must land where the sine's phasor does.
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        ConductiveItem ring = Ring("20 mm", "2 mm");
        var centre = new Vector3D(0.09, 0, 0.01);
        Vector3D bySine = FluxCoupling.WorstNormal(Sine(coil), centre, ring.Loop);
        var ramp = new FieldSource("ramp", new[] { new SourceTerm(coil, new RampWaveform(0, 1000, 0.01, drive: DriveKind.Current)) });
        Vector3D byRamp = FluxCoupling.WorstNormal(ramp, centre, ring.Loop);
        Within.Absolute(1, Math.Abs(bySine.Dot(byRamp)), 1e-12, "the two normals' alignment");
        Assert.True(Math.Abs(bySine.Dot(new Vector3D(0.5875, 0, 0.8092))) < Math.Cos(3 * Math.PI / 180), "the search turns the ring from the axes' estimate");
    }

    [Fact]
    public void WhereTheFluxGrowsUntilTheLoopReachesTheWindingTheOrientationIsNotFoundAndTheResponseSaysSo()
    {
        // A 300 mm loop 30 mm above a 100 mm coil's winding, off its axis: turned toward the winding its flux grows until
        // the field over it can no longer be integrated, so no orientation may stand for the worst.
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        ConductiveItem loop = Ring("300 mm", "4 mm");
        var centre = new Vector3D(0.12, 0, 0.03);
        InductionResponse response = InductionEngine.Respond(new Scenario(loop, Sine(coil), new Placement(centre)));
        Assert.False(response.IsValid);
        Assert.Contains(response.ValidityIssues, i => i.Reason.Contains("the orientation that links the largest flux change cannot be found this near the source", StringComparison.Ordinal));

        // Given how it sits, it is solved.
        Assert.True(InductionEngine.Respond(new Scenario(loop, Sine(coil), new Placement(centre, Vector3D.UnitZ))).IsValid);
    }
}
