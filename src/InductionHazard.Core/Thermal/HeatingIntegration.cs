namespace InductionHazard.Thermal;

/// <summary>How a run of <see cref="HeatingIntegrator"/> ended.</summary>
/// <param name="FinalCelsius">The temperature at the end of the run (or where it stopped), °C.</param>
/// <param name="EnergyJoules">The energy delivered by the heating power, J.</param>
/// <param name="StoppedAboveLimitSeconds">When the temperature passed the stop temperature (melting) and the run stopped there, s; null when it did not.</param>
/// <param name="BudgetExceeded">True when the step budget ran out, or time stopped advancing, before the end: the run is incomplete.</param>
/// <param name="Steps">The steps taken, rejected ones included.</param>
public sealed record HeatingIntegration(double FinalCelsius, double EnergyJoules, double? StoppedAboveLimitSeconds, bool BudgetExceeded, int Steps);
