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
    public string Canonical() => string.Concat(Lines());

    /// <summary>Lowercase hex SHA-256 of the canonical form.</summary>
    public string Sha256() => CanonicalForm.Sha256(Lines());

    IEnumerable<string> Lines()
    {
        var touched = Edges.SelectMany(e => new[] { e.U, e.V }).ToHashSet();
        return CanonicalForm.Lines(Inputs, Outputs, Nodes.Where(n => !touched.Contains(n)), Edges.Select(e => (e.U, e.V, e.W.ToString())));
    }
}

/// <summary>The canonical form of docs/formats.md (input line, output line, isolated nodes, edges; LF endings)
/// and its SHA-256, hashed in pieces of about 32 Ki characters: the canonical text is never held whole.</summary>
public static class CanonicalForm
{
    public static IEnumerable<string> Lines(IEnumerable<string> inputs, IEnumerable<string> outputs, IEnumerable<string> isolated,
        IEnumerable<(string U, string V, string W)> edges) =>
        new[] { string.Join(" ", inputs.Prepend("input")) + "\n", string.Join(" ", outputs.Prepend("output")) + "\n" }
            .Concat(isolated.Select(n => $"node {n}\n")).Concat(edges.Select(e => $"edge {e.U} {e.V} {e.W}\n"));

    public static string Sha256(IEnumerable<string> lines)
    {
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        var text = new StringBuilder();
        foreach (var line in lines)
            if (text.Append(line).Length > 1 << 15) { hash.AppendData(Encoding.UTF8.GetBytes(text.ToString())); text.Clear(); }
        hash.AppendData(Encoding.UTF8.GetBytes(text.ToString()));
        return Convert.ToHexStringLower(hash.GetHashAndReset());
    }
}
