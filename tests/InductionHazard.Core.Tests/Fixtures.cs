using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Tests;

/// <summary>Items, sources and scenarios the tests share. The numbers are test inputs, not published values.</summary>
internal static class Fixtures
{
    public static ConductiveItem Ring(string material = "Copper", double diameter = 0.02, double wire = 0.002, double gap = 0, string contact = "Skin") =>
        ItemRecordReader.Read(
            new Dictionary<string, object?>
            {
                ["Name"] = "test ring",
                ["Material"] = material,
                ["Diameter"] = diameter,
                ["WireDiameter"] = wire,
                ["Gap"] = gap,
                ["Contact"] = contact,
            },
            MaterialLibrary.BuiltIn);

    public static ConductiveItem Band(string material, double diameter, double width, double thickness, string contact = "Skin") =>
        ItemRecordReader.Read(
            new Dictionary<string, object?>
            {
                ["Name"] = "test band",
                ["Material"] = material,
                ["Diameter"] = diameter,
                ["Width"] = width,
                ["Thickness"] = thickness,
                ["Contact"] = contact,
            },
            MaterialLibrary.BuiltIn);

    public static FieldSource UniformSine(double peakTesla, double frequency, double? duration = null) =>
        FieldSource.Uniform("sine", new SineWaveform(peakTesla, frequency, durationSeconds: duration, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

    public static FieldSource UniformRamp(double from, double to, double duration) =>
        FieldSource.Uniform("ramp", new RampWaveform(from, to, duration, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

    public static InductionResponse Respond(ConductiveItem item, FieldSource source, double? exposure = null, Vector3D? normal = null) =>
        InductionEngine.Respond(new Scenario(item, source, new Placement(Vector3D.Zero, normal), exposure));
}
