using System;

namespace InductionHazard.Items;

/// <summary>
/// A circular loop: its mean diameter D (the centre line of the wire or band) and cross-section. Rings are
/// sized by inner diameter, as jewellers do; the loop is computed on the centre line.
/// </summary>
public sealed class RingGeometry
{
    /// <summary>Creates the geometry.</summary>
    public RingGeometry(double meanDiameterMeters, CrossSection section)
    {
        MeanDiameterMeters = meanDiameterMeters;
        Section = section;
    }

    /// <summary>The mean (centre-line) diameter D, m.</summary>
    public double MeanDiameterMeters { get; }

    /// <summary>The wire or band section.</summary>
    public CrossSection Section { get; }

    /// <summary>The loop radius R = D / 2, m.</summary>
    public double LoopRadiusMeters => MeanDiameterMeters / 2;

    /// <summary>The inner diameter D - radial extent, m.</summary>
    public double InnerDiameterMeters => MeanDiameterMeters - Section.RadialExtentMeters;

    /// <summary>The outer diameter D + radial extent, m.</summary>
    public double OuterDiameterMeters => MeanDiameterMeters + Section.RadialExtentMeters;

    /// <summary>The area the centre line encloses, pi (D/2)^2, m^2: the flux area of the loop.</summary>
    public double LoopAreaSquareMeters => Math.PI * LoopRadiusMeters * LoopRadiusMeters;

    /// <summary>The length of the centre line, pi D, m: the current path.</summary>
    public double PathLengthMeters => Math.PI * MeanDiameterMeters;

    /// <summary>The metal volume, section area times path length, m^3.</summary>
    public double VolumeCubicMeters => Section.AreaSquareMeters * PathLengthMeters;

    /// <summary>The outer surface, section perimeter times path length, m^2.</summary>
    public double SurfaceSquareMeters => Section.PerimeterMeters * PathLengthMeters;

    /// <summary>The largest dimension of the item, m (the outer diameter).</summary>
    public double LargestDimensionMeters => Math.Max(OuterDiameterMeters, Section.LargestDimensionMeters);
}
