using System.Numerics;
using System.Security.Cryptography;
using System.Text;
using Fractions;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Validation;

/// <summary>
/// A test-side verifier of certificates (docs/formats.md) that shares nothing with src/FlowCert: it
/// re-reads the JSON with Newtonsoft.Json, rebuilds A with the Fractions package (reducing into F_p by
/// itself), and checks flows.md sections 3 (generalized flow), 4 (causal flow) and 6 (blocked sets)
/// literally. Throws <see cref="CertificateRejectedException"/> with a reason on any failure.
/// </summary>
public static class CertificateVerifier
{
    private static long verified;
    /// <summary>How many certificates have passed in this test run.</summary>
    public static long VerifiedCount => Interlocked.Read(ref verified);

    private static readonly string[] TopKeysFlow = ["format", "version", "flow", "field", "graphSha256", "graph", "verdict", "depth", "rounds", "corrections", "producer"];
    private static readonly string[] TopKeysNoFlow = ["format", "version", "flow", "field", "graphSha256", "graph", "verdict", "obstruction", "producer"];

    /// <summary>What a verified certificate proves.</summary>
    public sealed record Verdict(string Flow, string Field, bool HasFlow, int Depth, string CanonicalGraph);

    /// <summary>Verifies the certificate text; returns what it proves.</summary>
    public static Verdict Verify(string json)
    {
        var root = Parse(json);
        var verdictText = Str(root, "verdict");
        var expectedKeys = verdictText switch
        {
            "flow" => TopKeysFlow,
            "noflow" => TopKeysNoFlow,
            _ => throw Reject($"unknown verdict '{verdictText}'"),
        };
        var keys = root.Properties().Select(p => p.Name).ToArray();
        if (!keys.SequenceEqual(expectedKeys))
            throw Reject($"keys [{string.Join(", ", keys)}] are not [{string.Join(", ", expectedKeys)}]");
        if (Str(root, "format") != "flowcert-certificate") throw Reject("unknown format");
        if (root["version"]!.Type != JTokenType.Integer || (long)root["version"]! != 1) throw Reject("unknown version");
        var flow = Str(root, "flow");
        if (flow is not ("general" or "causal")) throw Reject($"unknown flow '{flow}'");
        var fieldName = Str(root, "field");
        var field = ParseField(fieldName);

        var graph = ReadGraph(root["graph"] as JObject ?? throw Reject("graph is not an object"), field);
        var sha = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(graph.Canonical)));
        if (Str(root, "graphSha256") != sha) throw Reject($"graphSha256 is not the SHA-256 of the canonical graph ({sha})");
        var producer = root["producer"] as JObject ?? throw Reject("producer is not an object");
        if (producer["name"]?.Type != JTokenType.String || producer["version"]?.Type != JTokenType.String) throw Reject("producer needs name and version strings");

        int depth = -1;
        if (verdictText == "flow") depth = CheckFlow(root, graph, field, flow == "causal");
        else CheckObstruction(root["obstruction"] as JObject ?? throw Reject("obstruction is not an object"), graph, field, flow == "causal");
        Interlocked.Increment(ref verified);
        return new Verdict(flow, fieldName, verdictText == "flow", depth, graph.Canonical);
    }

    private static JObject Parse(string json)
    {
        using var reader = new JsonTextReader(new StringReader(json)) { DateParseHandling = DateParseHandling.None, FloatParseHandling = FloatParseHandling.Decimal };
        var settings = new JsonLoadSettings { DuplicatePropertyNameHandling = DuplicatePropertyNameHandling.Error };
        var token = JToken.ReadFrom(reader, settings);
        if (reader.Read()) throw Reject("text after the JSON object");
        return token as JObject ?? throw Reject("not a JSON object");
    }

    // ---------- the field ----------

    /// <summary>Q (Prime = 0) or F_p; elements are Fractions, integers in 0..p-1 for F_p.</summary>
    private sealed record Field(BigInteger Prime)
    {
        public bool IsQ => Prime.IsZero;
        public Fraction Reduce(Fraction x)
        {
            if (IsQ) return x.Reduce();
            var x2 = x.Reduce();
            var den = Mod(x2.Denominator);
            if (den.IsZero) throw Reject($"{x2} has no value in F{Prime}");
            return new Fraction(Mod(Mod(x2.Numerator) * BigInteger.ModPow(den, Prime - 2, Prime)));
        }
        private BigInteger Mod(BigInteger n) => ((n % Prime) + Prime) % Prime;
        public Fraction Add(Fraction a, Fraction b) => Reduce(a + b);
        public Fraction Mul(Fraction a, Fraction b) => Reduce(a * b);
        public string Name => IsQ ? "Q" : "F" + Prime;
    }

    private static Field ParseField(string name)
    {
        if (name == "Q") return new Field(BigInteger.Zero);
        if (name.Length < 2 || name[0] != 'F' || name[1] == '0' || !name[1..].All(char.IsAsciiDigit)) throw Reject($"unknown field '{name}'");
        var p = BigInteger.Parse(name[1..]);
        if (p < 2) throw Reject($"unknown field '{name}'");
        for (BigInteger d = 2; d * d <= p; d++) if ((p % d).IsZero) throw Reject($"field '{name}': {p} is not prime");
        return new Field(p);
    }

    /// <summary>A field element in certificate form: reduced rational over Q, residue 1..p-1 over F_p; never zero.</summary>
    private static Fraction Element(JToken? token, Field f, string where)
    {
        if (token?.Type != JTokenType.String) throw Reject($"{where}: field element must be a string");
        var text = (string)token!;
        if (f.IsQ)
        {
            if (!TryRational(text, out var q) || FormatRational(q) != text) throw Reject($"{where}: '{text}' is not a reduced rational");
            if (q.IsZero) throw Reject($"{where}: zero entries are never written");
            return q;
        }
        if (text.Length == 0 || !text.All(char.IsAsciiDigit) || (text.Length > 1 && text[0] == '0')) throw Reject($"{where}: '{text}' is not a residue");
        var r = BigInteger.Parse(text);
        if (r.IsZero || r >= f.Prime) throw Reject($"{where}: '{text}' is not a residue in 1..{f.Prime - 1}");
        return new Fraction(r);
    }

    internal static bool TryRational(string text, out Fraction value)
    {
        value = Fraction.Zero;
        var body = text.StartsWith('-') ? text[1..] : text;
        var parts = body.Split('/');
        if (parts.Length > 2 || parts.Any(p => p.Length == 0 || !p.All(char.IsAsciiDigit))) return false;
        var num = BigInteger.Parse(parts[0]);
        var den = parts.Length == 2 ? BigInteger.Parse(parts[1]) : BigInteger.One;
        if (den.IsZero) return false;
        value = new Fraction(text.StartsWith('-') ? -num : num, den).Reduce();
        return true;
    }

    internal static string FormatRational(Fraction q)
    {
        q = q.Reduce();
        var (n, d) = (q.Numerator, q.Denominator);
        if (d.Sign < 0) { n = -n; d = -d; }
        return d.IsOne ? n.ToString() : $"{n}/{d}";
    }

    // ---------- the graph ----------

    private sealed record Graph(string[] Nodes, Dictionary<string, int> Index, bool[] IsInput, bool[] IsOutput, Fraction[,] A, string Canonical)
    {
        public int N => Nodes.Length;
    }

    private static Graph ReadGraph(JObject g, Field f)
    {
        var keys = g.Properties().Select(p => p.Name).ToArray();
        if (!keys.SequenceEqual(["inputs", "outputs", "nodes", "edges"])) throw Reject("graph keys must be inputs, outputs, nodes, edges");
        var nodes = Names(g["nodes"], "graph.nodes");
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < nodes.Length; i++) index[nodes[i]] = i;
        var inputs = Names(g["inputs"], "graph.inputs");
        var outputs = Names(g["outputs"], "graph.outputs");
        var isInput = new bool[nodes.Length];
        var isOutput = new bool[nodes.Length];
        foreach (var x in inputs) isInput[Lookup(index, x, "graph.inputs")] = true;
        foreach (var x in outputs) isOutput[Lookup(index, x, "graph.outputs")] = true;
        var a = new Fraction[nodes.Length, nodes.Length];
        for (int i = 0; i < nodes.Length; i++) for (int j = 0; j < nodes.Length; j++) a[i, j] = Fraction.Zero;
        var edgeLines = new List<string>();
        var touched = new bool[nodes.Length];
        string? previous = null;
        foreach (var e in g["edges"] as JArray ?? throw Reject("graph.edges is not a list"))
        {
            if (e is not JArray t || t.Count != 3 || t.Any(x => x.Type != JTokenType.String)) throw Reject("an edge is [u, v, weight] with strings");
            var (u, v, w) = ((string)t[0]!, (string)t[1]!, (string)t[2]!);
            if (string.CompareOrdinal(u, v) >= 0) throw Reject($"edge {u} {v}: u must come before v");
            if (!TryRational(w, out var weight) || FormatRational(weight) != w || weight.IsZero) throw Reject($"edge {u} {v}: bad weight '{w}'");
            var key = u + "\u0000" + v;
            if (previous is not null && string.CompareOrdinal(previous, key) >= 0) throw Reject("edges are not sorted or repeat");
            previous = key;
            int iu = Lookup(index, u, "graph.edges"), iv = Lookup(index, v, "graph.edges");
            touched[iu] = touched[iv] = true;
            var inField = f.Reduce(weight); // rejects a weight whose denominator p divides
            a[iu, iv] = a[iv, iu] = inField;
            edgeLines.Add($"edge {u} {v} {w}\n");
        }
        var sb = new StringBuilder();
        sb.Append("input").Append(string.Concat(inputs.Select(x => " " + x))).Append('\n');
        sb.Append("output").Append(string.Concat(outputs.Select(x => " " + x))).Append('\n');
        for (int i = 0; i < nodes.Length; i++) if (!touched[i]) sb.Append("node ").Append(nodes[i]).Append('\n');
        foreach (var line in edgeLines) sb.Append(line);
        return new Graph(nodes, index, isInput, isOutput, a, sb.ToString());
    }

    /// <summary>A sorted list of distinct node names.</summary>
    private static string[] Names(JToken? token, string where)
    {
        if (token is not JArray list || list.Any(x => x.Type != JTokenType.String)) throw Reject($"{where} must be a list of names");
        var names = list.Select(x => (string)x!).ToArray();
        for (int i = 1; i < names.Length; i++)
            if (string.CompareOrdinal(names[i - 1], names[i]) >= 0) throw Reject($"{where} is not sorted or repeats a name");
        return names;
    }

    private static int Lookup(Dictionary<string, int> index, string name, string where)
        => index.TryGetValue(name, out var i) ? i : throw Reject($"{where}: unknown node '{name}'");

    // ---------- flows.md sections 3 and 4 ----------

    private static int CheckFlow(JObject root, Graph g, Field f, bool causal)
    {
        if (root["depth"]?.Type != JTokenType.Integer) throw Reject("depth is not an integer");
        int depth = (int)root["depth"]!;
        var rounds = root["rounds"] as JArray ?? throw Reject("rounds is not a list");
        if (rounds.Count != depth) throw Reject($"depth {depth} but {rounds.Count} rounds");
        var round = new int[g.N]; // 0 = not scheduled
        for (int k = 0; k < rounds.Count; k++)
        {
            var names = Names(rounds[k], $"rounds[{k}]");
            if (names.Length == 0) throw Reject($"round {k + 1} is empty");
            foreach (var x in names)
            {
                int v = Lookup(g.Index, x, "rounds");
                if (g.IsOutput[v]) throw Reject($"output {x} is scheduled for measurement");
                if (round[v] != 0) throw Reject($"{x} is scheduled twice");
                round[v] = k + 1;
            }
        }
        var measured = Enumerable.Range(0, g.N).Where(v => !g.IsOutput[v]).ToArray();
        foreach (var v in measured) if (round[v] == 0) throw Reject($"measured node {g.Nodes[v]} has no round");

        var corrections = root["corrections"] as JObject ?? throw Reject("corrections is not an object");
        var keys = corrections.Properties().Select(p => p.Name).ToArray();
        if (!keys.SequenceEqual(measured.Select(v => g.Nodes[v]))) throw Reject("corrections must have exactly the measured nodes as keys, sorted");
        foreach (var v in measured)
        {
            string name = g.Nodes[v];
            bool Later(int u) => g.IsOutput[u] || round[u] > round[v];
            var c = Vector(corrections[name], g, f, $"corrections.{name}");
            // section 3.1: support on non-inputs later than v
            foreach (var u in c.Keys)
            {
                if (g.IsInput[u]) throw Reject($"c_{name} uses input {g.Nodes[u]}");
                if (!Later(u)) throw Reject($"c_{name} uses {g.Nodes[u]}, which is not later than {name}");
            }
            var ac = new Fraction[g.N];
            for (int w = 0; w < g.N; w++)
            {
                var s = Fraction.Zero;
                foreach (var (u, cu) in c) s = f.Add(s, f.Mul(g.A[w, u], cu));
                ac[w] = s;
            }
            // section 3.2
            if (ac[v] != Fraction.One) throw Reject($"(A c_{name})({name}) = {FormatRational(ac[v])}, not 1");
            // section 3.3
            foreach (var w in measured)
                if (w != v && !ac[w].IsZero && !Later(w))
                    throw Reject($"(A c_{name})({g.Nodes[w]}) = {FormatRational(ac[w])} but {g.Nodes[w]} is not later than {name}");
            if (causal)
            {
                // section 4: c_v = e_f(v) / A[v][f(v)] with A[v][f(v)] != 0, f(v) later, measured neighbours of f(v) later
                if (c.Count != 1) throw Reject($"causal c_{name} must have exactly one entry");
                var (fv, value) = c.Single();
                if (g.A[v, fv].IsZero) throw Reject($"f({name}) = {g.Nodes[fv]} is not a neighbour of {name}");
                if (f.Mul(value, g.A[v, fv]) != Fraction.One) throw Reject($"c_{name} is not e_f(v) / A[v][f(v)]");
                for (int w = 0; w < g.N; w++)
                    if (w != v && !g.IsOutput[w] && !g.A[fv, w].IsZero && !Later(w))
                        throw Reject($"neighbour {g.Nodes[w]} of f({name}) = {g.Nodes[fv]} is not later than {name}");
            }
        }
        return depth;
    }

    /// <summary>A sparse vector object {node: element}, keys sorted, entries non-zero.</summary>
    private static Dictionary<int, Fraction> Vector(JToken? token, Graph g, Field f, string where)
    {
        if (token is not JObject o) throw Reject($"{where} is not an object");
        var result = new Dictionary<int, Fraction>();
        string? previous = null;
        foreach (var p in o.Properties())
        {
            if (previous is not null && string.CompareOrdinal(previous, p.Name) >= 0) throw Reject($"{where}: keys not sorted");
            previous = p.Name;
            result[Lookup(g.Index, p.Name, where)] = Element(p.Value, f, $"{where}.{p.Name}");
        }
        return result;
    }

    // ---------- flows.md section 6 ----------

    private static void CheckObstruction(JObject o, Graph g, Field f, bool causal)
    {
        var keys = o.Properties().Select(p => p.Name).ToArray();
        if (!keys.SequenceEqual(causal ? ["blocked"] : (string[])["blocked", "witnesses"])) throw Reject("obstruction keys are wrong for this flow kind");
        var blockedNames = Names(o["blocked"], "obstruction.blocked");
        if (blockedNames.Length == 0) throw Reject("the blocked set is empty");
        var inU = new bool[g.N];
        foreach (var x in blockedNames)
        {
            int v = Lookup(g.Index, x, "obstruction.blocked");
            if (g.IsOutput[v]) throw Reject($"blocked node {x} is an output, not measured");
            inU[v] = true;
        }
        // C = (V \ I) \ U
        var correctors = Enumerable.Range(0, g.N).Where(u => !g.IsInput[u] && !inU[u]).ToArray();
        if (causal)
        {
            foreach (var u in correctors)
            {
                int count = Enumerable.Range(0, g.N).Count(w => inU[w] && !g.A[u, w].IsZero);
                if (count == 1) throw Reject($"corrector {g.Nodes[u]} has exactly one neighbour in the blocked set");
            }
            return;
        }
        var witnesses = o["witnesses"] as JArray ?? throw Reject("witnesses is not a list");
        var covered = new bool[g.N];
        for (int k = 0; k < witnesses.Count; k++)
        {
            var y = Vector(witnesses[k], g, f, $"witnesses[{k}]");
            foreach (var w in y.Keys)
            {
                if (!inU[w]) throw Reject($"witness {k} has entry {g.Nodes[w]} outside the blocked set");
                covered[w] = true;
            }
            // y^T A[U, C] = 0
            foreach (var c in correctors)
            {
                var s = Fraction.Zero;
                foreach (var (w, yw) in y) s = f.Add(s, f.Mul(yw, g.A[w, c]));
                if (!s.IsZero) throw Reject($"witness {k} is not in the left kernel: column {g.Nodes[c]} gives {FormatRational(s)}");
            }
        }
        for (int v = 0; v < g.N; v++)
            if (inU[v] && !covered[v]) throw Reject($"the witnesses do not cover blocked node {g.Nodes[v]}");
    }

    private static string Str(JObject o, string key)
        => o[key]?.Type == JTokenType.String ? (string)o[key]! : throw Reject($"'{key}' is missing or not a string");

    private static CertificateRejectedException Reject(string why) => new(why);
}
