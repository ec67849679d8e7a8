using System;
using System.Collections;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InductionHazard.Errors;
using InductionHazard.Quantities;

namespace InductionHazard.Items;

/// <summary>
/// Builds a <see cref="ConductiveItem"/> from named values: a CSV row, a hashtable or the parameters of
/// New-ConductiveItem. Columns: Name, Shape, Material, Diameter or InnerDiameter, WireDiameter or Width and
/// Thickness, Gap, Contact; for a RectangularLoop Width and Height (its sides) and WireDiameter (names match without regard to case, spaces and underscores; common spellings are
/// aliases). Other columns (location, asset tag, notes) are ignored. Every problem in the record is reported
/// at once, naming the record and the field.
/// </summary>
public static class ItemRecordReader
{
    /// <summary>The aliases each field accepts, for documentation and completion.</summary>
    public static IReadOnlyDictionary<string, string[]> Aliases { get; } = new Dictionary<string, string[]>
    {
        ["Name"] = new[] { "Item", "ItemName", "Description" },
        ["Shape"] = new[] { "Form", "Type" },
        ["Material"] = new[] { "Metal", "Alloy" },
        ["Diameter"] = new[] { "MeanDiameter", "D" },
        ["InnerDiameter"] = new[] { "ID", "InsideDiameter", "Inner" },
        ["WireDiameter"] = new[] { "Wire", "WireDia" },
        ["Width"] = new[] { "BandWidth" },
        ["Thickness"] = new[] { "BandThickness" },
        ["Height"] = new[] { "LoopHeight" },
        ["Length"] = new[] { "Len", "Long" },
        ["WallThickness"] = new[] { "Wall", "WallThick" },
        ["ClosedEnds"] = new[] { "Closed", "EndsClosed" },
        ["Gap"] = new[] { "GapWidth", "Split" },
        ["Contact"] = new[] { "ContactKind", "Wear", "Worn" },
        ["AcceptUnusualSize"] = new[] { "UnusualSize" },
    };

    /// <summary>Reads one item.</summary>
    /// <param name="record">The named values.</param>
    /// <param name="materials">Where material names are looked up.</param>
    /// <param name="rowNumber">The record's position in its input (1-based), for messages; null for a single item.</param>
    /// <param name="units">The unit of each field's bare numbers where the column names do not say (a -Unit table).</param>
    /// <exception cref="RecordException">Something in the record is missing, malformed or out of range.</exception>
    /// <param name="acceptUnusualSize">Whether to accept sizes outside those of things people wear, carry or install (<see cref="PlausibleSizes"/>).</param>
    public static ConductiveItem Read(IEnumerable<KeyValuePair<string, object?>> record, MaterialLibrary materials, int? rowNumber = null, IReadOnlyDictionary<string, string>? units = null, bool acceptUnusualSize = false)
    {
        var fields = new RecordFields(record, units);
        string? name = fields.Text("Name", required: false, A("Name"));
        ItemShape shape = fields.Choice<ItemShape>("Shape", required: false, A("Shape")) ?? ItemShape.Ring;
        ConductorMaterial? material = ReadMaterial(fields, materials);
        double? mean = fields.Quantity("Diameter", QuantityKind.Length, required: false, A("Diameter"));
        double? inner = fields.Quantity("InnerDiameter", QuantityKind.Length, required: false, A("InnerDiameter"));
        double? wire = fields.Quantity("WireDiameter", QuantityKind.Length, required: false, A("WireDiameter"));
        double? width = fields.Quantity("Width", QuantityKind.Length, required: false, A("Width"));
        double? thickness = fields.Quantity("Thickness", QuantityKind.Length, required: false, A("Thickness"));
        double gap = fields.Quantity("Gap", QuantityKind.Length, required: false, A("Gap")) ?? 0.0;
        ContactKind contact = ReadContact(fields);

        string label = Label(rowNumber, name);
        LoopGeometry? loop = shape switch
        {
            ItemShape.RectangularLoop => ReadRectangle(fields, wire, width),
            ItemShape.Ring => ReadRing(fields, mean, inner, wire, width, thickness),
            ItemShape.Plate or ItemShape.Bar => ReadBlock(fields, shape, width, thickness),
            _ => ReadBody(fields, shape, mean, thickness),
        };
        if (loop is BodyGeometry && gap > 0)
        {
            fields.AddError("Gap", "applies to a ring or a loop; a " + shape.ToString().ToLowerInvariant() + " has no gap");
        }
        else if (loop is not null)
        {
            double perimeter = loop.PathLengthMeters;
            if (gap < 0)
            {
                fields.AddError("Gap", "must be zero (a closed loop) or more; got " + Mm(gap));
            }
            else if (gap > 0 && PhysicalRanges.Gap.Problem(gap) is { } gapProblem)
            {
                fields.AddError("Gap", gapProblem);
            }
            else if (gap >= perimeter)
            {
                fields.AddError("Gap", "(" + Mm(gap) + ") must be shorter than the loop's " + (shape == ItemShape.Ring ? "circumference" : "perimeter") + " (" + Mm(perimeter) + ")");
            }
        }

        if (fields.Errors.Count == 0 && loop is not null && !(acceptUnusualSize || (fields.Raw("AcceptUnusualSize", required: false, A("AcceptUnusualSize")) is { } accept && RecordFields.IsTrue(accept))))
        {
            CheckPlausible(fields, shape, loop, contact);
        }

        if (fields.Errors.Count > 0)
        {
            AddDelimiterHint(fields, record);
            throw new RecordException(label, fields.Errors);
        }

        return new ConductiveItem(
            ItemName(name, rowNumber),
            shape,
            material!,
            loop!,
            gap,
            contact);
    }

