using System;
using System.Collections.Generic;
using System.Management.Automation;
using InductionHazard.Assessment;
using InductionHazard.Criteria;
using InductionHazard.Errors;
using InductionHazard.Fields;
using InductionHazard.PowerShell.Binding;
using InductionHazard.Quantities;

namespace InductionHazard.PowerShell.Commands;

/// <summary>Test-FieldExposure: a person's own exposure to a source's field at points, or at a site's stations, against the ICNIRP limits.</summary>
[Cmdlet(VerbsDiagnostic.Test, "FieldExposure", DefaultParameterSetName = SourceSet)]
[OutputType(typeof(FieldExposure))]
public sealed class TestFieldExposureCommand : PSCmdlet
{
    private const string SourceSet = "Source";
    private const string SiteSet = "Site";
    private const string InputObjectSet = "InputObject";

    private FieldSource _source = null!;
    private int _row;

    /// <summary>The field source, from New-FieldSource; several sources sum into one.</summary>
    [Parameter(Mandatory = true, Position = 0, ParameterSetName = SourceSet)]
    [Parameter(Mandatory = true, Position = 0, ParameterSetName = InputObjectSet)]
    public FieldSource[] Source { get; set; } = null!;

    /// <summary>The points where a person stands or reaches, as x,y,z lengths ('0, 300 mm, 0'; bare numbers in metres); the origin by default.</summary>
    [Parameter(Position = 1, ParameterSetName = SourceSet)]
    [Vector(QuantityKind.Length, Many = true)]
    public Vector3D[] Position { get; set; } = { Vector3D.Zero };

    /// <summary>Points piped in: the points themselves ('0, 300 mm, 0', as -Position takes them), or rows with X, Y, Z columns or one Position column (Import-Csv output, hashtables), one result per row.</summary>
    /// <remarks>One object as the shell binds it from the pipeline; several given at once arrive as one collection and are taken in turn (<see cref="ItemInput.ForEachGiven"/>), a $null its row's error.</remarks>
    [Parameter(Mandatory = true, ValueFromPipeline = true, ParameterSetName = InputObjectSet)]
    [AllowNull]
    [AllowEmptyCollection]
    public PSObject? InputObject { get; set; }

    /// <summary>The unit of bare numbers in the rows' X, Y, Z or Position where the headers do not name it: @{ X = 'mm'; Y = 'mm'; Z = 'mm' }.</summary>
    [Parameter(ParameterSetName = InputObjectSet)]
    public System.Collections.Hashtable? Unit { get; set; }

    /// <summary>A site, from Import-HazardSite: a person's exposure at each station's position, by the station's policy (its own, else the site's).</summary>
    [Parameter(Mandatory = true, ParameterSetName = SiteSet)]
    public HazardSite Site { get; set; } = null!;

    /// <summary>The stations of -Site to judge, by name; all of them by default.</summary>
    [Parameter(Position = 0, ParameterSetName = SiteSet)]
    [ArgumentCompleter(typeof(StationCompleter))]
    public string[]? Station { get; set; }

    /// <summary>Judge against the general public's limits instead of the occupational ones (as a policy whose ExposureGroup is Public does).</summary>
    [Parameter]
    public SwitchParameter Public { get; set; }

    /// <summary>The safety factor between Clear and Caution, the static limit for workers and whose limits apply (ExposureGroup): a policy from Get-HazardPolicy, a policy file's path, or a table of policy values; by default the published one, or with -Site each station's.</summary>
    [Parameter]
    [Policy]
    public HazardPolicy? Policy { get; set; }

    /// <inheritdoc />
    protected override void BeginProcessing()
    {
        try
        {
            if (ParameterSetName != SiteSet)
            {
                _source = FieldSource.Combine(Source);
            }
            else
            {
                foreach (string name in Station ?? Array.Empty<string>())
                {
                    _ = Site.Find(name);
                }
            }
        }
        catch (InductionHazardException ex)
        {
            ThrowTerminatingError(ErrorRecords.From(ex, null));
        }
    }

    /// <inheritdoc />
    protected override void ProcessRecord()
    {
        if (ParameterSetName == SiteSet)
        {
            return;
        }

        if (ParameterSetName == InputObjectSet)
        {
            ItemInput.ForEachGiven(InputObject, JudgeRow);

            return;
        }

        foreach (Vector3D point in Position)
        {
            Judge(_source, point, Policy ?? HazardPolicy.Default, null);
        }
    }

    /// <summary>One row or point: its judgement written, or an error naming the row.</summary>
    private void JudgeRow(PSObject? input)
    {
        _row++;
        string label = "row " + _row;
        try
        {
            if (input is null || input.BaseObject is null)
            {
                throw ItemInput.NothingGiven(label);
            }

            IReadOnlyList<KeyValuePair<string, object?>>? record = PointInput.RecordOf(input);
            string? name = PointInput.NameOf(record);
            Vector3D point = PointInput.Of(input, record, label, Unit);

            // A row may name a visitors' point (ExposureGroup = Public); it cannot loosen a judgement of the public.
            HazardPolicy policy = Policy ?? HazardPolicy.Default;
            ExposureGroup? group = record is null ? null : WearerGroupReader.Read(record, label);
            if (StationPolicy.WearerNotApplied(name ?? label, group, policy.ExposureGroup, policy.Name) is { } notApplied)
            {
                WriteWarning(notApplied);
            }

            Judge(_source, point, policy.For(group), null, name);
        }
        catch (InductionHazardException ex)
        {
            WriteError(ErrorRecords.From(ex, input, label));
        }
    }

    /// <inheritdoc />
    protected override void EndProcessing()
    {
        if (ParameterSetName != SiteSet)
        {
            return;
        }

        // Each station at its own position, by -Policy or else its own policy over the site's.
        foreach (Station station in Station is null ? Site.Stations : Array.ConvertAll(Station, Site.Find))
        {
            if (Policy is not null && StationPolicy.Replaced(station, Policy) is { } replaced)
            {
                WriteWarning(replaced);
            }

            Judge(station.Source, station.Placement.Centre, Policy ?? Site.PolicyAt(station.Name) ?? HazardPolicy.Default, station.Name);
        }
    }

    private void Judge(FieldSource source, Vector3D point, HazardPolicy policy, string? station, string? pointName = null)
    {
        string where = station is not null ? "station '" + station + "'" : pointName is not null ? "point '" + pointName + "' at " + point : "position " + point;
        try
        {
            FieldExposure exposure = FieldExposure.At(source, point, Public.IsPresent || policy.ExposureGroup == ExposureGroup.Public, policy) with { Station = station, PointName = pointName };
            if (exposure.Verdict == Verdict.Indeterminate)
            {
                WriteWarning(where + ": " + exposure.Finding);
            }

            WriteObject(exposure);
        }
        catch (FieldEvaluationException ex)
        {
            WriteError(ErrorRecords.From(new InvalidInputException(station is null ? "Position" : "Station", ex.Message), point, where));
        }
    }
}
