using System;
using System.Collections;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using Xunit;

namespace InductionHazard.Tests.Criteria;

/// <summary>Site policies read from data: good ones merge over the published limits, hostile ones are refused naming the key.</summary>
public sealed class PolicyReaderTests
{
    private static readonly object?[] Hostile =
    {
        double.NaN, double.PositiveInfinity, double.NegativeInfinity, -1.0, 0.0, 5e-324, 1e308, "1e308 V", "25 A", "2 T", "", "   ", "abc", "١٨ V",
        "0x10", "1,5 V", true, new Hashtable(), new object[] { 1, 2 }, "25 V; 30 V", "-25 V",
    };

    private static readonly Dictionary<string, object?[]> Good = new()
    {
        ["SafetyFactor"] = new object?[] { 1.0, 2.5, 3, "4" },
        ["AlternatingVoltageLimit"] = new object?[] { "25 V", 30.0, "0.05 kV", "12 V" },
        ["DirectVoltageLimit"] = new object?[] { "60 V", 120, "1 kV" },
        ["ImpulseChargeLimit"] = new object?[] { "20 uC", 4.5e-5, "0.01 mC" },
        ["BodyResistance"] = new object?[] { "1 kohm", 750, "2000 ohm" },
        ["StaticExposureLimit"] = new object?[] { "4 T", 8, "500 mT" },
        ["ThermalDoseLimit"] = new object?[] { 1.0, 0.5, "2" },
        ["TouchTime"] = new object?[] { "2 s", 0.5, "500 ms" },
        ["LaunchSpeedLimit"] = new object?[] { "2 m/s", 1.5, "0.5 m/s" },
    };

    [Fact]
    public void APolicyTableMergesOverThePublishedLimitsAndNamesTheSiteAsTheSourceOfWhatItSets()
    {
        HazardPolicy p = PolicyReader.Read(new Hashtable { ["Name"] = "Bay 2", ["AlternatingVoltageLimit"] = "25 V", ["TouchTime"] = "2 s" }, "bay2.psd1");
        Assert.Equal(25.0, p.AlternatingVoltageLimitRms);
        Assert.Equal(2.0, p.TouchSeconds);
        Assert.Equal(HazardPolicy.Default.DirectVoltageLimit, p.DirectVoltageLimit);
        Assert.StartsWith("site policy 'Bay 2': AlternatingVoltageLimit = 25 V", p.SourceOf("AlternatingVoltageLimit"), StringComparison.Ordinal);
        Assert.Equal(Standards.ExtraLowVoltage, p.SourceOf("DirectVoltageLimit"));
        Assert.True(p.IsSitePolicy);
        Assert.NotEqual(HazardPolicy.Default.Fingerprint, p.Fingerprint);
        Assert.Equal(p.Fingerprint, PolicyReader.Read(new Hashtable { ["Name"] = "Bay 2", ["TouchTime"] = 2.0, ["AlternatingVoltageLimit"] = 25 }, "other.psd1").Fingerprint);
    }

    [Fact]
    public void APolicyMayJudgeThePublicsExposureAndSaysSoInItsSourceAndFingerprint()
    {
        HazardPolicy visitors = PolicyReader.Read(new Hashtable { ["Name"] = "Gallery", ["ExposureGroup"] = "public" }, "gallery.psd1");
        Assert.Equal(ExposureGroup.Public, visitors.ExposureGroup);
        Assert.True(visitors.IsSitePolicy);
        Assert.Equal("site policy 'Gallery': ExposureGroup = Public", visitors.ExposureGroupSource);
        HazardPolicy workers = PolicyReader.Read(new Hashtable { ["Name"] = "Gallery" }, "gallery.psd1");
        Assert.Equal(ExposureGroup.Occupational, workers.ExposureGroup);
        Assert.False(workers.IsSitePolicy);
        Assert.NotEqual(workers.Fingerprint, visitors.Fingerprint);

        // Naming the default group changes nothing, the fingerprint included: a policy that judges workers keeps the one it had.
        HazardPolicy named = PolicyReader.Read(new Hashtable { ["Name"] = "Gallery", ["ExposureGroup"] = "Occupational" }, "gallery.psd1");
        Assert.Equal(workers.Fingerprint, named.Fingerprint);
        Assert.Equal(HazardPolicy.Default.Fingerprint, new HazardPolicy { ExposureGroup = ExposureGroup.Occupational }.Fingerprint);
        Assert.False(new HazardPolicy { ExposureGroup = ExposureGroup.Occupational }.IsSitePolicy);
        Assert.True(new HazardPolicy { ExposureGroup = ExposureGroup.Public }.IsSitePolicy);

        foreach (object bad in new object[] { "Visitors", 1, true, "Public, Occupational" })
        {
            DataFileException ex = Assert.Throws<DataFileException>(() => PolicyReader.Read(new Hashtable { ["ExposureGroup"] = bad }, "gallery.psd1"));
            Assert.Contains("ExposureGroup: '", ex.Message, StringComparison.Ordinal);
            Assert.Contains("is not one of Occupational, Public", ex.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void HostilePolicyTablesGiveAValidPolicyOrAnErrorNamingTheKey()
    {
        // Fixed seed: each table sets some keys to good values, some to hostile ones, and sometimes a key that does not exist.
        var random = new Random(20261202);
        string[] keys = HazardPolicy.Keys.Select(k => k.Name).ToArray();
        int accepted = 0, refused = 0;
        for (int trial = 0; trial < 2000; trial++)
        {
            var table = new Hashtable();
            string? hostileKey = null;
            foreach (string key in keys.Where(_ => random.Next(2) == 0))
            {
                bool hostile = random.Next(5) == 0;
                table[key] = hostile ? Hostile[random.Next(Hostile.Length)] : Good[key][random.Next(Good[key].Length)];
                hostileKey ??= hostile ? key : null;
            }

            if (random.Next(10) == 0)
            {
                table["VoltageLimt"] = "25 V";
                hostileKey ??= "VoltageLimt";
            }

            try
            {
                HazardPolicy p = PolicyReader.Read(table, "fuzz.psd1");
                accepted++;
                Assert.True(p.SafetyFactor >= 1 && Finite.Is(p.SafetyFactor), "safety factor " + p.SafetyFactor);
                foreach (PolicyLimit limit in p.Limits.Where(l => !(l.Key == "LaunchSpeedLimit" && double.IsNaN(l.Value))))
                {
                    Assert.True(Finite.Is(limit.Value) && limit.Value > 0, limit.Key + " = " + limit.Value);
                }
            }
            catch (DataFileException ex)
            {
                refused++;
                Assert.Equal(PolicyReader.ErrorId, ex.ErrorId);
                Assert.True(keys.Append("VoltageLimt").Any(k => ex.Message.Contains(k + ":", StringComparison.Ordinal) || ex.Message.Contains(k + " ", StringComparison.Ordinal)), "no key named in: " + ex.Message);
                Assert.NotNull(hostileKey);
            }
        }

        Assert.True(accepted > 200 && refused > 200, accepted + " accepted, " + refused + " refused");
    }
}
