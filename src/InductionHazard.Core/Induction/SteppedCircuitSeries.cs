using System;
using System.Collections;
using System.Collections.Generic;
using System.Threading;

namespace InductionHazard.Induction;

/// <summary>
/// A one-path circuit's time series as a chart or an export reads it: the samples at the solver's step ends, and
/// within each step whose current moved by a visible share, points of the step's own exact solution i(s) = a + b s +
/// c e^(-s/tau), found only when the series is first read. The points are a quarter of tau apart while the
/// exponential part is more than a hundredth of the step's larger current, so that the straight lines between them
/// stray from the solution by at most a 128th of that part (a chord of e^(-s/tau) over tau/4 strays by (1/4)^2 / 8 of
/// its value at the chord's start); past that the current is a line to the step's end, within a hundredth of the step's
/// larger current. The solver's steps for such a circuit are
/// exact for any length, so they are as long as the heating and the drive allow; the points within them cost nothing
/// to an assessment that no one charts. Public so that a shell reads its count and items as it reads any list's.
/// </summary>
public sealed class SteppedCircuitSeries : IReadOnlyList<CircuitSample>
{
    /// <summary>The spacing of the points within a step, in the circuit's time constants L/R.</summary>
    private const double SpacingOfTau = 0.25;

    /// <summary>Points are placed while the exponential part is above this share of the step's larger current.</summary>
    private const double Visible = 0.01;

    /// <summary>The most points within one step (4 ln(1 / <see cref="Visible"/>) is some 18).</summary>
    private const int MostWithin = 24;

    private readonly List<CircuitSample> _ends;
    private readonly List<Fill> _fills;
    private readonly double _lambda;
    private readonly double _inverseLambda;
    private readonly double _weight;
    private readonly Func<double, double> _emf;
    private CircuitSample[]? _all;

    /// <summary>Creates the series.</summary>
    /// <param name="ends">The samples at the step ends, in time order.</param>
    /// <param name="fills">The steps to fill, each with the index in <paramref name="ends"/> of the sample at its end, in order.</param>
    /// <param name="lambda">The mode's time constant at unit resistance scale, s.</param>
    /// <param name="inverseLambda">1 / lambda.</param>
    /// <param name="weight">The total current per unit modal amplitude.</param>
    /// <param name="emf">The emf around the outline at a time, V.</param>
    internal SteppedCircuitSeries(List<CircuitSample> ends, List<Fill> fills, double lambda, double inverseLambda, double weight, Func<double, double> emf)
    {
        _ends = ends;
        _fills = fills;
        _lambda = lambda;
        _inverseLambda = inverseLambda;
        _weight = weight;
        _emf = emf;
    }

    /// <summary>The number of samples, the points within the steps included.</summary>
    public int Count => All.Length;

    /// <summary>A sample by its place in time order.</summary>
    public CircuitSample this[int index] => All[index];

    private CircuitSample[] All => _all ?? LazyInitializer.EnsureInitialized(ref _all, Build)!;

    /// <inheritdoc/>
    public IEnumerator<CircuitSample> GetEnumerator() => ((IEnumerable<CircuitSample>)All).GetEnumerator();

    /// <inheritdoc/>
    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    private CircuitSample[] Build()
    {
        var all = new List<CircuitSample>(_ends.Count + (8 * _fills.Count));
        int next = 0;
        for (int i = 0; i < _ends.Count; i++)
        {
            if (next < _fills.Count && _fills[next].EndIndex == i)
            {
                Fill f = _fills[next++];
                CircuitSample end = _ends[i];
                double seconds = end.TimeSeconds - f.StartSeconds;
                var rl = new RlStep.Circuit(_lambda, _inverseLambda, f.Scale, 1 / f.Scale);
                // i(s) = a + b s + c e^(-s/tau), in the mode's amplitude: c = i0 - (e0 - g tau) / R.
                double c = f.Amplitude - ((f.DriveStart - (f.DriveSlope * rl.Tau)) * rl.InverseR);
                double larger = Math.Max(Math.Abs(_weight * f.Amplitude), Math.Abs(end.CurrentAmperes));
                double spacing = SpacingOfTau * rl.Tau;
                for (int j = 1; j <= MostWithin; j++)
                {
                    double s = j * spacing;
                    if (!(s < seconds) || !(Math.Abs(_weight * c) * Math.Exp(-(s - spacing) / rl.Tau) > Visible * larger))
                    {
                        break;
                    }

                    double t = f.StartSeconds + s;
                    double current = _weight * RlStep.Current(rl, f.Amplitude, f.DriveStart, f.DriveSlope, s);
                    double celsius = f.StartCelsius + ((end.TemperatureCelsius - f.StartCelsius) * (s / seconds));
                    all.Add(new CircuitSample(t, _emf(t), current, celsius));
                }
            }

            all.Add(_ends[i]);
        }

        return all.ToArray();
    }

    /// <summary>One step to fill: where it starts, its mode's amplitude and drive line there, its resistance scale and its temperature at its start (its end is the sample at <see cref="EndIndex"/>).</summary>
    internal readonly struct Fill
    {
        public Fill(int endIndex, double startSeconds, double amplitude, double driveStart, double driveSlope, double scale, double startCelsius)
        {
            EndIndex = endIndex;
            StartSeconds = startSeconds;
            Amplitude = amplitude;
            DriveStart = driveStart;
            DriveSlope = driveSlope;
            Scale = scale;
            StartCelsius = startCelsius;
        }

        /// <summary>The index of the sample at the step's end.</summary>
        public int EndIndex { get; }

        public double StartSeconds { get; }

        public double Amplitude { get; }

        public double DriveStart { get; }

        public double DriveSlope { get; }

        public double Scale { get; }

        public double StartCelsius { get; }
    }
}
