namespace FlowCheck;

/// <summary>Checks a "noflow" verdict: the blocked set U and, for general flow, the left-kernel
/// witnesses of A[U, C] with C = (V \ I) \ U (flows.md section 6).</summary>
public sealed class NoFlowClaim(FieldGraph g, bool causal, Progress progress, bool labelled)
{
    readonly bool[] inU = new bool[g.Count];

    /// <summary>Returns the size of the blocked set proven, or throws naming the first failure.</summary>
    public int Check(Json json)
    {
        json.Known("obstruction", "obstruction", causal ? ["blocked"] : ["blocked", "witnesses"]);
        var names = json.At("obstruction", "blocked", "obstruction.blocked").Strings("obstruction.blocked");
        if (names.Count == 0) throw new InvalidCertificate("obstruction.blocked is empty");
        Json.SortedUnique(names, "obstruction.blocked");
        var blocked = names.Select(name => g.Measured(name, "obstruction.blocked")).ToList();
        foreach (var v in blocked) inU[v] = true;
        if (labelled) Labelled.CheckWitnesses(g, json, blocked, inU);
        else if (causal) CheckCausal(blocked);
        else CheckWitnesses(json, blocked);
        return blocked.Count;
    }

    bool IsCorrector(int w) => !g.IsInput(w) && !inU[w];

    /// <summary>Every corrector has a number of neighbours in U other than exactly one.</summary>
    void CheckCausal(List<int> blocked)
    {
        var (count, via) = (new int[g.Count], new int[g.Count]); // via[w]: a neighbour of w in U
        foreach (var x in blocked)
            foreach (var (w, _) in g.Neighbours(x).Where(e => IsCorrector(e.Node))) (count[w], via[w]) = (count[w] + 1, x);
        foreach (var w in Enumerable.Range(0, g.Count).Where(w => count[w] == 1))
            throw new InvalidCertificate($"corrector {g.Name(w)} has exactly one neighbour in the blocked set ({g.Name(via[w])}), so it could correct {g.Name(via[w])}");
    }

    /// <summary>Each witness y has y^T A[U, C] = 0, entries non-zero on U; the supports cover U.</summary>
    void CheckWitnesses(Json json, List<int> blocked)
    {
        var covered = new bool[g.Count];
        foreach (var i in json.At("obstruction", "witnesses", "obstruction.witnesses").Items("obstruction.witnesses"))
        {
            var (what, product) = ($"obstruction.witnesses[{i}]", new Dictionary<int, Rational>());
            foreach (var key in json.NodeMap(what))
            {
                var text = json.String(what, key);
                if (!g.Graph.Index.TryGetValue(key, out var x) || !inU[x])
                    throw new InvalidCertificate($"{what}: entry on {Json.Cut(key)}, which is not in the blocked set");
                var y = g.Field.ParseNonZero(text) ?? throw new InvalidCertificate($"{what}: y({key}) = \"{Json.Cut(text)}\" is not a canonical non-zero element of {g.Field.Name}");
                covered[x] = true;
                foreach (var (w, a) in g.Neighbours(x).Where(e => IsCorrector(e.Node)))
                    g.Add(product, w, g.Field.Mul(y, a));
            }
            foreach (var w in product.Keys.Order().Where(w => !product[w].Num.IsZero))
                throw new InvalidCertificate($"{what}: (y^T A)({g.Name(w)}) = {product[w].Show()} for corrector {g.Name(w)}, not 0");
            if (progress.Due) progress.Show($"witnesses checked: {i + 1:N0} (blocked set of {blocked.Count:N0})");
        }
        foreach (var v in blocked.Where(v => !covered[v]))
            throw new InvalidCertificate($"blocked node {g.Name(v)} is in no witness's support");
    }
}
