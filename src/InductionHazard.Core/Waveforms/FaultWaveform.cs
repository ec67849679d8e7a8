using System;
using System.Collections.Generic;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Waveforms;

/// <summary>
/// The asymmetric short-circuit current of IEC 60909-0 (2016): after the fault at the start,
/// i(t) = sqrt2 Ik'' [sin(omega t + psi - phik) - sin(psi - phik) e^(-t/tau)], phik = atan(X/R), tau = (X/R)/omega,
/// until the protection clears it at the first current zero after the clearing time. The closing angle psi
/// (the voltage's phase when the fault occurs) is by default the one that gives the largest first peak, found by
/// search; the peak over sqrt2 Ik'' is the standard's peak factor kappa.
/// </summary>
public sealed class FaultWaveform : FieldWaveform
{
    /// <summary>The default clearing time, s: 1 s, a slow backup protection (common practice; a shorter one is conservative to leave out).</summary>
    public const double DefaultClearingSeconds = 1.0;

    /// <summary>Steps per period the transient solver may take: 200 keeps a piecewise-linear emf within about 1e-5 of the sinusoid.</summary>
    private const int StepsPerPeriod = 200;

    private readonly double _amplitude;
    private readonly double _omega;
    private readonly double _tau;
    private readonly double _offsetAngle;

    /// <summary>Creates the fault current.</summary>
    /// <param name="symmetricalRmsAmperes">The initial symmetrical short-circuit current Ik'' (rms), A.</param>
    /// <param name="xOverR">The ratio X/R of the source impedance at the fault.</param>
    /// <param name="frequencyHertz">The system frequency, Hz.</param>
    /// <param name="clearingSeconds">When the protection opens, s after the fault; the current stops at its next zero.</param>
    /// <param name="closingAngleRadians">The voltage's phase psi when the fault occurs; null for the worst case (largest first peak).</param>
    /// <param name="startSeconds">When the fault occurs, s.</param>
    /// <exception cref="InvalidInputException">A value is out of range.</exception>
    public FaultWaveform(double symmetricalRmsAmperes, double xOverR, double frequencyHertz, double clearingSeconds = DefaultClearingSeconds, double? closingAngleRadians = null, double startSeconds = 0)
        : base(DriveKind.Current)
    {
        Require.Positive("Current", symmetricalRmsAmperes);
        PhysicalRanges.Current.For("Current").Check(symmetricalRmsAmperes * Math.Sqrt(2) * 2);
        if (!(xOverR >= 0.1 && xOverR <= 1000))
        {
            throw new InvalidInputException("XOverR", "must be between 0.1 and 1000 (power systems lie between about 1 and 100); got " + SiFormat.Plain(xOverR));
        }

        PhysicalRanges.Frequency.Check(frequencyHertz);
        Require.Positive("ClearingTime", clearingSeconds);
        PhysicalRanges.DriveDuration.For("ClearingTime").Check(clearingSeconds);
        if (closingAngleRadians is { } given)
        {
            Require.Finite("ClosingAngleDegrees", given);
        }

        DriveTiming.RequireResolvable(startSeconds, 1.0 / frequencyHertz, "Frequency");
        SymmetricalRmsAmperes = symmetricalRmsAmperes;
        XOverR = xOverR;
        FrequencyHertz = frequencyHertz;
        ClearingSeconds = clearingSeconds;
        StartSeconds = startSeconds;
        _amplitude = Math.Sqrt(2) * symmetricalRmsAmperes;
        _omega = 2 * Math.PI * frequencyHertz;
        _tau = xOverR / _omega;
        ImpedanceAngleRadians = Math.Atan(xOverR);
        ClosingAngleSearched = closingAngleRadians is null;
        ClosingAngleRadians = closingAngleRadians ?? WorstClosingAngle(xOverR);
        _offsetAngle = ClosingAngleRadians - ImpedanceAngleRadians;
        (FirstPeakAmperes, FirstPeakSeconds) = FirstPeak(_offsetAngle);
        EndSeconds = StartSeconds + CurrentZeroAfter(clearingSeconds);
        PeakRate = LargestRate();
    }

    /// <inheritdoc />
    public override string Form => "Fault";

    /// <summary>The initial symmetrical short-circuit current Ik'' (rms), A.</summary>
    public double SymmetricalRmsAmperes { get; }

    /// <summary>The ratio X/R of the source impedance.</summary>
    public double XOverR { get; }

    /// <summary>The system frequency, Hz.</summary>
    public double FrequencyHertz { get; }

    /// <summary>When the protection opens, s after the fault.</summary>
    public double ClearingSeconds { get; }

    /// <summary>The impedance angle phik = atan(X/R), rad.</summary>
    public double ImpedanceAngleRadians { get; }

    /// <summary>The voltage's phase psi when the fault occurs, rad.</summary>
    public double ClosingAngleRadians { get; }

    /// <summary>True when the closing angle was found by search for the largest first peak (the default).</summary>
    public bool ClosingAngleSearched { get; }

    /// <summary>The time constant of the d.c. component, X / (omega R), s.</summary>
    public double DcTimeConstantSeconds => _tau;

    /// <summary>The first peak of the current (signed), A: the peak short-circuit current ip for the worst closing angle.</summary>
    public double FirstPeakAmperes { get; }

    /// <summary>When the first peak occurs, s after the fault.</summary>
    public double FirstPeakSeconds { get; }

    /// <summary>The peak factor |ip| / (sqrt2 Ik''), kappa in IEC 60909-0.</summary>
    public double PeakFactor => Math.Abs(FirstPeakAmperes) / _amplitude;

    /// <inheritdoc />
    public override double StartSeconds { get; }

    /// <inheritdoc />
    public override double EndSeconds { get; }

