using FlowCert.Graphs.Families;

namespace FlowCert.Simulation;

/// <summary>
/// A small deterministic generator (xoshiro256** seeded through SplitMix64; common practice): the same seed
/// gives the same numbers on every machine and .NET version, unlike <see cref="Random"/>'s unspecified algorithm.
/// The four state words are the first four outputs of the project's one <see cref="SplitMix64"/> for the seed.
/// </summary>
public sealed class SeededRandom
{
    private ulong s0, s1, s2, s3;

    /// <summary>A generator whose state is drawn from <paramref name="seed"/>.</summary>
    public SeededRandom(ulong seed)
    {
        var seeder = new SplitMix64(seed);
        s0 = seeder.Next(); s1 = seeder.Next(); s2 = seeder.Next(); s3 = seeder.Next();
    }

    /// <summary>The next 64 random bits.</summary>
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
