using Newtonsoft.Json;
using Newtonsoft.Json.Linq;
using NJsonSchema;
using Xunit.Abstractions;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>Version-2 certificates (measurement labels, Pauli flow; flows.md section 9): the solver's are
/// accepted by flowcheck and by <see cref="LabelledOracle"/>; corrupted ones are judged alike by both;
/// hand-written ones break each rule with its message.</summary>
public class LabelledTests(ITestOutputHelper output)
{
    static List<SolverCertificates.Produced> Produced() => SolverCertificates.Labelled(graphs: 160, seed: 909).ToList();

    [Fact]
    public async Task SolverLabelledCertificatesAreAcceptedByCheckerOracleAndSchema()
    {
        var schema = await JsonSchema.FromFileAsync(Path.Combine(AppContext.BaseDirectory, "certificate.schema.json"));
        var all = Produced();
        var kinds = new HashSet<string>();
        foreach (var p in all)
        {
            var r = CheckText(p.Json, p.Ograph);
            var cert = JObject.Parse(p.Json);
            var oracle = LabelledOracle.Reason(cert);
            Assert.True(r.Code == 0 && oracle is null, $"{p.Name}: checker \"{r.First}{r.Err}\", oracle \"{oracle ?? "valid"}\"\n{p.Ograph}\n{p.Json}");
            Assert.Contains("note: graph file ", r.Out);
            Assert.Empty(schema.Validate(p.Json));
            kinds.Add($"{cert["flow"]} {cert["verdict"]}");
        }
        Assert.Equal(["general flow", "general noflow", "pauli flow", "pauli noflow"], kinds.Order());
    }

    static readonly (string Name, bool NeverValid, Func<JObject, Random, bool> Apply)[] Corruptions =
    [
        ("toggle a node in a correction set", false, (c, rng) =>
        {
            if (c["corrections"] is not JObject cs || !cs.HasValues) return false;
            var v = (JObject)cs.Properties().ElementAt(rng.Next(cs.Count)).Value;
            var nodes = c["graph"]!["nodes"]!.Select(t => (string)t!).ToList();
            var u = nodes[rng.Next(nodes.Count)];
            if (v[u] is null) v[u] = "1"; else v.Remove(u);
            var sorted = v.Properties().OrderBy(p => p.Name, StringComparer.Ordinal).ToList();
            v.RemoveAll();
            foreach (var p in sorted) v.Add(p);
            return true;
        }),
        ("move a node to another round", false, (c, rng) =>
        {
            if (c["rounds"] is not JArray rounds || rounds.Count < 2) return false;
            var from = (JArray)rounds[rng.Next(rounds.Count)];
            var node = from[rng.Next(from.Count)];
            from.Remove(node);
            var to = (JArray)rounds[rng.Next(rounds.Count)];
            var list = to.Select(t => (string)t!).Append((string)node!).Distinct().Order(StringComparer.Ordinal).ToList();
            to.RemoveAll();
            foreach (var x in list) to.Add(x);
            return true;
        }),
        ("toggle the self row of a witness", true, (c, rng) =>
        {
            if (c["obstruction"]?["witnesses"] is not JObject ws) return false;
            var w = ws.Properties().ElementAt(rng.Next(ws.Count)).Value;
            w["self"] = !(bool)w["self"]!;
            return true;
        }),
        ("toggle a row of a witness", false, (c, rng) =>
        {
            if (c["obstruction"]?["witnesses"] is not JObject ws) return false;
            var w = ws.Properties().ElementAt(rng.Next(ws.Count)).Value;
            var blocked = c["obstruction"]!["blocked"]!.Select(t => (string)t!).ToList();
            var rows = w["rows"]!.Select(t => (string)t!).ToHashSet();
            var r = blocked[rng.Next(blocked.Count)];
            if (!rows.Remove(r)) rows.Add(r);
            w["rows"] = new JArray(rows.Order(StringComparer.Ordinal));
            return true;
        }),
        ("drop a witness", true, (c, rng) =>
        {
            if (c["obstruction"]?["witnesses"] is not JObject ws || ws.Count < 1) return false;
            ws.Remove(ws.Properties().ElementAt(rng.Next(ws.Count)).Name);
            return true;
        }),
        ("change a label", false, (c, rng) =>
        {
            var g = (JObject)c["graph"]!;
            var outputs = g["outputs"]!.Select(t => (string)t!).ToHashSet();
            var measured = g["nodes"]!.Select(t => (string)t!).Where(v => !outputs.Contains(v)).ToList();
            if (measured.Count == 0) return false;
            var labels = g["labels"] as JObject ?? new JObject();
            var v = measured[rng.Next(measured.Count)];
            var pick = new[] { "XY", "XZ", "YZ", "X", "Y", "Z" }[rng.Next(6)];
            var all = labels.Properties().ToDictionary(p => p.Name, p => (string)p.Value!);
            if (pick == "XY") all.Remove(v); else all[v] = pick;
            g.Remove("labels");
            if (all.Count > 0) g["labels"] = new JObject(all.OrderBy(kv => kv.Key, StringComparer.Ordinal).Select(kv => new JProperty(kv.Key, kv.Value)));
            return true;
        }),
        ("swap the verdict with a made-up proof", true, (c, rng) =>
        {
            var outputs = c["graph"]!["outputs"]!.Select(t => (string)t!).ToHashSet();
            var measured = c["graph"]!["nodes"]!.Select(t => (string)t!).Where(v => !outputs.Contains(v)).ToList();
            if (measured.Count == 0) return false;
            if ((string)c["verdict"]! == "flow")
            {
                foreach (var k in new[] { "depth", "rounds", "corrections" }) c.Remove(k);
                c["verdict"] = "noflow";
                c["obstruction"] = new JObject(new JProperty("blocked", new JArray(measured)),
                    new JProperty("witnesses", new JObject(measured.Select(v => new JProperty(v, new JObject(
                        new JProperty("rows", new JArray(rng.Next(2) == 0 ? [v] : Array.Empty<string>())), new JProperty("self", rng.Next(2) == 0)))))));
            }
            else
            {
                c.Remove("obstruction");
                c["verdict"] = "flow";
                c["depth"] = 1;
                c["rounds"] = new JArray(new JArray(measured));
                c["corrections"] = new JObject(measured.Select(v => new JProperty(v, new JObject())));
            }
            return true;
        }),
    ];

