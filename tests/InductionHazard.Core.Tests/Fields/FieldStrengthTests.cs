using System;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class FieldStrengthTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    [Validates("peak", "B", "= mu0 ip / (2 pi rho)")]
    [Fact]
    public void AFaultOnALineGivesItsFirstPeakOverTwoPiRho()
    {
        // B = mu0 ip / (2 pi rho) at the fault's first peak (Ampere's law, IEC 60909-0 ip).
        var fault = new FaultWaveform(40e3, 14, 50, 0.2);
        var source = new FieldSource("line", new[] { new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), fault) });
        FieldStrength s = FieldStrength.At(source, new Vector3D(0.25, 0, 0));
        Within.Relative(Mu0 * fault.PeakValue / (2 * Math.PI * 0.25), s.PeakFluxDensityTesla, 1e-4, "peak field");
        Within.Relative(fault.FirstPeakSeconds, s.PeakSeconds, 0.01, "when it peaks");
        Assert.Equal(50, s.FrequencyHertz);
    }

    [Validates("1/r^2 fall-off of a balanced set", "superposition", "5 %")]
    [Fact]
    public void AFlatThreePhaseSetsFieldCancelsFarAway()
    {
        // Three currents summing to zero: the far field falls as 1/r^2, not 1/r (a line current's).
        var sine = new SineWaveform(1000, 50, drive: DriveKind.Current);
        var values = new System.Collections.Generic.Dictionary<string, object?> { ["Form"] = "ThreePhase", ["Spacing"] = "100 mm" };
        FieldSource set = SourceRecordReader.Read(values, sine, ".");
        Assert.Equal(3, set.Terms.Count);
        double near = FieldStrength.At(set, new Vector3D(0, 1, 0)).PeakFluxDensityTesla;
        double far = FieldStrength.At(set, new Vector3D(0, 10, 0)).PeakFluxDensityTesla;
        double line = Mu0 * 1000 / (2 * Math.PI * 10);
        Assert.True(far < 0.05 * line, "far field of the set against one line's");
        Within.Relative(100, near / far, 0.05, "1/r^2 fall-off");
    }
}