    /// <summary>Each size field against the sizes of things people wear, carry or install of that shape; a worn item no larger than a belt.</summary>
    private static void CheckPlausible(RecordFields fields, ItemShape shape, LoopGeometry loop, ContactKind contact)
    {
        foreach (string field in PlausibleSizes.OverallFields(shape))
        {
            if (fields.Quantity(field, QuantityKind.Length, required: false, A(field)) is { } v && PlausibleSizes.OverallProblem(shape, v) is { } problem)
            {
                fields.AddError(field, problem, "UnusualSize");
            }
        }

        foreach (string field in PlausibleSizes.SectionFields(shape))
        {
            if (fields.Quantity(field, QuantityKind.Length, required: false, A(field)) is { } v && PlausibleSizes.SectionProblem(shape, v) is { } problem)
            {
                fields.AddError(field, problem, "UnusualSize");
            }
        }

        // Only where the record says the item is worn: Skin is also the default for a record that does not say.
        if (fields.Errors.Count == 0 && contact == ContactKind.Skin && fields.Has("Contact", A("Contact")) && loop.LargestDimensionMeters > PlausibleSizes.LargestWorn)
        {
            fields.AddError("Contact", "Skin (worn) for an item " + SiFormat.Format(loop.LargestDimensionMeters, "m") + " across: worn items are no larger than a belt ("
                + SiFormat.Format(PlausibleSizes.LargestWorn, "m") + "); check the size or the contact, or accept the size deliberately (-AcceptUnusualSize)", "UnusualSize");
        }
    }

    /// <summary>The words people use for contact, beside the enumeration's own: Worn is Skin, Loose is Free.</summary>
    private static readonly Dictionary<string, ContactKind> ContactWords = new(StringComparer.OrdinalIgnoreCase)
    {
        ["Worn"] = ContactKind.Skin, ["Wearing"] = ContactKind.Skin, ["Carried"] = ContactKind.Held, ["Hand"] = ContactKind.Held,
        ["Loose"] = ContactKind.Free, ["Installed"] = ContactKind.Fixed, ["Mounted"] = ContactKind.Fixed,
    };

    /// <summary>The contact a word names: the enumeration's own names, or the words people use (Worn is Skin, Loose is Free, Carried is Held, Installed is Fixed).</summary>
    public static bool TryReadContact(string word, out ContactKind contact)
    {
        string trimmed = word.Trim();
        if (ContactWords.TryGetValue(trimmed, out contact))
        {
            return true;
        }

        return Enum.TryParse(trimmed, ignoreCase: true, out contact) && Enum.IsDefined(typeof(ContactKind), contact) && !trimmed.All(char.IsDigit);
    }

