using System.Collections.Generic;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Errors;
using InductionHazard.Items;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Items;

/// <summary>A row's own position, normal and velocity: by components or as one column each, with the spreadsheet's unit rules.</summary>
public class PlacementRecordReaderTests
{
    private static List<KeyValuePair<string, object?>> Row(params (string Key, object? Value)[] extra) => Fixtures.InventoryRow(extra);

    private static (Vector3D? Position, Vector3D? Normal, Vector3D? Velocity, double? TiltDegrees) Read(List<KeyValuePair<string, object?>> row, IReadOnlyDictionary<string, string>? units = null) =>
        PlacementRecordReader.Read(row, "row 2 ('Ring')", units);

    private static void Near(Vector3D expected, Vector3D? actual)
    {
        Assert.NotNull(actual);
        Assert.True((actual!.Value - expected).Length <= 1e-12 * expected.Length, "expected " + expected + ", got " + actual);
    }

    [Fact]
    public void AVectorInOneColumnIsTheSameAsItsThreeComponents()
    {
        Assert.Equal(Read(Row(("X", "300 mm"), ("Y", "0"), ("Z", "1.2 m"))).Position, Read(Row(("Position", "300 mm, 0, 1.2 m"))).Position);
        Assert.Equal(new Vector3D(0.3, 0, 1.2), Read(Row(("Position", "(0.3 m; 0; 1.2 m)"))).Position);
        Assert.Equal(Read(Row(("NormalX", "0"), ("NormalY", "1"), ("NormalZ", "0"))).Normal, Read(Row(("Normal", "0, 1, 0"))).Normal);
        Assert.Equal(Vector3D.UnitY, Read(Row(("Normal", "y"))).Normal);
        Assert.Equal(new Vector3D(0, 0, -1.5), Read(Row(("VelocityX", "0"), ("VelocityY", "0"), ("VelocityZ", "-1.5 m/s"))).Velocity);
        Assert.Equal(new Vector3D(0, 0, -1.5), Read(Row(("Velocity", "0, 0, -1.5 m/s"))).Velocity);
        Near(new Vector3D(0.5, 0, 0), Read(Row(("Velocity", "1.8 km/h, 0, 0"))).Velocity);
    }

    [Fact]
    public void EveryFieldAndAliasIsLookedAtAlone()
    {
        // A row is read further only when it has a placement column: each name, alone, must be seen (a component alone is
        // refused as a part of its vector, a whole vector is read).
        foreach (KeyValuePair<string, string[]> field in PlacementRecordReader.Aliases)
        {
            foreach (string name in new[] { field.Key }.Concat(field.Value))
            {
                bool whole = field.Key is "Position" or "Normal" or "Velocity" or "Tilt";
                string value = field.Key == "Tilt" ? "30 deg" : field.Key.StartsWith("Normal", System.StringComparison.Ordinal) ? (whole ? "0, 0, 1" : "1") : field.Key.StartsWith("Velocity", System.StringComparison.Ordinal) ? (whole ? "0, 0, 1 m/s" : "1 m/s") : (whole ? "0, 0, 1 m" : "1 m");
                if (whole)
                {
                    var read = Read(Row((name, value)));
                    Assert.True(read.Position is not null || read.Normal is not null || read.Velocity is not null || read.TiltDegrees is not null, name + " was not read");
                }
                else
                {
                    var error = Assert.Throws<RecordException>(() => Read(Row((name, value))));
                    Assert.Contains("give all of", error.Message, System.StringComparison.Ordinal);
                }
            }
        }
    }

    [Fact]
    public void ARowThatGivesNoneOfAVectorLeavesItToTheRun()
    {
        Assert.Equal(((Vector3D?)null, (Vector3D?)null, (Vector3D?)null, (double?)null), Read(Row()));
        Assert.Equal(((Vector3D?)null, (Vector3D?)null, (Vector3D?)null, (double?)null), Read(Row(("Position", " "), ("Velocity", ""))));
    }

    [Fact]
    public void AZeroVelocitySaysTheItemIsPlacedNotMoved()
    {
        // The row's zero stands over the run's -Velocity; the placement then carries no motion.
        Vector3D? still = Read(Row(("Velocity", "0, 0, 0"))).Velocity;
        Assert.Equal(Vector3D.Zero, still);
        Assert.Null(new Placement(Vector3D.Zero, null, still).Velocity);
    }

