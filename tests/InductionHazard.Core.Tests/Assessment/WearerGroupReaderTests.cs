using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>An inventory row's ExposureGroup column: the group of the person who wears or holds the row's item.</summary>
public class WearerGroupReaderTests
{
    private static List<KeyValuePair<string, object?>> Row(params (string Key, object? Value)[] extra) => Fixtures.InventoryRow(extra);

    [Theory]
    [InlineData("ExposureGroup", "Public", ExposureGroup.Public)]
    [InlineData("Exposure Group", "public", ExposureGroup.Public)]
    [InlineData("exposure_group", " PUBLIC ", ExposureGroup.Public)]
    [InlineData("WearerGroup", "Occupational", ExposureGroup.Occupational)]
    public void AGroupIsReadByAnySpellingOfItsColumn(string column, string value, ExposureGroup expected) =>
        Assert.Equal(expected, WearerGroupReader.Read(Row((column, value)), "row 3"));

    [Fact]
    public void ARowWithoutTheColumnOrWithItBlankNamesNoGroup()
    {
        Assert.Null(WearerGroupReader.Read(Row(), "row 3"));
        Assert.Null(WearerGroupReader.Read(Row(("ExposureGroup", "  ")), "row 3"));
        Assert.Null(WearerGroupReader.Read(Row(("ExposureGroup", null)), "row 3"));
    }

    [Fact]
    public void AnUnknownGroupIsRefusedNamingTheRowTheFieldAndTheGroups()
    {
        var error = Assert.Throws<RecordException>(() => WearerGroupReader.Read(Row(("ExposureGroup", "Visitor")), "row 3 ('Badge')"));
        Assert.Contains("ExposureGroup", error.Fields);
        Assert.StartsWith("row 3 ('Badge')", error.Message, System.StringComparison.Ordinal);
        Assert.Contains("'Visitor' is not one of Occupational, Public", error.Message, System.StringComparison.Ordinal);
    }

    [Fact]
    public void TheColumnIsNotAnInventoryColumnAndTellsRepeatedRowsApart()
    {
        InventoryFields inventory = InventoryFields.Of(Row(("ExposureGroup", "Public")));
        Assert.Equal(new[] { "Holder" }, inventory.Keys);

        // The same item at the same place for a worker and for a visitor is not a repeat: the judgement differs.
        Assert.NotEqual(RepeatedRows.KeyOf(Row()), RepeatedRows.KeyOf(Row(("ExposureGroup", "Public"))));
        Assert.Equal(RepeatedRows.KeyOf(Row(("ExposureGroup", "Public"))), RepeatedRows.KeyOf(Row(("ExposureGroup", "Public"))));
    }
}
