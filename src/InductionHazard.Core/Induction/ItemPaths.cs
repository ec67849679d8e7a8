using System;
using System.Collections.Generic;
using System.Linq;
using System.Globalization;
using System.Numerics;
using System.Threading;
using InductionHazard.Fields;
using InductionHazard.Items;
using InductionHazard.Quantities;

namespace InductionHazard.Induction;

/// <summary>
/// The current paths an item is solved with, chosen per scenario: one path for a loop that is thin against its own
/// span and against the skin depth; coaxial filaments over the section of a thick ring or band and of every body of
/// revolution, cells a third of the skin depth thick at each surface. Holds the set, its modes at the starting
/// resistivity and what the notes say of it.
/// </summary>
public sealed class ItemPaths
{
    /// <summary>The filament cells at a surface are at most this fraction of the skin depth thick.</summary>
    public const double SurfaceCellSkinDepths = 1.0 / 3;

    /// <summary>
    /// The most filaments solved: the inductance matrix grows as the square and its modes as the cube of the count.
    /// A section that needs more (a thick body at a high frequency) is refused, not solved coarsely.
    /// </summary>
    public const int MaxPaths = 1100;

    private ItemPaths(ConductiveItem item, PathSet? paths, PathModes? modes, string description, string? problem, double referenceResistivity)
    {
        Item = item;
        Paths = paths;
        Modes = modes;
        Description = description;
        Problem = problem;
        ReferenceResistivityOhmMeters = referenceResistivity;
        _inverseReference = 1 / referenceResistivity;
    }

    /// <summary>1 / rho_ref: <see cref="ScaleAt"/> runs at every step of a transient, where a division held up the step.</summary>
    private readonly double _inverseReference;

    /// <summary>The item.</summary>
    public ConductiveItem Item { get; }

    /// <summary>The path set; null when it could not be built (see <see cref="Problem"/>).</summary>
    public PathSet? Paths { get; }

    /// <summary>Its modes at the reference resistivity; null when not found.</summary>
    public PathModes? Modes { get; }

    /// <summary>True for one path (a thin loop).</summary>
    public bool IsSingle => Paths is { Count: 1 };

    /// <summary>What was built and why, for the notes.</summary>
    public string Description { get; }

    /// <summary>Why no solution can be given with these paths; null when they hold.</summary>
    public string? Problem { get; }

    /// <summary>The resistivity the modes were found at (the item's at its starting temperature), ohm m.</summary>
    public double ReferenceResistivityOhmMeters { get; }

    /// <summary>s(T) = rho(T) / rho_ref: every path's resistance relative to the reference (as rho(T) times 1 / rho_ref, within an ulp of the quotient).</summary>
    public double ScaleAt(double celsius) => Item.Material.ResistivityAt(celsius) * _inverseReference;

    /// <summary>Chooses and builds the paths for an item at a drive's significant frequency.</summary>
    /// <param name="item">The item (closed).</param>
    /// <param name="frequencyHertz">The drive's significant frequency.</param>
    /// <param name="startCelsius">The item's starting temperature (the modes' reference resistivity).</param>
    /// <param name="thinLoop">True when the loop is thin against its span and the skin depth (one path holds).</param>
    /// <param name="refinement">Multiplies the fewest cells across each dimension, and divides the surface cell (to show convergence).</param>
    public static ItemPaths For(ConductiveItem item, double frequencyHertz, double startCelsius, bool thinLoop, int refinement = 1)
    {
        // The item's last paths serve again when asked for the same (an item is assessed at many places and distances;
        // a filament body's modes take milliseconds): everything below depends on these and the item alone, and an
        // item does not change.
        var key = (frequencyHertz, startCelsius, thinLoop, refinement);
        if (Volatile.Read(ref item.LastPaths) is { } last && last._key.Equals(key))
        {
            return last;
        }

        ItemPaths paths = Build(item, frequencyHertz, startCelsius, thinLoop, refinement);
        paths._key = key;
        Volatile.Write(ref item.LastPaths, paths);
        return paths;
    }

