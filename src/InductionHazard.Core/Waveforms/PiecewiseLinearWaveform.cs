using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// A drive given by its values at times, linear between them and held at the end values outside: a trapezoidal
/// pulse, or a sampled capture from an oscilloscope or logger. The rate is constant on each piece and every
/// sample is a breakpoint, so the transient solver is exact for it.
/// </summary>
public sealed class PiecewiseLinearWaveform : FieldWaveform
{
    private readonly double[] _times;
    private readonly double[] _values;

    /// <summary>Creates the waveform from its samples (copied).</summary>
    /// <param name="form">"Trapezoid" or "Samples".</param>
    /// <param name="times">The sample times, strictly increasing, s.</param>
    /// <param name="values">The drive at each time.</param>
    /// <param name="drive">What the values measure.</param>
    /// <param name="description">A one-line description.</param>
    /// <exception cref="InvalidInputException">Fewer than two samples, times not strictly increasing, or a value not finite.</exception>
    public PiecewiseLinearWaveform(string form, IReadOnlyList<double> times, IReadOnlyList<double> values, DriveKind drive, string description)
        : base(drive)
    {
        if (times.Count != values.Count || times.Count < 2)
        {
            throw new InvalidInputException("Samples", "a piecewise-linear drive needs at least two (time, value) samples; got " + Math.Min(times.Count, values.Count));
        }

        _times = new double[times.Count];
        _values = new double[values.Count];
        double shortest = double.PositiveInfinity, peak = 0, peakRate = 0;
        for (int k = 0; k < times.Count; k++)
        {
            _times[k] = Require.Finite("Samples", times[k]);
            _values[k] = Require.Finite("Samples", values[k]);
            peak = Math.Max(peak, Math.Abs(values[k]));
            if (k > 0)
            {
                double dt = times[k] - times[k - 1];
                if (!(dt > 0))
                {
                    throw new InvalidInputException("Samples", "times must be strictly increasing; sample " + (k + 1) + " at " + SiFormat.Format(times[k], "s") + " does not follow " + SiFormat.Format(times[k - 1], "s"));
                }

                shortest = Math.Min(shortest, dt);
                peakRate = Math.Max(peakRate, Math.Abs(values[k] - values[k - 1]) / dt);
            }
        }

        DriveTiming.RequireResolvable(_times[0], shortest, "Samples");
        PhysicalRanges.StartTime.For("Samples").Check(_times[_times.Length - 1]);
        Form = form;
        PeakValue = peak;
        PeakRate = peakRate;
        ShortestIntervalSeconds = shortest;
        _description = description;
    }

    private readonly string _description;

    /// <summary>A trapezoidal pulse from 0: up to the amplitude over the rise, flat, down to 0 over the fall.</summary>
    /// <exception cref="InvalidInputException">A time is not positive (the flat top may be zero).</exception>
    public static PiecewiseLinearWaveform Trapezoid(double amplitude, double riseSeconds, double flatSeconds, double fallSeconds, double startSeconds = 0, DriveKind drive = DriveKind.Unspecified)
    {
        Require.Finite("Amplitude", amplitude);
        PhysicalRanges.DriveDuration.For("RiseTime").Check(riseSeconds);
        PhysicalRanges.DriveDuration.For("FallTime").Check(fallSeconds);
        Require.NonNegative("FlatTime", flatSeconds);
        var times = new List<double> { startSeconds, startSeconds + riseSeconds };
        var values = new List<double> { 0, amplitude };
        if (flatSeconds > 0)
        {
            times.Add(startSeconds + riseSeconds + flatSeconds);
            values.Add(amplitude);
        }

        times.Add(startSeconds + riseSeconds + flatSeconds + fallSeconds);
        values.Add(0);
        string unit = drive switch { DriveKind.FluxDensity => "T", DriveKind.Current => "A", _ => string.Empty };
        return new PiecewiseLinearWaveform(
            "Trapezoid",
            times,
            values,
            drive,
            "trapezoid to " + SiFormat.Format(amplitude, unit) + ": rise " + SiFormat.Format(riseSeconds, "s") + ", flat " + SiFormat.Format(flatSeconds, "s")
            + ", fall " + SiFormat.Format(fallSeconds, "s") + " from t = " + SiFormat.Format(startSeconds, "s"));
    }

    /// <inheritdoc />
    public override string Form { get; }

    /// <summary>How many samples define the drive.</summary>
    public int SampleCount => _times.Length;

    /// <summary>The shortest interval between samples, s.</summary>
    public double ShortestIntervalSeconds { get; }

    /// <inheritdoc />
    public override double StartSeconds => _times[0];

    /// <inheritdoc />
    public override double EndSeconds => _times[_times.Length - 1];

    /// <inheritdoc />
    public override double PeakValue { get; }

    /// <inheritdoc />
    public override double PeakRate { get; }

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints => _times;

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales => new[]
    {
        new TimeScale("shortest interval", ShortestIntervalSeconds),
        new TimeScale("duration", EndSeconds - StartSeconds),
    };

    /// <summary>The knee frequency of the fastest edge: 0.35 over the shortest piece over which the drive changes, Hz.</summary>
    public override double SignificantFrequencyHertz => EdgeTiming.KneeFrequencyHertz(FastestEdgeSeconds());

    /// <inheritdoc />
    public override double Value(double t)
    {
        if (t <= _times[0])
        {
            return _values[0];
        }

        int n = _times.Length;
        if (t >= _times[n - 1])
        {
            return _values[n - 1];
        }

        int k = Piece(t);
        return _values[k] + ((_values[k + 1] - _values[k]) * (t - _times[k]) / (_times[k + 1] - _times[k]));
    }

    /// <inheritdoc />
    public override double Rate(double t)
    {
        if (t < _times[0] || t >= _times[_times.Length - 1])
        {
            return 0.0;
        }

        int k = Piece(t);
        return (_values[k + 1] - _values[k]) / (_times[k + 1] - _times[k]);
    }

    /// <inheritdoc />
    public override string Describe() => _description;

    /// <summary>The index k with times[k] &lt;= t &lt; times[k + 1] (binary search).</summary>
    private int Piece(double t)
    {
        int index = Array.BinarySearch(_times, t);
        int k = index >= 0 ? index : ~index - 1;
        return Math.Max(0, Math.Min(k, _times.Length - 2));
    }

    /// <summary>
    /// The rise time of the fastest edge: the full change of the drive over its fastest rate (the time that rate
    /// would take to cover the drive's span). For a trapezoid, its shorter edge.
    /// </summary>
    private double FastestEdgeSeconds()
    {
        double span = 0;
        double min = _values[0], max = _values[0];
        foreach (double v in _values)
        {
            min = Math.Min(min, v);
            max = Math.Max(max, v);
        }

        span = max - min;
        return PeakRate > 0 && span > 0 ? Math.Max(span / PeakRate, ShortestIntervalSeconds) : EndSeconds - StartSeconds;
    }
}