    [Fact]
    public void CorruptedLabelledCertificatesAreJudgedLikeTheOracle()
    {
        var seeds = Produced().Select(p => JObject.Parse(p.Json)).ToList();
        var rng = new Random(99);
        var rejected = new Dictionary<string, int>();
        var valid = new Dictionary<string, int>();
        var failures = new List<string>();
        for (int attempt = 0; attempt < 3000; attempt++)
        {
            var c = (JObject)seeds[rng.Next(seeds.Count)].DeepClone();
            var (name, neverValid, apply) = Corruptions[rng.Next(Corruptions.Length)];
            if (!apply(c, rng)) continue;
            Rehash(c);
            var text = c.ToString(Formatting.Indented);
            var result = CheckText(text);
            var oracle = LabelledOracle.Reason(c);
            if ((result.Code == 0) != (oracle is null))
            {
                if (failures.Count < 5) failures.Add($"{name}: checker \"{result.First}{result.Err}\", oracle \"{oracle ?? "valid"}\"\n{text}");
                continue;
            }
            if (oracle is null) valid[name] = valid.GetValueOrDefault(name) + 1;
            else rejected[name] = rejected.GetValueOrDefault(name) + 1;
        }
        foreach (var (name, _, _) in Corruptions)
            output.WriteLine($"{rejected.GetValueOrDefault(name),5} rejected, {valid.GetValueOrDefault(name),4} valid after all: {name}");
        Assert.True(failures.Count == 0, string.Join("\n\n", failures));
        Assert.True(rejected.Values.Sum() >= 1500, $"only {rejected.Values.Sum()} rejected");
        foreach (var (name, neverValid, _) in Corruptions)
        {
            Assert.True(rejected.GetValueOrDefault(name) > 0, $"\"{name}\" never rejected");
            if (neverValid) Assert.True(valid.GetValueOrDefault(name) == 0, $"\"{name}\" gave a valid certificate");
        }
    }

    /// <summary>Path i - a - o: i input measured X, a measured X, o output. Hand computed from flows.md 9.3:
    /// p(i) = {a} (a is X, so it may sit in the same round; Odd = {i, o}), p(a) = {o} (Odd = {a}).</summary>
    const string PauliWire = "{'inputs':['i'],'outputs':['o'],'nodes':['a','i','o'],'edges':[['a','i','1'],['a','o','1']],'labels':{'a':'X','i':'X'}}";

    static JObject V2(string flow, string field, string graph, string body)
    {
        var c = Cert(flow, field, graph, body);
        c["version"] = 2;
        return c;
    }

    static JObject PauliWireFlow() => V2("pauli", "F2", PauliWire, "'verdict':'flow','depth':1,'rounds':[['a','i']],'corrections':{'a':{'o':'1'},'i':{'a':'1'}}");

    [Fact]
    public void HandWrittenPauliFlowIsValidAndEachRuleHasItsMessage()
    {
        AssertValid(PauliWireFlow(), "valid: Pauli flow over F2, depth 1");
        // P1: a labelled XY may not sit in p(i) unless later
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"] = JObject.Parse("{'i':'X'}")), "node i (round 1): a (labelled XY) is in p_i but not later");
        // P9 at a labelled Z: a must be in p(a)
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"]!["a"] = "Z"), "node a (round 1): labelled Z, but a in p_a is False");
        AssertInvalid(Edit(PauliWireFlow(), c => c["corrections"]!["a"] = new JObject()), "node a (round 1): labelled X", "Odd(p_a) is False");
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"]!["a"] = "Y"), "a is labelled Y and not later");
        AssertInvalid(Edit(PauliWireFlow(), c => c["corrections"]!["i"] = JObject.Parse("{'a':'1','o':'1'}")), "is in Odd(p_i) but not later");
        AssertInvalid(Edit(PauliWireFlow(), c => c["corrections"]!["i"] = JObject.Parse("{'a':'1','i':'1'}")), "correction on input i");
    }

