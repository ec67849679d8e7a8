using System;
using System.Management.Automation;
using InductionHazard.Items;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Reads a contact as people say it: the names Skin, Held, Free and Fixed, or the words Worn, Carried, Loose,
/// Installed and the like (as data rows take them). Another word is refused with every word that is taken.
/// </summary>
[AttributeUsage(AttributeTargets.Property | AttributeTargets.Field)]
public sealed class ContactAttribute : ArgumentTransformationAttribute
{
    /// <inheritdoc />
    public override object? Transform(EngineIntrinsics engineIntrinsics, object? inputData)
    {
        if (QuantityAttribute.Unwrap(inputData) is not string word)
        {
            return inputData;
        }

        return ItemRecordReader.TryReadContact(word, out ContactKind contact)
            ? contact
            : throw new ArgumentTransformationMetadataException("expected how a person touches the item, one of " + string.Join(", ", ItemRecordReader.ContactNames) + "; got '" + word + "'");
    }
}