    /// <summary>What the key asks for, built.</summary>
    private (double Frequency, double Start, bool Thin, int Refinement) _key;

    private static ItemPaths Build(ConductiveItem item, double frequencyHertz, double startCelsius, bool thinLoop, int refinement)
    {
        double rho = item.Material.ResistivityAt(startCelsius);
        if (!thinLoop && item.Loop is RectangularLoopGeometry frame && item.Loop.Section is RoundWire wire)
        {
            return ForShells(item, frame, wire.RadiusMeters, SkinEffect.SkinDepthMeters(rho, frequencyHertz, item.Material.RelativePermeability), refinement, rho);
        }

        if (thinLoop || item.Loop is RectangularLoopGeometry)
        {
            var circuit = new RingCircuit(item);
            PathSet single = PathSet.OnePath(circuit.DcInductanceHenries, item.Loop.PathLengthMeters / item.Loop.Section.AreaSquareMeters, "one path");
            return new ItemPaths(item, single, single.Modes(rho), "one path: the loop as a thin ring (Grover 1946)", null, rho);
        }

        double delta = SkinEffect.SkinDepthMeters(rho, frequencyHertz, item.Material.RelativePermeability);
        double cell = SurfaceCellSkinDepths * delta / refinement;
        if (item.Loop is PrismBody prism)
        {
            return ForBlock(item, prism, cell, delta, frequencyHertz, refinement, rho);
        }

        IReadOnlyList<Filament>? cells = item.Loop.Filaments(cell, refinement);
        if (cells is null)
        {
            return new ItemPaths(item, null, null, "no filament model for this outline", "no filament model exists for a " + item.Loop.Describe(), rho);
        }

        if (cells.Count > MaxPaths)
        {
            return new ItemPaths(
                item,
                null,
                null,
                cells.Count.ToString(CultureInfo.InvariantCulture) + " filaments needed",
                "the skin depth (" + SiFormat.Format(delta, "m") + " at " + SiFormat.Format(frequencyHertz, "Hz") + ") is so small against the item that resolving it needs "
                + cells.Count.ToString("N0", CultureInfo.InvariantCulture) + " filaments, more than the " + MaxPaths.ToString(CultureInfo.InvariantCulture) + " the filament model solves",
                rho);
        }

        PathSet set = PathSet.Coaxial(cells, cells.Count.ToString(CultureInfo.InvariantCulture) + " coaxial filaments");
        PathModes? modes = set.Modes(rho);
        string description = cells.Count.ToString(CultureInfo.InvariantCulture) + " coaxial filaments over the section, cells at most "
            + SiFormat.Format(Math.Min(cell, double.MaxValue), "m") + " (a third of the skin depth " + SiFormat.Format(delta, "m") + ") at each surface, growing " + FilamentMesh.Growth.ToString(CultureInfo.InvariantCulture) + "x inward";
        return modes is null
            ? new ItemPaths(item, set, null, description, "the filament inductance matrix is not positive definite (the mesh cannot represent this section)", rho)
            : new ItemPaths(item, set, modes, description, null, rho);
    }