    [Fact]
    public void HeaderRulesForLabels()
    {
        AssertInvalid(Edit(PauliWireFlow(), c => c["version"] = 1), "version 2 is exactly for graphs with a label");
        AssertInvalid(Edit(PauliWireFlow(), c => c["field"] = "F3"), "labels and Pauli flow are defined for F2 only");
        AssertInvalid(Edit(PauliWireFlow(), c => c["flow"] = "causal"), "causal flow is XY-only");
        AssertInvalid(Edit(PauliWireFlow(), c => c["flow"] = "general"), "generalized flow takes the planes");
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"]!["a"] = "XY"), "is not one of XZ, YZ, X, Y, Z");
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"] = JObject.Parse("{'o':'X'}")), "graph.labels: o is not a measured node");
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"] = new JObject()), "graph.labels is empty");
        AssertInvalid(Edit(PauliWireFlow(), c => c["graph"]!["labels"]!["a"] = "Z", rehash: false), "graphSha256");
        var allXyPauli = Edit(PauliWireFlow(), c => ((JObject)c["graph"]!).Remove("labels"));
        AssertInvalid(allXyPauli, "node i (round 1)"); // version 2 is right for pauli; the X conditions no longer hold
    }

    [Fact]
    public void PerNodeWitnessesOfAbsence()
    {
        // i - a - b - o with i an input, a labelled XZ, b labelled Y: U = {a, i} is blocked (hand computed with
        // the systems of docs/algorithms.md: i's row has no unknown; for a, i's row plus a's self row cancel).
        const string graph = "{'inputs':['i'],'outputs':['o'],'nodes':['a','b','i','o'],'edges':[['a','b','1'],['a','i','1'],['b','o','1']],'labels':{'a':'XZ','b':'Y'}}";
        JObject Proof(string witnesses) => V2("pauli", "F2", graph, $"'verdict':'noflow','obstruction':{{'blocked':['a','i'],'witnesses':{witnesses}}}");
        AssertValid(Proof("{'a':{'rows':['i'],'self':true},'i':{'rows':['i'],'self':false}}"), "valid: no Pauli flow over F2, blocked set of 2 nodes");
        AssertInvalid(Proof("{'a':{'rows':['i'],'self':false},'i':{'rows':['i'],'self':false}}"), "obstruction.witnesses.a: (y^T M)(a) = 1");
        AssertInvalid(Proof("{'a':{'rows':['a','i'],'self':true},'i':{'rows':['i'],'self':false}}"), "obstruction.witnesses.a: (y^T M)(b) = 1");
        AssertInvalid(Proof("{'a':{'rows':['i'],'self':true},'i':{'rows':[],'self':false}}"), "y^T b = 0, not 1");
        AssertInvalid(Proof("{'a':{'rows':['i'],'self':true},'i':{'rows':['i'],'self':true}}"), "i is labelled XY and has no self row");
        AssertInvalid(Proof("{'a':{'rows':['i'],'self':true}}"), "blocked node i has no witness");
        AssertInvalid(Proof("{'a':{'rows':['i'],'self':true},'b':{'rows':[],'self':false},'i':{'rows':['i'],'self':false}}"), "b is not in the blocked set");
        AssertInvalid(Proof("{'a':{'rows':['b'],'self':true},'i':{'rows':['i'],'self':false}}"), "b has no row in the system of a");
    }

    [Fact]
    public void GraphFileMeasureLines()
    {
        var ograph = "input i\noutput o\nedge i a\nedge a o\nmeasure a X\nmeasure i X  # both Pauli X\n";
        var ok = CheckText(PauliWireFlow().ToString(), ograph);
        Assert.Equal(0, ok.Code);
        Assert.Contains("matches the embedded graph", ok.Out);
        var different = CheckText(PauliWireFlow().ToString(), ograph.Replace("measure i X", "measure i Y"));
        AssertInvalid(different, "differs from the embedded graph");
        foreach (var (text, fragment) in new[]
                 {
                     ("input i\noutput o\nedge i o\nmeasure o X\n", ":4:9: label on output o"),
                     ("input i\noutput o\nedge i o\nmeasure i W\n", ":4:11: unknown label \"W\""),
                     ("input i\noutput o\nedge i o\nmeasure i X\nmeasure i Y\n", ":5:9: i has two labels (lines 4 and 5)"),
                     ("input i\noutput o\nedge i o\nmeasure q X\n", ":4:9: unknown node q"),
                     ("input i\noutput o\nedge i o\nmeasure i\n", ":4:1: wrong number of tokens"),
                 })
        {
            var r = CheckText(PauliWireFlow().ToString(), text);
            Assert.Equal(2, r.Code);
            Assert.Contains(fragment, r.Err);
        }
    }
}
