using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Text;
using System.Text.RegularExpressions;
using Xunit;

namespace InductionHazard.Tests;

/// <summary>
/// docs/validation.md is generated from the tests: every xunit test marked [Validates] and every Pester test
/// preceded by a "# Validates: compares | source | tolerance" comment is one row. The committed table must equal
/// the generated one, so a test added, removed or untagged without the table changing fails here. To rewrite
/// the table: set INDUCTIONHAZARD_WRITE_VALIDATION=1 and run this test (build.ps1 Validation does).
/// </summary>
public class ValidationTableTests
{
    private static readonly Regex PesterTag = new(@"#\s*Validates:\s*(?<compares>[^|]+)\|(?<source>[^|]+)\|(?<tolerance>.+)\r?\n\s*It\s+'(?<name>(?:[^']|'')+)'", RegexOptions.CultureInvariant);

    private const string Header = @"# Validation

Each check of the module's physics against something outside the project: the test, what it compares, the
source, and the tolerance. Tests are in tests/InductionHazard.Core.Tests (xunit) unless marked Pester.

This file is generated from the tests themselves (the [Validates] attribute on an xunit test, a
`# Validates: compares | source | tolerance` comment above a Pester test) and checked on every test run:
do not edit it by hand; tag the test and run `dotnet pwsh -NoProfile -File build.ps1 Validation`.

| Test | Compares | Source | Tolerance |
|---|---|---|---|
";

    /// <summary>The repository root: the folder above this assembly's that holds docs/validation.md.</summary>
    private static string Root()
    {
        string? dir = AppContext.BaseDirectory;
        while (dir is not null && !File.Exists(Path.Combine(dir, "docs", "validation.md")))
        {
            dir = Path.GetDirectoryName(dir);
        }

        return dir ?? throw new InvalidOperationException("docs/validation.md not found above " + AppContext.BaseDirectory);
    }

    private static string Cell(string text) => text.Trim().Replace("|", "\\|");

    /// <summary>The table as the tests define it.</summary>
    internal static string Generate(string root)
    {
        var rows = new List<string>();
        foreach (MethodInfo method in typeof(ValidationTableTests).Assembly.GetTypes()
            .SelectMany(t => t.GetMethods(BindingFlags.Public | BindingFlags.Instance | BindingFlags.DeclaredOnly))
            .Where(m => m.GetCustomAttribute<ValidatesAttribute>() is not null)
            .OrderBy(m => m.DeclaringType!.Namespace, StringComparer.Ordinal)
            .ThenBy(m => m.DeclaringType!.Name, StringComparer.Ordinal)
            .ThenBy(m => m.MetadataToken))
        {
            ValidatesAttribute v = method.GetCustomAttribute<ValidatesAttribute>()!;
            Assert.True(method.GetCustomAttribute<FactAttribute>() is not null, method.Name + " is tagged [Validates] but is not a test");
            rows.Add("| `" + method.DeclaringType!.Name + "." + method.Name + "` | " + Cell(v.Compares) + " | " + Cell(v.Source) + " | " + Cell(v.Tolerance) + " |");
        }

        foreach (string file in Directory.GetFiles(Path.Combine(root, "tests"), "*.Tests.ps1").OrderBy(f => f, StringComparer.Ordinal))
        {
            string text = File.ReadAllText(file);
            string command = Path.GetFileName(file).Replace(".Tests.ps1", string.Empty);
            foreach (Match m in PesterTag.Matches(text))
            {
                rows.Add("| Pester `" + command + "` \"" + m.Groups["name"].Value.Replace("''", "'") + "\" | " + Cell(m.Groups["compares"].Value) + " | "
                    + Cell(m.Groups["source"].Value) + " | " + Cell(m.Groups["tolerance"].Value) + " |");
            }
        }

        var table = new StringBuilder(Header.Replace("\r\n", "\n"));
        foreach (string row in rows)
        {
            table.Append(row).Append('\n');
        }

        table.Append('\n').Append(rows.Count).Append(" checks.\n");
        return table.ToString();
    }

    [Fact]
    public void TheValidationTableIsGeneratedFromTheTaggedTests()
    {
        string root = Root();
        string path = Path.Combine(root, "docs", "validation.md");
        string generated = Generate(root);
        if (Environment.GetEnvironmentVariable("INDUCTIONHAZARD_WRITE_VALIDATION") == "1")
        {
            File.WriteAllText(path, generated);
        }

        string committed = File.ReadAllText(path).Replace("\r\n", "\n");
        Assert.True(
            committed == generated,
            "docs/validation.md differs from the table the tagged tests define (a tag added, changed or removed?); run build.ps1 Validation to regenerate it and review the difference");
    }

    [Fact]
    public void AtLeastSixtyChecksAgainstOutsideSourcesAreListed()
    {
        int checks = Generate(Root()).Split('\n').Count(l => l.StartsWith("| `", StringComparison.Ordinal) || l.StartsWith("| Pester", StringComparison.Ordinal));
        Assert.True(checks >= 60, checks + " checks");
    }
}
