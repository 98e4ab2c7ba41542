using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>Which flow condition is asked for (flows.md sections 3 and 4).</summary>
public enum FlowKind
{
    /// <summary>Generalized flow: correction vectors with any support.</summary>
    General,
    /// <summary>Causal flow: one corrector per measured node.</summary>
    Causal,
}

/// <summary>The one place where a kind of flow is named: in certificates and on the command line, and in prose.</summary>
public static class FlowKinds
{
    /// <summary>The name in certificates and on the command line: <c>general</c> or <c>causal</c>.</summary>
    public static string Name(FlowKind kind) => kind == FlowKind.Causal ? "causal" : "general";

    /// <summary>The adjective in prose and pictures: <c>generalized</c> or <c>causal</c>.</summary>
    public static string Adjective(FlowKind kind) => kind == FlowKind.Causal ? "causal" : "generalized";

    /// <summary>Reads a name written by <see cref="Name"/>; false for anything else.</summary>
    public static bool TryParse(string text, out FlowKind kind)
    {
        kind = text == "causal" ? FlowKind.Causal : FlowKind.General;
        return text is "general" or "causal";
    }
}

/// <summary>A proof that no flow exists: a blocked set and, for generalized flow, left-kernel witnesses.</summary>
public sealed record BlockedSet(IReadOnlyList<int> Nodes, IReadOnlyList<NodeVector> Witnesses);

/// <summary>The outcome of a flow search: a schedule with correction vectors, or an obstruction.</summary>
public sealed record FlowResult
{
    /// <summary>The graph analysed.</summary>
    public required OpenGraph Graph { get; init; }
    /// <summary>The field the analysis ran over.</summary>
    public required FieldSpec Field { get; init; }
    /// <summary>The flow condition asked for.</summary>
    public required FlowKind Kind { get; init; }
    /// <summary>Measured nodes by round, round 1 first, each round sorted; empty when there is no flow.</summary>
    public required IReadOnlyList<IReadOnlyList<int>> Rounds { get; init; }
    /// <summary>The correction vector c_v of every measured node v (empty when there is no flow).</summary>
    public required IReadOnlyDictionary<int, NodeVector> Corrections { get; init; }
    /// <summary>The proof of absence, or null when a flow exists.</summary>
    public required BlockedSet? Obstruction { get; init; }
    /// <summary>Edges whose weight is zero in the chosen field (they vanish there).</summary>
    public required IReadOnlyList<WeightedEdge> VanishedEdges { get; init; }

    /// <summary>True when a flow exists (there is no obstruction).</summary>
    public bool HasFlow => Obstruction is null;
    /// <summary>The number of rounds (minimal among flows of this kind over this field).</summary>
    public int Depth => Rounds.Count;
}
