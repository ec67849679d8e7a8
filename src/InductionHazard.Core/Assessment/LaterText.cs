using System;
using System.Threading;

namespace InductionHazard.Assessment;

/// <summary>
/// A sentence written from its figures when it is first read, not when the engine or a check makes it: an audit's
/// rows are mostly filtered, counted or exported by their verdicts and margins, and writing every figure of every
/// note and finding as text cost about a sixth of an assessment.
/// </summary>
/// <remarks>
/// The figures are copied when the text is made (values, never the engine's working state, which it would keep
/// alive), so the text read later is the text that would have been written then. A slot holds either the written
/// string or the text still to be written; two threads reading one slot at once may both write it, with the same result.
/// </remarks>
internal abstract class LaterText
{
    /// <summary>Writes the sentence.</summary>
    public abstract string Write();

    /// <summary>A sentence written by <paramref name="write"/> from <paramref name="figures"/> when first read.</summary>
    public static LaterText From<T>(T figures, Func<T, string> write) => new Of<T>(figures, write);

    /// <summary>The slot's text, written (and kept in the slot) if it was not yet.</summary>
    public static string Read(ref object slot)
    {
        object held = Volatile.Read(ref slot);
        if (held is string text)
        {
            return text;
        }

        text = ((LaterText)held).Write();
        Volatile.Write(ref slot, text);
        return text;
    }

    private sealed class Of<T> : LaterText
    {
        private readonly T _figures;
        private readonly Func<T, string> _write;

        public Of(T figures, Func<T, string> write)
        {
            _figures = figures;
            _write = write;
        }

        public override string Write() => _write(_figures);
    }
}