    /// <summary>Every word <see cref="TryReadContact"/> takes, the enumeration's names first.</summary>
    public static IReadOnlyList<string> ContactNames { get; } = Enum.GetNames(typeof(ContactKind)).Concat(ContactWords.Keys).ToArray();

    private static ContactKind ReadContact(RecordFields fields)
    {
        object? raw = fields.Raw("Contact", required: false, A("Contact"));
        if (raw is string text && ContactWords.TryGetValue(text.Trim(), out ContactKind word))
        {
            return word;
        }

        if (raw is null)
        {
            return ContactKind.Skin;
        }

        return fields.Choice<ContactKind>("Contact", required: false, A("Contact")) ?? ContactKind.Skin;
    }

    /// <summary>A row read with the wrong delimiter arrives as one column whose name holds ';' or a tab: say so.</summary>
    private static void AddDelimiterHint(RecordFields fields, IEnumerable<KeyValuePair<string, object?>> record)
    {
        KeyValuePair<string, object?>[] pairs = record.ToArray();
        KeyValuePair<string, object?> joined = pairs.FirstOrDefault(p => p.Key.IndexOf(';') >= 0 || p.Key.IndexOf('\t') >= 0);
        if (joined.Key is not null && fields.Errors.Any(e => e.Message.StartsWith("is missing", StringComparison.Ordinal)))
        {
            string delimiter = joined.Key.IndexOf(';') >= 0 ? "';'" : "\"`t\"";
            fields.AddError("Delimiter", "the column '" + (joined.Key.Length > 60 ? joined.Key.Substring(0, 60) + "..." : joined.Key) + "' holds " + (delimiter == "';'" ? "semicolons" : "tabs")
                + ": the file is probably " + (delimiter == "';'" ? "semicolon" : "tab") + "-separated; read it with Import-Csv -Delimiter " + delimiter);
        }
    }

    private static RingGeometry? ReadRing(RecordFields fields, double? mean, double? inner, double? wire, double? width, double? thickness)
    {
        CrossSection? section = ReadSection(fields, wire, width, thickness);
        double? diameter = ReadDiameter(fields, mean, inner, section);
        return diameter is { } d ? new RingGeometry(d, section!) : null;
    }

