using System.Text;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Certificates;

/// <summary>
/// Writes a <see cref="FlowResult"/> as a certificate (docs/formats.md): fixed key order, nodes in
/// ordinal order, two-space indentation, LF line ends, so the same result gives the same bytes anywhere.
/// </summary>
public static class CertificateWriter
{
    /// <summary>The value of the certificate's <c>format</c> key.</summary>
    public const string Format = "flowcert-certificate";
    /// <summary>The value of the certificate's <c>version</c> key.</summary>
    public const int Version = 1;
    /// <summary>The producer name written into every certificate.</summary>
    public const string ProducerName = "flowcert";
    /// <summary>Written into every certificate: the library's version (Version in Directory.Build.props), as major.minor.patch.</summary>
    public static readonly string ProducerVersion = typeof(CertificateWriter).Assembly.GetName().Version!.ToString(3);

    /// <summary>The certificate text.</summary>
    public static string Write(FlowResult r)
    {
        var g = r.Graph;
        string N(int v) => Quote(g.Names[v]);
        string List(IEnumerable<int> nodes) => "[" + string.Join(", ", nodes.Select(N)) + "]";
        string Vector(NodeVector v) => "{" + string.Join(", ", v.Entries.Select(e => $"{N(e.Node)}: {Quote(e.Value.ToString())}")) + "}";
        static string Block(IEnumerable<string> lines, string indent, char open, char close)
        {
            var items = lines.ToList();
            return items.Count == 0 ? $"{open}{close}" : $"{open}\n{string.Join(",\n", items.Select(l => indent + "  " + l))}\n{indent}{close}";
        }

        var sb = new StringBuilder();
        sb.Append("{\n");
        sb.Append($"  \"format\": {Quote(Format)},\n");
        sb.Append($"  \"version\": {Version},\n");
        sb.Append($"  \"flow\": {Quote(FlowKinds.Name(r.Kind))},\n");
        sb.Append($"  \"field\": {Quote(r.Field.Name)},\n");
        sb.Append($"  \"graphSha256\": {Quote(CanonicalForm.Sha256(g))},\n");
        sb.Append("  \"graph\": ").Append(GraphJson.WriteObject(g, "  ")).Append(",\n");
        if (r.Obstruction is null)
        {
            sb.Append("  \"verdict\": \"flow\",\n");
            sb.Append($"  \"depth\": {r.Depth},\n");
            sb.Append("  \"rounds\": ").Append(Block(r.Rounds.Select(List), "  ", '[', ']')).Append(",\n");
            sb.Append("  \"corrections\": ").Append(Block(r.Corrections.OrderBy(kv => kv.Key).Select(kv => $"{N(kv.Key)}: {Vector(kv.Value)}"), "  ", '{', '}')).Append(",\n");
        }
        else
        {
            sb.Append("  \"verdict\": \"noflow\",\n");
            sb.Append("  \"obstruction\": {\n");
            sb.Append($"    \"blocked\": {List(r.Obstruction.Nodes)}");
            if (r.Kind == FlowKind.General)
                sb.Append(",\n    \"witnesses\": ").Append(Block(r.Obstruction.Witnesses.Select(Vector), "    ", '[', ']'));
            sb.Append("\n  },\n");
        }
        sb.Append($"  \"producer\": {{\"name\": {Quote(ProducerName)}, \"version\": {Quote(ProducerVersion)}}}\n");
        sb.Append("}\n");
        return sb.ToString();
    }

    private static string Quote(string s) => JsonSource.Quote(s);
}
