using System;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// Checks on when a drive starts and how long its features last, so that a solver stepping in absolute time can
/// resolve them: a start so late that start + duration rounds back to the start would otherwise read as no change.
/// </summary>
public static class DriveTiming
{
    /// <summary>The relative resolution a drive's shortest time scale must keep at its start time: one part in a million.</summary>
    public const double RequiredResolution = 1e-6;

    /// <summary>The spacing of doubles relative to their size, 2^-52.</summary>
    private const double DoubleEpsilon = 2.220446049250313e-16;

    /// <summary>Checks a start time and the drive's shortest time scale (a duration, a period) against each other.</summary>
    /// <param name="startSeconds">When the drive starts, s.</param>
    /// <param name="shortestSeconds">The drive's shortest time scale, s (already range-checked).</param>
    /// <param name="scaleName">The parameter that sets the shortest time scale ("Duration", "Frequency").</param>
    /// <exception cref="InvalidInputException">The start is out of range, or so late that the time scale cannot be resolved.</exception>
    public static void RequireResolvable(double startSeconds, double shortestSeconds, string scaleName)
    {
        PhysicalRanges.StartTime.Check(startSeconds);
        double spacing = Math.Abs(startSeconds) * DoubleEpsilon;
        if (spacing > RequiredResolution * shortestSeconds)
        {
            throw new InvalidInputException(
                "Start",
                "is so late (" + SiFormat.Format(startSeconds, "s") + ") that the drive's " + SiFormat.Format(shortestSeconds, "s")
                + " time scale (from -" + scaleName + ") cannot be resolved in time; measure -Start from nearer the drive, for example 0 s");
        }
    }
}