    /// <summary>
    /// A body of revolution: a Disc (Diameter, Thickness), a Cylinder (Diameter, Length), a Tube (Diameter outside,
    /// WallThickness, Length) or a Sphere (Diameter). A field that belongs to another shape is refused, not ignored.
    /// </summary>
    private static BodyGeometry? ReadBody(RecordFields fields, ItemShape shape, double? diameter, double? thickness)
    {
        string word = shape.ToString();
        foreach (string other in new[] { "InnerDiameter", "WireDiameter", "Width", "Height" })
        {
            if (fields.Has(other, A(other)))
            {
                fields.AddError(other, "does not apply to a " + word.ToLowerInvariant() + " (give " + BodyFields(shape) + ")");
            }
        }

        if (shape != ItemShape.Disc && fields.Has("Thickness", A("Thickness")))
        {
            fields.AddError("Thickness", "does not apply to a " + word.ToLowerInvariant() + " (give " + BodyFields(shape) + ")");
        }

        bool needsLength = shape is ItemShape.Cylinder or ItemShape.Tube;
        double? length = needsLength || fields.Has("Length", A("Length")) ? fields.Quantity("Length", QuantityKind.Length, required: needsLength, A("Length")) : null;
        if (!needsLength && length is not null)
        {
            fields.AddError("Length", "does not apply to a " + word.ToLowerInvariant() + " (give " + BodyFields(shape) + ")");
        }

        double? wall = shape == ItemShape.Tube ? fields.Quantity("WallThickness", QuantityKind.Length, required: true, A("WallThickness")) : null;
        object? closedRaw = fields.Raw("ClosedEnds", required: false, A("ClosedEnds"));
        bool closed = closedRaw is not null && (RecordFields.IsTrue(closedRaw) || string.Equals(System.Convert.ToString(closedRaw, CultureInfo.InvariantCulture)?.Trim(), "yes", StringComparison.OrdinalIgnoreCase));
        if (closed && shape != ItemShape.Tube)
        {
            fields.AddError("ClosedEnds", "applies to a Tube (a gas cylinder's shell); a " + word.ToLowerInvariant() + " has no ends to close");
        }
        if (shape != ItemShape.Tube && fields.Has("WallThickness", A("WallThickness")))
        {
            fields.AddError("WallThickness", "does not apply to a " + word.ToLowerInvariant() + " (give " + BodyFields(shape) + ")");
        }

        if (!fields.Has("Diameter", A("Diameter")))
        {
            fields.AddError("Diameter", "is missing (a " + word.ToLowerInvariant() + " needs " + BodyFields(shape) + ")");
        }

        if (shape == ItemShape.Disc && !fields.Has("Thickness", A("Thickness")))
        {
            fields.AddError("Thickness", "is missing (a disc needs " + BodyFields(shape) + ")");
        }

        bool ok = Positive(fields, "Diameter", diameter);
        switch (shape)
        {
            case ItemShape.Disc:
                return ok & Positive(fields, "Thickness", thickness) && fields.Errors.Count == 0 ? new CylinderBody(diameter!.Value, thickness!.Value, "disc") : null;
            case ItemShape.Cylinder:
                return ok & Positive(fields, "Length", length) && fields.Errors.Count == 0 ? new CylinderBody(diameter!.Value, length!.Value, "cylinder") : null;
            case ItemShape.Tube:
                if (!(ok & Positive(fields, "WallThickness", wall) & Positive(fields, "Length", length)))
                {
                    return null;
                }

                if (2 * wall!.Value >= diameter!.Value)
                {
                    fields.AddError("WallThickness", "(" + Mm(wall.Value) + ") must be less than half the outside diameter (" + Mm(diameter.Value) + "); a tube this thick is a Cylinder");
                    return null;
                }

                if (closed && 2 * wall.Value >= length!.Value)
                {
                    fields.AddError("WallThickness", "(" + Mm(wall.Value) + ") leaves no inside between the closed ends of a tube " + Mm(length.Value) + " long");
                    return null;
                }

                return fields.Errors.Count == 0 ? new TubeBody(diameter.Value, wall.Value, length!.Value, closed) : null;
            default:
                return ok && fields.Errors.Count == 0 ? new SphereBody(diameter!.Value) : null;
        }
    }

    /// <summary>
    /// A block: a Plate (Width, Height, Thickness; its axis along its normal) or a Bar (Width, Height, Length; its
    /// axis along its length). A field of another shape is refused.
    /// </summary>
    private static PrismBody? ReadBlock(RecordFields fields, ItemShape shape, double? width, double? thickness)
    {
        string word = shape.ToString().ToLowerInvariant();
        bool plate = shape == ItemShape.Plate;
        string[] others = plate
            ? new[] { "Diameter", "InnerDiameter", "WireDiameter", "Length", "WallThickness", "ClosedEnds" }
            : new[] { "Diameter", "InnerDiameter", "WireDiameter", "Thickness", "WallThickness", "ClosedEnds" };
        foreach (string other in others)
        {
            if (fields.Has(other, A(other)))
            {
                fields.AddError(other, "does not apply to a " + word + " (give " + BodyFields(shape) + ")");
            }
        }

        double? height = fields.Quantity("Height", QuantityKind.Length, required: true, A("Height"));
        double? depth = plate ? thickness : fields.Quantity("Length", QuantityKind.Length, required: true, A("Length"));
        string depthField = plate ? "Thickness" : "Length";
        if (!fields.Has("Width", A("Width")))
        {
            fields.AddError("Width", "is missing (a " + word + " needs " + BodyFields(shape) + ")");
        }

        if (plate && !fields.Has("Thickness", A("Thickness")))
        {
            fields.AddError("Thickness", "is missing (a plate needs " + BodyFields(shape) + ")");
        }

        bool ok = Positive(fields, "Width", width) & Positive(fields, "Height", height) & Positive(fields, depthField, depth);
        return ok && fields.Errors.Count == 0 ? new PrismBody(width!.Value, height!.Value, depth!.Value, word) : null;
    }

