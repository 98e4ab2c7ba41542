using System.Numerics;

namespace FlowCheck.Tests;

/// <summary>The checker's exact arithmetic: rationals, prime fields and its primality test.</summary>
public class ArithmeticTests
{
    [Theory]
    [InlineData("3", "3")]
    [InlineData("-3", "-3")]
    [InlineData("6/4", "3/2")]
    [InlineData("-6/4", "-3/2")]
    [InlineData("0/5", "0")]
    [InlineData("-0", "0")]
    [InlineData("0.25", "1/4")]
    [InlineData("-0.25", "-1/4")]
    [InlineData("-2.50", "-5/2")]
    [InlineData("10.0", "10")]
    [InlineData("007", "7")]
    [InlineData("123456789012345678901234567890/10", "12345678901234567890123456789")]
    public void WeightsAreReadExactly(string text, string canonical) =>
        Assert.Equal(canonical, Rational.ParseWeight(text).ToString());

    [Theory]
    [InlineData("")]
    [InlineData("1/0")]
    [InlineData("1/-2")]
    [InlineData("+1")]
    [InlineData("1.")]
    [InlineData(".5")]
    [InlineData("1e2")]
    [InlineData("1 ")]
    [InlineData("1\n")]
    [InlineData("--1")]
    [InlineData("1/2/3")]
    [InlineData("\u0661")]
    public void MalformedWeightsAreRefused(string text) => Assert.Null(Rational.ParseWeight(text));

    [Theory]
    [InlineData("1", true)]
    [InlineData("-7/3", true)]
    [InlineData("0", true)]
    [InlineData("2/4", false)]
    [InlineData("3/1", false)]
    [InlineData("-0", false)]
    [InlineData("01", false)]
    [InlineData("0.5", false)]
    [InlineData("4/-2", false)]
    public void CanonicalFormIsExactlyOneSpelling(string text, bool canonical) =>
        Assert.Equal(canonical, Rational.ParseCanonical(text) is not null);

    [Fact]
    public void RationalOperations()
    {
        var half = new Rational(1, 2);
        var third = new Rational(-1, 3);
        Assert.Equal(new Rational(1, 6), half + third);
        Assert.Equal(new Rational(-1, 6), half * third);
        Assert.Equal(new Rational(2, -4), new Rational(-1, 2));
        Assert.Equal("-1/2", new Rational(3, -6).ToString());
    }

    [Theory]
    [InlineData("F2", "1", "1", "0", "1", "1")]
    [InlineData("F3", "2", "2", "1", "1", "2")]
    [InlineData("F5", "3", "4", "2", "2", "2")]
    [InlineData("F7", "3", "5", "1", "1", "5")]
    [InlineData("Q", "3", "-1/2", "5/2", "-3/2", "1/3")]
    public void FieldArithmetic(string field, string a, string b, string sum, string product, string inverseOfA)
    {
        var f = Field.Parse(field);
        var (x, y) = (Rational.ParseCanonical(a)!.Value, Rational.ParseCanonical(b)!.Value);
        Assert.Equal(sum, f.Add(x, y).ToString());
        Assert.Equal(product, f.Mul(x, y).ToString());
        Assert.Equal(inverseOfA, f.Inverse(x).ToString());
        Assert.Equal(field, f.Name);
    }

    [Theory]
    [InlineData("F3", "1/2", "2")]
    [InlineData("F3", "-1/2", "1")]
    [InlineData("F5", "-1", "4")]
    [InlineData("F5", "-7/3", "1")]
    [InlineData("F5", "10", "0")]
    [InlineData("F7", "2/3", "3")]
    [InlineData("Q", "-2/3", "-2/3")]
    public void WeightsReduceIntoTheField(string field, string weight, string reduced) =>
        Assert.Equal(reduced, Field.Parse(field).Reduce(Rational.ParseCanonical(weight)!.Value).ToString());

    [Theory]
    [InlineData("F3", "1/3")]
    [InlineData("F5", "2/25")]
    [InlineData("F2", "-1/6")]
    public void WeightsWithPInTheDenominatorHaveNoValue(string field, string weight) =>
        Assert.Null(Field.Parse(field).Reduce(Rational.ParseCanonical(weight)!.Value));

    [Theory]
    [InlineData("F5", "4", true)]
    [InlineData("F5", "5", false)]
    [InlineData("F5", "0", false)]
    [InlineData("F5", "-1", false)]
    [InlineData("F5", "1/2", false)]
    [InlineData("F5", "04", false)]
    [InlineData("Q", "-1/2", true)]
    [InlineData("Q", "0", false)]
    [InlineData("Q", "2/4", false)]
    public void NonZeroElementsAreCanonical(string field, string text, bool ok) =>
        Assert.Equal(ok, Field.Parse(field).ParseNonZero(text) is not null);

    /// <summary>Small cases against trial division (common practice); the strong pseudoprimes 3215031751
    /// (to bases 2, 3, 5, 7; common practice) and 318665857834031151167461 (to the prime bases up to 37,
    /// "Strong pseudoprimes to twelve prime bases", arXiv:1509.00864) and the Carmichael number 561.</summary>
    [Fact]
    public void PrimalityIsExact()
    {
        for (var n = -3; n < 3000; n++)
        {
            var trial = n >= 2 && Enumerable.Range(2, Math.Max(0, (int)Math.Sqrt(n) - 1)).All(d => n % d != 0);
            Assert.True(trial == Prime.IsPrime(n), $"{n}");
        }
        Assert.False(Prime.IsPrime(561));
        Assert.False(Prime.IsPrime(3215031751));
        var psi12 = BigInteger.Parse("318665857834031151167461");
        Assert.Equal(BigInteger.Parse("399165290221") * BigInteger.Parse("798330580441"), psi12);
        Assert.False(Prime.IsPrime(psi12));
        Assert.True(Prime.IsPrime(2147483647));
        Assert.True(Prime.IsPrime(BigInteger.Parse("18446744073709551557")));
        Assert.False(Prime.IsPrime(BigInteger.Parse("18446744073709551557") * 3));
        Assert.True(Prime.IsPrime(BigInteger.Parse("170141183460469231731687303715884105727")));
    }

    // Printing a 2,000,000-digit number to compare spellings took minutes (issue 12): the canonical test
    // now reads the shape and the reduced denominator. Correctness: the same verdicts as the spelling rule.
    // 200,001 digits keep the test long enough to matter and short enough for mutation testing (the
    // 2,000,001-digit version took 33 s of each mutant's run); speed belongs to bench/, not here.
    [Fact]
    public void ALongNumberIsJudgedWithoutPrintingIt()
    {
        var digits = "7" + string.Concat(Enumerable.Repeat("1234567890", 20_000));
        Assert.Equal(BigInteger.Parse(digits), Rational.ParseCanonical(digits)!.Value.Num);
        Assert.Null(Rational.ParseCanonical("0" + digits));
        Assert.Null(Rational.ParseCanonical(digits + "/" + digits));
        Assert.NotNull(Rational.ParseCanonical("-" + digits + "/3"));
    }

    [Fact]
    public void MessagesCutLongValues()
    {
        Assert.Equal(new string('9', 80) + "...", Json.Cut(new string('9', 81)));
        Assert.Equal("12", Json.Cut("12"));
    }
}
