using System;
using System.Collections.Generic;
using System.Linq;
using CsCheck;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Properties;

/// <summary>
/// Hostile rows: every cell drawn from sensible values, absurd ones and garbage (NaN, infinities, zero, negatives,
/// huge and tiny numbers, wrong units, digits of other scripts). Each row must give an assessment or one of the
/// module's own exceptions, never anything else, and a Clear only when every margin is a number at least the
/// safety factor (infinite only where the field adds nothing at all: a rise or a voltage of exactly zero).
/// </summary>
public class HostileInputPropertyTests
{
    private static readonly object?[] GoodLengths = { "20 mm", "2 mm", "0.5 mm", "65 mm", 0.02, 0.002, "1 mm", "20mm", "3 mm" };

    private static readonly object?[] BadLengths =
    {
        "1 nm", "5 A", "3 T", "", "  ", null, "NaN", double.NaN, double.PositiveInfinity, -0.02, 0.0, 5e-324, 1e300, "1e308 km",
        "١٨ mm", "0x10", "20 MM", "1,5 mm", "-3 mm", "180 m",
    };

    private static readonly object?[] GoodMaterials = { "Copper", "Gold", "SS304", "Titanium", "Silver", "Brass" };

    private static readonly object?[] BadMaterials = { "mild steel", "Unobtainium", string.Empty, null, 42 };

    private static readonly object?[] Contacts = { "Skin", "Held", "Free", "Fixed", "Worn", null, string.Empty };

    /// <summary>A value that is sensible four times in five and hostile once.</summary>
    private static Gen<object?> Pick(object?[] good, object?[] bad) =>
        Gen.Frequency((4, Gen.Int[0, good.Length - 1].Select(i => good[i])), (1, Gen.Int[0, bad.Length - 1].Select(i => bad[i])));

    private static readonly Gen<Dictionary<string, object?>> Rows =
        Gen.Select(Pick(GoodLengths, BadLengths), Pick(GoodLengths, BadLengths), Pick(GoodLengths, BadLengths), Pick(GoodMaterials, BadMaterials), Gen.Int[0, Contacts.Length - 1], Gen.Bool)
            .Select((d, w, g, m, c, gap) => new Dictionary<string, object?>
            {
                ["Name"] = "fuzz",
                ["Material"] = m,
                ["Diameter"] = d,
                ["WireDiameter"] = w,
                ["Gap"] = gap ? g : null,
                ["Contact"] = Contacts[c],
            });

    private static readonly FieldSource[] Sources =
    {
        FieldSource.Uniform("ramp", new RampWaveform(0, 3, 0.01, drive: DriveKind.FluxDensity), Vector3D.UnitZ),
        FieldSource.Uniform("sine", new SineWaveform(0.004, 12000, drive: DriveKind.FluxDensity), Vector3D.UnitZ),
        new FieldSource("fault", new[] { new SourceTerm(new LineConductor(new Axis(new Vector3D(0.1, 0, 0), Vector3D.UnitZ)), new FaultWaveform(40e3, 14, 50, 0.2)) }),
    };

    [Fact]
    public void EveryHostileRowGivesAnAssessmentOrTheModulesOwnErrorAndNeverAnUnfoundedClear()
    {
        (int assessed, int refused) = AssessOrRefuse(Rows, "0N0XIzNsQ1A1", 2000);
        Assert.True(assessed > 100 && refused > 100, assessed + " assessed, " + refused + " refused: the corpus should exercise both");
    }

    /// <summary>
    /// Each generated record through the reader and the engine against each source in turn: an assessment that is
    /// never an unfounded Clear, or one of the module's own exceptions; the counts of each.
    /// </summary>
    private static (int Assessed, int Refused) AssessOrRefuse(Gen<Dictionary<string, object?>> records, string seed, long iterations)
    {
        int assessed = 0, refused = 0;
        Gen.Select(records, Gen.Int[0, Sources.Length - 1]).Sample((row, s) =>
        {
            InductionAssessment a;
            try
            {
                ConductiveItem item = ItemRecordReader.Read(row, MaterialLibrary.BuiltIn, 1);
                a = HazardAssessor.Assess(InductionEngine.Respond(new Scenario(item, Sources[s])), HazardPolicy.Default);
            }
            catch (InductionHazardException)
            {
                refused++;
                return;
            }

            assessed++;
            NeverAnUnfoundedClear(a);
            EveryTextReads(a);
        }, seed: seed, iter: iterations, threads: 1);
        return (assessed, refused);
    }