    /// <summary>
    /// Concentric shells of a round wire bent into a rectangle: the outermost a third of the skin depth thick (over the
    /// refinement), each next one <see cref="FilamentMesh.Growth"/> times thicker inward, none thicker than a third
    /// of the radius, and a solid core.
    /// </summary>
    private static ItemPaths ForShells(ConductiveItem item, RectangularLoopGeometry frame, double radius, double delta, int refinement, double rho)
    {
        var radii = new List<double> { radius };
        double r = radius, thickness = Math.Min(SurfaceCellSkinDepths * delta / refinement, radius / (3 * refinement));
        while (r - thickness > 0.5 * thickness && radii.Count <= MaxPaths)
        {
            r -= thickness;
            radii.Add(r);
            thickness = Math.Min(thickness * FilamentMesh.Growth, radius / (3 * refinement));
        }

        radii.Add(0);
        radii.Reverse();
        int count = radii.Count - 1;
        string description = count.ToString(CultureInfo.InvariantCulture) + " concentric shells of the wire, the outermost " + SiFormat.Format(radii[count] - radii[count - 1], "m")
            + " thick (a third of the skin depth " + SiFormat.Format(delta, "m") + "), growing " + FilamentMesh.Growth.ToString(CultureInfo.InvariantCulture) + "x inward";
        if (count > MaxPaths)
        {
            return new ItemPaths(item, null, null, description, "the skin depth (" + SiFormat.Format(delta, "m") + ") is so small against the wire that resolving it needs more than " + MaxPaths.ToString(CultureInfo.InvariantCulture) + " shells", rho);
        }

        PathSet set = PathSet.Shells(frame.WidthMeters, frame.HeightMeters, radii, description);
        PathModes? modes = set.Modes(rho);
        return modes is null
            ? new ItemPaths(item, set, null, description, "the shells' inductance matrix is not positive definite", rho)
            : new ItemPaths(item, set, modes, description, null, rho);
    }

    /// <summary>The flux per unit drive through each cell of a block's mesh: the cell's rectangle at its centre.</summary>
    private static double[,] MeshCoupling(PlateMesh mesh, FieldSource source, Vector3D centre, Vector3D normal, Vector3D? width)
    {
        (Vector3D ex, Vector3D ey) = FaceAxes(normal, width);
        var coupling = new double[mesh.Count, source.Terms.Count];
        for (int j = 0; j < source.Terms.Count; j++)
        {
            IFieldGeometry geometry = source.Terms[j].Geometry;
            for (int k = 0; k < mesh.Layers; k++)
            {
                for (int row = 0; row < mesh.Rows; row++)
                {
                    for (int col = 0; col < mesh.Columns; col++)
                    {
                        double w = mesh.X[col + 1] - mesh.X[col], h = mesh.Y[row + 1] - mesh.Y[row];
                        Vector3D p = centre + (0.5 * (mesh.X[col] + mesh.X[col + 1]) * ex) + (0.5 * (mesh.Y[row] + mesh.Y[row + 1]) * ey) + (0.5 * (mesh.Z[k] + mesh.Z[k + 1]) * normal);
                        coupling[mesh.Cell(col, row, k), j] = geometry is UniformField u
                            ? u.Direction.Dot(normal) * w * h
                            : RectangleQuadrature.Flux(geometry.FieldPerUnitDrive, p, normal, ex, w, h);
                    }
                }
            }
        }

        return coupling;
    }

    /// <summary>
    /// The force per ampere of each cell's current and unit drive of each term: the sum over its branches, with the
    /// signs its current runs in them, of l x b at two Gauss points along each branch.
    /// </summary>
    private static Vector3D[,] MeshForce(PlateMesh mesh, FieldSource source, Vector3D centre, Vector3D normal, Vector3D? width)
    {
        (Vector3D ex, Vector3D ey) = FaceAxes(normal, width);
        var force = new Vector3D[mesh.Count, source.Terms.Count];
        double g = 0.5 / Math.Sqrt(3);
        for (int j = 0; j < source.Terms.Count; j++)
        {
            IFieldGeometry geometry = source.Terms[j].Geometry;
            foreach (MeshBranch b in mesh.Branches)
            {
                Vector3D along = b.AlongX ? ex : ey, across = b.AlongX ? ey : ex;
                Vector3D start = centre + (b.From * along) + (b.Across * across) + (b.Axial * normal);
                Vector3D f = Vector3D.Zero;
                foreach (double u in new[] { 0.5 - g, 0.5 + g })
                {
                    f += (0.5 * b.Length * along).Cross(geometry.FieldPerUnitDrive(start + (u * b.Length * along)));
                }

                if (b.Plus >= 0)
                {
                    force[b.Plus, j] += f;
                }

                if (b.Minus >= 0)
                {
                    force[b.Minus, j] -= f;
                }
            }
        }

        return force;
    }

