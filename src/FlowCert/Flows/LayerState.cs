namespace FlowCert.Flows;

/// <summary>
/// Book-keeping shared by both flow searches of the maximally delayed construction (flows.md section 5):
/// which nodes are processed, which processed nodes may correct (non-inputs), and for each corrector how
/// many unprocessed neighbours it still has. Correctors with none are dropped from the active set, so
/// each layer touches only the frontier.
/// </summary>
internal sealed class LayerState
{
    private readonly CompactRows<int> neighbours;
    private readonly bool[] isInput;
    public bool[] Processed { get; }
    public bool[] IsCorrector { get; }
    /// <summary>For a corrector: its number of unprocessed neighbours.</summary>
    public int[] UnprocessedNeighbours { get; }
    // Correctors with at least one unprocessed neighbour: an unordered set with O(1) add and remove
    // (activeAt[v] is v's slot in active, -1 when absent); callers that need an order sort what they take.
    private int[] active = new int[16];
    private readonly int[] activeAt;
    private int activeCount;
    /// <summary>Correctors with at least one unprocessed neighbour, in no particular order.</summary>
    public ReadOnlySpan<int> Active => active.AsSpan(0, activeCount);
    public int UnprocessedCount { get; private set; }
    public List<int[]> Layers { get; } = [];

    public LayerState(CompactRows<int> neighbours, IReadOnlySet<int> inputs, IReadOnlySet<int> outputs)
    {
        this.neighbours = neighbours;
        int n = neighbours.Count;
        isInput = new bool[n];
        foreach (var i in inputs) isInput[i] = true;
        Processed = new bool[n];
        IsCorrector = new bool[n];
        UnprocessedNeighbours = new int[n];
        activeAt = new int[n];
        Array.Fill(activeAt, -1);
        foreach (var o in outputs) Processed[o] = true;
        UnprocessedCount = n - outputs.Count;
        foreach (var o in outputs.Order()) Promote(o);
    }

    private void Promote(int v)
    {
        if (isInput[v]) return;
        IsCorrector[v] = true;
        int count = 0;
        foreach (var w in neighbours[v]) if (!Processed[w]) count++;
        UnprocessedNeighbours[v] = count;
        if (count > 0) AddActive(v);
    }

    private void AddActive(int v)
    {
        if (activeCount == active.Length) Array.Resize(ref active, 2 * activeCount);
        activeAt[v] = activeCount;
        active[activeCount++] = v;
    }

    private void RemoveActive(int v)
    {
        int slot = activeAt[v], last = active[--activeCount];
        active[slot] = last;
        activeAt[last] = slot;
        activeAt[v] = -1;
    }

    /// <summary>Marks a layer processed and updates the counts of the correctors around it.</summary>
    public void AddLayer(int[] layer)
    {
        Layers.Add(layer);
        foreach (var v in layer) Processed[v] = true;
        UnprocessedCount -= layer.Length;
        foreach (var v in layer)
            foreach (var w in neighbours[v])
                if (IsCorrector[w] && --UnprocessedNeighbours[w] == 0) RemoveActive(w);
        foreach (var v in layer) Promote(v);
    }

    // Marks for Frontier: frontierMark[w] == frontierStamp when w was already taken this call.
    private int[]? frontierMark;
    private int frontierStamp;

    /// <summary>The unprocessed nodes adjacent to an active corrector, sorted.</summary>
    public int[] Frontier()
    {
        frontierMark ??= new int[Processed.Length];
        frontierStamp++;
        var rows = new List<int>();
        foreach (var c in Active)
            foreach (var w in neighbours[c])
                if (!Processed[w] && frontierMark[w] != frontierStamp) { frontierMark[w] = frontierStamp; rows.Add(w); }
        var sorted = rows.ToArray();
        Array.Sort(sorted);
        return sorted;
    }

    /// <summary>The unprocessed nodes, sorted.</summary>
    public int[] Unprocessed() => Enumerable.Range(0, Processed.Length).Where(v => !Processed[v]).ToArray();

    /// <summary>The rounds: layers in reverse, so the first layer found is measured last.</summary>
    public IReadOnlyList<IReadOnlyList<int>> Rounds()
        => Enumerable.Reverse(Layers).Select(l => (IReadOnlyList<int>)l).ToList();
}
