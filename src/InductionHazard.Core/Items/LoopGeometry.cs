using System.Collections.Generic;

namespace InductionHazard.Items;

/// <summary>
/// The outline of an item's current path and its cross-section: a circle (<see cref="RingGeometry"/>) or a
/// rectangle (<see cref="RectangularLoopGeometry"/>). The loop is computed on the centre line of the section.
/// </summary>
public abstract class LoopGeometry
{
    /// <summary>Creates the geometry with its section.</summary>
    protected LoopGeometry(CrossSection section)
    {
        Section = section;
    }

    /// <summary>The wire or band section.</summary>
    public CrossSection Section { get; }

    /// <summary>The area the centre line encloses, m^2: the flux area of the loop.</summary>
    public abstract double LoopAreaSquareMeters { get; }

    /// <summary>The length of the centre line, m: the current path.</summary>
    public abstract double PathLengthMeters { get; }

    /// <summary>
    /// The loop's smallest half-span, m (the radius of a circle, half the shorter side of a rectangle): the section
    /// must stay thin against it for the thin-loop inductance formulas to hold.
    /// </summary>
    public abstract double HalfSpanMeters { get; }

    /// <summary>The largest dimension of the item, m.</summary>
    public abstract double LargestDimensionMeters { get; }

    /// <summary>The metal volume, m^3: section area times path length for a loop.</summary>
    public virtual double VolumeCubicMeters => Section.AreaSquareMeters * PathLengthMeters;

    /// <summary>The outer surface, m^2: section perimeter times path length for a loop.</summary>
    public virtual double SurfaceSquareMeters => Section.PerimeterMeters * PathLengthMeters;

    /// <summary>
    /// The item as coaxial current paths (filaments over its meridional (r, z) section, z along the axis), cells no
    /// thicker than <paramref name="surfaceCellMeters"/> at every surface and growing inward, and at least
    /// <paramref name="refinement"/> times the fewest cells across each dimension (a finer mesh to show convergence); null for an outline
    /// that is not a body of revolution (a rectangular loop is one path).
    /// </summary>
    public virtual IReadOnlyList<Filament>? Filaments(double surfaceCellMeters, int refinement = 1) => null;

    /// <summary>"circle D 20 mm" or "rectangle 300 mm x 400 mm".</summary>
    public abstract string Describe();

    /// <summary>The geometry in words, as <see cref="Describe"/> gives it.</summary>
    public override string ToString() => Describe();
}