    private static string BodyFields(ItemShape shape) => shape switch
    {
        ItemShape.Plate => "Width, Height and Thickness",
        ItemShape.Bar => "Width, Height (its section) and Length",
        ItemShape.Disc => "Diameter and Thickness",
        ItemShape.Cylinder => "Diameter and Length",
        ItemShape.Tube => "Diameter (outside), WallThickness and Length, and ClosedEnds for a closed shell",
        _ => "Diameter",
    };

    /// <summary>A rectangular loop: Width and Height are the sides of its centre line, of round wire WireDiameter.</summary>
    private static RectangularLoopGeometry? ReadRectangle(RecordFields fields, double? wire, double? width)
    {
        double? height = fields.Quantity("Height", QuantityKind.Length, required: true, A("Height"));
        if (!fields.Has("WireDiameter", A("WireDiameter")))
        {
            fields.AddError("WireDiameter", "is missing (a rectangular loop is of round wire: give WireDiameter, and Width and Height for its sides)");
        }

        if (!fields.Has("Width", A("Width")))
        {
            fields.AddError("Width", "is missing (a rectangular loop needs Width and Height, the sides of its centre line)");
        }

        bool ok = Positive(fields, "WireDiameter", wire) & Positive(fields, "Width", width) & Positive(fields, "Height", height);
        if (!ok)
        {
            return null;
        }

        foreach ((string field, double side) in new[] { ("Width", width!.Value), ("Height", height!.Value) })
        {
            if (side <= wire!.Value)
            {
                fields.AddError(field, "(" + Mm(side) + ") must exceed the wire diameter (" + Mm(wire.Value) + "): the loop would have no hole");
                return null;
            }
        }

        return new RectangularLoopGeometry(width!.Value, height!.Value, new RoundWire(wire!.Value));
    }

    /// <summary>The item name a record gives (through the Name column or its aliases), or null.</summary>
    /// <remarks>
    /// As <see cref="RecordFields"/> reads it (the first column of each spelling, the first non-empty of Name and its
    /// aliases in that order, trimmed), without making a reader of the whole record: every row of a pipeline is named
    /// first, a row that repeats an earlier one by nothing else.
    /// </remarks>
    public static string? NameOf(IEnumerable<KeyValuePair<string, object?>> record)
    {
        object? best = null;
        int bestRank = int.MaxValue;
        int seen = 0;
        foreach (KeyValuePair<string, object?> pair in record)
        {
            int rank = pair.Key is null ? -1 : Array.IndexOf(NameKeys, RecordFields.FieldKey(pair.Key));
            if (rank < 0 || (seen & (1 << rank)) != 0)
            {
                continue;
            }

            seen |= 1 << rank;
            object? value = pair.Value;
            bool empty = value is null || value is DBNull || (value is string text && text.Trim().Length == 0);
            if (!empty && rank < bestRank)
            {
                (best, bestRank) = (value, rank);
            }
        }

        return best is null ? null : Convert.ToString(best, CultureInfo.InvariantCulture)?.Trim();
    }

    /// <summary>The Name column and its aliases, normalized, in the order a reader takes them.</summary>
    private static readonly string[] NameKeys = new[] { "Name" }.Concat(A("Name")).Select(RecordFields.Normalize).ToArray();

    /// <summary>The name of the item a record makes: its Name column, else "row 7" (or "item" outside a pipeline or file).</summary>
    public static string ItemName(string? name, int? rowNumber) =>
        string.IsNullOrWhiteSpace(name) ? (rowNumber is { } r ? "row " + r.ToString(CultureInfo.InvariantCulture) : "item") : name!;

    /// <summary>How a record is named in messages: "row 7 ('Wedding band')", or "item 'Wedding band'".</summary>
    public static string Label(int? rowNumber, string? name)
    {
        string quoted = string.IsNullOrWhiteSpace(name) ? string.Empty : "'" + name + "'";
        if (rowNumber is { } r)
        {
            return "row " + r.ToString(CultureInfo.InvariantCulture) + (quoted.Length > 0 ? " (" + quoted + ")" : string.Empty);
        }

        return quoted.Length > 0 ? "item " + quoted : "item";
    }

