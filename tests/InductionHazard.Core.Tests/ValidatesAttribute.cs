using System;

namespace InductionHazard.Tests;

/// <summary>
/// Marks a test that checks the module against something outside it: what it compares, the source (a standard, a
/// handbook, a closed form, an independent model; "common practice" or "from memory" where that is all there is)
/// and the tolerance. docs/validation.md is generated from these (ValidationTableTests), so it cannot drift.
/// </summary>
[AttributeUsage(AttributeTargets.Method, AllowMultiple = false)]
internal sealed class ValidatesAttribute : Attribute
{
    public ValidatesAttribute(string compares, string source, string tolerance)
    {
        Compares = compares;
        Source = source;
        Tolerance = tolerance;
    }

    /// <summary>What the test compares.</summary>
    public string Compares { get; }

    /// <summary>Where the expected value comes from.</summary>
    public string Source { get; }

    /// <summary>The tolerance, as the test applies it.</summary>
    public string Tolerance { get; }
}
