using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Waveforms;

public class DischargeWaveformTests
{
    /// <summary>
    /// An independent model: the series RLC circuit's equations L di/dt = v - R i, C dv/dt = -i integrated by
    /// classical fourth-order Runge-Kutta from v = V0, i = 0. Returns the first peak (time, current) and the energy
    /// R i^2 dissipated up to the end.
    /// </summary>
    private static (double PeakSeconds, double PeakAmperes, double Energy) Integrate(double c, double v0, double l, double r, double end, int steps)
    {
        double h = end / steps, i = 0, v = v0, energy = 0, peak = 0, peakAt = 0;
        bool found = false;
        (double di, double dv) F(double ii, double vv) => ((vv - (r * ii)) / l, -ii / c);
        for (int k = 0; k < steps; k++)
        {
            var k1 = F(i, v);
            var k2 = F(i + (h / 2 * k1.di), v + (h / 2 * k1.dv));
            var k3 = F(i + (h / 2 * k2.di), v + (h / 2 * k2.dv));
            var k4 = F(i + (h * k3.di), v + (h * k3.dv));
            double iNext = i + (h / 6 * (k1.di + (2 * k2.di) + (2 * k3.di) + k4.di));
            v += h / 6 * (k1.dv + (2 * k2.dv) + (2 * k3.dv) + k4.dv);
            energy += h * r * 0.5 * ((i * i) + (iNext * iNext));
            if (!found && Math.Abs(iNext) < Math.Abs(i))
            {
                found = true;
                peak = i;
                peakAt = k * h;
            }

            i = iNext;
        }

        return (peakAt, peak, energy);
    }

    [Validates("first peak and its time, under-, critically and over-damped", "series RLC equations by fourth-order Runge-Kutta (independent)", "1e-5, 1e-4")]
    [Theory]
    [InlineData(4e-3, 6000, 120e-6, 0.04)]   // underdamped
    [InlineData(1e-3, 1000, 100e-6, 0.632455532)]   // critically damped: R = 2 sqrt(L/C)
    [InlineData(1e-3, 1000, 100e-6, 2.0)]    // overdamped
    public void TheFirstPeakMatchesAnIndependentIntegrationOfTheCircuit(double c, double v0, double l, double r)
    {
        var d = new DischargeWaveform(c, v0, l, r);
        (double at, double peak, _) = Integrate(c, v0, l, r, 3 * d.FirstPeakSeconds, 300_000);
        Within.Relative(peak, d.PeakValue, 1e-5, d.Damping + " first peak");
        Within.Relative(at, d.FirstPeakSeconds, 1e-4, d.Damping + " time of the first peak");
    }

    [Validates("C V0^2 / 2 = integral of R i^2 dt", "energy conservation", "1e-4")]
    [Theory]
    [InlineData(4e-3, 6000, 120e-6, 0.04)]
    [InlineData(1e-3, 1000, 100e-6, 2.0)]
    public void TheBanksEnergyEqualsTheResistiveLossOverThePulse(double c, double v0, double l, double r)
    {
        // Energy conservation: C V0^2 / 2 = integral of R i^2 dt, here with the waveform's own current.
        var d = new DischargeWaveform(c, v0, l, r);
        int n = 2_000_000;
        double h = (d.EndSeconds - d.StartSeconds) / n, loss = 0;
        for (int k = 0; k < n; k++)
        {
            double i = d.Value((k + 0.5) * h);
            loss += r * i * i * h;
        }

        Within.Relative(d.StoredEnergyJoules, loss, 1e-4, "energy balance, " + d.Damping);
    }

    [Validates("i_pk e^(-1) one L/R after the peak", "RL circuit theory", "1e-12")]
    [Fact]
    public void ACrowbarTurnsTheRingingIntoAnLOverRDecayAfterTheFirstPeak()
    {
        var d = new DischargeWaveform(4e-3, 6000, 120e-6, 0.04, crowbar: true);
        double tau = 120e-6 / 0.04, tp = d.FirstPeakSeconds;
        Within.Relative(d.PeakValue * Math.Exp(-1), d.Value(tp + tau), 1e-12, "one L/R after the peak");
        Assert.True(d.Value(tp + (5 * tau)) > 0, "a crowbarred current does not reverse");
    }

