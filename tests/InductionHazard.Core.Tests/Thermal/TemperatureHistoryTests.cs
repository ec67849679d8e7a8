using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class TemperatureHistoryTests
{
    private static readonly HeatingSample[] Triangle =
    {
        new(0, 30, 0), new(100, 70, 0), new(200, 30, 0),
    };

    [Fact]
    public void TheSustainedTemperatureOfATriangleIsLinearInTheDuration()
    {
        // A symmetric triangle from 30 to 70 °C and back over 200 s stays above 70 - 40 d / 200 for d seconds.
        foreach (double d in new[] { 0.0, 10, 50, 100, 199 })
        {
            Within.Absolute(70 - (40 * d / 200), TemperatureHistory.SustainedFor(Triangle, d), 1e-6, "held for " + d + " s");
        }

        Assert.True(double.IsNaN(TemperatureHistory.SustainedFor(Triangle, 300)), "a history shorter than the contact has no answer");
    }

    [Fact]
    public void FindsPeaksAndCrossings()
    {
        Assert.Equal(70, TemperatureHistory.Peak(Triangle));
        Assert.Equal(50, TemperatureHistory.FirstReaching(Triangle, 50)!.Value, 12);
        Assert.Null(TemperatureHistory.FirstReaching(Triangle, 71));
        Assert.Equal(100, TemperatureHistory.LongestRunAtOrAbove(Triangle, 50), 12);
    }
}
