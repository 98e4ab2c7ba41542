using FlowCert.Algebra;

namespace FlowCert.Graphs.Families;

/// <summary>
/// A generated graph before its weights are chosen: nodes (with positions for lattices), edges tagged
/// with a lattice direction, inputs and outputs. <see cref="Build"/> applies a <see cref="WeightRule"/>.
/// </summary>
public sealed class GraphDraft(string family, IReadOnlyList<string> directions)
{
    private readonly List<string> nodes = [];
    private readonly Dictionary<string, PositionHint> positions = new(StringComparer.Ordinal);
    private readonly List<(string U, string V, string Direction)> edges = [];

    /// <summary>The family's name, for messages.</summary>
    public string Family { get; } = family;
    /// <summary>The direction tags edges may carry (empty for random graphs).</summary>
    public IReadOnlyList<string> Directions { get; } = directions;
    /// <summary>Input node names, in the order added.</summary>
    public List<string> Inputs { get; } = [];
    /// <summary>Output node names, in the order added.</summary>
    public List<string> Outputs { get; } = [];
    /// <summary>Number of nodes added so far.</summary>
    public int NodeCount => nodes.Count;
    /// <summary>Number of edges added so far.</summary>
    public int EdgeCount => edges.Count;

    /// <summary>Adds a node with a drawing position.</summary>
    public void Node(string name, decimal x, decimal y)
    {
        nodes.Add(name);
        positions[name] = new PositionHint(x, y);
    }

    /// <summary>Adds a node without a position.</summary>
    public void Node(string name) => nodes.Add(name);

    /// <summary>Adds an edge in a direction (one of <see cref="Directions"/>, or "" for untagged families).</summary>
    public void Edge(string u, string v, string direction) => edges.Add((u, v, direction));

    /// <summary>
    /// The open graph with weights from the rule. A <see cref="WeightRule.Choice"/> draws from
    /// <paramref name="weightStream"/> once per edge, edges taken in canonical order (by their names,
    /// smaller name first), so the weights do not depend on the order the family built its edges in.
    /// </summary>
    public OpenGraph Build(WeightRule rule, SplitMix64 weightStream)
    {
        if (rule is WeightRule.PerDirection pd)
            foreach (var d in pd.Weights.Keys)
                if (!Directions.Contains(d))
                    throw new FamilyParameterException(Directions.Count == 0
                        ? $"{Family} has no lattice directions: use one weight or random weights"
                        : $"{Family} has no direction '{d}': its directions are {string.Join(", ", Directions)}");
        var ordered = edges
            .Select(e => string.CompareOrdinal(e.U, e.V) < 0 ? e : (e.V, e.U, e.Direction))
            .OrderBy(e => e.Item1, StringComparer.Ordinal).ThenBy(e => e.Item2, StringComparer.Ordinal)
            .ToList();
        var weighted = new List<(string, string, Rational)>(ordered.Count);
        foreach (var (u, v, d) in ordered)
        {
            var w = rule switch
            {
                WeightRule.Constant c => c.Weight,
                WeightRule.PerDirection p => p.Weights.TryGetValue(d, out var x) ? x : Rational.One,
                WeightRule.Choice ch => ch.Values[(int)weightStream.NextBelow((ulong)ch.Values.Count)],
                _ => throw new InvalidOperationException("unknown weight rule"),
            };
            weighted.Add((u, v, w));
        }
        return new OpenGraph(nodes, weighted, Inputs, Outputs, positions);
    }
}
