using System;
using System.Collections.Generic;
using System.IO;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// Builds a source from named values and its waveform: the parameters of New-FieldSource or a source table of a
/// site file. The form is named by a Form value or a true switch of its name (Uniform, Conductor, Busbar,
/// ThreePhase, Coil, Solenoid, Dipole, Map). Positions are lengths ('300 mm, 0, 0'; bare numbers in metres).
/// </summary>
public static class SourceRecordReader
{
    /// <summary>The forms, as named in parameters and site files.</summary>
    public static IReadOnlyList<string> Forms { get; } = new[] { "Uniform", "Conductor", "Busbar", "ThreePhase", "Coil", "Solenoid", "Dipole", "Map" };

    /// <summary>The phase shifts of a three-phase set's conductors A, B, C: B lags A by 120 degrees, C leads it (sequence ABC).</summary>
    private static readonly double[] PhaseShifts = { 0, -2 * Math.PI / 3, 2 * Math.PI / 3 };

    /// <summary>Reads the source.</summary>
    /// <param name="values">The named values (the waveform is given apart).</param>
    /// <param name="waveform">The drive.</param>
    /// <param name="baseDirectory">Where a relative map path is resolved from.</param>
    /// <param name="label">How the definition is named in messages.</param>
    /// <exception cref="RecordException">A value is missing, malformed or of the wrong unit.</exception>
    /// <exception cref="InvalidInputException">A value is out of range, or the waveform's drive does not fit the source.</exception>
    /// <exception cref="DataFileException">A map file cannot be read.</exception>
    public static FieldSource Read(IEnumerable<KeyValuePair<string, object?>> values, FieldWaveform waveform, string baseDirectory, string label = "source")
    {
        var fields = new RecordFields(values);
        string form = fields.Form(Forms, label);
        string? name = fields.Text("Name", required: false);
        Vector3D centre = Vector(fields, "Center", QuantityKind.Length, Vector3D.Zero, "Centre", "Position");
        Vector3D axisDirection = Vector(fields, "Axis", null, Vector3D.UnitZ);
        SourceTerm[]? terms = null;
        try
        {
            terms = form switch
            {
                "Uniform" => One(new UniformField(Vector(fields, "Direction", null, Vector3D.UnitZ)), waveform),
                "Conductor" => One(Conductor(fields, centre, axisDirection), waveform),
                "Busbar" => One(Busbar(fields, centre, axisDirection), waveform),
                "ThreePhase" => ThreePhase(fields, centre, axisDirection, waveform),
                "Coil" => One(Coil(fields, centre, axisDirection), waveform),
                "Solenoid" => One(Solenoid(fields, centre, axisDirection), waveform),
                "Dipole" => One(Dipole(fields, centre), waveform),
                _ => One(Map(fields, baseDirectory), waveform),
            };
        }
        catch (MissingValueException)
        {
            terms = null;
        }

        if (terms is not null)
        {
            fields.RejectUnused("is not a value of this " + label + " (check the spelling)");
        }

        if (fields.Errors.Count > 0 || terms is null)
        {
            throw new RecordException(label, fields.Errors);
        }

        return new FieldSource(name ?? DefaultName(form), terms);
    }

    private static string DefaultName(string form) => form switch
    {
        "ThreePhase" => "three-phase set",
        "Map" => "mapped field",
        _ => form.ToLowerInvariant() switch { "uniform" => "uniform field", var f => f },
    };

    private static SourceTerm[] One(IFieldGeometry geometry, FieldWaveform waveform) => new[] { new SourceTerm(geometry, waveform) };

    private static IFieldGeometry Conductor(RecordFields f, Vector3D centre, Vector3D axis)
    {
        if (f.Has("Start") || f.Has("End"))
        {
            Vector3D start = Vector(f, "Start", QuantityKind.Length, null);
            Vector3D end = Vector(f, "End", QuantityKind.Length, null);
            return new SegmentConductor(start, end);
        }

        return new LineConductor(new Axis(centre, axis));
    }

    private static BusbarField Busbar(RecordFields f, Vector3D centre, Vector3D axis) =>
        new(new Axis(centre, axis), Length(f, "Width"), Length(f, "Thickness"));

    private static CircularCoil Coil(RecordFields f, Vector3D centre, Vector3D axis) =>
        new(new Axis(centre, axis), Length(f, "Radius"), f.Number("Turns", required: false, "N") ?? 1);

    private static SolenoidField Solenoid(RecordFields f, Vector3D centre, Vector3D axis) =>
        new(new Axis(centre, axis), Length(f, "Radius"), Length(f, "Length"), Required(f.Number("Turns", required: true, "N")));

    private static DipoleField Dipole(RecordFields f, Vector3D centre)
    {
        Vector3D moment = Vector(f, "Moment", null, null);
        return new DipoleField(centre, moment, f.Quantity("SourceSize", QuantityKind.Length, required: false));
    }

    private static FieldMap Map(RecordFields f, string baseDirectory)
    {
        string path = f.Text("Path", required: true, "File") ?? throw new MissingValueException();
        return FieldMap.Read(Path.IsPathRooted(path) ? path : Path.Combine(baseDirectory, path));
    }

    /// <summary>Three parallel conductors at the corners of a flat row or an equilateral triangle (trefoil) of side -Spacing, driven 120 degrees apart.</summary>
    private static SourceTerm[] ThreePhase(RecordFields f, Vector3D centre, Vector3D axisDirection, FieldWaveform waveform)
    {
        double spacing = Length(f, "Spacing");
        string arrangement = f.Text("Arrangement", required: false) ?? "Flat";
        var axis = new Axis(centre, axisDirection);
        Vector3D u = axis.Perpendicular, v = axis.Direction.Cross(u);
        Vector3D[] offsets;
        if (string.Equals(arrangement, "Flat", StringComparison.OrdinalIgnoreCase))
        {
            offsets = new[] { -spacing * u, Vector3D.Zero, spacing * u };
        }
        else if (string.Equals(arrangement, "Trefoil", StringComparison.OrdinalIgnoreCase))
        {
            double r = spacing / Math.Sqrt(3);
            offsets = new[] { r * v, r * ((-Math.Sqrt(3) / 2 * u) - (0.5 * v)), r * ((Math.Sqrt(3) / 2 * u) - (0.5 * v)) };
        }
        else
        {
            f.AddError("Arrangement", "'" + arrangement + "' is not Flat or Trefoil");
            throw new MissingValueException();
        }

        var terms = new SourceTerm[3];
        for (int k = 0; k < 3; k++)
        {
            terms[k] = new SourceTerm(new LineConductor(new Axis(centre + offsets[k], axis.Direction)), waveform.WithPhaseShift(PhaseShifts[k]));
        }

        return terms;
    }

    private static double Length(RecordFields f, string name) => Required(f.Quantity(name, QuantityKind.Length, required: true));

    private static double Required(double? value) => value ?? throw new MissingValueException();

    private static Vector3D Vector(RecordFields f, string name, QuantityKind? kind, Vector3D? fallback, params string[] aliases)
    {
        object? raw = f.Raw(name, required: fallback is null, aliases);
        if (raw is null)
        {
            return fallback ?? throw new MissingValueException();
        }

        try
        {
            return VectorParser.Parse(raw, name, kind);
        }
        catch (InvalidInputException ex)
        {
            f.AddError(name, ex.Reason);
            throw new MissingValueException();
        }
    }

    /// <summary>A required value was missing or malformed; its error is already recorded.</summary>
    private sealed class MissingValueException : Exception
    {
    }
}
