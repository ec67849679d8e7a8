using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using CsvHelper;
using CsvHelper.Configuration;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A measured or computed field on a regular grid (x, y, z, Bx, By, Bz), interpolated trilinearly. Its shape is
/// scaled by the drive in tesla: the drive is the field magnitude at the map's strongest node. Outside the grid
/// the field is not known, and a point there is refused.
/// </summary>
public sealed class FieldMap : IFieldGeometry
{
    /// <summary>The error id of a map that cannot be read.</summary>
    public const string ErrorId = "InvalidFieldMap";

    private static readonly string[] Columns = { "x", "y", "z", "bx", "by", "bz" };
    private static readonly Regex UnitInHeader = new(@"^\s*(?<name>[^\(\[]+?)\s*[\(\[]\s*(?<unit>[^\)\]]+)\s*[\)\]]\s*$", RegexOptions.CultureInvariant);

    private readonly double[] _x;
    private readonly double[] _y;
    private readonly double[] _z;
    private readonly Vector3D[] _field;

    private FieldMap(string name, double[] x, double[] y, double[] z, Vector3D[] field, double reference)
    {
        Name = name;
        _x = x;
        _y = y;
        _z = z;
        _field = field;
        ReferenceTesla = reference;
    }

    /// <summary>The map's file name.</summary>
    public string Name { get; }

    /// <summary>The largest |B| on the grid, T: the field that a drive of 1 T stands for.</summary>
    public double ReferenceTesla { get; }

    /// <summary>The number of nodes along x, y and z.</summary>
    public (int X, int Y, int Z) GridSize => (_x.Length, _y.Length, _z.Length);

    /// <inheritdoc />
    public DriveKind Drive => DriveKind.FluxDensity;

