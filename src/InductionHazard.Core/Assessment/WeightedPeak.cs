using System;
using System.Linq;
using System.Numerics;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using MathNet.Numerics.IntegralTransforms;

namespace InductionHazard.Assessment;

/// <summary>
/// The weighted-peak method for a field that is neither static nor a sinusoid (ICNIRP 2010, Health Phys 99:818,
/// and its guidance on pulsed and complex fields, ICNIRP 2003, Health Phys 84:383): each spectral component of the
/// field is divided by the reference level at its frequency (as a peak value, the rms level times the square root of
/// 2) and shifted by the phase of the weighting (0 where the levels are flat, 90 degrees where they fall as 1/f, 180
/// where they fall as 1/f^2), the components are summed back in time, and each axis's largest weighted value is
/// combined with the others' as the root of the sum of their squares: the exposure index, at most 1 complies (for a
/// sinusoid of any polarization, its resultant rms over the reference level). Components below 1 Hz (the static part)
/// are left to the static limit.
/// </summary>
/// <remarks>
/// Computed from the field's rate of change, which returns to zero before and after the event, so that the discrete
/// Fourier transform of the record has no jump at its ends: B = (dB/dt) / (j 2 pi f) for every component above 1 Hz.
/// A periodic field is transformed over one period, which is exact; an event over a window of at least 1 s and four
/// times its length, padded with quiet field, so that the resolution reaches the lowest reference-level band.
/// </remarks>
public static class WeightedPeak
{
    /// <summary>The most samples a record may take.</summary>
    public const int MaxSamples = 1 << 22;

    /// <summary>The exposure index of a source's field at a point.</summary>
    /// <param name="source">The source.</param>
    /// <param name="point">The point, m.</param>
    /// <param name="publicExposure">True for the general public's reference levels.</param>
    /// <returns>The index (at most 1 complies), or a reason it cannot be computed.</returns>
    public static (double Index, string? Problem) At(FieldSource source, Vector3D point, bool publicExposure)
    {
        Vector3D[] perDrive = source.FieldPerUnitDrive(point);
        double significant = source.SignificantFrequencyHertz;
        if (!(significant <= ExposureLimits.HighestHertz))
        {
            return (double.NaN, "the field's significant frequency (" + SiFormat.Format(significant, "Hz") + ") is beyond the reference levels used here (10 MHz)");
        }

        (double start, double window, string? problem) = Window(source);
        if (problem is not null)
        {
            return (double.NaN, problem);
        }

        double shortest = source.Terms.SelectMany(t => t.Waveform.TimeScales).Select(s => s.Seconds).Where(s => s > 0).DefaultIfEmpty(window).Min();
        double step = Math.Min(Math.Min(1.0 / (40 * Math.Max(significant, ExposureLimits.LowestHertz)), shortest / 20), window / 64);
        long wanted = (long)Math.Ceiling(window / step);
        if (wanted > MaxSamples)
        {
            return (double.NaN, "the field changes too fast for its duration to be resolved in " + MaxSamples.ToString(System.Globalization.CultureInfo.InvariantCulture) + " samples");
        }

        int n = 1;
        while (n < wanted)
        {
            n <<= 1;
        }

        double dt = window / n;
        var x = new Complex[n];
        var y = new Complex[n];
        var z = new Complex[n];
        // Each sample is the rate averaged over its interval, the field's change over it divided by dt: a drive whose
        // rate jumps (a ramp's corners) then gives the same record however its jumps fall on the grid, where the rate
        // at the grid's instants would count a corner in or out whole.
        Vector3D FieldAt(double t)
        {
            Vector3D b = Vector3D.Zero;
            for (int k = 0; k < perDrive.Length; k++)
            {
                b += source.Terms[k].Waveform.Value(t) * perDrive[k];
            }

            return b;
        }

        Vector3D before = FieldAt(start);
        for (int i = 0; i < n; i++)
        {
            Vector3D after = FieldAt(start + ((i + 1) * dt));
            Vector3D rate = (1 / dt) * (after - before);
            before = after;
            x[i] = rate.X;
            y[i] = rate.Y;
            z[i] = rate.Z;
        }

        foreach (Complex[] c in new[] { x, y, z })
        {
            Fourier.Forward(c, FourierOptions.Matlab);
            for (int m = 0; m < n; m++)
            {
                int harmonic = m <= n / 2 ? m : m - n;
                double f = harmonic / window;
                Complex h = Filter(Math.Abs(f), publicExposure);

                // Averaging over an interval filters by sinc(pi f dt) and delays by dt/2: both undone, so a sinusoid
                // keeps its full amplitude and the samples their instants.
                double u = Math.PI * f * dt;
                double averaging = u == 0 ? 1 : Math.Sin(u) / u;
                c[m] *= (f < 0 ? Complex.Conjugate(h) : h) * Complex.FromPolarCoordinates(1 / averaging, u);
            }

            Fourier.Inverse(c, FourierOptions.Matlab);
        }

        // Each axis's weighted peak, combined as the root of the sum of their squares: for a sinusoid of any polarization
        // exactly its resultant rms over the reference level, as a field of one frequency is judged, where the largest
        // magnitude of the weighted vector would fall up to sqrt 2 lower for a field that turns (beside a three-phase set),
        // so that a trace of a harmonic would have judged such a field more leniently than the pure sinusoid. For a field
        // of one direction it is that largest magnitude; for any other, at least it.
        double peakX = AxisPeak(x), peakY = AxisPeak(y), peakZ = AxisPeak(z);
        double index = Math.Sqrt((peakX * peakX) + (peakY * peakY) + (peakZ * peakZ));
        return Finite.Is(index) ? (index, null) : (double.NaN, "the weighted field is not a finite number");
    }

