using System.Collections.Generic;
using System.Threading;
using InductionHazard.Thermal;
using Xunit;

namespace InductionHazard.Tests.Thermal;

public class AdiabaticHeatingTests
{
    // IEC 60364-5-54 Annex A / IEC 60949 material constants (Qc in J/(K m^3), beta in K, rho20 in ohm m).
    private const double CopperQc = 3.45e6, CopperBeta = 234.5, CopperRho = 1.7241e-8;
    private const double AluminiumQc = 2.5e6, AluminiumBeta = 228, AluminiumRho = 2.8264e-8;

    [Validates("k = 115, 143, 159, 138, 228", "IEC 60364-4-43 table 43A; IEC 60364-5-54 table A.54", "±1")]
    [Theory]
    [InlineData(70, 160, 115)]   // PVC-insulated copper, IEC 60364-4-43 table 43A
    [InlineData(90, 250, 143)]   // XLPE-insulated copper, IEC 60364-4-43 table 43A
    [InlineData(30, 200, 159)]   // bare copper, IEC 60364-5-54 table A.54
    [InlineData(30, 150, 138)]   // bare copper, IEC 60364-5-54 table A.54
    [InlineData(30, 500, 228)]   // bare copper, IEC 60364-5-54 table A.54
    public void TheCopperFactorMatchesTheTabulatedK(double initial, double final, double tabulated)
    {
        double k = AdiabaticHeating.KFactor(CopperQc, CopperBeta, CopperRho, initial, final) / 1e6;
        Within.Absolute(tabulated, k, 1.0, "k of copper " + initial + " -> " + final + " °C");
    }

    [Validates("k = 76, 94", "IEC 60364-4-43 table 43A", "±1")]
    [Theory]
    [InlineData(70, 160, 76)]    // PVC-insulated aluminium, IEC 60364-4-43 table 43A
    [InlineData(90, 250, 94)]    // XLPE-insulated aluminium, IEC 60364-4-43 table 43A
    public void TheAluminiumFactorMatchesTheTabulatedK(double initial, double final, double tabulated)
    {
        double k = AdiabaticHeating.KFactor(AluminiumQc, AluminiumBeta, AluminiumRho, initial, final) / 1e6;
        Within.Absolute(tabulated, k, 1.0, "k of aluminium " + initial + " -> " + final + " °C");
    }

    [Validates("lumped heating with rho(T) against I^2 t = k^2 S^2, 30 -> 200 °C", "IEC 60949 / IEC 60364-5-54 Annex A", "±0.05 K")]
    [Fact]
    public void TheLumpedModelWithRhoOfTReproducesTheAdiabaticLaw()
    {
        // A 10 mm^2 copper conductor carries 2 kA with no cooling; I^2 t = k^2 S^2 gives the time to go 30 -> 200 °C.
        // The lumped model heats with P = I^2 rho(T) l / S and rho(T) = rho20 (1 + alpha (T - 20)), alpha = 1/(beta + 20).
        const double Section = 10e-6, Length = 1.0, Current = 2000;
        double alpha = 1 / (CopperBeta + 20);
        double k = AdiabaticHeating.KFactor(CopperQc, CopperBeta, CopperRho, 30, 200);
        double seconds = k * k * Section * Section / (Current * Current);
        var model = new LumpedThermalModel(CopperQc * Section * Length, 1e-3, new ThermalEnvironment(20, 0, 0));
        double Power(double t, double celsius) => Current * Current * CopperRho * (1 + (alpha * (celsius - 20))) * Length / Section;
        double final = HeatingIntegrator.Run(model, Power, 0, seconds, 30, new List<HeatingSample>(), CancellationToken.None).FinalCelsius;
        Within.Absolute(200, final, 0.05, "final temperature by the lumped model");
        Within.Absolute(200, AdiabaticHeating.FinalCelsius(CopperQc, CopperBeta, CopperRho, 30, Current * Current * seconds, Section), 1e-9, "the law solved for Tf");
    }
}