    private static string[] A(string field) => Aliases[field];

    private static ConductorMaterial? ReadMaterial(RecordFields fields, MaterialLibrary materials)
    {
        object? raw = fields.Raw("Material", required: true, A("Material"));
        switch (raw)
        {
            case null:
                return null;
            case ConductorMaterial material:
                return material;
            case IDictionary dictionary:
                try
                {
                    return MaterialLibrary.Define(dictionary.Keys.Cast<object>().Select(k => new KeyValuePair<string, object?>(Convert.ToString(k, CultureInfo.InvariantCulture) ?? string.Empty, dictionary[k])));
                }
                catch (RecordException ex)
                {
                    fields.AddError("Material", ex.Message, ex.ErrorId);
                    return null;
                }

            default:
                string name = Convert.ToString(raw, CultureInfo.InvariantCulture)?.Trim() ?? string.Empty;
                try
                {
                    return materials.Find(name);
                }
                catch (UnknownMaterialException ex)
                {
                    fields.AddError("Material", ex.Message, ex.ErrorId);
                    return null;
                }
        }
    }

    private static CrossSection? ReadSection(RecordFields fields, double? wire, double? width, double? thickness)
    {
        bool hasWire = fields.Has("WireDiameter", A("WireDiameter"));
        bool hasBand = fields.Has("Width", A("Width")) || fields.Has("Thickness", A("Thickness"));
        if (hasWire && hasBand)
        {
            fields.AddError("WireDiameter", "give WireDiameter for a round wire or Width and Thickness for a band, not both");
            return null;
        }

        if (hasWire)
        {
            return Positive(fields, "WireDiameter", wire) ? new RoundWire(wire!.Value) : null;
        }

        if (hasBand)
        {
            if (!fields.Has("Width", A("Width")))
            {
                fields.AddError("Width", "is missing (a band needs Width and Thickness)");
            }

            if (!fields.Has("Thickness", A("Thickness")))
            {
                fields.AddError("Thickness", "is missing (a band needs Width and Thickness)");
            }

            bool ok = Positive(fields, "Width", width) & Positive(fields, "Thickness", thickness);
            return ok ? new RectangularBand(width!.Value, thickness!.Value) : null;
        }

        fields.AddError("WireDiameter", "is missing (give WireDiameter for a round wire, or Width and Thickness for a band)");
        return null;
    }

    private static double? ReadDiameter(RecordFields fields, double? mean, double? inner, CrossSection? section)
    {
        bool hasMean = fields.Has("Diameter", A("Diameter"));
        bool hasInner = fields.Has("InnerDiameter", A("InnerDiameter"));
        if (hasMean && hasInner)
        {
            fields.AddError("Diameter", "give Diameter (the loop's mean diameter) or InnerDiameter, not both");
            return null;
        }

        if (!hasMean && !hasInner)
        {
            fields.AddError("Diameter", "is missing (give the loop's mean diameter as Diameter, or InnerDiameter as jewellers size rings)");
            return null;
        }

        string field = hasMean ? "Diameter" : "InnerDiameter";
        double? given = hasMean ? mean : inner;
        if (!Positive(fields, field, given) || section is null)
        {
            return null;
        }

        double radial = section.RadialExtentMeters;
        double diameter = hasMean ? given!.Value : given!.Value + radial;
        if (hasMean && diameter <= radial)
        {
            fields.AddError("Diameter", "(" + Mm(diameter) + ") must exceed the section's radial extent (" + Mm(radial) + "): the loop would have no hole");
            return null;
        }

        return diameter;
    }

    private static bool Positive(RecordFields fields, string field, double? value)
    {
        if (value is null)
        {
            return false;
        }

        if (!(value.Value > 0))
        {
            fields.AddError(field, "must be greater than zero; got " + Mm(value.Value));
            return false;
        }

        if (PhysicalRanges.ItemDimension.Problem(value.Value) is { } problem)
        {
            fields.AddError(field, problem);
            return false;
        }

        return true;
    }

    private static string Mm(double metres) => SiFormat.Format(metres, "m");
}
