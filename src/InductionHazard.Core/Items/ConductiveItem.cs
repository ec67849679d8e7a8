using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// A conductive thing that a person wears, carries or installs near a field: its shape, material, dimensions,
/// any gap, and how a person touches it. Built by <see cref="ItemRecordReader"/> from parameters or a data row.
/// </summary>
public sealed class ConductiveItem
{
    internal ConductiveItem(string name, ItemShape shape, ConductorMaterial material, LoopGeometry loop, double gapMeters, ContactKind contact)
    {
        Name = name;
        Shape = shape;
        Material = material;
        Loop = loop;
        GapMeters = gapMeters;
        Contact = contact;
    }

    /// <summary>The same item under another name.</summary>
    internal ConductiveItem Named(string name) =>
        name == Name ? this : new ConductiveItem(name, Shape, Material, Loop, GapMeters, Contact);

    /// <summary>The item's name as given in the inventory.</summary>
    public string Name { get; }

    /// <summary>The shape.</summary>
    public ItemShape Shape { get; }

    /// <summary>The material.</summary>
    public ConductorMaterial Material { get; }

    /// <summary>The loop geometry.</summary>
    public LoopGeometry Loop { get; }

    /// <summary>The width of the gap in a split ring, m; zero for a closed loop.</summary>
    public double GapMeters { get; }

    /// <summary>How a person touches the item.</summary>
    public ContactKind Contact { get; }

    /// <summary>
    /// The current paths last built for the item, with what they were built for (see <see cref="Induction.ItemPaths.For"/>):
    /// one reference, so any thread may read or replace it (written with release semantics once they are complete).
    /// </summary>
    internal Induction.ItemPaths? LastPaths;

    /// <summary>True for a split ring or open loop (a gap that carries the emf and no current).</summary>
    public bool IsSplit => GapMeters > 0;

    /// <summary>The mean diameter of a circular loop, m; NaN for another outline.</summary>
    public double MeanDiameterMeters => Loop is RingGeometry r ? r.MeanDiameterMeters : double.NaN;

    /// <summary>The metal mass, kg (the gap's missing metal neglected).</summary>
    public double MassKilograms => Loop.VolumeCubicMeters * Material.DensityKilogramsPerCubicMeter;

    /// <summary>The d.c. resistance around the loop at 20 °C, rho l / S, ohm.</summary>
    public double ResistanceOhms => Material.ResistivityOhmMeters * Loop.PathLengthMeters / Loop.Section.AreaSquareMeters;

    /// <summary>"Wedding band: Ring, Gold, circle D 19.8 mm, 4 mm x 1.6 mm band, closed, Skin".</summary>
    public string Describe() =>
        Name + ": " + Shape + ", " + Material.Name + ", " + Loop.Describe() + ", "
        + Loop.Section.Describe() + ", " + (Loop is BodyGeometry ? string.Empty : IsSplit ? "gap " + SiFormat.Format(GapMeters, "m") + ", " : "closed, ") + Contact;

    /// <inheritdoc />
    public override string ToString() => Name;
}