    /// <summary>
    /// Reads a map: a header naming x, y, z, Bx, By, Bz (any order, any case, a unit in brackets such as
    /// "x (mm)" or "Bz [mT]"; metres and tesla otherwise), then one row per node of a full regular grid.
    /// </summary>
    /// <exception cref="DataFileException">The file is missing, a column is missing, a cell is not a number, or the rows do not fill a grid.</exception>
    public static FieldMap Read(string path)
    {
        if (!File.Exists(path))
        {
            throw new DataFileException(path, null, "the file does not exist", ErrorId);
        }

        CsvConfiguration config = DelimitedText.Configuration();
        using var reader = new StreamReader(path);
        using var parser = new CsvParser(reader, config);
        if (!parser.Read())
        {
            throw new DataFileException(path, null, "the file is empty", ErrorId);
        }

        (int[] index, double[] scale) = Header(path, parser.Record ?? Array.Empty<string>());
        var rows = new List<double[]>();
        while (parser.Read())
        {
            string[] cells = parser.Record ?? Array.Empty<string>();
            var row = new double[6];
            for (int c = 0; c < 6; c++)
            {
                if (index[c] >= cells.Length || !double.TryParse(cells[index[c]], NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !Finite.Is(v * scale[c]))
                {
                    throw new DataFileException(path, parser.RawRow, "the " + Columns[c] + " cell " + (index[c] < cells.Length ? "'" + cells[index[c]] + "'" : "(missing)") + " is not a finite number", ErrorId);
                }

                row[c] = v * scale[c];
            }

            rows.Add(row);
        }

        return Grid(path, rows);
    }

    /// <inheritdoc />
    public Vector3D FieldPerUnitDrive(Vector3D point)
    {
        if (!Bracket(_x, point.X, out int i, out double fx) || !Bracket(_y, point.Y, out int j, out double fy) || !Bracket(_z, point.Z, out int k, out double fz))
        {
            throw new FieldEvaluationException("the point " + point + " m is outside the field map " + Name + " (x " + Span(_x) + ", y " + Span(_y) + ", z " + Span(_z) + "): the field there is not known");
        }

        Vector3D sum = Vector3D.Zero;
        for (int di = 0; di <= 1; di++)
        {
            for (int dj = 0; dj <= 1; dj++)
            {
                for (int dk = 0; dk <= 1; dk++)
                {
                    double w = (di == 0 ? 1 - fx : fx) * (dj == 0 ? 1 - fy : fy) * (dk == 0 ? 1 - fz : fz);
                    if (w != 0)
                    {
                        sum += w * _field[Node(Math.Min(i + di, _x.Length - 1), Math.Min(j + dj, _y.Length - 1), Math.Min(k + dk, _z.Length - 1))];
                    }
                }
            }
        }

        return (1.0 / ReferenceTesla) * sum;
    }

    /// <inheritdoc />
    public double FluxThroughDisc(Vector3D centre, Vector3D normal, double radius) =>
        DiscQuadrature.Flux(FieldPerUnitDrive, centre, normal, radius);

    /// <inheritdoc />
    public string Describe() =>
        "field map " + Name + " (" + _x.Length + " x " + _y.Length + " x " + _z.Length + " nodes; drive = |B| at its strongest node, " + SiFormat.Format(ReferenceTesla, "T") + " as mapped)";

    private static (int[] Index, double[] Scale) Header(string path, string[] header)
    {
        var index = new int[6];
        var scale = new double[6];
        for (int c = 0; c < 6; c++)
        {
            index[c] = -1;
            for (int h = 0; h < header.Length; h++)
            {
                Match m = UnitInHeader.Match(header[h]);
                string name = m.Success ? m.Groups["name"].Value : header[h];
                if (RecordFields.Normalize(name) != Columns[c])
                {
                    continue;
                }

                index[c] = h;
                scale[c] = 1;
                if (m.Success)
                {
                    QuantityKind kind = c < 3 ? QuantityKind.Length : QuantityKind.MagneticFluxDensity;
                    if (!QuantityParser.TryParse("1 " + m.Groups["unit"].Value, kind, out scale[c], out string? error))
                    {
                        throw new DataFileException(path, 1, "column '" + header[h] + "': " + error, ErrorId);
                    }
                }
            }

            if (index[c] < 0)
            {
                throw new DataFileException(path, 1, "the header has no " + Columns[c] + " column (it needs x, y, z, Bx, By, Bz; got " + string.Join(", ", header) + ")", ErrorId);
            }
        }

        return (index, scale);
    }

    private static FieldMap Grid(string path, List<double[]> rows)
    {
        double[] Axis(int c) => rows.Select(r => r[c]).Distinct().OrderBy(v => v).ToArray();
        double[] x = Axis(0), y = Axis(1), z = Axis(2);
        if ((long)x.Length * y.Length * z.Length != rows.Count || rows.Count == 0)
        {
            throw new DataFileException(path, null, rows.Count + " rows do not fill a regular grid of " + x.Length + " x " + y.Length + " x " + z.Length + " nodes", ErrorId);
        }

        var field = new Vector3D[rows.Count];
        var seen = new bool[rows.Count];
        double reference = 0;
        foreach (double[] r in rows)
        {
            int n = (((Array.BinarySearch(x, r[0]) * y.Length) + Array.BinarySearch(y, r[1])) * z.Length) + Array.BinarySearch(z, r[2]);
            if (seen[n])
            {
                throw new DataFileException(path, null, "the node (" + r[0] + ", " + r[1] + ", " + r[2] + ") appears twice", ErrorId);
            }

            seen[n] = true;
            field[n] = new Vector3D(r[3], r[4], r[5]);
            reference = Math.Max(reference, field[n].Length);
        }

        if (!(reference > 0))
        {
            throw new DataFileException(path, null, "the field is zero at every node", ErrorId);
        }

        return new FieldMap(Path.GetFileName(path), x, y, z, field, reference);
    }

    private int Node(int i, int j, int k) => (((i * _y.Length) + j) * _z.Length) + k;

    /// <summary>The cell index and fraction of a coordinate; false outside. A single node is a plane that the point must lie on.</summary>
    private static bool Bracket(double[] nodes, double value, out int index, out double fraction)
    {
        index = 0;
        fraction = 0;
        int n = nodes.Length;
        double tolerance = 1e-9 * Math.Max(1, Math.Abs(nodes[n - 1] - nodes[0]));
        if (n == 1)
        {
            return Math.Abs(value - nodes[0]) <= tolerance;
        }

        if (value < nodes[0] - tolerance || value > nodes[n - 1] + tolerance)
        {
            return false;
        }

        int at = Array.BinarySearch(nodes, value);
        index = at >= 0 ? Math.Min(at, n - 2) : Math.Max(0, Math.Min(~at - 1, n - 2));
        fraction = Math.Max(0, Math.Min(1, (value - nodes[index]) / (nodes[index + 1] - nodes[index])));
        return true;
    }

    private static string Span(double[] nodes) => SiFormat.Format(nodes[0], "m") + " to " + SiFormat.Format(nodes[nodes.Length - 1], "m");
}
