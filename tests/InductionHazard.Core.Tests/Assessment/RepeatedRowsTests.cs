using System.Collections.Generic;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Items;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>
/// Rows that repeat an item at a place take the first row's result: they are known by every field the assessment
/// reads, exactly as written, and by nothing that only labels them; the result they take is the one assessing them
/// afresh gives.
/// </summary>
public class RepeatedRowsTests
{
    private static KeyValuePair<string, object?>[] Row(params (string Name, object? Value)[] fields)
    {
        var row = new KeyValuePair<string, object?>[fields.Length];
        for (int k = 0; k < fields.Length; k++)
        {
            row[k] = new KeyValuePair<string, object?>(fields[k].Name, fields[k].Value);
        }

        return row;
    }

    private static KeyValuePair<string, object?>[] Ring(string name, string diameter = "20 mm", string tag = "T-1", string contact = "Skin", string? station = null) =>
        station is null
            ? Row(("Name", name), ("Material", "Copper"), ("Diameter", diameter), ("WireDiameter", "2 mm"), ("Contact", contact), ("AssetTag", tag), ("Holder", "A"))
            : Row(("Name", name), ("Material", "Copper"), ("Diameter", diameter), ("WireDiameter", "2 mm"), ("Contact", contact), ("AssetTag", tag), ("Station", station));

    [Fact]
    public void ANameAndTheInventorysOwnColumnsDoNotMakeARowDifferent()
    {
        string? key = RepeatedRows.KeyOf(Ring("Wedding band"));
        Assert.NotNull(key);
        Assert.Equal(key, RepeatedRows.KeyOf(Ring("Spare band", tag: "T-2")));
        Assert.Equal(key, RepeatedRows.KeyOf(Ring(string.Empty, tag: string.Empty)));
        // The Name column's aliases name the item too.
        Assert.Equal(
            RepeatedRows.KeyOf(Row(("Item", "one"), ("Material", "Copper"), ("Diameter", "20 mm"), ("WireDiameter", "2 mm"))),
            RepeatedRows.KeyOf(Row(("Item", "two"), ("Material", "Copper"), ("Diameter", "20 mm"), ("WireDiameter", "2 mm"))));
    }

    [Fact]
    public void EveryFieldTheAssessmentReadsMakesARowDifferent()
    {
        string? key = RepeatedRows.KeyOf(Ring("Band", station: "Bay 1"));
        Assert.NotEqual(key, RepeatedRows.KeyOf(Ring("Band", diameter: "21 mm", station: "Bay 1")));
        Assert.NotEqual(key, RepeatedRows.KeyOf(Ring("Band", contact: "Held", station: "Bay 1")));
        Assert.NotEqual(key, RepeatedRows.KeyOf(Ring("Band", station: "Bay 2")));
        // The same size written otherwise is another key (assessed afresh, to the same result): values are compared as written.
        Assert.NotEqual(key, RepeatedRows.KeyOf(Ring("Band", diameter: "0.02 m", station: "Bay 1")));
        // A placement column, a header that names its unit, and a column the row leaves out.
        KeyValuePair<string, object?>[] placed = Row(("Material", "Copper"), ("Diameter (mm)", "20"), ("WireDiameter", "2 mm"), ("X", "0.1"));
        Assert.NotEqual(RepeatedRows.KeyOf(placed), RepeatedRows.KeyOf(Row(("Material", "Copper"), ("Diameter (mm)", "20"), ("WireDiameter", "2 mm"), ("X", "0.2"))));
        Assert.NotEqual(RepeatedRows.KeyOf(placed), RepeatedRows.KeyOf(Row(("Material", "Copper"), ("Diameter (mm)", "20"), ("WireDiameter", "2 mm"))));
        Assert.NotEqual(RepeatedRows.KeyOf(placed), RepeatedRows.KeyOf(Row(("Material", "Copper"), ("Diameter", "20"), ("WireDiameter", "2 mm"), ("X", "0.1"))));
    }

