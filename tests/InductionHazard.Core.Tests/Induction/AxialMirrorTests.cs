using System;
using System.Collections.Generic;
using System.Numerics;
using InductionHazard.Induction;
using InductionHazard.Items;
using Xunit;

namespace InductionHazard.Tests.Induction;

/// <summary>
/// The mirror symmetry of coaxial filament meshes about their mid-plane: every mesh the bodies make has it, a pair of
/// filaments and its mirror image have the same mutual inductance (Maxwell's formula depends on the axial distance
/// alone), and the modes found from the even and odd halves are those of the whole matrix.
/// </summary>
public class AxialMirrorTests
{
    private const double Rho = 2.7e-8;

    public static TheoryData<string> Meshes => new() { "rod", "disc", "sphere", "closed tube", "thick ring", "band", "finer sphere", "finer thick ring" };

    /// <summary>Meshes of the bodies and thick rings the filament model solves, at cell sizes it uses.</summary>
    private static IReadOnlyList<Filament> Cells(string mesh) => mesh switch
    {
        // A copper rod in a ramp over minutes: the mesh's fewest cells (the demo's test rod).
        "rod" => FilamentModelTests.Body("Cylinder", "Copper", 0.010, length: 0.120).Loop.Filaments(1.0)!,
        // The furnace's aluminium disc: cells a third of the skin depth at 9.6 kHz.
        "disc" => FilamentModelTests.Body("Disc", "Aluminium", 0.050, thickness: 0.003).Loop.Filaments(2.9e-4)!,
        "sphere" => FilamentModelTests.Body("Sphere", "Brass", 0.030).Loop.Filaments(1e-3)!,
        "closed tube" => FilamentModelTests.Body("Tube", "Aluminium", 0.100, length: 0.300, wall: 0.004, closedEnds: true).Loop.Filaments(2e-3)!,
        "thick ring" => Ring(new Dictionary<string, object?> { ["Diameter"] = 0.020, ["WireDiameter"] = 0.004 }).Loop.Filaments(3e-4)!,
        "band" => Ring(new Dictionary<string, object?> { ["InnerDiameter"] = 0.017, ["Width"] = 0.004, ["Thickness"] = 0.0016 }).Loop.Filaments(2e-4)!,
        // Finer polar meshes whose rings have an odd number of sectors: some filaments lie on the mid-plane, their own images.
        "finer sphere" => FilamentModelTests.Body("Sphere", "Brass", 0.030).Loop.Filaments(5e-4)!,
        "finer thick ring" => Ring(new Dictionary<string, object?> { ["Diameter"] = 0.020, ["WireDiameter"] = 0.004 }).Loop.Filaments(8e-5)!,
        _ => throw new ArgumentOutOfRangeException(nameof(mesh)),
    };

    private static ConductiveItem Ring(Dictionary<string, object?> sizes)
    {
        sizes["Name"] = "ring";
        sizes["Material"] = "Gold";
        return ItemRecordReader.Read(sizes, MaterialLibrary.BuiltIn);
    }

    [Theory]
    [MemberData(nameof(Meshes))]
    public void EveryFilamentOfABodysMeshHasItsMirrorImage(string mesh)
    {
        IReadOnlyList<Filament> cells = Cells(mesh);
        AxialMirror mirror = AxialMirror.Of(cells) ?? throw new Xunit.Sdk.XunitException(mesh + ": no mirror found for its " + cells.Count + " filaments");
        for (int i = 0; i < cells.Count; i++)
        {
            Filament p = cells[i], q = cells[mirror.ImageOf(i)];
            Assert.Equal(i, mirror.ImageOf(mirror.ImageOf(i)));
            Within.Absolute(p.RadiusMeters, q.RadiusMeters, 1e-15, mesh + " filament " + i + ": its image's radius");
            Within.Absolute(-p.AxialMeters, q.AxialMeters, 1e-15, mesh + " filament " + i + ": its image's axial position");
            Within.Relative(p.AreaSquareMeters, q.AreaSquareMeters, 1e-12, mesh + " filament " + i + ": its image's section");
        }
    }

