namespace FlowCert.Tests.Oracles;

/// <summary>
/// A qubit open graph with measurement labels as bit masks (at most 30 nodes), written for the tests from
/// flows.md section 9 alone: adjacency over F_2 (odd weights are edges), inputs, outputs, and a label
/// ("XY", "XZ", "YZ", "X", "Y" or "Z") for every node (outputs carry "XY" and are never looked at).
/// </summary>
public sealed record LabelledReference(int Count, int[] Adjacency, int Inputs, int Outputs, string[] Labels)
{
    public int Measured => ((1 << Count) - 1) & ~Outputs;
    public int NonInputs => ((1 << Count) - 1) & ~Inputs;
    public bool Has(int mask, int v) => (mask >> v & 1) != 0;

    /// <summary>Odd(p): the nodes with an odd number of neighbours in p.</summary>
    public int Odd(int p)
    {
        int odd = 0;
        for (int u = 0; u < Count; u++) if (Has(p, u)) odd ^= Adjacency[u];
        return odd;
    }

    /// <summary>From a solver graph (the weights reduced mod 2 by their numerators over odd denominators).</summary>
    public static LabelledReference From(FlowCert.Graphs.OpenGraph g)
    {
        int n = g.NodeCount;
        var adjacency = new int[n];
        foreach (var e in g.Edges)
            if (!e.Weight.Numerator.IsEven && !e.Weight.Denominator.IsEven) { adjacency[e.U] |= 1 << e.V; adjacency[e.V] |= 1 << e.U; }
        int inputs = 0, outputs = 0;
        foreach (var i in g.Inputs) inputs |= 1 << i;
        foreach (var o in g.Outputs) outputs |= 1 << o;
        var labels = Enumerable.Range(0, n).Select(v => FlowCert.Graphs.MeasurementLabels.Name(g.Label(v))).ToArray();
        return new LabelledReference(n, adjacency, inputs, outputs, labels);
    }
}

/// <summary>
/// Brute force over every schedule (ordered partition of the measured nodes into non-empty rounds) and
/// every correction set (every subset of the non-inputs), from the definitions of flows.md 9.2
/// (generalized flow with planes: G1-G3) and 9.3 (Pauli flow: P1-P9), written out separately.
/// Whether v can be corrected depends only on which measured nodes are later than v, so it is decided
/// once per (v, later set) and looked up for every schedule. Meant for up to 6 measured nodes.
/// </summary>
public static class LabelledBruteForce
{
    /// <summary>G1-G3 of flows.md 9.2 for node v, set g and the measured nodes later than v.</summary>
    public static bool General(LabelledReference r, int v, int g, int later)
    {
        if ((g & r.Inputs) != 0) return false; // g(v) is a set of non-inputs
        int odd = r.Odd(g);
        for (int w = 0; w < r.Count; w++)
        {
            if (w == v || r.Has(r.Outputs, w) || r.Has(later, w)) continue; // outputs are always later
            if (r.Has(g, w)) return false;   // G1
            if (r.Has(odd, w)) return false; // G2
        }
        bool inG = r.Has(g, v), inOdd = r.Has(odd, v);
        return r.Labels[v] switch // G3
        {
            "XY" => !inG && inOdd,
            "XZ" => inG && inOdd,
            "YZ" => inG && !inOdd,
            _ => throw new ArgumentException($"label {r.Labels[v]} is not a plane"),
        };
    }

    /// <summary>P1-P9 of flows.md 9.3 for node v, set p and the measured nodes later than v.</summary>
    public static bool Pauli(LabelledReference r, int v, int p, int later)
    {
        if ((p & r.Inputs) != 0) return false;
        int odd = r.Odd(p);
        for (int w = 0; w < r.Count; w++)
        {
            if (w == v || r.Has(r.Outputs, w) || r.Has(later, w)) continue;
            var l = r.Labels[w];
            if (r.Has(p, w) && l is not ("X" or "Y")) return false;           // P1
            if (r.Has(odd, w) && l is not ("Y" or "Z")) return false;         // P2
            if (l == "Y" && r.Has(p, w) != r.Has(odd, w)) return false;        // P3
        }
        bool inP = r.Has(p, v), inOdd = r.Has(odd, v);
        return r.Labels[v] switch // P4-P9
        {
            "XY" => !inP && inOdd,
            "XZ" => inP && inOdd,
            "YZ" => inP && !inOdd,
            "X" => inOdd,
            "Z" => inP,
            "Y" => inP != inOdd,
            _ => throw new ArgumentException(r.Labels[v]),
        };
    }

    /// <summary>The minimum depth over every schedule and every correction set, or null when no flow exists.</summary>
    public static int? MinimumDepth(LabelledReference r, bool pauli)
    {
        var measured = Enumerable.Range(0, r.Count).Where(v => r.Has(r.Measured, v)).ToArray();
        if (measured.Length == 0) return 0;
        var cache = new Dictionary<(int, int), bool>();
        bool Correctable(int v, int later)
        {
            if (cache.TryGetValue((v, later), out var known)) return known;
            bool found = false;
            for (int p = 0; p < 1 << r.Count && !found; p++)
                found = (p & r.Inputs) == 0 && (pauli ? Pauli(r, v, p, later) : General(r, v, p, later));
            return cache[(v, later)] = found;
        }
        int? best = null;
        // Rounds are chosen from the last one backwards: `later` holds every node of the rounds after this one.
        void Schedule(int remaining, int later, int rounds)
        {
            if (remaining == 0) { if (best is null || rounds < best) best = rounds; return; }
            for (int round = remaining; round != 0; round = (round - 1) & remaining)
            {
                bool ok = true;
                for (int v = 0; v < r.Count && ok; v++)
                    if (r.Has(round, v)) ok = Correctable(v, later);
                if (ok) Schedule(remaining & ~round, later | round, rounds + 1);
            }
        }
        Schedule(r.Measured, 0, 0);
        return best;
    }
}