    [Fact]
    public void NumbersAreComparedExactlyAndOtherObjectsNotAtAll()
    {
        // Two doubles that print alike to 15 digits are still two sizes.
        double d = 0.02, next = 0.020000000000000004;
        Assert.Equal(d.ToString("G15", System.Globalization.CultureInfo.InvariantCulture), next.ToString("G15", System.Globalization.CultureInfo.InvariantCulture));
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("Diameter", d))), RepeatedRows.KeyOf(Row(("Diameter", next))));
        Assert.Equal(RepeatedRows.KeyOf(Row(("Diameter", d))), RepeatedRows.KeyOf(Row(("Diameter", 0.02))));
        // A number and the same digits as text are read differently (a bare number's unit may differ), so they differ here.
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("Gap", 1))), RepeatedRows.KeyOf(Row(("Gap", "1"))));
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("Gap", 1))), RepeatedRows.KeyOf(Row(("Gap", 1L))));
        // An object whose text may not say all it holds gives no key: the row is assessed on its own.
        Assert.Null(RepeatedRows.KeyOf(Row(("Name", "Odd"), ("Diameter", new object()))));
        Assert.Null(RepeatedRows.KeyOf(Row(("AssetTag", "only inventory columns"))));
        // Two columns that name the item (which the reader refuses if they disagree) give no key either.
        Assert.Null(RepeatedRows.KeyOf(Row(("Name", "Spanner"), ("Description", "13 mm spanner"), ("Material", "Copper"), ("Diameter", "20 mm"), ("WireDiameter", "2 mm"))));
        Assert.Null(RepeatedRows.KeyOf(Row(("Name", "Spanner"), ("name", "Spanner"), ("Material", "Copper"), ("Diameter", "20 mm"), ("WireDiameter", "2 mm"))));
    }

    [Fact]
    public void TheFirstRowsWorkIsKeptForTheLatestRowsOnly()
    {
        // The commands keep it in a bounded cache, which starts again empty every so many additions.
        var rows = new BoundedCache<string, int>(3, System.StringComparer.Ordinal);
        for (int k = 0; k < 10; k++)
        {
            rows.Add("row " + k, k);
        }

        Assert.True(rows.TryGet("row 9", out int last));
        Assert.Equal(9, last);
        Assert.False(rows.TryGet("row 0", out _));
        Assert.False(rows.TryGet("row 5", out _));
    }

    /// <summary>Keys "row N" hashed to N mod 1,000, so that which keys share a hash is known (a string's own hash changes from run to run).</summary>
    private sealed class Numbered : IEqualityComparer<string>
    {
        public bool Equals(string? x, string? y) => string.Equals(x, y, System.StringComparison.Ordinal);

        public int GetHashCode(string obj) => int.Parse(System.MemoryExtensions.AsSpan(obj, 4), System.Globalization.NumberStyles.Integer, System.Globalization.CultureInfo.InvariantCulture) % 1000;
    }

    [Fact]
    public void AValueOfferedOnRepeatIsKeptFromItsKeysSecondSightOn()
    {
        // A row's work (and a parsed text) is kept only when its key comes again: an inventory of items all different
        // keeps nothing alive for repeats that never come.
        var rows = new BoundedCache<string, int>(256, System.StringComparer.Ordinal);
        for (int k = 0; k < 100; k++)
        {
            Assert.Equal(k, rows.AddOnRepeat("row " + k, k));
        }

        for (int k = 0; k < 100; k++)
        {
            Assert.False(rows.TryGet("row " + k, out _));
        }

        // A key is known by its whole text, not the same string object, and the value kept is the second sight's.
        Assert.Equal(1000, rows.AddOnRepeat(string.Concat("row ", "14"), 1000));
        Assert.True(rows.TryGet("row 14", out int kept));
        Assert.Equal(1000, kept);
        Assert.False(rows.TryGet("row 16", out _));
    }

    [Fact]
    public void KeysThatComeInTurnAreAllKeptWhateverTheirHashes()
    {
        // Ten sizes of ring in turn, row after row, under the process's own string hashes in fresh caches: every size
        // is kept from its second sight (a table of one slot per hash once lost keys whose slots collided, so that
        // they were solved on every row).
        for (int trial = 0; trial < 200; trial++)
        {
            var rows = new BoundedCache<string, int>(256, System.StringComparer.Ordinal);
            for (int row = 0; row < 30; row++)
            {
                string key = "Copper|" + (18 + (row % 10)) + " mm|" + trial;
                if (!rows.TryGet(key, out _))
                {
                    rows.AddOnRepeat(key, row);
                }
            }

            for (int size = 0; size < 10; size++)
            {
                Assert.True(rows.TryGet("Copper|" + (18 + size) + " mm|" + trial, out int first), "size " + size + ", trial " + trial);
                Assert.Equal(10 + size, first);
            }
        }
    }

    [Fact]
    public void AValueOfferedOnRepeatIsFoundOnlyByItsWholeKeyAndForgottenAfterAsManyOthers()
    {
        // Two keys with one hash ("row 5" and "row 1005"): the second is kept on its first sight, and the first takes
        // nothing of it.
        var rows = new BoundedCache<string, int>(16, new Numbered());
        rows.AddOnRepeat("row 5", 5);
        Assert.Equal(1005, rows.AddOnRepeat("row 1005", 1005));
        Assert.True(rows.TryGet("row 1005", out int kept));
        Assert.Equal(1005, kept);
        Assert.False(rows.TryGet("row 5", out _));

        // A key offered again after more keys than the cache keeps is a first sight again.
        rows.AddOnRepeat("row 9", 9);
        for (int k = 100; k < 117; k++)
        {
            rows.AddOnRepeat("row " + k, k);
        }

        rows.AddOnRepeat("row 9", 90);
        Assert.False(rows.TryGet("row 9", out _), "row 9 was forgotten after 17 other keys");
        rows.AddOnRepeat("row 9", 900);
        Assert.True(rows.TryGet("row 9", out int nine));
        Assert.Equal(900, nine);
    }

    [Fact]
    public void ARepeatedRowTakesTheResultAssessingItAfreshGives()
    {
        var source = Fixtures.UniformRamp(0, 1, 0.01);
        KeyValuePair<string, object?>[] first = Ring("Wedding band");
        KeyValuePair<string, object?>[] again = Ring(string.Empty, tag: "T-9");
        Assert.Equal(RepeatedRows.KeyOf(first), RepeatedRows.KeyOf(again));

        InductionAssessment Assess(KeyValuePair<string, object?>[] row, int number) =>
            HazardAssessor.Assess(
                InductionEngine.Respond(new Scenario(ItemRecordReader.Read(row, MaterialLibrary.BuiltIn, number), source) { Inventory = InventoryFields.Of(row) }),
                HazardPolicy.Default,
                number);

        InductionAssessment assessed = Assess(first, 1);
        string firstHash = assessed.InputHash; // found before the relabelling, which must not keep it
        InductionAssessment relabelled = assessed.For(RepeatedRows.Relabel(assessed.Response, ItemRecordReader.NameOf(again), again, 7), 7);
        InductionAssessment afresh = Assess(again, 7);
        Assert.Equal("row 7", relabelled.ItemName);
        Assert.Equal(afresh.ItemName, relabelled.ItemName);
        Assert.Equal(afresh.Response.ItemName, relabelled.Response.ItemName);
        Assert.Equal(7, relabelled.RowNumber);
        Assert.Equal("T-9", relabelled.Inventory["AssetTag"]);
        Assert.Equal(afresh.InputHash, relabelled.InputHash);
        Assert.NotEqual(firstHash, relabelled.InputHash);
        Assert.Equal("Wedding band", assessed.ItemName);
        Assert.Equal(afresh.Verdict, relabelled.Verdict);
        Assert.Equal(afresh.MinimumMargin, relabelled.MinimumMargin);
        Assert.Equal(afresh.Summary, relabelled.Summary);
        Assert.Equal(afresh.Reasons.ToArray(), relabelled.Reasons.ToArray());
        Assert.Equal(afresh.Response.PeakCurrentAmperes, relabelled.Response.PeakCurrentAmperes);
        Assert.Equal(afresh.Response.Scenario.Fingerprint(), relabelled.Response.Scenario.Fingerprint());
    }
}
