using System.Globalization;
using System.Numerics;

namespace FlowCert.Algebra;

/// <summary>
/// Decimal text of a big integer in time close to that of one multiplication, not quadratic:
/// BigInteger.ToString takes about 25 s for a million digits, so long numbers are split at a power of
/// ten near half their length, each half written recursively, the low half padded with zeros
/// (the usual divide-and-conquer radix conversion; common practice).
/// </summary>
internal static class DecimalText
{
    // Below this many bits the built-in conversion is fast enough (and the recursion's base case).
    private const int DirectBits = 1 << 14;

    /// <summary>The decimal text of n: an optional '-' and digits without leading zeros.</summary>
    public static string Of(BigInteger n)
    {
        if (n.GetBitLength() < 64) return ((long)n).ToString(CultureInfo.InvariantCulture); // the common small value, without BigInteger formatting
        if (n.GetBitLength() <= DirectBits) return n.ToString(CultureInfo.InvariantCulture);
        var powers = new List<BigInteger>(); // powers[k] = 10^(Chunk * 2^k)
        var sb = new System.Text.StringBuilder();
        if (n.Sign < 0) { sb.Append('-'); n = -n; }
        powers.Add(BigInteger.Pow(10, Chunk));
        while (powers[^1].GetBitLength() * 2 <= n.GetBitLength() + 1) powers.Add(powers[^1] * powers[^1]);
        Write(sb, n, powers, powers.Count - 1, pad: false);
        return sb.ToString();
    }

    // The number of decimal digits in the smallest piece written directly.
    private const int Chunk = 1 << 12;

    // Writes n < 10^(Chunk * 2^(level+1)) (when padded, exactly Chunk * 2^(level+1) digits).
    private static void Write(System.Text.StringBuilder sb, BigInteger n, List<BigInteger> powers, int level, bool pad)
    {
        if (level < 0)
        {
            var text = n.ToString(CultureInfo.InvariantCulture);
            if (pad) sb.Append('0', Chunk - text.Length);
            sb.Append(text);
            return;
        }
        if (!pad && n < powers[level]) { Write(sb, n, powers, level - 1, false); return; }
        var high = BigInteger.DivRem(n, powers[level], out var low);
        Write(sb, high, powers, level - 1, pad);
        Write(sb, low, powers, level - 1, true);
    }
}
