using System;
using System.Linq;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.PowerShell.Commands;

/// <summary>New-FieldWaveform: the time course of a source's drive (ramp, sine, fault, discharge, decay, trapezoid, capture; optionally repeated).</summary>
[Cmdlet(VerbsCommon.New, "FieldWaveform", DefaultParameterSetName = RampSet)]
[OutputType(typeof(FieldWaveform))]
public sealed class NewFieldWaveformCommand : PSCmdlet
{
    private const string RampSet = "Ramp";
    private const string SineSet = "Sine";
    private const string SineRmsSet = "SineRms";
    private const string FaultSet = "Fault";
    private const string DischargeSet = "Discharge";
    private const string DecaySet = "Decay";
    private const string TrapezoidSet = "Trapezoid";
    private const string SamplesSet = "Samples";

    /// <summary>Makes a linear ramp from -From to -To over -Duration.</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    public SwitchParameter Ramp { get; set; }

    /// <summary>The drive before the ramp or decay: a flux density ('0 T') or a current ('0 A').</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    [Parameter(Mandatory = true, ParameterSetName = DecaySet)]
    [DriveLevel]
    public DriveLevel From { get; set; }

    /// <summary>The drive after the ramp, or the level a decay tends to (0 by default).</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    [Parameter(ParameterSetName = DecaySet)]
    [DriveLevel]
    public DriveLevel To { get; set; }

    /// <summary>Makes a steady sinusoid of -Amplitude (peak) or -RmsAmplitude at -Frequency.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineSet)]
    [Parameter(Mandatory = true, ParameterSetName = SineRmsSet)]
    public SwitchParameter Sine { get; set; }

    /// <summary>The peak value of a sinusoid or a trapezoid: a flux density ('5 mT') or a current ('2 kA').</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineSet)]
    [Parameter(Mandatory = true, ParameterSetName = TrapezoidSet)]
    [DriveLevel]
    public DriveLevel Amplitude { get; set; }

    /// <summary>The rms value of the sinusoid, as an alternative to -Amplitude.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineRmsSet)]
    [DriveLevel]
    public DriveLevel RmsAmplitude { get; set; }

    /// <summary>The frequency of a sinusoid or of the system that faults ('50 Hz', '12 kHz').</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineSet)]
    [Parameter(Mandatory = true, ParameterSetName = SineRmsSet)]
    [Parameter(Mandatory = true, ParameterSetName = FaultSet)]
    [Quantity(QuantityKind.Frequency)]
    public double Frequency { get; set; }

    /// <summary>The phase of the sinusoid at its start: a number in degrees, or an angle with its unit ('90 deg', '1.57 rad').</summary>
    [Parameter(ParameterSetName = SineSet)]
    [Parameter(ParameterSetName = SineRmsSet)]
    [Quantity(QuantityKind.Angle)]
    public double PhaseDegrees { get; set; }

    /// <summary>How long the ramp takes; for a sinusoid, how long the field runs (omit for a field that runs on).</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    [Parameter(ParameterSetName = SineSet)]
    [Parameter(ParameterSetName = SineRmsSet)]
    [Quantity(QuantityKind.Time)]
    public double? Duration { get; set; }

    /// <summary>Makes the asymmetric short-circuit current of IEC 60909-0.</summary>
    [Parameter(Mandatory = true, ParameterSetName = FaultSet)]
    public SwitchParameter Fault { get; set; }

    /// <summary>The initial symmetrical short-circuit current Ik'' (rms), for example '40 kA'.</summary>
    [Parameter(Mandatory = true, ParameterSetName = FaultSet)]
    [Quantity(QuantityKind.ElectricCurrent)]
    public double Current { get; set; }

    /// <summary>The ratio X/R of the source impedance at the fault (about 10 to 20 near large transformers).</summary>
    [Parameter(Mandatory = true, ParameterSetName = FaultSet)]
    public double XOverR { get; set; }

    /// <summary>When the protection opens after the fault ('200 ms'); the current stops at its next zero. 1 s by default.</summary>
    [Parameter(ParameterSetName = FaultSet)]
    [Quantity(QuantityKind.Time)]
    public double ClearingTime { get; set; } = FaultWaveform.DefaultClearingSeconds;

    /// <summary>The voltage's phase when the fault occurs, in degrees; by default the angle that gives the largest first peak.</summary>
    [Parameter(ParameterSetName = FaultSet)]
    [Quantity(QuantityKind.Angle)]
    public double ClosingAngleDegrees { get; set; }

    /// <summary>Makes the current of a capacitor bank discharged into a coil.</summary>
    [Parameter(Mandatory = true, ParameterSetName = DischargeSet)]
    public SwitchParameter Discharge { get; set; }

    /// <summary>The bank's capacitance ('2 mF').</summary>
    [Parameter(Mandatory = true, ParameterSetName = DischargeSet)]
    [Quantity(QuantityKind.Capacitance)]
    public double Capacitance { get; set; }

    /// <summary>The bank's charging voltage ('10 kV').</summary>
    [Parameter(Mandatory = true, ParameterSetName = DischargeSet)]
    [Quantity(QuantityKind.Voltage)]
    public double Voltage { get; set; }

    /// <summary>The circuit's inductance, coil and leads ('40 uH').</summary>
    [Parameter(Mandatory = true, ParameterSetName = DischargeSet)]
    [Quantity(QuantityKind.Inductance)]
    public double Inductance { get; set; }

