using System;
using System.Collections.Generic;
using InductionHazard.Criteria;
using InductionHazard.Fields;
using InductionHazard.Quantities;

namespace InductionHazard.Assessment;

/// <summary>
/// A person's own exposure at a point: the source's flux density against the ICNIRP limit that applies (static
/// below 1 Hz, the reference level at the frequency of a sinusoid), with the implant and projectile lines.
/// </summary>
public sealed record FieldExposure
{
    /// <summary>The point, m.</summary>
    public Vector3D Position { get; init; }

    /// <summary>The source's name.</summary>
    public string SourceName { get; init; } = string.Empty;

    /// <summary>The site's station judged (Test-FieldExposure -Site); null for a point given by its position.</summary>
    public string? Station { get; init; }

    /// <summary>Whose limits judged the point: workers' (Occupational) or the general public's (Public).</summary>
    public ExposureGroup ExposureGroup { get; init; }

    /// <summary>The point's name as a survey's row gives it (its Name, Point or Location column); null for a point given by its position alone.</summary>
    public string? PointName { get; init; }

    /// <summary>The largest |B| over the drive, T.</summary>
    public double PeakFluxDensityTesla { get; init; }

    /// <summary>The field's frequency, Hz (its significant frequency when not a sinusoid).</summary>
    public double FrequencyHertz { get; init; }

    /// <summary>What is compared: "static, peak", "sinusoid, resultant rms" or the weighted peak of a pulsed or mixed field.</summary>
    public string Basis { get; init; } = string.Empty;

    /// <summary>
    /// The value compared with the limit, T: the peak for a static field; for a sinusoid the resultant rms, the root of
    /// the sum of the squares of the three components' rms values (see <see cref="FieldStrength.RmsFluxDensityTesla"/>).
    /// </summary>
    public double ComparedTesla { get; init; }

    /// <summary>The limit, T.</summary>
    public double LimitTesla { get; init; }

    /// <summary>The limit over the compared value; NaN when it cannot be judged.</summary>
    public double Margin { get; init; }

    /// <summary>Clear, Caution, Hazard, or Indeterminate with the reason.</summary>
    public Verdict Verdict { get; init; }

    /// <summary>True where the peak field exceeds 0.5 mT: people with active implants stay out.</summary>
    public bool ImplantLineExceeded { get; init; }

    /// <summary>True where the peak field exceeds 3 mT: ferromagnetic items can become projectiles.</summary>
    public bool ProjectileLineExceeded { get; init; }

    /// <summary>What was found, in words.</summary>
    public string Finding { get; init; } = string.Empty;

    /// <summary>The limits' sources.</summary>
    public IReadOnlyList<string> Standards { get; init; } = Array.Empty<string>();

    /// <summary>The cautions every assessment carries.</summary>
    public IReadOnlyList<string> Cautions { get; init; } = Array.Empty<string>();

    /// <summary>Judges the exposure at a point.</summary>
    /// <param name="source">The source.</param>
    /// <param name="point">The point, m.</param>
    /// <param name="publicExposure">True for the general public's limits, false for occupational ones.</param>
    /// <param name="policy">The safety factor between Clear and Caution.</param>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be evaluated at the point.</exception>
    public static FieldExposure At(FieldSource source, Vector3D point, bool publicExposure, HazardPolicy policy)
    {
        FieldStrength strength = FieldStrength.At(source, point);
        double peak = strength.PeakFluxDensityTesla, f = source.SignificantFrequencyHertz;
        string who = publicExposure ? "general public" : "occupational";
        var standards = new List<string> { ExposureLimits.ActionLevelSource };
        string staticSource = publicExposure ? ExposureLimits.StaticSource : policy.SourceOf("StaticExposureLimit");
        string basis;
        double compared, limit;
        string? indeterminate = null;
        if (!source.IsSinusoidal && ExposureLimits.CountsAsStatic(f))
        {
            basis = "static, peak";
            compared = peak;
            limit = publicExposure ? ExposureLimits.StaticPublicTesla : policy.StaticExposureLimitTesla;
            standards.Add(staticSource);
        }
        else if (source.IsSinusoidal)
        {
            basis = "sinusoid, resultant rms";
            compared = strength.RmsFluxDensityTesla!.Value;
            limit = ExposureLimits.CountsAsStatic(f)
                ? (publicExposure ? ExposureLimits.StaticPublicTesla : policy.StaticExposureLimitTesla)
                : publicExposure ? ExposureLimits.PublicTesla(f) : ExposureLimits.OccupationalTesla(f);
            standards.Add(ExposureLimits.CountsAsStatic(f) ? staticSource : ExposureLimits.TimeVaryingSource);
            if (double.IsNaN(limit))
            {
                indeterminate = "the frequency (" + SiFormat.Format(f, "Hz") + ") is beyond the reference levels used here (1 Hz to 10 MHz)";
            }
        }
        else
        {
            // Neither static nor a sinusoid: the weighted-peak index of the changing part, and the peak against the
            // static limit for the field that stays (a magnet ramped up and held); the smaller margin governs.
            (double index, string? problem) = WeightedPeak.At(source, point, publicExposure);
            standards.Add(ExposureLimits.TimeVaryingSource);
            standards.Add(ExposureLimits.WeightedPeakSource);
            standards.Add(staticSource);
            double staticLimit = publicExposure ? ExposureLimits.StaticPublicTesla : policy.StaticExposureLimitTesla;
            compared = peak;
            if (problem is not null)
            {
                basis = "pulsed or mixed, weighted peak";
                limit = double.NaN;
                indeterminate = "the weighted-peak method cannot be applied: " + problem;
            }
            else if (index > 0 && peak / index < staticLimit)
            {
                basis = "pulsed or mixed, weighted peak (index " + SiFormat.Plain(index) + "; the peak at which it reaches 1 is the limit)";
                limit = peak / index;
            }
            else
            {
                basis = "pulsed or mixed, peak against the static limit (weighted-peak index " + SiFormat.Plain(index) + ")";
                limit = staticLimit;
            }
        }

        double margin = indeterminate is null ? VerdictRules.Margin(limit, compared) : double.NaN;
        Verdict verdict = indeterminate is null ? VerdictRules.FromMargin(margin, policy.SafetyFactor) : Verdict.Indeterminate;
        bool implant = peak > ExposureLimits.ImplantTesla, projectile = peak > ExposureLimits.ProjectileTesla;
        string lines = (implant ? "; above the 0.5 mT line: people with active implants stay out" : string.Empty)
            + (projectile ? "; above the 3 mT line: loose ferromagnetic items can become projectiles" : string.Empty);
        string finding = indeterminate is not null
            ? "Indeterminate: " + indeterminate + lines
            : verdict + ": " + basis + " " + SiFormat.Format(compared, "T") + " against the " + who + " limit " + SiFormat.Format(limit, "T")
              + " (margin " + SiFormat.Margin(margin) + ")"
              + (basis.StartsWith("static", StringComparison.Ordinal) && !publicExposure ? "; the limbs alone may take 8 T" : string.Empty) + lines;
        return new FieldExposure
        {
            Position = point,
            SourceName = source.Name,
            PeakFluxDensityTesla = peak,
            FrequencyHertz = f,
            Basis = basis,
            ComparedTesla = compared,
            LimitTesla = limit,
            Margin = margin,
            Verdict = verdict,
            ExposureGroup = publicExposure ? ExposureGroup.Public : ExposureGroup.Occupational,
            ImplantLineExceeded = implant,
            ProjectileLineExceeded = projectile,
            Finding = finding,
            Standards = standards,
            Cautions = Criteria.Cautions.For(standards),
        };
    }
}
