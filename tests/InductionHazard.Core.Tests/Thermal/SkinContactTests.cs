using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Thermal;

/// <summary>Heat from a worn ring into the perfused skin under it (Pennes' bioheat equation).</summary>
public class SkinContactTests
{
    [Validates("Steady heat flux into perfused tissue: sqrt(k w rho c) dT", "Pennes, J Appl Physiol 1:93 (1948), one-dimensional steady solution; finite differences", "1e-3")]
    [Fact]
    public void TheContactConductanceIsTheFluxOfPennesEquationInOneDimension()
    {
        // k T'' = w rho c (T - Ts), T(0) = Ts + 1, T(deep) = Ts, solved by finite differences (Thomas algorithm) to
        // twenty penetration depths; the surface flux k T'(0) is the conductance per kelvin.
        double k = SkinContact.ConductivityWattsPerMeterKelvin, m2 = SkinContact.PerfusionPerSecond * SkinContact.BloodHeatCapacityJoulesPerCubicMeterKelvin / k;
        int n = 200_000;
        double depth = 20 / Math.Sqrt(m2), h = depth / n;
        var a = new double[n + 1];
        var b = new double[n + 1];
        var c = new double[n + 1];
        var d = new double[n + 1];
        b[0] = 1; d[0] = 1; b[n] = 1; d[n] = 0;
        for (int i = 1; i < n; i++)
        {
            a[i] = 1; b[i] = -(2 + (m2 * h * h)); c[i] = 1; d[i] = 0;
        }

        for (int i = 1; i <= n; i++)
        {
            double w = a[i] / b[i - 1];
            b[i] -= w * c[i - 1];
            d[i] -= w * d[i - 1];
        }

        var t = new double[n + 1];
        t[n] = d[n] / b[n];
        for (int i = n - 1; i >= 0; i--)
        {
            t[i] = (d[i] - (c[i] * t[i + 1])) / b[i];
        }

        // Second-order one-sided difference at the surface.
        double flux = k * ((3 * t[0]) - (4 * t[1]) + t[2]) / (2 * h);
        Within.Relative(flux, SkinContact.ConductancePerArea, 1e-3, "skin contact conductance per area and kelvin");
        Assert.InRange(SkinContact.ConductancePerArea, 10, 16);
    }

    [Fact]
    public void AWornRingsSteadyRiseIsItsPowerOverAirAndSkinTogether()
    {
        // A copper ring of constant resistivity, no radiation, worn in a 20 degC room (so it starts at and cools to the
        // skin's 33 degC): its steady rise is P / ((h + hs f) A), with P = e^2 R / (R^2 + (w L)^2) (thin ring, Maxwell's L).
        MaterialLibrary materials = Fixtures.WithSteadyCopper;
        ConductiveItem Ring(string contact) => ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "steady copper", ["Diameter"] = 0.02, ["WireDiameter"] = 0.002, ["Contact"] = contact }, materials);
        double a = 0.01, r = 0.001, omega = 2 * Math.PI * 50, tesla = 0.02;
        double resistance = 1.72e-8 * 2 * Math.PI * a / (Math.PI * r * r), inductance = PhysicalConstants.VacuumPermeability * a * (Math.Log(8 * a / r) - 1.75);
        double emf = omega * tesla * Math.PI * a * a / Math.Sqrt(2);
        double power = emf * emf * resistance / ((resistance * resistance) + (omega * omega * inductance * inductance));
        double surface = Math.PI * 2 * r * 2 * Math.PI * a, h = 5;
        var room = new ThermalEnvironment(20, h, 0);
        FieldSource mains = FieldSource.Uniform("mains", new SineWaveform(tesla, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        InductionResponse worn = InductionEngine.Respond(new Scenario(Ring("Skin"), mains, new Placement(Vector3D.Zero), 8 * 3600, room));
        Within.Relative(power / ((h + SkinContact.SurfaceAveragedCoefficient) * surface), worn.PeakTemperatureCelsius - SkinContact.SurfaceCelsius, 2e-3, "worn ring's steady rise");
        Assert.Contains(worn.ModelNotes, n => n.Contains("heat flows into the skin", StringComparison.Ordinal));

        // Held in the hand, or in a room warmer than skin, the skin is not counted as a sink (the safe side).
        InductionResponse held = InductionEngine.Respond(new Scenario(Ring("Held"), mains, new Placement(Vector3D.Zero), 8 * 3600, room));
        Within.Relative(power / (h * surface), held.PeakTemperatureCelsius - SkinContact.SurfaceCelsius, 2e-3, "held ring's steady rise");
        Assert.DoesNotContain(held.ModelNotes, n => n.Contains("heat flows into the skin", StringComparison.Ordinal));
    }
}
