using System.Globalization;
using System.Numerics;
using FlowCert.Algebra.Factoring;
using FlowCert.Tests.Algebra;

namespace FlowCert.Tests.Algebra.Factoring;

/// <summary>
/// IntegerFactoring and BigPrimality against known factorisations and against coreutils <c>factor</c>
/// (an independent factoring program; Debian package coreutils).
/// </summary>
public class IntegerFactoringTests
{
    // Primes of 20, 21, 25 and 30 digits (chosen as the next primes after 3 * 10^(d-1) + 12345 with
    // python3-sympy's nextprime while writing this test); every test below first has coreutils factor
    // confirm that each of them is prime.
    private static readonly BigInteger P20 = Big("30000000000000012347");
    private static readonly BigInteger P21 = Big("300000000000000012367");
    private static readonly BigInteger P25 = Big("3000000000000000000012367");
    private static readonly BigInteger P30 = Big("300000000000000000000000012371");
    // Primes of 10 digits (same method, from 10^9 + 21, 4 * 10^9 and 10^10).
    private static readonly BigInteger Q10a = Big("1000000033"), Q10b = Big("4000000007"), Q11 = Big("10000000019");

    private static BigInteger Big(string s) => BigInteger.Parse(s, CultureInfo.InvariantCulture);
    private static FactoringBudget Plenty => new(TimeSpan.FromSeconds(60));

    private static void AssertPrimeByCoreutils(params BigInteger[] numbers)
    {
        foreach (var (n, f) in CoreutilsFactor.Of(numbers))
            Assert.True(f.Length == 1 && f[0] == n, $"coreutils factor says {n} is not prime: {string.Join(" ", f)}");
    }

    /// <summary>Every listed factor divides the value, and dividing all of them out fully leaves 1.</summary>
    private static void AssertAccountsForValue(Factorisation f)
    {
        var m = BigInteger.Abs(f.Value);
        foreach (var d in f.Primes.Concat(f.ProbablePrimes).Concat(f.Unfactored))
        {
            Assert.True(d > 1 && (m % d).IsZero, $"{d} does not divide what is left of {f.Value}");
            while ((m % d).IsZero) m /= d;
        }
        Assert.Equal(BigInteger.One, m);
    }

    [Fact]
    public void FermatF5IsThe641Times6700417()
    {
        // F5 = 2^32 + 1 = 641 * 6700417 (common knowledge).
        var f = IntegerFactoring.Factor((BigInteger.One << 32) + 1, Plenty);
        Assert.Equal([641, 6700417], f.Primes.Select(p => (long)p).ToArray());
        Assert.True(f.IsComplete);
        AssertAccountsForValue(f);
    }

    [Fact]
    public void ProductsOfLargeKnownPrimesWithSmallerOnesAreSplitExactly()
    {
        AssertPrimeByCoreutils(P20, P21, P25, P30, Q10a, Q10b, Q11);
        var cases = new (BigInteger[] Primes, int[] Powers)[]
        {
            ([P20, 641, 6700417], [1, 1, 1]),          // a 20-digit prime (above 2^64: a probable prime) times F5's factors
            ([2, 3, P25, Q10a], [5, 2, 1, 1]),         // rho on BigInteger finds the 10-digit prime
            ([P30, Q10b, 65537], [1, 1, 2]),
            ([Q10a, Q11], [1, 1]),                     // a 20-digit semiprime: 64-bit rho is not enough (above 2^63), BigInteger rho splits it
            ([Q10a, Q10b], [1, 1]),                    // below 2^63: the 64-bit rho
        };
        foreach (var (primes, powers) in cases)
        {
            var n = primes.Zip(powers).Aggregate(BigInteger.One, (a, pk) => a * BigInteger.Pow(pk.First, pk.Second));
            var f = IntegerFactoring.Factor(-n, Plenty);
            Assert.Equal(-n, f.Value);
            Assert.Empty(f.Unfactored);
            var expected = primes.Order().ToArray();
            // Factors of 2^64 or more can only be probable primes (Baillie-PSW); below, proven.
            Assert.Equal(expected.Where(p => p < BigInteger.One << 64), f.Primes);
            Assert.Equal(expected.Where(p => p >= BigInteger.One << 64), f.ProbablePrimes);
            AssertAccountsForValue(f);
        }
    }

