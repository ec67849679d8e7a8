using InductionHazard.Waveforms;

namespace InductionHazard.Fields;

/// <summary>One term of a source: a geometry b_k(p) driven by a waveform d_k(t).</summary>
public sealed class SourceTerm
{
    /// <summary>Creates the term.</summary>
    public SourceTerm(IFieldGeometry geometry, FieldWaveform waveform)
    {
        Geometry = geometry;
        Waveform = waveform;
    }

    /// <summary>The field per unit drive.</summary>
    public IFieldGeometry Geometry { get; }

    /// <summary>The drive in time.</summary>
    public FieldWaveform Waveform { get; }

    /// <summary>"uniform field along +z, sine 1 mT peak at 50 Hz".</summary>
    public override string ToString() => Geometry.Describe() + ", " + Waveform.Describe();
}
