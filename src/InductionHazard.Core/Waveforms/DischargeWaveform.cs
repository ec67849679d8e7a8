using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// A capacitor bank C charged to V0 discharged into a coil of inductance L and resistance R (series RLC circuit
/// theory, any circuits text): with a = R / 2L and w0^2 = 1 / LC, underdamped i = (V0 / (wd L)) e^(-a t) sin(wd t),
/// wd = sqrt(w0^2 - a^2); critically damped i = (V0 / L) t e^(-a t); overdamped
/// i = V0 / (L (s1 - s2)) (e^(s1 t) - e^(s2 t)), s1,2 = -a +- sqrt(a^2 - w0^2). With a crowbar the capacitor is
/// shorted at the first current peak, after which i = i_pk e^(-(R/L)(t - t_pk)).
/// </summary>
public sealed class DischargeWaveform : FieldWaveform
{
    /// <summary>The drive is followed until it falls below this fraction of its peak (1e-4: the energy left is 1e-8 of the pulse's).</summary>
    private const double TailFraction = 1e-4;

    private readonly double _alpha;
    private readonly double _omegaD;
    private readonly double _s1;
    private readonly double _s2;

    /// <summary>Creates the discharge.</summary>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public DischargeWaveform(double capacitanceFarads, double voltageVolts, double inductanceHenries, double resistanceOhms, bool crowbar = false, double startSeconds = 0)
        : base(DriveKind.Current)
    {
        Require.Positive("Capacitance", capacitanceFarads);
        Require.Positive("Voltage", voltageVolts);
        Require.Positive("Inductance", inductanceHenries);
        Require.Positive("Resistance", resistanceOhms);
        CapacitanceFarads = capacitanceFarads;
        VoltageVolts = voltageVolts;
        InductanceHenries = inductanceHenries;
        ResistanceOhms = resistanceOhms;
        Crowbar = crowbar;
        StartSeconds = startSeconds;
        _alpha = resistanceOhms / (2 * inductanceHenries);
        double w0Squared = 1 / (inductanceHenries * capacitanceFarads);
        double discriminant = (_alpha * _alpha) - w0Squared;
        Damping = Math.Abs(discriminant) <= 1e-9 * w0Squared ? "critically damped" : discriminant < 0 ? "underdamped" : "overdamped";
        _omegaD = Damping == "underdamped" ? Math.Sqrt(-discriminant) : 0;
        double root = Damping == "overdamped" ? Math.Sqrt(discriminant) : 0;
        _s1 = -_alpha + root;
        _s2 = -_alpha - root;
        FirstPeakSeconds = Damping switch
        {
            "underdamped" => Math.Atan2(_omegaD, _alpha) / _omegaD,
            "critically damped" => 1 / _alpha,
            _ => Math.Log(_s2 / _s1) / (_s1 - _s2),
        };
        PeakValue = Math.Abs(Free(FirstPeakSeconds));
        double decay = crowbar ? resistanceOhms / inductanceHenries : Damping == "overdamped" ? -_s1 : _alpha;
        double tail = Math.Log(1 / TailFraction) / decay;
        EndSeconds = startSeconds + (crowbar ? FirstPeakSeconds + tail : Math.Max(tail, FirstPeakSeconds + tail / 4));
        PhysicalRanges.DriveDuration.For("Capacitance").Check(EndSeconds - startSeconds);
        DriveTiming.RequireResolvable(startSeconds, Math.Min(FirstPeakSeconds, MaxStepSeconds * 50), "Capacitance");
        PeakRate = voltageVolts / inductanceHenries;
    }

    /// <inheritdoc />
    public override string Form => "Discharge";

    /// <summary>The bank's capacitance C, F.</summary>
    public double CapacitanceFarads { get; }

    /// <summary>The bank's charging voltage V0, V.</summary>
    public double VoltageVolts { get; }

    /// <summary>The circuit's inductance L, H.</summary>
    public double InductanceHenries { get; }

    /// <summary>The circuit's resistance R, ohm.</summary>
    public double ResistanceOhms { get; }

    /// <summary>True when a crowbar shorts the capacitor at the first current peak.</summary>
    public bool Crowbar { get; }

    /// <summary>"underdamped", "critically damped" or "overdamped".</summary>
    public string Damping { get; }

    /// <summary>When the current first peaks, s after the start.</summary>
    public double FirstPeakSeconds { get; }

    /// <summary>The energy stored in the bank, C V0^2 / 2, J.</summary>
    public double StoredEnergyJoules => 0.5 * CapacitanceFarads * VoltageVolts * VoltageVolts;

    /// <inheritdoc />
    public override double StartSeconds { get; }

    /// <inheritdoc />
    public override double EndSeconds { get; }

    /// <inheritdoc />
    public override double PeakValue { get; }

