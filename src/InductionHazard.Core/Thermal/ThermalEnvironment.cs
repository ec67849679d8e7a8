using InductionHazard.Errors;

namespace InductionHazard.Thermal;

/// <summary>How an item exchanges heat with its surroundings: ambient temperature, convection and radiation.</summary>
public sealed class ThermalEnvironment
{
    /// <summary>
    /// Natural convection coefficient in still air, W/(m^2 K): 5, at the low end of the textbook range for free
    /// convection in gases (2-25 W/(m^2 K); Incropera and DeWitt, Fundamentals of Heat and Mass Transfer, table
    /// 1.1, from memory). Low cooling overstates the temperature, which is the safe side here.
    /// </summary>
    public const double StillAirConvection = 5.0;

    /// <summary>Emissivity of bright metal, 0.05 (polished metals 0.02-0.1; from memory). Low emissivity overstates the temperature.</summary>
    public const double BrightMetalEmissivity = 0.05;

    /// <summary>Creates an environment.</summary>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public ThermalEnvironment(double ambientCelsius = 20.0, double convectionWattsPerSquareMeterKelvin = StillAirConvection, double emissivity = BrightMetalEmissivity)
    {
        Quantities.PhysicalRanges.Ambient.Check(ambientCelsius);

        Require.NonNegative("ConvectionCoefficient", convectionWattsPerSquareMeterKelvin);
        if (!(emissivity >= 0 && emissivity <= 1))
        {
            throw new InvalidInputException("Emissivity", "must be between 0 and 1; got " + emissivity);
        }

        AmbientCelsius = ambientCelsius;
        ConvectionWattsPerSquareMeterKelvin = convectionWattsPerSquareMeterKelvin;
        Emissivity = emissivity;
    }

    /// <summary>Still air at 20 °C around bright metal.</summary>
    public static ThermalEnvironment StillAir { get; } = new();

    /// <summary>The air (and surroundings) temperature, °C.</summary>
    public double AmbientCelsius { get; }

    /// <summary>The convection coefficient h, W/(m^2 K).</summary>
    public double ConvectionWattsPerSquareMeterKelvin { get; }

    /// <summary>The surface emissivity for radiation to surroundings at ambient temperature.</summary>
    public double Emissivity { get; }

    /// <summary>"air at 20.0 °C, convection 5 W/(m² K), emissivity 0.05".</summary>
    public override string ToString() =>
        "air at " + Quantities.SiFormat.Celsius(AmbientCelsius) + ", convection " + Quantities.SiFormat.Plain(ConvectionWattsPerSquareMeterKelvin) + " W/(m² K), emissivity " + Quantities.SiFormat.Plain(Emissivity);
}
