using System.Globalization;
using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>The divide-and-conquer decimal writer against BigInteger.ToString (the runtime's own, the reference).</summary>
public class DecimalTextTests
{
    public static TheoryData<int> Seeds() => [1, 2, 3, 4, 5, 6];

    [Theory]
    [MemberData(nameof(Seeds))]
    public void LongNumbersAreWrittenAsTheRuntimeWritesThem(int seed)
    {
        var random = new Random(seed);
        foreach (var digits in new[] { 1, 4000, 5000, 9000, 20000, 50000 + random.Next(30000) })
        {
            var text = new string(Enumerable.Range(0, digits).Select(i => (char)('0' + (i == 0 ? 1 + random.Next(9) : random.Next(10)))).ToArray());
            var n = BigInteger.Parse(text, CultureInfo.InvariantCulture);
            Assert.Equal(text, DecimalText.Of(n));
            Assert.Equal("-" + text, DecimalText.Of(-n));
        }
    }

    [Fact]
    public void PowersOfTenAndTheirNeighboursKeepTheirZeros()
    {
        foreach (var k in new[] { 4095, 4096, 4097, 8192, 16384, 20000 })
        {
            var p = BigInteger.Pow(10, k);
            foreach (var n in new[] { p - 1, p, p + 1, p * 7 + 3 })
                Assert.Equal(n.ToString(CultureInfo.InvariantCulture), DecimalText.Of(n));
        }
    }
}
