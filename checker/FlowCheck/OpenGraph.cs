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

    /// <summary>The measurement labels of flows.md section 9 that differ from XY, by node (XY is never stored).</summary>
    public SortedDictionary<string, string> Labels { get; } = new(StringComparer.Ordinal);
    public static readonly string[] LabelNames = ["XY", "XZ", "YZ", "X", "Y", "Z"];

    /// <summary>The canonical text of docs/formats.md.</summary>
    public string Canonical() => string.Concat(Lines());

    /// <summary>Lowercase hex SHA-256 of the canonical form.</summary>
    public string Sha256() => CanonicalForm.Sha256(Lines());

    IEnumerable<string> Lines()
    {
        var touched = Edges.SelectMany(e => new[] { e.U, e.V }).ToHashSet();
        return CanonicalForm.Lines(Inputs, Outputs, Nodes.Where(n => !touched.Contains(n)), Edges.Select(e => (e.U, e.V, e.W.ToString())), Labels);
    }
}

/// <summary>The canonical form of docs/formats.md (input line, output line, isolated nodes, edges, labels; LF endings)
/// and its SHA-256, hashed in pieces of about 32 Ki characters: the canonical text is never held whole.</summary>
public static class CanonicalForm
{
    public static IEnumerable<string> Lines(IEnumerable<string> inputs, IEnumerable<string> outputs, IEnumerable<string> isolated,
        IEnumerable<(string U, string V, string W)> edges, IEnumerable<KeyValuePair<string, string>> labels) =>
        new[] { string.Join(" ", inputs.Prepend("input")) + "\n", string.Join(" ", outputs.Prepend("output")) + "\n" }
            .Concat(isolated.Select(n => $"node {n}\n")).Concat(edges.Select(e => $"edge {e.U} {e.V} {e.W}\n"))
            .Concat(labels.Select(l => $"measure {l.Key} {l.Value}\n"));

    public static string Sha256(IEnumerable<string> lines)
    {
        using var sha = SHA256.Create();
        using (var stream = new CryptoStream(Stream.Null, sha, CryptoStreamMode.Write))
        using (var text = new StreamWriter(stream, new UTF8Encoding(false), 1 << 15))
            foreach (var line in lines) text.Write(line);
        return Convert.ToHexStringLower(sha.Hash!);
    }
}
