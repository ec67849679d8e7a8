using InductionHazard.Errors;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Quantities;

public class Vector3DTests
{
    // Defect: a direction of '1e200,0,0' passed validation, then its length overflowed and it failed inside with no
    // parameter named. Scaling by the largest component first keeps any finite non-zero direction usable.
    [Theory]
    [InlineData(1e200, 0, 0)]
    [InlineData(1e-200, 0, 0)]
    [InlineData(1e308, 1e308, 0)]
    public void AnyFiniteNonZeroVectorNormalises(double x, double y, double z)
    {
        Vector3D unit = Require.Direction("Direction", new Vector3D(x, y, z));
        Within.Relative(1, unit.Length, 1e-15, "length of the unit vector");
        Assert.True(unit.X > 0);
    }

    [Theory]
    [InlineData(0, 0, 0)]
    [InlineData(double.NaN, 0, 1)]
    [InlineData(double.PositiveInfinity, 0, 0)]
    public void AZeroOrNonFiniteDirectionIsRefusedNamingTheParameter(double x, double y, double z)
    {
        var ex = Assert.Throws<InvalidInputException>(() => Require.Direction("Normal", new Vector3D(x, y, z)));
        Assert.Equal("Normal", ex.Field);
    }

    [Validates("a vector's text, axes, the origin and negative zero among 324 vectors", ".NET composite format \"({0:G4}, {1:G4}, {2:G4})\" (general-purpose reference library)", "the same text")]
    [Fact]
    public void AVectorReadsAsTheFormatterWritesIt()
    {
        // Axes and the origin are written without the formatter: the text must be the formatter's, negative zero included
        // (where it is not beside a larger component, where it is noise like any other).
        var random = new System.Random(20261202);
        double[] special = { 0.0, -0.0, 1, -1, 0.5, 1e-9, -2.5e7, 123456.789, double.NaN };
        foreach (double x in special)
        {
            foreach (double y in special)
            {
                foreach (double z in new[] { 0.0, -0.0, 1.0, random.NextDouble() })
                {
                    var v = new Vector3D(x, y, z);
                    // A component below 1e-12 of the largest is rounding noise, displayed as 0 (1e-9 beside 2.5e7).
                    double noise = 1e-12 * System.Math.Max(System.Math.Abs(x), System.Math.Max(System.Math.Abs(y), System.Math.Abs(z)));
                    object Shown(double c) => System.Math.Abs(c) < noise ? 0.0 : c;
                    Assert.Equal(string.Format(System.Globalization.CultureInfo.InvariantCulture, "({0:G4}, {1:G4}, {2:G4})", Shown(x), Shown(y), Shown(z)), v.ToString());
                }
            }
        }
    }
}
