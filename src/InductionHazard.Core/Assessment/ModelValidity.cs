using System;
using System.Collections.Generic;
using System.Globalization;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Assessment;

/// <summary>
/// The assumptions of the ring models, checked per scenario. Each broken assumption becomes a
/// <see cref="ValidityIssue"/> naming what it breaks; what holds goes into the notes.
/// </summary>
public static class ModelValidity
{
    /// <summary>Quasi-static: the item's largest dimension must stay below this fraction of the wavelength.</summary>
    public const double QuasiStaticFraction = 0.1;

    /// <summary>
    /// Thin ring: the section's GMD over the loop radius must stay below 0.25 e^(-1/4) = 0.195, which for a round wire
    /// is a wire radius below a quarter of the loop radius. Grover's thin-ring formula then errs by under about 2 %
    /// (its first correction is of order (a/R)^2 / 8 ln(8R/a)).
    /// </summary>
    public static readonly double MaxGmdToLoopRadius = 0.25 * Math.Exp(-0.25);

    /// <summary>
    /// The d.c. resistance and inductance hold while a round wire's radius is at most one skin depth (R_ac/R_dc =
    /// 1.020 there, Kelvin-function formula) and a band's thickness at most one skin depth and width at most two.
    /// </summary>
    public const double DcModelSkinDepths = 1.0;

    /// <summary>
    /// Checks the scenario's assumptions. Returns true when the item is a loop thin against its span and against the
    /// skin depth, so that one path holds; false when the item needs filaments over its section (a thick ring or
    /// band, a body), which is a change of model, not a broken assumption. A rectangular loop has no filament model:
    /// its broken assumptions are issues.
    /// </summary>
    /// <param name="item">The item.</param>
    /// <param name="frequencyHertz">The drive's highest significant frequency.</param>
    /// <param name="alternating">True when the drive is sinusoidal (round wires then carry skin effect through the Kelvin functions).</param>
    /// <param name="startCelsius">The starting temperature.</param>
    /// <param name="thermal">The lumped heating model of the item.</param>
    /// <param name="issues">Receives the broken assumptions.</param>
    /// <param name="notes">Receives what was checked and holds.</param>
    public static bool Check(ConductiveItem item, double frequencyHertz, bool alternating, double startCelsius, LumpedThermalModel thermal, ICollection<ValidityIssue> issues, TextList notes)
    {
        ConductorMaterial material = item.Material;
        if (material.IsFerromagnetic)
        {
            issues.Add(new ValidityIssue(
                material.Name + " is ferromagnetic: the induction model (emf, current, heating, induced force) does not apply, since its permeability concentrates the flux and depends on the field; its pull and twist are judged by the magnetisation model (Attraction, Torque)",
                AffectedResults.Emf | AffectedResults.Current | AffectedResults.Heating));
        }

        double wavelength = PhysicalConstants.SpeedOfLight / frequencyHertz;
        double size = item.Loop.LargestDimensionMeters;
        if (size > QuasiStaticFraction * wavelength)
        {
            issues.Add(new ValidityIssue(
                "not quasi-static: the item (" + SiFormat.Format(size, "m") + ") exceeds a tenth of the wavelength (" + SiFormat.Format(wavelength, "m") + ") at " + SiFormat.Format(frequencyHertz, "Hz"),
                AffectedResults.All));
        }

        if (item.IsSplit)
        {
            // An open loop carries no current and does not heat: the inductance, skin depth and lumped-heating
            // assumptions have nothing to act on, and its zero current and unchanged temperature are exact.
            notes.Add("split ring: open circuit, so the inductance, skin-effect and heating models are not needed; the gap emf is taken around the loop's mean outline");
            CheckTemperatureCoefficient(material, notes);
            return true;
        }

        CheckBiot(item, startCelsius, thermal, issues, notes);
        CheckTemperatureCoefficient(material, notes);
        if (item.Loop is BodyGeometry)
        {
            notes.Add(item.Loop is PrismBody
                ? "block: eddy currents as mesh currents over a grid of its face, in layers along its axis (the placement's normal)"
                : "solid body: eddy currents in coaxial filaments over its section, axis along the placement's normal");
            return false;
        }

        double ratio = item.Loop.Section.GeometricMeanRadiusMeters / item.Loop.HalfSpanMeters;
        bool ring = item.Loop is RingGeometry;
        if (ratio > MaxGmdToLoopRadius && ring)
        {
            notes.Add(ratio, static ratio => "the section is thick for the thin-ring formula (GMD / loop radius = " + Num(ratio) + " > " + Num(MaxGmdToLoopRadius) + "): filaments over the section");
            return false;
        }

        if (ratio > MaxGmdToLoopRadius)
        {
            issues.Add(new ValidityIssue(
                "the section is too thick for the thin-loop inductance formula: GMD / loop half-span = " + Num(ratio) + " > " + Num(MaxGmdToLoopRadius) + " (for a round wire: a diameter above half the loop's radius or half-side); a solid-body model is needed",
                AffectedResults.Current | AffectedResults.Heating));
        }
        else
        {
            notes.Add(ratio, static ratio => "thin-loop inductance (Grover 1946): GMD / loop half-span = " + Num(ratio) + " <= " + Num(MaxGmdToLoopRadius));
        }

        return CheckSkinDepth(item, frequencyHertz, alternating, startCelsius, issues, notes);
    }

