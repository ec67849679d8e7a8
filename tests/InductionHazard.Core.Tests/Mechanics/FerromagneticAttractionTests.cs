using System;
using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Mechanics;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Mechanics;

public class FerromagneticAttractionTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    private static ConductiveItem SteelSphere(double diameter, string contact = "Free") =>
        ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ball", ["Shape"] = "Sphere", ["Material"] = "Steel", ["Diameter"] = diameter, ["Contact"] = contact }, MaterialLibrary.BuiltIn);

    [Validates("magnetisation of a sphere below saturation, M = 3 (mu_r - 1)/(mu_r + 2) H", "Jackson, Classical Electrodynamics, section 5.11 (magnetised sphere in a uniform field)", "1e-12")]
    [Fact]
    public void ASphereBelowSaturationTakesTheClassicalMagnetisation()
    {
        foreach (double mur in new[] { 2.0, 10, 1000 })
        {
            double b = 1e-4;
            Within.Relative(3 * (mur - 1) / (mur + 2) * b, FerromagneticAttraction.Magnetisation(b, mur, 1.0 / 3, 2.1), 1e-12, "mu0 M at mu_r = " + mur);
        }

        Assert.Equal(2.1, FerromagneticAttraction.Magnetisation(3, 1000, 1.0 / 3, 2.1));
    }

    [Validates("demagnetising factors of spheroids: sphere 1/3, N_axial + 2 N_transverse = 1, prolate aspect 2: 0.1736, long rod (ln 2m - 1)/m^2", "Osborn, Phys. Rev. 67:351 (1945) (from memory: the aspect-2 value and the long-rod limit)", "1e-3")]
    [Fact]
    public void TheSpheroidFactorsMatchOsborn()
    {
        Within.Relative(1.0 / 3, Demagnetisation.SpheroidAxial(1.0 + 1e-9), 1e-6, "sphere");
        Within.Relative(1.0 / 3, Demagnetisation.SpheroidAxial(1.01), 1e-2, "near-sphere, prolate side");
        Within.Relative(1.0 / 3, Demagnetisation.SpheroidAxial(0.99), 1e-2, "near-sphere, oblate side");
        Within.Relative(0.1736, Demagnetisation.SpheroidAxial(2), 1e-3, "prolate, aspect 2");
        double m = 1000;
        Within.Relative((Math.Log(2 * m) - 1) / (m * m), Demagnetisation.SpheroidAxial(m), 1e-3, "long rod");
        Assert.True(Demagnetisation.SpheroidAxial(0.01) > 0.98, "a thin disc along its axis is nearly 1");
    }

    [Validates("pull on a saturated steel ball on a coil's axis, F = V (Bs/mu0) dB/dz", "on-axis field of a coil, B = mu0 N I a^2 / (2 (a^2 + z^2)^1.5), differentiated in closed form", "1e-4")]
    [Fact]
    public void ASaturatedBallOnACoilsAxisIsPulledByItsMomentTimesTheGradient()
    {
        double a = 0.05, turns = 100, current = 2000, z = 0.04, diameter = 0.01;
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), a, turns), new RampWaveform(0, current, 1, drive: DriveKind.Current)) });
        ConductiveItem ball = SteelSphere(diameter);
        FerromagneticAttraction pull = FerromagneticAttraction.At(coil, new Vector3D(0, 0, z), ball);
        double b = Mu0 * turns * current * a * a / (2 * Math.Pow((a * a) + (z * z), 1.5));
        double gradient = 3 * Mu0 * turns * current * a * a * z / (2 * Math.Pow((a * a) + (z * z), 2.5));
        Assert.True(3 * b > 2.1, "saturated (a sphere magnetises to 3 B below saturation): B = " + b);
        Within.Relative(b, pull.FieldTesla, 1e-9, "|B| on the axis");
        double volume = Math.PI * Math.Pow(diameter, 3) / 6;
        Within.Relative(volume * 2.1 / Mu0 * gradient, pull.ForceNewtons, 1e-4, "pull");
        Assert.True(pull.ForceDirection.Z < -0.999, "toward the coil, where the field is stronger");
        Assert.Equal(0, pull.TorqueNewtonMeters);

        InductionAssessment assessed = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(ball, coil, new Placement(new Vector3D(0, 0, z), null))), HazardPolicy.Default);
        Assert.Equal(Verdict.Hazard, assessed.Verdict);
        Assert.Equal(HazardMechanism.Attraction, assessed.GoverningMechanism);
        Within.Relative(ball.MassKilograms * 9.80665 / pull.ForceNewtons, assessed.AttractionMargin!.Value, 1e-9, "margin = weight / pull");
    }
}
