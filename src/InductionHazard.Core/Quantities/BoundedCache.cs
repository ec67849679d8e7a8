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
    private readonly IEqualityComparer<TKey> _comparer;
    private readonly int _capacity;
    private int _added;

    /// <summary>The hashes of the keys offered to <see cref="AddOnRepeat"/>, at most as many as the cache keeps; made when first needed.</summary>
    private HashSet<int>? _offered;
    private readonly object _offeredLock = new();

    /// <summary>Creates an empty cache.</summary>
    public BoundedCache(int capacity, IEqualityComparer<TKey>? comparer = null)
    {
        _capacity = capacity;
        _comparer = comparer ?? EqualityComparer<TKey>.Default;
        _entries = new ConcurrentDictionary<TKey, TValue>(_comparer);
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

    /// <summary>
    /// Keeps a value only if its key was offered before, and returns it either way. For values of which most are asked
    /// for once (every row's own size, every item of an inventory of different items): kept from their first sight,
    /// they live while the cache fills and the runtime carries each into its older generation before it is dropped,
    /// which costs more than finding a value twice. The keys offered are known by their hashes alone (no key is kept
    /// alive), as many as the cache keeps entries, then the set starts again: two keys with one hash only make the
    /// second kept on its first sight, never change a value (a value is always found by its whole key). Safe on any
    /// thread.
    /// </summary>
    public TValue AddOnRepeat(TKey key, TValue value)
    {
        int hash = _comparer.GetHashCode(key);
        bool seen;
        lock (_offeredLock)
        {
            HashSet<int> offered = _offered ??= new HashSet<int>();
            seen = !offered.Add(hash);
            if (!seen && offered.Count > _capacity)
            {
                offered.Clear();
                offered.Add(hash);
            }
        }

        return seen ? Add(key, value) : value;
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
