using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// Builds a waveform from named values: the parameters of New-FieldWaveform or a waveform table of a site file.
/// The form is named by a Form value or by a true switch of its name (Ramp, Sine, Fault, Discharge, Decay,
/// Trapezoid, Samples); Repeat and Period make any pulse a train.
/// </summary>
public static class WaveformRecordReader
{
    /// <summary>The forms, as named in parameters and site files.</summary>
    public static IReadOnlyList<string> Forms { get; } = new[] { "Ramp", "Sine", "Fault", "Discharge", "Decay", "Trapezoid", "Samples" };

    /// <summary>Reads the waveform.</summary>
    /// <param name="values">The named values.</param>
    /// <param name="baseDirectory">Where a relative capture path is resolved from.</param>
    /// <param name="label">How the definition is named in messages ("waveform", "station 'Bay 2' source 1 waveform").</param>
    /// <exception cref="RecordException">A value is missing, malformed or of the wrong unit.</exception>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    /// <exception cref="DataFileException">A capture file cannot be read.</exception>
    public static FieldWaveform Read(IEnumerable<KeyValuePair<string, object?>> values, string baseDirectory, string label = "waveform")
    {
        var fields = new RecordFields(values);
        string form = fields.Form(Forms, label);
        double start = fields.Quantity("Start", QuantityKind.Time, required: false) ?? 0.0;
        FieldWaveform? waveform = form switch
        {
            "Ramp" => Ramp(fields, start),
            "Sine" => Sine(fields, start),
            "Fault" => Fault(fields, start),
            "Discharge" => Discharge(fields, start),
            "Decay" => Decay(fields, start),
            "Trapezoid" => Trapezoid(fields, start),
            _ => Samples(fields, baseDirectory),
        };
        int? repeat = Count(fields);
        double? period = fields.Quantity("Period", QuantityKind.Time, required: repeat is not null);
        fields.RejectUnused("is not a value of this " + label + " (check the spelling)");
        if (fields.Errors.Count > 0 || waveform is null)
        {
            throw new RecordException(label, fields.Errors);
        }

        return repeat is { } n ? new RepeatedWaveform(waveform, n, period!.Value) : waveform;
    }

    private static RampWaveform? Ramp(RecordFields f, double start)
    {
        DriveLevel? from = Level(f, "From", required: true), to = Level(f, "To", required: true);
        double? duration = f.Quantity("Duration", QuantityKind.Time, required: true);
        if (from is null || to is null || duration is null)
        {
            return null;
        }

        DriveKind kind = DriveLevel.Common(from.Value, to.Value)
            ?? throw new InvalidInputException("To", "is " + to + " but From is " + from + ": both must be flux densities or both currents");
        return new RampWaveform(from.Value.Value, to.Value.Value, duration.Value, start, kind);
    }

    private static SineWaveform? Sine(RecordFields f, double start)
    {
        bool rms = f.Has("RmsAmplitude");
        DriveLevel? level = rms ? Level(f, "RmsAmplitude", required: true) : Level(f, "Amplitude", required: true);
        double? frequency = f.Quantity("Frequency", QuantityKind.Frequency, required: true);
        double phase = f.Quantity("PhaseDegrees", QuantityKind.Angle, required: false, "Phase") ?? 0.0;
        double? duration = f.Quantity("Duration", QuantityKind.Time, required: false);
        if (level is null || frequency is null)
        {
            return null;
        }

        double peak = rms ? level.Value.Value * Math.Sqrt(2) : level.Value.Value;
        return new SineWaveform(peak, frequency.Value, phase * Math.PI / 180, duration, start, level.Value.Kind);
    }

    private static FaultWaveform? Fault(RecordFields f, double start)
    {
        double? current = f.Quantity("Current", QuantityKind.ElectricCurrent, required: true);
        double? xr = f.Number("XOverR", required: true, "XR");
        double? frequency = f.Quantity("Frequency", QuantityKind.Frequency, required: true);
        double clearing = f.Quantity("ClearingTime", QuantityKind.Time, required: false) ?? FaultWaveform.DefaultClearingSeconds;
        double? angle = f.Quantity("ClosingAngleDegrees", QuantityKind.Angle, required: false, "ClosingAngle");
        return current is null || xr is null || frequency is null
            ? null
            : new FaultWaveform(current.Value, xr.Value, frequency.Value, clearing, angle is { } a ? a * Math.PI / 180 : null, start);
    }

