using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>The --field argument: Q, a prime, or a one-sentence refusal that says what is wrong.</summary>
public class FieldSpecTests
{
    [Theory]
    [InlineData("Q")]
    [InlineData("q")]
    public void QIsTheRationals(string text)
    {
        var spec = FieldSpec.Parse(text);
        Assert.True(spec.IsRationals);
        Assert.Equal("Q", spec.Name);
        Assert.Equal(0UL, spec.Prime);
        Assert.Same(FieldSpec.Rationals, spec);
    }

    [Theory]
    [InlineData("2", 2UL)]
    [InlineData("3", 3UL)]
    [InlineData("F7", 7UL)]
    [InlineData("65537", 65537UL)]
    [InlineData("2305843009213693951", 2305843009213693951UL)]   // 2^61 - 1
    [InlineData("4611686018427387847", 4611686018427387847UL)]   // 2^62 - 57, largest prime below 2^62 (from memory)
    public void PrimesNameTheirField(string text, ulong p)
    {
        var spec = FieldSpec.Parse(text);
        Assert.False(spec.IsRationals);
        Assert.Equal(p, spec.Prime);
        Assert.Equal("F" + p, spec.Name);
        Assert.Equal(spec, FieldSpec.PrimeField(p));
    }

    private static string Refusal(string text) => Assert.Throws<FieldSpecException>(() => FieldSpec.Parse(text)).Message;

    private static void AssertOneSentence(string message)
    {
        Assert.EndsWith(".", message);
        Assert.DoesNotContain(". ", message.TrimEnd('.'));
        Assert.DoesNotContain("\n", message);
    }

    [Theory]
    [InlineData("4")]
    [InlineData("6")]
    [InlineData("9")]
    [InlineData("F6")]
    [InlineData("561")]                   // a Carmichael number
    [InlineData("3215031751")]            // a strong pseudoprime to bases 2, 3, 5, 7
    [InlineData("4611686018427387903")]   // 2^62 - 1
    public void CompositesAreRefusedPointingToCompositeDimensions(string text)
    {
        var m = Refusal(text);
        Assert.Contains("composite", m);
        Assert.Contains("\"Composite dimensions\"", m);
        Assert.Contains(text.TrimStart('F'), m);
        AssertOneSentence(m);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("1")]
    [InlineData("F1")]
    public void ZeroAndOneAreNotPrimes(string text)
    {
        var m = Refusal(text);
        Assert.Contains("not a prime", m);
        AssertOneSentence(m);
    }

    [Theory]
    [InlineData("4611686018427387904")]             // 2^62
    [InlineData("18446744073709551557")]            // 2^64 - 59, a prime, but beyond the supported range
    [InlineData("18446744073709551616")]            // 2^64: does not fit a 64-bit word
    [InlineData("618970019642690137449562111")]     // 2^89 - 1, a Mersenne prime (OEIS A000043, from memory)
    public void HugeNumbersAreRefusedAsTooLarge(string text)
    {
        var m = Refusal(text);
        Assert.Contains("too large", m);
        Assert.Contains("2^62", m);
        AssertOneSentence(m);
    }

    [Theory]
    [InlineData("")]
    [InlineData("F")]
    [InlineData("x")]
    [InlineData("R")]
    [InlineData("-3")]
    [InlineData("+3")]
    [InlineData("3.0")]
    [InlineData(" 3")]
    [InlineData("3 ")]
    [InlineData("f7")]
    [InlineData("F-7")]
    [InlineData("Q2")]
    [InlineData("0x11")]
    [InlineData("\u0663")] // ARABIC-INDIC DIGIT THREE
    public void GarbageIsRefusedAsNotAField(string text)
    {
        var m = Refusal(text);
        Assert.Contains("is not a field", m);
        Assert.Contains($"'{text}'", m);
        AssertOneSentence(m);
    }

    [Fact]
    public void PrimeFieldRefusesCompositesAndOutOfRangeValues()
    {
        Assert.Throws<ArgumentException>(() => FieldSpec.PrimeField(6));
        Assert.Throws<ArgumentException>(() => FieldSpec.PrimeField(1));
        Assert.Throws<ArgumentException>(() => FieldSpec.PrimeField(18446744073709551557UL));
        Assert.Equal("F5", FieldSpec.PrimeField(5).ToString());
    }
}
