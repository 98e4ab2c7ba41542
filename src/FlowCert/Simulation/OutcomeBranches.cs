namespace FlowCert.Simulation;

/// <summary>Which outcome branches to simulate: every outcome string, or a sample plus the all-zero one.</summary>
public sealed record OutcomeBranches
{
    /// <summary>The most branches "all" may enumerate (2^20).</summary>
    public const long MaxExhaustive = 1L << 20;

    /// <summary>Null for every branch; otherwise the number of random branches besides the all-zero one.</summary>
    public int? SampleSize { get; }
    /// <summary>The seed that draws the sampled branches.</summary>
    public ulong Seed { get; }

    private OutcomeBranches(int? sampleSize, ulong seed) { SampleSize = sampleSize; Seed = seed; }

    /// <summary>Every outcome string.</summary>
    public static OutcomeBranches All { get; } = new(null, 0);

    /// <summary>K uniformly random raw-outcome strings (duplicates merged) plus the all-zero one; 0 &lt;= K &lt;= <see cref="MaxExhaustive"/>.</summary>
    public static OutcomeBranches Sample(int k, ulong seed)
        => k is >= 0 and <= (int)MaxExhaustive ? new(k, seed)
            : throw new ArgumentOutOfRangeException(nameof(k), $"the sample size must be from 0 to {MaxExhaustive}");

    /// <summary>True when every branch is simulated (no sampling).</summary>
    public bool IsExhaustive => SampleSize is null;
}
