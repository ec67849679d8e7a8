namespace InductionHazard.Waveforms;

/// <summary>What a waveform's values measure.</summary>
public enum DriveKind
{
    /// <summary>Bare numbers: the source that uses the waveform decides (tesla for a uniform source, amperes for a conductor).</summary>
    Unspecified,

    /// <summary>Magnetic flux density in tesla: the drive of a uniform or mapped field.</summary>
    FluxDensity,

    /// <summary>Electric current in amperes: the drive of a conductor or coil.</summary>
    Current,
}