    private static void CheckBiot(ConductiveItem item, double startCelsius, LumpedThermalModel thermal, ICollection<ValidityIssue> issues, TextList notes)
    {
        ConductorMaterial material = item.Material;
        double biot = LumpedThermalModel.BiotNumber(thermal.TransferCoefficient(startCelsius), item.Loop.VolumeCubicMeters, item.Loop.SurfaceSquareMeters, material.ThermalConductivityWattsPerMeterKelvin);
        if (biot > LumpedThermalModel.LumpedBiotLimit)
        {
            issues.Add(new ValidityIssue("lumped heating does not hold: Biot number " + Num(biot) + " > 0.1", AffectedResults.Heating));
        }
        else
        {
            notes.Add(biot, static biot => "lumped heating: Biot number " + Num(biot) + " < 0.1");
        }
    }

    private static void CheckTemperatureCoefficient(ConductorMaterial material, TextList notes)
    {
        if (!material.TemperatureCoefficientKnown)
        {
            notes.Add(material.Name, static name => name + ": no confirmed temperature coefficient; resistivity held at its 20 °C value");
        }
    }

    private static bool CheckSkinDepth(ConductiveItem item, double frequencyHertz, bool alternating, double startCelsius, ICollection<ValidityIssue> issues, TextList notes)
    {
        double delta = SkinEffect.SkinDepthMeters(item.Material.ResistivityAt(startCelsius), frequencyHertz, item.Material.RelativePermeability);
        bool ring = item.Loop is RingGeometry;
        if (item.Loop.Section is RoundWire wire)
        {
            if (ring && wire.RadiusMeters > DcModelSkinDepths * delta)
            {
                notes.Add((wire.RadiusMeters, frequencyHertz, delta), static n => "the wire radius (" + SiFormat.Format(n.RadiusMeters, "m") + ") exceeds the skin depth" + At(n.frequencyHertz, n.delta) + ": filaments over the wire's section resolve the current's crowding");
                return false;
            }

            if (!ring && !alternating && wire.RadiusMeters > DcModelSkinDepths * delta)
            {
                notes.Add((wire.RadiusMeters, frequencyHertz, delta), static n => "the wire radius (" + SiFormat.Format(n.RadiusMeters, "m") + ") exceeds the skin depth" + At(n.frequencyHertz, n.delta) + ": concentric shells of the wire resolve its skin effect in time (the loop is large against the wire, so its proximity effect is neglected)");
                return false;
            }

            if (alternating)
            {
                notes.Add((wire.RadiusMeters, frequencyHertz, delta), static n => "skin effect by the Kelvin-function formula: wire radius / skin depth = " + Num(n.RadiusMeters / n.delta) + At(n.frequencyHertz, n.delta));
            }
            else if (wire.RadiusMeters > DcModelSkinDepths * delta)
            {
                issues.Add(new ValidityIssue(
                    "the wire radius (" + SiFormat.Format(wire.RadiusMeters, "m") + ") exceeds the skin depth" + At(frequencyHertz, delta) + ": the current does not fill the wire during the pulse, and the d.c. resistance and inductance do not hold (a filament model is needed)",
                    AffectedResults.Current | AffectedResults.Heating));
            }
            else
            {
                notes.Add((wire.RadiusMeters, frequencyHertz, delta), static n => "d.c. resistance and inductance hold: wire radius / skin depth = " + Num(n.RadiusMeters / n.delta) + At(n.frequencyHertz, n.delta));
            }

            return true;
        }

        var band = (RectangularBand)item.Loop.Section;
        if (band.ThicknessMeters > DcModelSkinDepths * delta || band.WidthMeters > 2 * DcModelSkinDepths * delta)
        {
            if (ring)
            {
                notes.Add((band, frequencyHertz, delta), static n => "the band (" + n.band.Describe() + ") is not thin against the skin depth" + At(n.frequencyHertz, n.delta) + ": filaments over the band's section");
                return false;
            }

            issues.Add(new ValidityIssue(
                "the band (" + band.Describe() + ") is not thin against the skin depth" + At(frequencyHertz, delta) + ": the d.c. resistance and inductance do not hold (a filament model is needed)",
                AffectedResults.Current | AffectedResults.Heating));
        }
        else
        {
            notes.Add((band.ThicknessMeters, frequencyHertz, delta), static n => "d.c. resistance and inductance hold: band thickness / skin depth = " + Num(n.ThicknessMeters / n.delta) + At(n.frequencyHertz, n.delta));
        }

        return true;
    }

    /// <summary>" at 50 Hz (skin depth 9.3 mm)": where a skin-depth note or issue holds.</summary>
    private static string At(double frequencyHertz, double skinDepthMeters) =>
        " at " + SiFormat.Format(frequencyHertz, "Hz") + " (skin depth " + SiFormat.Format(skinDepthMeters, "m") + ")";

    /// <summary>Three significant figures, so that a small ratio (a Biot number of 2E-05) does not read as 0.</summary>
    private static string Num(double value) => SiFormat.Plain(value);
}