    [Fact]
    public void ACrowbarsDecayIsSteppedAsAnExponentialDecayIs()
    {
        // The module steps an exponential decay at a fiftieth of its time constant (DecayWaveform); a crowbar's decay, the
        // same, where that is longer than the first phase's step.
        var d = new DischargeWaveform(4e-3, 6000, 120e-6, 0.04, crowbar: true);
        double tp = d.StartSeconds + d.FirstPeakSeconds;
        Assert.Equal(d.MaxStepSeconds, d.MaxStepAt(0.5 * tp));
        Assert.Equal(120e-6 / 0.04 / 50, d.MaxStepAt(tp));
        Assert.Equal(120e-6 / 0.04 / 50, d.MaxStepAt(tp + 0.01));

        // Never below the hundredth of the first peak (a decay faster than the rise keeps the rise's step), and a
        // discharge with no crowbar rings on: its step stays the least throughout.
        var fast = new DischargeWaveform(4e-3, 6000, 120e-6, 0.04 * 100, crowbar: true);
        Assert.Equal(fast.MaxStepSeconds, fast.MaxStepAt(fast.FirstPeakSeconds + 1e-3));
        var ringing = new DischargeWaveform(4e-3, 6000, 120e-6, 0.04);
        Assert.Equal(ringing.MaxStepSeconds, ringing.MaxStepAt(ringing.FirstPeakSeconds + 1e-3));

        // A train of them takes each pulse's own step at the same time within it: the first phase's from each pulse's
        // start, also where rounding leaves the start an ulp short (which once read the last pulse's decay there).
        var train = new RepeatedWaveform(d, 3, 0.1);
        Assert.Equal(d.MaxStepSeconds, train.MaxStepAt(0.2 + (0.5 * tp)));
        Assert.Equal(d.MaxStepAt(tp + 0.01), train.MaxStepAt(0.2 + tp + 0.01));
        foreach (double start in train.Breakpoints.Where((_, i) => i % 3 == 0))
        {
            Assert.Equal(d.MaxStepSeconds, train.MaxStepAt(start));
            Assert.Equal(d.MaxStepSeconds, train.MaxStepAt(start * (1 - 1e-15)));
        }

        // A discharge that starts late takes the decay's step from its crowbar's breakpoint on.
        var late = new DischargeWaveform(4e-3, 6000, 120e-6, 0.04, crowbar: true, startSeconds: 0.3);
        Assert.Equal(120e-6 / 0.04 / 50, late.MaxStepAt(late.Breakpoints[1]));
    }

