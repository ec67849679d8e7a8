using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Fields;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;
using Xunit;

namespace InductionHazard.Tests.Fields;

public class BreakpointsTests
{
    [Validates("a source's breakpoints strictly between two times, sorted and each once, 300 random sources of two to four terms sharing corners", ".NET's Enumerable.SelectMany, Where, Distinct and OrderBy (general-purpose reference library)", "the same values")]
    [Fact]
    public void TheBreakpointsBetweenTwoTimesAreEveryTermsOwnWithinThemSortedAndEachOnce()
    {
        // Two to four piecewise-linear terms whose corners share times (on a coarse grid, so that terms repeat each
        // other's), against the union written with LINQ: strictly inside the span, ascending, each time once.
        var random = new Random(20261205);
        for (int trial = 0; trial < 300; trial++)
        {
            var sources = new List<FieldSource>();
            int count = 2 + random.Next(3);
            for (int k = 0; k < count; k++)
            {
                double[] times = Enumerable.Range(0, 2 + random.Next(6)).Select(_ => random.Next(40) * 0.25).Distinct().OrderBy(t => t).ToArray();
                if (times.Length < 2)
                {
                    times = new[] { 0.0, 1.0 };
                }

                double[] values = times.Select(_ => random.NextDouble()).ToArray();
                sources.Add(FieldSource.Uniform("term " + k, new PiecewiseLinearWaveform("corners", times, values, DriveKind.FluxDensity, "corners"), Vector3D.UnitZ));
            }

            FieldSource source = FieldSource.Combine(sources);
            double from = random.Next(-4, 20) * 0.25, to = from + (random.Next(0, 40) * 0.25);
            double[] expected = source.Terms.SelectMany(t => t.Waveform.Breakpoints).Where(b => b > from && b < to).Distinct().OrderBy(b => b).ToArray();
            Assert.Equal(expected, source.BreakpointsBetween(from, to));
        }
    }
}
