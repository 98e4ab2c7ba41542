using Newtonsoft.Json.Linq;

namespace FlowCheck;

/// <summary>Reads the certificate's "graph" object, requiring exactly the canonical shape of docs/formats.md.</summary>
public static class EmbeddedGraph
{
    public static OpenGraph Read(JToken? token)
    {
        var g = Json.Object(token, "graph", "inputs", "outputs", "nodes", "edges", "labels");
        var nodes = Names(g["nodes"], "graph.nodes");
        var known = nodes.ToHashSet();
        var inputs = Names(g["inputs"], "graph.inputs");
        var outputs = Names(g["outputs"], "graph.outputs");
        foreach (var n in inputs.Concat(outputs).Where(n => !known.Contains(n)))
            throw new InvalidCertificate($"graph: input/output {n} is not in graph.nodes");
        var edges = new List<Edge>();
        var list = Json.Array(g["edges"], "graph.edges");
        for (var i = 0; i < list.Count; i++)
        {
            var e = Json.Strings(list[i], $"graph.edges[{i}]");
            if (e.Count != 3) throw new InvalidCertificate($"graph.edges[{i}] must be [u, v, weight], found {e.Count} items");
            var (u, v) = (e[0], e[1]);
            if (!known.Contains(u) || !known.Contains(v)) throw new InvalidCertificate($"graph.edges[{i}]: {u} {v} names a node not in graph.nodes");
            if (string.CompareOrdinal(u, v) >= 0) throw new InvalidCertificate($"graph.edges[{i}]: {u} {v} must have u < v");
            if (Rational.ParseCanonical(e[2]) is not { } w || w.Num.IsZero)
                throw new InvalidCertificate($"graph.edges[{i}]: weight \"{e[2]}\" of {u} {v} is not a canonical non-zero rational");
            if (i > 0 && Compare(edges[^1], u, v) >= 0)
                throw new InvalidCertificate($"graph.edges[{i}]: {u} {v} after {edges[^1].U} {edges[^1].V} (must be sorted, no duplicates)");
            edges.Add(new Edge(u, v, w));
        }
        var graph = new OpenGraph(inputs, outputs, nodes, edges);
        if (g["labels"] is null) return graph;
        var labels = Json.NodeMap(g["labels"], "graph.labels");
        if (!labels.HasValues) throw new InvalidCertificate("graph.labels is empty: it is written only when some node is not XY");
        foreach (var p in labels.Properties())
        {
            var label = Json.String(p.Value, $"graph.labels.{p.Name}");
            if (!known.Contains(p.Name) || outputs.Contains(p.Name))
                throw new InvalidCertificate($"graph.labels: {p.Name} is not a measured node");
            if (label == "XY" || !OpenGraph.LabelNames.Contains(label))
                throw new InvalidCertificate($"graph.labels.{p.Name}: \"{Json.Cut(label)}\" is not one of XZ, YZ, X, Y, Z (XY is not written)");
            graph.Labels[p.Name] = label;
        }
        return graph;
    }

    static int Compare(Edge before, string u, string v)
    {
        var byU = string.CompareOrdinal(before.U, u);
        return byU != 0 ? byU : string.CompareOrdinal(before.V, v);
    }

    static List<string> Names(JToken? token, string what)
    {
        var names = Json.Strings(token, what);
        foreach (var n in names.Where(n => !OpenGraph.IsName(n)))
            throw new InvalidCertificate($"{what}: \"{n}\" is not a valid node name");
        Json.SortedUnique(names, what);
        return names;
    }
}
