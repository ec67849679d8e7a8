using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Quantities;

namespace InductionHazard.Reporting;

/// <summary>
/// What every report format says, worked out once: the assessments in input order, the counts by verdict, station
/// and governing mechanism, the worst items first, and the provenance (module version, time, the policies with their
/// fingerprints, a fingerprint of all the inputs, the cautions and the standards whose limits were used).
/// </summary>
public sealed class HazardReport
{
    private readonly Dictionary<InductionAssessment, int> _index = new();

    /// <summary>Verdicts from the one that needs action first: Hazard, Indeterminate, Caution, Clear.</summary>
    public static IReadOnlyList<Verdict> VerdictsBySeverity { get; } = new[] { Verdict.Hazard, Verdict.Indeterminate, Verdict.Caution, Verdict.Clear };

    /// <summary>Builds the report's content.</summary>
    /// <param name="assessments">The assessments, in the order they were made.</param>
    /// <param name="title">The report's title; null for a default.</param>
    /// <param name="site">The site's name, if any.</param>
    /// <param name="generatedUtc">When the report is made.</param>
    /// <param name="notAssessed">The inputs that could not be assessed, each with why (the error's message), so that none is lost from the report.</param>
    public HazardReport(IEnumerable<InductionAssessment> assessments, string? title, string? site, DateTime generatedUtc, IEnumerable<string>? notAssessed = null)
    {
        Assessments = assessments.ToArray();
        NotAssessed = notAssessed?.ToArray() ?? Array.Empty<string>();
        Site = string.IsNullOrWhiteSpace(site) ? string.Empty : site!.Trim();
        Title = string.IsNullOrWhiteSpace(title) ? "Induction hazard assessment" + (Site.Length > 0 ? ": " + Site : string.Empty) : title!.Trim();
        GeneratedUtc = generatedUtc.ToUniversalTime().ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture);
        ModuleVersion = HazardAssessor.ModuleVersion;
        ModuleVersions = Assessments.Select(a => a.ModuleVersion).Distinct().ToArray();
        Policies = Assessments.Select(a => new PolicyUsed(a.PolicyName, a.SafetyFactor, a.PolicyHash, a.ExposureGroup)).Distinct().ToArray();
        InputsHash = TextHash.Sha256(string.Join("\n", Assessments.Select(a => a.InputHash)));
        Standards = Assessments.SelectMany(a => a.Standards).Distinct().ToArray();
        Cautions = new[] { Criteria.Cautions.EngineeringEstimate, Criteria.Cautions.Governance, Criteria.Cautions.Indeterminate }
            .Concat(Assessments.SelectMany(a => a.Cautions).Where(c => !c.StartsWith("Limits from:", StringComparison.Ordinal)))
            .Distinct().ToArray();
        Stations = Assessments.Select(a => a.StationName).Distinct().ToArray();
        WorstRows = Assessments.Select((a, i) => (a, i))
            .OrderBy(p => Severity(p.a.Verdict)).ThenBy(p => double.IsNaN(p.a.MinimumMargin) ? double.MaxValue : p.a.MinimumMargin).ThenBy(p => p.i)
            .Select(p => p.i).ToArray();
        Worst = WorstRows.Select(i => Assessments[i]).ToArray();
        for (int i = 0; i < Assessments.Count; i++)
        {
            if (!_index.ContainsKey(Assessments[i]))
            {
                _index.Add(Assessments[i], i);
            }
        }

