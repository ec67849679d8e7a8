using System;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.Induction;
using InductionHazard.Items;
using InductionHazard.Quantities;
using InductionHazard.Thermal;

namespace InductionHazard.Assessment;

/// <summary>What every branch of the engine needs: the coupling of each term, the circuit, the heating model and the start.</summary>
internal sealed class EngineContext
{
    public EngineContext(Scenario scenario)
    {
        Scenario = scenario;
        FieldSource source = scenario.Source;
        Vector3D centre = scenario.Placement.Centre;
        LoopGeometry loop = scenario.Item.Loop;
        Circuit = new RingCircuit(scenario.Item);
        // A worn or held item sits on skin that blood flow holds near 33 °C: it cannot cool below its starting
        // temperature, so it exchanges heat with surroundings at that temperature (less cooling than room air:
        // the safe side). A loose or fixed item starts at, and cools to, the room.
        ThermalEnvironment surroundings = scenario.Environment;
        var cooling = new ThermalEnvironment(scenario.InitialCelsius, surroundings.ConvectionWattsPerSquareMeterKelvin + SkinCoefficient(scenario), surroundings.Emissivity);
        Thermal = new LumpedThermalModel(scenario.Item.MassKilograms * scenario.Item.Material.SpecificHeatJoulesPerKilogramKelvin, scenario.Item.Loop.SurfaceSquareMeters, cooling);
        Start = scenario.InitialCelsius;
        if (SkinCoefficient(scenario) > 0)
        {
            Notes.Add(SkinNote);
        }

        Rdc = Circuit.DcResistanceOhms(Start);
        Ldc = Circuit.DcInductanceHenries;
        Frequency = source.SignificantFrequencyHertz;
        SkinDepthMeters = SkinEffect.SkinDepthMeters(scenario.Item.Material.ResistivityAt(Start), Frequency, scenario.Item.Material.RelativePermeability);
        Normal = scenario.Placement.Normal ?? Vector3D.UnitZ;
        FieldDirection = Normal;
        Coupling = new double[source.Terms.Count];
        NormalField = new double[source.Terms.Count];
        CrossCoupling = new double[source.Terms.Count][];
        for (int j = 0; j < CrossCoupling.Length; j++)
        {
            CrossCoupling[j] = Array.Empty<double>();
        }

        TorqueField = new Vector3D[source.Terms.Count];
        try
        {
            if (scenario.Placement.Normal is null || loop is SphereBody)
            {
                // A sphere has no axis of its own: its filaments' axis follows the largest flux change.
                if (scenario.Placement.TiltDegrees is { } tilt && tilt != 0 && loop is not SphereBody)
                {
                    Normal = FluxCoupling.TiltedNormal(source, centre, loop, tilt);
                    Orientation = "tilted " + SiFormat.Plain(tilt) + " degrees from the largest flux change (toward the side that keeps the most), normal " + Normal;
                }
                else
                {
                    (Normal, Width) = FluxCoupling.WorstOrientation(source, centre, loop);
                    Orientation = (loop is SphereBody ? "axis " : string.Empty) + "facing the largest flux change, normal " + Normal
                        + (Width is { } w ? ", width along " + w : string.Empty)
                        + (scenario.Placement.TiltDegrees is { } given && given != 0 && loop is SphereBody ? " (a sphere has no axis to tilt)" : string.Empty)
                        + (scenario.Placement.TiltDegrees == 0 ? " (tilted 0 degrees)" : string.Empty);
                }
            }
            else if (scenario.Placement.AxisAlong is { } searchedFrom && scenario.Placement.Searched)
            {
                Orientation = "axis turned to normal " + Normal + ", where a search on a low-frequency model of its heating put the most (the field varies through the body; the model fitted to the orientations solved: its axis along the largest flux change, normal "
                    + searchedFrom + ", and across it; judged beside them)";
            }
            else if (scenario.Placement.AxisAlong is { } along)
            {
                Orientation = "axis across the largest flux change, normal " + Normal + " (judged worse than its axis along it, normal " + along
                    + "; the field across drives currents along the body and back, which heat it, while the emf and current around its axis are those of the flux along it)";
            }
            else
            {
                Orientation = "as given, normal " + Normal;
            }

            Coupling = FluxCoupling.PerUnitDrive(source, centre, Normal, loop, Width);
            Vector3D[] b = source.FieldPerUnitDrive(centre);
            NormalField = new double[b.Length];
            TorqueField = new Vector3D[b.Length];
            for (int j = 0; j < b.Length; j++)
            {
                NormalField[j] = b[j].Dot(Normal);

                // A normal along the field to within rounding (1e-9 rad) feels no torque: its cross product is the
                // rounding's, not a tilt, and would print torques of zepto-newton metres.
                Vector3D torque = Normal.Cross(b[j]);
                TorqueField[j] = torque.Length <= 1e-9 * b[j].Length ? Vector3D.Zero : torque;
            }

            FieldDirection = b[0].Length > 0 && b[0].IsFinite ? b[0].Normalized() : Normal;
            CentreField = b;
            if (scenario.Placement.Normal is null && (scenario.Placement.TiltDegrees ?? 0) == 0 && loop is not SphereBody && !scenario.Item.IsSplit && !scenario.Item.Material.IsFerromagnetic)
            {
                // The engine chose the orientation, so the item may sit turned from it: the torque on its moment is
                // judged at the worst turn (Torque check). In a field of one direction the moment falls as the cosine of
                // the turn and the field across it grows as the sine: at most half of |m| |B|, at 45 degrees; where the
                // field turns as it alternates, |m| |B| itself bounds it.
                bool oneDirection = true;
                foreach (Vector3D v in b)
                {
                    oneDirection &= v.Cross(FieldDirection).Length <= 1e-9 * v.Length;
                }

                TiltTorqueFactor = oneDirection ? 0.5 : 1;
            }

            if (loop is BodyGeometry body)
            {
                // The field across a body's axis drives eddies the coaxial filaments do not carry (section 5 of the
                // methods), by its mean square over the body. Where that cannot be found, the heating cannot.
                try
                {
                    CrossCoupling = CrossAxisField.Couplings(source, centre, Normal, Width, body);
                }
                catch (FieldEvaluationException ex)
                {
                    Issues.Add(new ValidityIssue(ex.Message, AffectedResults.Heating));
                }
            }
        }
        catch (FieldEvaluationException ex)
        {
            FieldFailed = true;
            Orientation = scenario.Placement.Normal is null ? "not found: the field cannot be evaluated" : "as given, normal " + Normal;
            Issues.Add(new ValidityIssue(ex.Message, AffectedResults.All));
        }

        Notes.Add((centre, Orientation), static f => "placement: loop centre at " + f.centre + " m, " + f.Orientation);
    }

