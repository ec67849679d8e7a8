using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>A named characteristic time of a waveform (rise time, period, time constant).</summary>
public sealed class TimeScale
{
    /// <summary>Creates the time scale.</summary>
    public TimeScale(string name, double seconds)
    {
        Name = name;
        Seconds = seconds;
    }

    /// <summary>What the time is ("rise time", "period").</summary>
    public string Name { get; }

    /// <summary>The time in seconds.</summary>
    public double Seconds { get; }

    /// <summary>"period 20 ms".</summary>
    public override string ToString() => Name + " " + SiFormat.Format(Seconds, "s");
}
