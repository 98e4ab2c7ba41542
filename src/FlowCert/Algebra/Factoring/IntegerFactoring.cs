using System.Numerics;

namespace FlowCert.Algebra.Factoring;

/// <summary>
/// What is known about the prime factors of one integer: the distinct primes found (proven prime), the
/// factors that passed only a probable-prime test, and composite cofactors that could not be split in time.
/// The product of all three lists' members (with multiplicity) is the integer's absolute value.
/// </summary>
public sealed record Factorisation(
    BigInteger Value,
    IReadOnlyList<BigInteger> Primes,
    IReadOnlyList<BigInteger> ProbablePrimes,
    IReadOnlyList<BigInteger> Unfactored)
{
    /// <summary>True when every prime factor is known and proven prime.</summary>
    public bool IsComplete => ProbablePrimes.Count == 0 && Unfactored.Count == 0;
}

/// <summary>
/// Factors integers: trial division by the primes below 2^16, perfect powers, then Pollard's rho with
/// Brent's cycle detection ("An improved Monte Carlo factorization algorithm", BIT 20 (1980) 176-184,
/// doi:10.1007/BF01933190), in 64-bit arithmetic when the cofactor fits and on BigInteger otherwise.
/// The polynomials x^2 + c are tried for c = 1, 2, ... so the same input gives the same steps.
/// </summary>
public static class IntegerFactoring
{
    private const int TrialLimit = 1 << 16;
    private const int Batch = 128;
    private const int MaxPolynomials = 64;
    private static readonly int[] TrialPrimes = Sieve(TrialLimit);

    /// <summary>Factors |n| (n != 0) as far as the budget allows.</summary>
    public static Factorisation Factor(BigInteger n, FactoringBudget budget)
    {
        if (n.IsZero) throw new ArgumentException("0 has no factorisation", nameof(n));
        var value = n;
        n = BigInteger.Abs(n);
        var primes = new SortedSet<BigInteger>();
        var probable = new SortedSet<BigInteger>();
        var unfactored = new List<BigInteger>();
        foreach (var p in TrialPrimes)
        {
            if ((long)p * p > n) break;
            if (!(n % p).IsZero) continue;
            primes.Add(p);
            do n /= p; while ((n % p).IsZero);
        }
        var pending = new Stack<BigInteger>();
        if (n > 1) pending.Push(n);
        while (pending.Count > 0)
        {
            var m = pending.Pop();
            if (m < (long)TrialLimit * TrialLimit) { primes.Add(m); continue; } // no factor below 2^16: prime
            switch (BigPrimality.Test(m))
            {
                case PrimalityVerdict.Prime: primes.Add(m); continue;
                case PrimalityVerdict.ProbablePrime: probable.Add(m); continue;
            }
            var split = PerfectPowerBase(m) ?? Split(m, budget);
            if (split is { } d) { pending.Push(d); pending.Push(m / d); }
            else unfactored.Add(m);
        }
        unfactored.Sort();
        return new Factorisation(value, primes.ToList(), probable.ToList(), unfactored);
    }

    /// <summary>r when m = r^k for some k &gt;= 2, else null.</summary>
    private static BigInteger? PerfectPowerBase(BigInteger m)
    {
        // m has no prime factor below 2^16, so k &lt;= bits / 16.
        for (int k = 2; k <= m.GetBitLength() / 16; k++)
        {
            var r = BigPrimality.IntegerRoot(m, k);
            if (BigInteger.Pow(r, k) == m) return r;
        }
        return null;
    }

    /// <summary>A non-trivial divisor of the composite m, or null when the budget ran out first.</summary>
    internal static BigInteger? Split(BigInteger m, FactoringBudget budget)
    {
        for (int c = 1; c <= MaxPolynomials && !budget.Expired; c++)
        {
            BigInteger? d = m < (BigInteger.One << 63) ? Brent64((ulong)m, (ulong)c, budget) : BrentBig(m, c, budget);
            if (d is null) return null;
            if (d.Value > 1 && d.Value < m) return d;
        }
        return null;
    }

    // Brent's variant of Pollard's rho on x -> x^2 + c mod n: a divisor (n itself on failure), or null on timeout.
    private static BigInteger? BrentBig(BigInteger n, BigInteger c, FactoringBudget budget)
    {
        BigInteger y = 2, x = 2, ys = 2, q = 1, g = 1;
        long r = 1;
        do
        {
            x = y;
            for (long i = 0; i < r; i++)
            {
                y = (y * y + c) % n;
                if ((i & (Batch - 1)) == 0 && budget.Expired) return null;
            }
            long k = 0;
            do
            {
                ys = y;
                for (long i = 0; i < Math.Min(Batch, r - k); i++)
                {
                    y = (y * y + c) % n;
                    q = q * BigInteger.Abs(x - y) % n;
                }
                g = BigInteger.GreatestCommonDivisor(q, n);
                k += Batch;
                if (budget.Expired) return null;
            } while (k < r && g.IsOne);
            r *= 2;
        } while (g.IsOne);
        if (g == n)
            do
            {
                ys = (ys * ys + c) % n;
                g = BigInteger.GreatestCommonDivisor(BigInteger.Abs(x - ys), n);
            } while (g.IsOne);
        return g;
    }

    // The same on words, for n < 2^63.
    private static BigInteger? Brent64(ulong n, ulong c, FactoringBudget budget)
    {
        ulong F(ulong v) { var s = Primality.MulMod(v, v, n) + c; return s >= n ? s - n : s; }
        ulong y = 2, x = 2, ys = 2, q = 1, g = 1;
        long r = 1;
        do
        {
            x = y;
            for (long i = 0; i < r; i++)
            {
                y = F(y);
                if ((i & 4095) == 0 && budget.Expired) return null;
            }
            long k = 0;
            do
            {
                ys = y;
                for (long i = 0; i < Math.Min(Batch, r - k); i++)
                {
                    y = F(y);
                    q = Primality.MulMod(q, x > y ? x - y : y - x, n);
                }
                g = Gcd(q, n);
                k += Batch;
                if ((k & 4095) == 0 && budget.Expired) return null;
            } while (k < r && g == 1);
            r *= 2;
        } while (g == 1);
        if (g == n)
            do
            {
                ys = F(ys);
                g = Gcd(x > ys ? x - ys : ys - x, n);
            } while (g == 1);
        return g;
    }

    private static ulong Gcd(ulong a, ulong b) { while (b != 0) (a, b) = (b, a % b); return a; }

    private static int[] Sieve(int limit)
    {
        var composite = new bool[limit];
        var list = new List<int>();
        for (int i = 2; i < limit; i++)
        {
            if (composite[i]) continue;
            list.Add(i);
            for (long j = (long)i * i; j < limit; j += i) composite[j] = true;
        }
        return list.ToArray();
    }
}
