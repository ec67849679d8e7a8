using System;
using System.Collections.Generic;
using Complex = System.Numerics.Complex;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using MathNet.Numerics.LinearAlgebra;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>Concentric shells of a thick round wire bent into a large rectangle, against the exact round-wire solution.</summary>
public sealed class WireShellTests
{
    private static ConductiveItem Frame(double wireDiameter) =>
        ItemRecordReader.Read(
            new Dictionary<string, object?> { ["Name"] = "frame", ["Shape"] = "RectangularLoop", ["Material"] = "Aluminium", ["Width"] = 0.4, ["Height"] = 0.3, ["WireDiameter"] = wireDiameter, ["Contact"] = "Held" },
            MaterialLibrary.BuiltIn);

    [Theory]
    [InlineData(1.0)]
    [InlineData(3.0)]
    [InlineData(10.0)]
    [Validates("the impedance of a 400 x 300 mm loop of thick aluminium wire as concentric shells, at wire radius / skin depth 1, 3 and 10", "exact internal impedance of a round wire (Bessel/Kelvin functions, Ramo, Whinnery and Van Duzer) plus the loop's external inductance (Grover)", "1 %")]
    public void ShellsGiveTheRoundWiresExactImpedance(double radiusOverSkinDepth)
    {
        ConductiveItem frame = Frame(0.025);
        double rho = frame.Material.ResistivityAt(20);
        double radius = 0.0125, delta = radius / radiusOverSkinDepth;
        double f = rho / (Math.PI * 4e-7 * Math.PI * delta * delta);
        ItemPaths paths = ItemPaths.For(frame, f, 20, thinLoop: false);
        Assert.Null(paths.Problem);
        PathSet set = paths.Paths!;
        Assert.True(set.Count > 1 && set.SharesOutline);

        // Every shell driven by the same emf (they link the same flux): Z = 1 / sum of the shells' currents.
        double omega = 2 * Math.PI * f;
        Matrix<Complex> z = Matrix<Complex>.Build.Dense(set.Count, set.Count, (i, j) => new Complex(i == j ? rho * set.LengthOverArea[i] : 0, omega * set.InductanceHenries[i, j]));
        Vector<Complex> currents = z.Solve(Vector<Complex>.Build.Dense(set.Count, Complex.One));
        Complex shells = Complex.One / currents.Sum();

        Complex exact = new RingCircuit(frame).ImpedanceOhms(f, 20);
        Within.Relative(exact.Real, shells.Real, 0.01, "resistance at a/delta = " + radiusOverSkinDepth);
        Within.Relative(exact.Imaginary, shells.Imaginary, 0.01, "reactance at a/delta = " + radiusOverSkinDepth);
    }

    [Fact]
    public void FinerShellsAtLeastHalveTheError()
    {
        double Error(int refinement)
        {
            ConductiveItem frame = Frame(0.025);
            double rho = frame.Material.ResistivityAt(20), delta = 0.0125 / 3;
            double f = rho / (Math.PI * 4e-7 * Math.PI * delta * delta);
            PathSet set = ItemPaths.For(frame, f, 20, thinLoop: false, refinement).Paths!;
            double omega = 2 * Math.PI * f;
            Matrix<Complex> z = Matrix<Complex>.Build.Dense(set.Count, set.Count, (i, j) => new Complex(i == j ? rho * set.LengthOverArea[i] : 0, omega * set.InductanceHenries[i, j]));
            Complex shells = Complex.One / z.Solve(Vector<Complex>.Build.Dense(set.Count, Complex.One)).Sum();
            return Math.Abs((shells.Real / new RingCircuit(frame).ImpedanceOhms(f, 20).Real) - 1);
        }

        double coarse = Error(1), fine = Error(2);
        Assert.True(fine <= coarse / 2, "error " + coarse + " with the default shells, " + fine + " with twice as many");
    }

    [Fact]
    public void ALadderInAFaultIsSolvedByShellsNotRefused()
    {
        // 25 mm aluminium rails in a 50 Hz fault with its d.c. offset: the wire is thicker than the skin depth, so the
        // transient needs the shells; before them it was Indeterminate.
        var fault = new FieldSource("feeder", new[] { new SourceTerm(new LineConductor(new Axis(new Vector3D(0, 0.5, 0), Vector3D.UnitX)), new FaultWaveform(40e3, 14, 50, 0.2)) });
        InductionResponse r = InductionEngine.Respond(new Scenario(Frame(0.025), fault, new Placement(Vector3D.Zero, Vector3D.UnitZ)));
        Assert.True(r.IsValid, string.Join("; ", r.ValidityIssues));
        Assert.True(r.PathCount > 1, r.Model);
        Assert.Contains("concentric shells", r.Model, StringComparison.Ordinal);
        Assert.True(Finite.Is(r.PeakCurrentAmperes) && r.PeakCurrentAmperes > 0);

        // Its peak current lies between the inductive limit (no resistance) and what a uniform d.c. current distribution gives.
        Assert.True(r.PeakCurrentAmperes <= r.InductiveLimitCurrentAmperes * 1.001, r.PeakCurrentAmperes + " A against the inductive limit " + r.InductiveLimitCurrentAmperes);
    }
}
