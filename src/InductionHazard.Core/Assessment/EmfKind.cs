namespace InductionHazard.Assessment;

/// <summary>The time course of the induced emf, which sets the voltage limit that applies.</summary>
public enum EmfKind
{
    /// <summary>An alternating emf (a sinusoidal drive): limits in rms.</summary>
    Alternating,

    /// <summary>A unidirectional pulse (a ramp): limits for ripple-free d.c.</summary>
    Unidirectional,
}
