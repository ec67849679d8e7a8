using System;
using InductionHazard.Quantities;

namespace InductionHazard.Thermal;

/// <summary>
/// Lumped heating of a small metal item: m c dT/dt = P - h A (T - Ta) - eps sigma A (T^4 - Ta^4), the item at one
/// temperature throughout (valid for Biot number h Lc / k &lt; 0.1; see <see cref="BiotNumber"/>).
/// </summary>
public sealed class LumpedThermalModel
{
    /// <summary>The Biot number below which one temperature describes the item (common practice, e.g. Incropera and DeWitt).</summary>
    public const double LumpedBiotLimit = 0.1;

    /// <summary>Creates the model.</summary>
    /// <param name="heatCapacityJoulesPerKelvin">m c of the item.</param>
    /// <param name="surfaceSquareMeters">The surface that exchanges heat with the surroundings.</param>
    /// <param name="environment">The surroundings.</param>
    public LumpedThermalModel(double heatCapacityJoulesPerKelvin, double surfaceSquareMeters, ThermalEnvironment environment)
    {
        HeatCapacityJoulesPerKelvin = heatCapacityJoulesPerKelvin;
        SurfaceSquareMeters = surfaceSquareMeters;
        Environment = environment;
        _inverseHeatCapacity = 1 / heatCapacityJoulesPerKelvin;
    }

    /// <summary>1 / (m c), for the steps' multiplications in place of divisions.</summary>
    private readonly double _inverseHeatCapacity;

    /// <summary>m c, J/K.</summary>
    public double HeatCapacityJoulesPerKelvin { get; }

    /// <summary>The cooled surface A, m^2.</summary>
    public double SurfaceSquareMeters { get; }

    /// <summary>The surroundings.</summary>
    public ThermalEnvironment Environment { get; }

    /// <summary>
    /// The heat transfer coefficient at a temperature, convection plus radiation linearised about it:
    /// h + eps sigma (T^2 + Ta^2)(T + Ta), temperatures in kelvin, W/(m^2 K).
    /// </summary>
    public double TransferCoefficient(double celsius)
    {
        double t = Math.Max(celsius, -PhysicalConstants.ZeroCelsiusInKelvin + 1) + PhysicalConstants.ZeroCelsiusInKelvin;
        double ta = Environment.AmbientCelsius + PhysicalConstants.ZeroCelsiusInKelvin;
        return Environment.ConvectionWattsPerSquareMeterKelvin
            + (Environment.Emissivity * PhysicalConstants.StefanBoltzmann * ((t * t) + (ta * ta)) * (t + ta));
    }

    /// <summary>The cooling time constant m c / (h A) at a temperature, s (infinite without cooling).</summary>
    public double TimeConstantSeconds(double celsius) => TimeConstantFor(Conductance(celsius));

    /// <summary>The conductance to the surroundings G = h_total(T) A at a temperature, W/K.</summary>
    internal double Conductance(double celsius) => TransferCoefficient(celsius) * SurfaceSquareMeters;

    /// <summary>The cooling time constant m c / G for a conductance, s (infinite without cooling).</summary>
    internal double TimeConstantFor(double conductance) =>
        conductance > 0 ? HeatCapacityJoulesPerKelvin / conductance : double.PositiveInfinity;

    /// <summary>
    /// Advances the temperature over dt with a constant heating power: the exact solution of the linear
    /// equation m c dT/dt = P - G (T - Ta), G = h_total(T) A held at its value at the start of the step.
    /// Stable for any step.
    /// </summary>
    public double Advance(double celsius, double powerWatts, double dtSeconds) => Advance(celsius, powerWatts, dtSeconds, Conductance(celsius));

    /// <summary>The same, with the conductance at the starting temperature already known (<see cref="Conductance"/>).</summary>
    internal double Advance(double celsius, double powerWatts, double dtSeconds, double g) => new Step(this, dtSeconds, g).Advance(celsius, powerWatts);

    /// <summary>
    /// One step of <see cref="LumpedThermalModel.Advance(double, double, double)"/> from a temperature whose conductance is known, for
    /// several powers: an integrator's predictor and corrector share the step's decay 1 - e^(-G dt / m c), found once.
    /// </summary>
    internal readonly struct Step
    {
        private readonly double _ambient;
        private readonly double _g;
        private readonly double _gain;

        public Step(LumpedThermalModel model, double dtSeconds, double g)
        {
            _ambient = model.Environment.AmbientCelsius;
            _g = g;
            double rate = g * dtSeconds * model._inverseHeatCapacity;

            // T1 = T0 + net gain: gain = (1 - e^(-G dt / m c)) / G, or dt / (m c) where the decay is below rounding.
            _gain = rate < 1e-12 ? dtSeconds * model._inverseHeatCapacity : -Quantities.Exponential.Minus1(-rate) / g;
        }

        /// <summary>The temperature at the step's end with a constant power over it.</summary>
        public double Advance(double celsius, double powerWatts) => celsius + ((powerWatts - (_g * (celsius - _ambient))) * _gain);
    }

    /// <summary>
    /// The Biot number h Lc / k with Lc = volume / surface; the lumped model holds below 0.1.
    /// </summary>
    public static double BiotNumber(double transferCoefficient, double volumeCubicMeters, double surfaceSquareMeters, double thermalConductivity) =>
        transferCoefficient * (volumeCubicMeters / surfaceSquareMeters) / thermalConductivity;
}
