using System.Collections.Generic;

namespace InductionHazard.Waveforms;

/// <summary>
/// The time course d(t) of a source's drive (tesla for a uniform field, amperes for a conductor) and its
/// rate d'(t), with the times a solver must step onto exactly and the time scales that set the physics.
/// </summary>
public abstract class FieldWaveform
{
    /// <summary>Creates a waveform of a drive kind.</summary>
    protected FieldWaveform(DriveKind drive)
    {
        Drive = drive;
    }

    /// <summary>The name of the form ("Ramp", "Sine").</summary>
    public abstract string Form { get; }

    /// <summary>What the values measure.</summary>
    public DriveKind Drive { get; }

    /// <summary>The drive at time t (s).</summary>
    public abstract double Value(double t);

    /// <summary>The rate of change of the drive at time t (per second); right-continuous at breakpoints.</summary>
    public abstract double Rate(double t);

    /// <summary>The largest magnitude of the drive.</summary>
    public abstract double PeakValue { get; }

    /// <summary>The largest magnitude of the rate.</summary>
    public abstract double PeakRate { get; }

    /// <summary>When the waveform begins to change, s.</summary>
    public abstract double StartSeconds { get; }

    /// <summary>When the drive stops changing (or the field is switched off), s; +infinity for a drive that runs on.</summary>
    public abstract double EndSeconds { get; }

    /// <summary>The times where the rate jumps, in increasing order; solvers step onto them exactly.</summary>
    public abstract IReadOnlyList<double> Breakpoints { get; }

    /// <summary>The characteristic times (rise time, period).</summary>
    public abstract IReadOnlyList<TimeScale> TimeScales { get; }

    /// <summary>
    /// The highest frequency with significant content, Hz: the frequency of a sine, the knee frequency
    /// 0.35 / rise time of an edge. Sets the quasi-static and skin-depth checks.
    /// </summary>
    public abstract double SignificantFrequencyHertz { get; }

    /// <summary>True for a drive that repeats with <see cref="PeriodSeconds"/> and is treated in periodic steady state.</summary>
    public virtual bool IsPeriodic => false;

    /// <summary>The period of a periodic drive, s; NaN otherwise.</summary>
    public virtual double PeriodSeconds => double.NaN;

    /// <summary>
    /// The largest step a time-stepping solver may take so that the emf is linear over each step to engineering
    /// accuracy: infinite for a piecewise-linear drive (every kink is a breakpoint), a fraction of the period or
    /// time constant for a curved one.
    /// </summary>
    public virtual double MaxStepSeconds => double.PositiveInfinity;

    /// <summary>
    /// The largest step from time t on, s: <see cref="MaxStepSeconds"/> (the least over the drive) unless a part of the
    /// drive is smoother than its most curved part, where a longer step keeps the emf as nearly linear over it. Never
    /// below <see cref="MaxStepSeconds"/>. A step that starts at t may take it only when no breakpoint lies within it
    /// (a time-stepping solver lands on every breakpoint, where the drive's form may change).
    /// </summary>
    public virtual double MaxStepAt(double t) => MaxStepSeconds;

    /// <summary>The same drive shifted in phase (for the other phases of a three-phase set).</summary>
    /// <exception cref="Errors.InvalidInputException">The form has no phase (only sines and faults do).</exception>
    public virtual FieldWaveform WithPhaseShift(double radians) =>
        throw new Errors.InvalidInputException("Waveform", "a " + Form.ToLowerInvariant() + " has no phase to shift; a three-phase set needs a sine or a fault waveform");

    /// <summary>The drive's unit symbol ("T", "A", or "" when unspecified).</summary>
    public string DriveUnit => Drive switch
    {
        DriveKind.FluxDensity => "T",
        DriveKind.Current => "A",
        _ => string.Empty,
    };

    /// <summary>A one-line description with units ("ramp 0 T to 3 T in 2 ms from 0 s").</summary>
    public abstract string Describe();

    /// <inheritdoc />
    public override string ToString() => Describe();
}
