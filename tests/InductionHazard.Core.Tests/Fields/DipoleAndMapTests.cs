using System;
using System.IO;
using System.Text;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class DipoleAndMapTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    [Validates("coil far field against the dipole's; axial 2 mu0 m / (4 pi r^3)", "Jackson 5.56", "3 (a/r)^2; 1e-12")]
    [Theory]
    [InlineData(2.0)]
    [InlineData(5.0)]
    public void ACoilsFarFieldIsThatOfADipoleOfMomentNIPiA2(double distance)
    {
        // Far from a loop its field is the dipole's, m = N I pi a^2 (Jackson 5.56); the difference falls as (a/r)^2.
        var coil = new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10);
        var dipole = new DipoleField(Vector3D.Zero, new Vector3D(0, 0, 10 * Math.PI * 0.01));
        foreach (var p in new[] { new Vector3D(0, 0, distance), new Vector3D(distance, 0, 0), new Vector3D(distance * 0.6, 0, distance * 0.8) })
        {
            Vector3D c = coil.FieldPerUnitDrive(p), d = dipole.FieldPerUnitDrive(p);
            Assert.True((c - d).Length / d.Length < 3 * Math.Pow(0.1 / distance, 2), "at " + p + ": coil " + c + ", dipole " + d);
        }

        // On the axis the dipole field is mu0 2 m / (4 pi r^3).
        Within.Relative(Mu0 * 2 * Math.PI * 0.1 / (4 * Math.PI * Math.Pow(distance, 3)), dipole.FieldPerUnitDrive(new Vector3D(0, 0, distance)).Z, 1e-12, "axial dipole field");
    }

    [Fact]
    public void ADipoleRefusesPointsWhereItsFarFieldDoesNotHold()
    {
        var dipole = new DipoleField(Vector3D.Zero, Vector3D.UnitZ, 0.5);
        Assert.Throws<FieldEvaluationException>(() => dipole.FieldPerUnitDrive(new Vector3D(0, 0, 1.2)));
        Assert.True(dipole.FieldPerUnitDrive(new Vector3D(0, 0, 1.6)).Z > 0);
    }

    private static string WriteMap(Func<double, double, double, Vector3D> field)
    {
        var text = new StringBuilder("x (mm),y (mm),z (mm),Bx (mT),By (mT),Bz (mT)\n");
        foreach (int x in new[] { -50, 0, 50 })
        {
            foreach (int y in new[] { -50, 0, 50 })
            {
                foreach (int z in new[] { 0, 20 })
                {
                    Vector3D b = field(x, y, z);
                    text.Append(FormattableString.Invariant($"{x},{y},{z},{b.X},{b.Y},{b.Z}\n"));
                }
            }
        }

        string path = Path.GetTempFileName();
        File.WriteAllText(path, text.ToString());
        return path;
    }

    [Validates("trilinear interpolation of a linear field", "exactness of trilinear interpolation", "1e-12")]
    [Fact]
    public void AMapReproducesAFieldThatIsLinearInPositionAndRefusesPointsOutside()
    {
        // Trilinear interpolation is exact for a field linear in each coordinate: Bz = 10 + x/10 + y/20 + z/5 (mT, mm).
        string path = WriteMap((x, y, z) => new Vector3D(0, 0, 10 + (x / 10.0) + (y / 20.0) + (z / 5.0)));
        FieldMap map = FieldMap.Read(path);
        Within.Relative(0.0215, map.ReferenceTesla, 1e-12, "strongest node, 10 + 5 + 2.5 + 4 mT");
        var p = new Vector3D(0.013, -0.021, 0.007);
        double expected = 1e-3 * (10 + 1.3 - 1.05 + 1.4) / map.ReferenceTesla;
        Within.Relative(expected, map.FieldPerUnitDrive(p).Z, 1e-12, "interpolated field per unit drive");
        Assert.Throws<FieldEvaluationException>(() => map.FieldPerUnitDrive(new Vector3D(0.06, 0, 0.01)));
        File.Delete(path);
    }

    [Fact]
    public void AMapThatDoesNotFillAGridIsRefused()
    {
        string path = Path.GetTempFileName();
        File.WriteAllText(path, "x,y,z,Bx,By,Bz\n0,0,0,0,0,1\n1,0,0,0,0,1\n0,1,0,0,0,1\n");
        var ex = Assert.Throws<DataFileException>(() => FieldMap.Read(path));
        Assert.Contains("regular grid", ex.Reason, StringComparison.Ordinal);
        File.Delete(path);
    }
}
