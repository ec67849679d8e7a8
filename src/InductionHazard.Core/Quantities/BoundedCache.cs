using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using System.Threading;

namespace InductionHazard.Quantities;

/// <summary>
/// Values found once and kept for the texts and names an inventory repeats on every row; safe on any thread. It
/// starts again empty after every <c>capacity</c> additions, so that texts made afresh for each row cannot fill
/// memory (its additions are counted: the dictionary's own count takes all its locks).
/// </summary>
internal sealed class BoundedCache<TKey, TValue>
    where TKey : notnull
{
    private readonly ConcurrentDictionary<TKey, TValue> _entries;
    private readonly int _capacity;
    private int _added;

    /// <summary>Creates an empty cache.</summary>
    public BoundedCache(int capacity, IEqualityComparer<TKey>? comparer = null)
    {
        _capacity = capacity;
        _entries = comparer is null ? new ConcurrentDictionary<TKey, TValue>() : new ConcurrentDictionary<TKey, TValue>(comparer);
    }

    /// <summary>The value kept for a key, if any.</summary>
    public bool TryGet(TKey key, out TValue value) => _entries.TryGetValue(key, out value!);

    /// <summary>Keeps a value and returns it.</summary>
    public TValue Add(TKey key, TValue value)
    {
        if (Interlocked.Increment(ref _added) % _capacity == 0)
        {
            _entries.Clear();
        }

        _entries[key] = value;
        return value;
    }
}

/// <summary>
/// Keys compared as objects: a lookup costs no hashing of their contents. An equal key in another object is only a
/// miss, so it suits names the code and a file's header pass again and again as the same objects.
/// </summary>
internal sealed class SameObject<T> : IEqualityComparer<T>
    where T : class
{
    /// <summary>The comparer.</summary>
    public static readonly SameObject<T> Instance = new();

    /// <inheritdoc />
    public bool Equals(T? x, T? y) => ReferenceEquals(x, y);

    /// <inheritdoc />
    public int GetHashCode(T obj) => RuntimeHelpers.GetHashCode(obj);
}
