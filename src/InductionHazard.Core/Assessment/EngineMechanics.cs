using System;
using System.Linq;
using System.Numerics;
using InductionHazard.Errors;
using InductionHazard.Induction;
using InductionHazard.Mechanics;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Assessment;

/// <summary>
/// What the engine adds to a response beyond the currents and heating: the pull and twist of a ferromagnetic item,
/// the emf and braking of an item moved through the field, the force over a cycle of a sine, the inductive limit of
/// a set, and the periodic steady state of a pulse train.
/// </summary>
internal static class EngineMechanics
{
    /// <summary>
    /// A ferromagnetic item: its pull toward stronger field and the bound on its twist, from its magnetisation in the
    /// source's field (the induced-current results do not apply to it; the validity issue says so).
    /// </summary>
    internal static InductionResponse Magnetised(InductionResponse response, EngineContext c)
    {
        try
        {
            FerromagneticAttraction pull = FerromagneticAttraction.At(c.Scenario.Source, c.Scenario.Placement.Centre, c.Scenario.Item);
            c.Notes.Add(pull, static pull => "magnetisation: mu0 M = " + SiFormat.Format(pull.MagnetisationTesla, "T") + " in " + SiFormat.Format(pull.FieldTesla, "T") + " (demagnetising factor " + SiFormat.Plain(pull.DemagnetisingFactor)
                + ", the smallest over orientations), grad |B| = " + SiFormat.Format(pull.GradientTeslaPerMeter, "T/m"));
            return response with { Attraction = pull, PeakTorqueNewtonMeters = pull.TorqueNewtonMeters };
        }
        catch (FieldEvaluationException ex)
        {
            c.Issues.Add(new ValidityIssue("the field and its gradient at the item cannot be evaluated for its magnetisation: " + ex.Message, AffectedResults.Field));
            return response with { PeakTorqueNewtonMeters = double.NaN };
        }
    }

    /// <summary>
    /// An item moved at a velocity v through the source's field, held at its peak drive: the motional emf around
    /// its outline, |sum_j d_j v . grad M_j|, which a split ring carries across its gap; and for a closed item the
    /// braking force in the resistive limit, F = -sum_k (v . g_k) g_k / s with g_k = sum_j G_kj d_j (each mode carrying
    /// its steady current (v . g_k) / s), an upper bound on the force at any speed, and the speed at which it
    /// equals the item's weight.
    /// </summary>
    internal static InductionResponse Moving(InductionResponse response, EngineContext c)
    {
        Vector3D v = c.Scenario.Placement.Velocity!.Value;
        var terms = c.Scenario.Source.Terms;
        var peak = new double[terms.Count];
        for (int j = 0; j < peak.Length; j++)
        {
            peak[j] = terms[j].Waveform.PeakValue;
        }

        try
        {
            ItemPaths outline = ItemPaths.For(c.Scenario.Item, c.Frequency, c.Start, thinLoop: true);
            Vector3D[,] gradient = outline.CouplingGradient(c.Scenario.Source, c.Scenario.Placement.Centre, c.Normal, c.Width);
            double rate = 0;
            for (int j = 0; j < peak.Length; j++)
            {
                rate += peak[j] * v.Dot(gradient[0, j]);
            }

            double motional = Math.Abs(rate);
            c.Notes.Add((v, motional), static n => "moved at " + SiFormat.Format(n.v.Length, "m/s") + " along " + n.v.Normalized() + " through the field at its peak drive: motional emf " + SiFormat.Format(n.motional, "V"));
            response = response with
            {
                MotionalEmfVolts = motional,
                GapVoltageVolts = response.GapVoltageVolts is { } gap ? Math.Max(gap, motional) : null,
            };
        }
        catch (FieldEvaluationException ex)
        {
            c.Issues.Add(new ValidityIssue("the motional emf cannot be found along the item's outline: " + ex.Message, AffectedResults.Emf | AffectedResults.Current));
            return response;
        }

        if (c.Modal?.ForceCoupling is not { } g)
        {
            return response;
        }

        double s = c.Paths!.ScaleAt(c.Start);
        Vector3D unit = v.Normalized(), perSpeed = Vector3D.Zero;
        for (int k = 0; k < c.Modal.Count; k++)
        {
            Vector3D gk = Vector3D.Zero;
            for (int j = 0; j < peak.Length; j++)
            {
                gk += peak[j] * g[k, j];
            }

            perSpeed += (-unit.Dot(gk) / s) * gk;
        }

        double braking = perSpeed.Length * v.Length;
        double weight = c.Scenario.Item.MassKilograms * PhysicalConstants.StandardGravity;
        c.Notes.Add(
            (braking, speed: v.Length, weightAt: perSpeed.Length > 0 ? weight / perSpeed.Length : double.PositiveInfinity),
            static n => "braking in the resistive limit (an upper bound): " + SiFormat.Format(n.braking, "N") + " at " + SiFormat.Format(n.speed, "m/s") + ", equal to the weight at " + SiFormat.Format(n.weightAt, "m/s"));
        return response with
        {
            BrakingForceNewtons = braking,
            SpeedForWeightMetersPerSecond = perSpeed.Length > 0 ? weight / perSpeed.Length : null,
        };
    }

