using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// An exponential decay, d(t) = To + (From - To) e^(-(t - start)/tau) after the start and From before it: a
/// magnet quench or a fast discharge through a dump resistor (first-order circuit theory).
/// </summary>
public sealed class DecayWaveform : FieldWaveform
{
    /// <summary>The decay is followed for this many time constants (e^-14 = 8e-7 of the change remains).</summary>
    public const double TimeConstantsFollowed = 14;

    /// <summary>Creates the decay.</summary>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public DecayWaveform(double from, double timeConstantSeconds, double to = 0, double startSeconds = 0, DriveKind drive = DriveKind.Unspecified)
        : base(drive)
    {
        Require.Finite("From", from);
        Require.Finite("To", to);
        Require.Positive("TimeConstant", timeConstantSeconds);
        PhysicalRanges.DriveDuration.For("TimeConstant").Check(timeConstantSeconds);
        DriveTiming.RequireResolvable(startSeconds, timeConstantSeconds, "TimeConstant");
        From = from;
        To = to;
        TimeConstantSeconds = timeConstantSeconds;
        StartSeconds = startSeconds;
    }

    /// <inheritdoc />
    public override string Form => "Decay";

    /// <summary>The drive before the decay.</summary>
    public double From { get; }

    /// <summary>The level the drive decays to.</summary>
    public double To { get; }

    /// <summary>The time constant tau, s.</summary>
    public double TimeConstantSeconds { get; }

    /// <inheritdoc />
    public override double StartSeconds { get; }

    /// <inheritdoc />
    public override double EndSeconds => StartSeconds + (TimeConstantsFollowed * TimeConstantSeconds);

    /// <inheritdoc />
    public override double PeakValue => Math.Max(Math.Abs(From), Math.Abs(To));

    /// <inheritdoc />
    public override double PeakRate => Math.Abs(From - To) / TimeConstantSeconds;

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints => new[] { StartSeconds, EndSeconds };

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales => new[] { new TimeScale("time constant", TimeConstantSeconds) };

    /// <summary>The corner frequency 1 / (2 pi tau) of the decay, Hz; its content falls off above it.</summary>
    public override double SignificantFrequencyHertz => 1 / (2 * Math.PI * TimeConstantSeconds);

    /// <inheritdoc />
    public override double MaxStepSeconds => TimeConstantSeconds / StepsPerTimeConstant;

    /// <summary>The steps per time constant of an exponential decay: its emf, e^(-t/tau), is then linear over a step to about 1e-5.</summary>
    internal const double StepsPerTimeConstant = 50;

    /// <inheritdoc />
    public override double Value(double t) => t <= StartSeconds ? From : To + ((From - To) * Math.Exp(-(t - StartSeconds) / TimeConstantSeconds));

    /// <inheritdoc />
    public override double Rate(double t) =>
        t < StartSeconds || t >= EndSeconds ? 0.0 : -(From - To) / TimeConstantSeconds * Math.Exp(-(t - StartSeconds) / TimeConstantSeconds);

    /// <inheritdoc />
    public override string Describe() =>
        "decay " + SiFormat.Format(From, DriveUnit) + " to " + SiFormat.Format(To, DriveUnit) + " with time constant "
        + SiFormat.Format(TimeConstantSeconds, "s") + " from t = " + SiFormat.Format(StartSeconds, "s");
}
