using System.Collections.Generic;
using System.Linq;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class ThermalDoseTests
{
    // Sapareto and Dewey (1984): CEM43 = sum R^(43 - T) dt in minutes, R = 0.5 at or above 43 °C, 0.25 below.
    [Validates("CEM43 of plateaus", "Sapareto and Dewey (1984)", "1e-12")]
    [Theory]
    [InlineData(43, 10, 10)]
    [InlineData(45, 10, 40)]
    [InlineData(44, 30, 60)]
    [InlineData(41, 60, 3.75)]
    [InlineData(39, 480, 1.875)]
    public void AConstantTemperatureGivesTheDefinition(double celsius, double minutes, double expected)
    {
        Within.Relative(expected, ThermalDose.Cem43Minutes(celsius, minutes * 60), 1e-12, "CEM43 at " + celsius + " °C");
        var plateau = new[] { new HeatingSample(0, celsius, 0), new HeatingSample(minutes * 60, celsius, 0) };
        Within.Relative(expected, ThermalDose.Cem43Minutes(plateau), 1e-12, "CEM43 of the plateau history");
    }

    [Validates("exact integration against fine sampling", "the definition", "1e-6")]
    [Fact]
    public void ALinearRampIsIntegratedExactlyAcrossTheBreakpoint()
    {
        // 40 -> 46 °C over 10 minutes, against a fine sampling of the same history.
        var coarse = new[] { new HeatingSample(0, 40, 0), new HeatingSample(600, 46, 0) };
        var fine = Enumerable.Range(0, 600001).Select(k => new HeatingSample(k / 1000.0, 40 + (6 * k / 600000.0), 0)).ToArray();
        Within.Relative(ThermalDose.Cem43Minutes(fine), ThermalDose.Cem43Minutes(coarse), 1e-6, "dose of the ramp");
    }
}
