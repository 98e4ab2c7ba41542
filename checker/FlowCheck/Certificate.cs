namespace FlowCheck;

/// <summary>Checks a whole certificate: header, embedded graph and hash, then the verdict's proof.</summary>
public static class Certificate
{
    static readonly string[] Keys = ["format", "version", "flow", "field", "graphSha256", "graph",
        "verdict", "depth", "rounds", "corrections", "obstruction", "producer"];

    /// <summary>Returns the report lines (the first starts with "valid:") or throws <see cref="InvalidCertificate"/>.</summary>
    public static List<string> Check(Json json, OpenGraph? fileGraph, string? graphPath, Progress progress)
    {
        json.Validate();
        json.Known("", "certificate", Keys);
        var format = json.At("", "format", "format").String("format");
        if (format != "flowcert-certificate") throw new InvalidCertificate($"unknown format \"{Json.Cut(format)}\"");
        var version = json.At("", "version", "version").Integer("version");
        if (version != 1) throw new InvalidCertificate($"unknown version {Rational.Show(version)} (this checker knows version 1)");
        var flow = json.At("", "flow", "flow").String("flow");
        if (flow is not ("general" or "causal")) throw new InvalidCertificate($"unknown flow \"{Json.Cut(flow)}\" (expected general or causal)");
        var field = Field.Parse(json.At("", "field", "field").String("field"));
        if (json.Find("", "producer"))
        {
            json.Known("producer", "producer", "name", "version");
            foreach (var key in new[] { "name", "version" }) json.At("producer", key, $"producer.{key}").String($"producer.{key}");
        }
        var graph = EmbeddedGraph.Read(json);
        var claimed = json.At("", "graphSha256", "graphSha256").String("graphSha256");
        var hash = graph.Sha256();
        if (claimed != hash) throw new InvalidCertificate($"graphSha256 is {Json.Cut(claimed)} but the embedded graph hashes to {hash}");
        if (fileGraph is not null && fileGraph.Sha256() != hash)
            throw new InvalidCertificate($"graph file {graphPath} (sha256 {fileGraph.Sha256()}) differs from the embedded graph (sha256 {hash})");
        var g = new FieldGraph(graph, field);
        var verdict = json.At("", "verdict", "verdict").String("verdict");
        var causal = flow == "causal";
        if (verdict is not ("flow" or "noflow")) throw new InvalidCertificate($"unknown verdict \"{Json.Cut(verdict)}\" (expected flow or noflow)");
        foreach (var key in (verdict == "flow" ? ["obstruction"] : new[] { "depth", "rounds", "corrections" }).Where(k => json.Find("", k)))
            throw new InvalidCertificate($"key \"{key}\" does not belong to a \"{verdict}\" certificate");
        var proven = verdict == "flow"
            ? $"{flow} flow over {field.Name}, depth {new FlowClaim(g, causal, progress).Check(json)}"
            : $"no {flow} flow over {field.Name}, blocked set of {new NoFlowClaim(g, causal, progress).Check(json)} nodes";
        var lines = new List<string> { $"valid: {proven}, graph sha256 {hash}" };
        if (fileGraph is not null) lines.Add($"note: graph file {graphPath} matches the embedded graph");
        lines.AddRange(g.Vanished.Select(e => $"note: edge {g.Name(e.U)} {g.Name(e.V)} (weight {Json.Cut(graph.WeightText[e.W])}) vanishes in {field.Name}"));
        return lines;
    }
}
