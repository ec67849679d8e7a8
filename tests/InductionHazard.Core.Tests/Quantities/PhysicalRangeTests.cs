using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Quantities;

public class PhysicalRangeTests
{
    [Fact]
    public void ALongTimeIsShownInSecondsWithItsHoursBeside()
    {
        // The exposure's upper bound is 8 h: the message says so in hours as well as in seconds, and so does the value;
        // beyond a hundred hours (a drive's start time, up to 1e6 s) the seconds alone.
        string problem = PhysicalRanges.ExposureTime.Problem(9 * 3600.0)!;
        Assert.StartsWith("must be between 100 ms and 28800 s = 8 h (", problem, System.StringComparison.Ordinal);
        Assert.EndsWith("; got 32400 s = 9 h", problem, System.StringComparison.Ordinal);
        Assert.Null(PhysicalRanges.ExposureTime.Problem(600));
        Assert.EndsWith("; got 50 ms", PhysicalRanges.ExposureTime.Problem(0.05)!, System.StringComparison.Ordinal);
        Assert.EndsWith("; got 400000 s", PhysicalRanges.ExposureTime.Problem(4e5)!, System.StringComparison.Ordinal);
    }
}