    [Fact]
    public void ADischargeWithALongCrowbarredDecayIsSolvedWithinTheBudget()
    {
        // A crowbarred discharge whose L/R is 1.2 s, followed for 11 s: at a hundredth of its 1 ms first peak that would
        // be a million steps, over the solver's budget, and the run was refused. At a fiftieth of L/R the decay takes a
        // few hundred, and the ring is solved.
        var d = new DischargeWaveform(4e-3, 60, 120e-6, 1e-4, crowbar: true);
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.05, 10), d) });
        ConductiveItem ring = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.001, ["Contact"] = "Fixed" }, MaterialLibrary.BuiltIn);
        InductionResponse response = InductionEngine.Respond(new Scenario(ring, coil, new Placement(new Vector3D(0, 0, 0.03), Vector3D.UnitZ)));
        Assert.True((d.EndSeconds - d.StartSeconds) / d.MaxStepSeconds > 200_000, "a million steps at the first peak's");
        Assert.True(response.IsValid, string.Join("; ", response.ValidityIssues));
        Assert.True(response.PeakCurrentAmperes > 0 && response.EnergyDissipatedJoules > 0, "solved");
    }

    [Validates("ring above a coil fed by a crowbarred discharge: peak current and energy", "the ring's circuit L di/dt + R i = -M di_c/dt with the discharge's closed-form rate, by fourth-order Runge-Kutta in 300,000 steps (independent of the module's exponential steps); M by Maxwell's coaxial formula", "1e-5")]
    [Fact]
    public void ARingInACrowbarredDischargeMatchesAnIndependentIntegrationWithAQuarterOfTheSteps()
    {
        // A 20 mm copper ring of 1 mm wire, fixed 30 mm above a 10-turn coil of radius 50 mm, the bank at 60 V (so that
        // the ring warms by well under a millikelvin and its resistance stays that of the start). The crowbar's decay
        // (L/R 3 ms, followed for 9.2 of them) is stepped at a fiftieth of L/R, not at a hundredth of the 1 ms first
        // peak: the run takes under a quarter of the steps that would take, and its peak current and energy meet the
        // integration to 1e-5.
        var d = new DischargeWaveform(4e-3, 60, 120e-6, 0.04, crowbar: true);
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.05, 10), d) });
        ConductiveItem ring = ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.001, ["Contact"] = "Fixed" }, MaterialLibrary.BuiltIn);
        InductionResponse response = InductionEngine.Respond(new Scenario(ring, coil, new Placement(new Vector3D(0, 0, 0.03), Vector3D.UnitZ)));
        Assert.True(response.IsValid, string.Join("; ", response.ValidityIssues));
        Assert.True(response.TemperatureRiseKelvin < 1e-3, "the ring barely warms: " + response.TemperatureRiseKelvin + " K");

        double m = 10 * CircularCoil.CoaxialMutualInductance(0.05, 0.01, 0.03);
        double l = response.InductanceHenries, r = response.ResistanceOhms;
        double tp = d.StartSeconds + d.FirstPeakSeconds;
        double i = 0, energy = 0, peak = 0;

        // Each part on its own steps, so that none straddles the crowbar, where the coil current's rate jumps.
        foreach ((double from, double to, int steps) in new[] { (d.StartSeconds, tp, 100_000), (tp, d.EndSeconds, 200_000) })
        {
            double h = (to - from) / steps;
            double Di(double t, double ii) => ((-m * d.Rate(t)) - (r * ii)) / l;
            for (int k = 0; k < steps; k++)
            {
                // Just inside the part at its ends, so that the rate is the part's own.
                double t0 = from + (k * h), tMid = t0 + (h / 2), t1 = k == steps - 1 ? to - (1e-9 * h) : t0 + h;
                double t0In = k == 0 ? from + (1e-9 * h) : t0;
                double k1 = Di(t0In, i), k2 = Di(tMid, i + (h / 2 * k1)), k3 = Di(tMid, i + (h / 2 * k2)), k4 = Di(t1, i + (h * k3));
                double next = i + (h / 6 * (k1 + (2 * k2) + (2 * k3) + k4));

                // R i^2 over the step by Simpson's rule, the midpoint current from the cubic through both ends and their rates.
                double iMid = (0.5 * (i + next)) + (h / 8 * (k1 - Di(t1, next)));
                energy += r * h / 6 * ((i * i) + (4 * iMid * iMid) + (next * next));
                i = next;
                peak = Math.Max(peak, Math.Abs(i));
            }
        }

        // After the drive ends the ring's current dies away in L/R: the energy it holds goes to heat.
        energy += 0.5 * l * i * i;
        Within.Relative(peak, response.PeakCurrentAmperes, 1e-5, "the ring's peak current");
        Within.Relative(energy, response.EnergyDissipatedJoules, 1e-5, "the energy the ring takes");

        string note = response.ModelNotes.Single(n => n.StartsWith("circuit: ", StringComparison.Ordinal));
        int taken = int.Parse(note.Split(' ')[1], NumberStyles.Integer, CultureInfo.InvariantCulture);
        double fine = (d.EndSeconds - d.StartSeconds) / d.MaxStepSeconds;
        Assert.True(taken < fine / 4, taken + " steps against " + fine.ToString("F0", CultureInfo.InvariantCulture) + " at a hundredth of the first peak");
    }
}