    /// <summary>
    /// Every text of the assessment and its response reads as words: they are written when first read, after the
    /// assessment is made, so a writer that failed on an odd figure would fail here and not in a report.
    /// </summary>
    private static void EveryTextReads(InductionAssessment a)
    {
        var texts = new List<string> { a.Summary, a.Action, a.Reasons.ToString(), a.Mechanisms.ToString(), a.Response.Regime, a.Response.CurrentSense, a.Response.ModelNotes.ToString() ?? string.Empty };
        texts.AddRange(a.Mechanisms.Select(m => m.Detail));
        texts.AddRange(a.Response.ModelNotes);
        foreach (string text in texts)
        {
            Assert.NotNull(text);
            Assert.DoesNotContain("InductionHazard.", text, StringComparison.Ordinal);
        }

        Assert.NotEmpty(a.Summary);
    }

    /// <summary>Clear only when every margin is a number at least the safety factor; a NaN minimum margin only beside Indeterminate.</summary>
    private static void NeverAnUnfoundedClear(InductionAssessment a)
    {
        if (a.Verdict == Verdict.Clear)
        {
            Assert.True(!double.IsNaN(a.MinimumMargin) && a.MinimumMargin >= a.SafetyFactor, "Clear with a minimum margin of " + a.MinimumMargin);
            foreach (MechanismResult m in a.Mechanisms.Where(m => m.Applies))
            {
                Assert.True(!double.IsNaN(m.Margin) && m.Margin >= a.SafetyFactor, m.Mechanism + " margin " + m.Margin);
                if (m.Margin >= VerdictRules.LargestMargin)
                {
                    double start = a.Response.InitialTemperatureCelsius;
                    (double added, double allowed) = m.Unit == "°C" ? (m.Predicted - start, m.Limit - start) : (m.Predicted, m.Limit);
                    Assert.True(added <= allowed / VerdictRules.LargestMargin, m.Mechanism + ": the largest margin beside a predicted " + m.Predicted + " " + m.Unit);
                }
            }
            Assert.True(Finite.Is(a.PeakEmfVolts), "Clear beside an emf of " + a.PeakEmfVolts);
            Assert.True(Finite.Is(a.PeakTemperatureCelsius), "Clear beside a temperature of " + a.PeakTemperatureCelsius);
        }

        if (double.IsNaN(a.MinimumMargin))
        {
            Assert.Equal(Verdict.Indeterminate, a.Verdict);
        }

        // Every mechanism that was judged has a finite, positive margin: never 0, NaN or infinite for an input that was assessed.
        foreach (MechanismResult m in a.Mechanisms.Where(m => m.Applies && m.Verdict != Verdict.Indeterminate))
        {
            Assert.True(Finite.Is(m.Margin) && m.Margin > 0 && m.Margin <= VerdictRules.LargestMargin, m.Mechanism + " judged with a margin of " + m.Margin);
        }
    }

    private static readonly object?[] Shapes = { "Disc", "Cylinder", "Tube", "Sphere", "Tube" };

    private static readonly Gen<Dictionary<string, object?>> Bodies =
        Gen.Select(Gen.Int[0, Shapes.Length - 1], Pick(GoodLengths, BadLengths), Pick(GoodLengths, BadLengths), Pick(GoodLengths, BadLengths), Pick(GoodMaterials, BadMaterials), Gen.Int[0, Contacts.Length - 1], Gen.Bool)
            .Select((shape, d, t, l, m, c, closed) => new Dictionary<string, object?>
            {
                ["Name"] = "fuzz body",
                ["Shape"] = Shapes[shape],
                ["Material"] = m,
                ["Diameter"] = d,
                ["Thickness"] = (string?)Shapes[shape] == "Disc" ? t : null,
                ["Length"] = (string?)Shapes[shape] is "Cylinder" or "Tube" ? l : null,
                ["WallThickness"] = (string?)Shapes[shape] == "Tube" ? t : null,
                ["ClosedEnds"] = (string?)Shapes[shape] == "Tube" && closed,
                ["Contact"] = Contacts[c],
            });

    [Fact]
    public void EveryHostileBodyGivesAnAssessmentOrTheModulesOwnErrorAndNeverAnUnfoundedClear()
    {
        (int assessed, int refused) = AssessOrRefuse(Bodies, "0N0XIzNsQ1A2", 300);
        Assert.True(assessed > 50 && refused > 20, assessed + " assessed, " + refused + " refused: the corpus should exercise both");
    }
}