    /// <summary>A block: mesh currents over its grid, the centre cells' currents reported as the total.</summary>
    private static ItemPaths ForBlock(ConductiveItem item, PrismBody prism, double cell, double delta, double frequencyHertz, int refinement, double rho)
    {
        PlateMesh mesh = prism.Mesh(cell, refinement);
        string count = mesh.Count.ToString(CultureInfo.InvariantCulture) + " mesh currents (" + mesh.Columns.ToString(CultureInfo.InvariantCulture) + " x " + mesh.Rows.ToString(CultureInfo.InvariantCulture) + " cells in "
            + mesh.Layers.ToString(CultureInfo.InvariantCulture) + (mesh.Layers == 1 ? " layer" : " layers") + ")";
        if (mesh.Count > MaxPaths)
        {
            return new ItemPaths(
                item,
                null,
                null,
                count,
                "the skin depth (" + SiFormat.Format(delta, "m") + " at " + SiFormat.Format(frequencyHertz, "Hz") + ") is so small against the block that resolving it needs "
                + mesh.Count.ToString("N0", CultureInfo.InvariantCulture) + " mesh currents, more than the " + MaxPaths.ToString(CultureInfo.InvariantCulture) + " solved",
                rho);
        }

        PathSet set = PathSet.Mesh(mesh, count);
        var centre = new double[mesh.Count];
        for (int k = 0; k < mesh.Layers; k++)
        {
            centre[mesh.Cell(mesh.Columns / 2, mesh.Rows / 2, k)] = 1;
        }

        PathModes? modes = set.Modes(rho);
        string description = count + " over the block (partial-element method), cells at most " + SiFormat.Format(cell, "m") + " (a third of the skin depth " + SiFormat.Format(delta, "m") + ") at each face";
        return modes is null
            ? new ItemPaths(item, set, null, description, "the block's inductance or resistance matrix is not positive definite (the mesh cannot represent it)", rho)
            : new ItemPaths(item, set, modes with { CurrentWeights = centre }, description, null, rho);
    }

    /// <summary>The unit directions of a block's width and height for a normal (and its width's direction, if given).</summary>
    private static (Vector3D X, Vector3D Y) FaceAxes(Vector3D normal, Vector3D? width)
    {
        Vector3D x = RectangularLoopGeometry.WidthDirection(normal, width);
        return (x, normal.Cross(x));
    }

