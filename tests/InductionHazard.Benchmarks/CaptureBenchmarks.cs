using System;
using System.Globalization;
using System.IO;
using BenchmarkDotNet.Attributes;
using InductionHazard.Waveforms;

namespace InductionHazard.Benchmarks;

/// <summary>
/// Loading a 1,000,000-row capture (time, value) into a waveform, against a baseline in the same run: the same
/// file read line by line and parsed into two arrays with no checks, the least any loader must do.
/// </summary>
[MemoryDiagnoser]
public class CaptureBenchmarks
{
    /// <summary>The rows of the capture file.</summary>
    public const int Rows = 1_000_000;

    private string _path = string.Empty;

    /// <summary>Writes the capture: a 50 Hz field sampled every microsecond, in mT.</summary>
    [GlobalSetup]
    public void Setup() => _path = WriteCapture(Rows);

    /// <summary>Deletes the capture.</summary>
    [GlobalCleanup]
    public void Cleanup() => File.Delete(_path);

    /// <summary>The baseline: lines split and parsed into arrays.</summary>
    [Benchmark(Baseline = true)]
    public double ParseLines() => Baseline(_path);

    /// <summary>The module's loader (CsvHelper, header detection, checks on every line).</summary>
    [Benchmark]
    public double LoadCapture() => CaptureReader.Read(_path, null, null, 1e-3, DriveKind.FluxDensity, "mT").PeakValue;

    /// <summary>Writes a capture of the given rows and returns its path.</summary>
    public static string WriteCapture(int rows)
    {
        string path = Path.Combine(Path.GetTempPath(), "induction-hazard-capture-" + rows + ".csv");
        using var writer = new StreamWriter(path);
        writer.WriteLine("Time (s),B (mT)");
        for (int k = 0; k < rows; k++)
        {
            double t = k * 1e-6;
            writer.WriteLine(t.ToString("R", CultureInfo.InvariantCulture) + "," + (3 * Math.Sin(2 * Math.PI * 50 * t)).ToString("R", CultureInfo.InvariantCulture));
        }

        return path;
    }

    /// <summary>The baseline loader.</summary>
    public static double Baseline(string path)
    {
        var times = new double[Rows];
        var values = new double[Rows];
        int n = 0;
        foreach (string line in File.ReadLines(path))
        {
            int comma = line.IndexOf(',');
            if (n == 0 && !char.IsDigit(line[0]))
            {
                continue;
            }

            times[n] = double.Parse(line.AsSpan(0, comma), NumberStyles.Float, CultureInfo.InvariantCulture);
            values[n] = double.Parse(line.AsSpan(comma + 1), NumberStyles.Float, CultureInfo.InvariantCulture);
            n++;
        }

        return values[n - 1] + times[n - 1];
    }
}
