using System.Diagnostics;

namespace FlowCert.Algebra.Factoring;

/// <summary>
/// A time budget shared by every factorisation of one run. Only whether a cofactor was split depends on
/// it: every answer given is exact whatever the budget, and a cofactor left over is reported as such.
/// </summary>
public sealed class FactoringBudget
{
    private readonly long deadline;

    /// <summary>A budget of <paramref name="limit"/> from now (zero or less: only trial division and primality tests).</summary>
    public FactoringBudget(TimeSpan limit)
    {
        Limit = limit;
        var ticks = limit <= TimeSpan.Zero ? 0 : (long)Math.Min(limit.TotalSeconds * Stopwatch.Frequency, long.MaxValue / 4.0);
        deadline = Stopwatch.GetTimestamp() + ticks;
    }

    /// <summary>The budget asked for.</summary>
    public TimeSpan Limit { get; }

    /// <summary>True once the budget is spent.</summary>
    public bool Expired => Stopwatch.GetTimestamp() >= deadline;
}
