using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// Primality.IsPrime against a sieve of Eratosthenes, against coreutils <c>factor</c> (an independent
/// factoring program), and on the composites that fool weaker tests: Carmichael numbers and strong
/// pseudoprimes.
/// </summary>
public class PrimalityTests
{
    private const int SieveLimit = 100_000;

    [Fact]
    public void AgreesWithASieveUpTo100000()
    {
        var composite = new bool[SieveLimit + 1];
        composite[0] = composite[1] = true;
        for (int i = 2; (long)i * i <= SieveLimit; i++)
            if (!composite[i])
                for (int j = i * i; j <= SieveLimit; j += i) composite[j] = true;
        for (int n = 0; n <= SieveLimit; n++)
            Assert.True(!composite[n] == Primality.IsPrime((ulong)n), $"IsPrime({n}) should be {!composite[n]}");
    }

    private static bool PrimeByFactor(Dictionary<BigInteger, BigInteger[]> f, BigInteger n) => f[n].Length == 1;

    /// <summary>Strong probable prime to base a (the Miller-Rabin round), written independently over BigInteger.</summary>
    private static bool StrongProbablePrime(BigInteger n, BigInteger a)
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

    /// <summary>Named numbers and whether they are prime, each with its source; BigPrimality's tests below 2^64 use them too.</summary>
    internal static readonly (ulong N, bool Prime)[] Named =
    [
        ((1UL << 31) - 1, true),            // Mersenne prime M31 (OEIS A000043, from memory)
        ((1UL << 61) - 1, true),            // Mersenne prime M61 (OEIS A000043, from memory)
        ((1UL << 62) - 57, true),           // largest prime below 2^62 (from memory)
        (ulong.MaxValue - 58, true),        // 2^64 - 59, the largest prime below 2^64 (from memory)
        (1_000_000_007, true),              // common practice
        (998_244_353, true),                // 119 * 2^23 + 1 (common practice)
        ((1UL << 62) - 1, false),           // 3 divides 2^(2k) - 1
        (ulong.MaxValue, false),            // 2^64 - 1 = 3 * 5 * 17 * 257 * 641 * 65537 * 6700417
        ((1UL << 59) - 1, false),           // 2^59 - 1 is not a Mersenne prime (179951 divides it; from memory)
        (4_294_967_297, false),             // F5 = 641 * 6700417 (common practice)
        (4_294_967_291UL * 4_294_967_279UL, false), // product of the two largest primes below 2^32 (from memory)
    ];

    public static TheoryData<ulong, bool> NamedNumbers()
    {
        var data = new TheoryData<ulong, bool>();
        foreach (var (n, prime) in Named) data.Add(n, prime);
        return data;
    }

    [Theory]
    [MemberData(nameof(NamedNumbers))]
    public void NamedPrimesAndCompositesAreClassifiedAsCoreutilsFactorSays(ulong n, bool prime)
    {
        var f = CoreutilsFactor.Of([n]);
        Assert.Equal(prime, PrimeByFactor(f, n)); // the value remembered above is right
        // Do not take factor's word for primality: a composite is proved by its factors (their product is
        // checked in Factor), a prime by a Pratt certificate checked here with BigInteger.
        if (prime) Assert.True(ProvePrime(n), $"no primality certificate for {n}");
        Assert.Equal(prime, Primality.IsPrime(n));
    }

    private static bool TrialDivisionPrime(ulong n)
    {
        if (n < 2) return false;
        for (ulong d = 2; d * d <= n; d++) if (n % d == 0) return false;
        return true;
    }

    private static bool TrialDivisionPrime(BigInteger n)
    {
        if (n <= ulong.MaxValue >> 2) return TrialDivisionPrime((ulong)n);
        if (n < 2) return false;
        for (BigInteger d = 2; d * d <= n; d++) if ((n % d).IsZero) return false;
        return true;
    }

    /// <summary>
    /// Lucas' converse of Fermat (a Pratt certificate, "Every prime has a succinct certificate",
    /// SIAM J. Comput. 4 (1975), doi:10.1137/0204018, reference from memory): n is prime when some a has a^(n-1) = 1 mod n and
    /// a^((n-1)/q) != 1 mod n for every prime q dividing n - 1. The factors of n - 1 come from coreutils
    /// factor and are proved prime the same way, down to trial division below 2^32.
    /// </summary>
    private static bool ProvePrime(BigInteger n)
    {
        if (n < (BigInteger.One << 32)) return TrialDivisionPrime(n);
        var qs = CoreutilsFactor.Of([n - 1])[n - 1].Distinct().ToArray();
        if (!qs.All(ProvePrime)) return false;
        for (BigInteger a = 2; a < 1000; a++)
            if (BigInteger.ModPow(a, n - 1, n).IsOne && qs.All(q => !BigInteger.ModPow(a, (n - 1) / q, n).IsOne))
                return true;
        return false;
    }

