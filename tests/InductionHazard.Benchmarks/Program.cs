using System;
using System.Diagnostics;
using System.IO;
using BenchmarkDotNet.Running;
using InductionHazard.Waveforms;

namespace InductionHazard.Benchmarks;

/// <summary>
/// Runs the engine's benchmarks (BenchmarkDotNet; pass its usual arguments, such as --filter '*'), or with
/// "memory capture" or "memory baseline" loads the 1,000,000-row capture once in this process and prints the
/// process's peak working set, so two runs compare the memory of the module's loader with the baseline's.
/// </summary>
public static class Program
{
    /// <summary>The entry point.</summary>
    public static int Main(string[] args)
    {
        if (args.Length == 2 && args[0] == "memory")
        {
            string path = CaptureBenchmarks.WriteCapture(CaptureBenchmarks.Rows);
            GC.Collect();
            long before = Process.GetCurrentProcess().PeakWorkingSet64;
            var watch = Stopwatch.StartNew();
            double result = args[1] == "capture"
                ? CaptureReader.Read(path, null, null, 1e-3, DriveKind.FluxDensity, "mT").PeakValue
                : CaptureBenchmarks.Baseline(path);
            watch.Stop();
            Process p = Process.GetCurrentProcess();
            p.Refresh();
            Console.WriteLine($"{args[1]}: {watch.Elapsed.TotalSeconds:F2} s, peak working set {p.PeakWorkingSet64 / 1048576.0:F0} MiB (before loading {before / 1048576.0:F0} MiB), result {result:G4}");
            File.Delete(path);
            return 0;
        }

        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
        return 0;
    }
}
