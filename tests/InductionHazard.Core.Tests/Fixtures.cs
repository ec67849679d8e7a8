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
    /// <summary>
    /// The built-in materials and "steady copper": copper's constants with no temperature coefficient, so that heating
    /// bends no square law and the power of a ring in a sine stays constant (test input).
    /// </summary>
    public static MaterialLibrary WithSteadyCopper { get; } = MaterialLibrary.BuiltIn.With(new[]
    {
        MaterialLibrary.Define(new Dictionary<string, object?>
        {
            ["Name"] = "steady copper", ["Resistivity"] = SteadyCopperResistivity, ["TemperatureCoefficient"] = 0.0, ["Density"] = 8960.0, ["SpecificHeat"] = 385.0,
            ["MeltingTemperature"] = "1085 degC", ["LatentHeat"] = "208.7 kJ/kg",
        }),
    });

    /// <summary>The resistivity of "steady copper", ohm m.</summary>
    public const double SteadyCopperResistivity = 1.72e-8;

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

    public static ConductiveItem Frame(string material, double width, double height, double wire, string contact = "Skin") =>
        ItemRecordReader.Read(
            new Dictionary<string, object?>
            {
                ["Name"] = "test frame",
                ["Shape"] = "RectangularLoop",
                ["Material"] = material,
                ["Width"] = width,
                ["Height"] = height,
                ["WireDiameter"] = wire,
                ["Contact"] = contact,
            },
            MaterialLibrary.BuiltIn);

    public static FieldSource UniformSine(double peakTesla, double frequency, double? duration = null) =>
        FieldSource.Uniform("sine", new SineWaveform(peakTesla, frequency, durationSeconds: duration, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

    public static FieldSource UniformRamp(double from, double to, double duration) =>
        FieldSource.Uniform("ramp", new RampWaveform(from, to, duration, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

    /// <summary>A sine source whose geometry yields NaN: stands for a defect inside a field model.</summary>
    public static FieldSource BrokenGeometrySine(double frequency) => BrokenGeometry(new SineWaveform(1, frequency, drive: DriveKind.FluxDensity));

    /// <summary>A source whose geometry yields NaN, under any waveform.</summary>
    public static FieldSource BrokenGeometry(FieldWaveform waveform) =>
        new("broken", new[] { new SourceTerm(new NaNGeometry(), waveform) });

    /// <summary>An inventory row of a copper ring with a Holder column, and any further columns given.</summary>
    public static List<KeyValuePair<string, object?>> InventoryRow(params (string Key, object? Value)[] extra)
    {
        var row = new List<KeyValuePair<string, object?>> { new("Name", "Ring"), new("Material", "Copper"), new("Diameter", "20 mm"), new("WireDiameter", "2 mm"), new("Holder", "holder A") };
        foreach ((string key, object? value) in extra)
        {
            row.Add(new KeyValuePair<string, object?>(key, value));
        }

        return row;
    }

    public static InductionResponse Respond(ConductiveItem item, FieldSource source, double? exposure = null, Vector3D? normal = null) =>
        InductionEngine.Respond(new Scenario(item, source, new Placement(Vector3D.Zero, normal), exposure));

    /// <summary>A field geometry that returns NaN for everything, as a defect inside a model would.</summary>
    private sealed class NaNGeometry : IFieldGeometry
    {
        public DriveKind Drive => DriveKind.FluxDensity;

        public Vector3D FieldPerUnitDrive(Vector3D point) => new(double.NaN, double.NaN, double.NaN);

        public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) => double.NaN;

        public string Describe() => "a geometry that yields NaN";
    }

    /// <summary>
    /// A flat three-phase set of 100 mm spacing (1 kA amplitude by default, 50 Hz), the point 50 mm across its row from
    /// the middle line, where the three fields point different ways and their sum traces a fat ellipse over a cycle, and
    /// there the resultant rms and the peak |B|, from |B(t)| at 64 instants of a period of the three lines' fields,
    /// mu0 i / (2 pi r) each (Ampere's law; the average of |B|^2 over them is exact for a sum of sinusoids of one frequency).
    /// </summary>
    public static (FieldSource Set, Vector3D Point, double Resultant, double Peak) ThreePhaseAtFiftyMillimetres(double amplitude = 1000, double hertz = 50)
    {
        var values = new Dictionary<string, object?> { ["Form"] = "ThreePhase", ["Spacing"] = "100 mm", ["Name"] = hertz + " Hz set" };
        FieldSource set = SourceRecordReader.Read(values, new SineWaveform(amplitude, hertz, drive: DriveKind.Current), ".");
        Vector3D[] at = System.Linq.Enumerable.ToArray(System.Linq.Enumerable.Select(set.Terms, t => ((LineConductor)t.Geometry).Axis.Centre));
        Vector3D z = Vector3D.UnitZ, point = 0.05 * z.Cross((at[2] - at[0]).Normalized());
        double[] phases = { 0, -2 * System.Math.PI / 3, 2 * System.Math.PI / 3 };
        double sum = 0, peak = 0;
        const int Instants = 64;
        for (int n = 0; n < Instants; n++)
        {
            double wt = 2 * System.Math.PI * n / Instants;
            Vector3D b = Vector3D.Zero;
            for (int k = 0; k < 3; k++)
            {
                Vector3D r = point - at[k];
                b += amplitude * System.Math.Sin(wt + phases[k]) * (4e-7 * System.Math.PI / (2 * System.Math.PI * r.Dot(r))) * z.Cross(r);
            }

            sum += b.Dot(b);
            peak = System.Math.Max(peak, b.Length);
        }

        return (set, point, System.Math.Sqrt(sum / Instants), peak);
    }
}
