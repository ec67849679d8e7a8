using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The force and torque on the paths at each step's end: the peak force and when, the impulse (over each step, the
/// integral of the cubic through the force and its rate at both ends, with the part of each mode the step outlasts
/// integrated exactly, where the solver gives the step's ends; else the trapezoid rule) and the peak torque.
/// </summary>
internal sealed class StepMechanics
{
    private readonly ModalCircuit _circuit;
    private readonly Func<double, double>[]? _values;
    private readonly Vector3D[]? _torqueField;
    private readonly Vector3D[]? _centreField;
    private readonly double[] _drive;
    private readonly double[] _driveStart;
    private Vector3D _last;

    // Squared lengths compared (the square root is monotone): no root per step.
    private double _peakForceSquared, _peakTorqueSquared, _peakMomentField, _lastField;

    /// <param name="circuit">The modes.</param>
    /// <param name="values">d_j(t), each term's drive as the item sees it.</param>
    /// <param name="torqueField">n x b_j per term (null for no torque).</param>
    /// <param name="terms">The number of terms.</param>
    /// <param name="centreField">b_j, each term's field per unit drive at the centre, when the largest |m| |B| is wanted (an item whose orientation the engine chose); null otherwise.</param>
    public StepMechanics(ModalCircuit circuit, Func<double, double>[]? values, Vector3D[]? torqueField, int terms, Vector3D[]? centreField = null)
    {
        _circuit = circuit;
        _values = values;
        _torqueField = torqueField;
        _centreField = circuit.MomentWeights is null ? null : centreField;
        _drive = new double[terms];
        _driveStart = new double[terms];
        Inert = NoForceOrTorque(circuit, torqueField);
    }

    /// <summary>True when a force is followed (a force coupling that is not all zero, and the drives as the item sees them): the solver then gives each step's rates (<see cref="StepEnds"/>).</summary>
    public bool FollowsForce => _values is not null && _circuit.ForceCoupling is not null && !Inert;

    /// <summary>
    /// What a step knows for its impulse. Each mode's amplitude over the step is, exactly for the step's linear emf
    /// e(x) = e0 + g x, z(x) = A + B x + C e^(-x/tau) (tau = lambda / s, A = (e0 - g tau) / s, B = g / s, C = z(0) - A).
    /// For a mode the step does not outlast (h at most tau), its rate at both ends, (e - s z) / lambda, for the cubic
    /// through the force and its rate. For one it outlasts (stiff), A, B, C and tau, for the exact integral of its part
    /// of the force: its rate at the ends is a small difference over a small lambda, which the step's line for e (off
    /// the drive by some h^2 e'' at the ends) made several per cent wrong (a band in a 50 Hz fault, L/R 2 us against
    /// steps of 100 us: its impulse 0.7 % off). And each drive u_j (the emf per unit flux coupling, minus the rate of
    /// the drive as the item sees it) at both ends, from the step's own line. Rates within the step, so a breakpoint at
    /// either end (where a rate jumps) is taken on its own side.
    /// </summary>
    internal sealed class StepEnds
    {
        public StepEnds(int modes, int terms)
        {
            Start = new double[modes];
            RateStart = new double[modes];
            RateEnd = new double[modes];
            Stiff = new bool[modes];
            A = new double[modes];
            B = new double[modes];
            C = new double[modes];
            Tau = new double[modes];
            DriveStart = new double[terms];
            DriveEnd = new double[terms];
        }

        public double[] Start { get; }

        public double[] RateStart { get; }

        public double[] RateEnd { get; }

        public bool[] Stiff { get; }

        public double[] A { get; }

        public double[] B { get; }

        public double[] C { get; }

        public double[] Tau { get; }

        public double[] DriveStart { get; }

        public double[] DriveEnd { get; }

        /// <summary>Whether any mode is stiff this step.</summary>
        public bool AnyStiff { get; set; }
    }

    /// <summary>
    /// True when no step can give a force or a torque: every force coupling and torque field is zero or absent (a
    /// loop in a uniform field facing it), so nothing is read at the steps' ends but the current, whose peak each
    /// step finds within itself.
    /// </summary>
    public bool Inert { get; }

    public Vector3D PeakForce { get; private set; }

    public double PeakForceAt { get; private set; }

    public Vector3D Impulse { get; private set; }

    public double PeakTorque => Math.Sqrt(_peakTorqueSquared);

