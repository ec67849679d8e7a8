using System;
using System.Collections;
using System.Collections.Generic;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Criteria;

/// <summary>
/// Builds a site policy from its data (a policy file or a site file's Policy table, read as data): Name, ExposureGroup
/// (Occupational or Public) and any of the keys of <see cref="HazardPolicy.Keys"/>, each a number in SI or a string
/// with its unit. What it leaves out keeps the published default, or a station's the value of its site's policy. An
/// unknown key, a value of the wrong kind or out of range is an error naming the key.
/// </summary>
public static class PolicyReader
{
    /// <summary>The error id of a policy that cannot be used.</summary>
    public const string ErrorId = "InvalidPolicyFile";

    /// <summary>Reads the policy.</summary>
    /// <param name="data">The table of values.</param>
    /// <param name="origin">Where it came from (a file's path), for messages and as the policy's name when it gives none.</param>
    /// <param name="basis">The policy whose values it keeps where it sets none (a station's policy over its site's); the published one by default.</param>
    /// <param name="defaultName">Its name when it gives none; by default the file's name.</param>
    /// <exception cref="DataFileException">A key is unknown, or a value is malformed or out of range; the message names the key.</exception>
    public static HazardPolicy Read(IDictionary data, string origin, HazardPolicy? basis = null, string? defaultName = null)
    {
        var fields = new RecordFields(RecordFields.FromTable(data));
        string name = fields.Text("Name", required: false, "Policy", "PolicyName") ?? defaultName ?? System.IO.Path.GetFileNameWithoutExtension(origin);
        ExposureGroup? group = fields.Choice<ExposureGroup>("ExposureGroup", required: false);
        var values = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (PolicyKey key in HazardPolicy.Keys)
        {
            double? value = key.Kind is { } kind ? fields.Quantity(key.Name, kind, required: false) : fields.Number(key.Name, required: false);
            if (value is { } v)
            {
                values[key.Name] = v;
            }
        }

        fields.RejectUnused("is not a policy key (the keys: Name, ExposureGroup, " + string.Join(", ", HazardPolicy.Keys.Select(k => k.Name)) + ")");
        if (fields.Errors.Count > 0)
        {
            throw new DataFileException(origin, null, string.Join("; ", fields.Errors.Select(e => e.ToString())), ErrorId);
        }

        HazardPolicy d = basis ?? HazardPolicy.Default;
        double Get(string key, double fallback) => values.TryGetValue(key, out double v) ? v : fallback;
        var policy = new HazardPolicy
        {
            Name = string.IsNullOrWhiteSpace(name) ? "site policy" : name,
            ExposureGroup = group ?? d.ExposureGroup,
            ContactBurn = d.ContactBurn,
            SafetyFactor = Get("SafetyFactor", d.SafetyFactor),
            AlternatingVoltageLimitRms = Get("AlternatingVoltageLimit", d.AlternatingVoltageLimitRms),
            DirectVoltageLimit = Get("DirectVoltageLimit", d.DirectVoltageLimit),
            ImpulseChargeLimit = Get("ImpulseChargeLimit", d.ImpulseChargeLimit),
            BodyResistanceOhms = Get("BodyResistance", d.BodyResistanceOhms),
            StaticExposureLimitTesla = Get("StaticExposureLimit", d.StaticExposureLimitTesla),
            ThermalDoseLimitMinutes = Get("ThermalDoseLimit", d.ThermalDoseLimitMinutes),
            TouchSeconds = Get("TouchTime", d.TouchSeconds),
            LaunchSpeedLimit = Get("LaunchSpeedLimit", d.LaunchSpeedLimit),

            // A value it takes from the policy it is merged over cites that policy, not this one.
            Basis = basis,
            OwnKeys = basis is null ? null : values.Keys.Concat(group is null ? Array.Empty<string>() : new[] { nameof(HazardPolicy.ExposureGroup) }).ToArray(),
        };
        try
        {
            return policy.Validated();
        }
        catch (InvalidInputException ex)
        {
            throw new DataFileException(origin, null, ex.Message, ErrorId);
        }
    }
}
