using System.Globalization;
using System.Numerics;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// Prime factors as printed by coreutils <c>factor</c> ("n: p q r"), an independent factoring program
/// (Debian package coreutils), for the primality and factoring tests.
/// </summary>
internal static class CoreutilsFactor
{
    /// <summary>The prime factors, with multiplicity, of each number; their product is checked to be the number.</summary>
    public static Dictionary<BigInteger, BigInteger[]> Of(IEnumerable<BigInteger> numbers)
    {
        var list = numbers.Distinct().ToList();
        var run = ExternalProgram.Run("factor", "coreutils", list.Select(n => n.ToString(CultureInfo.InvariantCulture)));
        Assert.True(run.ExitCode == 0, $"factor failed: {run.Stderr}");
        var result = new Dictionary<BigInteger, BigInteger[]>();
        foreach (var line in run.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries))
        {
            var parts = line.Split(':');
            result[BigInteger.Parse(parts[0], CultureInfo.InvariantCulture)] = parts[1]
                .Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(s => BigInteger.Parse(s, CultureInfo.InvariantCulture)).ToArray();
        }
        Assert.Equal(list.Count, result.Count);
        foreach (var n in list)
        {
            var product = result[n].Aggregate(BigInteger.One, (a, b) => a * b);
            Assert.Equal(n, product); // factor's answer is at least a factorisation of n
        }
        return result;
    }
}