        InventoryColumns = Assessments.SelectMany(a => a.Inventory.Keys).Distinct(StringComparer.OrdinalIgnoreCase).ToArray();
    }

    /// <summary>The title.</summary>
    public string Title { get; }

    /// <summary>The site's name, or empty.</summary>
    public string Site { get; }

    /// <summary>When the report was made, ISO 8601 UTC.</summary>
    public string GeneratedUtc { get; }

    /// <summary>The version of the module writing the report.</summary>
    public string ModuleVersion { get; }

    /// <summary>The module versions that made the assessments (one, unless assessments from several versions were mixed).</summary>
    public IReadOnlyList<string> ModuleVersions { get; }

    /// <summary>The assessments, in input order.</summary>
    public IReadOnlyList<InductionAssessment> Assessments { get; }

    /// <summary>The inputs that could not be assessed, each as the error that says which row and why.</summary>
    public IReadOnlyList<string> NotAssessed { get; }

    /// <summary>The assessments, the one that needs action first leading: by verdict (Hazard, Indeterminate, Caution, Clear), then smallest margin.</summary>
    public IReadOnlyList<InductionAssessment> Worst { get; }

    /// <summary>The positions in <see cref="Assessments"/> (0-based) in the order of <see cref="Worst"/>.</summary>
    public IReadOnlyList<int> WorstRows { get; }

    /// <summary>The policies applied, each with its safety factor and fingerprint.</summary>
    public IReadOnlyList<PolicyUsed> Policies { get; }

    /// <summary>A SHA-256 over the fingerprints of every assessment's inputs, in order: the same inputs give the same value.</summary>
    public string InputsHash { get; }

    /// <summary>The standards and sources of every limit applied.</summary>
    public IReadOnlyList<string> Standards { get; }

    /// <summary>The cautions every report carries.</summary>
    public IReadOnlyList<string> Cautions { get; }

    /// <summary>The stations named by the assessments, in order of first appearance (empty text: no station).</summary>
    public IReadOnlyList<string> Stations { get; }

    /// <summary>The inventory's own columns over all assessments, in order of first appearance.</summary>
    public IReadOnlyList<string> InventoryColumns { get; }

    /// <summary>How many assessments have a verdict.</summary>
    public int Count(Verdict verdict, string? station = null) =>
        Assessments.Count(a => a.Verdict == verdict && (station is null || a.StationName == station));

    /// <summary>How many assessments each governing mechanism decides, most first (for verdicts other than Clear).</summary>
    public IReadOnlyList<(string Mechanism, int Count)> GoverningCounts() =>
        Assessments.Where(a => a.Verdict != Verdict.Clear)
            .GroupBy(a => a.GoverningMechanism?.ToString() ?? "none")
            .Select(g => (g.Key, g.Count()))
            .OrderByDescending(p => p.Item2).ThenBy(p => p.Key, StringComparer.Ordinal)
            .ToArray();

    /// <summary>Where an assessment stands in <see cref="Assessments"/> (its first place, if given twice).</summary>
    public int IndexOf(InductionAssessment assessment) => _index.TryGetValue(assessment, out int i) ? i : -1;

    /// <summary>The position of a verdict in <see cref="VerdictsBySeverity"/>.</summary>
    public static int Severity(Verdict verdict) => verdict switch
    {
        Verdict.Hazard => 0,
        Verdict.Indeterminate => 1,
        Verdict.Caution => 2,
        _ => 3,
    };

    /// <summary>" (judged at the general public's limits)" for an assessment that judged its person as one of the public; else nothing.</summary>
    public static string GroupNote(InductionAssessment a) =>
        a.ExposureGroup == Criteria.ExposureGroup.Public ? " (judged at the general public's limits)" : string.Empty;

    /// <summary>The text a reader sees for where an assessment came from: "row 7".</summary>
    public static string RowText(InductionAssessment a) =>
        a.RowNumber is { } r ? r.ToString(CultureInfo.InvariantCulture) : string.Empty;
}

/// <summary>A policy an assessment applied.</summary>
/// <param name="Name">The policy's name.</param>
/// <param name="SafetyFactor">Its safety factor.</param>
/// <param name="Fingerprint">Its SHA-256 fingerprint.</param>
/// <param name="ExposureGroup">Whose exposure it judges: workers or the general public.</param>
public sealed record PolicyUsed(string Name, double SafetyFactor, string Fingerprint, Criteria.ExposureGroup ExposureGroup = Criteria.ExposureGroup.Occupational)
{
    /// <summary>", for the general public's exposure" where it judges the public, else nothing: words for a policy's line.</summary>
    public string GroupWords => ExposureGroup == Criteria.ExposureGroup.Public ? ", for the general public's exposure" : string.Empty;
}
