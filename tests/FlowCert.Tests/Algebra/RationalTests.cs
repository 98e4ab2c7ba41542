using System.Globalization;
using System.Numerics;
using FlowCert.Algebra;
using Fractions;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// Exact rationals: the weight syntax of docs/formats.md, the canonical text, and arithmetic, with the
/// Fractions NuGet package as the independent reference for values.
/// </summary>
public class RationalTests
{
    private static Fraction Reference(Rational r) => new(r.Numerator, r.Denominator);

    private static void AssertSameValue(Fraction expected, Rational actual, string context)
        => Assert.True(expected.Numerator * actual.Denominator == actual.Numerator * expected.Denominator,
            $"{context}: expected {expected}, got {actual}");

    private static void AssertCanonical(Rational r)
    {
        Assert.True(r.Denominator.Sign > 0, $"{r}: denominator not positive");
        Assert.True(BigInteger.GreatestCommonDivisor(r.Numerator, r.Denominator).IsOne, $"{r}: not reduced");
        if (r.IsZero) Assert.True(r.Denominator.IsOne, "zero is 0/1");
    }

    [Theory]
    [InlineData("0.25", "1/4")]
    [InlineData("-1/2", "-1/2")]
    [InlineData("2/4", "1/2")]
    [InlineData("-6/3", "-2")]
    [InlineData("0/7", "0")]
    [InlineData("-0", "0")]
    [InlineData("-0.0", "0")]
    [InlineData("1.50", "3/2")]
    [InlineData("007", "7")]
    [InlineData("-0.125", "-1/8")]
    [InlineData("3/1", "3")]
    [InlineData("12/-0", null)]
    [InlineData("123456789012345678901234567890/10", "12345678901234567890123456789")]
    public void WeightsAreReadExactlyAndWrittenReduced(string text, string? canonical)
    {
        bool ok = Rational.TryParse(text, out var r);
        Assert.Equal(canonical is not null, ok);
        if (!ok) return;
        AssertCanonical(r);
        Assert.Equal(canonical, r.ToString());
        AssertSameValue(Fraction.FromString(text, CultureInfo.InvariantCulture), r, text);
    }

    [Theory]
    [InlineData("1/0")]
    [InlineData("-3/0")]
    [InlineData("1.")]
    [InlineData(".5")]
    [InlineData("-.5")]
    [InlineData("+1")]
    [InlineData("1e3")]
    [InlineData("1E3")]
    [InlineData("")]
    [InlineData("-")]
    [InlineData("--1")]
    [InlineData("1/")]
    [InlineData("/2")]
    [InlineData("1/-2")]
    [InlineData("1/2/3")]
    [InlineData("1.2.3")]
    [InlineData("1/2.5")]
    [InlineData("1.5/2")]
    [InlineData(" 1")]
    [InlineData("1 ")]
    [InlineData("0x10")]
    [InlineData("1,5")]
    [InlineData("\u0661")] // ARABIC-INDIC DIGIT ONE: the format is ASCII only
    [InlineData("NaN")]
    [InlineData("Infinity")]
    public void MalformedWeightsAreRejected(string text)
        => Assert.False(Rational.TryParse(text, out _), $"'{text}' should be rejected");

    [Fact]
    public void RandomIntegerFractionAndDecimalTextsReadTheSameValueAsFractions()
    {
        var rng = new Random(31337);
        string Digits(int max) => string.Concat(Enumerable.Range(0, rng.Next(1, max + 1)).Select(_ => (char)('0' + rng.Next(10))));
        for (int t = 0; t < 3000; t++)
        {
            var sign = rng.Next(2) == 0 ? "-" : "";
            var text = rng.Next(3) switch
            {
                0 => sign + Digits(25),
                1 => sign + Digits(25) + "/" + (rng.Next(1, 1_000_000)).ToString(CultureInfo.InvariantCulture),
                _ => sign + Digits(12) + "." + Digits(12),
            };
            Assert.True(Rational.TryParse(text, out var r), text);
            AssertCanonical(r);
            AssertSameValue(Fraction.FromString(text, CultureInfo.InvariantCulture), r, text);
            // The canonical text reads back to the same number and is a fixed point.
            Assert.True(Rational.TryParse(r.ToString(), out var back));
            Assert.Equal(r, back);
            Assert.Equal(r.ToString(), back.ToString());
        }
    }

    [Fact]
    public void ArithmeticAgreesWithFractions()
    {
        var rng = new Random(4242);
        for (int t = 0; t < 3000; t++)
        {
            Rational a = FieldSamples.Rational(rng), b = FieldSamples.Rational(rng);
            Fraction fa = Reference(a), fb = Reference(b);
            foreach (var (name, actual, expected) in new[]
            {
                ("+", a + b, fa + fb), ("-", a - b, fa - fb), ("*", a * b, fa * fb), ("neg", -a, -fa),
            })
            {
                AssertCanonical(actual);
                AssertSameValue(expected, actual, $"{a} {name} {b}");
            }
            if (!b.IsZero)
            {
                AssertCanonical(a / b);
                AssertSameValue(fa / fb, a / b, $"{a} / {b}");
                AssertSameValue(Fraction.One / fb, b.Reciprocal(), $"1 / {b}");
            }
            Assert.Equal(Math.Sign(fa.CompareTo(fb)), Math.Sign(a.CompareTo(b)));
            Assert.Equal(a == b, fa.CompareTo(fb) == 0);
            if (a == b) Assert.Equal(a.GetHashCode(), b.GetHashCode());
        }
    }

    [Fact]
    public void CreateNormalisesSignAndRejectsZeroDenominators()
    {
        Assert.Equal("-3/4", Rational.Create(6, -8).ToString());
        Assert.Equal("3/4", Rational.Create(-6, -8).ToString());
        Assert.Equal("0", Rational.Create(0, -5).ToString());
        Assert.Equal(Rational.Zero, Rational.Create(0, 12345));
        Assert.Throws<DivideByZeroException>(() => Rational.Create(1, 0));
        Assert.Throws<DivideByZeroException>(() => Rational.One / Rational.Zero);
        Assert.Throws<DivideByZeroException>(() => Rational.Zero.Reciprocal());
        Assert.Equal(Rational.Zero, default);
        Assert.Equal("0", default(Rational).ToString());
        Assert.Equal(BigInteger.One, default(Rational).Denominator);
    }

    [Theory]
    [InlineData("1/2", true)]
    [InlineData("-7", true)]
    [InlineData("0", true)]
    [InlineData("2/4", false)]
    [InlineData("0.5", false)]
    [InlineData("-0", false)]
    [InlineData("4/1", false)]
    public void TheFieldQAcceptsOnlyCanonicalElementText(string text, bool accepted)
        => Assert.Equal(accepted, default(RationalField).TryParse(text, out _));
}