    /// <summary>
    /// Builds the item's current paths for a closed item: one for a thin loop, filaments otherwise. A body's
    /// resistance and inductance are then the equivalents of its low-frequency loss and its leading mode.
    /// </summary>
    public void BuildPaths(bool thin)
    {
        Paths = ItemPaths.For(Scenario.Item, Frequency, Start, thin);
        Notes.Add(Paths.Description, static d => "current paths: " + d);
        if (Paths.Problem is not null || Paths.Modes is null || FieldFailed)
        {
            return;
        }

        try
        {
            double[,] pathCoupling = Paths.Coupling(Scenario.Source, Scenario.Placement.Centre, Normal, Width);
            Vector3D[,] gradient = Paths.CouplingGradient(Scenario.Source, Scenario.Placement.Centre, Normal, Width);
            Modal = Paths.Modes.Drive(pathCoupling, gradient, Paths.PathAreas());
        }
        catch (FieldEvaluationException ex)
        {
            Issues.Add(new ValidityIssue(ex.Message, AffectedResults.Current | AffectedResults.Heating));
            return;
        }

        if (Scenario.Item.Loop is BodyGeometry body)
        {
            (double across, double along) = body.SecondMoments;
            CrossPowerFactor = across * along / (across + along) / Paths.ReferenceResistivityOhmMeters;
            (Rdc, Ldc) = Equivalent(Paths, body);
        }
    }

    /// <summary>
    /// A body's equivalent single turn on its outline: R such that (pi R_out^2 B')^2 / R is the filaments'
    /// low-frequency loss in a uniform axial field, and L that with R gives the leading mode's time constant.
    /// </summary>
    private static (double R, double L) Equivalent(ItemPaths paths, BodyGeometry body)
    {
        // In a uniform axial field each path links its own area: the modes' low-frequency loss per B'^2 is sum_k C_k^2.
        double[] areas = paths.PathAreas();
        var uniform = new double[areas.Length, 1];
        for (int i = 0; i < areas.Length; i++)
        {
            uniform[i, 0] = areas[i];
        }

        ModalCircuit axial = paths.Modes!.Drive(uniform);
        double conductance = 0, lead = 0, best = -1;
        for (int k = 0; k < axial.Count; k++)
        {
            double c2 = axial.Coupling[k, 0] * axial.Coupling[k, 0];
            conductance += c2;
            if (c2 * axial.Lambdas[k] > best)
            {
                (best, lead) = (c2 * axial.Lambdas[k], axial.Lambdas[k]);
            }
        }

        double outline = body.LoopAreaSquareMeters;
        double r = outline * outline / conductance;
        return (r, lead * r);
    }