    private static DischargeWaveform? Discharge(RecordFields f, double start)
    {
        double? c = f.Quantity("Capacitance", QuantityKind.Capacitance, required: true);
        double? v = f.Quantity("Voltage", QuantityKind.Voltage, required: true);
        double? l = f.Quantity("Inductance", QuantityKind.Inductance, required: true);
        double? r = f.Quantity("Resistance", QuantityKind.Resistance, required: true);
        bool crowbar = f.Raw("Crowbar", required: false) is { } cb && RecordFields.IsTrue(cb);
        return c is null || v is null || l is null || r is null ? null : new DischargeWaveform(c.Value, v.Value, l.Value, r.Value, crowbar, start);
    }

    private static DecayWaveform? Decay(RecordFields f, double start)
    {
        DriveLevel? from = Level(f, "From", required: true);
        DriveLevel to = Level(f, "To", required: false) ?? new DriveLevel(0, DriveKind.Unspecified);
        double? tau = f.Quantity("TimeConstant", QuantityKind.Time, required: true, "Tau");
        if (from is null || tau is null)
        {
            return null;
        }

        DriveKind kind = DriveLevel.Common(from.Value, to)
            ?? throw new InvalidInputException("To", "is " + to + " but From is " + from + ": both must be flux densities or both currents");
        return new DecayWaveform(from.Value.Value, tau.Value, to.Value, start, kind);
    }

    private static PiecewiseLinearWaveform? Trapezoid(RecordFields f, double start)
    {
        DriveLevel? amplitude = Level(f, "Amplitude", required: true);
        double? rise = f.Quantity("RiseTime", QuantityKind.Time, required: true, "Rise");
        double flat = f.Quantity("FlatTime", QuantityKind.Time, required: false, "Flat") ?? 0.0;
        double? fall = f.Quantity("FallTime", QuantityKind.Time, required: true, "Fall");
        return amplitude is null || rise is null || fall is null
            ? null
            : PiecewiseLinearWaveform.Trapezoid(amplitude.Value.Value, rise.Value, flat, fall.Value, start, amplitude.Value.Kind);
    }

    private static PiecewiseLinearWaveform? Samples(RecordFields f, string baseDirectory)
    {
        string? path = f.Text("Path", required: true, "File", "Capture");
        string? timeColumn = f.Text("TimeColumn", required: false);
        string? valueColumn = f.Text("ValueColumn", required: false);
        string? unit = f.Text("Unit", required: true);
        if (path is null || unit is null)
        {
            return null;
        }

        DriveLevel scale;
        try
        {
            scale = DriveLevel.Parse("1 " + unit);
        }
        catch (QuantityFormatException ex)
        {
            f.AddError("Unit", "'" + unit + "' is not a unit of flux density or current (" + ex.Message + ")", ex.ErrorId);
            return null;
        }

        if (scale.Kind == DriveKind.Unspecified)
        {
            f.AddError("Unit", "give the values' unit, such as 'T', 'mT' or 'kA'");
            return null;
        }

        string full = Path.IsPathRooted(path) ? path : Path.Combine(baseDirectory, path);
        return CaptureReader.Read(full, timeColumn, valueColumn, scale.Value, scale.Kind, unit);
    }

    private static DriveLevel? Level(RecordFields f, string name, bool required)
    {
        object? raw = f.Raw(name, required);
        if (raw is null)
        {
            return null;
        }

        try
        {
            return DriveLevel.Parse(raw);
        }
        catch (QuantityFormatException ex)
        {
            f.AddError(name, ex.Message, ex.ErrorId);
            return null;
        }
    }

    private static int? Count(RecordFields f)
    {
        double? n = f.Number("Repeat", required: false, "Count");
        if (n is null)
        {
            return null;
        }

        if (n.Value != Math.Floor(n.Value) || n.Value < 1 || n.Value > RepeatedWaveform.MaxCount)
        {
            f.AddError("Repeat", "must be a whole number of pulses from 1 to " + RepeatedWaveform.MaxCount + "; got " + n.Value);
            return null;
        }

        return (int)n.Value;
    }
}
