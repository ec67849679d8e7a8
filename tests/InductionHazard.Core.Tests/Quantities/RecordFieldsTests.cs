using System.Collections.Generic;
using System.Linq;
using CsCheck;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Quantities;

/// <summary>The record reader's name matching, which is kept fast by remembering names it has seen.</summary>
public sealed class RecordFieldsTests
{
    /// <summary>The rule as documented: without spaces, hyphens, underscores and dots, in lower case.</summary>
    private static string ByTheRule(string name) =>
        new string(name.Where(c => !char.IsWhiteSpace(c) && c != '-' && c != '_' && c != '.').ToArray()).ToLowerInvariant();

    [Fact]
    public void NamesAreNormalizedByTheRuleWhetherSeenBeforeOrNot()
    {
        Gen.String[Gen.Char["AaZz09 -_.\tÄöİıΣς"], 0, 16].Sample(name =>
        {
            string first = RecordFields.Normalize(name), again = RecordFields.Normalize(name);
            return first == ByTheRule(name) && again == first;
        });
    }

    [Fact]
    public void AQuantityReadAgainIsTheSameAndUnderOtherAliasesIsReadAfresh()
    {
        // A reader's plausibility check reads its sizes again (each is read once and remembered): the same value for
        // the same field and aliases, but a field asked for under other aliases is read from the record as asked.
        var fields = new RecordFields(new[] { new KeyValuePair<string, object?>("Size", "20 mm") });
        Assert.Equal(0.02, fields.Quantity("Diameter", QuantityKind.Length, required: false, "Size"));
        Assert.Equal(0.02, fields.Quantity("Diameter", QuantityKind.Length, required: false, new[] { "Size" }));
        Assert.Null(fields.Quantity("Diameter", QuantityKind.Length, required: false));
        Assert.Null(fields.Quantity("Diameter", QuantityKind.Length, required: false, "Width"));
        Assert.Empty(fields.Errors);
    }

    [Fact]
    public void TwoColumnsForOneFieldMustStillAgree()
    {
        var fields = new RecordFields(new[]
        {
            new KeyValuePair<string, object?>("WireDiameter", "2 mm"),
            new KeyValuePair<string, object?>("Wire Diameter", "3 mm"),
        });
        fields.Quantity("WireDiameter", QuantityKind.Length, required: true);
        Assert.Contains(fields.Errors, e => e.Message.Contains("more than one column"));

        var aliased = new RecordFields(new[]
        {
            new KeyValuePair<string, object?>("Diameter", "20 mm"),
            new KeyValuePair<string, object?>("OD", "21 mm"),
        });
        aliased.Quantity("Diameter", QuantityKind.Length, required: true, "OD");
        Assert.Contains(aliased.Errors, e => e.Message.Contains("more than one column"));

        var agreeing = new RecordFields(new[]
        {
            new KeyValuePair<string, object?>("Diameter", "20 mm"),
            new KeyValuePair<string, object?>("OD", "20 mm"),
        });
        Assert.Equal(0.02, agreeing.Quantity("Diameter", QuantityKind.Length, required: true, "OD")!.Value, 12);
        Assert.Empty(agreeing.Errors);
    }

    [Fact]
    public void OneAliasListGivenWithTwoFieldsFindsEachFieldsOwnColumn()
    {
        // Alias lists are remembered with the field they came with: the same list with another field must not find the first's column.
        string[] shared = { "Span" };
        var fields = new RecordFields(new[]
        {
            new KeyValuePair<string, object?>("Diameter", "20 mm"),
            new KeyValuePair<string, object?>("Width", "3 mm"),
        });
        for (int round = 0; round < 3; round++)
        {
            Assert.Equal(0.02, fields.Quantity("Diameter", QuantityKind.Length, required: true, shared)!.Value, 12);
            Assert.Equal(0.003, fields.Quantity("Width", QuantityKind.Length, required: true, shared)!.Value, 12);
        }

        Assert.Empty(fields.Errors);
    }
}
