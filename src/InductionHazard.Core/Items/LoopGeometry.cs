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

    /// <summary>The metal volume, section area times path length, m^3.</summary>
    public double VolumeCubicMeters => Section.AreaSquareMeters * PathLengthMeters;

    /// <summary>The outer surface, section perimeter times path length, m^2.</summary>
    public double SurfaceSquareMeters => Section.PerimeterMeters * PathLengthMeters;

    /// <summary>"circle D 20 mm" or "rectangle 300 mm x 400 mm".</summary>
    public abstract string Describe();
}
