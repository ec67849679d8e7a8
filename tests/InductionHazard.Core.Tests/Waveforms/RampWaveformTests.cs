using InductionHazard.Errors;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Waveforms;

public class RampWaveformTests
{
    [Fact]
    public void HoldsThenChangesLinearlyThenHolds()
    {
        var ramp = new RampWaveform(1, 3, 2, startSeconds: 1);
        Assert.Equal(1, ramp.Value(0));
        Assert.Equal(2, ramp.Value(2));
        Assert.Equal(3, ramp.Value(5));
        Assert.Equal(0, ramp.Rate(0.5));
        Assert.Equal(1, ramp.Rate(2));
        Assert.Equal(0, ramp.Rate(3));
        Assert.Equal(new[] { 1.0, 3.0 }, ramp.Breakpoints);
        Assert.Equal(3, ramp.PeakValue);
        Assert.Equal(1, ramp.PeakRate);
        Assert.Equal(2, ramp.TimeScales[0].Seconds);
    }

    [Fact]
    public void ItsSignificantFrequencyIsTheKneeOfItsEdge()
    {
        // Knee frequency 0.35 / rise time (common practice).
        Assert.Equal(0.35 / 0.002, new RampWaveform(0, 1, 0.002).SignificantFrequencyHertz, 9);
    }

    [Fact]
    public void RefusesANonPositiveDuration()
    {
        var error = Assert.Throws<InvalidInputException>(() => new RampWaveform(0, 1, 0));
        Assert.Equal("Duration", error.Field);
        Assert.Throws<InvalidInputException>(() => new RampWaveform(double.NaN, 1, 1));
    }

    // Defect: a ramp starting at 1e17 s (or 1e300) had start + duration round back to the start, and was assessed as
    // no exposure: a Hazard became Clear. Such a start is refused, naming -Start.
    [Theory]
    [InlineData(1e17, 0.01)]
    [InlineData(1e300, 0.01)]
    [InlineData(-1e300, 0.01)]
    [InlineData(9e5, 1e-9)]
    public void AStartTooLateToResolveTheRampIsRefused(double start, double duration)
    {
        var ex = Assert.Throws<InvalidInputException>(() => new RampWaveform(0, 3, duration, start));
        Assert.Equal("Start", ex.Field);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1e-10)]
    [InlineData(2e6)]
    public void ADurationOutsideItsPhysicalRangeIsRefused(double duration)
    {
        var ex = Assert.Throws<InvalidInputException>(() => new RampWaveform(0, 3, duration));
        Assert.Equal("Duration", ex.Field);
    }
}