    /// <summary>
    /// The flux per unit drive of each term through each path (paths x terms), Wb per drive unit: through the disc
    /// of each filament (radius r_i, at z_i along the normal), or through the loop's own outline for one path.
    /// </summary>
    /// <param name="source">The field source.</param>
    /// <param name="centre">The item's centre, m.</param>
    /// <param name="normal">The item's unit normal (its axis).</param>
    /// <param name="width">For a rectangular outline or block, the direction of its width; null for the usual one.</param>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be integrated over a path.</exception>
    public double[,] Coupling(FieldSource source, Vector3D centre, Vector3D normal, Vector3D? width = null)
    {
        int terms = source.Terms.Count;
        if (Paths?.Plate is { } mesh)
        {
            return MeshCoupling(mesh, source, centre, normal, width);
        }

        if (Paths?.Filaments is not { } cells)
        {
            // One path, or shells that all follow the outline: each links the outline's flux.
            double[] outline = FluxCoupling.PerUnitDrive(source, centre, normal, Item.Loop, width);
            int count = Paths?.Count ?? 1;
            var single = new double[count, terms];
            for (int i = 0; i < count; i++)
            {
                for (int j = 0; j < terms; j++)
                {
                    single[i, j] = outline[j];
                }
            }

            return single;
        }

        // A cell of uniform current density I/S takes in the power I times the cell's mean emf, so its coupling is the
        // flux averaged over the cell: by 2 x 2 Gauss-Legendre points, exact for the r^2 of a uniform field.
        var coupling = new double[cells.Count, terms];
        for (int j = 0; j < terms; j++)
        {
            IFieldGeometry geometry = source.Terms[j].Geometry;
            if (geometry is UniformField)
            {
                for (int i = 0; i < cells.Count; i++)
                {
                    double sum = 0;
                    foreach ((double r, double z, double weight) in cells[i].GaussSamples())
                    {
                        sum += weight * geometry.FluxThroughDisc(centre + (z * normal), normal, Math.Max(r, 0));
                    }

                    coupling[i, j] = sum;
                }

                continue;
            }

            // A field integrated by quadrature: the discs of one plane share it, so each plane is integrated once,
            // annulus by annulus, for all the radii its samples need (DiscQuadrature.NestedFluxes); or in closed form
            // where the geometry has one (a coil's discs on its axis).
            var planes = new Dictionary<double, List<double>>();
            foreach (Filament cell in cells)
            {
                foreach ((double r, double z, _) in cell.GaussSamples())
                {
                    if (!planes.TryGetValue(z, out List<double>? radii))
                    {
                        planes[z] = radii = new List<double>();
                    }

                    radii.Add(Math.Max(r, 0));
                }
            }

            var flux = new Dictionary<(double Z, double R), double>();
            foreach (KeyValuePair<double, List<double>> plane in planes)
            {
                Vector3D at = centre + (plane.Key * normal);
                double[] values = (geometry as IClosedFormDiscFlux)?.ClosedFormFluxes(at, normal, plane.Value)
                    ?? DiscQuadrature.NestedFluxes(geometry.FieldPerUnitDrive, at, normal, plane.Value);
                for (int k = 0; k < values.Length; k++)
                {
                    flux[(plane.Key, plane.Value[k])] = values[k];
                }
            }

            for (int i = 0; i < cells.Count; i++)
            {
                double sum = 0;
                foreach ((double r, double z, double weight) in cells[i].GaussSamples())
                {
                    sum += weight * flux[(z, Math.Max(r, 0))];
                }

                coupling[i, j] = sum;
            }
        }

        return coupling;
    }

    /// <summary>Points around a circular path for the force's line integral (trapezoid rule: spectral for a smooth field).</summary>
    private const int CirclePoints = 96;

