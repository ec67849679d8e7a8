using System;
using System.Collections;
using System.Collections.Generic;
using System.Numerics;

namespace InductionHazard.Induction;

/// <summary>
/// One period of a sinusoidal emf and current, sampled evenly (the first and last samples a period apart), made
/// when read: only charts and exports read them, and an audit of a million items need not hold them all.
/// </summary>
public sealed class PeriodSamples : IReadOnlyList<CircuitSample>
{
    private readonly Complex _emf;
    private readonly Complex _current;
    private readonly double _frequency;
    private readonly double _start;
    private readonly double _celsius;
    private readonly int _intervals;

    /// <summary>Creates the samples.</summary>
    /// <param name="emf">The emf phasor (peak), V: the emf is Im(emf e^(j omega t)).</param>
    /// <param name="current">The current phasor (peak), A.</param>
    /// <param name="frequencyHertz">The frequency, Hz.</param>
    /// <param name="startSeconds">The time of the first sample, s.</param>
    /// <param name="celsius">The temperature recorded with each sample, °C.</param>
    /// <param name="intervals">The samples per period (one more sample closes the period).</param>
    public PeriodSamples(Complex emf, Complex current, double frequencyHertz, double startSeconds, double celsius, int intervals)
    {
        _emf = emf;
        _current = current;
        _frequency = frequencyHertz;
        _start = startSeconds;
        _celsius = celsius;
        _intervals = intervals;
    }

    /// <inheritdoc />
    public int Count => _intervals + 1;

    /// <inheritdoc />
    public CircuitSample this[int index]
    {
        get
        {
            if (index < 0 || index > _intervals)
            {
                throw new ArgumentOutOfRangeException(nameof(index));
            }

            double t = index / (_intervals * _frequency);
            Complex rotor = Complex.FromPolarCoordinates(1, 2 * Math.PI * _frequency * t);
            return new CircuitSample(_start + t, (_emf * rotor).Imaginary, (_current * rotor).Imaginary, _celsius);
        }
    }

    /// <inheritdoc />
    public IEnumerator<CircuitSample> GetEnumerator()
    {
        for (int k = 0; k <= _intervals; k++)
        {
            yield return this[k];
        }
    }

    /// <inheritdoc />
    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
