using System;
using System.Collections.Generic;

namespace InductionHazard.Criteria;

/// <summary>
/// The burn threshold of skin in contact with a hot, uncoated metal surface as a function of contact time,
/// after ISO 13732-1:2006 (figure 1 for contacts up to 10 s, uncoated metal, lower edge of the threshold band;
/// table 2 for 1 min and longer, all materials). Points used: 0.5 s and 1 s: 65 °C; 10 s: 55 °C; 1 min: 51 °C;
/// 10 min: 48 °C; 8 h: 43 °C; linear in the logarithm of time between them, held flat outside. The 1-10 s
/// values are read from secondary summaries of the figure (partly confirmed); the standard covers contacts of
/// 0.5 s and longer at an essentially constant surface temperature.
/// </summary>
public sealed class ContactBurnThreshold
{
    private readonly (double Seconds, double Celsius)[] _points;

    /// <summary>Creates a threshold curve from (contact time, temperature) points in increasing time.</summary>
    public ContactBurnThreshold(IReadOnlyList<(double Seconds, double Celsius)> points, string source)
    {
        if (points.Count < 1)
        {
            throw new ArgumentException("A threshold curve needs at least one point.", nameof(points));
        }

        _points = new (double, double)[points.Count];
        _logSeconds = new double[points.Count];
        for (int k = 0; k < points.Count; k++)
        {
            (double seconds, double celsius) = points[k];
            if (!(seconds > 0) || double.IsInfinity(seconds) || !Quantities.Finite.Is(celsius) || (k > 0 && !(seconds > points[k - 1].Seconds)))
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Point {k} of the threshold curve ({seconds} s, {celsius} °C): contact times must be finite, positive and increasing, temperatures finite."),
                    nameof(points));
            }

            _points[k] = points[k];
            _logSeconds[k] = Math.Log(seconds);
        }

        Source = source;
    }

    /// <summary>The natural logarithm of each point's contact time.</summary>
    private readonly double[] _logSeconds;

    /// <summary>The curve for uncoated metal described above.</summary>
    public static ContactBurnThreshold UncoatedMetal { get; } = new(
        new[] { (0.5, 65.0), (1.0, 65.0), (10.0, 55.0), (60.0, 51.0), (600.0, 48.0), (8 * 3600.0, 43.0) },
        Standards.ContactBurn);

    /// <summary>Where the curve comes from.</summary>
    public string Source { get; }

    /// <summary>The shortest contact time the curve covers, s.</summary>
    public double ShortestSeconds => _points[0].Seconds;

    /// <summary>The longest contact time the curve covers, s.</summary>
    public double LongestSeconds => _points[_points.Length - 1].Seconds;

    /// <summary>The curve's points.</summary>
    public IReadOnlyList<(double Seconds, double Celsius)> Points => _points;

    /// <summary>The threshold temperature for a contact of the given duration, °C.</summary>
    public double CelsiusFor(double contactSeconds)
    {
        if (contactSeconds <= _points[0].Seconds)
        {
            return _points[0].Celsius;
        }

        for (int k = 1; k < _points.Length; k++)
        {
            if (contactSeconds <= _points[k].Seconds)
            {
                (double t0, double c0) = _points[k - 1];
                (double t1, double c1) = _points[k];
                double f = Math.Log(contactSeconds / t0) / Math.Log(t1 / t0);
                return c0 + (f * (c1 - c0));
            }
        }

        return _points[_points.Length - 1].Celsius;
    }

    /// <summary>
    /// The threshold for a contact time given by its natural logarithm, °C: <see cref="CelsiusFor"/> with no logarithm
    /// taken, for a grid of contact times made from their logarithms (it agrees to rounding).
    /// </summary>
    public double CelsiusForLogSeconds(double logSeconds)
    {
        if (logSeconds <= _logSeconds[0])
        {
            return _points[0].Celsius;
        }

        for (int k = 1; k < _points.Length; k++)
        {
            if (logSeconds <= _logSeconds[k])
            {
                double f = (logSeconds - _logSeconds[k - 1]) / (_logSeconds[k] - _logSeconds[k - 1]);
                return _points[k - 1].Celsius + (f * (_points[k].Celsius - _points[k - 1].Celsius));
            }
        }

        return _points[_points.Length - 1].Celsius;
    }
}