    /// <summary>
    /// The force on each path per ampere and per unit drive of each term (paths x terms), N/(A drive unit): the line
    /// integral of dl x b_j around the path, which for a rigid circuit equals the gradient of its flux per unit drive,
    /// grad M_ij (F = I grad Phi = I closed-integral dl x B). Around a filament's circle (averaged over its cell's Gauss
    /// points) by the trapezoid rule at 96 points, or in closed form where the geometry has one (a coil's circles on its
    /// axis, <see cref="IClosedFormDiscFlux"/>); around a rectangle by 16-point Gauss-Legendre on each side. Zero for a
    /// source whose every term is uniform.
    /// </summary>
    /// <param name="source">The field source.</param>
    /// <param name="centre">The item's centre, m.</param>
    /// <param name="normal">The item's unit normal (its axis).</param>
    /// <param name="width">For a rectangular outline or block, the direction of its width; null for the usual one.</param>
    /// <exception cref="Errors.FieldEvaluationException">The field cannot be evaluated on a path.</exception>
    public Vector3D[,] CouplingGradient(FieldSource source, Vector3D centre, Vector3D normal, Vector3D? width = null)
    {
        int paths = Paths?.Count ?? 1, terms = source.Terms.Count;
        var gradient = new Vector3D[paths, terms];
        bool uniform = true;
        foreach (SourceTerm term in source.Terms)
        {
            uniform &= term.Geometry is UniformField;
        }

        if (uniform)
        {
            return gradient;
        }

        if (Paths?.Plate is { } mesh)
        {
            return MeshForce(mesh, source, centre, normal, width);
        }

        (Vector3D u, Vector3D v) = DiscQuadrature.Basis(normal);
        for (int j = 0; j < terms; j++)
        {
            IFieldGeometry geometry = source.Terms[j].Geometry;
            if (Paths?.Filaments is { } cells)
            {
                for (int i = 0; i < cells.Count; i++)
                {
                    Vector3D sum = Vector3D.Zero;
                    foreach ((double r, double z, double weight) in cells[i].GaussSamples())
                    {
                        Vector3D at = centre + (z * normal);
                        sum += weight * ((geometry as IClosedFormDiscFlux)?.ClosedFormRimForce(at, normal, r) ?? AroundCircle(geometry, at, u, v, r));
                    }

                    gradient[i, j] = sum;
                }
            }
            else
            {
                Vector3D around = Item.Loop is RectangularLoopGeometry rectangle
                    ? AroundRectangle(geometry, centre, normal, rectangle, width)
                    : (geometry as IClosedFormDiscFlux)?.ClosedFormRimForce(centre, normal, Item.Loop.HalfSpanMeters) ?? AroundCircle(geometry, centre, u, v, Item.Loop.HalfSpanMeters);
                for (int i = 0; i < paths; i++)
                {
                    gradient[i, j] = around;
                }
            }
        }

        return gradient;
    }

    /// <summary>cos and sin of the circle's points k 2 pi / <see cref="CirclePoints"/>, found once (they were found at every point of every filament's circle).</summary>
    private static readonly double[] CircleCosines = Enumerable.Range(0, CirclePoints).Select(k => Math.Cos(k * (2 * Math.PI / CirclePoints))).ToArray();

    private static readonly double[] CircleSines = Enumerable.Range(0, CirclePoints).Select(k => Math.Sin(k * (2 * Math.PI / CirclePoints))).ToArray();

    /// <summary>
    /// The line integral of dl x b around a circle by the trapezoid rule on nested sets of its 96 points: every eighth
    /// (12), then every fourth, second and all, each set adding the points between the last's. It stops at the first set
    /// that agrees with the one before to 1e-10 of the integral of |b| dl: the rule converges spectrally for a smooth
    /// field, so that set is within far less of the integral (a small filament far from every conductor agrees at 24
    /// points, a quarter of the work); where the field varies fast around the circle, all 96 are taken, as before.
    /// </summary>
    private static Vector3D AroundCircle(IFieldGeometry geometry, Vector3D centre, Vector3D u, Vector3D v, double radius)
    {
        Vector3D sum = Vector3D.Zero;
        double magnitude = 0;
        void Add(int k)
        {
            double c = CircleCosines[k], sn = CircleSines[k];
            Vector3D b = geometry.FieldPerUnitDrive(centre + (radius * c * u) + (radius * sn * v));
            sum += ((-sn * u) + (c * v)).Cross(b);
            magnitude += b.Length;
        }

        for (int k = 0; k < CirclePoints; k += CircleFirstStride)
        {
            Add(k);
        }

        Vector3D previous = sum * (2 * Math.PI * radius * CircleFirstStride / CirclePoints);
        for (int stride = CircleFirstStride / 2; stride >= 1; stride /= 2)
        {
            for (int k = stride; k < CirclePoints; k += 2 * stride)
            {
                Add(k);
            }

            double length = 2 * Math.PI * radius * stride / CirclePoints;
            Vector3D estimate = sum * length;
            if ((estimate - previous).Length <= CircleTolerance * magnitude * length)
            {
                return estimate;
            }

            previous = estimate;
        }

        return previous;
    }

    /// <summary>The stride through the circle's points of the first set (every eighth: 12 points).</summary>
    private const int CircleFirstStride = 8;

