using System;
using System.Collections;
using System.Collections.Generic;

namespace InductionHazard.Assessment;

/// <summary>
/// The model's notes: what it did and why, a sentence each, reading as one line of text ("a; b") wherever text is
/// wanted. A note with figures in it is written when first read (see the engine's <c>LaterText</c>), the same text
/// it would have been when the engine made it.
/// </summary>
public sealed class NoteList : IReadOnlyList<string>
{
    private object[] _entries = new object[8];
    private int _count;

    /// <summary>The number of notes.</summary>
    public int Count => _count;

    /// <summary>The note at a position.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The position is not that of a note.</exception>
    public string this[int index]
    {
        get
        {
            if ((uint)index >= (uint)_count)
            {
                throw new ArgumentOutOfRangeException(nameof(index), index, "there are " + _count + " notes");
            }

            return LaterText.Read(ref _entries[index]);
        }
    }

    /// <summary>Adds a note written now.</summary>
    internal void Add(string note) => Append(note);

    /// <summary>Adds a note written from its figures when first read.</summary>
    internal void Add<T>(T figures, Func<T, string> write) => Append(LaterText.From(figures, write));

    private void Append(object entry)
    {
        if (_count == _entries.Length)
        {
            Array.Resize(ref _entries, 2 * _count);
        }

        _entries[_count++] = entry;
    }

    /// <inheritdoc />
    public IEnumerator<string> GetEnumerator()
    {
        for (int i = 0; i < _count; i++)
        {
            yield return this[i];
        }
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>The notes joined by "; ".</summary>
    public override string ToString() => string.Join("; ", this);
}
