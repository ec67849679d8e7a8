using System;
using System.Globalization;

namespace InductionHazard.Quantities;

/// <summary>
/// The span of values an input can physically take for the things this module assesses, with the reason for
/// each bound. A value outside is an error naming the field, never a number carried into the physics.
/// </summary>
/// <param name="Field">The input, as the user names it ("Gap", "ExposureTime").</param>
/// <param name="Minimum">The smallest value accepted, in <paramref name="Unit"/> (SI).</param>
/// <param name="Maximum">The largest value accepted, in <paramref name="Unit"/> (SI).</param>
/// <param name="Unit">The SI symbol of the bounds ("m", "s", "°C").</param>
/// <param name="Reason">Why values outside are refused, in a few words.</param>
public sealed record PhysicalRange(string Field, double Minimum, double Maximum, string Unit, string Reason)
{
    /// <summary>True when the value is finite and within the bounds.</summary>
    public bool Contains(double value) => Finite.Is(value) && value >= Minimum && value <= Maximum;

    /// <summary>What is wrong with a value outside, as a sentence fragment after the field name; null when it is inside.</summary>
    public string? Problem(double value)
    {
        if (Contains(value))
        {
            return null;
        }

        return "must be between " + Show(Minimum) + " and " + Show(Maximum)
            + " (" + Reason + "); got " + (Finite.Is(value) ? Show(value) : value.ToString(CultureInfo.InvariantCulture));
    }

    /// <summary>
    /// A bound or value with its unit: an SI prefix for the base units (but long times in plain seconds, as nobody
    /// reads "Ms" or "kT", with the hours beside them from an hour to a hundred: "28800 s = 8 h"), plain figures for
    /// compound units and °C.
    /// </summary>
    private string Show(double value)
    {
        bool prefixed = Unit is "m" or "Hz" or "A" || (Unit is "s" or "T" && Math.Abs(value) < 1000);
        string shown = prefixed ? SiFormat.Format(value, Unit) : (SiFormat.Plain(value) + " " + Unit).Trim();
        return Unit == "s" && Math.Abs(value) >= 3600 && Math.Abs(value) < 360_000 ? shown + " = " + SiFormat.Plain(value / 3600) + " h" : shown;
    }

    /// <summary>Checks a value and returns it.</summary>
    /// <exception cref="Errors.InvalidInputException">The value is outside the range or not finite.</exception>
    public double Check(double value)
    {
        string? problem = Problem(value);
        if (problem is not null)
        {
            throw new Errors.InvalidInputException(Field, problem);
        }

        return value;
    }

    /// <summary>The same bounds and reason under another field name.</summary>
    public PhysicalRange For(string field) => this with { Field = field };
}