    /// <summary>The largest rate, V0 / L, at the start (the whole bank voltage across the inductance).</summary>
    public override double PeakRate { get; }

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints => Crowbar
        ? new[] { StartSeconds, StartSeconds + FirstPeakSeconds, EndSeconds }
        : new[] { StartSeconds, EndSeconds };

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales => new[]
    {
        new TimeScale("time to first peak", FirstPeakSeconds),
        new TimeScale("decay time constant", 1 / (Damping == "overdamped" ? -_s1 : _alpha)),
    };

    /// <summary>The frequency of the ringing (underdamped), else the knee frequency 0.35 / rise time of the first peak, Hz.</summary>
    public override double SignificantFrequencyHertz => Damping == "underdamped"
        ? Math.Max(_omegaD / (2 * Math.PI), EdgeTiming.KneeFrequencyHertz(FirstPeakSeconds))
        : EdgeTiming.KneeFrequencyHertz(FirstPeakSeconds);

    /// <inheritdoc />
    public override double MaxStepSeconds => FirstPeakSeconds / 100;

    /// <summary>
    /// After a crowbar fires (a breakpoint), the current only decays, as e^(-(R/L) t): it is stepped as an exponential
    /// decay is (<see cref="DecayWaveform"/>), at a fiftieth of its time constant L/R, where that is longer than the
    /// hundredth of the time to the first peak that the ringing part takes (some 2,200 steps fewer over a decay of
    /// 3 ms followed to 1e-4 of its peak, after a first peak at 1.1 ms). Before it, and for a discharge with no crowbar
    /// (whose ringing goes on), the hundredth of the time to the first peak.
    /// </summary>
    /// <remarks>
    /// From the crowbar's breakpoint on, to within a part in 1e9 of the time to the peak: the breakpoint is start + time
    /// to the peak, from which the time to the peak comes back an ulp short when the start is not zero. A step taken a
    /// little before it ends on the breakpoint anyway (a solver lands on each).
    /// </remarks>
    public override double MaxStepAt(double t) =>
        Crowbar && t - StartSeconds >= FirstPeakSeconds * (1 - 1e-9)
            ? Math.Max(MaxStepSeconds, InductanceHenries / ResistanceOhms / DecayWaveform.StepsPerTimeConstant)
            : MaxStepSeconds;

    /// <inheritdoc />
    public override double Value(double t)
    {
        double s = t - StartSeconds;
        if (s <= 0 || t >= EndSeconds)
        {
            return 0.0;
        }

        return Crowbar && s > FirstPeakSeconds
            ? Free(FirstPeakSeconds) * Math.Exp(-(ResistanceOhms / InductanceHenries) * (s - FirstPeakSeconds))
            : Free(s);
    }

    /// <inheritdoc />
    public override double Rate(double t)
    {
        double s = t - StartSeconds;
        if (s < 0 || t >= EndSeconds)
        {
            return 0.0;
        }

        if (Crowbar && s >= FirstPeakSeconds)
        {
            return -(ResistanceOhms / InductanceHenries) * Value(t);
        }

        double v = VoltageVolts, l = InductanceHenries;
        return Damping switch
        {
            "underdamped" => v / (_omegaD * l) * Math.Exp(-_alpha * s) * ((_omegaD * Math.Cos(_omegaD * s)) - (_alpha * Math.Sin(_omegaD * s))),
            "critically damped" => v / l * Math.Exp(-_alpha * s) * (1 - (_alpha * s)),
            _ => v / (l * (_s1 - _s2)) * ((_s1 * Math.Exp(_s1 * s)) - (_s2 * Math.Exp(_s2 * s))),
        };
    }

    /// <inheritdoc />
    public override string Describe() =>
        "discharge of " + SiFormat.Format(CapacitanceFarads, "F") + " at " + SiFormat.Format(VoltageVolts, "V") + " into "
        + SiFormat.Format(InductanceHenries, "H") + ", " + SiFormat.Format(ResistanceOhms, "Ω") + " (" + Damping + (Crowbar ? ", crowbarred" : string.Empty)
        + "): first peak " + SiFormat.Format(PeakValue, "A") + " at " + SiFormat.Format(FirstPeakSeconds, "s");

    /// <summary>The current of the free RLC discharge, s after the start.</summary>
    private double Free(double s)
    {
        double v = VoltageVolts, l = InductanceHenries;
        return Damping switch
        {
            "underdamped" => v / (_omegaD * l) * Math.Exp(-_alpha * s) * Math.Sin(_omegaD * s),
            "critically damped" => v / l * s * Math.Exp(-_alpha * s),
            _ => v / (l * (_s1 - _s2)) * (Math.Exp(_s1 * s) - Math.Exp(_s2 * s)),
        };
    }
}
