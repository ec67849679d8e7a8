using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Errors;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>An inventory row's own exposure and leave times, over the run's.</summary>
public class ExposureRecordReaderTests
{
    private static List<KeyValuePair<string, object?>> Row(params (string Key, object? Value)[] extra) => Fixtures.InventoryRow(extra);

    [Fact]
    public void ARowsTimesAreReadWithTheirUnitsAndARowWithoutThemGivesNone()
    {
        Assert.Equal((300.0, (double?)null, (double?)null), ExposureRecordReader.Read(Row(("ExposureTime", "5 min")), "row 2"));
        Assert.Equal(((double?)null, 3.0, (double?)null), ExposureRecordReader.Read(Row(("Leave Time", "3 s")), "row 2"));
        Assert.Equal((7200.0, (double?)null, (double?)null), ExposureRecordReader.Read(Row(("ExposureTime (h)", "2")), "row 2"));
        Assert.Equal((90.0, (double?)null, (double?)null), ExposureRecordReader.Read(Row(("ExposureTime", "1.5")), "row 2", new Dictionary<string, string> { ["ExposureTime"] = "min" }));
        Assert.Equal(((double?)null, (double?)null, (double?)null), ExposureRecordReader.Read(Row(), "row 2"));
        Assert.Equal(((double?)null, (double?)null, (double?)null), ExposureRecordReader.Read(Row(("ExposureTime", " ")), "row 2"));
    }

    [Fact]
    public void ARowsAirTemperatureIsReadWithItsUnit()
    {
        Assert.Equal(((double?)null, (double?)null, 35.0), ExposureRecordReader.Read(Row(("AmbientTemperature", "35 degC")), "row 2"));
        Assert.Equal(((double?)null, (double?)null, 35.0), ExposureRecordReader.Read(Row(("Ambient Temperature (degC)", "35")), "row 2"));
        (_, _, double? fahrenheit) = ExposureRecordReader.Read(Row(("AmbientTemperature", "95 degF")), "row 2");
        Assert.Equal(35.0, fahrenheit!.Value, 12);
    }

    [Theory]
    [InlineData("30", "has no unit")]
    [InlineData("9 h", "must be between 100 ms and 28800 s = 8 h")]
    [InlineData("10 ms", "must be between 100 ms and 28800 s = 8 h")]
    [InlineData("10 mm", "ExposureTime")]
    public void ATimeWithoutItsUnitOrOutOfRangeIsRefusedNamingTheRowAndTheField(string value, string expected) =>
        Refused("ExposureTime", value, expected);

    [Theory]
    [InlineData("35", "has no unit")]
    [InlineData("80 degC", "must be between -50 °C and 60 °C")]
    [InlineData("-60 degC", "must be between -50 °C and 60 °C")]
    [InlineData("3 T", "AmbientTemperature")]
    public void AnAirTemperatureWithoutItsUnitOrOutOfRangeIsRefusedNamingTheRowAndTheField(string value, string expected) =>
        Refused("AmbientTemperature", value, expected);

    private static void Refused(string field, string value, string expected)
    {
        var error = Assert.Throws<RecordException>(() => ExposureRecordReader.Read(Row((field, value)), "row 2 ('Ring')"));
        Assert.Contains(field, error.Fields);
        Assert.StartsWith("row 2 ('Ring')", error.Message, System.StringComparison.Ordinal);
        Assert.Contains(expected, error.Message, System.StringComparison.Ordinal);
    }

    [Fact]
    public void TheTimesAreNotInventoryColumnsAndTellRepeatedRowsApart()
    {
        Assert.Equal(new[] { "Holder" }, InventoryFields.Of(Row(("ExposureTime", "5 min"), ("LeaveTime", "2 s"), ("AmbientTemperature", "35 degC"))).Keys);
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("AmbientTemperature", "25 degC"))), RepeatedRows.KeyOf(Row(("AmbientTemperature", "35 degC"))));
        Assert.NotEqual(RepeatedRows.KeyOf(Row()), RepeatedRows.KeyOf(Row(("ExposureTime", "5 min"))));
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("ExposureTime", "5 min"))), RepeatedRows.KeyOf(Row(("ExposureTime", "6 min"))));
    }
}
