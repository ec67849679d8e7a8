using System;
using System.Management.Automation;
using InductionHazard.Errors;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.PowerShell.Commands;

/// <summary>New-FieldWaveform: the time course of a source's drive (a ramp or a sinusoid).</summary>
[Cmdlet(VerbsCommon.New, "FieldWaveform", DefaultParameterSetName = RampSet)]
[OutputType(typeof(RampWaveform), ParameterSetName = new[] { RampSet })]
[OutputType(typeof(SineWaveform), ParameterSetName = new[] { SineSet, SineRmsSet })]
public sealed class NewFieldWaveformCommand : PSCmdlet
{
    private const string RampSet = "Ramp";
    private const string SineSet = "Sine";
    private const string SineRmsSet = "SineRms";

    /// <summary>Makes a linear ramp from -From to -To over -Duration.</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    public SwitchParameter Ramp { get; set; }

    /// <summary>The drive before the ramp: a flux density ('0 T') or a current ('0 A').</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    [DriveLevel]
    public DriveLevel From { get; set; }

    /// <summary>The drive after the ramp.</summary>
    [Parameter(Mandatory = true, ParameterSetName = RampSet)]
    [DriveLevel]
    public DriveLevel To { get; set; }

    /// <summary>Makes a steady sinusoid of -Amplitude (peak) or -RmsAmplitude at -Frequency.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineSet)]
    [Parameter(Mandatory = true, ParameterSetName = SineRmsSet)]
    public SwitchParameter Sine { get; set; }

    /// <summary>The peak value of the sinusoid: a flux density ('5 mT') or a current ('2 kA').</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineSet)]
    [DriveLevel]
    public DriveLevel Amplitude { get; set; }

    /// <summary>The rms value of the sinusoid, as an alternative to -Amplitude.</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineRmsSet)]
    [DriveLevel]
    public DriveLevel RmsAmplitude { get; set; }

    /// <summary>The frequency of the sinusoid ('50 Hz', '12 kHz').</summary>
    [Parameter(Mandatory = true, ParameterSetName = SineSet)]
    [Parameter(Mandatory = true, ParameterSetName = SineRmsSet)]
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

    /// <summary>When the ramp or the field starts ('0 s' by default).</summary>
    [Parameter]
    [Quantity(QuantityKind.Time)]
    public double Start { get; set; }

    /// <inheritdoc />
    protected override void EndProcessing()
    {
        try
        {
            WriteObject(Build());
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, null));
        }
    }

    private FieldWaveform Build()
    {
        if (ParameterSetName == RampSet)
        {
            DriveKind kind = DriveLevel.Common(From, To)
                ?? throw new InvalidInputException("To", "is " + To + " but -From is " + From + ": both must be flux densities or both currents");
            return new RampWaveform(From.Value, To.Value, Duration!.Value, Start, kind);
        }

        DriveLevel level = ParameterSetName == SineRmsSet ? RmsAmplitude : Amplitude;
        double peak = ParameterSetName == SineRmsSet ? level.Value * Math.Sqrt(2) : level.Value;
        return new SineWaveform(peak, Frequency, PhaseDegrees * Math.PI / 180, Duration, Start, level.Kind);
    }
}
