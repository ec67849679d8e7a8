using System;
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
}
