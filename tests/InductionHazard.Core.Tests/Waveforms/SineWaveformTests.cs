using System;
using InductionHazard.Errors;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Waveforms;

public class SineWaveformTests
{
    [Fact]
    public void ValueAndRateAreTheSineAndItsDerivative()
    {
        var sine = new SineWaveform(2, 50, phaseRadians: 0.3);
        double omega = 2 * Math.PI * 50;
        for (double t = 0; t < 0.04; t += 0.0013)
        {
            Assert.Equal(2 * Math.Sin((omega * t) + 0.3), sine.Value(t), 12);
            Assert.Equal(2 * omega * Math.Cos((omega * t) + 0.3), sine.Rate(t), 9);
        }

        Assert.Equal(2, sine.PeakValue);
        Assert.Equal(2 * omega, sine.PeakRate, 9);
        Assert.Equal(0.02, sine.PeriodSeconds, 15);
        Assert.Equal(2 / Math.Sqrt(2), sine.RmsAmplitude, 15);
    }

    [Fact]
    public void RunsIndefinitelyUnlessGivenADuration()
    {
        Assert.True(double.IsPositiveInfinity(new SineWaveform(1, 50).EndSeconds));
        Assert.Equal(12, new SineWaveform(1, 50, durationSeconds: 10, startSeconds: 2).EndSeconds);
    }

    [Fact]
    public void RefusesANonPositiveFrequency()
    {
        var error = Assert.Throws<InvalidInputException>(() => new SineWaveform(1, 0));
        Assert.Equal("Frequency", error.Field);
        Assert.Throws<InvalidInputException>(() => new SineWaveform(-1, 50));
    }

    // Defect: -Start 1e300 on a sine was accepted and the drive's time stopped advancing in the heating integrator.
    [Theory]
    [InlineData(1e300, 50.0)]
    [InlineData(1e17, 50.0)]
    [InlineData(5e5, 1e9)]
    public void AStartTooLateToResolveAPeriodIsRefused(double start, double frequency)
    {
        var ex = Assert.Throws<InvalidInputException>(() => new SineWaveform(1, frequency, startSeconds: start));
        Assert.Equal("Start", ex.Field);
    }
}
