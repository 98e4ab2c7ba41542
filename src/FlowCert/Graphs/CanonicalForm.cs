using System.Runtime.CompilerServices;
using System.Security.Cryptography;
using System.Text;

namespace FlowCert.Graphs;

/// <summary>The canonical <c>.ograph</c> text of a graph and its SHA-256 (docs/formats.md).</summary>
public static class CanonicalForm
{
    /// <summary>The canonical text: input, output, isolated nodes, edges, then labels other than XY; LF line ends.</summary>
    public static string Write(OpenGraph g)
    {
        var text = new StringWriter { NewLine = "\n" };
        Write(g, text);
        return text.ToString();
    }

    /// <summary>Writes the canonical text of <see cref="Write(OpenGraph)"/> to <paramref name="w"/>, piece by piece.</summary>
    public static void Write(OpenGraph g, TextWriter w)
    {
        w.Write("input");
        foreach (var i in g.SortedInputs) { w.Write(' '); w.Write(g.Names[i]); }
        w.Write('\n');
        w.Write("output");
        foreach (var o in g.SortedOutputs) { w.Write(' '); w.Write(g.Names[o]); }
        w.Write('\n');
        foreach (var v in g.IsolatedNodes()) { w.Write("node "); w.Write(g.Names[v]); w.Write('\n'); }
        foreach (var e in g.Edges)
        {
            w.Write("edge "); w.Write(g.Names[e.U]); w.Write(' '); w.Write(g.Names[e.V]); w.Write(' ');
            w.Write(e.Weight.ToString()); w.Write('\n');
        }
        foreach (var (v, label) in g.Labels.OrderBy(kv => kv.Key))
        {
            w.Write("measure "); w.Write(g.Names[v]); w.Write(' '); w.Write(MeasurementLabels.Name(label)); w.Write('\n');
        }
    }

    // A graph is immutable, so its hash is computed once (solve --json and the certificate both need it).
    private static readonly ConditionalWeakTable<OpenGraph, string> Hashes = new();

    /// <summary>Lowercase hex SHA-256 of the UTF-8 canonical text, hashed as it is written (the text is never held whole).</summary>
    public static string Sha256(OpenGraph g) => Hashes.GetValue(g, Compute);

    private static string Compute(OpenGraph g)
    {
        using var sha = SHA256.Create();
        using (var hashing = new CryptoStream(Stream.Null, sha, CryptoStreamMode.Write, leaveOpen: true))
        using (var w = new StreamWriter(hashing, new UTF8Encoding(false), 1 << 16))
            Write(g, w);
        return Convert.ToHexStringLower(sha.Hash!);
    }
}
