using System;
using System.Diagnostics;
using System.IO;
using BenchmarkDotNet.Running;
using InductionHazard.Waveforms;

namespace InductionHazard.Benchmarks;

/// <summary>
/// Runs the engine's benchmarks (BenchmarkDotNet; pass its usual arguments, such as --filter '*'), or with
/// "memory capture" or "memory baseline" loads the 1,000,000-row capture once in this process and prints the
/// process's peak working set, so two runs compare the memory of the module's loader with the baseline's; or with
/// "loop" and a number of seconds, times the ring assessments of <see cref="EngineBenchmarks"/> in a plain loop, one
/// line per case (tests/bench/CompareEngine.ps1 runs it against an earlier commit, alternately, in one session); with
/// "pulse-loop", the same for <see cref="PulseBodyBenchmarks"/> (CompareEngine.ps1 -PulseBody); with "sweep", writes the
/// lines of <see cref="RingSweep"/> (CompareEngine.ps1 -Sweep).
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

        if (args.Length == 2 && args[0] == "loop")
        {
            Loop(double.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture));
            return 0;
        }

        if (args.Length == 1 && args[0] == "sweep")
        {
            RingSweep.Write(Console.Out);
            return 0;
        }

        if (args.Length == 2 && args[0] == "pulse-loop")
        {
            PulseLoop(double.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture));
            return 0;
        }

        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
        return 0;
    }

    /// <summary>Each case of <see cref="PulseBodyBenchmarks"/> for about the time given (at least three runs), after three runs to warm up: milliseconds per assessment.</summary>
    private static void PulseLoop(double seconds)
    {
        var cases = new PulseBodyBenchmarks();
        cases.Setup();
        Time(
            new (string, Func<object>)[] { ("ring", () => cases.Ring()), ("drift-given", () => cases.DriftNormalGiven()), ("drift", () => cases.DriftNoNormal()) },
            warmUp: 3,
            batch: 1,
            least: 3,
            seconds,
            static (name, perRun) => FormattableString.Invariant($"{name} {perRun * 1e3:F3} ms"));
    }

    /// <summary>Each case of <see cref="EngineBenchmarks"/> for about the time given, after a warm-up: microseconds per assessment.</summary>
    private static void Loop(double seconds)
    {
        var cases = new EngineBenchmarks();
        cases.Setup();
        Time(
            new (string, Func<object>)[]
            {
                ("sine", () => cases.SineContinuous()),
                ("ramp10ms", () => cases.Ramp10Milliseconds()),
                ("ramp1s", () => cases.Ramp1Second()),
                ("row", () => cases.InventoryRowRamp10Milliseconds()),
                ("readrow", () => cases.ReadDistinctRow()),
            },
            warmUp: 20_000,
            batch: 1000,
            least: 1,
            seconds,
            static (name, perRun) => FormattableString.Invariant($"{name} {perRun * 1e6:F2} us"));
    }

    /// <summary>Each case warmed up, then run in batches for about the time given (at least <paramref name="least"/> batches), one line per case: the seconds per run, as the format writes it.</summary>
    private static void Time((string Name, Func<object> Run)[] cases, int warmUp, int batch, int least, double seconds, Func<string, double, string> format)
    {
        foreach ((string name, Func<object> run) in cases)
        {
            for (int i = 0; i < warmUp; i++)
            {
                run();
            }

            long count = 0;
            var watch = Stopwatch.StartNew();
            while (watch.Elapsed.TotalSeconds < seconds || count < least * batch)
            {
                for (int i = 0; i < batch; i++)
                {
                    run();
                }

                count += batch;
            }

            Console.WriteLine(format(name, watch.Elapsed.TotalSeconds / count));
        }
    }
}
