namespace InductionHazard.Items;

/// <summary>The geometric form of a conductive item.</summary>
[Newtonsoft.Json.JsonConverter(typeof(Newtonsoft.Json.Converters.StringEnumConverter))]
public enum ItemShape
{
    /// <summary>A circular loop of round wire or of a rectangular band: rings, bands, bracelets, bangles; closed or split.</summary>
    Ring,

    /// <summary>A rectangular loop of round wire: a frame, a ladder section, a tool that closes a loop; closed or open.</summary>
    RectangularLoop,

    /// <summary>A solid disc (-Diameter, -Thickness): a washer blank, a flange, a coin, a tool face; axis along its normal.</summary>
    Disc,

    /// <summary>A solid cylinder (-Diameter, -Length): a rod, a shaft, a pin, a tool handle; axis along its length.</summary>
    Cylinder,

    /// <summary>A tube with open ends (-Diameter outside, -WallThickness, -Length): a pipe, a sleeve, a gas cylinder's shell.</summary>
    Tube,

    /// <summary>A solid sphere (-Diameter): a ball, a bearing, a knob.</summary>
    Sphere,

    /// <summary>A plate (-Width -Height -Thickness): a fixture plate, a panel, a shim; axis along its normal.</summary>
    Plate,

    /// <summary>A bar (-Width -Height -Length): a tool head, a rail, a busbar offcut; axis along its length.</summary>
    Bar,
}