    /// <summary>
    /// The force and torque over one cycle at the starting temperature: the modal amplitudes from the steady state
    /// (one path: the total current over its weight), the drive phasors D_k of d_k(t) = Im(D_k e^(j omega t)).
    /// </summary>
    internal static SteadyMechanics SteadyForces(EngineContext c, Complex totalCurrent, double omega)
    {
        var terms = c.Scenario.Source.Terms;
        ModalCircuit modal = c.Modal!;
        var drives = new Complex[terms.Count];
        var rates = new Complex[terms.Count];
        for (int k = 0; k < terms.Count; k++)
        {
            drives[k] = ((SineWaveform)terms[k].Waveform).Phasor;
            rates[k] = -Complex.ImaginaryOne * omega * drives[k];
        }

        var amplitudes = new Complex[modal.Count];
        if (modal.Count == 1)
        {
            amplitudes[0] = totalCurrent / modal.TotalWeights[0];
        }
        else
        {
            double s = c.Paths!.ScaleAt(c.Start);
            for (int k = 0; k < modal.Count; k++)
            {
                Complex forcing = Complex.Zero;
                for (int j = 0; j < terms.Count; j++)
                {
                    forcing += modal.Coupling[k, j] * rates[j];
                }

                amplitudes[k] = forcing / new Complex(s, omega * modal.Lambdas[k]);
            }
        }

        SteadyMechanics mechanics = SteadyMechanics.Of(modal, amplitudes, drives, c.TorqueField);
        return c.TiltTorqueFactor > 0
            ? mechanics with { PeakMomentField = SteadyMechanics.MomentField(modal, amplitudes, drives, c.CentreField) }
            : mechanics;
    }

    /// <summary>
    /// The total current of a path set when its resistance is negligible against the change (the inductive limit):
    /// each mode then carries z_k = -(C Delta d)_k / lambda_k, and the total is t . z. For one path, Delta Phi / L.
    /// </summary>
    internal static double InductiveLimit(ModalCircuit modal, double[] driveSwing)
    {
        double total = 0;
        for (int k = 0; k < modal.Count; k++)
        {
            double forcing = 0;
            for (int j = 0; j < driveSwing.Length; j++)
            {
                forcing += modal.Coupling[k, j] * driveSwing[j];
            }

            total += modal.TotalWeights[k] * forcing / modal.Lambdas[k];
        }

        return Math.Abs(total);
    }

    /// <summary>
    /// For a train of pulses (every term repeated with one period P and count n): the temperature the item would
    /// settle at just after each pulse if the train went on, T0 + (E1 / C) / (1 - e^(-P / tau)), with E1 the energy of
    /// one pulse (the run's energy over n; pulses short against P) and tau = C / (h A) the cooling time (the sum of a
    /// geometric series of pulses each decaying by e^(-P/tau) before the next). Null for a single pulse, or when
    /// nothing cools the item (it then has no steady state and heats with every pulse).
    /// </summary>
    internal static double? PeriodicSteadyState(EngineContext c, double energyJoules)
    {
        var terms = c.Scenario.Source.Terms;
        if (!terms.All(t => t.Waveform is RepeatedWaveform r && r.Count > 1) || terms.Select(t => t.Waveform.PeriodSeconds).Distinct().Count() != 1)
        {
            return null;
        }

        var first = (RepeatedWaveform)terms[0].Waveform;
        double tau = c.Thermal.TimeConstantSeconds(c.Start);
        if (double.IsInfinity(tau) || !Finite.Is(energyJoules))
        {
            c.Notes.Add("pulse train: nothing cools the item, so it has no periodic steady state and heats with every pulse");
            return null;
        }

        double perPulse = energyJoules / first.Count / c.Thermal.HeatCapacityJoulesPerKelvin;
        double settled = c.Start + (perPulse / -Exponential.Minus1(-first.PeriodSeconds / tau));
        c.Notes.Add((settled, perPulse, tau), static n => "pulse train: if it went on, the item would settle near " + SiFormat.Celsius(n.settled) + " just after each pulse (each pulse adds " + SiFormat.Format(n.perPulse, "K") + ", cooling time " + SiFormat.Format(n.tau, "s") + ")");
        return settled;
    }
}
