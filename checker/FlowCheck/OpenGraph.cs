using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;

namespace FlowCheck;

/// <summary>One edge U - V with U &lt; V ordinally and its rational weight.</summary>
public sealed record Edge(string U, string V, Rational W);

/// <summary>A rational open graph read from a .ograph file, with sorted node lists and sorted edges.</summary>
public sealed record OpenGraph(List<string> Inputs, List<string> Outputs, List<string> Nodes, List<Edge> Edges)
{
    static readonly Regex Name = new(@"^[A-Za-z_][A-Za-z0-9_.:-]*\z");

    public static bool IsName(string text) => Name.IsMatch(text);

    /// <summary>The canonical text of docs/formats.md.</summary>
    public string Canonical()
    {
        var text = new StringBuilder();
        Write(s => text.Append(s));
        return text.ToString();
    }

    /// <summary>Lowercase hex SHA-256 of the canonical form.</summary>
    public string Sha256() => CanonicalHash.Of(Write);

    void Write(Action<string> append)
    {
        var touched = Edges.SelectMany(e => new[] { e.U, e.V }).ToHashSet();
        CanonicalHash.Write(append, Inputs, Outputs, Nodes.Where(n => !touched.Contains(n)), Edges.Select(e => (e.U, e.V, e.W.ToString())));
    }
}

/// <summary>The SHA-256 of the canonical form of docs/formats.md (input line, output line, isolated nodes,
/// edges; LF endings), hashed line by line in 64 KiB chunks: the canonical text is never held whole.</summary>
public sealed class CanonicalHash
{
    readonly IncrementalHash hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
    readonly byte[] chunk = new byte[1 << 16];
    int n;

    /// <summary>The hash of the text that <paramref name="write"/> hands, piece by piece, to its argument.</summary>
    public static string Of(Action<Action<string>> write)
    {
        var h = new CanonicalHash();
        write(h.Append);
        h.hash.AppendData(h.chunk, 0, h.n);
        return Convert.ToHexStringLower(h.hash.GetHashAndReset());
    }

    /// <summary>Writes the canonical form, piece by piece.</summary>
    public static void Write(Action<string> append, IEnumerable<string> inputs, IEnumerable<string> outputs,
        IEnumerable<string> isolated, IEnumerable<(string U, string V, string W)> edges)
    {
        append("input");
        foreach (var i in inputs) { append(" "); append(i); }
        append("\noutput");
        foreach (var o in outputs) { append(" "); append(o); }
        append("\n");
        foreach (var node in isolated) { append("node "); append(node); append("\n"); }
        foreach (var (u, v, w) in edges) { append("edge "); append(u); append(" "); append(v); append(" "); append(w); append("\n"); }
    }

    void Append(string text)
    {
        if (n + Encoding.UTF8.GetMaxByteCount(text.Length) > chunk.Length)
        {
            hash.AppendData(chunk, 0, n);
            n = 0;
            if (Encoding.UTF8.GetMaxByteCount(text.Length) > chunk.Length) { hash.AppendData(Encoding.UTF8.GetBytes(text)); return; }
        }
        n += Encoding.UTF8.GetBytes(text, chunk.AsSpan(n));
    }
}
