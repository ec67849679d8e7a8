namespace InductionHazard.Induction;

/// <summary>One point of a loop's electrical time series.</summary>
public sealed class CircuitSample
{
    /// <summary>Creates the sample.</summary>
    public CircuitSample(double timeSeconds, double emfVolts, double currentAmperes, double temperatureCelsius)
    {
        TimeSeconds = timeSeconds;
        EmfVolts = emfVolts;
        CurrentAmperes = currentAmperes;
        TemperatureCelsius = temperatureCelsius;
    }

    /// <summary>The time, s.</summary>
    public double TimeSeconds { get; }

    /// <summary>The emf around the loop, -dPhi/dt, V (positive drives current right-handed about the loop normal).</summary>
    public double EmfVolts { get; }

    /// <summary>The loop current, A (positive right-handed about the loop normal).</summary>
    public double CurrentAmperes { get; }

    /// <summary>The item's temperature, °C.</summary>
    public double TemperatureCelsius { get; }

    /// <summary>"at 1.2 ms: emf 3.4 V, current 56 A, 37.0 °C".</summary>
    public override string ToString() =>
        "at " + Quantities.SiFormat.Format(TimeSeconds, "s") + ": emf " + Quantities.SiFormat.Format(EmfVolts, "V") + ", current " + Quantities.SiFormat.Format(CurrentAmperes, "A") + ", " + Quantities.SiFormat.Celsius(TemperatureCelsius);
}
