using System.Numerics;

namespace FlowCheck;

/// <summary>Deterministic primality below <see cref="Limit"/>: Miller-Rabin with the prime bases 2..41.</summary>
public static class Prime
{
    static readonly int[] Bases = [2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37, 41];

    /// <summary>The least strong pseudoprime to all of <see cref="Bases"/> ("Strong pseudoprimes to twelve
    /// prime bases", arXiv:1509.00864; the value from memory, as commonly used); below it the test is exact.</summary>
    public static readonly BigInteger Limit = BigInteger.Parse("3317044064679887385961981");

    public static bool IsPrime(BigInteger n)
    {
        if (n < 2) return false;
        foreach (var b in Bases)
            if (n % b == 0) return n == b;
        var (d, s) = (n - 1, 0);
        while (d.IsEven) { d /= 2; s++; }
        return Bases.All(b => PassesRound(n, d, s, b));
    }

    /// <summary>One strong-probable-prime round: b^d = 1, or b^(d 2^i) = n - 1 for some i &lt; s.</summary>
    static bool PassesRound(BigInteger n, BigInteger d, int s, BigInteger b)
    {
        var x = BigInteger.ModPow(b, d, n);
        if (x.IsOne) return true;
        for (var i = 0; i < s; i++, x = x * x % n) if (x == n - 1) return true;
        return false;
    }
}