    [Theory]
    [InlineData("finer sphere")]
    [InlineData("finer thick ring")]
    public void SomeMeshesHaveFilamentsOnTheMidPlaneThatAreTheirOwnImages(string mesh)
    {
        // The halves' modes treat such a filament apart (in the even block alone); these meshes keep that case tested.
        IReadOnlyList<Filament> cells = Cells(mesh);
        AxialMirror mirror = AxialMirror.Of(cells)!;
        int onPlane = 0;
        for (int i = 0; i < cells.Count; i++)
        {
            if (mirror.ImageOf(i) == i)
            {
                onPlane++;
                Within.Absolute(0, cells[i].AxialMeters, 1e-15, mesh + " filament " + i + " on the plane");
            }
        }

        Assert.True(onPlane > 0, mesh + ": no filament on the mid-plane among " + cells.Count);
    }

    [Fact]
    public void AMeshWithOneFilamentMovedHasNoMirror()
    {
        var cells = new List<Filament>(Cells("disc"));
        Assert.NotNull(AxialMirror.Of(cells));
        Filament moved = cells[7];
        cells[7] = moved with { AxialMeters = moved.AxialMeters + 1e-6 };
        Assert.Null(AxialMirror.Of(cells));
        cells[7] = moved with { RadiusMeters = moved.RadiusMeters * (1 + 1e-6) };
        Assert.Null(AxialMirror.Of(cells));
        cells.RemoveAt(7);
        Assert.Null(AxialMirror.Of(cells));
    }

    [Theory]
    [MemberData(nameof(Meshes))]
    public void APairOfFilamentsAndItsMirrorImageHaveOneMutualInductance(string mesh)
    {
        // Maxwell's formula depends on the radii and the axial distance alone, so a pair and its image (each filament
        // reflected in the mid-plane) couple alike. The evenly spaced cells of a mesh sit on the boundary between the
        // pairs taken at their centroids and those averaged over sub-filaments; taken on either side of it by rounding,
        // a rod's pair and its image differed by 9 %.
        IReadOnlyList<Filament> cells = Cells(mesh);
        AxialMirror mirror = AxialMirror.Of(cells)!;
        int compared = 0;
        for (int i = 0; i < cells.Count; i++)
        {
            for (int j = i + 1; j < cells.Count; j++)
            {
                double m = CoaxialInductance.MutualHenries(cells[i], cells[j]);
                double image = CoaxialInductance.MutualHenries(cells[mirror.ImageOf(i)], cells[mirror.ImageOf(j)]);
                // To rounding: the GMD correction of rectangles a few sides apart is a difference of nearly equal logarithms,
                // some 1e-9 of the term.
                Within.Relative(m, image, 1e-8, mesh + ": filaments " + i + " and " + j + " against their images");
                compared++;
            }
        }

        Assert.True(compared > 1000, compared + " pairs compared");
    }

