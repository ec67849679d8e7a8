using System;
using System.Globalization;
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

    /// <summary>For an alternating drive: the sense in each half cycle and the current's lag behind the emf.</summary>
    public static string Alternating(double frequencyHertz, double lagRadians, Vector3D normal, Vector3D fieldDirection)
    {
        if (Math.Abs(normal.Dot(fieldDirection)) < 1e-12)
        {
            return "no current: no flux links the loop (its plane contains the field)";
        }

        string along = Directions.Describe(fieldDirection);
        return "alternating at " + SiFormat.Format(frequencyHertz, "Hz") + ": anticlockwise viewed looking along " + along
            + " while the flux along " + along + " rises, clockwise while it falls (Lenz); the current lags the emf by "
            + (lagRadians * 180 / Math.PI).ToString("0", CultureInfo.InvariantCulture) + "°";
    }
}
