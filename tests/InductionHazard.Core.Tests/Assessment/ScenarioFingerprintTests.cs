using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>The inputs' fingerprint: the same inputs give the same one, whatever objects carry them; any change gives another.</summary>
public class ScenarioFingerprintTests
{
    private static ConductiveItem Ring(double diameter = 0.02) =>
        ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = diameter, ["WireDiameter"] = 0.002 }, MaterialLibrary.BuiltIn);

    private static FieldSource Sine(double tesla = 0.01) => FieldSource.Uniform("sine", new SineWaveform(tesla, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

    [Fact]
    public void TheSameInputsInNewObjectsGiveTheSameFingerprintAndAnyChangeAnother()
    {
        string first = new Scenario(Ring(), Sine()).Fingerprint();
        Assert.Equal(first, new Scenario(Ring(), Sine()).Fingerprint());
        Assert.Matches("^[0-9a-f]{64}$", first);
        Assert.NotEqual(first, new Scenario(Ring(0.02 * (1 + 1e-12)), Sine()).Fingerprint());
        Assert.NotEqual(first, new Scenario(Ring(), Sine(0.01 * (1 + 1e-12))).Fingerprint());
        Assert.NotEqual(first, new Scenario(Ring(), Sine(), new Placement(new Vector3D(0, 0, 1e-9))).Fingerprint());
        Assert.NotEqual(first, new Scenario(Ring(), Sine(), exposureSeconds: 60).Fingerprint());

        // Beyond the four figures a placement is displayed with: every bit of the centre, normal and velocity counts.
        string placed = new Scenario(Ring(), Sine(), new Placement(new Vector3D(0.25, 0, 0), Vector3D.UnitY)).Fingerprint();
        Assert.NotEqual(placed, new Scenario(Ring(), Sine(), new Placement(new Vector3D(0.25 * (1 + 1e-9), 0, 0), Vector3D.UnitY)).Fingerprint());
        Assert.NotEqual(placed, new Scenario(Ring(), Sine(), new Placement(new Vector3D(0.25, 0, 0), new Vector3D(1e-9, 1, 0).Normalized())).Fingerprint());
        Assert.NotEqual(first, new Scenario(Ring(), Sine()) { StationName = "Bay 2" }.Fingerprint());
        Assert.NotEqual(first, new Scenario(Ring(), Sine()) { WearerGroup = InductionHazard.Criteria.ExposureGroup.Public }.Fingerprint());
        Assert.NotEqual(new Scenario(Ring(), Sine()) { WearerGroup = InductionHazard.Criteria.ExposureGroup.Occupational }.Fingerprint(), new Scenario(Ring(), Sine()) { WearerGroup = InductionHazard.Criteria.ExposureGroup.Public }.Fingerprint());
    }

    [Fact]
    public void AVectorIsDisplayedWithoutItsRoundingNoise()
    {
        // A normal turned from +x by 90 degrees about z carries cos 90 = 6.1e-17 in x: it is displayed as the axis it is.
        double quarter = System.Math.PI / 2;
        Assert.Equal("(0, 1, 0)", new Vector3D(System.Math.Cos(quarter), System.Math.Sin(quarter), 0).ToString());
        Assert.Equal("(0.6, 0, -0.8)", new Vector3D(0.6, -4e-17, -0.8).ToString());
        // A small vector keeps its own small components: the noise is relative to its largest.
        Assert.Equal("(1E-09, 2E-09, 0)", new Vector3D(1e-9, 2e-9, 0).ToString());
        Assert.Equal("(1E-09, 1, 0)", new Vector3D(1e-9, 1, 0).ToString());
    }

    [Validates("SHA-256 of \"abc\" and of the empty text", "FIPS 180-2, appendix B.1 (\"abc\"); the empty text's digest from memory", "exact")]
    [Fact]
    public void TheHashIsSha256()
    {
        // FIPS 180-2, appendix B.1: SHA-256("abc"); and of the empty text (from memory).
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", TextHash.Sha256("abc"));
        Assert.Equal("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", TextHash.Sha256(string.Empty));
    }
}
