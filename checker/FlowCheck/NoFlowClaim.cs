using Newtonsoft.Json.Linq;

namespace FlowCheck;

/// <summary>Checks a "noflow" verdict: the blocked set U and, for general flow, the left-kernel
/// witnesses of A[U, C] with C = (V \ I) \ U (flows.md section 6).</summary>
public sealed class NoFlowClaim(FieldGraph g, bool causal, OpenGraph? labelled = null)
{
    /// <summary>Returns the size of the blocked set proven, or throws naming the first failure.</summary>
    public int Check(JObject root)
    {
        var obstruction = causal
            ? Json.Object(root["obstruction"], "obstruction", "blocked")
            : Json.Object(root["obstruction"], "obstruction", "blocked", "witnesses");
        var blocked = Json.Strings(obstruction["blocked"], "obstruction.blocked");
        if (blocked.Count == 0) throw new InvalidCertificate("obstruction.blocked is empty");
        Json.SortedUnique(blocked, "obstruction.blocked");
        foreach (var v in blocked.Where(v => !g.IsMeasured(v)))
            throw new InvalidCertificate($"obstruction.blocked: {v} is not a measured node");
        var u = blocked.ToHashSet();
        if (labelled is not null) Labelled.CheckWitnesses(g, labelled, Json.NodeMap(obstruction["witnesses"], "obstruction.witnesses"), blocked, u);
        else if (causal) CheckCausal(blocked, u);
        else CheckWitnesses(Json.Array(obstruction["witnesses"], "obstruction.witnesses"), blocked, u);
        return blocked.Count;
    }

    bool IsCorrector(string w, HashSet<string> blocked) => !g.Inputs.Contains(w) && !blocked.Contains(w);

    /// <summary>Every corrector has a number of neighbours in U other than exactly one.</summary>
    void CheckCausal(List<string> blocked, HashSet<string> u)
    {
        var count = new Dictionary<string, int>();
        foreach (var x in blocked)
            foreach (var w in g.Adjacent[x].Keys.Where(w => IsCorrector(w, u)))
                count[w] = count.GetValueOrDefault(w) + 1;
        foreach (var w in count.Keys.Order(StringComparer.Ordinal).Where(w => count[w] == 1))
        {
            var x = blocked.First(x => g.Adjacent[x].ContainsKey(w));
            throw new InvalidCertificate($"corrector {w} has exactly one neighbour in the blocked set ({x}), so it could correct {x}");
        }
    }

    /// <summary>Each witness y has y^T A[U, C] = 0, entries non-zero on U; the supports cover U.</summary>
    void CheckWitnesses(JArray witnesses, List<string> blocked, HashSet<string> u)
    {
        var covered = new HashSet<string>();
        for (var i = 0; i < witnesses.Count; i++)
        {
            var what = $"obstruction.witnesses[{i}]";
            var product = new Dictionary<string, Rational>();
            foreach (var p in Json.NodeMap(witnesses[i], what).Properties())
            {
                var text = Json.String(p.Value, $"{what}.{p.Name}");
                if (!u.Contains(p.Name)) throw new InvalidCertificate($"{what}: entry on {p.Name}, which is not in the blocked set");
                var y = g.Field.ParseNonZero(text) ?? throw new InvalidCertificate(
                    $"{what}: y({p.Name}) = \"{Json.Cut(text)}\" is not a canonical non-zero element of {g.Field.Name}");
                covered.Add(p.Name);
                foreach (var (w, a) in g.Adjacent[p.Name].Where(e => IsCorrector(e.Key, u)))
                    product[w] = g.Field.Add(product.GetValueOrDefault(w, Rational.Zero), g.Field.Mul(y, a));
            }
            foreach (var w in product.Keys.Order(StringComparer.Ordinal).Where(w => !product[w].Num.IsZero))
                throw new InvalidCertificate($"{what}: (y^T A)({w}) = {product[w]} for corrector {w}, not 0");
        }
        foreach (var v in blocked.Where(v => !covered.Contains(v)))
            throw new InvalidCertificate($"blocked node {v} is in no witness's support");
    }
}
