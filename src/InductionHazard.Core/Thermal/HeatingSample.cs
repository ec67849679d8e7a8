namespace InductionHazard.Thermal;

/// <summary>One point of a temperature history.</summary>
public sealed class HeatingSample
{
    /// <summary>Creates the sample.</summary>
    public HeatingSample(double timeSeconds, double temperatureCelsius, double powerWatts)
    {
        TimeSeconds = timeSeconds;
        TemperatureCelsius = temperatureCelsius;
        PowerWatts = powerWatts;
    }

    /// <summary>The time, s.</summary>
    public double TimeSeconds { get; }

    /// <summary>The item's temperature, °C.</summary>
    public double TemperatureCelsius { get; }

    /// <summary>The heating power dissipated in the item (averaged over a cycle for an alternating drive), W.</summary>
    public double PowerWatts { get; }

    /// <summary>"at 10 s: 37.0 °C, 1.2 W".</summary>
    public override string ToString() =>
        "at " + Quantities.SiFormat.Format(TimeSeconds, "s") + ": " + Quantities.SiFormat.Celsius(TemperatureCelsius) + ", " + Quantities.SiFormat.Format(PowerWatts, "W");
}
