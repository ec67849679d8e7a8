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

    [Validates("a rod pointing away from a line current (from 50 to 150 mm), 1 Hz: its heating by the field across its axis, which falls as 1/x along it, slice by slice", "the low-frequency loss of a long cylinder across its axis, pi sigma R^4 B'^2 / 4 per length (classical eddy-current loss, PHYSICS section 5), integrated along the rod in the line's closed-form field mu0 I / (2 pi x)", "2 % (l = 40 R)")]
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
}