    [Fact]
    public void TwoLargePrimesWithATinyBudgetAreReportedUnfactored()
    {
        AssertPrimeByCoreutils(P20, P21);
        var n = P20 * P21 * 12;
        var f = IntegerFactoring.Factor(n, new FactoringBudget(TimeSpan.FromMilliseconds(50)));
        Assert.Equal([2, 3], f.Primes.Select(p => (int)p).ToArray());
        Assert.Empty(f.ProbablePrimes);
        Assert.Equal([P20 * P21], f.Unfactored);
        Assert.False(f.IsComplete);
        AssertAccountsForValue(f);
    }

    [Fact]
    public void PerfectPowersOfLargePrimesAreFound()
    {
        AssertPrimeByCoreutils(Q10a, P20);
        // With no time for rho at all, a perfect power is still taken apart by its integer root.
        var f = IntegerFactoring.Factor(BigInteger.Pow(Q10a, 4), new FactoringBudget(TimeSpan.Zero));
        Assert.Equal([Q10a], f.Primes);
        Assert.True(f.IsComplete);
        AssertAccountsForValue(f);
        var g = IntegerFactoring.Factor(BigInteger.Pow(P20, 3), new FactoringBudget(TimeSpan.Zero));
        Assert.Equal([P20], g.ProbablePrimes);
        AssertAccountsForValue(g);
    }

    [Fact]
    public void AgreesWithCoreutilsFactorOnSeededNumbersUpTo2To80()
    {
        var rng = new Random(1010);
        var numbers = new List<BigInteger>();
        for (int i = 0; i < 60; i++)
        {
            var bytes = new byte[1 + rng.Next(10)];
            rng.NextBytes(bytes);
            var n = new BigInteger(bytes, isUnsigned: true);
            if (n > 1) numbers.Add(n);
        }
        var reference = CoreutilsFactor.Of(numbers);
        foreach (var n in numbers.Distinct())
        {
            var f = IntegerFactoring.Factor(n, Plenty);
            Assert.Empty(f.Unfactored);
            var expected = reference[n].Distinct().Order().ToArray();
            Assert.Equal(expected, f.Primes.Concat(f.ProbablePrimes).Order().ToArray());
            AssertAccountsForValue(f);
        }
    }

    [Fact]
    public void BailliePswSeparatesPrimesFromCompositesAbove2To64()
    {
        AssertPrimeByCoreutils(P20, P21, P25, P30);
        foreach (var p in new[] { P20, P21, P25, P30 })
            Assert.Equal(PrimalityVerdict.ProbablePrime, BigPrimality.Test(p));
        // Composites above 2^64 with no small factor, including a square (the Lucas part refuses squares).
        foreach (var c in new[] { P20 * P21, P20 * P20, Q10a * Q10b * Q11, P25 * P30 })
            Assert.Equal(PrimalityVerdict.Composite, BigPrimality.Test(c));
        // Below 2^64 the answer is exact: the named numbers of the primality tests, with their sources there.
        foreach (var (n, prime) in PrimalityTests.Named)
            Assert.Equal(prime ? PrimalityVerdict.Prime : PrimalityVerdict.Composite, BigPrimality.Test(n));
    }

    [Fact]
    public void IntegerRootIsTheFloorOfTheRoot()
    {
        var rng = new Random(77);
        for (int i = 0; i < 200; i++)
        {
            var bytes = new byte[1 + rng.Next(20)];
            rng.NextBytes(bytes);
            var n = new BigInteger(bytes, isUnsigned: true);
            int k = 2 + rng.Next(5);
            var r = BigPrimality.IntegerRoot(n, k);
            Assert.True(BigInteger.Pow(r, k) <= n && BigInteger.Pow(r + 1, k) > n, $"root {k} of {n}: {r}");
        }
    }
}