    /// <summary>
    /// The largest magnitude of one axis's weighted record, raised to the vertex of the parabola through the largest
    /// sample and its two neighbours (the record is periodic) where they bend down to it: the samples of a sinusoid at
    /// 64 a period fall up to 0.12 % short of its crest, the vertex some 1e-5. The rise is at most an eighth of the
    /// samples' second difference, and never lowers the largest sample. NaN when any sample is.
    /// </summary>
    private static double AxisPeak(Complex[] record)
    {
        int n = record.Length, at = 0;
        double largest = 0;
        for (int i = 0; i < n; i++)
        {
            double magnitude = Math.Abs(record[i].Real);
            if (double.IsNaN(magnitude))
            {
                // Not a number anywhere is not a number for the axis, and so for the index: never a sample passed over.
                return double.NaN;
            }

            if (magnitude > largest)
            {
                (largest, at) = (magnitude, i);
            }
        }

        double sign = Math.Sign(record[at].Real);
        double before = sign * record[(at + n - 1) % n].Real, after = sign * record[(at + 1) % n].Real;
        double bend = (2 * largest) - before - after;
        return bend > 0 ? largest + ((before - after) * (before - after) / (8 * bend)) : largest;
    }

    /// <summary>
    /// The weighting applied to the rate of change at a frequency: 1/(j 2 pi f) to recover the field, times the
    /// reciprocal of the peak reference level, times the weighting's phase; zero below 1 Hz.
    /// </summary>
    public static Complex Filter(double f, bool publicExposure)
    {
        if (ExposureLimits.CountsAsStatic(f))
        {
            return Complex.Zero;
        }

        double band = Math.Min(f, ExposureLimits.HighestHertz);
        double rms = publicExposure ? ExposureLimits.PublicTesla(band) : ExposureLimits.OccupationalTesla(band);
        double phase = PhaseRadians(band, publicExposure);
        return Complex.FromPolarCoordinates(1.0 / (Math.Sqrt(2) * rms), phase) / new Complex(0, 2 * Math.PI * f);
    }

    /// <summary>
    /// The weighting's phase: pi where the levels fall as 1/f^2, pi/2 where as 1/f, 0 where flat; a frequency within
    /// rounding of a corner takes the band above it, as the corner itself does.
    /// </summary>
    public static double PhaseRadians(double f, bool publicExposure)
    {
        double firstFlat = 25, secondSlope = publicExposure ? 400 : 300;
        return ExposureLimits.Below(f, 8) ? Math.PI
            : ExposureLimits.Below(f, firstFlat) ? Math.PI / 2
            : ExposureLimits.Below(f, secondSlope) ? 0
            : ExposureLimits.Below(f, 3000) ? Math.PI / 2
            : 0;
    }

    /// <summary>The longest period when every other fits into it a whole number of times; null otherwise.</summary>
    private static double? CommonPeriod(FieldSource source)
    {
        double longest = source.Terms.Max(t => t.Waveform.PeriodSeconds);
        foreach (SourceTerm term in source.Terms)
        {
            double ratio = longest / term.Waveform.PeriodSeconds;
            if (!(Math.Abs(ratio - Math.Round(ratio)) < 1e-9 * ratio))
            {
                return null;
            }
        }

        return longest;
    }

    /// <summary>Where and how long a record covers the field's changes; a reason when it cannot.</summary>
    private static (double Start, double Window, string? Problem) Window(FieldSource source)
    {
        if (source.Terms.All(t => t.Waveform.IsPeriodic && double.IsPositiveInfinity(t.Waveform.EndSeconds)) && CommonPeriod(source) is { } common)
        {
            // Periodic with one period, or with periods that fit a whole number of times into the longest (50 and 150 Hz).
            return (source.Terms.Max(t => t.Waveform.StartSeconds) + common, common, null);
        }

        if (source.IsPeriodic)
        {
            double period = source.Terms[0].Waveform.PeriodSeconds;
            return (source.StartSeconds + period, period, null);
        }

        if (source.Terms.Any(t => t.Waveform.IsPeriodic && double.IsPositiveInfinity(t.Waveform.EndSeconds)))
        {
            return (0, 0, "the field runs on in terms that do not share one period, so no record covers it");
        }

        // An event: its changes, settled within 20 of its longest time scales where it has no end of its own.
        double start = source.StartSeconds;
        double end = source.Terms.Max(t => double.IsPositiveInfinity(t.Waveform.EndSeconds)
            ? t.Waveform.StartSeconds + (20 * t.Waveform.TimeScales.Select(s => s.Seconds).DefaultIfEmpty(1).Max())
            : t.Waveform.EndSeconds);
        double length = Math.Max(end - start, 1e-9);
        double window = Math.Max(4 * length, 1.0);
        return (start - (0.25 * (window - length)), window, null);
    }
}
