using System.Numerics;
using System.Text.RegularExpressions;
using Fractions;
using Newtonsoft.Json.Linq;

namespace FlowCheck.Tests;

/// <summary>A second, deliberately naive judge of certificates, written in the tests straight from
/// docs/flows.md (sections 2-6, the design contract) and docs/formats.md: dense matrices indexed by node, every
/// condition quantified over all nodes, Q arithmetic from the Fractions package, F_p residues as
/// integral Fractions, primality by trial division. It shares no code with the checker. The corruption
/// test uses it to tell a corruption that happens to be another valid certificate from a miss.</summary>
public static class Oracle
{
    sealed class Reject(string why) : Exception(why);

    static readonly string[] TopKeys = ["format", "version", "flow", "field", "graphSha256", "graph", "verdict",
        "depth", "rounds", "corrections", "obstruction", "producer"];

    /// <summary>Null when the certificate is valid, otherwise the first reason found.</summary>
    public static string? Reason(JToken document)
    {
        // Version 2 (measurement labels, Pauli flow) has its own naive judge; see LabelledOracle.
        if (document is JObject o && o["version"]?.Type == JTokenType.Integer && o["version"]!.ToString() == "2") return LabelledOracle.Reason(o);
        try { Judge(document); return null; }
        catch (Reject r) { return r.Message; }
    }

    static void Judge(JToken document)
    {
        var c = document as JObject ?? throw new Reject("not an object");
        Need(c.Properties().All(p => TopKeys.Contains(p.Name)), "unknown key");
        Need(Str(c["format"]) == "flowcert-certificate", "format");
        Need(c["version"]?.Type == JTokenType.Integer && c["version"]!.ToString() == "1", "version");
        var flow = Str(c["flow"]);
        Need(flow is "general" or "causal", "flow");
        var p = FieldPrime(Str(c["field"]));
        if (c["producer"] is { } prod)
            Need(prod is JObject po && po.Properties().Select(x => x.Name).Order().SequenceEqual(["name", "version"])
                 && po.Properties().All(x => x.Value.Type == JTokenType.String), "producer");
        var g = c["graph"] as JObject ?? throw new Reject("graph");
        Need(g.Properties().Select(x => x.Name).Order().SequenceEqual(["edges", "inputs", "nodes", "outputs"]), "graph keys");
        var nodes = SortedNames(g["nodes"]);
        var inputs = SortedNames(g["inputs"]);
        var outputs = SortedNames(g["outputs"]);
        Need(inputs.Concat(outputs).All(nodes.Contains), "io not nodes");
        var n = nodes.Count;
        var A = new Fraction[n, n];
        for (var i = 0; i < n; i++) for (var j = 0; j < n; j++) A[i, j] = Fraction.Zero;
        var edgeKeys = new List<string>();
        foreach (var e in Arr(g["edges"]))
        {
            var t = Arr(e).Select(Str).ToList();
            Need(t.Count == 3 && nodes.Contains(t[0]) && nodes.Contains(t[1]) && string.CompareOrdinal(t[0], t[1]) < 0, "edge");
            var w = Canonical(t[2], 0) ?? throw new Reject("weight");
            Need(p.IsZero || !(w.Denominator % p).IsZero, "weight meaningless in field");
            var (i, j) = (nodes.IndexOf(t[0]), nodes.IndexOf(t[1]));
            A[i, j] = A[j, i] = Into(w, p);
            edgeKeys.Add(t[0] + " " + t[1]);
        }
        Need(edgeKeys.SequenceEqual(edgeKeys.Order(StringComparer.Ordinal)) && edgeKeys.Distinct().Count() == edgeKeys.Count
             && EdgesSortedByPair(g), "edges order");
        Need(Str(c["graphSha256"]) == Support.Sha256Hex(Support.Canonical(g)), "hash");
        var measured = nodes.Where(v => !outputs.Contains(v)).ToList();
        var verdict = Str(c["verdict"]);
        if (verdict == "flow")
        {
            Need(c["obstruction"] is null, "obstruction key in flow");
            JudgeFlow(c, flow == "causal", p, nodes, inputs, outputs, measured, A);
        }
        else if (verdict == "noflow")
        {
            Need(c["depth"] is null && c["rounds"] is null && c["corrections"] is null, "flow key in noflow");
            JudgeNoFlow(c, flow == "causal", p, nodes, inputs, measured, A);
        }
        else throw new Reject("verdict");
    }

