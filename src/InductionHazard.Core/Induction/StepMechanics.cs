using System;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The force and torque on the paths at each step's end: the peak force and when, the impulse (the trapezoid
/// rule over the steps) and the peak torque.
/// </summary>
internal sealed class StepMechanics
{
    private readonly ModalCircuit _circuit;
    private readonly Func<double, double>[]? _values;
    private readonly Vector3D[]? _torqueField;
    private readonly Vector3D[]? _centreField;
    private readonly double[] _drive;
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
        Inert = NoForceOrTorque(circuit, torqueField);
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
        if (_centreField is { } b && _values is { } values)
        {
            for (int j = 0; j < _drive.Length; j++)
            {
                _drive[j] = values[j](t);
            }

            _lastField = FieldSize(b);
        }
    }

    /// <summary>Records the step ending at t (the drives read at <paramref name="driveAt"/>, just inside the step).</summary>
    /// <param name="z">The modal amplitudes at the step's end.</param>
    /// <param name="driveAt">Where the drives are read.</param>
    /// <param name="t">The step's end.</param>
    /// <param name="h">The step.</param>
    /// <param name="momentPeak">The moment's largest size within the step, when the largest |m| |B| is wanted; NaN otherwise.</param>
    public void Record(double[] z, double driveAt, double t, double h, double momentPeak = double.NaN)
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
