using System;
using Xunit.Sdk;

namespace InductionHazard.Tests;

/// <summary>Assertions on numbers with a relative or absolute tolerance and a readable message.</summary>
internal static class Within
{
    /// <summary>Asserts |actual - expected| &lt;= tolerance |expected|.</summary>
    public static void Relative(double expected, double actual, double tolerance, string what)
    {
        double error = Math.Abs(actual - expected);
        if (!(error <= tolerance * Math.Abs(expected)))
        {
            throw new XunitException($"{what}: expected {expected:G8} within {tolerance:P3}, got {actual:G8} (off by {error / Math.Abs(expected):P4})");
        }
    }

    /// <summary>Asserts |actual - expected| &lt;= tolerance.</summary>
    public static void Absolute(double expected, double actual, double tolerance, string what)
    {
        double error = Math.Abs(actual - expected);
        if (!(error <= tolerance))
        {
            throw new XunitException($"{what}: expected {expected:G8} within ±{tolerance:G4}, got {actual:G8} (off by {error:G4})");
        }
    }
}
