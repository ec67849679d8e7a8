namespace InductionHazard.Items;

/// <summary>How a person is in contact with the item; decides which mechanisms apply.</summary>
[Newtonsoft.Json.JsonConverter(typeof(Newtonsoft.Json.Converters.StringEnumConverter))]
public enum ContactKind
{
    /// <summary>Worn against the skin (a ring, a bracelet): burns and shock apply.</summary>
    Skin,

    /// <summary>Held in the hand (a tool): burns and shock apply.</summary>
    Held,

    /// <summary>Loose and not touched (a tool on a bench): the item's own heating and any exposed voltage apply.</summary>
    Free,

    /// <summary>Fixed in place (a fixture): the item's own heating and any exposed voltage apply.</summary>
    Fixed,
}
