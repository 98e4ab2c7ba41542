namespace FlowCheck;

/// <summary>Checks a "flow" verdict: the rounds and, per measured node, its correction vector
/// (flows.md section 3 for general flow, section 4 for causal flow), one vector at a time as it is read.</summary>
public sealed class FlowClaim(FieldGraph g, bool causal, Progress progress, bool labelled)
{
    readonly int[] round = new int[g.Count];
    readonly Dictionary<int, Rational> product = [];
    readonly List<(int U, Rational X)> c = [];

    /// <summary>Returns the depth proven, or throws naming the first failing node.</summary>
    public int Check(Json json)
    {
        var rounds = 0;
        foreach (var i in json.At("", "rounds", "rounds").Items("rounds")) ReadRound(json.Strings("rounds", i), ++rounds);
        for (var v = 0; v < g.Count; v++)
            if (!g.IsOutput(v) && round[v] == 0) throw new InvalidCertificate($"measured node {g.Name(v)} is in no round");
        var depth = json.At("", "depth", "depth").Integer("depth");
        if (depth != rounds) throw new InvalidCertificate($"depth is {Rational.Show(depth)} but there are {rounds} rounds");
        var (next, missing) = (0, -1);
        foreach (var key in json.At("", "corrections", "corrections").NodeMap("corrections"))
        {
            // the keys are sorted, so the key is usually the first measured node after the last one (no lookup);
            // when it is not, that node (if below v) is the first without a vector: one scan serves both
            // Stryker disable once Equality: usual > 0 only looks node 0 up instead of guessing it (the same node); the == on this line was killed (2026-12-03)
            var v = Missing(next, g.Count) is var usual && usual >= 0 && g.Name(usual) == key ? usual : g.Measured(key, "corrections");
            (missing, next) = (missing < 0 && usual < v ? usual : missing, v + 1);
            CheckCorrection(v, json);
            if (progress.Due) progress.Show($"correction vectors checked up to node {v + 1:N0} of {g.Count:N0}");
        }
        if ((missing < 0 ? Missing(next, g.Count) : missing) is >= 0 and var first) throw new InvalidCertificate($"node {g.Name(first)}: no correction vector");
        return rounds;
    }

    /// <summary>The first measured node in [from, to) (they have no vector), or -1; reported after the map is read.</summary>
    int Missing(int from, int to) => Enumerable.Range(from, to - from).FirstOrDefault(v => !g.IsOutput(v), -1);

    void ReadRound(List<string> nodes, int r)
    {
        if (nodes.Count == 0) throw new InvalidCertificate($"round {r} is empty");
        Json.SortedUnique(nodes, $"round {r}");
        foreach (var v in nodes.Select(name => g.Measured(name, $"round {r}")))
            round[v] = round[v] == 0 ? r : throw new InvalidCertificate($"node {g.Name(v)} is in round {round[v]} and in round {r}");
    }

    /// <summary>An output, or a measured node in a strictly later round.</summary>
    bool IsLater(int u, int v) => g.IsOutput(u) || round[u] > round[v];

    void CheckCorrection(int v, Json json)
    {
        var name = g.Name(v); c.Clear();
        foreach (var key in json.NodeMap("corrections", name))
        {
            var text = json.String($"corrections.{name}", key);
            if (!g.Graph.Index.TryGetValue(key, out var u)) throw new InvalidCertificate($"node {name}: correction on unknown node {Json.Cut(key)}");
            var x = g.Field.ParseNonZero(text) ?? throw new InvalidCertificate($"node {name}: c_{name}({key}) = \"{Json.Cut(text)}\" is not a canonical non-zero element of {g.Field.Name}");
            if (g.IsInput(u)) throw new InvalidCertificate($"node {name}: correction on input {key}");
            if (!labelled && !IsLater(u, v)) throw new InvalidCertificate($"node {name} (round {round[v]}): correction on {key} (in round {round[u]}), which is not later");
            c.Add((u, x));
        }
        if (labelled) { Labelled.CheckCorrection(g, v, c.Select(e => e.U).ToHashSet(), u => IsLater(u, v), $"node {name} (round {round[v]})"); return; }
        if (causal) CheckCausal(v, name);
        foreach (var (u, x) in c) foreach (var (w, a) in g.Neighbours(u)) g.Add(product, w, g.Field.Mul(a, x));
        var self = product.GetValueOrDefault(v, Rational.Zero);
        if (self != Rational.One) throw new InvalidCertificate($"node {name}: (A c_{name})({name}) = {self.Show()}, not 1");
        foreach (var w in product.Keys.Where(w => w != v && !product[w].Num.IsZero && !IsLater(w, v)).Order()) // the first in node order
            throw new InvalidCertificate($"node {name} (round {round[v]}): (A c_{name})({g.Name(w)}) = {product[w].Show()} is non-zero but {g.Name(w)} is in round {round[w]}, not later");
        product.Clear();
    }

    /// <summary>Section 4: one entry, on a neighbour f(v), equal to 1 / A[v][f(v)].</summary>
    void CheckCausal(int v, string name)
    {
        if (c.Count != 1) throw new InvalidCertificate($"node {name}: a causal correction has exactly one entry, found {c.Count}");
        var (f, x) = c[0];
        if (g.Neighbours(v).Where(e => e.Node == f).Select(e => (Rational?)e.A).FirstOrDefault() is not { } a)
            throw new InvalidCertificate($"node {name}: f({name}) = {g.Name(f)} is not a neighbour of {name} in {g.Field.Name}");
        var inverse = g.Field.Inverse(a);
        if (x != inverse) throw new InvalidCertificate($"node {name}: c_{name}({g.Name(f)}) = {x.Show()} but 1/A[{name}][{g.Name(f)}] = {inverse.Show()}");
    }
}
