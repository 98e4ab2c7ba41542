using System.Text;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using static FlowCert.Drawing.SvgPicture;

namespace FlowCert.Drawing;

/// <summary>
/// The picture of <see cref="SvgPicture"/> in Graphviz DOT, for users who lay out with Graphviz: the
/// same colours, inputs as boxes and outputs as double circles (<see cref="DotWriter.NodeShape"/>), a
/// flow's rounds as ranks from left to right with the outputs last, corrections as orange arrows and a
/// blocked set in red; the legend is the graph's label (it names the edges that vanish in the certificate's field).
/// </summary>
public static class DotPicture
{
    /// <summary>The DOT text of the graph with the result's flow or blocked set, if any, titled <paramref name="title"/>.</summary>
    public static string Write(OpenGraph g, FlowResult? result, string title)
    {
        var blocked = result?.Obstruction?.Nodes.ToHashSet() ?? [];
        var id = g.Names.Select(DotWriter.Id).ToArray();
        var s = new StringBuilder();
        s.Append("digraph flow_picture {\n");
        s.Append("  rankdir=LR;\n");
        s.Append($"  label={DotWriter.Id(title)[..^1]}\\n{DotWriter.Id(Legend(g, result))[1..]};\n"); // two lines: title, legend
        s.Append("  labelloc=b; fontname=\"DejaVu Sans\"; fontsize=11;\n");
        s.Append($"  node [shape=circle, style=filled, fillcolor=\"{MeasuredFill}\", color=\"{MeasuredStroke}\", fontname=\"DejaVu Sans\", fontsize=10];\n");
        s.Append("  edge [fontname=\"DejaVu Sans\", fontsize=9];\n");
        for (int v = 0; v < g.NodeCount; v++)
        {
            var attributes = new List<string>();
            if (DotWriter.NodeShape(g, v) is { } shape) attributes.Add(shape);
            if (blocked.Contains(v)) attributes.Add($"fillcolor=\"{BlockedFill}\", color=\"{BlockedStroke}\", penwidth=2.5");
            else if (g.Outputs.Contains(v)) attributes.Add($"fillcolor=\"{OutputFill}\", color=\"{OutputStroke}\"");
            s.Append("  ").Append(id[v]);
            if (attributes.Count > 0) s.Append(" [").Append(string.Join(", ", attributes)).Append(']');
            s.Append(";\n");
        }
        bool rounds = result is { HasFlow: true };
        if (rounds)
        {
            var columns = result!.Rounds.Select(r => r.ToList()).ToList();
            var outputs = g.SortedOutputs.ToList();
            if (outputs.Count > 0) columns.Add(outputs);
            for (int c = 0; c < columns.Count; c++)
                s.Append($"  subgraph column{c + 1} {{ rank=same; ").Append(string.Concat(columns[c].Select(v => id[v] + "; "))).Append("}\n");
            for (int c = 0; c + 1 < columns.Count; c++)
                s.Append($"  {id[columns[c][0]]} -> {id[columns[c + 1][0]]} [style=invis];\n");
        }
        foreach (var e in g.Edges)
        {
            s.Append($"  {id[e.U]} -> {id[e.V]} [dir=none, color=\"{EdgeColour}\"");
            if (rounds) s.Append(", constraint=false");
            if (e.Weight != Algebra.Rational.One) s.Append(", label=").Append(DotWriter.Id(e.Weight.ToString()));
            s.Append("];\n");
        }
        if (rounds)
            foreach (var (v, vector) in result!.Corrections.OrderBy(kv => kv.Key))
                foreach (var (u, value) in vector.Entries)
                {
                    s.Append($"  {id[v]} -> {id[u]} [color=\"{CorrectionColour}\", fontcolor=\"{CorrectionColour}\", constraint=false");
                    if (!value.IsOne) s.Append(", label=").Append(DotWriter.Id(value.ToString()));
                    s.Append("];\n");
                }
        return s.Append("}\n").ToString();
    }

    private static string Legend(OpenGraph g, FlowResult? r)
    {
        var parts = new List<string> { "boxes: inputs", "green double circles: outputs", "grey lines: edges (label: weight unless 1)" };
        if (r is not null && r.VanishedEdges is { Count: > 0 } vanished)
            parts.Add(VanishingEdges.Warning(g, r.Field, vanished));
        if (r is { HasFlow: true })
            parts.Add($"orange arrows: corrections over {r.Field.Name} (label: coefficient unless 1); ranks left to right: rounds 1 to {r.Depth}, then outputs");
        if (r?.Obstruction is { } b)
            parts.Add($"red: blocked set of {b.Nodes.Count} nodes, so no flow over {r.Field.Name}");
        return string.Join("; ", parts);
    }
}
