using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Tests.Induction;
using InductionHazard.Waveforms;
using Xunit;
using Xunit.Abstractions;

namespace InductionHazard.Tests.Assessment;

/// <summary>
/// A body with an axis placed without a normal is judged with its axis along the largest flux change and across it,
/// and the worst of the three is the assessment: a rod across a field heats more than along it.
/// </summary>
public sealed class BodyOrientationTests
{
    private readonly ITestOutputHelper _out;

    public BodyOrientationTests(ITestOutputHelper output) => _out = output;

    [Validates("a rod given no normal in a 1 Hz field: the orientation kept heats it as a long cylinder across its axis, pi sigma l R^4 B'^2 / 4, twice the pi sigma l R^4 B'^2 / 8 along it", "classical eddy-current losses of a long cylinder along and across its axis (derived from the low-frequency current density, sigma B' r / 2 round the axis and sigma B' x along it; Landau and Lifshitz vol. 8 section 59 for the method)", "2 % (l = 40 R), 1 % along")]
    [Fact]
    public void ARodGivenNoNormalIsJudgedWithItsAxisAcrossTheFieldWhichHeatsItTwiceAsMuch()
    {
        // A copper rod 10 mm across and 200 mm long, in 10 mT at 1 Hz for 100 s: far below the skin depth, and the rise
        // (some 0.1 mK) far too small to change the resistivity, yet its margins below the largest a margin is held to. Along the field the coaxial currents lose pi sigma l R^4 B'^2 / 8; across
        // it the currents run along the rod and back, pi sigma l R^4 B'^2 / 4, twice as much. Given no normal, the
        // orientation that links the largest flux change is along the field, but the one judged is the worse, across it.
        double b = 1e-2, f = 1, omega = 2 * Math.PI * f, seconds = 100;
        ConductiveItem rod = FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.2);
        double sigma = 1 / rod.Material.ResistivityAt(20), rate2 = omega * b * omega * b / 2;
        double along = Math.PI * sigma * 0.2 * Math.Pow(0.005, 4) * rate2 / 8, across = 2 * along;
        var source = FieldSource.Uniform("sine", new SineWaveform(b, f, drive: DriveKind.FluxDensity), Vector3D.UnitZ);