    /// <summary>
    /// When the paths cannot be solved: the issue recorded and a response whose current and heating are not
    /// numbers; null when they can.
    /// </summary>
    public InductionResponse? PathProblem(InductionResponse drive)
    {
        if (Modal is not null)
        {
            return null;
        }

        if (Paths?.Problem is { } problem)
        {
            Issues.Add(new ValidityIssue(problem, AffectedResults.Current | AffectedResults.Heating));
        }

        string why = Paths?.Problem
            ?? (Scenario.Item.Material.IsFerromagnetic ? "the induction model does not apply to a ferromagnetic item" : "the item's current paths could not be coupled to the source");
        return drive with
        {
            Model = "not solved: " + why,
            PeakCurrentAmperes = double.NaN,
            EnergyDissipatedJoules = double.NaN,
            PeakTemperatureCelsius = double.NaN,
            FinalTemperatureCelsius = double.NaN,
        };
    }

    public ItemPaths? Paths { get; private set; }

    public ModalCircuit? Modal { get; private set; }

    /// <summary>n x b_j: the normal crossed with each term's field per unit drive at the centre (the torque on the item's moment).</summary>
    public Vector3D[] TorqueField { get; } = Array.Empty<Vector3D>();

    /// <summary>
    /// The field across a body's axis per unit drive of each term, as vectors whose drive-weighted sum has the square
    /// length of its mean square over the body (<see cref="CrossAxisField"/>); empty for a loop.
    /// </summary>
    public double[][] CrossCoupling { get; }

    /// <summary>The cross-axis low-frequency loss factor at the reference resistivity, W per (T/s)^2 (zero for a loop).</summary>
    public double CrossPowerFactor { get; private set; }

    /// <summary>b_j, each term's field per unit drive at the centre.</summary>
    public Vector3D[] CentreField { get; private set; } = Array.Empty<Vector3D>();

    /// <summary>
    /// For an item whose orientation the engine chose (no normal, no tilt): the largest torque on its moment as it
    /// turns, per |m| |B| (0.5 in a field of one direction, at 45 degrees; 1, a bound, where the field turns); 0 otherwise.
    /// </summary>
    public double TiltTorqueFactor { get; private set; }

    public bool FieldFailed { get; }

    public string Orientation { get; } = string.Empty;

    public Scenario Scenario { get; }

    public Vector3D Normal { get; }

    /// <summary>For a rectangular outline turned within its plane by the search for the worst orientation, the direction of its width; null for the usual one.</summary>
    public Vector3D? Width { get; }

    public Vector3D FieldDirection { get; }

    /// <summary>Flux through the loop per unit drive of each term, Wb per drive unit.</summary>
    public double[] Coupling { get; }

    /// <summary>The field normal to the loop at its centre per unit drive of each term.</summary>
    public double[] NormalField { get; }

    public RingCircuit Circuit { get; }

    public LumpedThermalModel Thermal { get; }

    public double Start { get; }

    public double Rdc { get; private set; }

    public double Ldc { get; private set; }

    public double Frequency { get; }

    /// <summary>The skin depth in the item's material at its starting temperature and the drive's significant frequency, m.</summary>
    public double SkinDepthMeters { get; }

    public double MeltingCelsius => Scenario.Item.Material.MeltingCelsius;

    public TextList Notes { get; } = new();

    public List<ValidityIssue> Issues { get; } = new();

    private static readonly string SkinNote = "worn: heat flows into the skin under an eighth of its surface at the steady conductance of perfused skin, "
        + Quantities.SiFormat.Plain(SkinContact.ConductancePerArea) + " W/(m² K) (Pennes 1948, with low-end tissue values), and it cannot cool below the skin's "
        + Quantities.SiFormat.Celsius(SkinContact.SurfaceCelsius);

    /// <summary>
    /// The heat a worn ring or band loses into the skin under it, as a coefficient over its whole surface (Pennes'
    /// steady contact conductance times the share of the surface on skin; see <see cref="SkinContact"/>). Zero for
    /// an item that is not worn, a worn body of another shape, or a room warmer than skin, where the skin is no sink.
    /// </summary>
    private static double SkinCoefficient(Scenario scenario) =>
        scenario.Item.Contact == ContactKind.Skin && scenario.Item.Loop is RingGeometry && scenario.InitialCelsius <= SkinContact.SurfaceCelsius
            ? SkinContact.SurfaceAveragedCoefficient
            : 0;
}
