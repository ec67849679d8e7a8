using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// A pulse train: one pulse repeated <see cref="Count"/> times every <see cref="PeriodSeconds"/>. Peak values are
/// those of one pulse; the train is solved in time, so heating accumulates from pulse to pulse. The pulse must
/// fit in the period and end where it began, or each repetition would jump.
/// </summary>
public sealed class RepeatedWaveform : FieldWaveform
{
    /// <summary>The most pulses in a train (a solver steps onto every breakpoint of every pulse).</summary>
    public const int MaxCount = 100_000;

    private readonly double[] _breakpoints;

    /// <summary>Creates the train.</summary>
    /// <exception cref="InvalidInputException">The count or period is out of range, or the pulse does not fit or does not return to its start.</exception>
    public RepeatedWaveform(FieldWaveform pulse, int count, double periodSeconds)
        : base(pulse.Drive)
    {
        if (pulse is RepeatedWaveform || pulse.IsPeriodic)
        {
            throw new InvalidInputException("Repeat", "repeats a single pulse; a " + pulse.Form.ToLowerInvariant() + " cannot be repeated");
        }

        if (count < 1 || count > MaxCount)
        {
            throw new InvalidInputException("Repeat", "must be between 1 and " + MaxCount + " pulses; got " + count);
        }

        PhysicalRanges.DriveDuration.For("Period").Check(periodSeconds);
        double length = pulse.EndSeconds - pulse.StartSeconds;
        if (length > periodSeconds * (1 + 1e-12))
        {
            throw new InvalidInputException("Period", "(" + SiFormat.Format(periodSeconds, "s") + ") is shorter than one pulse (" + SiFormat.Format(length, "s") + ")");
        }

        double first = pulse.Value(pulse.StartSeconds), last = pulse.Value(pulse.EndSeconds);
        if (Math.Abs(first - last) > 1e-9 * Math.Max(pulse.PeakValue, 1e-300))
        {
            throw new InvalidInputException("Repeat", "the pulse ends at " + SiFormat.Plain(last) + " but starts at " + SiFormat.Plain(first) + ": each repetition would jump; repeat a pulse that returns to its start (a trapezoid, a discharge, a fault)");
        }

        Pulse = pulse;
        Count = count;
        PeriodSeconds = periodSeconds;
        DriveTiming.RequireResolvable(EndSeconds, Math.Min(length, pulse.MaxStepSeconds * 50), "Period");
        var points = new List<double>(pulse.Breakpoints.Count * count);
        for (int k = 0; k < count; k++)
        {
            foreach (double b in pulse.Breakpoints)
            {
                points.Add(b + (k * periodSeconds));
            }
        }

        points.Sort();
        _breakpoints = points.ToArray();
    }

    /// <inheritdoc />
    public override string Form => Pulse.Form + " train";

    /// <summary>The pulse that repeats.</summary>
    public FieldWaveform Pulse { get; }

    /// <summary>How many pulses.</summary>
    public int Count { get; }

    /// <summary>The time from one pulse's start to the next, s.</summary>
    public override double PeriodSeconds { get; }

    /// <inheritdoc />
    public override double StartSeconds => Pulse.StartSeconds;

    /// <inheritdoc />
    public override double EndSeconds => Pulse.EndSeconds + ((Count - 1) * PeriodSeconds);

    /// <inheritdoc />
    public override double PeakValue => Pulse.PeakValue;

    /// <inheritdoc />
    public override double PeakRate => Pulse.PeakRate;

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints => _breakpoints;

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales
    {
        get
        {
            var scales = new List<TimeScale>(Pulse.TimeScales) { new("repetition period", PeriodSeconds) };
            return scales;
        }
    }

    /// <inheritdoc />
    public override double SignificantFrequencyHertz => Math.Max(Pulse.SignificantFrequencyHertz, 1 / PeriodSeconds);

    /// <inheritdoc />
    public override double MaxStepSeconds => Pulse.MaxStepSeconds;

    /// <summary>
    /// The pulse's own step at the same time within it (each pulse's breakpoints are the train's). The pulse is the one
    /// whose start t has reached to within a part in 1e9 of the period: at a pulse's start (a breakpoint, which rounding
    /// may leave an ulp short), that pulse's first step, not the step after the last pulse's crowbar.
    /// </summary>
    public override double MaxStepAt(double t)
    {
        double k = Math.Floor(((t - Pulse.StartSeconds) / PeriodSeconds) + 1e-9);
        int index = (int)Math.Max(0, Math.Min(Count - 1, k));
        return Pulse.MaxStepAt(t - (index * PeriodSeconds));
    }

    /// <inheritdoc />
    public override double Value(double t) => Pulse.Value(t - (Index(t) * PeriodSeconds));

    /// <inheritdoc />
    public override double Rate(double t) => Pulse.Rate(t - (Index(t) * PeriodSeconds));

    /// <inheritdoc />
    public override string Describe() =>
        Count + " x (" + Pulse.Describe() + ") every " + SiFormat.Format(PeriodSeconds, "s");

    private int Index(double t)
    {
        double k = Math.Floor((t - Pulse.StartSeconds) / PeriodSeconds);
        return (int)Math.Max(0, Math.Min(Count - 1, k));
    }
}
