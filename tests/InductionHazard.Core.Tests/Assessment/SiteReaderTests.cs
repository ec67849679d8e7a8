using System.Collections;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
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

    [Fact]
    public void AStationMayGiveTheAirAroundItAndAnUnlikelyOneIsRefused()
    {
        static Hashtable Station(object? air)
        {
            var station = new Hashtable { ["Name"] = "Furnace mouth", ["Sources"] = new Hashtable { ["Form"] = "Uniform", ["Waveform"] = new Hashtable { ["Form"] = "Sine", ["Amplitude"] = "1.5 mT", ["Frequency"] = "9.6 kHz" } } };
            if (air is not null)
            {
                station["AmbientTemperature"] = air;
            }

            return station;
        }

        Assert.Equal(38.0, SiteReader.Read(Site(Station("38 degC")), "site.psd1").Find("Furnace mouth").AmbientCelsius);
        Assert.Null(SiteReader.Read(Site(Station(null)), "site.psd1").Find("Furnace mouth").AmbientCelsius);
        var ex = Assert.Throws<DataFileException>(() => SiteReader.Read(Site(Station("90 degC")), "site.psd1"));
        Assert.Contains("station 'Furnace mouth'", ex.Message, System.StringComparison.Ordinal);
        Assert.Contains("AmbientTemperature: must be between -50 °C and 60 °C", ex.Message, System.StringComparison.Ordinal);
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
    public void AStationsOwnPolicyIsMergedOverTheSitesAndAppliesThereAlone()
    {
        static Hashtable Mains(string name, object? policy = null)
        {
            var station = new Hashtable { ["Name"] = name, ["Sources"] = new Hashtable { ["Form"] = "Uniform", ["Waveform"] = new Hashtable { ["Form"] = "Sine", ["Amplitude"] = "0.5 mT", ["Frequency"] = "50 Hz" } } };
            if (policy is not null)
            {
                station["Policy"] = policy;
            }

            return station;
        }

        var data = new Hashtable
        {
            ["Site"] = "Test site",
            ["Policy"] = new Hashtable { ["Name"] = "Site rules", ["SafetyFactor"] = 3, ["TouchTime"] = "2 s" },
            ["Stations"] = new object[]
            {
                Mains("Switchroom"),
                Mains("Gallery", new Hashtable { ["ExposureGroup"] = "Public", ["SafetyFactor"] = 4 }),
                Mains("Tour stop", new Hashtable { ["Name"] = "Tour rules", ["ExposureGroup"] = "Public" }),
            },
        };
        HazardSite site = SiteReader.Read(data, "site.psd1");

        Assert.Null(site.Find("Switchroom").Policy);
        Assert.Same(site.Policy, site.PolicyAt("switchroom"));
        HazardPolicy gallery = site.PolicyAt("Gallery")!;
        Assert.Equal("Site rules at Gallery", gallery.Name);
        Assert.Equal(ExposureGroup.Public, gallery.ExposureGroup);
        Assert.Equal(4, gallery.SafetyFactor);
        Assert.Equal(2, gallery.TouchSeconds);
        Assert.Equal(ExposureGroup.Occupational, site.Policy!.ExposureGroup);
        Assert.Equal("Tour rules", site.PolicyAt("Tour stop")!.Name);
        Assert.Equal(3, site.PolicyAt("Tour stop")!.SafetyFactor);
        Assert.NotEqual(site.Policy.Fingerprint, gallery.Fingerprint);

        // Each value cites the policy that set it: the station's own, or the site's that it keeps.
        Assert.Equal("site policy 'Site rules at Gallery': SafetyFactor = 4", gallery.SourceOf("SafetyFactor"));
        Assert.Equal("site policy 'Site rules': TouchTime = 2 s", gallery.SourceOf("TouchTime"));
        Assert.Equal("site policy 'Site rules at Gallery': ExposureGroup = Public", gallery.ExposureGroupSource);
        Assert.Equal("site policy 'Tour rules': ExposureGroup = Public", site.PolicyAt("Tour stop")!.ExposureGroupSource);
        Assert.Equal("site policy 'Site rules': SafetyFactor = 3", site.PolicyAt("Tour stop")!.SourceOf("SafetyFactor"));
        Assert.Equal(HazardPolicy.Default.SourceOf("AlternatingVoltageLimit"), gallery.SourceOf("AlternatingVoltageLimit"));
        Assert.Equal("site policy 'Site rules': TouchTime = 2 s", gallery.For(ExposureGroup.Public).SourceOf("TouchTime"));

        // Without a site policy a station's merges over the published limits.
        data.Remove("Policy");
        HazardPolicy alone = SiteReader.Read(data, "site.psd1").PolicyAt("Gallery")!;
        Assert.Equal("published limits at Gallery", alone.Name);
        Assert.Equal(HazardPolicy.Default.TouchSeconds, alone.TouchSeconds);
        Assert.Null(SiteReader.Read(data, "site.psd1").PolicyAt("Switchroom"));

        // A bad value names the station and the key; a Policy that is neither a table nor a file is refused.
        data["Stations"] = new object[] { Mains("Gallery", new Hashtable { ["ExposureGroup"] = "Visitors" }) };
        var ex = Assert.Throws<DataFileException>(() => SiteReader.Read(data, "site.psd1"));
        Assert.Contains("station 'Gallery', its Policy", ex.Message, System.StringComparison.Ordinal);
        Assert.Contains("ExposureGroup: 'Visitors' is not one of Occupational, Public", ex.Message, System.StringComparison.Ordinal);
        data["Stations"] = new object[] { Mains("Gallery", 3) };
        ex = Assert.Throws<DataFileException>(() => SiteReader.Read(data, "site.psd1"));
        Assert.Contains("Policy: must be a table of policy values", ex.Message, System.StringComparison.Ordinal);
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