    /// <summary>The circuit's resistance ('20 mohm').</summary>
    [Parameter(Mandatory = true, ParameterSetName = DischargeSet)]
    [Quantity(QuantityKind.Resistance)]
    public double Resistance { get; set; }

    /// <summary>Shorts the capacitor at the first current peak, so the current then decays with L/R instead of ringing.</summary>
    [Parameter(ParameterSetName = DischargeSet)]
    public SwitchParameter Crowbar { get; set; }

    /// <summary>Makes an exponential decay from -From toward -To with -TimeConstant: a quench or a fast discharge.</summary>
    [Parameter(Mandatory = true, ParameterSetName = DecaySet)]
    public SwitchParameter Decay { get; set; }

    /// <summary>The decay's time constant ('0.3 s').</summary>
    [Parameter(Mandatory = true, ParameterSetName = DecaySet)]
    [Quantity(QuantityKind.Time)]
    public double TimeConstant { get; set; }

    /// <summary>Makes a trapezoidal pulse from 0: up to -Amplitude over -RiseTime, flat for -FlatTime, down over -FallTime.</summary>
    [Parameter(Mandatory = true, ParameterSetName = TrapezoidSet)]
    public SwitchParameter Trapezoid { get; set; }

    /// <summary>The trapezoid's rise time.</summary>
    [Parameter(Mandatory = true, ParameterSetName = TrapezoidSet)]
    [Quantity(QuantityKind.Time)]
    public double RiseTime { get; set; }

    /// <summary>The trapezoid's flat top (0 by default: a triangle).</summary>
    [Parameter(ParameterSetName = TrapezoidSet)]
    [Quantity(QuantityKind.Time)]
    public double FlatTime { get; set; }

    /// <summary>The trapezoid's fall time.</summary>
    [Parameter(Mandatory = true, ParameterSetName = TrapezoidSet)]
    [Quantity(QuantityKind.Time)]
    public double FallTime { get; set; }

    /// <summary>A sampled capture (an oscilloscope or logger export): a delimited text file of times in seconds and values in -Unit.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SamplesSet)]
    public string Path { get; set; } = string.Empty;

    /// <summary>The capture's time column: a header name or a 1-based number; the first column by default.</summary>
    [Parameter(ParameterSetName = SamplesSet)]
    public string? TimeColumn { get; set; }

    /// <summary>The capture's value column: a header name or a 1-based number; the second column by default.</summary>
    [Parameter(ParameterSetName = SamplesSet)]
    public string? ValueColumn { get; set; }

    /// <summary>The unit of the capture's values: 'T', 'mT', 'G', 'A', 'kA'.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SamplesSet)]
    public string Unit { get; set; } = string.Empty;

    /// <summary>When the drive starts ('0 s' by default).</summary>
    [Parameter(ParameterSetName = RampSet)]
    [Parameter(ParameterSetName = SineSet)]
    [Parameter(ParameterSetName = SineRmsSet)]
    [Parameter(ParameterSetName = FaultSet)]
    [Parameter(ParameterSetName = DischargeSet)]
    [Parameter(ParameterSetName = DecaySet)]
    [Parameter(ParameterSetName = TrapezoidSet)]
    [Quantity(QuantityKind.Time)]
    public double Start { get; set; }

    /// <summary>Repeats the pulse this many times every -Period: a pulse train.</summary>
    [Parameter(ParameterSetName = RampSet)]
    [Parameter(ParameterSetName = FaultSet)]
    [Parameter(ParameterSetName = DischargeSet)]
    [Parameter(ParameterSetName = DecaySet)]
    [Parameter(ParameterSetName = TrapezoidSet)]
    [Parameter(ParameterSetName = SamplesSet)]
    [ValidateRange(1, RepeatedWaveform.MaxCount)]
    public int Repeat { get; set; }

    /// <summary>The time from one pulse's start to the next, with -Repeat.</summary>
    [Parameter(ParameterSetName = RampSet)]
    [Parameter(ParameterSetName = FaultSet)]
    [Parameter(ParameterSetName = DischargeSet)]
    [Parameter(ParameterSetName = DecaySet)]
    [Parameter(ParameterSetName = TrapezoidSet)]
    [Parameter(ParameterSetName = SamplesSet)]
    [Quantity(QuantityKind.Time)]
    public double Period { get; set; }

    /// <inheritdoc />
    protected override void EndProcessing()
    {
        try
        {
            var values = BoundValues.Of(MyInvocation, WaveformRecordReader.Forms.Append("SineRms").ToArray());
            values["Form"] = ParameterSetName == SineRmsSet ? SineSet : ParameterSetName;
            if (values.ContainsKey("Path"))
            {
                values["Path"] = SessionState.Path.GetUnresolvedProviderPathFromPSPath(Path);
            }

            if (values.ContainsKey("Repeat") != values.ContainsKey("Period"))
            {
                throw new InvalidInputException(values.ContainsKey("Repeat") ? "Period" : "Repeat", "-Repeat and -Period go together: give both for a pulse train");
            }

            WriteObject(WaveformRecordReader.Read(values, SessionState.Path.CurrentFileSystemLocation.Path, "New-FieldWaveform"));
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, null));
        }
    }
}
