using System.Collections.Generic;

namespace InductionHazard.Criteria;

/// <summary>
/// Margins to verdicts. Margin = limit / predicted value; a margin that is NaN, negative or missing is
/// Indeterminate, never Clear.
/// </summary>
public static class VerdictRules
{
    /// <summary>The verdict of one margin: below 1 Hazard, below the safety factor Caution, else Clear; NaN Indeterminate.</summary>
    public static Verdict FromMargin(double margin, double safetyFactor)
    {
        if (double.IsNaN(margin) || margin < 0 || double.IsNaN(safetyFactor))
        {
            return Verdict.Indeterminate;
        }

        if (margin < 1)
        {
            return Verdict.Hazard;
        }

        return margin < safetyFactor ? Verdict.Caution : Verdict.Clear;
    }

    /// <summary>
    /// The overall verdict of several: Hazard if any is Hazard (a limit is known to be exceeded); otherwise
    /// Indeterminate if any is; otherwise Caution if any is; otherwise Clear. No verdicts at all is Indeterminate.
    /// </summary>
    public static Verdict Combine(IEnumerable<Verdict> verdicts)
    {
        bool any = false, indeterminate = false, caution = false;
        foreach (Verdict v in verdicts)
        {
            any = true;
            switch (v)
            {
                case Verdict.Hazard:
                    return Verdict.Hazard;
                case Verdict.Indeterminate:
                    indeterminate = true;
                    break;
                case Verdict.Caution:
                    caution = true;
                    break;
            }
        }

        if (!any || indeterminate)
        {
            return Verdict.Indeterminate;
        }

        return caution ? Verdict.Caution : Verdict.Clear;
    }

    /// <summary>
    /// The largest margin stated: a billion. Beyond it a margin says nothing more (views show "> 1000" long before),
    /// and a margin stays a finite number for every finite input, nothing predicted included.
    /// </summary>
    public const double LargestMargin = 1e9;

    /// <summary>The margin of a limit over a predicted value, limit / predicted, at most <see cref="LargestMargin"/> (reached when nothing is predicted).</summary>
    public static double Margin(double limit, double predicted)
    {
        if (double.IsNaN(limit) || double.IsNaN(predicted) || predicted < 0)
        {
            return double.NaN;
        }

        return predicted == 0 ? LargestMargin : Bounded(limit / predicted);
    }

    /// <summary>A margin held to at most <see cref="LargestMargin"/>; NaN stays NaN (not judged).</summary>
    public static double Bounded(double margin) => margin > LargestMargin ? LargestMargin : margin;
}
