using System;
using System.Collections.Generic;
using InductionHazard.Assessment;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Tests.Fields;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>
/// Forces on induced currents, F = sum_i i_i sum_j d_j grad M_ij (the gradient of each path's coupling, by
/// differences of the flux), against the direct integral of i dl x B around the loop with the Biot-Savart field of
/// the coil summed over 200,000 straight pieces (no elliptic integrals, no flux).
/// </summary>
public class ForceTests
{
    private const double CoilRadius = 0.05, Turns = 10, Height = 0.03;

    private static FieldSource Coil(FieldWaveform waveform) =>
        new("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), CoilRadius, Turns), waveform) });

    private static ConductiveItem Ring(double diameter, double wire, string contact = "Free") =>
        ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "ring", ["Material"] = "Copper", ["Diameter"] = diameter, ["WireDiameter"] = wire, ["Contact"] = contact }, MaterialLibrary.BuiltIn);

    [Validates("gradient of a ring's flux along the coil's axis, dM/dz = -2 pi r B_r per ampere", "Biot-Savart law summed over the coil (independent of the flux integrals), F = i dl x B", "1e-4")]
    [Fact]
    public void TheCouplingGradientIsTheRadialFieldAroundTheRing()
    {
        // For a coaxial ring of radius r at height z, the force on current i is F_z = i * integral (dl x B)_z = -2 pi r i B_r,
        // so the gradient of its flux per ampere of coil current must be -2 pi r B_r (field per ampere).
        ConductiveItem ring = Ring(0.02, 0.001);
        ItemPaths paths = ItemPaths.For(ring, 1, 20, thinLoop: true);
        FieldSource coil = Coil(new RampWaveform(0, 1, 1, drive: DriveKind.Current));
        var centre = new Vector3D(0, 0, Height);
        Vector3D gradient = paths.CouplingGradient(coil, centre, Vector3D.UnitZ)[0, 0];
        Vector3D b = Turns * BiotSavart.Circle(CoilRadius, 0, new Vector3D(0.01, 0, Height));
        Within.Relative(-2 * Math.PI * 0.01 * b.X, gradient.Z, 1e-4, "dM/dz against -2 pi r B_r");
        Assert.True(Math.Abs(gradient.X) < 1e-9 * Math.Abs(gradient.Z) && Math.Abs(gradient.Y) < 1e-9 * Math.Abs(gradient.Z), "no sideways force on a coaxial ring");
    }

    [Validates("gradient of a tilted ring's flux beside a coil's winding and far from it, the line integral of dl x b", "Biot-Savart law summed over the coil, integrated around the ring at 400 points (independent of the module's nested rules)", "1e-9")]
    [Theory]
    [InlineData(0.045, 0.006)]  // the ring passes within a few mm of the winding: 24 points fall 5e-3 short
    [InlineData(0.05, 0.008)]   // 24 points fall 4e-6 short
    [InlineData(0.055, 0.005)]  // 24 points fall 2e-5 short
    [InlineData(0.0, 0.2)]      // far above the coil: the field barely varies around the ring
    public void TheCouplingGradientOfARingOffTheAxisIsTheLineIntegralOfDlCrossB(double x, double z)
    {
        // Off the coil's axis no closed form applies: the line integral around the ring is taken on nested sets of its
        // points, stopping where two agree. Against the Biot-Savart field integrated at 400 points around the ring. With
        // the sets' agreement not asked (24 points always), the three cases near the winding fail.
        ConductiveItem ring = Ring(0.02, 0.001);
        ItemPaths paths = ItemPaths.For(ring, 1, 20, thinLoop: true);
        FieldSource coil = Coil(new RampWaveform(0, 1, 1, drive: DriveKind.Current));
        var centre = new Vector3D(x, 0, z);
        Vector3D normal = new Vector3D(1, 0.5, 2).Normalized();
        Vector3D gradient = paths.CouplingGradient(coil, centre, normal)[0, 0];

        (Vector3D u, Vector3D v) = DiscQuadrature.Basis(normal);
        const int points = 400;
        double r = 0.01, step = 2 * Math.PI / points;
        Vector3D expected = Vector3D.Zero;
        for (int k = 0; k < points; k++)
        {
            double phi = (k + 0.5) * step;
            Vector3D at = centre + (r * Math.Cos(phi) * u) + (r * Math.Sin(phi) * v);
            Vector3D dl = (r * step) * ((-Math.Sin(phi) * u) + (Math.Cos(phi) * v));
            expected += dl.Cross(Turns * BiotSavart.Circle(CoilRadius, 0, at, 50_000));
        }

        Assert.True((gradient - expected).Length <= 1e-9 * expected.Length, "dM against the line integral of dl x B: off by " + ((gradient - expected).Length / expected.Length));
    }

    [Validates("force on a closed ring above a coil whose current rises: pushed away, F = 2 pi r i B_r", "Lenz's law; F = i dl x B with the Biot-Savart field", "1e-3")]
    [Fact]
    public void AClosedRingAboveACoilWhoseCurrentRisesIsPushedAway()
    {
        // A slow ramp (1 s against the ring's L/R of about 30 us): the current is steady at the end, where the coil
        // current and so the force are largest.
        ConductiveItem ring = Ring(0.02, 0.001, contact: "Fixed");
        double peakCoil = 2000;
        FieldSource coil = Coil(new RampWaveform(0, peakCoil, 1, drive: DriveKind.Current));
        InductionResponse r = InductionEngine.Respond(new Scenario(ring, coil, new Placement(new Vector3D(0, 0, Height), Vector3D.UnitZ)));
        Assert.True(r.IsValid, string.Join("; ", r.ValidityIssues));
        Assert.True(r.PeakForceDirection.Z > 0.999, "pushed away from the coil, along +z: " + r.PeakForceDirection);
        Vector3D b = peakCoil * Turns * BiotSavart.Circle(CoilRadius, 0, new Vector3D(0.01, 0, Height));
        Within.Relative(2 * Math.PI * 0.01 * r.PeakCurrentAmperes * b.X, r.PeakForceNewtons, 1e-3, "F = 2 pi r i B_r at the end of the ramp");
        Within.Relative(r.PeakForceNewtons / (r.MassKilograms * 9.80665), r.ForceToWeightRatio, 1e-12, "force over weight");
    }

    [Validates("impulse on a ring above a coil whose current decays exponentially, J = |dM/dz| I0^2 (M a / L) / (b - a) (1/(2a) - 1/(a + b)), a = 1/tau, b = R/L", "closed form of an RL loop driven by an exponential decay (i = (M I0 a / L) (e^-at - e^-bt) / (b - a)); dM/dz = -2 pi r B_r with the Biot-Savart field", "1e-5")]
    [Theory]
    [InlineData(1e-3)]    // steps of 20 us, shorter than the ring's L/R
    [InlineData(0.1)]     // steps of 2 ms, seventy times the ring's L/R: its current follows the drive within each
    public void TheImpulseOnARingAboveADecayingCoilMatchesItsClosedForm(double tau)
    {
        // A fixed ring 30 mm above the coil, whose current decays from 100 A (the ring's own L/R some 30 us): F_z =
        // i_ring i_coil dM/dz, integrated over the decay. The current is small enough that the ring warms by well under a
        // millikelvin, so its resistance stays that of the start to about 1e-6. Steps of a fiftieth of the decay's time
        // constant. With the short steps the trapezoid rule on the steps' ends falls 6e-4 short of the integral, and the
        // cubic through the force and its rate at both ends is within 1e-6. With the long ones the trapezoid is 9e-5
        // over, the cubic 4e-5 under (its rate at the ends a small difference over a small L/R), and the exact integral
        // of the step's own solution within 4e-6.
        ConductiveItem ring = Ring(0.02, 0.001, contact: "Fixed");
        double i0 = 100, r = 0.01;
        FieldSource coil = Coil(new DecayWaveform(i0, tau, drive: DriveKind.Current));
        InductionResponse response = InductionEngine.Respond(new Scenario(ring, coil, new Placement(new Vector3D(0, 0, Height), Vector3D.UnitZ)));
        Assert.True(response.IsValid, string.Join("; ", response.ValidityIssues));
        Assert.True(response.TemperatureRiseKelvin < 1e-3, "the ring barely warms: " + response.TemperatureRiseKelvin + " K");

        double m = Turns * CircularCoil.CoaxialMutualInductance(CoilRadius, r, Height);
        double gradient = -2 * Math.PI * r * Turns * BiotSavart.Circle(CoilRadius, 0, new Vector3D(r, 0, Height)).X;
        double l = response.InductanceHenries, a = 1 / tau, b = response.ResistanceOhms / l;
        double expected = Math.Abs(gradient) * i0 * i0 * (m * a / l) / (b - a) * ((1 / (2 * a)) - (1 / (a + b)));
        Within.Relative(expected, response.ImpulseNewtonSeconds!.Value, 1e-5, "the impulse of the force over the decay");
    }

    [Fact]
    public void AUniformFieldExertsNoNetForce()
    {
        InductionResponse r = Fixtures.Respond(Fixtures.Ring(), Fixtures.UniformRamp(0, 3, 0.01));
        Assert.True(r.PeakCurrentAmperes > 1, "a current flows");
        Assert.Equal(0, r.PeakForceNewtons);
    }

    [Validates("filament disc above a coil: force against the sum of F = i dl x B over its filaments", "Biot-Savart law on each filament, with the filament currents the solver found", "1e-3")]
    [Fact]
    public void AFilamentDiscFeelsTheSumOfItsFilamentsForces()
    {
        // A copper disc 30 mm across and 2 mm thick, 30 mm above the coil, in a sinusoidal coil current at 50 Hz: the
        // mean force of the steady state against the sum over filaments of the cycle-averaged -2 pi r_i Re(I_i B_r,i*)/2.
        ConductiveItem disc = FilamentModelTests.Body("Disc", "Copper", 0.03, thickness: 0.002);
        double f = 50, omega = 2 * Math.PI * f, amplitude = 1000;
        ItemPaths paths = ItemPaths.For(disc, f, 20, thinLoop: false);
        FieldSource coil = Coil(new SineWaveform(amplitude, f, drive: DriveKind.Current));
        var centre = new Vector3D(0, 0, Height);
        double[,] m = paths.Coupling(coil, centre, Vector3D.UnitZ);
        ModalCircuit circuit = paths.Modes!.Drive(m, paths.CouplingGradient(coil, centre, Vector3D.UnitZ), paths.PathAreas());
        // d(t) = A sin(w t) = Im(D e^(j w t)) with D = A.
        var drive = System.Numerics.Complex.FromPolarCoordinates(amplitude, 0);
        var z = new System.Numerics.Complex[circuit.Count];
        for (int k = 0; k < z.Length; k++)
        {
            z[k] = circuit.Coupling[k, 0] * (-System.Numerics.Complex.ImaginaryOne * omega * drive) / new System.Numerics.Complex(1, omega * circuit.Lambdas[k]);
        }

        SteadyMechanics mechanics = SteadyMechanics.Of(circuit, z, new[] { drive }, null);

        IReadOnlyList<Filament> cells = paths.Paths!.Filaments!;
        double expected = 0;
        for (int i = 0; i < cells.Count; i++)
        {
            var current = System.Numerics.Complex.Zero;
            for (int k = 0; k < z.Length; k++)
            {
                current += circuit.PathWeights![i, k] * z[k];
            }

            // A cell of uniform current density feels -2 pi r B_r averaged over its section (its Gauss points).
            double perAmpere = 0;
            foreach ((double r, double zz, double weight) in cells[i].GaussSamples())
            {
                perAmpere += weight * -2 * Math.PI * r * Turns * BiotSavart.Circle(CoilRadius, 0, new Vector3D(r, 0, Height + zz), 20_000).X;
            }

            // Mean of Im(I e^(jwt)) Im(A e^(jwt)) is Re(I conj(A)) / 2.
            expected += perAmpere * (current * System.Numerics.Complex.Conjugate(drive)).Real / 2;
        }

        Within.Relative(expected, mechanics.MeanForce.Z, 1e-3, "mean force on the disc");
        Assert.True(mechanics.MeanForce.Z > 0, "an alternating field pushes a conductor away on average");
    }

    [Validates("torque on a ring tilted 45 degrees in a uniform ramp, |m x B| = i A B sin 45", "torque on a magnetic moment, tau = m x B (textbook)", "1e-3")]
    [Fact]
    public void ATiltedRingFeelsTheTorqueOfItsMomentInTheField()
    {
        // A slow ramp (steady current at its end, where the field is largest): torque i A B sin(theta) at the end.
        ConductiveItem ring = Ring(0.02, 0.001, contact: "Held");
        var normal = new Vector3D(1, 0, 1).Normalized();
        InductionResponse r = InductionEngine.Respond(new Scenario(ring, Fixtures.UniformRamp(0, 3, 1), new Placement(Vector3D.Zero, normal)));
        double area = Math.PI * 0.01 * 0.01;
        Within.Relative(r.PeakCurrentAmperes * area * 3 * Math.Sin(Math.PI / 4), r.PeakTorqueNewtonMeters, 1e-3, "|m x B| at the end of the ramp");
        Assert.Equal(0, r.PeakForceNewtons);
    }

    [Validates("Force and Torque margins: weight over peak force, m g L/2 over peak torque; a margin of 1 lands on the limit", "ASTM F2052 and F2213 criteria (from memory of the standards' methods)", "1e-12")]
    [Fact]
    public void TheForceAndTorqueMarginsCompareWithTheWeightAndTheGravitationalTorque()
    {
        ConductiveItem ring = Ring(0.02, 0.001, contact: "Free");
        FieldSource coil = Coil(new RampWaveform(0, 2000, 0.01, drive: DriveKind.Current));
        var centre = new Vector3D(0.01, 0, Height);
        InductionResponse r = InductionEngine.Respond(new Scenario(ring, coil, new Placement(centre, new Vector3D(0.2, 0, 1).Normalized())));
        InductionAssessment a = HazardAssessor.Assess(r, InductionHazard.Criteria.HazardPolicy.Default);
        double weight = r.MassKilograms * 9.80665;
        Within.Relative(weight / r.PeakForceNewtons, a.ForceMargin!.Value, 1e-12, "force margin");
        Within.Relative(weight * ring.Loop.LargestDimensionMeters / 2 / r.PeakTorqueNewtonMeters, a.TorqueMargin!.Value, 1e-12, "torque margin");
        Assert.True(r.LaunchSpeedMetersPerSecond > 0, "a loose item is given a launch speed");
        Within.Relative(r.ImpulseNewtonSeconds!.Value / r.MassKilograms, r.LaunchSpeedMetersPerSecond!.Value, 1e-12, "launch speed = |J| / m");
    }

    [Validates("a ring moved along a coil's axis: motional emf v 2 pi r B_r I and braking force e^2 / (R v)", "Faraday's law for motion (emf = v . grad Phi) and F = i dl x B, with the Biot-Savart field", "1e-3")]
    [Fact]
    public void ARingMovedAlongACoilsAxisIsBrakedByItsOwnCurrent()
    {
        ConductiveItem ring = Ring(0.02, 0.001, contact: "Held");
        double current = 2000, speed = 1.5;
        FieldSource coil = Coil(new RampWaveform(0, current, 1, drive: DriveKind.Current));
        var placement = new Placement(new Vector3D(0, 0, Height), Vector3D.UnitZ, new Vector3D(0, 0, speed));
        InductionResponse r = InductionEngine.Respond(new Scenario(ring, coil, placement));
        double br = current * Turns * BiotSavart.Circle(CoilRadius, 0, new Vector3D(0.01, 0, Height)).X;
        double emf = speed * 2 * Math.PI * 0.01 * br;
        double resistance = ring.Material.ResistivityAt(r.InitialTemperatureCelsius) * ring.Loop.PathLengthMeters / ring.Loop.Section.AreaSquareMeters;
        Within.Relative(Math.Abs(emf), r.MotionalEmfVolts!.Value, 1e-3, "motional emf");
        Within.Relative(emf * emf / (resistance * speed), r.BrakingForceNewtons!.Value, 1e-3, "braking force e^2 / (R v) (i = e / R times dPhi/dz = e / v)");
        Within.Relative(r.MassKilograms * 9.80665 / (r.BrakingForceNewtons!.Value / speed), r.SpeedForWeightMetersPerSecond!.Value, 1e-9, "speed at which braking equals the weight");
    }

    [Validates("a disc moved along a coil's axis through its fringe: braking force, the sum over its filaments of (v 2 pi r B_r I)^2 / (R_i v)", "Faraday's law for motion on each filament and F = i dl x B, with the Biot-Savart field at each cell's Gauss points (resistive limit)", "1e-3")]
    [Fact]
    public void ADiscMovedThroughACoilsFringeIsBrakedByItsEddyCurrents()
    {
        ConductiveItem disc = FilamentModelTests.Body("Disc", "Aluminium", 0.04, thickness: 0.003);
        double current = 2000, speed = 1.5;
        FieldSource coil = Coil(new RampWaveform(0, current, 1, drive: DriveKind.Current));
        var placement = new Placement(new Vector3D(0, 0, Height), Vector3D.UnitZ, new Vector3D(0, 0, speed));
        InductionResponse r = InductionEngine.Respond(new Scenario(disc, coil, placement));
        Assert.True(r.PathCount > 1, "filaments over the disc");

        ItemPaths paths = ItemPaths.For(disc, 1, r.InitialTemperatureCelsius, thinLoop: false);
        double rho = disc.Material.ResistivityAt(r.InitialTemperatureCelsius), expected = 0;
        foreach (Filament cell in paths.Paths!.Filaments!)
        {
            // The cell's emf: v times the flux gradient, -2 pi r B_r averaged over its section; its resistance rho 2 pi r / S.
            double gradient = 0;
            foreach ((double radius, double z, double weight) in cell.GaussSamples())
            {
                gradient += weight * -2 * Math.PI * radius * current * Turns * BiotSavart.Circle(CoilRadius, 0, new Vector3D(radius, 0, Height + z), 20_000).X;
            }

            double emf = speed * gradient;
            expected += emf * emf / (rho * cell.PathLengthMeters / cell.AreaSquareMeters) / speed;
        }

        Within.Relative(expected, r.BrakingForceNewtons!.Value, 1e-3, "braking force on the disc");
    }
}
