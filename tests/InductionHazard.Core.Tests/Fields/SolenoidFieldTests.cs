using System;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class SolenoidFieldTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    [Validates("centre field of a 4 m solenoid", "Ampere's law, long-solenoid limit", "1e-4")]
    [Fact]
    public void ALongSolenoidsCentreFieldIsMu0NIOverL()
    {
        // The long-solenoid limit B = mu0 N I / l (Ampere's law); a 4 m solenoid of radius 20 mm differs from it by
        // (2a/l)^2 / 2 = 5e-5 at its centre.
        var s = new SolenoidField(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.02, 4.0, 1000);
        Within.Relative(Mu0 * 1000 / 4.0, s.FieldPerUnitDrive(Vector3D.Zero).Z, 1e-4, "centre field");
        Within.Relative(Mu0 * 1000 / 4.0, s.FieldPerUnitDrive(new Vector3D(0.01, 0, 0)).Z, 1e-4, "off the axis, inside");
        Within.Absolute(0, s.FieldPerUnitDrive(new Vector3D(0.01, 0, 0)).X, 1e-9, "no radial field at the centre plane");
    }

    [Validates("loop quadrature against the on-axis closed form", "textbook closed form", "1e-7")]
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.08)]
    [InlineData(0.3)]
    public void TheQuadratureOfLoopsMatchesTheClosedFormOnTheAxis(double z)
    {
        // Just off the axis the field is the quadrature of filament loops along the length; on it the closed form
        // (mu0 N I / 2l)[(z + l/2)/sqrt((z + l/2)^2 + a^2) - (z - l/2)/sqrt((z - l/2)^2 + a^2)].
        var s = new SolenoidField(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.05, 0.2, 400);
        Within.Relative(s.AxialFieldPerAmpere(z), s.FieldPerUnitDrive(new Vector3D(1e-6, 0, z)).Z, 1e-7, "field at z = " + z);
    }
}