    static void JudgeFlow(JObject c, bool causal, BigInteger p, List<string> nodes, List<string> inputs,
        List<string> outputs, List<string> measured, Fraction[,] A)
    {
        var rounds = Arr(c["rounds"]).Select(SortedNames).ToList();
        var round = new Dictionary<string, int>();
        for (var r = 0; r < rounds.Count; r++)
        {
            Need(rounds[r].Count > 0, "empty round");
            foreach (var v in rounds[r]) { Need(measured.Contains(v) && !round.ContainsKey(v), "round member"); round[v] = r + 1; }
        }
        Need(measured.All(round.ContainsKey), "unscheduled");
        Need(c["depth"]?.Type == JTokenType.Integer && c["depth"]!.ToString() == rounds.Count.ToString(), "depth");
        var corr = c["corrections"] as JObject ?? throw new Reject("corrections");
        var keys = corr.Properties().Select(x => x.Name).ToList();
        Need(keys.SequenceEqual(measured), "correction keys");
        bool Later(string u, string v) => outputs.Contains(u) || (round.ContainsKey(u) && round[u] > round[v]);
        foreach (var v in measured)
        {
            var vec = Vector(corr[v], nodes, p);
            var vi = nodes.IndexOf(v);
            if (causal)
            {
                // flows.md section 4, conditions 1-3, and c_v = e_f / A[v][f].
                Need(vec.Count == 1, "causal needs one entry");
                var (f, x) = vec.Single();
                var fi = nodes.IndexOf(f);
                Need(!A[vi, fi].IsZero && !inputs.Contains(f) && Later(f, v), "causal f");
                Need(nodes.Where((w, wi) => w != v && !A[fi, wi].IsZero && measured.Contains(w)).All(w => Later(w, v)), "causal neighbours");
                Need(Mul(x, A[vi, fi], p) == Fraction.One, "causal value");
                continue;
            }
            // flows.md section 3, conditions 1-3, with A c_v computed densely.
            Need(vec.Keys.All(u => !inputs.Contains(u) && Later(u, v)), "support");
            var product = nodes.Select((_, wi) => vec.Aggregate(Fraction.Zero, (s, e) => Add(s, Mul(A[wi, nodes.IndexOf(e.Key)], e.Value, p), p))).ToList();
            Need(product[vi] == Fraction.One, "(A c)(v) != 1");
            Need(measured.All(w => w == v || product[nodes.IndexOf(w)].IsZero || Later(w, v)), "odd neighbourhood");
        }
    }

    static void JudgeNoFlow(JObject c, bool causal, BigInteger p, List<string> nodes, List<string> inputs,
        List<string> measured, Fraction[,] A)
    {
        var o = c["obstruction"] as JObject ?? throw new Reject("obstruction");
        var allowed = causal ? new[] { "blocked" } : ["blocked", "witnesses"];
        Need(o.Properties().All(x => allowed.Contains(x.Name)), "obstruction keys");
        var U = SortedNames(o["blocked"]);
        Need(U.Count > 0 && U.All(measured.Contains), "blocked");
        var C = nodes.Where(w => !inputs.Contains(w) && !U.Contains(w)).ToList();
        if (causal)
        {
            // flows.md section 6: every corrector has a number of neighbours in U other than exactly one.
            Need(C.All(u => U.Count(w => !A[nodes.IndexOf(u), nodes.IndexOf(w)].IsZero) != 1), "causal obstruction");
            return;
        }
        var covered = new HashSet<string>();
        foreach (var y in Arr(o["witnesses"]).Select(t => Vector(t, nodes, p)))
        {
            Need(y.Keys.All(U.Contains), "witness off U");
            Need(C.All(w => y.Aggregate(Fraction.Zero, (s, e) => Add(s, Mul(e.Value, A[nodes.IndexOf(e.Key), nodes.IndexOf(w)], p), p)).IsZero), "not in left kernel");
            covered.UnionWith(y.Keys);
        }
        Need(U.All(covered.Contains), "cover");
    }

