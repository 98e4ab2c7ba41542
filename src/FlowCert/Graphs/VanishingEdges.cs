using FlowCert.Algebra;

namespace FlowCert.Graphs;

/// <summary>
/// The edges whose weight is 0 in a field: they vanish there (flows.md section 1), and every command that
/// works in that field reports them, never silently. Over Q no edge vanishes (a weight is never 0); over
/// F_p a reduced weight a/b vanishes exactly when p divides a. A weight whose denominator p divides has no
/// value in F_p at all: that is an input error raised where the weights are mapped, and it is not listed here.
/// </summary>
public static class VanishingEdges
{
    /// <summary>The most edges <see cref="Describe"/> names before it says how many there are in all.</summary>
    public const int MaxListed = 10;

    /// <summary>The edges of <paramref name="g"/> whose weight is 0 in <paramref name="field"/>, in the graph's edge order.</summary>
    public static IReadOnlyList<WeightedEdge> In(OpenGraph g, FieldSpec field)
        => field.IsRationals ? [] : g.Edges.Where(e => (e.Weight.Numerator % field.Prime).IsZero).ToList();

    /// <summary>
    /// The edges as one line, <c>a-b (3), c-d (-9/2)</c> (ends and weight as written in the graph); past
    /// <see cref="MaxListed"/> edges the first ones and <c>... (N in all)</c>.
    /// </summary>
    public static string Describe(OpenGraph g, IReadOnlyList<WeightedEdge> edges)
    {
        var shown = edges.Take(MaxListed).Select(e => $"{g.Names[e.U]}-{g.Names[e.V]} ({e.Weight})");
        return string.Join(", ", edges.Count > MaxListed ? shown.Append($"... ({edges.Count} in all)") : shown);
    }

    /// <summary>The sentence every command prints: <c>N edges have weight 0 in F and vanish: ...</c> (<c>1 edge has ... and vanishes</c>).</summary>
    public static string Warning(OpenGraph g, FieldSpec field, IReadOnlyList<WeightedEdge> edges)
        => $"{Formats.Counted.Of(edges.Count, "edge")} {(edges.Count == 1 ? "has" : "have")} weight 0 in {field.Name} and {(edges.Count == 1 ? "vanishes" : "vanish")}: {Describe(g, edges)}";
}
