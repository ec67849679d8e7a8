using System;
using System.Collections;
using System.Collections.Generic;
using System.Collections.ObjectModel;
using System.Linq;

namespace InductionHazard.Assessment;

/// <summary>
/// A list of sentences that reads as one line of text ("a; b") wherever text is wanted: Export-Csv, a table cell. A
/// sentence with figures in it may be written when first read (see <c>LaterText</c>), the same text it would have
/// been when it was made.
/// </summary>
public sealed class TextList : ReadOnlyCollection<string>
{
    /// <summary>Creates the list.</summary>
    public TextList(IEnumerable<string> items)
        : base(new Entries(items))
    {
    }

    /// <summary>An empty list, to be added to by the module as it works (the model's notes, an assessment's reasons).</summary>
    internal TextList()
        : base(new Entries(Enumerable.Empty<string>()))
    {
    }

    /// <summary>An empty list.</summary>
    public static TextList Empty { get; } = new(Enumerable.Empty<string>());

    /// <summary>Adds a sentence written now.</summary>
    internal void Add(string text) => ((Entries)Items).Append(text);

    /// <summary>Adds a sentence written by <paramref name="write"/> from <paramref name="figures"/> when first read.</summary>
    internal void Add<T>(T figures, Func<T, string> write) => ((Entries)Items).Append(LaterText.From(figures, write));

    /// <summary>The entries joined by "; ".</summary>
    public override string ToString() => string.Join("; ", this);

    /// <summary>The sentences, each a string or a text still to be written; read-only to everything but the list's own adding.</summary>
    private sealed class Entries : IList<string>
    {
        private object[] _entries;
        private int _count;

        public Entries(IEnumerable<string> items)
        {
            if (items is IList<string> list)
            {
                _entries = new object[list.Count];
                for (int i = 0; i < _entries.Length; i++)
                {
                    _entries[i] = list[i];
                }
            }
            else
            {
                _entries = items.ToArray<object>();
            }

            _count = _entries.Length;
        }

        public int Count => _count;

        public bool IsReadOnly => true;

        public string this[int index]
        {
            get
            {
                if ((uint)index >= (uint)_count)
                {
                    throw new ArgumentOutOfRangeException(nameof(index), index, "the list has " + _count + " entries");
                }

                return LaterText.Read(ref _entries[index]);
            }

            set => throw new NotSupportedException("the list is read-only");
        }

        public void Append(object entry)
        {
            if (_count == _entries.Length)
            {
                Array.Resize(ref _entries, Math.Max(8, 2 * _count));
            }

            _entries[_count++] = entry;
        }

        public int IndexOf(string item)
        {
            for (int i = 0; i < _count; i++)
            {
                if (string.Equals(this[i], item, StringComparison.Ordinal))
                {
                    return i;
                }
            }

            return -1;
        }

        public bool Contains(string item) => IndexOf(item) >= 0;

        public void CopyTo(string[] array, int arrayIndex)
        {
            for (int i = 0; i < _count; i++)
            {
                array[arrayIndex + i] = this[i];
            }
        }

        public IEnumerator<string> GetEnumerator()
        {
            for (int i = 0; i < _count; i++)
            {
                yield return this[i];
            }
        }

        IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

        public void Add(string item) => throw new NotSupportedException("the list is read-only");

        public void Clear() => throw new NotSupportedException("the list is read-only");

        public void Insert(int index, string item) => throw new NotSupportedException("the list is read-only");

        public bool Remove(string item) => throw new NotSupportedException("the list is read-only");

        public void RemoveAt(int index) => throw new NotSupportedException("the list is read-only");
    }
}

/// <summary>Each mechanism's result, reading as one line ("Shock: Clear (margin 12); Burn: Hazard (margin 0.4)") wherever text is wanted.</summary>
public sealed class MechanismList : ReadOnlyCollection<MechanismResult>
{
    /// <summary>Creates the list.</summary>
    public MechanismList(IEnumerable<MechanismResult> results)
        : base(results.ToList())
    {
    }

    /// <summary>An empty list.</summary>
    public static MechanismList Empty { get; } = new(Enumerable.Empty<MechanismResult>());

    /// <summary>The mechanisms that apply, each with its verdict and margin, joined by "; ".</summary>
    public override string ToString() => string.Join("; ", this.Where(r => r.Applies));
}
