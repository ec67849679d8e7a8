using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// A linear ramp: the drive holds <see cref="From"/> until the start, changes linearly to <see cref="To"/> over
/// the duration, then holds <see cref="To"/>. The textbook case: its rate is (To - From) / duration during the
/// ramp and zero outside.
/// </summary>
public sealed class RampWaveform : FieldWaveform
{
    /// <summary>Creates the ramp.</summary>
    /// <exception cref="InvalidInputException">A value is not finite, the duration or start is out of range, or the start is too late to resolve the duration.</exception>
    public RampWaveform(double from, double to, double durationSeconds, double startSeconds = 0, DriveKind drive = DriveKind.Unspecified)
        : base(drive)
    {
        Require.Finite("From", from);
        Require.Finite("To", to);
        Require.Positive("Duration", durationSeconds);
        PhysicalRanges.DriveDuration.Check(durationSeconds);
        DriveTiming.RequireResolvable(startSeconds, durationSeconds, "Duration");
        From = from;
        To = to;
        DurationSeconds = durationSeconds;
        StartSeconds = startSeconds;
    }

    /// <inheritdoc />
    public override string Form => "Ramp";

    /// <summary>The drive before the ramp.</summary>
    public double From { get; }

    /// <summary>The drive after the ramp.</summary>
    public double To { get; }

    /// <summary>How long the ramp takes, s.</summary>
    public double DurationSeconds { get; }

    /// <inheritdoc />
    public override double StartSeconds { get; }

    /// <inheritdoc />
    public override double EndSeconds => StartSeconds + DurationSeconds;

    /// <summary>The rate during the ramp, per second.</summary>
    public double Slope => (To - From) / DurationSeconds;

    /// <inheritdoc />
    public override double PeakValue => System.Math.Max(System.Math.Abs(From), System.Math.Abs(To));

    /// <inheritdoc />
    public override double PeakRate => System.Math.Abs(Slope);

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints => new[] { StartSeconds, EndSeconds };

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales => new[] { new TimeScale("ramp time", DurationSeconds) };

    /// <inheritdoc />
    public override double SignificantFrequencyHertz => EdgeTiming.KneeFrequencyHertz(DurationSeconds);

    /// <inheritdoc />
    public override double Value(double t)
    {
        if (t <= StartSeconds)
        {
            return From;
        }

        return t >= EndSeconds ? To : From + (Slope * (t - StartSeconds));
    }

    /// <inheritdoc />
    public override double Rate(double t) => t >= StartSeconds && t < EndSeconds ? Slope : 0.0;

    /// <inheritdoc />
    public override string Describe() =>
        "ramp " + SiFormat.Format(From, DriveUnit) + " to " + SiFormat.Format(To, DriveUnit) + " in "
        + SiFormat.Format(DurationSeconds, "s") + " from t = " + SiFormat.Format(StartSeconds, "s");
}
