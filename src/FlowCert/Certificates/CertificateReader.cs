using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace FlowCert.Certificates;

/// <summary>A certificate that cannot be read; carries the file and, where known, the line and column.</summary>
public sealed class CertificateFormatException(string file, string problem, int line = 0, int column = 0)
    : Exception(line > 0 ? $"{file}:{line}:{column}: {problem}" : $"{file}: {problem}")
{
    public string File { get; } = file;
}

/// <summary>
/// Reads a certificate back into a <see cref="FlowResult"/> (for the schedule, simulation and drawing).
/// It checks the shape, not the mathematics: that is the independent checker's job.
/// </summary>
public static class CertificateReader
{
    public static FlowResult ReadFile(string path) => Parse(File.ReadAllText(path), path);

    public static FlowResult Parse(string text, string fileName)
    {
        JObject root;
        try
        {
            using var reader = new JsonTextReader(new StringReader(text)) { DateParseHandling = DateParseHandling.None, FloatParseHandling = FloatParseHandling.Decimal };
            root = JObject.Load(reader, new JsonLoadSettings { DuplicatePropertyNameHandling = DuplicatePropertyNameHandling.Error });
        }
        catch (JsonReaderException e) { throw new CertificateFormatException(fileName, e.Message.Split(" Path")[0], e.LineNumber, e.LinePosition); }
        CertificateFormatException Bad(string problem) => new(fileName, problem);
        string Str(JToken? t, string what) => t?.Type == JTokenType.String ? (string)t! : throw Bad($"{what} must be a string");
        string[] Names(JToken? t, string what) => t is JArray a ? a.Select(x => Str(x, what)).ToArray() : throw Bad($"{what} must be a list of names");

        if (Str(root["format"], "format") != CertificateWriter.Format) throw Bad($"unknown format '{root["format"]}'");
        if (root["version"]?.Type != JTokenType.Integer || (int)root["version"]! != CertificateWriter.Version) throw Bad($"unknown version '{root["version"]}'");
        var kind = Str(root["flow"], "flow") switch
        {
            "general" => FlowKind.General,
            "causal" => FlowKind.Causal,
            var other => throw Bad($"unknown flow '{other}'"),
        };
        var fieldName = Str(root["field"], "field");
        FieldSpec field;
        try { field = fieldName == "Q" ? FieldSpec.Rationals : fieldName.StartsWith('F') ? FieldSpec.Parse(fieldName) : throw new FieldSpecException(""); }
        catch (FieldSpecException) { throw Bad($"unknown field '{fieldName}'"); }

        var gj = root["graph"] as JObject ?? throw Bad("graph must be an object");
        var edges = new List<(string, string, Rational)>();
        foreach (var e in gj["edges"] as JArray ?? throw Bad("graph.edges must be a list"))
        {
            if (e is not JArray { Count: 3 } triple) throw Bad("every edge must be [u, v, weight]");
            if (!Rational.TryParse(Str(triple[2], "edge weight"), out var w)) throw Bad($"bad edge weight '{triple[2]}'");
            edges.Add((Str(triple[0], "edge end"), Str(triple[1], "edge end"), w));
        }
        OpenGraph graph;
        try { graph = new OpenGraph(Names(gj["nodes"], "graph.nodes"), edges, Names(gj["inputs"], "graph.inputs"), Names(gj["outputs"], "graph.outputs")); }
        catch (ArgumentException e) { throw Bad("graph: " + e.Message); }
        int Node(string name) => graph.Contains(name) ? graph.IndexOf(name) : throw Bad($"unknown node '{name}'");
        NodeVector Vector(JToken? t, string what)
        {
            if (t is not JObject o) throw Bad($"{what} must be an object");
            return new NodeVector(o.Properties().Select(p => (Node(p.Name), Str(p.Value, what))).OrderBy(x => x.Item1).ToList());
        }

        var verdict = Str(root["verdict"], "verdict");
        var rounds = new List<IReadOnlyList<int>>();
        var corrections = new Dictionary<int, NodeVector>();
        BlockedSet? obstruction = null;
        switch (verdict)
        {
            case "flow":
                foreach (var round in root["rounds"] as JArray ?? throw Bad("rounds must be a list"))
                    rounds.Add(Names(round, "round").Select(Node).ToArray());
                foreach (var p in (root["corrections"] as JObject ?? throw Bad("corrections must be an object")).Properties())
                    corrections[Node(p.Name)] = Vector(p.Value, $"correction of {p.Name}");
                break;
            case "noflow":
                var ob = root["obstruction"] as JObject ?? throw Bad("obstruction must be an object");
                var witnesses = (ob["witnesses"] as JArray ?? []).Select(w => Vector(w, "witness")).ToList();
                obstruction = new BlockedSet(Names(ob["blocked"], "blocked").Select(Node).ToArray(), witnesses);
                break;
            default:
                throw Bad($"unknown verdict '{verdict}'");
        }
        return new FlowResult
        {
            Graph = graph, Field = field, Kind = kind, Rounds = rounds, Corrections = corrections,
            Obstruction = obstruction, VanishedEdges = VanishedIn(graph, field),
        };
    }

    private static IReadOnlyList<WeightedEdge> VanishedIn(OpenGraph g, FieldSpec field)
        => field.IsRationals ? [] : g.Edges.Where(e => e.Weight.Numerator % field.Prime == 0).ToList();
}