    /// <inheritdoc />
    public override double PeakValue => Math.Abs(FirstPeakAmperes);

    /// <inheritdoc />
    public override double PeakRate { get; }

    /// <inheritdoc />
    public override IReadOnlyList<double> Breakpoints => new[] { StartSeconds, EndSeconds };

    /// <inheritdoc />
    public override IReadOnlyList<TimeScale> TimeScales => new[]
    {
        new TimeScale("period", 1.0 / FrequencyHertz),
        new TimeScale("d.c. time constant", _tau),
        new TimeScale("clearing time", ClearingSeconds),
    };

    /// <inheritdoc />
    public override double SignificantFrequencyHertz => FrequencyHertz;

    /// <inheritdoc />
    public override double MaxStepSeconds => 1.0 / (FrequencyHertz * StepsPerPeriod);

    /// <inheritdoc />
    public override double Value(double t) => t <= StartSeconds || t >= EndSeconds ? 0.0 : Current(t - StartSeconds, _offsetAngle);

    /// <inheritdoc />
    public override double Rate(double t)
    {
        if (t < StartSeconds || t >= EndSeconds)
        {
            return 0.0;
        }

        double s = t - StartSeconds;
        return _amplitude * ((_omega * Math.Cos((_omega * s) + _offsetAngle)) + (Math.Sin(_offsetAngle) * Math.Exp(-s / _tau) / _tau));
    }

    /// <inheritdoc />
    public override FieldWaveform WithPhaseShift(double radians) =>
        new FaultWaveform(SymmetricalRmsAmperes, XOverR, FrequencyHertz, ClearingSeconds, ClosingAngleRadians + radians, StartSeconds);

    /// <inheritdoc />
    public override string Describe() =>
        "fault " + SiFormat.Format(SymmetricalRmsAmperes, "A") + " rms (Ik''), X/R " + SiFormat.Plain(XOverR) + " at " + SiFormat.Format(FrequencyHertz, "Hz")
        + ", first peak " + SiFormat.Format(PeakValue, "A") + " (kappa " + SiFormat.Plain(PeakFactor, 4) + ") at closing angle "
        + (Math.Round(ClosingAngleRadians * 180 / Math.PI, 1) + 0.0).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture) + " deg" + (ClosingAngleSearched ? " (the worst, by search)" : string.Empty)
        + ", cleared at " + SiFormat.Format(EndSeconds - StartSeconds, "s");

    /// <summary>
    /// The closing angle with the largest first peak |i|, by golden-section search (MathNet.Numerics) of the first peak over
    /// psi - phik in [-pi, 0] (the worst lies near -pi/2, exactly there only as X/R tends to infinity).
    /// </summary>
    private double WorstClosingAngle(double xOverR)
    {
        double phik = Math.Atan(xOverR);
        double PeakAt(double offset) => Math.Abs(FirstPeak(offset).Amperes);
        double best = MathNet.Numerics.FindMinimum.OfScalarFunctionConstrained(offset => -PeakAt(offset), -Math.PI, 0, 1e-9);
        return best + phik;
    }

    private double Current(double s, double offset) =>
        _amplitude * (Math.Sin((_omega * s) + offset) - (Math.Sin(offset) * Math.Exp(-s / _tau)));

    /// <summary>
    /// The peak short-circuit current: the largest |i| in the first period and a quarter after the fault (where
    /// the d.c. component is largest), from 400 samples a period refined where di/dt changes sign.
    /// </summary>
    private (double Amperes, double Seconds) FirstPeak(double offset)
    {
        double period = 2 * Math.PI / _omega;
        double RateAt(double s) => (_omega * Math.Cos((_omega * s) + offset)) + (Math.Sin(offset) * Math.Exp(-s / _tau) / _tau);
        const int Samples = 400;
        double h = period / Samples;
        int best = 1;
        double bestValue = 0;
        for (int k = 1; k <= Samples * 5 / 4; k++)
        {
            double value = Math.Abs(Current(k * h, offset));
            if (value > bestValue)
            {
                bestValue = value;
                best = k;
            }
        }

        double a = (best - 1) * h, b = (best + 1) * h;
        double at = Math.Sign(RateAt(a)) != Math.Sign(RateAt(b)) ? Root(RateAt, a, b) : best * h;
        return (Current(at, offset), at);
    }

    /// <summary>The first zero of the current at or after the clearing time, s after the fault.</summary>
    private double CurrentZeroAfter(double clearing)
    {
        double period = 1.0 / FrequencyHertz;
        double h = period / 400;
        double previous = Current(clearing, _offsetAngle);
        if (previous == 0)
        {
            return clearing;
        }

        for (int k = 1; k <= 4000; k++)
        {
            double s = clearing + (k * h);
            double now = Current(s, _offsetAngle);
            if (Math.Sign(now) != Math.Sign(previous))
            {
                return Root(x => Current(x, _offsetAngle), s - h, s);
            }

            previous = now;
        }

        // A current fully offset for ten periods has no zero: the protection is taken to open at the clearing time.
        return clearing;
    }

    private double LargestRate()
    {
        double largest = 0;
        double span = Math.Min(EndSeconds - StartSeconds, 2.0 / FrequencyHertz);
        for (int k = 0; k <= 2000; k++)
        {
            largest = Math.Max(largest, Math.Abs(Rate(StartSeconds + (span * k / 2000))));
        }

        return largest;
    }

    /// <summary>The root of f between a and b, where f changes sign (Brent's method, MathNet.Numerics).</summary>
    private static double Root(Func<double, double> f, double a, double b) =>
        MathNet.Numerics.RootFinding.Brent.TryFindRoot(f, a, b, 1e-15 * Math.Max(1, Math.Abs(b)), 200, out double root) ? root : 0.5 * (a + b);
}
