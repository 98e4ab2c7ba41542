using System.Security.Cryptography;
using System.Text;

namespace FlowCert.Graphs;

/// <summary>The canonical <c>.ograph</c> text of a graph and its SHA-256 (docs/formats.md).</summary>
public static class CanonicalForm
{
    /// <summary>The canonical text: input, output, isolated nodes, edges, then labels other than XY; LF line ends.</summary>
    public static string Write(OpenGraph g)
    {
        var sb = new StringBuilder();
        sb.Append("input");
        foreach (var i in g.SortedInputs) sb.Append(' ').Append(g.Names[i]);
        sb.Append('\n').Append("output");
        foreach (var o in g.SortedOutputs) sb.Append(' ').Append(g.Names[o]);
        sb.Append('\n');
        foreach (var v in g.IsolatedNodes()) sb.Append("node ").Append(g.Names[v]).Append('\n');
        foreach (var e in g.Edges)
            sb.Append("edge ").Append(g.Names[e.U]).Append(' ').Append(g.Names[e.V]).Append(' ').Append(e.Weight.ToString()).Append('\n');
        foreach (var (v, label) in g.Labels.OrderBy(kv => kv.Key))
            sb.Append("measure ").Append(g.Names[v]).Append(' ').Append(MeasurementLabels.Name(label)).Append('\n');
        return sb.ToString();
    }

    /// <summary>Lowercase hex SHA-256 of the UTF-8 canonical text.</summary>
    public static string Sha256(OpenGraph g)
        => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(Write(g))));
}
