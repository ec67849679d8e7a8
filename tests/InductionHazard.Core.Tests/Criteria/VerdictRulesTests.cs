using System.Linq;
using CsCheck;
using InductionHazard.Criteria;
using Xunit;

namespace InductionHazard.Tests.Criteria;

public class VerdictRulesTests
{
    [Theory]
    [InlineData(0.5, Verdict.Hazard)]
    [InlineData(1.0, Verdict.Caution)]
    [InlineData(1.99, Verdict.Caution)]
    [InlineData(2.0, Verdict.Clear)]
    [InlineData(double.PositiveInfinity, Verdict.Clear)]
    [InlineData(double.NaN, Verdict.Indeterminate)]
    [InlineData(-1.0, Verdict.Indeterminate)]
    public void AMarginBecomesAVerdict(double margin, Verdict expected)
    {
        Assert.Equal(expected, VerdictRules.FromMargin(margin, 2.0));
    }

    [Fact]
    public void NoVerdictsAtAllIsIndeterminate()
    {
        Assert.Equal(Verdict.Indeterminate, VerdictRules.Combine(System.Array.Empty<Verdict>()));
    }

    [Fact]
    public void ANaNMarginNeverCombinesToClearOrCaution()
    {
        Gen.Double[0, 100].Array[0, 6].Sample(margins =>
        {
            var verdicts = margins.Append(double.NaN).Select(m => VerdictRules.FromMargin(m, 2.0)).ToArray();
            Verdict combined = VerdictRules.Combine(verdicts);
            Assert.True(combined is Verdict.Indeterminate or Verdict.Hazard, "combined " + combined + " from " + string.Join(", ", margins));
            Assert.Equal(margins.Any(m => m < 1) ? Verdict.Hazard : Verdict.Indeterminate, combined);
        });
    }

    [Fact]
    public void TheCombinedVerdictIsTheWorstOfFiniteMargins()
    {
        Gen.Double[0.01, 100].Array[1, 6].Sample(margins =>
        {
            Verdict combined = VerdictRules.Combine(margins.Select(m => VerdictRules.FromMargin(m, 2.0)));
            Assert.Equal(VerdictRules.FromMargin(margins.Min(), 2.0), combined);
        });
    }

    [Fact]
    public void TheMarginOfNothingPredictedIsTheLargestStatedAndNeverInfinite()
    {
        Assert.Equal(VerdictRules.LargestMargin, VerdictRules.Margin(50, 0));
        Assert.Equal(VerdictRules.LargestMargin, VerdictRules.Margin(50, 1e-300));
        Assert.Equal(VerdictRules.LargestMargin, VerdictRules.Bounded(double.PositiveInfinity));
        Assert.Equal(2.5, VerdictRules.Margin(50, 20));
        Assert.True(double.IsNaN(VerdictRules.Margin(50, double.NaN)));
    }
}
