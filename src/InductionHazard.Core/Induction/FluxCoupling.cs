using System;
using System.Collections.Generic;
using System.Linq;
using System.Numerics;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Induction;

/// <summary>
/// The coupling of a flat loop to a source: the flux per unit drive of each term, M_k = integral of b_k . n dA
/// over the loop's disc, and the orientation of the loop that links the largest flux change when none is given.
/// </summary>
public static class FluxCoupling
{
    /// <summary>The flux through the loop per unit drive of each term (Wb per tesla or per ampere).</summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static double[] PerUnitDrive(FieldSource source, Vector3D centre, Vector3D normal, LoopGeometry loop)
    {
        var coupling = new double[source.Terms.Count];
        for (int k = 0; k < coupling.Length; k++)
        {
            coupling[k] = Flux(source.Terms[k].Geometry, centre, normal, loop);
        }

        return coupling;
    }

    /// <summary>The flux per unit drive of one geometry through the loop's outline: a disc, or a rectangle whose width lies along <see cref="RectangularLoopGeometry.WidthDirection"/>.</summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static double Flux(IFieldGeometry geometry, Vector3D centre, Vector3D normal, LoopGeometry loop) => loop switch
    {
        RectangularLoopGeometry r when geometry is UniformField u => u.Direction.Dot(normal) * r.LoopAreaSquareMeters,
        RectangularLoopGeometry r => RectangleQuadrature.Flux(geometry.FieldPerUnitDrive, centre, normal, RectangularLoopGeometry.WidthDirection(normal), r.WidthMeters, r.HeightMeters),
        PrismBody p when geometry is UniformField u => u.Direction.Dot(normal) * p.LoopAreaSquareMeters,
        PrismBody p => RectangleQuadrature.Flux(geometry.FieldPerUnitDrive, centre, normal, RectangularLoopGeometry.WidthDirection(normal), p.WidthMeters, p.HeightMeters),
        _ => geometry.FluxThroughDisc(centre, normal, loop.HalfSpanMeters),
    };

    /// <summary>
    /// The unit normal that links the largest flux change: the flux per unit drive is found for loops facing x, y and
    /// z (a vector per term); for sinusoids of one frequency, the principal direction of the summed complex flux
    /// vector; otherwise the direction of the largest flux change over the drive, or of the largest flux (which
    /// leaving the field removes), whichever is larger. Oriented along the field at the centre where that is
    /// defined, so a positive drive gives a positive flux.
    /// </summary>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static Vector3D WorstNormal(FieldSource source, Vector3D centre, LoopGeometry loop) =>
        Worst(source, centre, FluxVectors(source, centre, loop));

    /// <summary>
    /// The normal turned by a tilt from the worst one (<see cref="WorstNormal"/>) toward the side that keeps the most
    /// flux change: n = cos(tilt) worst + sin(tilt) u, with u the one of 24 directions across the worst normal, 7.5
    /// degrees apart, for which the loop's peak flux by the same three axes' couplings (a sinusoid's phasor magnitude,
    /// or a transient's largest change or held flux over the drive's times) is largest. For a field of one direction
    /// over the loop every u gives the same flux, cos(tilt) of the worst; for a field that turns as it alternates, the
    /// side the field turns toward keeps more, and that side is taken.
    /// </summary>
    /// <param name="source">The field source.</param>
    /// <param name="centre">The loop's centre, m.</param>
    /// <param name="loop">The loop.</param>
    /// <param name="tiltDegrees">The tilt, degrees.</param>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over the loop.</exception>
    public static Vector3D TiltedNormal(FieldSource source, Vector3D centre, LoopGeometry loop, double tiltDegrees)
    {
        // Held, as each of 24 directions reads them again.
        List<Vector3D> vectors = FluxVectors(source, centre, loop).ToList();
        Vector3D worst = Worst(source, centre, vectors);
        double tilt = tiltDegrees * Math.PI / 180;
        if (tilt == 0)
        {
            return worst;
        }

        double Peak(Vector3D normal)
        {
            if (source.IsSinusoidal)
            {
                return Math.Sqrt(Math.Pow(normal.Dot(vectors[0]), 2) + Math.Pow(normal.Dot(vectors[1]), 2));
            }

            double first = normal.Dot(vectors[0]), largest = 0;
            foreach (Vector3D v in vectors)
            {
                double phi = normal.Dot(v);
                largest = Math.Max(largest, Math.Max(Math.Abs(phi - first), Math.Abs(phi)));
            }

            return largest;
        }

        // Two directions across the worst normal, and the 24 between them on a half turn (u and -u give the same peak).
        Vector3D across = Math.Abs(worst.X) < 0.9 ? Vector3D.UnitX : Vector3D.UnitY;
        Vector3D e1 = (across - (across.Dot(worst) * worst)).Normalized();
        Vector3D e2 = worst.Cross(e1).Normalized();
        Vector3D best = worst;
        double bestPeak = double.NegativeInfinity;
        for (int i = 0; i < 24; i++)
        {
            double alpha = i * Math.PI / 24;
            Vector3D u = (Math.Cos(alpha) * e1) + (Math.Sin(alpha) * e2);
            Vector3D candidate = ((Math.Cos(tilt) * worst) + (Math.Sin(tilt) * u)).Normalized();
            double peak = Peak(candidate);
            if (peak > bestPeak)
            {
                (best, bestPeak) = (candidate, peak);
            }
        }

        return best;
    }

