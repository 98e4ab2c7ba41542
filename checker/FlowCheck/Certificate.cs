using Newtonsoft.Json.Linq;

namespace FlowCheck;

/// <summary>Checks a whole certificate: header, embedded graph and hash, then the verdict's proof.</summary>
public static class Certificate
{
    static readonly string[] Keys = ["format", "version", "flow", "field", "graphSha256", "graph",
        "verdict", "depth", "rounds", "corrections", "obstruction", "producer"];

    /// <summary>Returns the report lines (the first starts with "valid:") or throws <see cref="InvalidCertificate"/>.</summary>
    public static List<string> Check(JToken document, OpenGraph? fileGraph, string? graphPath = null)
    {
        var root = Json.Object(document, "certificate", Keys);
        var format = Json.String(root["format"], "format");
        if (format != "flowcert-certificate") throw new InvalidCertificate($"unknown format \"{format}\"");
        var version = Json.Integer(root["version"], "version");
        if (version != 1 && version != 2) throw new InvalidCertificate($"unknown version {version} (this checker knows versions 1 and 2)");
        var flow = Json.String(root["flow"], "flow");
        if (flow is not ("general" or "causal" or "pauli")) throw new InvalidCertificate($"unknown flow \"{flow}\" (expected general, causal or pauli)");
        var field = Field.Parse(Json.String(root["field"], "field"));
        if (root["producer"] is { } producer)
            foreach (var key in new[] { "name", "version" })
                Json.String(Json.Object(producer, "producer", "name", "version")[key], $"producer.{key}");
        var graph = EmbeddedGraph.Read(root["graph"]);
        var claimed = Json.String(root["graphSha256"], "graphSha256");
        var hash = graph.Sha256();
        if (claimed != hash) throw new InvalidCertificate($"graphSha256 is {claimed} but the embedded graph hashes to {hash}");
        if (fileGraph is not null && fileGraph.Sha256() != hash)
            throw new InvalidCertificate($"graph file {graphPath} (sha256 {fileGraph.Sha256()}) differs from the embedded graph (sha256 {hash})");
        var labelled = graph.Labels.Count > 0 || flow == "pauli";
        if (labelled != (version == 2))
            throw new InvalidCertificate($"version {version}: version 2 is exactly for graphs with a label other than XY and for pauli flow");
        if (labelled) Labelled.CheckHeader(graph, field, flow);
        var g = new FieldGraph(graph, field);
        var verdict = Json.String(root["verdict"], "verdict");
        var causal = flow == "causal";
        string proven;
        if (verdict == "flow")
        {
            Absent(root, verdict, "obstruction");
            proven = $"{flow} flow over {field.Name}, depth {new FlowClaim(g, causal, labelled ? graph : null).Check(root)}";
        }
        else if (verdict == "noflow")
        {
            Absent(root, verdict, "depth", "rounds", "corrections");
            proven = $"no {flow} flow over {field.Name}, blocked set of {new NoFlowClaim(g, causal, labelled ? graph : null).Check(root)} nodes";
        }
        else throw new InvalidCertificate($"unknown verdict \"{verdict}\" (expected flow or noflow)");
        var lines = new List<string> { $"valid: {proven}, graph sha256 {hash}" };
        if (fileGraph is not null) lines.Add($"note: graph file {graphPath} matches the embedded graph");
        lines.AddRange(g.Vanished.Select(e => $"note: edge {e.U} {e.V} (weight {e.W}) vanishes in {field.Name}"));
        return lines;
    }

    static void Absent(JObject root, string verdict, params string[] keys)
    {
        foreach (var key in keys.Where(k => root[k] is not null))
            throw new InvalidCertificate($"key \"{key}\" does not belong to a \"{verdict}\" certificate");
    }
}
