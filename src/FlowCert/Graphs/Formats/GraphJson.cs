using System.Text;
using FlowCert.Algebra;
using Newtonsoft.Json.Linq;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// The JSON form of a graph: exactly a certificate's <c>"graph"</c> object (docs/formats.md) on its own,
/// with keys <c>inputs</c>, <c>outputs</c>, <c>nodes</c>, <c>edges</c>, two-space indentation and LF
/// line ends. The reader accepts the keys in any order and lists in any order, and checks what the
/// <c>.ograph</c> reader checks, naming the line and column of the first problem.
/// </summary>
public static class GraphJson
{
    /// <summary>The keys of the object, in the order written.</summary>
    public static readonly string[] Keys = ["inputs", "outputs", "nodes", "edges"];

    /// <summary>The graph as a JSON file: the object at indentation zero, then LF.</summary>
    public static string Write(OpenGraph g) => WriteObject(g, "") + "\n";

    /// <summary>
    /// The graph object as written inside a certificate and on its own: keys one level deeper than
    /// <paramref name="indent"/>, one edge a line, the closing brace at <paramref name="indent"/>.
    /// </summary>
    public static string WriteObject(OpenGraph g, string indent)
    {
        var text = new StringWriter { NewLine = "\n" };
        WriteObject(g, indent, text);
        return text.ToString();
    }

    /// <summary>Writes the graph object of <see cref="WriteObject(OpenGraph, string)"/> to <paramref name="w"/>, piece by piece.</summary>
    public static void WriteObject(OpenGraph g, string indent, TextWriter w)
    {
        void N(int v) => JsonSource.WriteQuoted(w, g.Names[v]);
        void List(string key, IEnumerable<int> nodes)
        {
            w.Write($"{indent}  \"{key}\": [");
            bool first = true;
            foreach (var v in nodes) { if (!first) w.Write(", "); N(v); first = false; }
            w.Write("],\n");
        }
        w.Write("{\n");
        List("inputs", g.SortedInputs);
        List("outputs", g.SortedOutputs);
        List("nodes", Enumerable.Range(0, g.NodeCount));
        w.Write($"{indent}  \"edges\": ");
        if (g.Edges.Count == 0) w.Write("[]");
        else
        {
            w.Write("[\n");
            for (int k = 0; k < g.Edges.Count; k++)
            {
                var e = g.Edges[k];
                if (k > 0) w.Write(",\n");
                w.Write(indent);
                w.Write("    [");
                N(e.U);
                w.Write(", ");
                N(e.V);
                w.Write(", ");
                JsonSource.WriteQuoted(w, e.Weight.ToString());
                w.Write(']');
            }
            w.Write($"\n{indent}  ]");
        }
        w.Write($"\n{indent}}}");
    }

    /// <summary>Reads a graph JSON file; errors name the file, line and column.</summary>
    public static OpenGraph Parse(string text, string fileName)
    {
        var source = JsonSource.Load(text, fileName);
        if (source.Root is not JObject obj) throw source.At(source.Root, "a graph JSON file holds one object with keys inputs, outputs, nodes and edges");
        return FromObject(obj, source);
    }

    /// <summary>Reads a graph object (on its own or inside a certificate).</summary>
    public static OpenGraph FromObject(JObject obj, JsonSource source)
    {
        GraphFormatException At(JToken t, string problem) => source.At(t, problem);
        foreach (var p in obj.Properties())
            if (!Keys.Contains(p.Name))
                throw At(p, $"unknown key '{p.Name}': a graph object has exactly inputs, outputs, nodes and edges");
        foreach (var k in Keys)
            if (obj[k] is null) throw At(obj, $"key '{k}' is missing: a graph object has exactly inputs, outputs, nodes and edges");

        JArray Array(JToken t, string what) => t as JArray ?? throw At(t, $"{what} must be a list");
        string Name(JToken t, string what)
        {
            if (t.Type != JTokenType.String) throw At(t, $"{what} must be a string");
            var s = (string)t!;
            if (!NodeNameRule.IsValid(s)) throw At(t, NodeNameRule.Problem(s));
            return s;
        }
        var nodes = new List<string>();
        var known = new HashSet<string>(StringComparer.Ordinal);
        foreach (var t in Array(obj["nodes"]!, "nodes"))
        {
            var n = Name(t, "a node");
            if (!known.Add(n)) throw At(t, $"node {n} is listed twice in nodes");
            nodes.Add(n);
        }
        string Known(JToken t, string what)
        {
            var n = Name(t, what);
            return known.Contains(n) ? n : throw At(t, $"unknown node {n} in {what}: list it in nodes");
        }
        List<string> Terminals(string key)
        {
            var list = new List<string>();
            var seen = new HashSet<string>(StringComparer.Ordinal);
            foreach (var t in Array(obj[key]!, key))
            {
                var n = Known(t, key);
                if (!seen.Add(n)) throw At(t, $"node {n} is listed twice in {key}");
                list.Add(n);
            }
            return list;
        }
        var inputs = Terminals("inputs");
        var outputs = Terminals("outputs");
        var edges = new List<(string, string, Rational)>();
        var pairs = new HashSet<(string, string)>();
        foreach (var t in Array(obj["edges"]!, "edges"))
        {
            if (t is not JArray { Count: 3 } triple) throw At(t, "an edge is [\"u\", \"v\", \"weight\"]");
            var (u, v) = (Known(triple[0], "an edge"), Known(triple[1], "an edge"));
            if (u == v) throw At(triple[1], $"self-loop on node {u}: a graph state has no edge from a node to itself");
            if (triple[2].Type != JTokenType.String || !Rational.TryParse((string)triple[2]!, out var w))
                throw At(triple[2], "bad weight: write a string holding an integer, a/b or a decimal such as \"0.25\"");
            if (w.IsZero) throw At(triple[2], $"weight of edge {u} {v} is zero: leave the edge out instead");
            if (!pairs.Add(string.CompareOrdinal(u, v) < 0 ? (u, v) : (v, u))) throw At(t, $"edge {u} {v} appears twice");
            edges.Add((u, v, w));
        }
        return new OpenGraph(nodes, edges, inputs, outputs);
    }
}
