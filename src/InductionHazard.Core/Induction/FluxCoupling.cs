using System;
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
    public static Vector3D WorstNormal(FieldSource source, Vector3D centre, LoopGeometry loop)
    {
        double[] mx = PerUnitDrive(source, centre, Vector3D.UnitX, loop);
        double[] my = PerUnitDrive(source, centre, Vector3D.UnitY, loop);
        double[] mz = PerUnitDrive(source, centre, Vector3D.UnitZ, loop);
        Vector3D M(int k) => new(mx[k], my[k], mz[k]);
        int n = mx.Length;
        Vector3D best;
        if (source.IsSinusoidal)
        {
            // Phi(t) = Im(V e^(j omega t)) with V = sum M_k A_k e^(j phi_k): the largest |n . Phi(t)| is along the
            // principal axis of Re(V) Re(V)^T + Im(V) Im(V)^T.
            Vector3D re = Vector3D.Zero, im = Vector3D.Zero;
            for (int k = 0; k < n; k++)
            {
                Complex a = ((SineWaveform)source.Terms[k].Waveform).Phasor;
                re += a.Real * M(k);
                im += a.Imaginary * M(k);
            }

            best = PrincipalAxis(re, im);
        }
        else
        {
            var drives = new FieldWaveform[n];
            for (int k = 0; k < n; k++)
            {
                drives[k] = source.Terms[k].Waveform;
            }

            double[] times = source.DriveTimes;
            Vector3D Flux(double t)
            {
                Vector3D sum = Vector3D.Zero;
                for (int k = 0; k < n; k++)
                {
                    sum += drives[k].Value(t) * M(k);
                }

                return sum;
            }

            Vector3D first = Flux(times[0]);
            Vector3D change = Vector3D.Zero, held = Vector3D.Zero;
            foreach (double t in times)
            {
                Vector3D phi = Flux(t);
                Vector3D d = phi - first;
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