    static Dictionary<string, Fraction> Vector(JToken? t, List<string> nodes, BigInteger p)
    {
        var o = t as JObject ?? throw new Reject("vector");
        var keys = o.Properties().Select(x => x.Name).ToList();
        Need(keys.All(nodes.Contains) && keys.SequenceEqual(keys.Order(StringComparer.Ordinal)), "vector keys");
        return o.Properties().ToDictionary(x => x.Name, x => Canonical(Str(x.Value), p) ?? throw new Reject("element"));
    }

    /// <summary>A canonical non-zero element: reduced a or a/b over Q (p = 0), a residue 1..p-1 over F_p.</summary>
    static Fraction? Canonical(string s, BigInteger p)
    {
        var m = Regex.Match(s, @"^(-?[0-9]+)(?:/([0-9]+))?\z");
        if (!m.Success) return null;
        var num = BigInteger.Parse(m.Groups[1].Value);
        var den = m.Groups[2].Success ? BigInteger.Parse(m.Groups[2].Value) : BigInteger.One;
        if (den.IsZero || num.IsZero) return null;
        var f = new Fraction(num, den);
        var text = f.Denominator.IsOne ? f.Numerator.ToString() : $"{f.Numerator}/{f.Denominator}";
        if (text != s) return null;
        return p.IsZero || (f.Denominator.IsOne && f.Numerator > 0 && f.Numerator < p) ? f : null;
    }

    static BigInteger FieldPrime(string field)
    {
        if (field == "Q") return BigInteger.Zero;
        var m = Regex.Match(field, @"^F([0-9]+)\z");
        Need(m.Success && !m.Groups[1].Value.StartsWith('0'), "field");
        var p = BigInteger.Parse(m.Groups[1].Value);
        Need(p >= 2, "field");
        // The Mersenne prime 2^61 - 1 (common practice) is known; other p are decided by trial division,
        // which the oracle only attempts below 10^12.
        if (p == (BigInteger.One << 61) - 1) return p;
        if (p >= BigInteger.Pow(10, 12)) throw new InvalidOperationException($"the oracle cannot decide whether {p} is prime");
        for (BigInteger d = 2; d * d <= p; d++) Need(!(p % d).IsZero, "composite field");
        return p;
    }

    static Fraction Into(Fraction w, BigInteger p) =>
        p.IsZero ? w : Mod(w.Numerator * BigInteger.ModPow(w.Denominator, p - 2, p), p);

    static Fraction Mod(BigInteger x, BigInteger p) => new(((x % p) + p) % p);
    static Fraction Add(Fraction a, Fraction b, BigInteger p) => p.IsZero ? a + b : Mod(a.Numerator + b.Numerator, p);
    static Fraction Mul(Fraction a, Fraction b, BigInteger p) => p.IsZero ? a * b : Mod(a.Numerator * b.Numerator, p);

    static bool EdgesSortedByPair(JObject g)
    {
        var pairs = Arr(g["edges"]).Select(e => (U: Str(e[0]), V: Str(e[1]))).ToList();
        return pairs.Zip(pairs.Skip(1)).All(z => string.CompareOrdinal(z.First.U, z.Second.U) < 0
            || (z.First.U == z.Second.U && string.CompareOrdinal(z.First.V, z.Second.V) < 0));
    }

    static List<string> SortedNames(JToken? t)
    {
        var names = Arr(t).Select(Str).ToList();
        Need(names.All(x => Regex.IsMatch(x, @"^[A-Za-z_][A-Za-z0-9_.:-]*\z")), "name");
        Need(names.SequenceEqual(names.Distinct().Order(StringComparer.Ordinal)), "sorted names");
        return names;
    }

    static JArray Arr(JToken? t) => t as JArray ?? throw new Reject("array expected");
    static string Str(JToken? t) => t?.Type == JTokenType.String ? (string)t! : throw new Reject("string expected");
    static void Need(bool ok, string why) { if (!ok) throw new Reject(why); }
}