    [Fact]
    public void BareNumbersTakeTheColumnsUnitOrTheUnitTablesAndAreNeverGuessedToBeSi()
    {
        Near(new Vector3D(0.3, 0, 1.2), Read(Row(("Position (mm)", "300, 0, 1200"))).Position);
        Near(new Vector3D(0.3, 0, 1.2), Read(Row(("Position", "300, 0, 1200")), new Dictionary<string, string> { ["Position"] = "mm" }).Position);
        Assert.Equal(new Vector3D(0, 0, 1.5), Read(Row(("Velocity (m/s)", "0, 0, 1.5"))).Velocity);

        var error = Assert.Throws<RecordException>(() => Read(Row(("Position", "300, 0, 1200"))));
        Assert.Contains("Position", error.Fields);
        Assert.StartsWith("row 2 ('Ring')", error.Message, System.StringComparison.Ordinal);
        Assert.Contains("'300' has no unit", error.Message, System.StringComparison.Ordinal);
        Assert.Contains("'0, 300 mm, 0'", error.Message, System.StringComparison.Ordinal);
        Assert.Contains("-Unit @{ Position = 'mm' }", error.Message, System.StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("Position", "1 m, 2 m", "is not three components")]
    [InlineData("Position", "1 m, 2 T, 0", "component 2")]
    [InlineData("Position", "0,5 m; 0; 0", "decimal comma")]
    [InlineData("Position", "1 m, NaN m, 0", "component 2")]
    [InlineData("Normal", "0, 0, 0", "the normal must not be zero")]
    [InlineData("Normal", "up", "expected three numbers")]
    [InlineData("Velocity", "0, 0, 300 m/s", "the speed must be between 0 m/s and 30 m/s")]
    [InlineData("Velocity", "0, 0, 1.5 m", "component 3")]
    [InlineData("Tilt", "120 deg", "must be between 0 degrees and 90 degrees")]
    [InlineData("Tilt", "30", "has no unit")]
    public void AMalformedVectorIsRefusedNamingTheRowAndTheColumn(string column, string value, string expected)
    {
        var error = Assert.Throws<RecordException>(() => Read(Row((column, value))));
        Assert.Contains(column, error.Fields);
        Assert.StartsWith("row 2 ('Ring')", error.Message, System.StringComparison.Ordinal);
        Assert.Contains(expected, error.Message, System.StringComparison.Ordinal);
    }

    [Fact]
    public void ARowMayGiveATiltFromTheWorstOrientationInPlaceOfANormal()
    {
        Assert.Equal(30.0, Read(Row(("Tilt", "30 deg"))).TiltDegrees!.Value, 12);
        Assert.Equal(30.0, Read(Row(("Tilt (deg)", "30"))).TiltDegrees!.Value, 12);
        Assert.Equal(90.0, Read(Row(("Tilt", "1.5707963267948966 rad"))).TiltDegrees!.Value, 9);
        var both = Assert.Throws<RecordException>(() => Read(Row(("Tilt", "30 deg"), ("Normal", "z"))));
        Assert.Contains("Tilt", both.Fields);
        Assert.Contains("not both", both.Message, System.StringComparison.Ordinal);
        Assert.Throws<RecordException>(() => Read(Row(("Tilt", "30 deg"), ("NX", "0"), ("NY", "0"), ("NZ", "1"))));
    }

    [Fact]
    public void AVectorGivenBothWaysOrInPartIsRefused()
    {
        var both = Assert.Throws<RecordException>(() => Read(Row(("Velocity", "0, 0, 1 m/s"), ("VelocityZ", "1 m/s"))));
        Assert.Contains("give Velocity or VelocityX, VelocityY, VelocityZ, not both", both.Message, System.StringComparison.Ordinal);
        var part = Assert.Throws<RecordException>(() => Read(Row(("VelocityX", "1 m/s"))));
        Assert.Contains("give all of VelocityX, VelocityY, VelocityZ, or none", part.Message, System.StringComparison.Ordinal);
        var fast = Assert.Throws<RecordException>(() => Read(Row(("VelocityX", "40 m/s"), ("VelocityY", "0"), ("VelocityZ", "0"))));
        Assert.Contains("VelocityX", fast.Fields);
    }

    [Fact]
    public void TheVectorsAreNotInventoryColumnsAndTellRepeatedRowsApart()
    {
        // A row's own place and motion are inputs of its assessment: not columns of the inventory, and part of what makes two rows alike.
        Assert.Equal(new[] { "Holder" }, InventoryFields.Of(Row(("Position", "1 m, 0, 0"), ("Normal", "z"), ("Velocity", "0, 0, 1 m/s"), ("VelX", "0"))).Keys);
        Assert.NotEqual(RepeatedRows.KeyOf(Row()), RepeatedRows.KeyOf(Row(("Velocity", "0, 0, 1 m/s"))));
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("Velocity", "0, 0, 1 m/s"))), RepeatedRows.KeyOf(Row(("Velocity", "0, 0, 2 m/s"))));
        Assert.NotEqual(RepeatedRows.KeyOf(Row(("Position", "1 m, 0, 0"))), RepeatedRows.KeyOf(Row(("Position", "2 m, 0, 0"))));
    }
}
