using System;
using System.Linq;
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

    [Validates("peak field of a three-phase set, flat and trefoil (sequence ABC, B lagging A by 120 degrees), at points between, beside and away from its conductors", "superposition of three lines' fields, mu0 i / (2 pi r) each (Ampere's law), the peak over a cycle as the major semi-axis of the field's ellipse (its 2 x 2 quadratic form's largest eigenvalue), its instant and vector, and omega times it for dB/dt", "1e-12")]
    [Theory]
    [InlineData("Flat")]
    [InlineData("Trefoil")]
    public void AThreePhaseSetsPeakFieldIsTheMajorAxisOfItsRotatingField(string arrangement)
    {
        // The conductors, along z, carry I sin(wt + phi_k) with phi = 0, -120 and +120 degrees: in a row at -s, 0 and +s
        // (flat), or at the corners of an equilateral triangle of side s about the centre (trefoil). At a point,
        // B(t) = P sin wt + Q cos wt with P and Q the sums of each line's field times cos phi_k and sin phi_k; |B|^2
        // peaks at the largest eigenvalue of [[P.P, P.Q], [P.Q, Q.Q]].
        double amplitude = 1000, spacing = 0.1;
        var sine = new SineWaveform(amplitude, 50, drive: DriveKind.Current);
        var values = new System.Collections.Generic.Dictionary<string, object?> { ["Form"] = "ThreePhase", ["Spacing"] = "100 mm", ["Arrangement"] = arrangement };
        FieldSource set = SourceRecordReader.Read(values, sine, ".");
        Vector3D[] at = set.Terms.Select(t => ((LineConductor)t.Geometry).Axis.Centre).ToArray();
        Assert.Equal(3, at.Length);
        Within.Absolute(0, (at[0] + at[1] + at[2]).Length / 3, 1e-15, "the set's centre");
        if (arrangement == "Flat")
        {
            Within.Absolute(0, at[1].Length, 1e-15, "the middle conductor on the centre");
            Within.Relative(2 * spacing, (at[2] - at[0]).Length, 1e-12, "the row's length");
        }
        else
        {
            Within.Relative(spacing, (at[1] - at[0]).Length, 1e-12, "side AB");
            Within.Relative(spacing, (at[2] - at[1]).Length, 1e-12, "side BC");
            Within.Relative(spacing, (at[0] - at[2]).Length, 1e-12, "side CA");
        }

        Vector3D z = Vector3D.UnitZ, u = (at[2] - at[0]).Normalized(), v = z.Cross(u);
        double[] phases = { 0, -2 * Math.PI / 3, 2 * Math.PI / 3 };
        (double x, double y)[] points = { (0.05, 0), (0, 0.05), (0.05, 0.05), (0.2, 0.1), (-0.15, -0.3), (1, 1) };
        foreach ((double x, double y) in points)
        {
            Vector3D point = (x * u) + (y * v);
            Vector3D p = Vector3D.Zero, q = Vector3D.Zero;
            for (int k = 0; k < 3; k++)
            {
                Vector3D r = point - at[k];
                Vector3D perUnit = Mu0 / (2 * Math.PI * r.Dot(r)) * z.Cross(r);
                p += amplitude * Math.Cos(phases[k]) * perUnit;
                q += amplitude * Math.Sin(phases[k]) * perUnit;
            }

            double a = p.Dot(p), c = q.Dot(q), b = p.Dot(q);
            double peak = Math.Sqrt(((a + c) / 2) + Math.Sqrt((((a - c) / 2) * ((a - c) / 2)) + (b * b)));
            FieldStrength found = FieldStrength.At(set, point);
            Within.Relative(peak, found.PeakFluxDensityTesla, 1e-12, arrangement + ": peak |B| at (" + x + ", " + y + ")");
            Within.Relative(2 * Math.PI * 50 * peak, found.PeakRateTeslaPerSecond, 1e-12, arrangement + ": peak |dB/dt| at (" + x + ", " + y + "), omega times the peak");

            // The field it reports, and the field the three lines give at the instant it names, are the peak's.
            Within.Relative(peak, found.FieldAtPeak.Length, 1e-12, "the field vector at the peak");
            double wt = 2 * Math.PI * 50 * found.PeakSeconds;
            Vector3D then = (Math.Sin(wt) * p) + (Math.Cos(wt) * q);
            Within.Absolute(0, (then - found.FieldAtPeak).Length, 1e-9 * peak, "the field at the instant named");
            Assert.InRange(found.PeakSeconds, 0, 0.01);
        }
    }

    [Validates("a tenth-of-a-period burst of a line's 50 Hz current: its largest field sin(pi/5) of the full one, at the burst's end", "mu0 I sin(omega t) / (2 pi r) (Ampere's law) over the burst", "1e-9")]
    [Fact]
    public void ABurstShorterThanAPeriodIsSearchedInTime()
    {
        // A burst of a sine from phase 0 lasting a tenth of a period reaches only sin(pi/5) of its amplitude, at its end:
        // the search in time finds that, where the ellipse's peak (the amplitude) would overstate it.
        var line = new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ));
        var burst = new FieldSource("burst", new[] { new SourceTerm(line, new SineWaveform(1000, 50, durationSeconds: 0.002, drive: DriveKind.Current)) });
        double full = Mu0 * 1000 / (2 * Math.PI * 0.1);
        FieldStrength s = FieldStrength.At(burst, new Vector3D(0.1, 0, 0));
        Within.Relative(full * Math.Sin(Math.PI / 5), s.PeakFluxDensityTesla, 1e-9, "the burst's largest field, at its end");
        Within.Relative(0.002, s.PeakSeconds, 1e-9, "at the burst's end");
    }
}
