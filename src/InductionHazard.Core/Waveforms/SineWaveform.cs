using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// A steady sinusoid d(t) = A sin(2 pi f (t - start) + phi), A the peak value. The field is taken to have
/// reached periodic steady state (switch-on transients are not modelled); it runs for
/// <see cref="DurationSeconds"/> from the start, or indefinitely when no duration is given.
/// </summary>
public sealed class SineWaveform : FieldWaveform
{
    /// <summary>Creates the sinusoid.</summary>
    /// <exception cref="InvalidInputException">A value is not finite, the frequency, duration or start is out of range, or the start is too late to resolve a period.</exception>
    public SineWaveform(double amplitude, double frequencyHertz, double phaseRadians = 0, double? durationSeconds = null, double startSeconds = 0, DriveKind drive = DriveKind.Unspecified)
        : base(drive)
    {
        Require.NonNegative("Amplitude", amplitude);
        Require.Positive("Frequency", frequencyHertz);
        PhysicalRanges.Frequency.Check(frequencyHertz);
        Require.Finite("PhaseDegrees", phaseRadians);
        if (durationSeconds is { } d)
        {
            Require.Positive("Duration", d);
            PhysicalRanges.DriveDuration.Check(d);
        }

        DriveTiming.RequireResolvable(startSeconds, 1.0 / frequencyHertz, "Frequency");

        Amplitude = amplitude;
        FrequencyHertz = frequencyHertz;
        PhaseRadians = phaseRadians;
        DurationSeconds = durationSeconds;
        StartSeconds = startSeconds;
    }

    /// <inheritdoc />
    public override string Form => "Sine";

    /// <summary>The peak value A.</summary>
    public double Amplitude { get; }

    /// <summary>The rms value A / sqrt 2.</summary>
    public double RmsAmplitude => Amplitude / Math.Sqrt(2);

    /// <summary>The frequency f, Hz.</summary>
    public double FrequencyHertz { get; }

    /// <summary>The angular frequency 2 pi f, rad/s.</summary>
    public double AngularFrequency => 2 * Math.PI * FrequencyHertz;

    /// <summary>The phase at the start, rad.</summary>
    public double PhaseRadians { get; }

    /// <summary>
    /// The drive's phasor D = A e^(j(phi - omega S)), so that d(t) = Im(D e^(j omega t)) at every time: the one phase
    /// reference every term of a sinusoidal source shares (the engine's currents, the worst orientation, the field's
    /// peak and rms).
    /// </summary>
    public System.Numerics.Complex Phasor => System.Numerics.Complex.FromPolarCoordinates(Amplitude, PhaseRadians - (AngularFrequency * StartSeconds));

    /// <summary>How long the field runs, s; null when it runs indefinitely.</summary>
    public double? DurationSeconds { get; }

    /// <inheritdoc />
    public override double StartSeconds { get; }

    /// <inheritdoc />
    public override double EndSeconds => DurationSeconds is { } d ? StartSeconds + d : double.PositiveInfinity;

    /// <inheritdoc />
    public override bool IsPeriodic => true;

    /// <inheritdoc />
    public override double PeriodSeconds => 1.0 / FrequencyHertz;

    /// <inheritdoc />
    public override double PeakValue => Amplitude;

    /// <inheritdoc />
    public override double PeakRate => AngularFrequency * Amplitude;

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints =>
        DurationSeconds is null ? new[] { StartSeconds } : new[] { StartSeconds, EndSeconds };

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales => new[] { new TimeScale("period", PeriodSeconds) };

    /// <inheritdoc />
    public override double SignificantFrequencyHertz => FrequencyHertz;

    /// <inheritdoc />
    public override double Value(double t) => Amplitude * Math.Sin((AngularFrequency * (t - StartSeconds)) + PhaseRadians);

    /// <inheritdoc />
    public override double Rate(double t) => AngularFrequency * Amplitude * Math.Cos((AngularFrequency * (t - StartSeconds)) + PhaseRadians);

    /// <inheritdoc />
    public override double MaxStepSeconds => PeriodSeconds / 200;

    /// <inheritdoc />
    public override FieldWaveform WithPhaseShift(double radians) =>
        new SineWaveform(Amplitude, FrequencyHertz, PhaseRadians + radians, DurationSeconds, StartSeconds, Drive);

    /// <inheritdoc />
    public override string Describe() =>
        "sine " + SiFormat.Format(Amplitude, DriveUnit) + " peak at " + SiFormat.Format(FrequencyHertz, "Hz")
        + (DurationSeconds is { } d ? " for " + SiFormat.Format(d, "s") : " (continuous)");
}
