using System.Collections.Generic;
using System.Linq;
using CsCheck;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Waveforms;

/// <summary>The sorted, distinct sample times the engine steps and looks through.</summary>
public sealed class DriveSamplingTests
{
    [Fact]
    [Validates("the sample times, breakpoints and contact times sorted and each kept once, 2,000 random lists with repeats, NaN, infinities and both zeros", ".NET's Enumerable.OrderBy then Distinct (general-purpose reference library)", "the same values")]
    public void SortedDistinctGivesWhatOrderingAndDistinctGive()
    {
        // Against the general-purpose library's own OrderBy and Distinct, with repeats, NaN, infinities and both zeros
        // among the values (the engine's times are finite, but the helper must not differ where they are not).
        double[] specials = { double.NaN, double.PositiveInfinity, double.NegativeInfinity, 0.0, -0.0, 1.0, 1e-300 };
        Gen.Select(Gen.Double[-10, 10], Gen.Int[0, 20], Gen.Int[0, specials.Length - 1]).Array[0, 40].Sample(draws =>
        {
            var values = draws.Select(d => d.Item2 < 4 ? specials[d.Item3] : d.Item2 < 10 ? System.Math.Round(d.Item1) : d.Item1).ToList();
            double[] expected = values.OrderBy(v => v).Distinct().ToArray();
            double[] actual = DriveSampling.SortedDistinct(new List<double>(values));
            Assert.Equal(expected.Length, actual.Length);
            for (int i = 0; i < expected.Length; i++)
            {
                Assert.True(expected[i].Equals(actual[i]), "at " + i + ": " + expected[i] + " against " + actual[i]);
            }
        }, seed: "4nQ2fV8sLk01", iter: 2000);
    }
}
