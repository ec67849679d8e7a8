using System;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A source's field at one point over the drive: the largest |B| and |dB/dt|, the field vector when |B| peaks,
/// and the frequency that governs skin depth. B(p, t) = sum b_k(p) d_k(t) sampled at every breakpoint and finely
/// between (<see cref="DriveSampling"/>).
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
        Vector3D real = Vector3D.Zero, imaginary = Vector3D.Zero;
        for (int k = 0; k < perDrive.Length; k++)
        {
            var sine = (SineWaveform)source.Terms[k].Waveform;
            double angle = sine.PhaseRadians - (sine.AngularFrequency * sine.StartSeconds);
            real += sine.Amplitude * Math.Cos(angle) * perDrive[k];
            imaginary += sine.Amplitude * Math.Sin(angle) * perDrive[k];
        }

        return Math.Sqrt(real.Dot(real) + imaginary.Dot(imaginary)) / Math.Sqrt(2);
    }
}
