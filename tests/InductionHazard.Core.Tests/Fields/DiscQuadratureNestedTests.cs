using System;
using System.Linq;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Fields;

/// <summary>Coaxial discs of one plane integrated annulus by annulus, against each disc integrated on its own.</summary>
public sealed class DiscQuadratureNestedTests
{
    [Fact]
    public void NestedDiscsGiveEachDiscsOwnFlux()
    {
        // A coil's field off its axis and a line conductor's beside the discs: no closed form, two quadratures of one integral.
        var coil = new CircularCoil(new Axis(new Vector3D(0.03, 0, -0.05), Vector3D.UnitZ), 0.1, 20);
        var line = new LineConductor(new Axis(new Vector3D(0.2, 0, 0), Vector3D.UnitY));
        double[] radii = { 0.06, 0.001, 0.02, 0.02, 0.045, 0, 0.0125 };
        var centre = new Vector3D(0, 0.01, 0.02);
        foreach (IFieldGeometry g in new IFieldGeometry[] { coil, line })
        {
            double[] nested = DiscQuadrature.NestedFluxes(g.FieldPerUnitDrive, centre, Vector3D.UnitZ, radii);
            for (int k = 0; k < radii.Length; k++)
            {
                double alone = radii[k] > 0 ? DiscQuadrature.Flux(g.FieldPerUnitDrive, centre, Vector3D.UnitZ, radii[k]) : 0;
                double scale = Math.Abs(DiscQuadrature.Flux(v => new Vector3D(0, 0, g.FieldPerUnitDrive(v).Length), centre, Vector3D.UnitZ, radii.Max()));
                Assert.True(Math.Abs(nested[k] - alone) <= 1e-6 * scale, g.Describe() + " at r = " + radii[k] + ": " + nested[k] + " against " + alone);
            }
        }
    }

    [Fact]
    public void ADiscTooNearAConductorIsStillRefused()
    {
        var line = new LineConductor(new Axis(new Vector3D(0.01, 0, 0), Vector3D.UnitY));
        Assert.Throws<Errors.FieldEvaluationException>(() => DiscQuadrature.NestedFluxes(line.FieldPerUnitDrive, Vector3D.Zero, Vector3D.UnitZ, new[] { 0.005, 0.02 }));
    }
}
