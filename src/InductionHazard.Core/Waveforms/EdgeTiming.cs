namespace InductionHazard.Waveforms;

/// <summary>Relations between the time course of an edge and its frequency content.</summary>
public static class EdgeTiming
{
    /// <summary>
    /// Knee factor 0.35: an edge of rise time t_r has significant content up to about 0.35 / t_r.
    /// Common practice (the 10-90 % rise time of a single-pole response is 0.35 / bandwidth).
    /// </summary>
    public const double KneeFactor = 0.35;

    /// <summary>The highest significant frequency of an edge with the given rise time, Hz.</summary>
    public static double KneeFrequencyHertz(double riseSeconds) => KneeFactor / riseSeconds;
}
