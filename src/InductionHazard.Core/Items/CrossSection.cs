using System;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>The cross-section of a wire or band that forms a loop.</summary>
public abstract class CrossSection
{
    /// <summary>The conducting area, m^2.</summary>
    public abstract double AreaSquareMeters { get; }

    /// <summary>The perimeter, m (the surface per unit length that cools the item).</summary>
    public abstract double PerimeterMeters { get; }

    /// <summary>
    /// The geometric mean distance of the section from itself, m: the radius of the thin filament with the same
    /// self-inductance for uniform current (Grover 1946; a e^(-1/4) for a round wire, about 0.2235 (w + t) for a
    /// rectangle).
    /// </summary>
    public abstract double GeometricMeanRadiusMeters { get; }

    /// <summary>The radial extent of the section in the loop's plane, m (wire diameter, band thickness).</summary>
    public abstract double RadialExtentMeters { get; }

    /// <summary>The largest dimension of the section, m.</summary>
    public abstract double LargestDimensionMeters { get; }

    /// <summary>The smallest dimension of the section, m: the one that current penetrates from both sides.</summary>
    public abstract double SmallestDimensionMeters { get; }

    /// <summary>A short description ("2 mm wire", "6 mm x 1.8 mm band").</summary>
    public abstract string Describe();

    /// <summary>The section in words, as <see cref="Describe"/> gives it.</summary>
    public override string ToString() => Describe();
}

/// <summary>A round wire of diameter d.</summary>
public sealed class RoundWire : CrossSection
{
    /// <summary>Creates the section.</summary>
    public RoundWire(double diameterMeters)
    {
        DiameterMeters = diameterMeters;
    }

    /// <summary>The wire diameter, m.</summary>
    public double DiameterMeters { get; }

    /// <summary>The wire radius a, m.</summary>
    public double RadiusMeters => DiameterMeters / 2;

    /// <inheritdoc />
    public override double AreaSquareMeters => Math.PI * RadiusMeters * RadiusMeters;

    /// <inheritdoc />
    public override double PerimeterMeters => Math.PI * DiameterMeters;

    /// <summary>a e^(-1/4): the GMD of a circle from itself (Grover 1946).</summary>
    public override double GeometricMeanRadiusMeters => RadiusMeters * Math.Exp(-0.25);

    /// <inheritdoc />
    public override double RadialExtentMeters => DiameterMeters;

    /// <inheritdoc />
    public override double LargestDimensionMeters => DiameterMeters;

    /// <inheritdoc />
    public override double SmallestDimensionMeters => DiameterMeters;

    /// <inheritdoc />
    public override string Describe() => SiFormat.Format(DiameterMeters, "m") + " wire";
}

/// <summary>A rectangular band: width w along the loop's axis, thickness t radially.</summary>
public sealed class RectangularBand : CrossSection
{
    /// <summary>
    /// The GMD factor of a rectangle, GMD ~ 0.2235 (w + t) (Grover 1946, Inductance Calculations; exact for a
    /// square to 0.2 %, and e^(-3/2) = 0.2231 for a thin strip).
    /// </summary>
    public const double GmdFactor = 0.2235;

    /// <summary>Creates the section.</summary>
    public RectangularBand(double widthMeters, double thicknessMeters)
    {
        WidthMeters = widthMeters;
        ThicknessMeters = thicknessMeters;
    }

    /// <summary>The width along the loop's axis, m.</summary>
    public double WidthMeters { get; }

    /// <summary>The radial thickness, m.</summary>
    public double ThicknessMeters { get; }

    /// <inheritdoc />
    public override double AreaSquareMeters => WidthMeters * ThicknessMeters;

    /// <inheritdoc />
    public override double PerimeterMeters => 2 * (WidthMeters + ThicknessMeters);

    /// <inheritdoc />
    public override double GeometricMeanRadiusMeters => GmdFactor * (WidthMeters + ThicknessMeters);

    /// <inheritdoc />
    public override double RadialExtentMeters => ThicknessMeters;

    /// <inheritdoc />
    public override double LargestDimensionMeters => Math.Max(WidthMeters, ThicknessMeters);

    /// <inheritdoc />
    public override double SmallestDimensionMeters => Math.Min(WidthMeters, ThicknessMeters);

    /// <inheritdoc />
    public override string Describe() =>
        SiFormat.Format(WidthMeters, "m") + " x " + SiFormat.Format(ThicknessMeters, "m") + " band";
}