        InductionAssessment judged = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(rod, source, null, seconds)), HazardPolicy.Default);
        InductionAssessment given = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(rod, source, new Placement(Vector3D.Zero, Vector3D.UnitZ), seconds)), HazardPolicy.Default);
        double judgedPower = judged.Response.EnergyDissipatedJoules / judged.Response.ExposureSeconds;
        double alongPower = given.Response.EnergyDissipatedJoules / given.Response.ExposureSeconds;
        _out.WriteLine($"along {alongPower:E5} W (closed form {along:E5}), judged {judgedPower:E5} W (closed form across {across:E5}): {judged.Orientation}");

        Assert.StartsWith("axis across the largest flux change, normal ", judged.Orientation, StringComparison.Ordinal);
        Assert.Equal(0, Math.Abs(judged.Response.Normal.Dot(Vector3D.UnitZ)), 12);
        Within.Relative(along, alongPower, 1e-2, "along the field");
        Within.Relative(across, judgedPower, 2e-2, "the orientation judged, across the field");
        Assert.True(judged.BurnMargin < given.BurnMargin, "the burn margin kept " + judged.BurnMargin + " against " + given.BurnMargin + " along the field");
    }

    public static IEnumerable<object[]> Bodies()
    {
        var coil = new FieldSource("pulse coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.08, 12), new DischargeWaveform(4e-3, 6000, 120e-6, 0.04, crowbar: true)) });
        var furnace = FieldSource.Uniform("furnace", new SineWaveform(0.0015, 9600, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        var mains = FieldSource.Uniform("mains", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        var ramp = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 0.01, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        yield return new object[] { "rod above a pulse coil", FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held"), coil, new Vector3D(0.02, 0, 0.1) };
        yield return new object[] { "rod in mains", FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held"), mains, Vector3D.Zero };
        yield return new object[] { "disc at a furnace", FilamentModelTests.Body("Disc", "Aluminium", 0.05, thickness: 0.003, contact: "Held"), furnace, Vector3D.Zero };
        yield return new object[] { "tube in a ramp", FilamentModelTests.Body("Tube", "Aluminium", 0.06, length: 0.3, wall: 0.003), ramp, Vector3D.Zero };
        yield return new object[] { "disc above a pulse coil", FilamentModelTests.Body("Disc", "Aluminium", 0.05, thickness: 0.003, contact: "Held"), coil, new Vector3D(0, 0.03, 0.06) };

        // Burn and overheat Hazards in every orientation; the force a Caution in one and some 5e-6 of the weight in the one
        // kept for its heating.
        var heater = new FieldSource("heater coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10), new SineWaveform(300, 10000, drive: DriveKind.Current)) });
        yield return new object[] { "disc at a heater coil", FilamentModelTests.Body("Disc", "Aluminium", 0.06, thickness: 0.003, contact: "Held"), heater, new Vector3D(0, 0, 0.05) };
    }

    private static int Severity(Verdict verdict) => verdict switch { Verdict.Hazard => 3, Verdict.Indeterminate => 2, Verdict.Caution => 1, _ => 0 };

    [Theory]
    [MemberData(nameof(Bodies))]
    public void TheAssessmentOfABodyGivenNoNormalIsNoMilderThanAnyOfItsOrientationsGiven(string label, ConductiveItem body, FieldSource source, Vector3D centre)
    {
        // The rule, not the physics: whichever mechanism governs, the kept orientation is at least as severe as each of
        // those judged given as a normal (along the largest flux change, across it both ways, and any a search found
        // where the field varies through the body), by verdict, then by the judged margins smallest first. This holds
        // what a reader of the verdict relies on: a late choice of orientation never turns one orientation's Hazard
        // into a milder verdict.
        InductionResponse head = InductionEngine.Respond(new Scenario(body, source, new Placement(centre)));
        Assert.InRange(head.AcrossAxis.Count, 2, 5);
        InductionAssessment judged = HazardAssessor.Assess(head, HazardPolicy.Default);
        var normals = new[] { head.Normal }.Concat(head.AcrossAxis.Select(r => r.Normal)).ToArray();
        Assert.Equal(0, normals[0].Dot(normals[1]), 12);
        Assert.Equal(0, normals[0].Dot(normals[2]), 12);
        Assert.Equal(0, normals[1].Dot(normals[2]), 12);
        foreach (Vector3D n in normals)
        {
            InductionAssessment given = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(body, source, new Placement(centre, n))), HazardPolicy.Default);
            _out.WriteLine($"{label}: normal {n}: {given.Verdict}, burn {given.BurnMargin}, force {given.ForceMargin}; kept {judged.Verdict}, burn {judged.BurnMargin}, force {judged.ForceMargin}");
            // A normal given is made a unit vector again, which may move the last digit of what it gives: margins are
            // compared to 1e-9.
            Assert.True(Severity(given.Verdict) <= Severity(judged.Verdict), label + ": the orientation " + n + " gives " + given.Verdict + ", the one kept " + judged.Verdict);
            if (given.Verdict == judged.Verdict && !double.IsNaN(judged.MinimumMargin))
            {
                Assert.True(given.MinimumMargin >= judged.MinimumMargin * (1 - 1e-9), label + ": smallest margin " + given.MinimumMargin + " at " + n + " below the kept " + judged.MinimumMargin);
            }

            // Each mechanism too, governing or not: its margin is that of the orientation worst for it, so a force or
            // a burn that does not govern is never shown milder than some orientation makes it.
            foreach (MechanismResult g in given.Mechanisms.Where(m => m.Applies && m.Verdict != Verdict.Indeterminate))
            {
                MechanismResult kept = judged.Mechanisms.Single(m => m.Mechanism == g.Mechanism);
                Assert.True(kept.Verdict == Verdict.Indeterminate || g.Margin >= kept.Margin * (1 - 1e-9), label + ": " + g.Mechanism + " margin " + g.Margin + " at " + n + " below the kept " + kept.Margin + " (" + kept.Detail + ")");
            }
        }
    }

    [Validates("a disc given no normal in a 9.6 kHz field, kept with its axis across the field for its heating: the figures shown are the largest over the orientations judged, the flux density the field's peak B and the emf around its axis omega B pi R^2", "Faraday's law for a flat loop facing a uniform sinusoidal field: Phi = B A, emf = omega Phi (textbook)", "1e-9")]
    [Fact]
    public void TheFiguresOfABodyGivenNoNormalAreTheLargestOverTheOrientationsJudged()
    {
        // The demo's aluminium sample disc at the furnace mouth: kept with its axis across the field, where the field
        // drives currents along the body and back and heats it most, but where no flux threads its axis: its own emf,
        // current and normal flux density are zero. The figures an assessment shows (and a report or a table reads) are
        // each the largest over the three orientations judged, as each mechanism's margin is the smallest over them.
        double b = 0.0015, f = 9600, radius = 0.025;
        ConductiveItem disc = FilamentModelTests.Body("Disc", "Aluminium", 2 * radius, thickness: 0.003, contact: "Held");
        var furnace = FieldSource.Uniform("furnace", new SineWaveform(b, f, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        InductionResponse head = InductionEngine.Respond(new Scenario(disc, furnace, new Placement(Vector3D.Zero)));
        InductionAssessment judged = HazardAssessor.Assess(head, HazardPolicy.Default);
        InductionAssessment[] each = new[] { head }.Concat(head.AcrossAxis).Select(r => HazardAssessor.Assess(r with { AcrossAxis = Array.Empty<InductionResponse>() }, HazardPolicy.Default)).ToArray();

        Assert.StartsWith("axis across the largest flux change", judged.Orientation, StringComparison.Ordinal);
        Assert.Equal(0, judged.Response.PeakEmfVolts, 15);
        Assert.Equal(3, judged.FiguresJudgedOver);
        Assert.Equal(each.Max(a => a.PeakEmfVolts), judged.PeakEmfVolts);
        Assert.Equal(each.Max(a => a.PeakCurrentAmperes), judged.PeakCurrentAmperes);
        Assert.Equal(each.Max(a => a.PeakFluxDensityTesla), judged.PeakFluxDensityTesla);
        Assert.Equal(each.Max(a => a.PeakTemperatureCelsius), judged.PeakTemperatureCelsius);
        Assert.Equal(each.Max(a => a.EnergyDissipatedJoules), judged.EnergyDissipatedJoules);
        Assert.True(judged.PeakCurrentAmperes > 0, "the current around the axis along the field");

        // Faraday's law for the orientation along the field: Phi = B pi R^2, emf = omega Phi.
        double flux = b * Math.PI * radius * radius;
        Within.Relative(b, judged.PeakFluxDensityTesla, 1e-9, "the field's peak, normal to the disc along it");
        Within.Relative(flux, judged.PeakFluxWebers, 1e-9, "B pi R^2");
        Within.Relative(2 * Math.PI * f * flux, judged.PeakEmfVolts, 1e-9, "omega B pi R^2");
        Within.Relative(2 * Math.PI * f * flux / Math.Sqrt(2), judged.RmsEmfVolts!.Value, 1e-9, "its rms");

        // A report's figures say so, and show those figures.
        IReadOnlyList<(string Label, string Text)> figures = InductionHazard.Reporting.ReportLines.Figures(judged);
        Assert.Equal("Figures shown", figures[0].Label);
        Assert.Contains("largest of the 3 orientations", figures[0].Text, StringComparison.Ordinal);
        Assert.Equal(SiFormat.Format(judged.PeakEmfVolts, "V"), figures.Single(l => l.Label == "Peak emf").Text);
        Assert.Equal(SiFormat.Format(b, "T"), figures.Single(l => l.Label == "Peak flux density normal to the item").Text);

        // A chart of the current draws the orientation whose current is the figure shown (the one kept carries none);
        // the temperature's, the one whose peak is.
        Assert.NotSame(judged.Response, judged.CurrentCharted);
        Assert.Equal(judged.PeakCurrentAmperes, judged.CurrentCharted.PeakCurrentAmperes);
        Assert.Equal(judged.PeakTemperatureCelsius, judged.HeatingCharted.PeakTemperatureCelsius);

        // An item judged as placed shows its own figures and says nothing of others.
        InductionAssessment given = each[0];
        Assert.Equal(1, given.FiguresJudgedOver);
        Assert.DoesNotContain(InductionHazard.Reporting.ReportLines.Figures(given), l => l.Label == "Figures shown");
    }

    [Theory]
    [InlineData("Cylinder")]
    [InlineData("Disc")]
    public void BesideALineCurrentNoOrientationOfFortyHeatsABodyMoreThanTheThreeJudged(string shape)
    {
        // The search, not the physics: 300 mm from a 10 kA line at 50 Hz (the field varies some 20 % over a 120 mm rod),
        // each of 40 normals spread over the half sphere is solved as given, and none heats the body more than the
        // most the three orientations judged do (to 2 %: the spread's own points miss the top by a little).
        var line = new FieldSource("line", new[] { new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), new SineWaveform(10000, 50, drive: DriveKind.Current)) });
        ConductiveItem body = shape == "Cylinder" ? FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held") : FilamentModelTests.Body("Disc", "Aluminium", 0.06, thickness: 0.003, contact: "Held");
        var centre = new Vector3D(0.3, 0.1, 0);
        InductionResponse head = InductionEngine.Respond(new Scenario(body, line, new Placement(centre)));
        double judged = new[] { head }.Concat(head.AcrossAxis).Max(r => r.EnergyDissipatedJoules);
        double spread = 0;
        const int count = 40;
        foreach (Vector3D normal in SphereSearch.Spread(count, half: true))
        {
            spread = Math.Max(spread, InductionEngine.Respond(new Scenario(body, line, new Placement(centre, normal))).EnergyDissipatedJoules);
        }

        _out.WriteLine($"{shape}: the three judged {judged:E5} J, the spread of {count} {spread:E5} J");
        Assert.True(spread <= 1.02 * judged, shape + ": an orientation of the spread heats it " + spread + " J against " + judged + " J judged");

        // A rod heats more across the field than along it, a thin disc less: the three include both.
        Assert.Equal(shape == "Cylinder", judged > head.EnergyDissipatedJoules);
    }

    [Theory]
    [InlineData("Cylinder", "sine")]
    [InlineData("Tube", "sine")]
    [InlineData("Cylinder", "ramp")]
    public void NearACoilASearchFindsTheOrientationThatHeatsABodyMostAmongFortyEight(string shape, string drive)
    {
        // The search, not the physics: 100 mm from a 100 mm coil the field varies by half its value through a 120 mm rod
        // or a 150 mm tube, and a body turned between its axis along the largest flux change and across it heats more
        // than any of those three (by the engine's own model), in a 1 kHz sine and in a 10 ms ramp. Each of 48 normals
        // spread over the half sphere is solved as given: the orientations judged reach the most of them (to 2 %: the
        // spread's own points miss the top by a little), where the three alone fall short by more than a tenth.
        FieldWaveform current = drive == "sine" ? new SineWaveform(1000, 1000, drive: DriveKind.Current) : new RampWaveform(0, 5000, 0.01, drive: DriveKind.Current);
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.1, 10), current) });
        ConductiveItem body = shape == "Cylinder"
            ? FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held")
            : FilamentModelTests.Body("Tube", "Aluminium", 0.04, length: 0.15, wall: 0.002, contact: "Held");
        var centre = new Vector3D(0.2, 0, 0.1);
        InductionResponse head = InductionEngine.Respond(new Scenario(body, coil, new Placement(centre)));
        double three = new[] { head }.Concat(head.AcrossAxis.Take(2)).Max(r => r.TemperatureRiseKelvin);
        double judged = new[] { head }.Concat(head.AcrossAxis).Max(r => r.TemperatureRiseKelvin);
        double spread = 0;
        const int count = 48;
        foreach (Vector3D normal in SphereSearch.Spread(count, half: true))
        {
            InductionResponse given = InductionEngine.Respond(new Scenario(body, coil, new Placement(centre, normal)));
            Assert.True(given.IsValid, shape + " at normal " + normal + ": " + string.Join("; ", given.ValidityIssues));
            spread = Math.Max(spread, given.TemperatureRiseKelvin);
        }

        _out.WriteLine($"{shape} ({drive}): the three {three:G4} K, judged {judged:G4} K ({head.AcrossAxis.Count - 2} found by the search), the spread of {count} {spread:G4} K");
        Assert.True(three < 0.9 * spread, shape + ": the three alone reach " + three + " K of the spread's " + spread + " K: the case does not need the search");
        Assert.True(spread <= 1.02 * judged, shape + ": an orientation of the spread heats it by " + spread + " K against " + judged + " K judged");
        InductionAssessment assessed = HazardAssessor.Assess(head, HazardPolicy.Default);
        Assert.Contains(assessed.Response.ModelNotes, n => n.Contains("turned as a search on a low-frequency model of its heating found worse, normal ", StringComparison.Ordinal));
    }

    [Fact]
    public void ABodyGivenNoNormalWithAConductorWithinItsReachIsNotJudgedForHeating()
    {
        // The rule, and why: 60 mm from a 10 kA line at 50 Hz a 120 mm rod, turned, reaches to within a few mm of the
        // conductor. An orientation the three judged and the search's model both miss heats it over twice as much as
        // any of the three (by the engine's own model), so without its normal its heating is not judged: Indeterminate,
        // saying why. Given its normal it is solved; 300 mm away nothing is within reach.
        var line = new FieldSource("line", new[] { new SourceTerm(new LineConductor(new Axis(Vector3D.Zero, Vector3D.UnitZ)), new SineWaveform(10000, 50, drive: DriveKind.Current)) });
        ConductiveItem rod = FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held");
        var near = new Vector3D(0.06, 0, 0);
        InductionResponse head = InductionEngine.Respond(new Scenario(rod, line, new Placement(near)));
        Assert.Contains(head.ValidityIssues, i => i.Reason.StartsWith("turned, the body reaches where the field is ", StringComparison.Ordinal) && i.Affects == AffectedResults.Heating);
        Assert.All(head.AcrossAxis, r => Assert.Contains(r.ValidityIssues, i => i.Reason.StartsWith("turned, the body reaches", StringComparison.Ordinal)));
        InductionAssessment assessed = HazardAssessor.Assess(head, HazardPolicy.Default);
        Assert.Equal(Verdict.Indeterminate, assessed.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Burn).Verdict);
        _out.WriteLine(assessed.Verdict + ": " + assessed.Action);
        // A Hazard by the holder's exposure stands beside it: the action still names the heating as not judged.
        Assert.Equal(Verdict.Hazard, assessed.Verdict);
        Assert.Contains("could not be judged (Burn, Overheat)", assessed.Action, StringComparison.Ordinal);
        Assert.Contains(assessed.Response.ModelNotes, n => n.Contains("a conductor of the source lies within its reach", StringComparison.Ordinal) && n.EndsWith("for its heating to be judged, give how it sits (-Normal or a Normal column)", StringComparison.Ordinal));

        double three = new[] { head }.Concat(head.AcrossAxis).Max(r => r.TemperatureRiseKelvin);
        InductionResponse towardTheLine = InductionEngine.Respond(new Scenario(rod, line, new Placement(near, new Vector3D(0.894, 0.046, 0.445))));
        _out.WriteLine($"the three at most {three:F2} K; turned toward the line {towardTheLine.TemperatureRiseKelvin:F2} K");
        Assert.True(towardTheLine.IsValid, string.Join("; ", towardTheLine.ValidityIssues));
        Assert.True(towardTheLine.TemperatureRiseKelvin > 2 * three, "turned toward the line " + towardTheLine.TemperatureRiseKelvin + " K against " + three + " K");

        Assert.True(InductionEngine.Respond(new Scenario(rod, line, new Placement(near, Vector3D.UnitZ))).IsValid, "given its normal");
        InductionResponse far = InductionEngine.Respond(new Scenario(rod, line, new Placement(new Vector3D(0.3, 0.1, 0))));
        Assert.DoesNotContain(far.ValidityIssues, i => i.Reason.StartsWith("turned, the body reaches", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData("Bar")]
    [InlineData("Cylinder")]
    public void ABodyAcrossAUniformRampWithNoFluxAlongItsAxisIsSolvedToTheEndOfItsRun(string shape)
    {
        // Across a uniform field no mode of the coaxial currents is driven: the body heats by the field across its axis
        // alone. A mode that is not driven sets no time scale for the first step; a brass bar's first mode (some 1e-17 s)
        // did, its steps took some 150 a segment to grow, and the run ran out of its budget before its end (Indeterminate).
        var ramp = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 0.01, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        ConductiveItem body = shape == "Bar"
            ? ItemRecordReader.Read(new Dictionary<string, object?> { ["Name"] = "bar", ["Shape"] = "Bar", ["Material"] = "Brass", ["Width"] = "20 mm", ["Height"] = "15 mm", ["Length"] = "90 mm", ["Contact"] = "Held" }, MaterialLibrary.BuiltIn)
            : FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held");
        InductionResponse across = InductionEngine.Respond(new Scenario(body, ramp, new Placement(Vector3D.Zero, Vector3D.UnitX)));
        Assert.True(across.IsValid, shape + ": " + string.Join("; ", across.ValidityIssues));
        Assert.Equal(0, across.PeakFluxWebers);
        Assert.True(across.TemperatureRiseKelvin > 0, shape + ": the field across the axis heats it");
        Within.Relative(across.AssessedSeconds, across.HeatingSeries[across.HeatingSeries.Count - 1].TimeSeconds - across.HeatingSeries[0].TimeSeconds, 1e-12, shape + ": the run's end");
    }

    [Fact]
    public void WhereTheFieldVariesThroughABodyItsNotesSayTheOrientationsJudgedComeFromASearchOnAModel()
    {
        // Beside a 50 mm coil a 120 mm rod spans fields that differ severalfold; in a uniform field it spans one.
        var coil = new FieldSource("coil", new[] { new SourceTerm(new CircularCoil(new Axis(Vector3D.Zero, Vector3D.UnitZ), 0.05, 10), new SineWaveform(100, 50, drive: DriveKind.Current)) });
        var mains = FieldSource.Uniform("mains", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        ConductiveItem rod = FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held");
        InductionAssessment near = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(rod, coil, new Placement(new Vector3D(0, 0, 0.06)))), HazardPolicy.Default);
        string note = Assert.Single(near.Response.ModelNotes, n => n.StartsWith("orientation: the field varies through the body (by ", StringComparison.Ordinal));
        Assert.Contains("a search on a low-frequency model of its heating found", note, StringComparison.Ordinal);
        Assert.Contains("the search solves a model, not every orientation", note, StringComparison.Ordinal);
        InductionAssessment uniform = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(rod, mains)), HazardPolicy.Default);
        Assert.DoesNotContain(uniform.Response.ModelNotes, n => n.StartsWith("orientation:", StringComparison.Ordinal));
        InductionAssessment given = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(rod, coil, new Placement(new Vector3D(0, 0, 0.06), Vector3D.UnitZ))), HazardPolicy.Default);
        Assert.DoesNotContain(given.Response.ModelNotes, n => n.StartsWith("orientation:", StringComparison.Ordinal));
    }

    [Fact]
    public void ABodyThatFacesAsGivenOrIsASphereIsJudgedOnceAndTheFingerprintIsTheInputs()
    {
        var mains = FieldSource.Uniform("mains", new SineWaveform(0.01, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        ConductiveItem rod = FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12);
        Assert.Empty(InductionEngine.Respond(new Scenario(rod, mains, new Placement(Vector3D.Zero, Vector3D.UnitZ))).AcrossAxis);
        Assert.Empty(InductionEngine.Respond(new Scenario(rod, mains, new Placement(Vector3D.Zero, null, null, 30))).AcrossAxis);
        Assert.Empty(InductionEngine.Respond(new Scenario(FilamentModelTests.Body("Sphere", "Copper", 0.02), mains)).AcrossAxis);
        Assert.Empty(InductionEngine.Respond(new Scenario(Fixtures.Ring(), mains)).AcrossAxis);

        // The kept orientation is the engine's choice, not an input: the assessment's fingerprint is that of the inputs.
        var scenario = new Scenario(rod, mains);
        InductionAssessment judged = HazardAssessor.Assess(InductionEngine.Respond(scenario), HazardPolicy.Default);
        Assert.StartsWith("axis across", judged.Orientation, StringComparison.Ordinal);
        Assert.Equal(scenario.Fingerprint(), judged.Response.Scenario.Fingerprint());

        // Kept across the field, it still shows the torque it would feel turned: its orientation was not given.
        double? turned = InductionEngine.Respond(scenario).PeakTorqueTurnedNewtonMeters;
        Assert.True(turned > 0);
        Assert.Equal(turned, judged.Response.PeakTorqueTurnedNewtonMeters);
        InductionAssessment held = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(FilamentModelTests.Body("Cylinder", "Copper", 0.01, length: 0.12, contact: "Held"), mains)), HazardPolicy.Default);
        Assert.StartsWith("axis across", held.Orientation, StringComparison.Ordinal);
        Assert.Equal("peak torque, the item turned", held.Mechanisms.Single(m => m.Mechanism == HazardMechanism.Torque).Quantity);
        Assert.NotEqual(new Scenario(rod, mains, new Placement(Vector3D.Zero, judged.Response.Normal)).Fingerprint(), scenario.Fingerprint());
    }
}

