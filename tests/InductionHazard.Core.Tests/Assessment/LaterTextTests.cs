using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Items;
using Xunit;

namespace InductionHazard.Tests.Assessment;

/// <summary>Notes, findings and summaries are written when first read: once, in order, the same on any thread.</summary>
public class LaterTextTests
{
    [Fact]
    public void ANoteWithFiguresIsWrittenWhenFirstReadAndOnlyOnce()
    {
        int written = 0;
        var notes = new TextList();
        notes.Add("first");
        notes.Add(2.5, x =>
        {
            written++;
            return "second at " + x.ToString(System.Globalization.CultureInfo.InvariantCulture);
        });
        notes.Add("third");
        Assert.Equal(0, written);
        Assert.Equal(3, notes.Count);
        Assert.Equal("second at 2.5", notes[1]);
        Assert.Equal("second at 2.5", notes[1]);
        Assert.Equal(new[] { "first", "second at 2.5", "third" }, notes.ToArray());
        Assert.Equal("first; second at 2.5; third", notes.ToString());
        Assert.Equal(1, written);
        var outside = Assert.Throws<ArgumentOutOfRangeException>(() => notes[3]);
        Assert.Equal("index", outside.ParamName);
    }

    [Fact]
    public void ATextListGrowsPastItsFirstRoom()
    {
        var notes = new TextList();
        for (int k = 0; k < 40; k++)
        {
            if (k % 2 == 0)
            {
                notes.Add("note " + k);
            }
            else
            {
                notes.Add(k, n => "note " + n);
            }
        }

        Assert.Equal(Enumerable.Range(0, 40).Select(k => "note " + k), notes);

        // The list's own searches and copies read the later entries as text; from outside it cannot be changed.
        Assert.Contains("note 31", notes);
        Assert.Equal(31, notes.IndexOf("note 31"));
        Assert.Equal(-1, notes.IndexOf("note 40"));
        var copy = new string[41];
        notes.CopyTo(copy, 1);
        Assert.Equal("note 39", copy[40]);
        Assert.Throws<NotSupportedException>(() => ((ICollection<string>)notes).Add("note 40"));
        Assert.Throws<NotSupportedException>(() => ((IList<string>)notes)[0] = "changed");
    }

    [Fact]
    public void AFindingIsWrittenWhenFirstRead()
    {
        int written = 0;
        MechanismResult r = MechanismResult.Judged(HazardMechanism.Torque, "peak torque", 1, 2, "N·m", 2, 2, Array.Empty<string>(), 7, n =>
        {
            written++;
            return "finding " + n;
        });
        Assert.Equal(0, written);
        Assert.Equal("finding 7", r.Detail);
        Assert.Equal("finding 7", r.Detail);
        Assert.Equal(1, written);
    }

    public static TheoryData<string> Cases() => new() { "closed ring, sine", "closed ring, ramp", "split ring, sine", "split ring, short pulse", "fixed frame, ramp", "steel ring, ramp", "loose ring, hot sine" };

    [Theory]
    [MemberData(nameof(Cases))]
    public void EveryTextReadsTheSameOnManyThreadsAtOnceAsOneReadingAlone(string name)
    {
        // Two assessments of one scenario: one read alone, one by eight threads at once (each reading every text,
        // starting at a different one). A slot written twice at once, or torn, would show as a difference.
        string[] alone = Texts(Assess(name));
        InductionAssessment shared = Assess(name);
        var readings = new string[8][];
        using var start = new Barrier(readings.Length);
        Parallel.For(0, readings.Length, new ParallelOptions { MaxDegreeOfParallelism = readings.Length }, k =>
        {
            start.SignalAndWait();
            readings[k] = Texts(shared, rotate: k);
        });
        foreach (string[] reading in readings)
        {
            Assert.Equal(alone, reading);
        }

        // Every text is words, never the name of the type that would have written it.
        Assert.All(alone, t => Assert.DoesNotContain("InductionHazard.", t, StringComparison.Ordinal));
        Assert.All(alone, t => Assert.DoesNotContain("System.", t, StringComparison.Ordinal));
    }

    private static InductionAssessment Assess(string name)
    {
        (ConductiveItem item, FieldSource source) = name switch
        {
            "closed ring, sine" => (Fixtures.Ring(), Fixtures.UniformSine(0.01, 50)),
            "closed ring, ramp" => (Fixtures.Ring(), Fixtures.UniformRamp(0, 1, 0.01)),
            "split ring, sine" => (Fixtures.Ring("Titanium", 0.065, 0.004, gap: 0.02, contact: "Free"), Fixtures.UniformSine(0.02, 50)),
            "split ring, short pulse" => (Fixtures.Ring("Titanium", 0.065, 0.004, gap: 0.02, contact: "Free"), Fixtures.UniformRamp(0, 1, 1e-3)),
            "fixed frame, ramp" => (Fixtures.Frame("Aluminium", 0.3, 0.2, 0.004, contact: "Fixed"), Fixtures.UniformRamp(0, 1.5, 0.05)),
            "steel ring, ramp" => (Fixtures.Ring("Steel"), Fixtures.UniformRamp(0, 3, 1)),
            _ => (Fixtures.Ring(contact: "Free"), Fixtures.UniformSine(0.004, 12000)),
        };
        return HazardAssessor.Assess(Fixtures.Respond(item, source), HazardPolicy.Default);
    }

    /// <summary>Every text of an assessment and its response, read from a place in the list on.</summary>
    private static string[] Texts(InductionAssessment a, int rotate = 0)
    {
        var slots = new List<Func<string>> { () => a.Summary, () => a.Action, () => a.Response.Regime, () => a.Response.CurrentSense, () => a.Reasons.ToString(), () => a.Mechanisms.ToString() };
        for (int k = 0; k < a.Mechanisms.Count; k++)
        {
            int at = k;
            slots.Add(() => a.Mechanisms[at].Detail);
        }

        for (int k = 0; k < a.Response.ModelNotes.Count; k++)
        {
            int at = k;
            slots.Add(() => a.Response.ModelNotes[at]);
        }

        var texts = new string[slots.Count];
        for (int i = 0; i < slots.Count; i++)
        {
            int k = (i + rotate) % slots.Count;
            texts[k] = slots[k]();
        }

        return texts;
    }
}
