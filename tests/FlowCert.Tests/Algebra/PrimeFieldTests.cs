using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// F_p arithmetic and the word-sized modular helpers compared with System.Numerics.BigInteger, which
/// computes the same residues by a different route (arbitrary precision, no 128-bit tricks).
/// </summary>
public class PrimeFieldTests
{
    public static TheoryData<ulong> Primes => new() { 2, 3, 5, 7919, FieldSamples.Mersenne61, (1UL << 62) - 57 };

    [Theory]
    [MemberData(nameof(Primes))]
    public void OperationsAgreeWithBigIntegerResidues(ulong p)
    {
        var f = new PrimeField(p);
        var rng = new Random(unchecked((int)p) ^ 0x5eed);
        BigInteger P = p;
        for (int t = 0; t < 3000; t++)
        {
            ulong a = FieldSamples.Residue(rng, p), b = FieldSamples.Residue(rng, p);
            Assert.Equal((ulong)((a + (BigInteger)b) % P), f.Add(a, b));
            Assert.Equal((ulong)(((a - (BigInteger)b) % P + P) % P), f.Subtract(a, b));
            Assert.Equal((ulong)((a * (BigInteger)b) % P), f.Multiply(a, b));
            Assert.Equal((ulong)((P - a) % P), f.Negate(a));
            if (a != 0)
                // Fermat's little theorem: a^(p-2) is the inverse of a (common practice).
                Assert.Equal((ulong)BigInteger.ModPow(a, P - 2, P), f.Inverse(a));
        }
    }

    [Fact]
    public void MulModAgreesWithBigIntegerOnFull64BitWords()
    {
        var rng = new Random(2024);
        for (int t = 0; t < 20000; t++)
        {
            ulong a = FieldSamples.Word(rng), b = FieldSamples.Word(rng), m = FieldSamples.Word(rng) | 1;
            if (t % 5 == 0) m = ulong.MaxValue - (ulong)rng.Next(1000);
            Assert.Equal((ulong)((BigInteger)a * b % m), Primality.MulMod(a, b, m));
        }
        Assert.Equal((ulong)((BigInteger)ulong.MaxValue * ulong.MaxValue % (ulong.MaxValue - 1)),
            Primality.MulMod(ulong.MaxValue, ulong.MaxValue, ulong.MaxValue - 1));
    }

    [Fact]
    public void PowModAgreesWithBigIntegerModPow()
    {
        var rng = new Random(77);
        for (int t = 0; t < 3000; t++)
        {
            ulong b = FieldSamples.Word(rng), e = FieldSamples.Word(rng), m = FieldSamples.Word(rng) | 1;
            if (t % 7 == 0) e = (ulong)rng.Next(3);
            Assert.Equal((ulong)BigInteger.ModPow(b, e, m), Primality.PowMod(b, e, m));
        }
        Assert.Equal(0UL, Primality.PowMod(5, 0, 1)); // everything is 0 mod 1
    }

    [Theory]
    [MemberData(nameof(Primes))]
    public void RationalsMapToNumeratorTimesInverseDenominator(ulong p)
    {
        var f = new PrimeField(p);
        var rng = new Random(unchecked((int)(p * 31)));
        BigInteger P = p;
        for (int t = 0; t < 1000; t++)
        {
            var r = FieldSamples.Rational(rng);
            if (r.Denominator % P == 0)
            {
                var e = Assert.Throws<NotInFieldException>(() => f.FromRational(r));
                Assert.Contains(r.ToString(), e.Message);
                continue;
            }
            var num = ((r.Numerator % P) + P) % P;
            var expected = num * BigInteger.ModPow(r.Denominator % P, P - 2, P) % P;
            Assert.Equal((ulong)expected, f.FromRational(r));
        }
    }

    [Fact]
    public void AWeightWhoseDenominatorPDividesHasNoImage()
    {
        var f3 = new PrimeField(3);
        Assert.Throws<NotInFieldException>(() => f3.FromRational(Rational.Create(1, 3)));
        Assert.Throws<NotInFieldException>(() => f3.FromRational(Rational.Create(-5, 12)));
        Assert.Equal(2UL, f3.FromRational(Rational.Create(1, 2)));   // 2 * 2 = 4 = 1 mod 3
        Assert.Equal(0UL, f3.FromRational(Rational.Create(3, 4)));   // 0.75 vanishes in F_3
        Assert.Equal(1UL, new PrimeField(2).FromRational(Rational.Create(-1, 1)));
    }

    [Theory]
    [InlineData(7UL, "6", true)]
    [InlineData(7UL, "0", true)]
    [InlineData(7UL, "7", false)]
    [InlineData(7UL, "07", false)]
    [InlineData(7UL, "-1", false)]
    [InlineData(7UL, "+1", false)]
    [InlineData(7UL, " 1", false)]
    [InlineData(7UL, "", false)]
    [InlineData(2305843009213693951UL, "2305843009213693950", true)]
    [InlineData(2305843009213693951UL, "2305843009213693951", false)]
    [InlineData(2305843009213693951UL, "99999999999999999999999", false)]
    public void ElementTextIsTheResidueInDecimalWithoutLeadingZeros(ulong p, string text, bool accepted)
    {
        Assert.Equal(accepted, new PrimeField(p).TryParse(text, out var v));
        if (accepted) Assert.Equal(text, new PrimeField(p).Format(v));
    }

    [Theory]
    [InlineData(0UL)]
    [InlineData(1UL)]
    [InlineData(4UL)]
    [InlineData(561UL)]
    [InlineData(4611686018427387847UL + 1)]
    [InlineData(18446744073709551557UL)] // 2^64 - 59 is prime (from memory; coreutils factor agrees) but not below 2^62
    public void OnlyPrimesBelow2To62MakeAField(ulong p)
        => Assert.Throws<ArgumentException>(() => new PrimeField(p));
}