    /// <summary>The agreement of two nested sets, relative to the integral of |b| dl, at which the line integral stops.</summary>
    private const double CircleTolerance = 1e-10;

    private static Vector3D AroundRectangle(IFieldGeometry geometry, Vector3D centre, Vector3D normal, RectangularLoopGeometry rectangle, Vector3D? width)
    {
        Vector3D w = RectangularLoopGeometry.WidthDirection(normal, width);
        Vector3D h = normal.Cross(w);
        double a = rectangle.WidthMeters / 2, b = rectangle.HeightMeters / 2;
        GaussLegendre.Rule rule = GaussLegendre.Of(16);

        // Corners counter-clockwise about the normal: (-a,-b) -> (a,-b) -> (a,b) -> (-a,b).
        Vector3D[] corners = { centre - (a * w) - (b * h), centre + (a * w) - (b * h), centre + (a * w) + (b * h), centre - (a * w) + (b * h) };
        Vector3D sum = Vector3D.Zero;
        for (int side = 0; side < 4; side++)
        {
            Vector3D from = corners[side], to = corners[(side + 1) % 4];
            Vector3D half = 0.5 * (to - from);
            for (int k = 0; k < rule.Nodes.Length; k++)
            {
                Vector3D p = from + half + (rule.Nodes[k] * half);
                sum += (rule.Weights[k] * half).Cross(geometry.FieldPerUnitDrive(p));
            }
        }

        return sum;
    }

    /// <summary>The area each path encloses, m^2: pi r_i^2 for a filament, the loop's own area for one path (its magnetic moment per ampere).</summary>
    public double[] PathAreas()
    {
        if (Paths?.Plate is { } mesh)
        {
            var cellAreas = new double[mesh.Count];
            for (int k = 0; k < mesh.Layers; k++)
            {
                for (int row = 0; row < mesh.Rows; row++)
                {
                    for (int col = 0; col < mesh.Columns; col++)
                    {
                        cellAreas[mesh.Cell(col, row, k)] = (mesh.X[col + 1] - mesh.X[col]) * (mesh.Y[row + 1] - mesh.Y[row]);
                    }
                }
            }

            return cellAreas;
        }

        if (Paths?.Filaments is not { } cells)
        {
            return Enumerable.Repeat(Item.Loop.LoopAreaSquareMeters, Paths?.Count ?? 1).ToArray();
        }

        var areas = new double[cells.Count];
        for (int i = 0; i < cells.Count; i++)
        {
            areas[i] = Math.PI * cells[i].RadiusMeters * cells[i].RadiusMeters;
        }

        return areas;
    }

    /// <summary>
    /// The steady response of the modes at a temperature to drives with phasors U_j (of u_j = -d_j'): mode k carries
    /// z_k = F_k / (s + j omega lambda_k), F = C U; the power is s |z|^2 / 2 plus the cross-axis part, and the total
    /// current t . z.
    /// </summary>
    public static Func<double, SteadyState> Steady(ModalCircuit circuit, Complex[] drivePhasors, double omega, Func<double, double> scaleAt, double crossPowerAtUnitScale)
    {
        var forcing = new Complex[circuit.Count];
        for (int k = 0; k < circuit.Count; k++)
        {
            for (int j = 0; j < drivePhasors.Length; j++)
            {
                forcing[k] += circuit.Coupling[k, j] * drivePhasors[j];
            }
        }

        return celsius =>
        {
            double s = scaleAt(celsius);
            double power = 0;
            Complex total = Complex.Zero;
            for (int k = 0; k < forcing.Length; k++)
            {
                Complex z = forcing[k] / new Complex(s, omega * circuit.Lambdas[k]);
                power += (z.Real * z.Real) + (z.Imaginary * z.Imaginary);
                total += circuit.TotalWeights[k] * z;
            }

            return new SteadyState((0.5 * s * power) + (crossPowerAtUnitScale / s), total);
        };
    }
}