    [Theory]
    [InlineData(31, true)]
    [InlineData(61, true)]
    [InlineData(89, true)]
    [InlineData(59, false)]
    [InlineData(67, false)]
    public void MersenneNumbersAgreeWithTheLucasLehmerTest(int exponent, bool prime)
    {
        // Lucas-Lehmer (common practice): for an odd prime q, 2^q - 1 is prime iff s_(q-2) = 0 with
        // s_0 = 4, s_(k+1) = s_k^2 - 2 mod 2^q - 1. The expected column is from memory (OEIS A000043).
        var m = (BigInteger.One << exponent) - 1;
        BigInteger s = 4;
        for (int k = 0; k < exponent - 2; k++) s = (s * s - 2) % m;
        Assert.Equal(prime, s.IsZero);
        if (exponent < 64) Assert.Equal(prime, Primality.IsPrime((ulong)m));
    }

    [Fact]
    public void CarmichaelNumbersAreComposite()
    {
        // Carmichael numbers (OEIS A002997, from memory): a^(n-1) = 1 mod n for every a coprime to n,
        // so a Fermat test alone calls them prime. Korselt's criterion is re-checked here: n squarefree,
        // and p - 1 divides n - 1 for every prime p dividing n.
        BigInteger[] carmichael = [561, 1105, 1729, 2465, 2821, 6601, 8911, 10585, 15841, 29341, 41041, 62745, 63973, 75361, 101101, 126217, 172081, 188461, 252601, 278545, 294409, 314821, 334153, 340561, 399001, 410041, 449065, 488881, 512461];
        var f = CoreutilsFactor.Of(carmichael);
        foreach (var n in carmichael)
        {
            var primes = f[n];
            Assert.True(primes.Length >= 3, $"{n} is not a product of at least three primes");
            Assert.Equal(primes.Length, primes.Distinct().Count());
            Assert.All(primes, p => Assert.True((n - 1) % (p - 1) == 0, $"{p} - 1 does not divide {n} - 1"));
            Assert.False(Primality.IsPrime((ulong)n), $"IsPrime({n}) on a Carmichael number");
        }
    }

    [Fact]
    public void StrongPseudoprimesAreComposite()
    {
        // Strong pseudoprimes to base 2 (OEIS A001262, from memory) and the least strong pseudoprimes to
        // the first k prime bases (OEIS A014233, from memory; "Strong pseudoprimes to twelve prime bases",
        // arXiv:1509.00864, reference from memory). Each is re-checked to really pass those Miller-Rabin rounds and to be composite.
        (BigInteger N, int[] Bases)[] cases =
        [
            (2047, [2]), (3277, [2]), (4033, [2]), (4681, [2]), (8321, [2]), (15841, [2]), (29341, [2]),
            (42799, [2]), (49141, [2]), (52633, [2]), (65281, [2]), (74665, [2]), (80581, [2]), (85489, [2]),
            (1373653, [2, 3]),
            (25326001, [2, 3, 5]),
            (3215031751, [2, 3, 5, 7]),
            (2152302898747, [2, 3, 5, 7, 11]),
            (3474749660383, [2, 3, 5, 7, 11, 13]),
            (341550071728321, [2, 3, 5, 7, 11, 13, 17]),
            (3825123056546413051, [2, 3, 5, 7, 11, 13, 17, 19, 23]),
        ];
        var f = CoreutilsFactor.Of(cases.Select(c => c.N));
        foreach (var (n, bases) in cases)
        {
            Assert.True(f[n].Length > 1, $"{n} is prime according to factor");
            Assert.All(bases, a => Assert.True(StrongProbablePrime(n, a), $"{n} is not a strong pseudoprime to base {a}"));
            Assert.False(Primality.IsPrime((ulong)n), $"IsPrime({n}) on a strong pseudoprime");
        }
    }

    [Fact]
    public void AgreesWithCoreutilsFactorOnRandom64BitNumbersAndSemiprimes()
    {
        var rng = new Random(9001);
        // Primes near 2^31..2^32 found by trial division (independent of the code under test).
        ulong RandomPrime32()
        {
            while (true)
            {
                ulong c = (1UL << 31) + (ulong)rng.NextInt64(0, 1L << 31);
                if (TrialDivisionPrime(c)) return c;
            }
        }
        var numbers = new List<BigInteger>();
        for (int i = 0; i < 150; i++) numbers.Add(FieldSamples.Word(rng) | 1);
        for (int i = 0; i < 60; i++) numbers.Add((BigInteger)RandomPrime32() * RandomPrime32());
        for (int i = 0; i < 40; i++)
        {
            // Numbers of the form (k+1)(2k+1) with both factors prime are hard cases for base-2 tests.
            ulong k = (ulong)rng.NextInt64(1, 1L << 30);
            if (TrialDivisionPrime(k + 1) && TrialDivisionPrime(2 * k + 1)) numbers.Add((BigInteger)(k + 1) * (2 * k + 1));
        }
        // Primes just below 2^64, found by walking down with factor as the judge.
        for (ulong n = ulong.MaxValue - 400; n < ulong.MaxValue; n += 2) numbers.Add(n);
        var f = CoreutilsFactor.Of(numbers);
        int primes = 0;
        foreach (var n in numbers.Distinct())
        {
            bool expected = PrimeByFactor(f, n);
            primes += expected ? 1 : 0;
            Assert.True(expected == Primality.IsPrime((ulong)n), $"IsPrime({n}) should be {expected}");
        }
        Assert.InRange(primes, 5, numbers.Count - 60); // the sample really contains both kinds
    }
}
