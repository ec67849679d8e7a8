using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;
using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>
/// A magnetic field source in air: B(p, t) = sum over terms of b_k(p) d_k(t). The first slice of the module
/// has the uniform field; conductors, coils and dipoles add terms of their own.
/// </summary>
public sealed class FieldSource
{
    /// <summary>Creates a source from its terms.</summary>
    /// <exception cref="InvalidInputException">No terms, or a waveform whose drive does not fit its geometry.</exception>
    public FieldSource(string name, IReadOnlyList<SourceTerm> terms)
    {
        if (terms.Count == 0)
        {
            throw new InvalidInputException("Source", "a source needs at least one term");
        }

        foreach (SourceTerm term in terms)
        {
            if (term.Waveform.Drive != DriveKind.Unspecified && term.Waveform.Drive != term.Geometry.Drive)
            {
                throw new InvalidInputException(
                    "Waveform",
                    "the " + term.Geometry.Describe() + " is driven by " + DriveWords(term.Geometry.Drive)
                    + ", but the waveform is in " + DriveWords(term.Waveform.Drive));
            }

            PhysicalRange range = term.Geometry.Drive == DriveKind.Current ? PhysicalRanges.Current : PhysicalRanges.FluxDensity;
            if (range.Problem(term.Waveform.PeakValue) is { } problem)
            {
                throw new InvalidInputException("Waveform", "its peak " + problem);
            }
        }

        Name = string.IsNullOrWhiteSpace(name) ? "source" : name.Trim();
        Terms = terms.ToArray();
        StartSeconds = Terms.Min(t => t.Waveform.StartSeconds);
        EndSeconds = Terms.Max(t => t.Waveform.EndSeconds);
    }

    /// <summary>The source's name, as it appears in assessments and reports.</summary>
    public string Name { get; }

    /// <summary>The terms that sum to the field.</summary>
    public IReadOnlyList<SourceTerm> Terms { get; }

    /// <summary>The form of the source: "Uniform", "Conductor", "Coil" ... for one kind of geometry, "Composite" for a mix.</summary>
    public string Kind
    {
        get
        {
            string[] kinds = Terms.Select(t => t.Geometry.GetType().Name.Replace("Field", string.Empty)).Distinct().ToArray();
            return kinds.Length == 1 ? kinds[0] : "Composite";
        }
    }

    /// <summary>Several sources as one: their terms summed (the field in air is linear in each drive).</summary>
    /// <exception cref="InvalidInputException">No source is given.</exception>
    public static FieldSource Combine(IReadOnlyList<FieldSource> sources, string? name = null)
    {
        if (sources.Count == 0)
        {
            throw new InvalidInputException("Source", "give at least one source");
        }

        return sources.Count == 1 && name is null
            ? sources[0]
            : new FieldSource(name ?? string.Join(" + ", sources.Select(s => s.Name)), sources.SelectMany(s => s.Terms).ToArray());
    }

    /// <summary>Creates a uniform source along a direction driven by a waveform in tesla.</summary>
    public static FieldSource Uniform(string name, FieldWaveform waveform, Vector3D direction) =>
        new(name, new[] { new SourceTerm(new UniformField(direction), waveform) });

    /// <summary>A one-line description.</summary>
    public string Describe() =>
        Name + ": " + string.Join(" + ", Terms.Select(t => t.Geometry.Describe() + ", " + t.Waveform.Describe()));

    /// <inheritdoc />
    public override string ToString() => Describe();

    private static string DriveWords(DriveKind drive) => drive switch
    {
        DriveKind.FluxDensity => "a flux density (tesla)",
        DriveKind.Current => "a current (amperes)",
        _ => "unspecified units",
    };

    /// <summary>The union of the terms' breakpoints strictly between from and to (finite ones), sorted and distinct.</summary>
    public IReadOnlyList<double> BreakpointsBetween(double from, double to)
    {
        var within = new List<double>();
        for (int k = 0; k < Terms.Count; k++)
        {
            IReadOnlyList<double> breakpoints = Terms[k].Waveform.Breakpoints;
            for (int i = 0; i < breakpoints.Count; i++)
            {
                double b = breakpoints[i];
                if (b > from && b < to && !double.IsInfinity(b))
                {
                    within.Add(b);
                }
            }
        }

        return Waveforms.DriveSampling.SortedDistinct(within);
    }

    /// <summary>The highest significant frequency over the terms, Hz.</summary>
    public double SignificantFrequencyHertz
    {
        get
        {
            // By a loop, as Enumerable.Max would (every assessment asks).
            double highest = Terms[0].Waveform.SignificantFrequencyHertz;
            for (int k = 1; k < Terms.Count; k++)
            {
                double f = Terms[k].Waveform.SignificantFrequencyHertz;
                if (f > highest || double.IsNaN(highest))
                {
                    highest = f;
                }
            }

            return highest;
        }
    }

    /// <summary>The earliest start of any term, s (found once: the terms are copied when the source is made, and a waveform does not change).</summary>
    public double StartSeconds { get; }

    /// <summary>The latest end of any term, s (infinity when one runs on).</summary>
    public double EndSeconds { get; }

    /// <summary>True when every term is periodic with the same period (a phasor-capable source).</summary>
    public bool IsPeriodic => _periodic != 0 ? _periodic == 2 : Remember(ref _periodic,
        Terms.All(t => t.Waveform.IsPeriodic) && Terms.Select(t => t.Waveform.PeriodSeconds).Distinct().Count() == 1);

    /// <summary>True when every term is a sinusoid of one frequency.</summary>
    public bool IsSinusoidal => _sinusoidal != 0 ? _sinusoidal == 2 : Remember(ref _sinusoidal, IsPeriodic && Terms.All(t => t.Waveform is SineWaveform));

    // Found once (0 not yet, 1 false, 2 true: one word, so any thread may read it): the terms are copied when the
    // source is made, and a waveform does not change.
    private int _periodic;
    private int _sinusoidal;

    /// <summary>
    /// The times at which the drives are sampled for their extremes (<see cref="DriveSampling.Times"/> over the terms'
    /// waveforms), found once: every transient assessment at this source reads them twice. Shared: not to be changed.
    /// </summary>
    internal double[] DriveTimes => _driveTimes ??= DriveSampling.Times(Terms.Select(t => t.Waveform).ToArray());

    private double[]? _driveTimes;

    private static bool Remember(ref int known, bool value)
    {
        known = value ? 2 : 1;
        return value;
    }

    /// <summary>The field per unit drive of every term at a point.</summary>
    /// <exception cref="FieldEvaluationException">The point is on a conductor, outside a map, or where a model does not hold.</exception>
    public Vector3D[] FieldPerUnitDrive(Vector3D point) => Terms.Select(t => t.Geometry.FieldPerUnitDrive(point)).ToArray();
}
