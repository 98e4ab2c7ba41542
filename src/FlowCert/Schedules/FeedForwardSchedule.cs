using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Schedules;

/// <summary>
/// A linear form sum_v Coefficient_v * m_v in the outcomes m_v of earlier measurements, m_v being the
/// outcome of v as re-read through its own frame (raw outcome minus b_v). Coefficients are field
/// elements; terms are ordered by (round of v, v) and none is zero.
/// </summary>
public sealed record LinearForm(IReadOnlyList<(int Node, FieldElement Coefficient)> Terms)
{
    /// <summary>True when the form has no terms (it is 0).</summary>
    public bool IsZero => Terms.Count == 0;
}

/// <summary>
/// What outcome m of <see cref="Source"/> asks of <see cref="Target"/>: the correction X^(X m) Z^(Z m),
/// with X = -c_v(u) and Z = -(A c_v)(u) (flows.md section 7).
/// </summary>
public sealed record TriggeredCorrection(int Source, int Target, FieldElement X, FieldElement Z);

/// <summary>
/// The Pauli frame of a node w when it is measured (or, for an output, after the last round): the state
/// is X^a Z^b applied to the ideal state, with a = <see cref="X"/> and b = <see cref="Z"/> as forms in
/// earlier outcomes. <see cref="Round"/> is 0 for an output.
/// </summary>
public sealed record NodeFrame(int Node, int Round, LinearForm X, LinearForm Z)
{
    /// <summary>True for an output's final frame (round 0).</summary>
    public bool IsOutput => Round == 0;
}

/// <summary>Counts that describe how much classical feed-forward a schedule needs.</summary>
/// <param name="Depth">The number of rounds.</param>
/// <param name="NodesPerRound">How many nodes are measured in each round, round 1 first.</param>
/// <param name="MaxAngleDependencies">The most outcomes any one measurement angle is adapted to (X part).</param>
/// <param name="MaxReadoutDependencies">The most outcomes any one measured outcome is re-read with (Z part).</param>
/// <param name="MaxOutputDependencies">The most outcomes any one output's final correction depends on.</param>
/// <param name="NonZeroX">Non-zero X exponents over all triggered corrections.</param>
/// <param name="NonZeroZ">Non-zero Z exponents over all triggered corrections.</param>
/// <param name="LongestChain">A longest path in the DAG "the outcome of v enters the frame of w", as nodes.</param>
public sealed record ScheduleStatistics(
    int Depth, IReadOnlyList<int> NodesPerRound, int MaxAngleDependencies, int MaxReadoutDependencies,
    int MaxOutputDependencies, int NonZeroX, int NonZeroZ, IReadOnlyList<int> LongestChain)
{
    /// <summary>Non-zero correction exponents, X and Z counted separately.</summary>
    public int NonZeroCorrections => NonZeroX + NonZeroZ;
}

/// <summary>
/// The running pattern of a flow certificate: rounds, the corrections each outcome triggers, the frame
/// of every node measured after round 1 and of every output, and statistics. Exact field elements.
/// </summary>
public sealed record FeedForwardSchedule
{
    /// <summary>The graph the schedule runs on.</summary>
    public required OpenGraph Graph { get; init; }
    /// <summary>The field of the outcomes and coefficients.</summary>
    public required FieldSpec Field { get; init; }
    /// <summary>The kind of flow the schedule comes from.</summary>
    public required FlowKind Kind { get; init; }
    /// <summary>Measured nodes by round, round 1 first, each round sorted.</summary>
    public required IReadOnlyList<IReadOnlyList<int>> Rounds { get; init; }
    /// <summary>Triggered corrections, by measurement order of the source, then by target.</summary>
    public required IReadOnlyList<TriggeredCorrection> Corrections { get; init; }
    /// <summary>Frames of measured nodes after round 1 (measurement order), then of the outputs (sorted).</summary>
    public required IReadOnlyList<NodeFrame> Frames { get; init; }
    /// <summary>Counts of the feed-forward the schedule needs.</summary>
    public required ScheduleStatistics Statistics { get; init; }
    /// <summary>Edges whose weight is 0 in the field (<see cref="VanishingEdges"/>): every format reports them.</summary>
    public required IReadOnlyList<WeightedEdge> VanishedEdges { get; init; }
}
