using FlowCert.Graphs.Formats;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Cli;

/// <summary>The short human-readable account of one solve.</summary>
public static class Summary
{
    private const int MaxRoundsShown = 12, MaxNodesShown = 10;

    /// <summary>The "verdict" ("flow" or "noflow") and "depth" (null without a flow) members of the JSON that solve and primes print.</summary>
    public static void WriteVerdictJson(Newtonsoft.Json.JsonWriter w, FlowResult r)
    {
        w.WritePropertyName("verdict"); w.WriteValue(r.HasFlow ? "flow" : "noflow");
        w.WritePropertyName("depth"); if (r.HasFlow) w.WriteValue(r.Depth); else w.WriteNull();
    }

    public static void Write(TextWriter o, string source, FlowResult r, string? certificatePath)
    {
        var g = r.Graph;
        string Names(IEnumerable<int> nodes)
        {
            var list = nodes.OrderBy(v => g.Names[v], NaturalNameOrder.Instance).ToList();
            var shown = string.Join(" ", list.Take(MaxNodesShown).Select(v => g.Names[v]));
            return list.Count > MaxNodesShown ? $"{shown} ... ({list.Count} nodes)" : shown;
        }
        o.WriteLine($"graph     {Escaped.Of(source)}: {Counted.Of(g.NodeCount, "node")}, {Counted.Of(g.Edges.Count, "edge")}, {Counted.Of(g.Inputs.Count, "input")}, {Counted.Of(g.Outputs.Count, "output")}, {g.NodeCount - g.Outputs.Count} measured");
        o.WriteLine($"field     {r.Field.Name}    flow: {FlowKinds.Name(r.Kind)}");
        if (g.HasLabels)
            o.WriteLine("labels    " + string.Join(", ", MeasurementLabels.All.Skip(1)
                .Select(l => (l, n: g.Labels.Values.Count(x => x == l))).Where(t => t.n > 0).Select(t => $"{t.n} {MeasurementLabels.Name(t.l)}")) + ", the rest XY");
        if (r.VanishedEdges.Count > 0)
            Terminal.Warn($"{source}: {VanishingEdges.Warning(g, r.Field, r.VanishedEdges)}");
        if (r.Obstruction is { } blocked)
        {
            o.WriteLine($"verdict   NO FLOW: blocked set of {Counted.Of(blocked.Nodes.Count, "node")}: {Names(blocked.Nodes)}");
            if (blocked.NodeWitnesses is { } perNode) o.WriteLine($"          {Counted.Of(perNode.Count, "witness", "witnesses")}, one per node, {(perNode.Count == 1 ? "proves" : "prove")} no node of it can be corrected (measurement labels)");
            else if (r.Kind == FlowKind.General) o.WriteLine($"          {Counted.Of(blocked.Witnesses.Count, "left-kernel witness", "left-kernel witnesses")} {(blocked.Witnesses.Count == 1 ? "proves" : "prove")} no node of it can be corrected");
            else o.WriteLine("          every possible corrector touches zero or at least two of its nodes");
        }
        else
        {
            o.WriteLine($"verdict   flow of minimum depth {r.Depth}");
            for (int i = 0; i < Math.Min(r.Depth, MaxRoundsShown); i++)
                o.WriteLine($"round {i + 1,-3} {Names(r.Rounds[i])}");
            if (r.Depth > MaxRoundsShown) o.WriteLine($"          ... {r.Depth - MaxRoundsShown} more rounds in the certificate");
        }
        o.WriteLine(certificatePath is null ? "certificate not written (use --out FILE)" : $"certificate {Escaped.Of(certificatePath)}");
    }
}
