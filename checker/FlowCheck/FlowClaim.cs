using Newtonsoft.Json.Linq;

namespace FlowCheck;

/// <summary>Checks a "flow" verdict: the rounds and, per measured node, its correction vector
/// (flows.md section 3 for general flow, section 4 for causal flow).</summary>
public sealed class FlowClaim(FieldGraph g, bool causal, OpenGraph? labelled = null)
{
    readonly Dictionary<string, int> round = [];

    /// <summary>Returns the depth proven, or throws naming the first failing node.</summary>
    public int Check(JObject root)
    {
        var rounds = Json.Array(root["rounds"], "rounds");
        for (var i = 0; i < rounds.Count; i++) ReadRound(Json.Strings(rounds[i], $"rounds[{i}]"), i + 1);
        var measured = g.Nodes.Where(g.IsMeasured).Order(StringComparer.Ordinal).ToList();
        foreach (var v in measured.Where(v => !round.ContainsKey(v)))
            throw new InvalidCertificate($"measured node {v} is in no round");
        var depth = Json.Integer(root["depth"], "depth");
        if (depth != rounds.Count) throw new InvalidCertificate($"depth is {depth} but there are {rounds.Count} rounds");
        var corrections = Json.NodeMap(root["corrections"], "corrections");
        foreach (var p in corrections.Properties().Where(p => !round.ContainsKey(p.Name)))
            throw new InvalidCertificate($"corrections: {p.Name} is not a measured node");
        foreach (var v in measured)
        {
            var token = corrections[v] ?? throw new InvalidCertificate($"node {v}: no correction vector");
            if (labelled is null) CheckCorrection(v, token);
            else Labelled.CheckCorrection(g, labelled, v, ReadSet(v, token), u => IsLater(u, v), $"node {v} (round {round[v]})");
        }
        return rounds.Count;
    }

    void ReadRound(List<string> nodes, int r)
    {
        if (nodes.Count == 0) throw new InvalidCertificate($"round {r} is empty");
        Json.SortedUnique(nodes, $"round {r}");
        foreach (var v in nodes)
        {
            if (!g.IsMeasured(v)) throw new InvalidCertificate($"round {r}: {v} is not a measured node");
            if (!round.TryAdd(v, r)) throw new InvalidCertificate($"node {v} is in round {round[v]} and in round {r}");
        }
    }

    /// <summary>An output, or a measured node in a strictly later round.</summary>
    bool IsLater(string u, string v) => g.Outputs.Contains(u) || round[u] > round[v];

    /// <summary>Where a node that is not later than another sits (never an output: outputs are always later).</summary>
    string Position(string u) => $"in round {round[u]}";

    /// <summary>Over F2 with labels (flows.md section 9): the support of a correction, entries "1" on known non-inputs.</summary>
    HashSet<string> ReadSet(string v, JToken token)
    {
        var set = new HashSet<string>();
        foreach (var p in Json.NodeMap(token, $"corrections.{v}").Properties())
        {
            var text = Json.String(p.Value, $"corrections.{v}.{p.Name}");
            if (!g.Nodes.Contains(p.Name)) throw new InvalidCertificate($"node {v}: correction on unknown node {p.Name}");
            if (text != "1") throw new InvalidCertificate($"node {v}: p_{v}({p.Name}) = \"{Json.Cut(text)}\" is not 1");
            if (g.Inputs.Contains(p.Name)) throw new InvalidCertificate($"node {v}: correction on input {p.Name}");
            set.Add(p.Name);
        }
        return set;
    }

    void CheckCorrection(string v, JToken token)
    {
        var entries = Json.NodeMap(token, $"corrections.{v}");
        var c = new Dictionary<string, Rational>();
        foreach (var p in entries.Properties())
        {
            var u = p.Name;
            var text = Json.String(p.Value, $"corrections.{v}.{u}");
            if (!g.Nodes.Contains(u)) throw new InvalidCertificate($"node {v}: correction on unknown node {u}");
            c[u] = g.Field.ParseNonZero(text) ?? throw new InvalidCertificate(
                $"node {v}: c_{v}({u}) = \"{Json.Cut(text)}\" is not a canonical non-zero element of {g.Field.Name}");
            if (g.Inputs.Contains(u)) throw new InvalidCertificate($"node {v}: correction on input {u}");
            if (!IsLater(u, v)) throw new InvalidCertificate($"node {v} (round {round[v]}): correction on {u} ({Position(u)}), which is not later");
        }
        if (causal) CheckCausal(v, c);
        var product = new Dictionary<string, Rational>();
        foreach (var (u, x) in c)
            foreach (var (w, a) in g.Adjacent[u])
                product[w] = g.Field.Add(product.GetValueOrDefault(w, Rational.Zero), g.Field.Mul(a, x));
        var self = product.GetValueOrDefault(v, Rational.Zero);
        if (self != Rational.One) throw new InvalidCertificate($"node {v}: (A c_{v})({v}) = {self}, not 1");
        foreach (var w in product.Keys.Order(StringComparer.Ordinal))
            if (w != v && !product[w].Num.IsZero && !IsLater(w, v))
                throw new InvalidCertificate(
                    $"node {v} (round {round[v]}): (A c_{v})({w}) = {product[w]} is non-zero but {w} is {Position(w)}, not later");
    }

    /// <summary>Section 4: one entry, on a neighbour f(v), equal to 1 / A[v][f(v)].</summary>
    void CheckCausal(string v, Dictionary<string, Rational> c)
    {
        if (c.Count != 1) throw new InvalidCertificate($"node {v}: a causal correction has exactly one entry, found {c.Count}");
        var (f, x) = c.Single();
        if (!g.Adjacent[v].TryGetValue(f, out var a))
            throw new InvalidCertificate($"node {v}: f({v}) = {f} is not a neighbour of {v} in {g.Field.Name}");
        var inverse = g.Field.Inverse(a);
        if (x != inverse) throw new InvalidCertificate($"node {v}: c_{v}({f}) = {x} but 1/A[{v}][{f}] = {inverse}");
    }
}
