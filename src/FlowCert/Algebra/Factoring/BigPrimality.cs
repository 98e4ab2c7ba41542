using System.Numerics;

namespace FlowCert.Algebra.Factoring;

/// <summary>How much a primality test has shown about an integer.</summary>
public enum PrimalityVerdict
{
    /// <summary>Shown to be composite.</summary>
    Composite,
    /// <summary>Proven prime (below 2^64 the Miller-Rabin bases of <see cref="Primality"/> are exact).</summary>
    Prime,
    /// <summary>Passed the Baillie-PSW test (no composite is known to pass it, but that is not a proof).</summary>
    ProbablePrime,
}

/// <summary>
/// Primality of arbitrary integers: exact below 2^64 (<see cref="Primality.IsPrime"/>), and the Baillie-PSW
/// test above (a strong Fermat test to base 2 and a strong Lucas test with Selfridge's parameters; published
/// as "Lucas pseudoprimes", Math. Comp. 35 (1980) 1391-1417, doi:10.2307/2006406).
/// </summary>
public static class BigPrimality
{
    private static readonly BigInteger Two64 = BigInteger.One << 64;
    private static readonly int[] SmallPrimes = [2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37, 41, 43, 47];

    /// <summary>Classifies n (values below 2 are composite here: they are not prime).</summary>
    public static PrimalityVerdict Test(BigInteger n)
    {
        if (n < 2) return PrimalityVerdict.Composite;
        if (n < Two64) return Primality.IsPrime((ulong)n) ? PrimalityVerdict.Prime : PrimalityVerdict.Composite;
        foreach (var p in SmallPrimes) if ((n % p).IsZero) return PrimalityVerdict.Composite;
        if (!StrongFermat(n, 2)) return PrimalityVerdict.Composite;
        return StrongLucas(n) ? PrimalityVerdict.ProbablePrime : PrimalityVerdict.Composite;
    }

    /// <summary>The strong probable-prime test to base a for odd n &gt; a.</summary>
    internal static bool StrongFermat(BigInteger n, BigInteger a)
    {
        var d = n - 1; int s = 0;
        while (d.IsEven) { d >>= 1; s++; }
        var x = BigInteger.ModPow(a, d, n);
        if (x.IsOne || x == n - 1) return true;
        for (int r = 1; r < s; r++)
        {
            x = x * x % n;
            if (x == n - 1) return true;
        }
        return false;
    }

    /// <summary>The strong Lucas probable-prime test with Selfridge's method A (P = 1, Q = (1 - D)/4) for odd n not a square... or a square (then composite).</summary>
    internal static bool StrongLucas(BigInteger n)
    {
        if (IsSquare(n)) return false;
        BigInteger dd = 5;
        while (true)
        {
            int j = Jacobi(Mod(dd, n), n);
            if (j == -1) break;
            if (j == 0 && BigInteger.Abs(dd) != n) return false; // shares a factor with n
            dd = dd.Sign > 0 ? -(dd + 2) : -dd + 2;
        }
        BigInteger p = 1, q = (1 - dd) / 4;
        var d = n + 1; int s = 0;
        while (d.IsEven) { d >>= 1; s++; }
        BigInteger u = 1, v = p, qk = Mod(q, n);
        long bits = (long)d.GetBitLength();
        for (long i = bits - 2; i >= 0; i--)
        {
            u = u * v % n;
            v = Mod(v * v - 2 * qk, n);
            qk = qk * qk % n;
            if (!(d >> (int)i).IsEven)
            {
                var (u0, v0) = (u, v);
                u = Half(Mod(p * u0 + v0, n), n);
                v = Half(Mod(dd * u0 + p * v0, n), n);
                qk = Mod(qk * q, n);
            }
        }
        if (u.IsZero || v.IsZero) return true;
        for (int r = 1; r < s; r++)
        {
            v = Mod(v * v - 2 * qk, n);
            qk = qk * qk % n;
            if (v.IsZero) return true;
        }
        return false;
    }

    private static BigInteger Mod(BigInteger a, BigInteger n) { var r = a % n; return r.Sign < 0 ? r + n : r; }
    private static BigInteger Half(BigInteger a, BigInteger n) => (a.IsEven ? a : a + n) >> 1;

    /// <summary>The Jacobi symbol (a / n) for odd positive n and 0 &lt;= a.</summary>
    internal static int Jacobi(BigInteger a, BigInteger n)
    {
        a %= n;
        int result = 1;
        while (!a.IsZero)
        {
            while (a.IsEven)
            {
                a >>= 1;
                var r = (int)(n % 8);
                if (r is 3 or 5) result = -result;
            }
            (a, n) = (n, a);
            if (a % 4 == 3 && n % 4 == 3) result = -result;
            a %= n;
        }
        return n.IsOne ? result : 0;
    }

    /// <summary>The largest r with r^k &lt;= n, for n &gt;= 0 and k &gt;= 1 (Newton's method on integers).</summary>
    public static BigInteger IntegerRoot(BigInteger n, int k)
    {
        if (n.Sign < 0) throw new ArgumentOutOfRangeException(nameof(n));
        if (n < 2 || k == 1) return n;
        var x = BigInteger.One << (int)((n.GetBitLength() + k - 1) / k); // x >= root
        while (true)
        {
            var y = ((k - 1) * x + n / BigInteger.Pow(x, k - 1)) / k;
            if (y >= x) return x;
            x = y;
        }
    }

    /// <summary>True when n is a perfect square.</summary>
    public static bool IsSquare(BigInteger n) { var r = IntegerRoot(n, 2); return r * r == n; }
}
