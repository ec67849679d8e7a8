using System;
using System.Numerics;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The force and torque on a path set in a periodic steady state: with drives d_j(t) = Im(D_j e^(j omega t)) and modal
/// amplitudes z_k(t) = Im(Z_k e^(j omega t)), the force sum_j d_j(t) sum_k G_kj z_k(t) is a product of two sinusoids: a
/// mean and a part at twice the frequency. Both, and the peak over the cycle, from 64 samples of one period.
/// </summary>
/// <param name="PeakForce">The force of largest magnitude over the cycle, N.</param>
/// <param name="MeanForce">The cycle-averaged force, N: a steady push or pull while the field runs.</param>
/// <param name="PeakTorqueNewtonMeters">The largest torque on the item's moment over the cycle, N m.</param>
public readonly record struct SteadyMechanics(Vector3D PeakForce, Vector3D MeanForce, double PeakTorqueNewtonMeters)
{
    /// <summary>The largest |m| |B| over the cycle, N m, when it was asked for (<see cref="MomentField(ModalCircuit, Complex[], Complex[], Vector3D[])"/>); 0 otherwise.</summary>
    public double PeakMomentField { get; init; }

    private const int Samples = 64;

    /// <summary>The sine and cosine of each sample's phase, 2 pi n / 64, found once.</summary>
    private static readonly double[] Sines = Table(Math.Sin, Samples), Cosines = Table(Math.Cos, Samples);

    private static double[] Table(Func<double, double> f, int samples)
    {
        var values = new double[samples];
        for (int n = 0; n < samples; n++)
        {
            values[n] = f(2 * Math.PI * n / samples);
        }

        return values;
    }

    /// <summary>The force and torque over one cycle.</summary>
    /// <param name="circuit">The modes with their force coupling and moment weights.</param>
    /// <param name="modal">The modal amplitude phasors Z_k.</param>
    /// <param name="drives">The drive phasors D_j.</param>
    /// <param name="torqueField">n x b_j per term (null for no torque).</param>
    public static SteadyMechanics Of(ModalCircuit circuit, Complex[] modal, Complex[] drives, Vector3D[]? torqueField)
    {
        if (Inert(circuit, modal, drives, torqueField))
        {
            // No field gradient and no field across the moment: every phase's force and torque are exactly zero.
            return new SteadyMechanics(Vector3D.Zero, Vector3D.Zero, 0);
        }

        int terms = drives.Length;
        var forceRe = new Vector3D[terms];
        var forceIm = new Vector3D[terms];
        Complex moment = Complex.Zero;
        for (int k = 0; k < modal.Length; k++)
        {
            for (int j = 0; j < terms && circuit.ForceCoupling is { } g; j++)
            {
                forceRe[j] += modal[k].Real * g[k, j];
                forceIm[j] += modal[k].Imaginary * g[k, j];
            }

            if (circuit.MomentWeights is { } a)
            {
                moment += a[k] * modal[k];
            }
        }

        // Squared lengths compared (the square root is monotone): one root at the end instead of two per phase.
        Vector3D peak = Vector3D.Zero, mean = Vector3D.Zero;
        double peakSquared = 0, peakTorqueSquared = 0;
        for (int n = 0; n < Samples; n++)
        {
            double sin = Sines[n], cos = Cosines[n];
            var rotor = new Complex(cos, sin);
            double m = (moment * rotor).Imaginary;
            Vector3D force = Vector3D.Zero, torque = Vector3D.Zero;
            for (int j = 0; j < terms; j++)
            {
                double d = (drives[j] * rotor).Imaginary;

                // Im(P e^(j phase)) = Re(P) sin(phase) + Im(P) cos(phase), componentwise.
                force += d * ((sin * forceRe[j]) + (cos * forceIm[j]));
                if (torqueField is not null)
                {
                    torque += (m * d) * torqueField[j];
                }
            }

            mean += (1.0 / Samples) * force;
            double squared = force.Dot(force);
            if (squared > peakSquared)
            {
                (peak, peakSquared) = (force, squared);
            }

            peakTorqueSquared = Math.Max(peakTorqueSquared, torque.Dot(torque));
        }

        return new SteadyMechanics(peak, mean, Math.Sqrt(peakTorqueSquared));
    }

    /// <summary>
    /// The largest |m(t)| |B(t)| over the cycle, the moment's size times the field's at the centre, N m: what the torque
    /// on the moment would be were the field square to it (an item whose orientation the engine chose turns the
    /// moment across the field). In closed form for a field of one direction; for one that turns, by samples of the
    /// period with a margin that keeps it at or above the peak.
    /// </summary>
    /// <param name="circuit">The modes with their moment weights.</param>
    /// <param name="modal">The modal amplitude phasors Z_k.</param>
    /// <param name="drives">The drive phasors D_j.</param>
    /// <param name="centreField">b_j, each term's field per unit drive at the centre.</param>
    public static double MomentField(ModalCircuit circuit, Complex[] modal, Complex[] drives, Vector3D[] centreField)
    {
        if (circuit.MomentWeights is not { } a)
        {
            return 0;
        }

        Complex moment = Complex.Zero;
        for (int k = 0; k < modal.Length; k++)
        {
            moment += a[k] * modal[k];
        }

        // B(t) = Im(P e^(j phase)) with P = sum_j D_j b_j, componentwise: Re(P) sin + Im(P) cos.
        Vector3D fieldRe = Vector3D.Zero, fieldIm = Vector3D.Zero;
        for (int j = 0; j < drives.Length; j++)
        {
            fieldRe += drives[j].Real * centreField[j];
            fieldIm += drives[j].Imaginary * centreField[j];
        }

        if (fieldRe.Length == 0 && fieldIm.Length == 0)
        {
            // No field at the centre: no torque (a moment that is not finite stays not finite).
            return 0 * moment.Magnitude;
        }

        if (fieldRe.Cross(fieldIm).Length <= 1e-12 * fieldRe.Length * fieldIm.Length || fieldRe.Length == 0 || fieldIm.Length == 0)
        {
            // A field of one direction, B(t) = beta(t) u: m beta = (a1 sin + a2 cos)(b1 sin + b2 cos) = C + A cos(2 phase - g),
            // whose largest size is |C| + |A|, with C = (a1 b1 + a2 b2) / 2 and |A| = |(a2 b2 - a1 b1, a1 b2 + a2 b1)| / 2.
            Vector3D u = fieldRe.Length >= fieldIm.Length ? fieldRe.Normalized() : fieldIm.Normalized();
            double a1 = moment.Real, a2 = moment.Imaginary, b1 = fieldRe.Dot(u), b2 = fieldIm.Dot(u);
            double mean = 0.5 * ((a1 * b1) + (a2 * b2));
            double swing = 0.5 * Math.Sqrt(((a2 * b2) - (a1 * b1)) * ((a2 * b2) - (a1 * b1)) + (((a1 * b2) + (a2 * b1)) * ((a1 * b2) + (a2 * b1))));
            return Math.Abs(mean) + swing;
        }

        // A field that turns: by 256 samples of the period. m^2 |B|^2 is a trigonometric polynomial of degree 4, so within
        // half a sample's step d of its peak it is at least the peak times cos(4 d) (Szego's form of Bernstein's
        // inequality): the largest sample over that factor is at or above the peak.
        double peak = 0;
        for (int n = 0; n < TurningSamples; n++)
        {
            double sin = TurningSines[n], cos = TurningCosines[n];
            double m = (moment.Real * sin) + (moment.Imaginary * cos);
            Vector3D field = (sin * fieldRe) + (cos * fieldIm);
            double squared = m * m * field.Dot(field);
            peak = double.IsNaN(squared) ? double.NaN : Math.Max(peak, squared);
        }

        return Math.Sqrt(peak / TurningStep);
    }

    private const int TurningSamples = 256;

    /// <summary>cos(4 pi / 256): the least a degree-4 product can fall to half a sample's step from its peak, relative.</summary>
    private static readonly double TurningStep = Math.Cos(4 * Math.PI / TurningSamples);

    private static readonly double[] TurningSines = Table(Math.Sin, TurningSamples), TurningCosines = Table(Math.Cos, TurningSamples);

    /// <summary>
    /// True when the loop below would give exactly zero: every force coupling and torque field zero (or absent), and
    /// every amplitude, drive and moment weight finite (zero times an infinity or a NaN is not zero).
    /// </summary>
    private static bool Inert(ModalCircuit circuit, Complex[] modal, Complex[] drives, Vector3D[]? torqueField)
    {
        if (!StepMechanics.NoForceOrTorque(circuit, torqueField))
        {
            return false;
        }

        foreach (Complex c in modal)
        {
            if (!Finite.Is(c.Real) || !Finite.Is(c.Imaginary))
            {
                return false;
            }
        }

        foreach (Complex d in drives)
        {
            if (!Finite.Is(d.Real) || !Finite.Is(d.Imaginary))
            {
                return false;
            }
        }

        foreach (double a in circuit.MomentWeights ?? Array.Empty<double>())
        {
            if (!Finite.Is(a))
            {
                return false;
            }
        }

        return true;
    }
}
