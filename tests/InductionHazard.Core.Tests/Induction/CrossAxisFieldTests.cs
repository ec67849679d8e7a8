using System;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;
using Xunit.Abstractions;

namespace InductionHazard.Tests.Induction;

/// <summary>The heating by the field across a body's axis where that field varies through the body.</summary>
public sealed class CrossAxisFieldTests
{
    private readonly ITestOutputHelper _out;

    public CrossAxisFieldTests(ITestOutputHelper output) => _out = output;

    private static FieldSource Line(double amperes, double hertz) =>
        new("line", new[] { new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), new SineWaveform(amperes, hertz, drive: DriveKind.Current)) });

    [Validates("a rod pointing away from a line current (from 50 to 150 mm), 1 Hz: its heating by the field across its axis, which falls as 1/x along it, slice by slice", "the low-frequency loss of a long cylinder across its axis, pi sigma R^4 B'^2 / 4 per length (classical eddy-current loss, derived from the current density sigma B' x along the rod), integrated along the rod in the line's closed-form field mu0 I / (2 pi x)", "2 % (l = 40 R)")]
    [Fact]
    public void ARodWhoseCrossFieldFallsAlongItHeatsAsItsSlicesEachInItsOwnField()
    {
        // A copper rod 5 mm across and 100 mm long, its axis along x from 50 to 150 mm off a line current along z: the
        // line's field there is across the rod (along y) and falls as 1/x, so its mean square along the rod is a third
        // above its value at the centre. At 1 Hz each slice loses pi sigma R^4 B'(x)^2 / 4 per length, and the sum is
        // (pi sigma R^4 / 4) (omega mu0 I / 2 pi)^2 / 2 (1/a - 1/b), cycle-averaged. The coaxial paths link nothing here
        // (the line's field along the rod is odd across it).
        double amperes = 2000, hertz = 1, omega = 2 * Math.PI * hertz, radius = 0.0025, a = 0.05, b = 0.15, seconds = 100;
        ConductiveItem rod = FilamentModelTests.Body("Cylinder", "Copper", 2 * radius, length: b - a);
        double sigma = 1 / rod.Material.ResistivityAt(20), k = omega * 4e-7 * Math.PI * amperes / (2 * Math.PI);
        double slices = Math.PI * sigma * Math.Pow(radius, 4) / 4 * (k * k / 2) * ((1 / a) - (1 / b));
        double atCentre = Math.PI * sigma * Math.Pow(radius, 4) / 4 * (k * k / 2) * (b - a) / (0.5 * (a + b) * 0.5 * (a + b));

        InductionResponse r = InductionEngine.Respond(new Scenario(rod, Line(amperes, hertz), new Placement(new Vector3D(0.5 * (a + b), 0, 0), Vector3D.UnitX), seconds));
        double power = r.EnergyDissipatedJoules / r.ExposureSeconds;
        _out.WriteLine($"slice by slice {slices:E5} W, engine {power:E5} W, by the field at the centre alone {atCentre:E5} W");
        Assert.Empty(r.ValidityIssues);
        Within.Relative(slices, power, 2e-2, "the rod's heating across its axis");
        Assert.True(power > 1.25 * atCentre, "the field at the centre alone gives " + atCentre + " W, a quarter less");
    }

    [Fact]
    public void ARodThatReachesIntoTheConductorsFieldTooSharplyHasItsHeatingIndeterminateSayingWhy()
    {
        // The same rod from 2 mm to 102 mm off the line: its mean square is dominated by the end at the conductor, where
        // the quadrature cannot settle it. The heating is not found, so the burn is not judged and the rod is not Clear.
        ConductiveItem rod = FilamentModelTests.Body("Cylinder", "Copper", 0.005, length: 0.1);
        InductionResponse r = InductionEngine.Respond(new Scenario(rod, Line(200, 50), new Placement(new Vector3D(0.052, 0, 0), Vector3D.UnitX)));
        ValidityIssue issue = Assert.Single(r.ValidityIssues);
        Assert.Contains("the field across the body's axis varies too sharply through the body", issue.Reason, StringComparison.Ordinal);
        Assert.Equal(AffectedResults.Heating, issue.Affects);
        InductionAssessment judged = HazardAssessor.Assess(r, HazardPolicy.Default);
        Assert.NotEqual(Verdict.Clear, judged.Verdict);
        Assert.Equal(Verdict.Indeterminate, judged.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn).Verdict);
    }

    [Validates("the field within a body's reach beside a line current: the largest field over a sphere of radius a at distance d from the line, over its rms there, for a/d from 0.2 to 0.92", "closed form for a line current's 1/rho field: the largest 1/(d - a); the mean of 1/rho^2 over the sphere arcsin(a/d) / (a sqrt(d^2 - a^2)) (the integral round the sphere's parallels, 2 pi / (d^2 - a^2 sin^2 theta), then over theta; derived here)", "0.1 % to a/d = 0.75; 1 % at 0.92")]
    [Theory]
    [InlineData(0.3, 0.06, 1e-3)]
    [InlineData(0.2, 0.1, 1e-3)]
    [InlineData(0.08, 0.06, 1e-3)]
    [InlineData(0.065, 0.06, 1e-2)]
    public void TheFieldWithinABodysReachBesideALineMeetsItsClosedForm(double d, double a, double tolerance)
    {
        FieldSource line = Line(1000, 50);
        double exact = (1 / (d - a)) / Math.Sqrt(Math.Asin(a / d) / (a * Math.Sqrt((d * d) - (a * a))));
        double found = InductionHazard.Induction.CrossAxisField.ReachRatio(line, new Vector3D(d, 0, 0), a, new[] { new System.Numerics.Complex(0, 1) });
        _out.WriteLine($"d {d} m, a {a} m: closed form {exact:F5}, found {found:F5}");
        Within.Relative(exact, found, tolerance, "the largest field over its rms within reach");

        // A uniform field is the same everywhere: the ratio is 1.
        var uniform = FieldSource.Uniform("uniform", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        Within.Relative(1, InductionHazard.Induction.CrossAxisField.ReachRatio(uniform, new Vector3D(d, 0, 0), a, new[] { new System.Numerics.Complex(0.01, 0) }), 1e-12, "uniform");
    }
}