/// <summary>The torque on an item whose orientation the engine chose, judged with the item turned from it.</summary>
public sealed class TurnedTorqueTests
{
    private readonly ITestOutputHelper _out;

    public TurnedTorqueTests(ITestOutputHelper output) => _out = output;

    [Validates("a ring given no normal in a slow ramp: the torque judged, with the ring turned from facing the field, against m B sin(theta) cos(theta) at 45 degrees with m = I A and I = A B' / R, and against the engine's own m x B with the ring given each normal 0 to 90 degrees from the field", "textbook: the moment of a current loop m = I A, the torque m x B, the resistive-limit current emf / R (L / R = 91 us against a 1 s ramp)", "1e-3")]
    [Fact]
    public void ARingGivenNoNormalIsJudgedForTheTorqueItWouldFeelTurnedFromTheField()
    {
        // Facing the field the ring's moment lies along it and feels no torque; turned by theta the flux, the current
        // and the moment fall as cos(theta) and the field across the moment grows as sin(theta): the torque is
        // I A B sin(theta) cos(theta), largest at 45 degrees, half of I A B. At the ramp's end I = A B' / R and B = 1 T.
        ConductiveItem ring = Fixtures.Ring(contact: "Free");
        var ramp = FieldSource.Uniform("ramp", new RampWaveform(0, 1, 1, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        InductionResponse chosen = InductionEngine.Respond(new Scenario(ring, ramp));
        double area = chosen.LoopAreaSquareMeters, current = area * 1 / chosen.ResistanceOhms;
        double textbook = 0.5 * current * area * 1;
        Assert.Equal(0, chosen.PeakTorqueNewtonMeters);
        Assert.NotNull(chosen.PeakTorqueTurnedNewtonMeters);
        Within.Relative(textbook, chosen.PeakTorqueTurnedNewtonMeters!.Value, 1e-3, "the torque turned 45 degrees");

        double largest = 0;
        for (int degrees = 0; degrees <= 90; degrees += 5)
        {
            double theta = degrees * Math.PI / 180;
            InductionResponse given = InductionEngine.Respond(new Scenario(ring, ramp, new Placement(Vector3D.Zero, new Vector3D(Math.Sin(theta), 0, Math.Cos(theta)))));
            Assert.Null(given.PeakTorqueTurnedNewtonMeters);
            largest = Math.Max(largest, given.PeakTorqueNewtonMeters);
        }

        _out.WriteLine($"textbook {textbook:E5} N m, judged {chosen.PeakTorqueTurnedNewtonMeters:E5} N m, largest over normals given {largest:E5} N m");
        Within.Relative(largest, chosen.PeakTorqueTurnedNewtonMeters.Value, 1e-3, "the largest torque over the normals given");

        MechanismResult torque = HazardAssessor.Assess(chosen, HazardPolicy.Default).Mechanisms.Single(m => m.Mechanism == HazardMechanism.Torque);
        Assert.True(torque.Applies);
        Assert.Equal("peak torque, the item turned", torque.Quantity);
        Assert.Contains("with the item turned from the orientation that links the largest flux change", torque.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void ASineDrivesTheSameRuleAndAFieldThatTurnsIsBoundedByTheWholeProduct()
    {
        // At 50 Hz the ring's current leads the field by nearly 90 degrees: |m| |B| peaks where both are at 1/sqrt(2) of
        // their peaks, so the turned torque is a quarter of I_peak A B_peak, which the explicit normals confirm.
        ConductiveItem ring = Fixtures.Ring(contact: "Free");
        var sine = FieldSource.Uniform("sine", new SineWaveform(0.1, 50, drive: DriveKind.FluxDensity), Vector3D.UnitZ);
        InductionResponse chosen = InductionEngine.Respond(new Scenario(ring, sine));
        double largest = 0;
        for (int degrees = 0; degrees <= 90; degrees += 5)
        {
            double theta = degrees * Math.PI / 180;
            largest = Math.Max(largest, InductionEngine.Respond(new Scenario(ring, sine, new Placement(Vector3D.Zero, new Vector3D(Math.Sin(theta), 0, Math.Cos(theta))))).PeakTorqueNewtonMeters);
        }

        Within.Relative(largest, chosen.PeakTorqueTurnedNewtonMeters!.Value, 2e-3, "the sine's torque turned");

        // Two uniform terms at right angles a quarter period apart: a field that turns. Its bound is the whole |m| |B|,
        // at least what any normal given feels.
        var turning = FieldSource.Combine(new[]
        {
            FieldSource.Uniform("x", new SineWaveform(0.1, 50, drive: DriveKind.FluxDensity), Vector3D.UnitX),
            FieldSource.Uniform("y", new SineWaveform(0.05, 50, phaseRadians: Math.PI / 2, drive: DriveKind.FluxDensity), Vector3D.UnitY),
        });
        InductionResponse turned = InductionEngine.Respond(new Scenario(ring, turning));
        double any = 0;
        for (int k = 0; k < 24; k++)
        {
            double phi = Math.PI * k / 24;
            for (int degrees = 0; degrees <= 90; degrees += 15)
            {
                double theta = degrees * Math.PI / 180;
                var normal = new Vector3D(Math.Sin(theta) * Math.Cos(phi), Math.Sin(theta) * Math.Sin(phi), Math.Cos(theta));
                any = Math.Max(any, InductionEngine.Respond(new Scenario(ring, turning, new Placement(Vector3D.Zero, normal))).PeakTorqueNewtonMeters);
            }
        }

        _out.WriteLine($"turning field: bound {turned.PeakTorqueTurnedNewtonMeters:E5} N m, largest over normals given {any:E5} N m");
        Assert.True(turned.PeakTorqueTurnedNewtonMeters >= any, "bound " + turned.PeakTorqueTurnedNewtonMeters + " below " + any);
    }
}