    [Theory]
    [MemberData(nameof(Meshes))]
    public void TheModesFromTheMirrorsHalvesAreThoseOfTheWholeMatrix(string mesh)
    {
        // The inductance matrix computed once for each pair and its image equals the one computed pair by pair (to
        // rounding); the modes
        // found in the even and odd halves reproduce it (W diag(lambda) W^T = R0^-1 L R0^-1), are orthonormal in the
        // resistance (W^T R0 W = I), and have the eigenvalues of the whole problem.
        IReadOnlyList<Filament> cells = Cells(mesh);
        int n = cells.Count;
        PathSet halves = PathSet.Coaxial(cells, mesh);
        PathSet whole = PathSet.Coaxial(cells, mesh, mirror: null);
        Assert.NotNull(halves.Mirror);
        Assert.Null(whole.Mirror);
        double scale = 0;
        for (int i = 0; i < n; i++)
        {
            scale = Math.Max(scale, Math.Abs(whole.InductanceHenries[i, i]));
        }

        for (int i = 0; i < n; i++)
        {
            Within.Relative(whole.LengthOverArea[i], halves.LengthOverArea[i], 1e-12, mesh + ": path " + i + "'s length over section");
            for (int j = 0; j < n; j++)
            {
                // Rounding apart: an image's term is found from geometry that differs in the last digits, some terms as a
                // difference of nearly equal logarithms (the GMD correction).
                Within.Absolute(whole.InductanceHenries[i, j], halves.InductanceHenries[i, j], 1e-8 * Math.Abs(whole.InductanceHenries[i, j]), mesh + ": L[" + i + ", " + j + "]");
            }
        }

        PathModes fromHalves = halves.Modes(Rho)!, fromWhole = whole.Modes(Rho)!;
        double largest = fromWhole.Lambdas[n - 1];
        for (int k = 0; k < n; k++)
        {
            Within.Absolute(fromWhole.Lambdas[k], fromHalves.Lambdas[k], 1e-11 * largest, mesh + ": mode " + k + "'s time constant");
            Assert.True(k == 0 || fromHalves.Lambdas[k] >= fromHalves.Lambdas[k - 1], mesh + ": modes in ascending order");
        }

        // R0^-1 = diag(1 / (rho l/S)); the check W diag(lambda) W^T against R0^-1 L R0^-1, entry by entry.
        double[,] w = fromHalves.Weights;
        var inverseR = new double[n];
        double reconstructedScale = 0;
        for (int i = 0; i < n; i++)
        {
            inverseR[i] = 1 / (Rho * whole.LengthOverArea[i]);
            reconstructedScale = Math.Max(reconstructedScale, inverseR[i] * inverseR[i] * scale);
        }

        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                double sum = 0, metric = 0;
                for (int k = 0; k < n; k++)
                {
                    sum += w[i, k] * fromHalves.Lambdas[k] * w[j, k];
                    metric += w[k, i] * w[k, j] / inverseR[k];
                }

                Within.Absolute(inverseR[i] * whole.InductanceHenries[i, j] * inverseR[j], sum, 1e-10 * reconstructedScale, mesh + ": (W diag(lambda) W^T)[" + i + ", " + j + "]");
                Within.Absolute(i == j ? 1 : 0, metric, 1e-10, mesh + ": (W^T R0 W)[" + i + ", " + j + "]");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Meshes))]
    public void ADriveAlikeAtBothHalvesLeavesTheOddModesOutAndTheCurrentsAsTheyWere(string mesh)
    {
        // A uniform field along the axis links each filament's own area, the same at a filament and its image: the odd
        // modes are not driven and the circuit holds the even ones alone. Every path's steady current at 1 kHz is that of
        // the whole problem's modes; a drive that differs between the halves (the field's gradient along the axis) keeps
        // every mode, with the same currents.
        IReadOnlyList<Filament> cells = Cells(mesh);
        int n = cells.Count;
        PathModes halves = PathSet.Coaxial(cells, mesh).Modes(Rho)!, whole = PathSet.Coaxial(cells, mesh, mirror: null).Modes(Rho)!;
        var alike = new double[n, 1];
        var differing = new double[n, 2];
        for (int i = 0; i < n; i++)
        {
            alike[i, 0] = Math.PI * cells[i].RadiusMeters * cells[i].RadiusMeters;
            differing[i, 0] = alike[i, 0];
            differing[i, 1] = alike[i, 0] * cells[i].AxialMeters;
        }

        ModalCircuit even = halves.Drive(alike), all = halves.Drive(differing);
        Assert.True(even.Count < n && even.Count >= n / 2, mesh + ": " + even.Count + " of " + n + " modes driven by a uniform field");
        Assert.Equal(n, all.Count);
        Same(even, whole.Drive(alike), new[] { 1.0 });
        Same(all, whole.Drive(differing), new[] { 1.0, 30.0 });

        void Same(ModalCircuit circuit, ModalCircuit reference, double[] drives)
        {
            Complex[] currents = Currents(circuit, drives), expected = Currents(reference, drives);
            double largest = 0;
            foreach (Complex c in expected)
            {
                largest = Math.Max(largest, c.Magnitude);
            }

            for (int i = 0; i < n; i++)
            {
                Within.Absolute(0, (currents[i] - expected[i]).Magnitude, 1e-10 * largest, mesh + ": path " + i + "'s current, " + circuit.Count + " modes against " + reference.Count);
            }
        }

        Complex[] Currents(ModalCircuit circuit, double[] drives)
        {
            double omega = 2 * Math.PI * 1000;
            var currents = new Complex[n];
            for (int k = 0; k < circuit.Count; k++)
            {
                Complex forcing = Complex.Zero;
                for (int j = 0; j < drives.Length; j++)
                {
                    forcing += circuit.Coupling[k, j] * drives[j];
                }

                Complex z = -Complex.ImaginaryOne * omega * forcing / new Complex(1, omega * circuit.Lambdas[k]);
                for (int i = 0; i < n; i++)
                {
                    currents[i] += circuit.PathWeights![i, k] * z;
                }
            }

            return currents;
        }
    }
}
