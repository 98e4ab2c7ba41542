using FlowCert.Algebra;
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
    /// <summary>The value of the certificate's <c>version</c> key for XY-only graphs and kinds general and causal.</summary>
    public const int Version = 1;
    /// <summary>The version of certificates whose graph has a label other than XY or whose flow is <c>pauli</c>.</summary>
    public const int LabelledVersion = 2;

    /// <summary>The version a result is written with: 2 when its graph has labels or its kind is Pauli, else 1.</summary>
    public static int VersionOf(FlowResult r) => VersionOf(r.Graph, r.Kind);

    private static int VersionOf(OpenGraph g, FlowKind kind) => g.HasLabels || kind == FlowKind.Pauli ? LabelledVersion : Version;

    /// <summary>The producer name written into every certificate.</summary>
    public const string ProducerName = "flowcert";
    /// <summary>Written into every certificate: the library's version (Version in Directory.Build.props), as major.minor.patch.</summary>
    public static readonly string ProducerVersion = typeof(CertificateWriter).Assembly.GetName().Version!.ToString(3);

    /// <summary>The certificate text.</summary>
    public static string Write(FlowResult r)
    {
        var text = new StringWriter { NewLine = "\n" };
        Write(r, text);
        return text.ToString();
    }

    /// <summary>
    /// Writes the certificate to <paramref name="w"/> piece by piece, never holding its whole text (a
    /// million-node certificate is over 100 MB); the bytes are those of <see cref="Write(FlowResult)"/>.
    /// </summary>
    public static void Write(FlowResult r, TextWriter w)
    {
        WriteHead(r.Graph, r.Field, r.Kind, w);
        WriteBody(r, w);
    }

    /// <summary>
    /// The part of the certificate known before solving (header, graph hash, graph block): with
    /// <see cref="WriteBody"/> after it, the bytes of <see cref="Write(FlowResult, TextWriter)"/>. A caller
    /// may write it while the solver runs.
    /// </summary>
    public static void WriteHead(OpenGraph g, FieldSpec field, FlowKind kind, TextWriter w)
    {
        w.Write("{\n");
        w.Write($"  \"format\": {Quote(Format)},\n");
        w.Write($"  \"version\": {VersionOf(g, kind)},\n");
        w.Write($"  \"flow\": {Quote(FlowKinds.Name(kind))},\n");
        w.Write($"  \"field\": {Quote(field.Name)},\n");
        w.Write($"  \"graphSha256\": {Quote(CanonicalForm.Sha256(g))},\n");
        w.Write("  \"graph\": ");
        GraphJson.WriteObject(g, "  ", w);
        w.Write(",\n");
    }

    /// <summary>The rest of the certificate after <see cref="WriteHead"/>: the verdict and its evidence.</summary>
    public static void WriteBody(FlowResult r, TextWriter w)
    {
        var g = r.Graph;
        void Name(int v) => JsonSource.WriteQuoted(w, g.Names[v]);
        void List(IReadOnlyList<int> nodes)
        {
            w.Write('[');
            for (int k = 0; k < nodes.Count; k++) { if (k > 0) w.Write(", "); Name(nodes[k]); }
            w.Write(']');
        }
        void Vector(NodeVector v)
        {
            w.Write('{');
            for (int k = 0; k < v.Count; k++)
            {
                if (k > 0) w.Write(", ");
                Name(v.Nodes[k]);
                w.Write(": \"");
                w.Write(v[k].ToString());
                w.Write('"');
            }
            w.Write('}');
        }
        // A block: "open", then one item a line indented two more than indent, then "close"; "openclose" when empty.
        void Block<TItem>(IEnumerable<TItem> items, string indent, char open, char close, Action<TItem> item)
        {
            w.Write(open);
            bool any = false;
            foreach (var x in items)
            {
                w.Write(any ? ",\n" : "\n");
                w.Write(indent);
                w.Write("  ");
                item(x);
                any = true;
            }
            if (any) { w.Write('\n'); w.Write(indent); }
            w.Write(close);
        }

        if (r.Obstruction is null)
        {
            w.Write("  \"verdict\": \"flow\",\n");
            w.Write($"  \"depth\": {r.Depth},\n");
            w.Write("  \"rounds\": ");
            Block(r.Rounds, "  ", '[', ']', List);
            w.Write(",\n  \"corrections\": ");
            var measured = Enumerable.Range(0, g.NodeCount).Where(r.Corrections.ContainsKey);
            Block(measured, "  ", '{', '}', v => { Name(v); w.Write(": "); Vector(r.Corrections[v]); });
            w.Write(",\n");
        }
        else
        {
            w.Write("  \"verdict\": \"noflow\",\n");
            w.Write("  \"obstruction\": {\n");
            w.Write("    \"blocked\": ");
            List(r.Obstruction.Nodes);
            if (r.Obstruction.NodeWitnesses is { } perNode)
            {
                w.Write(",\n    \"witnesses\": ");
                Block(perNode, "    ", '{', '}', x =>
                {
                    Name(x.Node);
                    w.Write(": {\"rows\": ");
                    List(x.Rows);
                    w.Write(x.Self ? ", \"self\": true}" : ", \"self\": false}");
                });
            }
            else if (r.Kind == FlowKind.General)
            {
                w.Write(",\n    \"witnesses\": ");
                Block(r.Obstruction.Witnesses, "    ", '[', ']', Vector);
            }
            w.Write("\n  },\n");
        }
        w.Write($"  \"producer\": {{\"name\": {Quote(ProducerName)}, \"version\": {Quote(ProducerVersion)}}}\n");
        w.Write("}\n");
    }

    private static string Quote(string s) => JsonSource.Quote(s);
}
