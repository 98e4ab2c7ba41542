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
        if (version != 1 && version != 2) throw new InvalidCertificate($"unknown version {Rational.Show(version)} (this checker knows versions 1 and 2)");
        var flow = json.At("", "flow", "flow").String("flow");
        if (flow is not ("general" or "causal" or "pauli")) throw new InvalidCertificate($"unknown flow \"{Json.Cut(flow)}\" (expected general, causal or pauli)");
        var field = Field.Parse(json.At("", "field", "field").String("field"));
        if (json.Find("", "producer")) json.Known("producer", "producer", "name", "version");
        foreach (var key in json.Find("", "producer") ? ["name", "version"] : new string[0]) json.At("producer", key, $"producer.{key}").String($"producer.{key}");
        var graph = EmbeddedGraph.Read(json);
        var claimed = json.At("", "graphSha256", "graphSha256").String("graphSha256");
        var hash = graph.Sha256();
        if (claimed != hash) throw new InvalidCertificate($"graphSha256 is {Json.Cut(claimed)} but the embedded graph hashes to {hash}");
        if (fileGraph is not null && fileGraph.Sha256() != hash)
            throw new InvalidCertificate($"graph file {graphPath} (sha256 {fileGraph.Sha256()}) differs from the embedded graph (sha256 {hash})");
        var labelled = graph.Labels.Count > 0 || flow == "pauli";
        if (labelled != (version == 2))
            throw new InvalidCertificate($"version {version}: version 2 is exactly for graphs with a label other than XY and for pauli flow");
        if (labelled && field.Name != "F2") throw new InvalidCertificate($"{flow} flow with labels over {field.Name}: labels and Pauli flow are defined for F2 only");
        if (labelled && flow == "causal") throw new InvalidCertificate("causal flow with labels: causal flow is XY-only");
        foreach (var (v, l) in graph.Labels.Where(kv => flow == "general" && kv.Value is "X" or "Y" or "Z"))
            throw new InvalidCertificate($"general flow with {graph.Names[v]} labelled {l}: generalized flow takes the planes XY, XZ, YZ only");
        var g = new FieldGraph(graph, field);
        var verdict = json.At("", "verdict", "verdict").String("verdict");
        var causal = flow == "causal";
        if (verdict is not ("flow" or "noflow")) throw new InvalidCertificate($"unknown verdict \"{Json.Cut(verdict)}\" (expected flow or noflow)");
        foreach (var key in (verdict == "flow" ? ["obstruction"] : new[] { "depth", "rounds", "corrections" }).Where(k => json.Find("", k)))
            throw new InvalidCertificate($"key \"{key}\" does not belong to a \"{verdict}\" certificate");
        var prose = flow switch { "general" => "generalized", "pauli" => "Pauli", _ => flow }; // the names used in prose
        var proven = verdict == "flow"
            ? $"{prose} flow over {field.Name}, depth {new FlowClaim(g, causal, progress, labelled).Check(json)}"
            : $"no {prose} flow over {field.Name}, blocked set of {(new NoFlowClaim(g, causal, progress, labelled).Check(json) is var n && n == 1 ? "1 node" : $"{n} nodes")}";
        var lines = new List<string> { $"valid: {proven}, graph sha256 {hash}" };
        if (fileGraph is not null) lines.Add($"note: graph file {graphPath} matches the embedded graph");
        lines.AddRange(g.Vanished.Select(e => $"note: edge {g.Name(e.U)} {g.Name(e.V)} (weight {Json.Cut(graph.WeightText[e.W])}) vanishes in {field.Name}"));
        return lines;
    }
}
