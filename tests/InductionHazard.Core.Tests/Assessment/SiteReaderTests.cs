using System.Collections;
using InductionHazard.Assessment;
using InductionHazard.Errors;
using Xunit;

namespace InductionHazard.Tests.Assessment;

public class SiteReaderTests
{
    private static Hashtable Site(Hashtable station) => new() { ["Site"] = "Test site", ["Stations"] = new object[] { station } };

    [Fact]
    public void ReadsAStationWithItsSourcesPlacementAndExposure()
    {
        var station = new Hashtable
        {
            ["Name"] = "Bench", ["Position"] = "0, 250 mm, 0", ["ExposureTime"] = "2 min",
            ["Sources"] = new object[]
            {
                new Hashtable { ["Form"] = "Conductor", ["Axis"] = "x", ["Waveform"] = new Hashtable { ["Form"] = "Sine", ["Amplitude"] = "2 kA", ["Frequency"] = "50 Hz" } },
                new Hashtable { ["Form"] = "Uniform", ["Waveform"] = new Hashtable { ["Form"] = "Ramp", ["From"] = "0 T", ["To"] = "1 mT", ["Duration"] = "1 s" } },
            },
        };
        HazardSite site = SiteReader.Read(Site(station), "site.psd1");
        Station s = site.Find("bench");
        Assert.Equal(2, s.Source.Terms.Count);
        Assert.Equal(0.25, s.Placement.Centre.Y, 12);
        Assert.Equal(120, s.ExposureSeconds);
    }

    [Theory]
    [InlineData("Frequency", "50 T", "Frequency")]
    [InlineData("Amplitud", "2 kA", "Amplitud")]
    public void AProblemNamesTheStationSourceAndValue(string key, string value, string named)
    {
        var waveform = new Hashtable { ["Form"] = "Sine", ["Amplitude"] = "2 kA", ["Frequency"] = "50 Hz" };
        waveform[key] = value;
        var station = new Hashtable { ["Name"] = "Bench", ["Sources"] = new Hashtable { ["Form"] = "Conductor", ["Waveform"] = waveform } };
        var ex = Assert.Throws<DataFileException>(() => SiteReader.Read(Site(station), "site.psd1"));
        Assert.Contains("station 'Bench' source 1 waveform", ex.Message, System.StringComparison.Ordinal);
        Assert.Contains(named, ex.Message, System.StringComparison.Ordinal);
    }

    [Fact]
    public void AnUnknownStationIsAnErrorListingTheStations()
    {
        var station = new Hashtable { ["Name"] = "Bench", ["Sources"] = new Hashtable { ["Form"] = "Uniform", ["Waveform"] = new Hashtable { ["Form"] = "Sine", ["Amplitude"] = "1 mT", ["Frequency"] = "50 Hz" } } };
        HazardSite site = SiteReader.Read(Site(station), "site.psd1");
        var ex = Assert.Throws<InvalidInputException>(() => site.Find("Lab 9"));
        Assert.Contains("Bench", ex.Message, System.StringComparison.Ordinal);
    }
}
