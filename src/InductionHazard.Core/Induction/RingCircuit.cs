using System;
using System.Numerics;
using InductionHazard.Items;

namespace InductionHazard.Induction;

/// <summary>
/// The ring as a circuit: resistance around the loop with its temperature law, self-inductance, and the
/// impedance at a frequency with skin effect (round wire) in the thin-loop approximation; circles by Grover's ring
/// formula, rectangles by his rectangle formula.
/// </summary>
public sealed class RingCircuit
{
    private readonly ConductiveItem _item;

    /// <summary>The external inductance of a round wire's loop, H; NaN until first asked.</summary>
    private double _external = double.NaN;

    /// <summary>Creates the circuit of a ring.</summary>
    public RingCircuit(ConductiveItem item)
    {
        _item = item;
    }

    /// <summary>The d.c. resistance around the loop at a temperature, rho(T) l / S, ohm.</summary>
    public double DcResistanceOhms(double celsius) => ResistanceFor(_item.Material.ResistivityAt(celsius));

    /// <summary>The self-inductance for uniform current (the low-frequency value), H (Grover 1946, via the section's GMD).</summary>
    public double DcInductanceHenries => _item.Loop switch
    {
        RectangularLoopGeometry r => RectangleInductance.UniformCurrentHenries(r.WidthMeters, r.HeightMeters, r.Section.GeometricMeanRadiusMeters),
        _ => RingInductance.UniformCurrentHenries(_item.Loop.HalfSpanMeters, _item.Loop.Section.GeometricMeanRadiusMeters),
    };

    /// <summary>
    /// The loop impedance at a frequency and temperature, ohm. Round wire: R_dc(T) times the internal impedance
    /// ratio (Kelvin functions) plus j omega L_ext. Band: R_dc(T) + j omega L_dc, valid while the band is thin
    /// against the skin depth (the engine checks that).
    /// </summary>
    public Complex ImpedanceOhms(double frequencyHertz, double celsius)
    {
        double omega = 2 * Math.PI * frequencyHertz;
        double rho = _item.Material.ResistivityAt(celsius);
        double rdc = ResistanceFor(rho);
        if (_item.Loop.Section is RoundWire wire)
        {
            double delta = SkinEffect.SkinDepthMeters(rho, frequencyHertz, _item.Material.RelativePermeability);
            Complex internalRatio = SkinEffect.RoundWireImpedanceRatio(wire.RadiusMeters, delta);
            if (double.IsNaN(_external))
            {
                // The geometry's alone: found on the first call, as a heating run asks at every temperature it passes.
                _external = _item.Loop is RectangularLoopGeometry r
                    ? RectangleInductance.ExternalHenries(r.WidthMeters, r.HeightMeters, wire.RadiusMeters)
                    : RingInductance.ExternalHenries(_item.Loop.HalfSpanMeters, wire.RadiusMeters);
            }

            return (rdc * internalRatio) + new Complex(0, omega * _external);
        }

        return new Complex(rdc, omega * DcInductanceHenries);
    }

    /// <summary>The loop's d.c. resistance at a resistivity, ohm.</summary>
    private double ResistanceFor(double resistivity) => resistivity * _item.Loop.PathLengthMeters / _item.Loop.Section.AreaSquareMeters;
}
