using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Benchmarks;

/// <summary>
/// 224 ring assessments in a uniform field with drives linear between breakpoints, one line each: four metals, four
/// sizes from a 10 mm ring of 1 mm wire to an 80 mm ring of 1.5 mm, worn and loose, in seven drives from a gentle 1 T
/// over a second to 20 T in a millisecond that melts some of them. Each line gives the verdict, the peak current,
/// temperature and energy and every margin at full precision, so that two builds' lines compare number by number
/// (`CompareEngine.ps1 -Sweep`).
/// </summary>
public static class RingSweep
{
    /// <summary>Writes the sweep's lines: a key, then name=value fields separated by tabs.</summary>
    public static void Write(TextWriter output)
    {
        var trapezoid = new PiecewiseLinearWaveform("trapezoid", new[] { 0, 0.005, 0.025, 0.030 }, new[] { 0, 0.5, 0.5, 0 }, DriveKind.FluxDensity, "0.5 T, 5 ms edges, 20 ms flat");
        var drives = new (string Name, FieldWaveform Waveform)[]
        {
            ("ramp-1T-1ms", new RampWaveform(0, 1, 0.001, drive: DriveKind.FluxDensity)),
            ("ramp-3T-10ms", new RampWaveform(0, 3, 0.01, drive: DriveKind.FluxDensity)),
            ("ramp-1T-1s", new RampWaveform(0, 1, 1, drive: DriveKind.FluxDensity)),
            ("ramp-7T-600s", new RampWaveform(0, 7, 600, drive: DriveKind.FluxDensity)),
            ("trapezoid", trapezoid),
            ("train-of-6", new RepeatedWaveform(trapezoid, 6, 0.1)),
            ("ramp-20T-1ms", new RampWaveform(0, 20, 0.001, drive: DriveKind.FluxDensity)),
        };
        foreach (string material in new[] { "Copper", "Gold", "Stainless 304", "Titanium grade 2" })
        {
            foreach ((double diameter, double wire) in new[] { (10.0, 1.0), (20.0, 2.0), (50.0, 4.0), (80.0, 1.5) })
            {
                foreach (string contact in new[] { "Skin", "Free" })
                {
                    var fields = new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = material, ["Diameter"] = diameter / 1000, ["WireDiameter"] = wire / 1000, ["Contact"] = contact };
                    ConductiveItem item = ItemRecordReader.Read(fields, MaterialLibrary.BuiltIn);
                    foreach ((string name, FieldWaveform waveform) in drives)
                    {
                        InductionResponse response = InductionEngine.Respond(new Scenario(item, FieldSource.Uniform(name, waveform, Vector3D.UnitZ)));
                        InductionAssessment assessment = HazardAssessor.Assess(response, HazardPolicy.Default);
                        output.Write(FormattableString.Invariant($"{material}|{diameter}|{wire}|{contact}|{name}\tverdict={assessment.Verdict}"));
                        output.Write("\tcurrent=" + Exact(response.PeakCurrentAmperes) + "\ttemperature=" + Exact(response.PeakTemperatureCelsius) + "\tenergy=" + Exact(response.EnergyDissipatedJoules));
                        foreach (MechanismResult m in assessment.Mechanisms)
                        {
                            if (m.Applies)
                            {
                                output.Write("\t" + m.Mechanism + "=" + Exact(m.Margin));
                            }
                        }

                        output.WriteLine();
                    }
                }
            }
        }
    }

    private static string Exact(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
