using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;

namespace FlowCheck;

/// <summary>One edge U - V with U &lt; V ordinally and its rational weight.</summary>
public sealed record Edge(string U, string V, Rational W);

/// <summary>A rational open graph with sorted node lists and sorted edges, and its canonical form.</summary>
public sealed record OpenGraph(List<string> Inputs, List<string> Outputs, List<string> Nodes, List<Edge> Edges)
{
    static readonly Regex Name = new(@"^[A-Za-z_][A-Za-z0-9_.:-]*\z");

    public static bool IsName(string text) => Name.IsMatch(text);

    /// <summary>The measurement labels of flows.md section 9 that differ from XY, by node (XY is never stored).</summary>
    public SortedDictionary<string, string> Labels { get; init; } = new(StringComparer.Ordinal);

    public static readonly string[] LabelNames = ["XY", "XZ", "YZ", "X", "Y", "Z"];

    /// <summary>The label of a node: XY unless another was given.</summary>
    public string Label(string node) => Labels.GetValueOrDefault(node, "XY");

    /// <summary>The canonical text of docs/formats.md: input, output, isolated nodes, edges, labels; LF endings.</summary>
    public string Canonical()
    {
        var text = new StringBuilder();
        text.Append("input").Append(string.Concat(Inputs.Select(n => " " + n))).Append('\n');
        text.Append("output").Append(string.Concat(Outputs.Select(n => " " + n))).Append('\n');
        var touched = Edges.SelectMany(e => new[] { e.U, e.V }).ToHashSet();
        foreach (var node in Nodes.Where(n => !touched.Contains(n)))
            text.Append($"node {node}\n");
        foreach (var e in Edges)
            text.Append($"edge {e.U} {e.V} {e.W}\n");
        foreach (var (node, label) in Labels) text.Append($"measure {node} {label}\n");
        return text.ToString();
    }

    /// <summary>Lowercase hex SHA-256 of the UTF-8 bytes of the canonical form.</summary>
    public string Sha256() => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(Canonical())));
}
