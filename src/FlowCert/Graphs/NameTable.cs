namespace FlowCert.Graphs;

/// <summary>
/// Interns node names to ids 0, 1, 2, ... in order of first sight, looked up by span. Open addressing with
/// linear probing over one array that holds each name's hash beside its id, so a lookup reads one slot and
/// compares one string (a general dictionary reads a bucket, an entry and the string: on a million names
/// each read is a cache miss). The hash is .NET's randomized string hash, so a crafted file cannot make
/// probing sequences long (common practice).
/// </summary>
internal sealed class NameTable
{
    private readonly List<string> names = [];
    private long[] slots = new long[1 << 10]; // (hash << 32) | (id + 1); 0 = empty
    private int mask = (1 << 10) - 1;

    /// <summary>The names, by id.</summary>
    public IReadOnlyList<string> Names => names;

    /// <summary>The number of names.</summary>
    public int Count => names.Count;

    /// <summary>The id of the name, or -1 when it has not been added.</summary>
    public int Find(ReadOnlySpan<char> name) => Find(name, string.GetHashCode(name));

    private int Find(ReadOnlySpan<char> name, int hash)
    {
        for (int i = hash & mask; ; i = (i + 1) & mask)
        {
            long slot = slots[i];
            if (slot == 0) return -1;
            int id = (int)(uint)slot - 1;
            if ((int)(slot >> 32) == hash && name.SequenceEqual(names[id])) return id;
        }
    }

    /// <summary>Adds a name that <see cref="Find(ReadOnlySpan{char})"/> did not find; returns its id.</summary>
    public int Add(string name)
    {
        if (2 * (names.Count + 1) > slots.Length) Grow();
        int id = names.Count;
        names.Add(name);
        Place(string.GetHashCode(name.AsSpan()), id);
        return id;
    }

    private void Place(int hash, int id)
    {
        int i = hash & mask;
        while (slots[i] != 0) i = (i + 1) & mask;
        slots[i] = ((long)hash << 32) | (uint)(id + 1);
    }

    private void Grow()
    {
        var old = slots;
        slots = new long[old.Length * 2];
        mask = slots.Length - 1;
        foreach (var slot in old)
            if (slot != 0) Place((int)(slot >> 32), (int)(uint)slot - 1);
    }
}
