namespace FlowCheck;

/// <summary>The embedded graph, compact: node names sorted ordinally (a node is its rank in that order),
/// roles, and edges as pairs of ranks with an index into the distinct weights.</summary>
public sealed record Graph(string[] Names, Dictionary<string, int> Index, bool[] Input, bool[] Output)
{
    public List<(int U, int V, int W)> Edges { get; } = [];
    public List<string> WeightText { get; } = [];
    public List<Rational> Weights { get; } = [];
    /// <summary>Labels other than XY (flows.md section 9), by rank, in rank order.</summary>
    public SortedDictionary<int, string> Labels { get; } = [];
    public string Label(int v) => Labels.GetValueOrDefault(v, "XY");

    public string Sha256()
    {
        var touched = new bool[Names.Length];
        foreach (var (u, v, _) in Edges) touched[u] = touched[v] = true;
        IEnumerable<string> Where(Func<int, bool> keep) => Enumerable.Range(0, Names.Length).Where(keep).Select(i => Names[i]);
        return CanonicalForm.Sha256(CanonicalForm.Lines(Where(i => Input[i]), Where(i => Output[i]), Where(i => !touched[i]),
            Edges.Select(e => (Names[e.U], Names[e.V], WeightText[e.W])), Labels.Select(l => KeyValuePair.Create(Names[l.Key], l.Value))));
    }
}

/// <summary>Reads the certificate's "graph" object, requiring exactly the canonical shape of docs/formats.md.</summary>
public static class EmbeddedGraph
{
    public static Graph Read(Json json)
    {
        json.Known("graph", "graph", "inputs", "outputs", "nodes", "edges", "labels");
        var nodes = Names(json, "nodes");
        var index = new Dictionary<string, int>(nodes.Count, StringComparer.Ordinal);
        for (var i = 0; i < nodes.Count; i++) index[nodes[i]] = i;
        var g = new Graph([.. nodes], index, new bool[nodes.Count], new bool[nodes.Count]);
        foreach (var (key, role) in new[] { ("inputs", g.Input), ("outputs", g.Output) })
            foreach (var n in Names(json, key))
                role[index.TryGetValue(n, out var i) ? i : throw new InvalidCertificate($"graph: input/output {Json.Cut(n)} is not in graph.nodes")] = true;
        var weights = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var i in json.At("graph", "edges", "graph.edges").Items("graph.edges"))
        {
            var e = json.Strings("graph.edges", i);
            if (e.Count != 3) throw new InvalidCertificate($"graph.edges[{i}] must be [u, v, weight], found {e.Count} items");
            var (u, v) = (Json.Cut(e[0]), Json.Cut(e[1]));
            // sorted edges: u is usually the u of the edge before (no lookup)
            // Stryker disable once Conditional,Equality: without the guess the lookup finds the same node (only slower)
            var a = i > 0 && g.Names[g.Edges[^1].U] == e[0] ? g.Edges[^1].U : index.GetValueOrDefault(e[0], -1);
            if (a < 0 || !index.TryGetValue(e[1], out var b))
                throw new InvalidCertificate($"graph.edges[{i}]: {u} {v} names a node not in graph.nodes");
            if (a >= b) throw new InvalidCertificate($"graph.edges[{i}]: {u} {v} must have u < v");
            if (!weights.TryGetValue(e[2], out var w))
            {
                if (Rational.ParseCanonical(e[2]) is not { } r || r.Num.IsZero)
                    throw new InvalidCertificate($"graph.edges[{i}]: weight \"{Json.Cut(e[2])}\" of {u} {v} is not a canonical non-zero rational");
                weights[e[2]] = w = g.Weights.Count;
                g.Weights.Add(r); g.WeightText.Add(e[2]);
            }
            if (i > 0 && (g.Edges[^1].U, g.Edges[^1].V).CompareTo((a, b)) >= 0)
                throw new InvalidCertificate($"graph.edges[{i}]: {u} {v} after {g.Names[g.Edges[^1].U]} {g.Names[g.Edges[^1].V]} (must be sorted, no duplicates)");
            g.Edges.Add((a, b, w));
        }
        if (!json.Find("graph", "labels")) return g;
        foreach (var (n, label) in json.NodeMap("graph.labels").Select(n => (n, json.String("graph.labels", n))))
            g.Labels[index.TryGetValue(n, out var v) && !g.Output[v] ? v : throw new InvalidCertificate($"graph.labels: {Json.Cut(n)} is not a measured node")] =
                label != "XY" && OpenGraph.LabelNames.Contains(label) ? label : throw new InvalidCertificate($"graph.labels.{n}: \"{Json.Cut(label)}\" is not one of XZ, YZ, X, Y, Z (XY is not written)");
        return g.Labels.Count > 0 ? g : throw new InvalidCertificate("graph.labels is empty: it is written only when some node is not XY");
    }

    static List<string> Names(Json json, string key)
    {
        var what = "graph." + key;
        var names = json.At("graph", key, what).Strings(what);
        foreach (var n in names.Where(n => !OpenGraph.IsName(n)))
            throw new InvalidCertificate($"{what}: \"{Json.Cut(n)}\" is not a valid node name");
        Json.SortedUnique(names, what);
        return names;
    }
}
