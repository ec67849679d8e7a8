using System;
using System.Numerics;
using InductionHazard.Items;

namespace InductionHazard.Induction;

/// <summary>
/// The ring as a circuit: resistance around the loop with its temperature law, self-inductance, and the
/// impedance at a frequency with skin effect (round wire) in the thin-ring approximation.
/// </summary>
public sealed class RingCircuit
{
    private readonly ConductiveItem _item;

    /// <summary>Creates the circuit of a ring.</summary>
    public RingCircuit(ConductiveItem item)
    {
        _item = item;
    }

    /// <summary>The d.c. resistance around the loop at a temperature, rho(T) l / S, ohm.</summary>
    public double DcResistanceOhms(double celsius) =>
        _item.Material.ResistivityAt(celsius) * _item.Ring.PathLengthMeters / _item.Ring.Section.AreaSquareMeters;

    /// <summary>The self-inductance for uniform current (the low-frequency value), H (Grover 1946, via the section's GMD).</summary>
    public double DcInductanceHenries =>
        RingInductance.UniformCurrentHenries(_item.Ring.LoopRadiusMeters, _item.Ring.Section.GeometricMeanRadiusMeters);

    /// <summary>
    /// The loop impedance at a frequency and temperature, ohm. Round wire: R_dc(T) times the internal impedance
    /// ratio (Kelvin functions) plus j omega L_ext. Band: R_dc(T) + j omega L_dc, valid while the band is thin
    /// against the skin depth (the engine checks that).
    /// </summary>
    public Complex ImpedanceOhms(double frequencyHertz, double celsius)
    {
        double omega = 2 * Math.PI * frequencyHertz;
        double rdc = DcResistanceOhms(celsius);
        if (_item.Ring.Section is RoundWire wire)
        {
            double delta = SkinEffect.SkinDepthMeters(_item.Material.ResistivityAt(celsius), frequencyHertz, _item.Material.RelativePermeability);
            Complex internalRatio = SkinEffect.RoundWireImpedanceRatio(wire.RadiusMeters, delta);
            double external = RingInductance.ExternalHenries(_item.Ring.LoopRadiusMeters, wire.RadiusMeters);
            return (rdc * internalRatio) + new Complex(0, omega * external);
        }

        return new Complex(rdc, omega * DcInductanceHenries);
    }
}
