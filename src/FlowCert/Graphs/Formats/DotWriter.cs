using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// Writes a graph for Graphviz (DOT language, write-only): inputs as boxes, outputs as double circles,
/// a node that is both as a double box, edges labelled with their weight unless it is 1, and position
/// hints as pinned <c>pos</c> attributes in points (y turned upwards) for <c>neato -n</c>.
/// </summary>
public static class DotWriter
{
    /// <summary>Points per unit of an <c>at</c> coordinate.</summary>
    public const decimal PointsPerUnit = 72;

    /// <summary>The DOT text of the graph.</summary>
    public static string Write(OpenGraph g)
    {
        var sb = new StringBuilder();
        sb.Append("graph open_graph {\n");
        sb.Append("  // written by flowcert: inputs are boxes, outputs double circles; edges are labelled with weights other than 1\n");
        sb.Append("  node [shape=circle, fontname=\"DejaVu Sans\", fontsize=10];\n");
        sb.Append("  edge [fontname=\"DejaVu Sans\", fontsize=9];\n");
        for (int v = 0; v < g.NodeCount; v++)
        {
            var attributes = new List<string>();
            var role = NodeShape(g, v);
            if (role is not null) attributes.Add(role);
            if (g.Positions.TryGetValue(v, out var p))
                attributes.Add($"pos=\"{Number(p.X * PointsPerUnit)},{Number(-p.Y * PointsPerUnit)}!\"");
            sb.Append("  ").Append(Id(g.Names[v]));
            if (attributes.Count > 0) sb.Append(" [").Append(string.Join(", ", attributes)).Append(']');
            sb.Append(";\n");
        }
        foreach (var e in g.Edges)
        {
            sb.Append("  ").Append(Id(g.Names[e.U])).Append(" -- ").Append(Id(g.Names[e.V]));
            if (e.Weight != Algebra.Rational.One) sb.Append(" [label=").Append(Id(e.Weight.ToString())).Append(']');
            sb.Append(";\n");
        }
        return sb.Append("}\n").ToString();
    }

    /// <summary>The shape attributes marking a node's role, or null for a node that is neither input nor output.</summary>
    public static string? NodeShape(OpenGraph g, int v) => (g.Inputs.Contains(v), g.Outputs.Contains(v)) switch
    {
        (true, true) => "shape=box, peripheries=2",
        (true, false) => "shape=box",
        (false, true) => "shape=doublecircle",
        _ => null,
    };

    /// <summary>A DOT identifier: always a quoted string, with quotes and backslashes escaped.</summary>
    public static string Id(string s) => "\"" + s.Replace("\\", "\\\\").Replace("\"", "\\\"") + "\"";

    private static string Number(decimal d) => OgraphWriter.Coordinate(d);
}
