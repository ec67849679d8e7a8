using System;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A source's field at one point over the drive: the largest |B| and |dB/dt|, the field vector when |B| peaks,
/// and the frequency that governs skin depth. B(p, t) = sum b_k(p) d_k(t) sampled at every breakpoint and finely
/// between (<see cref="DriveSampling"/>); for sinusoids of one frequency that all start and end together and run for
/// at least a period, in closed form from the field's phasor instead (the sampling's 200 looks a period fell short
/// of the peak by up to 1.2e-4).
/// </summary>
/// <param name="Position">The point, m.</param>
/// <param name="PeakFluxDensityTesla">The largest |B|, T.</param>
/// <param name="PeakRateTeslaPerSecond">The largest |dB/dt|, T/s.</param>
/// <param name="FieldAtPeak">The field vector when |B| is largest, T.</param>
/// <param name="PeakSeconds">When |B| is largest, s.</param>
/// <param name="FrequencyHertz">The highest significant frequency of the drives, Hz.</param>
/// <param name="SourceName">The source's name.</param>
public sealed record FieldStrength(Vector3D Position, double PeakFluxDensityTesla, double PeakRateTeslaPerSecond, Vector3D FieldAtPeak, double PeakSeconds, double FrequencyHertz, string SourceName)
{
    /// <summary>
    /// For a sinusoidal source, the resultant rms of its field, T: the root of the time average of |B|^2 over a period,
    /// which is the root of the sum of the squares of the components' rms values, as a three-axis meter reports the
    /// field (IEC 61786-1's resultant, from memory). A field of one direction gives its peak over sqrt 2; one that turns
    /// as it alternates (beside a three-phase set, where the conductors' fields point different ways and peak at
    /// different times) up to sqrt 2 times that, which the peak over sqrt 2 would understate. Null for any other source.
    /// </summary>
    public double? RmsFluxDensityTesla { get; init; }

    /// <summary>Evaluates the field of a source at a point.</summary>
    /// <exception cref="FieldEvaluationException">The point is on a conductor, outside a map, or where a model does not hold.</exception>
    public static FieldStrength At(FieldSource source, Vector3D point)
    {
        Vector3D[] b = source.FieldPerUnitDrive(point);
        if (RunsTogetherForAPeriod(source))
        {
            return Sinusoidal(source, point, b);
        }

        FieldWaveform[] drives = source.Terms.Select(t => t.Waveform).ToArray();
        double peak = 0, peakRate = 0, when = drives[0].StartSeconds;
        Vector3D atPeak = Vector3D.Zero;
        foreach (double t in DriveSampling.Times(drives))
        {
            Vector3D field = Vector3D.Zero, rate = Vector3D.Zero;
            for (int k = 0; k < b.Length; k++)
            {
                field += drives[k].Value(t) * b[k];
                rate += drives[k].Rate(t) * b[k];
            }

            double magnitude = field.Length;
            if (magnitude > peak)
            {
                peak = magnitude;
                atPeak = field;
                when = t;
            }

            peakRate = Math.Max(peakRate, rate.Length);
        }

        return new FieldStrength(point, peak, peakRate, atPeak, when, source.SignificantFrequencyHertz, source.Name)
        {
            RmsFluxDensityTesla = source.IsSinusoidal ? ResultantRms(source, b) : null,
        };
    }

    /// <summary>
    /// The resultant rms from the field's phasor B = sum_k b_k A_k e^(j(phi_k - omega S_k)): sqrt(|Re B|^2 + |Im B|^2) / sqrt 2.
    /// A field of one direction and phase gives its peak over sqrt 2 to the last digit (sqrt(x^2) is x), so a field set
    /// exactly at a level lands on it.
    /// </summary>
    private static double ResultantRms(FieldSource source, Vector3D[] perDrive)
    {
        (Vector3D real, Vector3D imaginary) = Phasor(source, perDrive);
        return Math.Sqrt(real.Dot(real) + imaginary.Dot(imaginary)) / Math.Sqrt(2);
    }

    /// <summary>The real and imaginary parts of the field's phasor: B(t) = Re B sin(omega t) + Im B cos(omega t).</summary>
    private static (Vector3D Real, Vector3D Imaginary) Phasor(FieldSource source, Vector3D[] perDrive)
    {
        Vector3D real = Vector3D.Zero, imaginary = Vector3D.Zero;
        for (int k = 0; k < perDrive.Length; k++)
        {
            System.Numerics.Complex d = ((SineWaveform)source.Terms[k].Waveform).Phasor;
            real += d.Real * perDrive[k];
            imaginary += d.Imaginary * perDrive[k];
        }

        return (real, imaginary);
    }

    /// <summary>
    /// Whether every term is a sinusoid of the one frequency, all starting and ending together and running for at least
    /// a period: the field then goes round its whole ellipse, and its peak is the ellipse's. (Terms that start apart can
    /// peak, one alone, above their sum; a burst shorter than a period may not reach the peak.)
    /// </summary>
    private static bool RunsTogetherForAPeriod(FieldSource source)
    {
        if (!source.IsSinusoidal)
        {
            return false;
        }

        var first = (SineWaveform)source.Terms[0].Waveform;
        foreach (SourceTerm term in source.Terms)
        {
            var sine = (SineWaveform)term.Waveform;
            if (sine.StartSeconds != first.StartSeconds || sine.DurationSeconds != first.DurationSeconds)
            {
                return false;
            }
        }

        return first.DurationSeconds is not { } d || d >= first.PeriodSeconds;
    }

    /// <summary>
    /// The peak of a sinusoidal field in closed form. With B(t) = P sin(theta) + Q cos(theta), theta = omega t, |B|^2 =
    /// (a + c)/2 + ((c - a)/2) cos 2 theta + b sin 2 theta (a = P.P, c = Q.Q, b = P.Q): largest, at the ellipse's major
    /// semi-axis, where 2 theta = atan2(2 b, c - a), the first such instant at or after the start (|B| repeats every half
    /// period, B itself with its sign turned). dB/dt = omega (P cos theta - Q sin theta) traces an ellipse with the same
    /// axes, so its largest magnitude is omega times the peak.
    /// </summary>
    private static FieldStrength Sinusoidal(FieldSource source, Vector3D point, Vector3D[] perDrive)
    {
        var first = (SineWaveform)source.Terms[0].Waveform;
        double omega = first.AngularFrequency;
        (Vector3D p, Vector3D q) = Phasor(source, perDrive);
        double a = p.Dot(p), c = q.Dot(q), b = p.Dot(q);
        double peak = Math.Sqrt(0.5 * ((a + c) + Math.Sqrt(((a - c) * (a - c)) + (4 * b * b))));
        double theta = 0.5 * Math.Atan2(2 * b, c - a);
        double halfPeriods = Math.Ceiling(((omega * first.StartSeconds) - theta) / Math.PI);
        double at = (theta + (halfPeriods * Math.PI)) / omega;
        Vector3D field = ((Math.Sin(theta) * p) + (Math.Cos(theta) * q)) * (Math.Abs(halfPeriods % 2) == 1 ? -1 : 1);
        return new FieldStrength(point, peak, omega * peak, field, at, source.SignificantFrequencyHertz, source.Name)
        {
            RmsFluxDensityTesla = ResultantRms(source, perDrive),
        };
    }
}
