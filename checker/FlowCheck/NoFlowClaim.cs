namespace FlowCheck;

/// <summary>Checks a "noflow" verdict: the blocked set U and, for general flow, the left-kernel
/// witnesses of A[U, C] with C = (V \ I) \ U (flows.md section 6).</summary>
public sealed class NoFlowClaim(FieldGraph g, bool causal, Progress progress)
{
    readonly bool[] inU = new bool[g.Count];

    /// <summary>Returns the size of the blocked set proven, or throws naming the first failure.</summary>
    public int Check(Json json)
    {
        if (causal) json.Known("obstruction", "obstruction", "blocked");
        else json.Known("obstruction", "obstruction", "blocked", "witnesses");
        var names = json.At("obstruction", "blocked", "obstruction.blocked").Strings("obstruction.blocked");
        if (names.Count == 0) throw new InvalidCertificate("obstruction.blocked is empty");
        Json.SortedUnique(names, "obstruction.blocked");
        var blocked = new List<int>();
        foreach (var name in names)
        {
            var v = g.Measured(name, "obstruction.blocked");
            blocked.Add(v);
            inU[v] = true;
        }
        if (causal) CheckCausal(blocked);
        else CheckWitnesses(json, blocked);
        return blocked.Count;
    }

    bool IsCorrector(int w) => !g.IsInput(w) && !inU[w];

    /// <summary>Every corrector has a number of neighbours in U other than exactly one.</summary>
    void CheckCausal(List<int> blocked)
    {
        var count = new int[g.Count];
        foreach (var x in blocked)
            foreach (var (w, _) in g.Neighbours(x).Where(e => IsCorrector(e.Node)))
                count[w]++;
        for (var w = 0; w < g.Count; w++)
            if (count[w] == 1)
            {
                var x = blocked.First(x => g.Neighbours(x).Any(e => e.Node == w));
                throw new InvalidCertificate($"corrector {g.Name(w)} has exactly one neighbour in the blocked set ({g.Name(x)}), so it could correct {g.Name(x)}");
            }
    }

    /// <summary>Each witness y has y^T A[U, C] = 0, entries non-zero on U; the supports cover U.</summary>
    void CheckWitnesses(Json json, List<int> blocked)
    {
        var covered = new bool[g.Count];
        var product = new Dictionary<int, Rational>();
        foreach (var i in json.At("obstruction", "witnesses", "obstruction.witnesses").Items("obstruction.witnesses"))
        {
            var what = $"obstruction.witnesses[{i}]";
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
            product.Clear();
            progress.Report("witnesses checked", i + 1, blocked.Count);
        }
        foreach (var v in blocked.Where(v => !covered[v]))
            throw new InvalidCertificate($"blocked node {g.Name(v)} is in no witness's support");
    }
}
