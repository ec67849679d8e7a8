using System.IO;
using InductionHazard.Errors;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Waveforms;

public class PiecewiseLinearWaveformTests
{
    [Fact]
    public void ATrapezoidRisesHoldsAndFalls()
    {
        var t = PiecewiseLinearWaveform.Trapezoid(2, 0.1, 0.2, 0.4, 1, DriveKind.FluxDensity);
        Assert.Equal(0, t.Value(0.5));
        Within.Relative(1, t.Value(1.05), 1e-12, "half way up");
        Within.Relative(2, t.Value(1.2), 1e-12, "on the flat top");
        Within.Relative(1, t.Value(1.5), 1e-12, "half way down");
        Within.Relative(20, t.Rate(1.05), 1e-12, "rate of the rise");
        Within.Relative(-5, t.Rate(1.5), 1e-12, "rate of the fall");
        double[] corners = { 1.0, 1.1, 1.3, 1.7 };
        Assert.Equal(corners.Length, t.Breakpoints.Count);
        for (int k = 0; k < corners.Length; k++)
        {
            Within.Relative(corners[k], t.Breakpoints[k], 1e-14, "corner " + k);
        }
        Within.Relative(20, t.PeakRate, 1e-12, "peak rate");
    }

    [Fact]
    public void ACaptureReadsTimesAndValuesAfterItsHeader()
    {
        string path = Path.GetTempFileName();
        File.WriteAllText(path, "Scope export, channel 2\nTime (s),Field (mT)\n0,0\n0.001,5\n0.002,0\n");
        PiecewiseLinearWaveform w = CaptureReader.Read(path, null, null, 1e-3, DriveKind.FluxDensity, "mT");
        Assert.Equal(3, w.SampleCount);
        Within.Relative(0.0025, w.Value(0.0005), 1e-12, "interpolated value");
        Within.Relative(5, w.Rate(0.0005), 1e-12, "rate of the first piece");
        File.Delete(path);
    }

    [Theory]
    [InlineData("t,v\n0,0\n0.001,1\n0.001,2\n", 4, "strictly increasing")]
    [InlineData("t,v\n0,0\n0.001,abc\n", 3, "not a finite number")]
    [InlineData("0;0\n0.001;1\n0.002;NaN\n", 3, "not a finite number")]
    public void ABadCaptureLineIsNamed(string text, int line, string reason)
    {
        string path = Path.GetTempFileName();
        File.WriteAllText(path, text);
        var ex = Assert.Throws<DataFileException>(() => CaptureReader.Read(path, null, null, 1, DriveKind.FluxDensity, "T"));
        Assert.Equal(line, ex.Line);
        Assert.Contains(reason, ex.Reason, System.StringComparison.Ordinal);
        File.Delete(path);
    }

    [Fact]
    public void ARepeatedPulseCarriesItsShapeToEveryPeriod()
    {
        var pulse = PiecewiseLinearWaveform.Trapezoid(1, 0.01, 0, 0.01, 0, DriveKind.Current);
        var train = new RepeatedWaveform(pulse, 3, 1.0);
        Within.Relative(pulse.Value(0.005), train.Value(2.005), 1e-12, "third pulse");
        Assert.Equal(0, train.Value(3.5));
        Assert.Equal(9, train.Breakpoints.Count);
        Assert.Equal(pulse.PeakValue, train.PeakValue);
        Assert.Throws<InvalidInputException>(() => new RepeatedWaveform(new RampWaveform(0, 1, 0.1, drive: DriveKind.Current), 3, 1.0));
    }
}
