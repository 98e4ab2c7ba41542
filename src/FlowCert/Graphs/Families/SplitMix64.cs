using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Graphs.Families;

/// <summary>
/// The SplitMix64 generator ("Fast splittable pseudorandom number generators", OOPSLA 2014,
/// doi:10.1145/2660193.2660195, identifier from memory; constants common practice): 64-bit state advanced by a fixed odd
/// constant and mixed. Written out here so that a seed gives the same graph on every machine and .NET
/// version, which System.Random does not promise. Not for cryptography.
/// </summary>
public sealed class SplitMix64(ulong seed)
{
    private ulong state = seed;

    /// <summary>The next 64 random bits.</summary>
    public ulong Next()
    {
        unchecked
        {
            state += 0x9E3779B97F4A7C15UL;
            ulong z = state;
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }

    /// <summary>A uniform integer in [0, bound), bound &gt; 0, without bias (draws below 2^64 mod bound are redrawn).</summary>
    public ulong NextBelow(ulong bound)
    {
        ArgumentOutOfRangeException.ThrowIfZero(bound);
        ulong threshold = unchecked(0UL - bound) % bound;
        while (true)
        {
            ulong r = Next();
            if (r >= threshold) return r % bound;
        }
    }

    /// <summary>A uniform integer in [0, bound) for any positive bound: whole 64-bit words, masked, redrawn when too large.</summary>
    public BigInteger NextBelow(BigInteger bound)
    {
        if (bound.Sign <= 0) throw new ArgumentOutOfRangeException(nameof(bound));
        if (bound <= ulong.MaxValue) return NextBelow((ulong)bound);
        long bits = (long)bound.GetBitLength();
        int words = (int)((bits + 63) / 64);
        var mask = (BigInteger.One << (int)bits) - 1;
        while (true)
        {
            BigInteger r = 0;
            for (int w = 0; w < words; w++) r = (r << 64) | Next();
            r &= mask;
            if (r < bound) return r;
        }
    }

    /// <summary>True with probability exactly q (0 &lt;= q &lt;= 1): a uniform draw below q's denominator is below its numerator.</summary>
    public bool NextBernoulli(Rational q)
    {
        if (q.Sign < 0 || q.CompareTo(Rational.One) > 0) throw new ArgumentOutOfRangeException(nameof(q));
        return NextBelow(q.Denominator) < q.Numerator;
    }
}
