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
}