    /// <summary>
    /// The vectors whose projection on a normal is the loop's flux, from its couplings facing x, y and z: a sinusoid's
    /// summed complex flux as its real and imaginary parts (Phi(t) = Im(V e^(j omega t)), V = sum M_k A_k e^(j phi_k)),
    /// else the flux at each of the drive's times, made as they are read (a curved drive has thousands of times, and
    /// the worst normal reads each once).
    /// </summary>
    private static IEnumerable<Vector3D> FluxVectors(FieldSource source, Vector3D centre, LoopGeometry loop)
    {
        double[] mx = PerUnitDrive(source, centre, Vector3D.UnitX, loop);
        double[] my = PerUnitDrive(source, centre, Vector3D.UnitY, loop);
        double[] mz = PerUnitDrive(source, centre, Vector3D.UnitZ, loop);
        Vector3D M(int k) => new(mx[k], my[k], mz[k]);
        int n = mx.Length;
        if (source.IsSinusoidal)
        {
            Vector3D re = Vector3D.Zero, im = Vector3D.Zero;
            for (int k = 0; k < n; k++)
            {
                Complex a = ((SineWaveform)source.Terms[k].Waveform).Phasor;
                re += a.Real * M(k);
                im += a.Imaginary * M(k);
            }

            return new[] { re, im };
        }

        var drives = new FieldWaveform[n];
        for (int k = 0; k < n; k++)
        {
            drives[k] = source.Terms[k].Waveform;
        }

        var m = new Vector3D[n];
        for (int k = 0; k < n; k++)
        {
            m[k] = M(k);
        }

        return FluxAtTimes(drives, m, source.DriveTimes);
    }

    private static IEnumerable<Vector3D> FluxAtTimes(FieldWaveform[] drives, Vector3D[] m, double[] times)
    {
        foreach (double t in times)
        {
            Vector3D sum = Vector3D.Zero;
            for (int k = 0; k < m.Length; k++)
            {
                sum += drives[k].Value(t) * m[k];
            }

            yield return sum;
        }
    }

    /// <summary>The worst normal from the flux vectors (<see cref="WorstNormal"/>).</summary>
    private static Vector3D Worst(FieldSource source, Vector3D centre, IEnumerable<Vector3D> vectors)
    {
        Vector3D best;
        if (source.IsSinusoidal)
        {
            // The largest |n . Phi(t)| is along the principal axis of Re(V) Re(V)^T + Im(V) Im(V)^T.
            Vector3D[] phasor = vectors.ToArray();
            best = PrincipalAxis(phasor[0], phasor[1]);
        }
        else
        {
            Vector3D? first = null;
            Vector3D change = Vector3D.Zero, held = Vector3D.Zero;
            foreach (Vector3D phi in vectors)
            {
                first ??= phi;
                Vector3D d = phi - first.Value;
                change = d.Length > change.Length ? d : change;
                held = phi.Length > held.Length ? phi : held;
            }

            best = change.Length >= held.Length ? change : held;
        }

        if (!(best.Length > 0) || !best.IsFinite)
        {
            return Vector3D.UnitZ;
        }

        Vector3D unit = best.Normalized();
        Vector3D b = source.Terms[0].Geometry.FieldPerUnitDrive(centre);
        return b.Dot(unit) < 0 ? -unit : unit;
    }

    /// <summary>The unit eigenvector of the largest eigenvalue of a a^T + b b^T (power iteration from the larger of a and b).</summary>
    private static Vector3D PrincipalAxis(Vector3D a, Vector3D b)
    {
        Vector3D v = a.Length >= b.Length ? a : b;
        if (!(v.Length > 0))
        {
            return Vector3D.Zero;
        }

        v = v.Normalized();
        for (int i = 0; i < 100; i++)
        {
            Vector3D next = (a.Dot(v) * a) + (b.Dot(v) * b);
            if (!(next.Length > 0))
            {
                break;
            }

            next = next.Normalized();
            if ((next - v).Length < 1e-14)
            {
                return next;
            }

            v = next;
        }

        return v;
    }
}
