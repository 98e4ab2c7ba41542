using FlowCert.Graphs;

namespace FlowCert.Flows.Primes;

/// <summary>The answer over F_p for one prime solved directly: a flow result, or "undefined" when p divides a denominator.</summary>
/// <param name="Prime">p.</param>
/// <param name="Result">The solve over F_p, or null when some weight has no value there.</param>
/// <param name="UndefinedEdges">The edges whose weight's denominator p divides (empty when <paramref name="Result"/> is not null).</param>
public sealed record PrimeAnswer(ulong Prime, FlowResult? Result, IReadOnlyList<WeightedEdge> UndefinedEdges)
{
    /// <summary>True when every weight has a value in F_p.</summary>
    public bool IsDefined => Result is not null;
}

/// <summary>How the survey knows the answer at a prime.</summary>
public enum PrimeClaimKind
{
    /// <summary>p is outside E and divides no unclassified integer: same verdict and depth as over Q (proven).</summary>
    SameAsRationals,
    /// <summary>p is in E and was solved directly over F_p.</summary>
    SolvedDirectly,
    /// <summary>p divides an integer that could not be fully classified: no claim.</summary>
    Unclassified,
}

/// <summary>What the survey claims at one prime: undefined, or a verdict and depth (null when unclassified).</summary>
/// <param name="Prime">p.</param>
/// <param name="Kind">Why the survey knows it.</param>
/// <param name="Defined">False when a weight has no value in F_p.</param>
/// <param name="HasFlow">The verdict (meaningful when defined and classified).</param>
/// <param name="Depth">The minimum depth when a flow exists.</param>
public sealed record PrimeClaim(ulong Prime, PrimeClaimKind Kind, bool Defined, bool HasFlow, int Depth)
{
    /// <summary>True when the claim and a direct answer at the same prime agree on definedness, verdict and depth.</summary>
    public bool AgreesWith(PrimeAnswer direct)
        => Kind == PrimeClaimKind.Unclassified
           || (direct.Result is { } r
               ? Defined && r.HasFlow == HasFlow && (!HasFlow || r.Depth == Depth)
               : !Defined);
}

/// <summary>An integer whose prime divisors the survey could not classify, and why.</summary>
/// <param name="Value">The integer: a cofactor not split, a probable prime, or a prime too large for F_p arithmetic.</param>
/// <param name="Reason">One sentence.</param>
public sealed record UnclassifiedPart(System.Numerics.BigInteger Value, string Reason);
