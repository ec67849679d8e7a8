using System;
using System.IO;
using System.Text;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Properties;

/// <summary>
/// Hostile data files (fixed seed): captures and field maps built from random mixes of good lines, garbage,
/// missing cells, repeated times, other delimiters and huge numbers. Each must load or be refused with a
/// <see cref="DataFileException"/> that names the file (and the line, where one line is at fault); nothing else.
/// </summary>
public class DataFileFuzzTests
{
    private static readonly string[] CaptureLines =
    {
        "{t},{v}", "{t},{v}", "{t},{v}", "{t};{v}", "{t}\t{v}", "{t},", ",{v}", "{t},abc", "{t},NaN", "{t},1e400", "0,{v}", "{t},{v},extra",
        "Time (s),B (mT)", "# comment", "", "{t},١٢", "{t},{v}", "\"{t}\",\"{v}\"",
    };

    private static readonly string[] MapLines = { "{x},{y},{z},0,0,{v}", "{x},{y},{z},0,0,{v}", "{x},{y},{z},abc,0,1", "{x},{y}", "{x},{y},{z},0,0,1e400", "" };

    [Fact]
    public void HostileCapturesLoadOrAreRefusedNamingTheFile()
    {
        var random = new Random(20261201);
        int loaded = 0, refused = 0;
        for (int trial = 0; trial < 300; trial++)
        {
            var text = new StringBuilder();
            double t = 0;
            int lines = random.Next(0, 30);
            bool clean = trial % 2 == 0;
            if (clean && random.Next(2) == 0)
            {
                text.Append("Time (s),B (mT)\n");
            }

            for (int k = 0; k < lines; k++)
            {
                t += clean ? 1e-6 + (random.NextDouble() * 1e-3) : random.Next(3) == 0 ? 0 : random.NextDouble() * 1e-3;
                string line = (clean ? CaptureLines[0] : CaptureLines[random.Next(CaptureLines.Length)])
                    .Replace("{t}", t.ToString("R", System.Globalization.CultureInfo.InvariantCulture))
                    .Replace("{v}", ((random.NextDouble() - 0.5) * 100).ToString("R", System.Globalization.CultureInfo.InvariantCulture));
                text.Append(line).Append('\n');
            }

            string path = Path.Combine(Path.GetTempPath(), "fuzz-capture-" + trial + ".csv");
            File.WriteAllText(path, text.ToString());
            try
            {
                PiecewiseLinearWaveform w = CaptureReader.Read(path, null, null, 1e-3, DriveKind.FluxDensity, "mT");
                Assert.True(w.SampleCount >= 2 && Finite.Is(w.PeakValue) && Finite.Is(w.PeakRate));
                loaded++;
            }
            catch (DataFileException ex)
            {
                Assert.Equal(path, ex.Path);
                Assert.Equal(CaptureReader.ErrorId, ex.ErrorId);
                refused++;
            }
            finally
            {
                File.Delete(path);
            }
        }

        Assert.True(loaded > 10 && refused > 10, loaded + " loaded, " + refused + " refused");
    }

    [Fact]
    public void HostileFieldMapsLoadOrAreRefusedNamingTheFile()
    {
        var random = new Random(20261202);
        int loaded = 0, refused = 0;
        for (int trial = 0; trial < 200; trial++)
        {
            var text = new StringBuilder(random.Next(5) == 0 ? "x,y,Bz\n" : "x (mm),y (mm),z (mm),Bx (mT),By (mT),Bz (mT)\n");
            bool full = random.Next(2) == 0;
            foreach (int x in new[] { 0, 10, 20 })
            {
                foreach (int y in new[] { 0, 10 })
                {
                    string line = full ? MapLines[0] : MapLines[random.Next(MapLines.Length)];
                    text.Append(line.Replace("{x}", x.ToString(System.Globalization.CultureInfo.InvariantCulture)).Replace("{y}", y.ToString(System.Globalization.CultureInfo.InvariantCulture)).Replace("{z}", "0")
                        .Replace("{v}", (1 + random.NextDouble()).ToString("R", System.Globalization.CultureInfo.InvariantCulture))).Append('\n');
                }
            }

            string path = Path.Combine(Path.GetTempPath(), "fuzz-map-" + trial + ".csv");
            File.WriteAllText(path, text.ToString());
            try
            {
                FieldMap map = FieldMap.Read(path);
                Assert.True(map.ReferenceTesla > 0 && Finite.Is(map.ReferenceTesla));
                loaded++;
            }
            catch (DataFileException ex)
            {
                Assert.Equal(FieldMap.ErrorId, ex.ErrorId);
                refused++;
            }
            finally
            {
                File.Delete(path);
            }
        }

        Assert.True(loaded > 10 && refused > 10, loaded + " loaded, " + refused + " refused");
    }
}
