namespace FlowCert.Simulation;

/// <summary>
/// A small deterministic generator (xoshiro256** seeded through SplitMix64; common practice): the same seed
/// gives the same numbers on every machine and .NET version, unlike <see cref="Random"/>'s unspecified algorithm.
/// </summary>
public sealed class SeededRandom
{
    private ulong s0, s1, s2, s3;

    public SeededRandom(ulong seed)
    {
        ulong x = seed;
        s0 = SplitMix(ref x); s1 = SplitMix(ref x); s2 = SplitMix(ref x); s3 = SplitMix(ref x);
    }

    private static ulong SplitMix(ref ulong x)
    {
        ulong z = x += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    public ulong NextUInt64()
    {
        ulong result = ulong.RotateLeft(s1 * 5, 7) * 9;
        ulong t = s1 << 17;
        s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3; s2 ^= t;
        s3 = ulong.RotateLeft(s3, 45);
        return result;
    }

    /// <summary>Uniform in [0, 1) with 53 random bits.</summary>
    public double NextDouble() => (NextUInt64() >> 11) * (1.0 / (1UL << 53));

    /// <summary>Uniform in 0..n-1 (rejection sampling, no modulo bias).</summary>
    public int NextInt(int n)
    {
        if (n <= 0) throw new ArgumentOutOfRangeException(nameof(n));
        ulong limit = ulong.MaxValue - ulong.MaxValue % (ulong)n;
        ulong x;
        do x = NextUInt64(); while (x >= limit);
        return (int)(x % (ulong)n);
    }

    /// <summary>A standard normal deviate (Box-Muller).</summary>
    public double NextGaussian()
    {
        double u = 1.0 - NextDouble(), v = NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u)) * Math.Cos(2 * Math.PI * v);
    }
}
