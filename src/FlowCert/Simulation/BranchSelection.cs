namespace FlowCert.Simulation;

/// <summary>Which outcome branches to simulate: every outcome string, or a sample plus the all-zero one.</summary>
public sealed record BranchSelection
{
    /// <summary>The most branches "all" may enumerate (2^20).</summary>
    public const long MaxExhaustive = 1L << 20;

    /// <summary>Null for every branch; otherwise the number of random branches besides the all-zero one.</summary>
    public int? SampleSize { get; }
    /// <summary>The seed that draws the sampled branches.</summary>
    public ulong Seed { get; }

    private BranchSelection(int? sampleSize, ulong seed) { SampleSize = sampleSize; Seed = seed; }

    public static BranchSelection All { get; } = new(null, 0);

    /// <summary>K uniformly random raw-outcome strings (duplicates merged) plus the all-zero one.</summary>
    public static BranchSelection Sample(int k, ulong seed)
        => k >= 0 ? new(k, seed) : throw new ArgumentOutOfRangeException(nameof(k), "the sample size must not be negative");

    public bool IsExhaustive => SampleSize is null;
}

/// <summary>
/// Deliberately wrong frame conventions, for tests that show each sign of flows.md section 7 is load-bearing.
/// </summary>
[Flags]
internal enum FrameFault
{
    None = 0,
    /// <summary>Frames accumulate -m c_v and -m A c_v (the corrections applied with the opposite sign).</summary>
    FlipCorrectionSign = 1,
    /// <summary>Measure with D itself, ignoring the X-frame.</summary>
    SkipAngleAdaptation = 2,
    /// <summary>Use X^-a D X^a in place of X^a D X^-a.</summary>
    FlipAngleAdaptation = 4,
    /// <summary>Read the outcome as raw + b in place of raw - b.</summary>
    FlipReadout = 8,
}
