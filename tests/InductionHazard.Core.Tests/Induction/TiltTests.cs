using System;
using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>A loop turned by a tilt from the orientation that links the largest flux change.</summary>
public class TiltTests
{
    private static readonly ConductiveItem Ring = ItemRecordReader.Read(
        new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002 }, MaterialLibrary.BuiltIn);

    private static InductionResponse At(FieldSource source, double? tiltDegrees) =>
        InductionEngine.Respond(new Scenario(Ring, source, new Placement(Vector3D.Zero, null, null, tiltDegrees)));

    [Theory]
    [InlineData(30.0)]
    [InlineData(60.0)]
    [InlineData(89.0)]
    [Validates("the emf around a plane loop tilted by an angle from a uniform field's direction, through the engine", "Faraday's law for a plane loop in a uniform field: Phi = B A cos(tilt) (textbook)", "1e-9")]
    public void InAUniformFieldTheEmfFallsAsTheCosineOfTheTilt(double tilt)
    {
        FieldSource field = FieldSource.Uniform("coil", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), new Vector3D(0, 0.6, 0.8));
        double facing = At(field, null).PeakEmfVolts;
        InductionResponse tilted = At(field, tilt);
        Within.Relative(facing * Math.Cos(tilt * Math.PI / 180), tilted.PeakEmfVolts, 1e-9, "emf at a tilt of " + tilt + " degrees");
        Within.Relative(Math.Cos(tilt * Math.PI / 180), Math.Abs(tilted.Normal.Dot(new Vector3D(0, 0.6, 0.8))), 1e-12, "the normal's angle to the field");
        Assert.Equal(facing, At(field, 0).PeakEmfVolts);
    }

    [Fact]
    public void InAFieldThatTurnsTheTiltGoesTowardTheSideThatKeepsTheMostFlux()
    {
        // Bx = 10 mT sin(wt), By = 4 mT cos(wt): the worst normal is x; turned 60 degrees toward y the loop's flux
        // amplitude is sqrt(cos^2 60 * 10^2 + sin^2 60 * 4^2) = sqrt(37) mT A, toward z only cos 60 * 10 = 5 mT A.
        var x = FieldSource.Uniform("x", new SineWaveform(0.010, 50, drive: DriveKind.FluxDensity), Vector3D.UnitX);
        var y = FieldSource.Uniform("y", new SineWaveform(0.004, 50, Math.PI / 2, drive: DriveKind.FluxDensity), Vector3D.UnitY);
        FieldSource turning = FieldSource.Combine(new[] { x, y }, "turning");
        double facing = At(turning, null).PeakEmfVolts;
        InductionResponse tilted = At(turning, 60);
        Within.Relative(Math.Sqrt(37) / 10, tilted.PeakEmfVolts / facing, 1e-9, "flux kept at 60 degrees toward the turning side");
        Within.Absolute(0, tilted.Normal.Z, 1e-12, "the normal stays in the plane the field turns in");
        Assert.Contains("tilted 60 degrees", tilted.Orientation, StringComparison.Ordinal);
    }

    [Fact]
    public void TheRowsOrientationStandsOverTheRunsAndTheRunsOverTheStations()
    {
        Vector3D x = Vector3D.UnitX, y = Vector3D.UnitY, z = Vector3D.UnitZ;
        Assert.Equal(((Vector3D?)null, (double?)30), Placement.Orientation((null, 30), (x, null), (y, null)));
        Assert.Equal(((Vector3D?)z, (double?)null), Placement.Orientation((z, null), (null, 45), (y, null)));
        Assert.Equal(((Vector3D?)null, (double?)45), Placement.Orientation((null, null), (null, 45), (y, null)));
        Assert.Equal(((Vector3D?)y, (double?)null), Placement.Orientation((null, null), (null, null), (y, null)));
        Assert.Equal(((Vector3D?)null, (double?)null), Placement.Orientation((null, null), (null, null), (null, null)));

        // A station's tilt, under the row's and the run's normal or tilt.
        Assert.Equal(((Vector3D?)null, (double?)60), Placement.Orientation((null, null), (null, null), (null, 60)));
        Assert.Equal(((Vector3D?)x, (double?)null), Placement.Orientation((null, null), (x, null), (null, 60)));
        Assert.Equal(((Vector3D?)null, (double?)0), Placement.Orientation((null, 0), (null, null), (null, 60)));
        var station = new Placement(Vector3D.Zero, null, null, 60);
        Assert.Equal(((Vector3D?)null, (double?)60), station.Facing);
    }

    [Fact]
    public void ATiltIsGivenInPlaceOfANormalAndWithinAQuarterTurn()
    {
        Assert.Throws<InductionHazard.Errors.InvalidInputException>(() => new Placement(Vector3D.Zero, Vector3D.UnitZ, null, 30));
        Assert.Throws<InductionHazard.Errors.InvalidInputException>(() => new Placement(Vector3D.Zero, null, null, 91));
        Assert.Throws<InductionHazard.Errors.InvalidInputException>(() => new Placement(Vector3D.Zero, null, null, double.NaN));
        Assert.NotEqual(
            new Scenario(Ring, FieldSource.Uniform("u", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ), new Placement(Vector3D.Zero, null, null, 30)).Fingerprint(),
            new Scenario(Ring, FieldSource.Uniform("u", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ), new Placement(Vector3D.Zero, null, null, 31)).Fingerprint());
    }
}