    /// <summary>The largest |m| |B| over the run, bounded step by step (the moment's largest size in a step times the field's larger at its ends), N m; 0 when not wanted.</summary>
    public double PeakMomentField => _peakMomentField;

    /// <summary>
    /// True when every force coupling and every torque field is zero or absent (a loop in a uniform field facing it):
    /// no current in any path can then give a force or a torque. Shared by the transient and steady mechanics.
    /// </summary>
    internal static bool NoForceOrTorque(ModalCircuit circuit, Vector3D[]? torqueField)
    {
        if (circuit.ForceCoupling is { } g)
        {
            foreach (Vector3D v in g)
            {
                if (v.X != 0 || v.Y != 0 || v.Z != 0)
                {
                    return false;
                }
            }
        }

        foreach (Vector3D v in torqueField ?? Array.Empty<Vector3D>())
        {
            if (v.X != 0 || v.Y != 0 || v.Z != 0)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>The field's size at the centre where the run starts, for the first step's largest |m| |B| (when wanted).</summary>
    public void StartAt(double t)
    {
        if ((_centreField is not null || FollowsForce) && _values is { } values)
        {
            for (int j = 0; j < _drive.Length; j++)
            {
                _drive[j] = values[j](t);
            }

            if (_centreField is { } b)
            {
                _lastField = FieldSize(b);
            }
        }
    }

    /// <summary>Records the step ending at t (the drives read at <paramref name="driveAt"/>, just inside the step).</summary>
    /// <param name="z">The modal amplitudes at the step's end.</param>
    /// <param name="driveAt">Where the drives are read.</param>
    /// <param name="t">The step's end.</param>
    /// <param name="h">The step.</param>
    /// <param name="momentPeak">The moment's largest size within the step, when the largest |m| |B| is wanted; NaN otherwise.</param>
    /// <param name="ends">The step's rates at both ends, for the impulse's cubic (null: the trapezoid rule).</param>
    public void Record(double[] z, double driveAt, double t, double h, double momentPeak = double.NaN, StepEnds? ends = null)
    {
        // An inert item's force and torque are zero at every step while its amplitudes are finite (every coupling and
        // field is zero), so the drives are not read; amplitudes that are not finite still go through, and carry NaN
        // into the impulse and the torque as they always did.
        if (_values is not { } values || (Inert && _centreField is null && Finite.All(z)))
        {
            return;
        }

        for (int j = 0; j < _drive.Length; j++)
        {
            _driveStart[j] = _drive[j];
            _drive[j] = values[j](driveAt);
        }

        if (_centreField is { } b)
        {
            RecordMomentField(momentPeak, b);
            if (Inert && Finite.All(z))
            {
                return;
            }
        }

        if (_circuit.ForceCoupling is { } g)
        {
            Vector3D force = Vector3D.Zero;
            for (int j = 0; j < _drive.Length; j++)
            {
                if (_drive[j] == 0)
                {
                    continue;
                }

                Vector3D perDrive = Vector3D.Zero;
                for (int k = 0; k < z.Length; k++)
                {
                    perDrive += z[k] * g[k, j];
                }

                force += _drive[j] * perDrive;
            }

            Impulse += 0.5 * h * (force + _last);
            if (ends is not null)
            {
                // The cubic through the force and its rate at both ends integrates to the trapezoid's h (F0 + F1) / 2
                // plus h^2 (F0' - F1') / 12 (fourth order in the step, where the trapezoid is second), for the modes the
                // step does not outlast; the stiff modes' part of the trapezoid is replaced by its exact integral.
                Impulse += (h * h / 12) * (ForceRate(g, ends.Start, ends.RateStart, _driveStart, ends.DriveStart, ends.Stiff) - ForceRate(g, z, ends.RateEnd, _drive, ends.DriveEnd, ends.Stiff));
                if (ends.AnyStiff)
                {
                    Impulse += StiffCorrection(g, ends, z, _driveStart, _drive, h);
                }
            }

            _last = force;
            double squared = force.Dot(force);
            if (squared > _peakForceSquared)
            {
                (PeakForce, _peakForceSquared) = (force, squared);
                PeakForceAt = t;
            }
        }

        if (_circuit.MomentWeights is { } a && _torqueField is { } nxb)
        {
            double moment = 0;
            for (int k = 0; k < z.Length; k++)
            {
                moment += a[k] * z[k];
            }

            Vector3D torque = Vector3D.Zero;
            for (int j = 0; j < _drive.Length; j++)
            {
                torque += (moment * _drive[j]) * nxb[j];
            }

            _peakTorqueSquared = Math.Max(_peakTorqueSquared, torque.Dot(torque));
        }
    }

    /// <summary>
    /// dF/dt = sum_j (d_j' P_j + d_j P_j') with P_j = sum_k z_k G_kj over the modes that are not stiff: the drive as the
    /// item sees it, d_j, falls at the rate u_j (its emf per unit flux coupling), so d_j' = -u_j.
    /// </summary>
    private static Vector3D ForceRate(Vector3D[,] g, double[] z, double[] rates, double[] drive, double[] u, bool[] stiff)
    {
        Vector3D sum = Vector3D.Zero;
        for (int j = 0; j < drive.Length; j++)
        {
            Vector3D p = Vector3D.Zero, pRate = Vector3D.Zero;
            for (int k = 0; k < z.Length; k++)
            {
                if (stiff[k])
                {
                    continue;
                }

                p += z[k] * g[k, j];
                pRate += rates[k] * g[k, j];
            }

            sum += (-u[j] * p) + (drive[j] * pRate);
        }

        return sum;
    }

    /// <summary>
    /// For each stiff mode, its part of the force integrated exactly over the step less its part of the trapezoid: the
    /// integral of d_j(x) z(x) with z = A + B x + C e^(-x/tau) and d_j(x) = d0 - u0 x - (u1 - u0) x^2 / (2h) (the drive
    /// whose rate is the step's line), against h (d0 z0 + d1 z1) / 2 with the drives as read. The exponential's moments
    /// tau (1 - E), tau^2 (1 - E (1 + r)), tau^3 (2 - E (2 + 2r + r^2)), E = e^-r, r = h / tau above 1 (no cancellation;
    /// E taken as 0 past r = 50, where it is below 2e-22).
    /// </summary>
    private static Vector3D StiffCorrection(Vector3D[,] g, StepEnds ends, double[] z, double[] driveStart, double[] driveEnd, double h)
    {
        Vector3D sum = Vector3D.Zero;
        double h2 = h * h, h3 = h2 * h, h4 = h3 * h;
        for (int k = 0; k < z.Length; k++)
        {
            if (!ends.Stiff[k])
            {
                continue;
            }

            double tau = ends.Tau[k], r = h / tau, e = r > 50 ? 0 : Math.Exp(-r);
            double m0 = tau * (1 - e), m1 = tau * tau * (1 - (e * (1 + r))), m2 = tau * tau * tau * (2 - (e * (2 + (2 * r) + (r * r))));
            double a = ends.A[k], b = ends.B[k], c = ends.C[k];
            for (int j = 0; j < driveStart.Length; j++)
            {
                double p0 = driveStart[j], p1 = -ends.DriveStart[j], p2 = -(ends.DriveEnd[j] - ends.DriveStart[j]) / (2 * h);
                double exact = (a * ((p0 * h) + (p1 * h2 / 2) + (p2 * h3 / 3))) + (b * ((p0 * h2 / 2) + (p1 * h3 / 3) + (p2 * h4 / 4))) + (c * ((p0 * m0) + (p1 * m1) + (p2 * m2)));
                double trapezoid = 0.5 * h * ((driveStart[j] * ends.Start[k]) + (driveEnd[j] * z[k]));
                sum += (exact - trapezoid) * g[k, j];
            }
        }

        return sum;
    }

    /// <summary>
    /// The step's bound on |m| |B|: the moment's largest size within it times the field's larger size at its ends (the
    /// field runs about linearly over a step: a curved drive takes short steps). A bound, never a sample that misses a
    /// peak between steps' ends.
    /// </summary>
    private void RecordMomentField(double momentPeak, Vector3D[] b)
    {
        double field = FieldSize(b);
        double larger = Math.Max(field, _lastField);
        _lastField = field;
        double product = momentPeak * (double.IsNaN(field) ? double.NaN : larger);
        _peakMomentField = double.IsNaN(product) || double.IsNaN(_peakMomentField) ? double.NaN : Math.Max(_peakMomentField, product);
    }

    /// <summary>|sum_j d_j b_j|, the field's size at the centre for the drives last read.</summary>
    private double FieldSize(Vector3D[] b)
    {
        Vector3D field = Vector3D.Zero;
        for (int j = 0; j < _drive.Length; j++)
        {
            field += _drive[j] * b[j];
        }

        return field.Length;
    }
}
