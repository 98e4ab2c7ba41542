using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>Random elements of the fields under test, drawn from a seeded <see cref="Random"/>.</summary>
public static class FieldSamples
{
    /// <summary>2^61 - 1, a Mersenne prime (OEIS A000043 lists the exponent 61; from memory, confirmed by coreutils factor in PrimalityTests).</summary>
    public const ulong Mersenne61 = (1UL << 61) - 1;

    /// <summary>A random BigInteger of up to <paramref name="bits"/> bits, either sign.</summary>
    public static BigInteger Integer(Random rng, int bits)
    {
        var bytes = new byte[(bits + 7) / 8 + 1];
        rng.NextBytes(bytes);
        bytes[^1] = 0; // non-negative
        var excess = bytes.Length * 8 - 8 - bits;
        if (excess > 0) bytes[^2] &= (byte)(0xFF >> excess);
        var n = new BigInteger(bytes);
        return rng.Next(2) == 0 ? n : -n;
    }

    /// <summary>A random rational: mostly small, sometimes with numerator and denominator of ~100 bits.</summary>
    public static Rational Rational(Random rng)
    {
        int bits = rng.Next(4) switch { 0 => 3, 1 => 10, 2 => 40, _ => 100 };
        var num = Integer(rng, bits);
        var den = BigInteger.Abs(Integer(rng, bits)) + 1;
        return FlowCert.Algebra.Rational.Create(num, den);
    }

    /// <summary>A small rational n/d with |n| &lt;= 5 and 1 &lt;= d &lt;= 4 (keeps matrix entries readable).</summary>
    public static Rational SmallRational(Random rng)
        => FlowCert.Algebra.Rational.Create(rng.Next(-5, 6), rng.Next(1, 5));

    /// <summary>A residue mod p: uniform, with the edge values 0, 1, p-1, p-2 and (p-1)/2 drawn more often.</summary>
    public static ulong Residue(Random rng, ulong p)
    {
        if (rng.Next(8) == 0)
        {
            ulong[] edges = [0, 1 % p, p - 1, p >= 2 ? p - 2 : 0, (p - 1) / 2];
            return edges[rng.Next(edges.Length)];
        }
        return (ulong)rng.NextInt64(0, (long)Math.Min(p, long.MaxValue));
    }

    /// <summary>A uniformly random 64-bit word.</summary>
    public static ulong Word(Random rng) => (ulong)rng.NextInt64() ^ ((ulong)rng.Next(4) << 62);
}
