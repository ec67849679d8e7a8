using System;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// The sense of an induced current in plain words (Lenz's law: the current's field opposes the change of flux).
/// Viewed looking along the field, a rising flux drives an anticlockwise current and a falling flux a clockwise one.
/// </summary>
internal static class LenzSense
{
    /// <summary>For a transient: the sense at the peak current.</summary>
    /// <param name="peakCurrent">The signed peak current, positive right-handed about the loop normal.</param>
    /// <param name="normal">The loop normal.</param>
    /// <param name="fieldDirection">The direction of the field for a positive drive.</param>
    public static string Transient(double peakCurrent, Vector3D normal, Vector3D fieldDirection)
    {
        double alignment = normal.Dot(fieldDirection);
        if (!Finite.Is(peakCurrent) || !Finite.Is(alignment))
        {
            return "not known: the current could not be found";
        }

        if (peakCurrent == 0 || Math.Abs(alignment) < 1e-12)
        {
            return "no current: no flux links the loop (its plane contains the field)";
        }

        string along = Directions.Describe(fieldDirection);
        bool clockwise = Math.Sign(peakCurrent) * Math.Sign(alignment) > 0;
        return clockwise
            ? "clockwise viewed looking along the field (" + along + "): the flux along " + along + " falls and the current acts to sustain it (Lenz)"
            : "anticlockwise viewed looking along the field (" + along + "): the flux along " + along + " rises and the current opposes the rise (Lenz)";
    }

    /// <summary>
    /// For an alternating drive: the sense by regime, from the current's lag behind the emf. Resistive (lag under
    /// 30°): the current follows the emf, anticlockwise viewed looking along the field while the flux rises. Inductive
    /// (over 60°): the current is in phase with minus the flux, anticlockwise while the flux along the view is
    /// positive (it cancels the flux itself, not its rise). Between: both, a fraction of a quarter cycle apart.
    /// </summary>
    public static string Alternating(double frequencyHertz, double lagRadians, Vector3D normal, Vector3D fieldDirection)
    {
        if (Math.Abs(normal.Dot(fieldDirection)) < 1e-12)
        {
            return "no current: no flux links the loop (its plane contains the field)";
        }

        string along = Directions.Describe(fieldDirection);
        double degrees = lagRadians * 180 / Math.PI;
        string lag = "; the current lags the emf by " + SiFormat.Fixed(degrees, 0, keepZeros: true) + "°";
        string head = "alternating at " + SiFormat.Format(frequencyHertz, "Hz") + ": anticlockwise viewed looking along " + along;
        if (degrees < 30)
        {
            return head + " while the flux along " + along + " rises, clockwise while it falls (Lenz; resistance limits the current, which follows the emf)" + lag;
        }

        if (degrees > 60)
        {
            return head + " while the flux along " + along + " is positive, clockwise while it is negative (inductance limits the current, which cancels the flux itself rather than its rise)" + lag;
        }

        return head + " from when the flux along " + along + " starts to rise until a " + SiFormat.Fixed(degrees / 90, 1, keepZeros: false)
            + " quarter cycle after it peaks (between the resistive and the inductive regimes)" + lag;
    }
}
