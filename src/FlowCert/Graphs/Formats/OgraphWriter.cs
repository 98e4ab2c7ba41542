using System.Globalization;
using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// Writes a graph as its canonical <c>.ograph</c> text followed by its position hints: one
/// <c>at NODE X Y</c> line per node that has one, in ordinal order of the names, coordinates as plain
/// decimals without trailing zeros (docs/formats.md). Without hints the text is the canonical form.
/// </summary>
public static class OgraphWriter
{
    /// <summary>The <c>.ograph</c> text of the graph, position hints included.</summary>
    public static string Write(OpenGraph g)
    {
        var sb = new StringBuilder(CanonicalForm.Write(g));
        foreach (var (v, p) in g.Positions.OrderBy(kv => kv.Key))
            sb.Append("at ").Append(g.Names[v]).Append(' ').Append(Coordinate(p.X)).Append(' ').Append(Coordinate(p.Y)).Append('\n');
        return sb.ToString();
    }

    /// <summary>A coordinate as the <c>at</c> line writes it: <c>2</c>, <c>-0.3</c>, <c>0.866</c>.</summary>
    public static string Coordinate(decimal d)
        => (d == 0 ? 0m : d).ToString("0.############################", CultureInfo.InvariantCulture);
}
