using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;
using FlowCert.Graphs.Formats;

namespace FlowCert.Tests.Graphs.Families;

/// <summary>The seeded generator, G(n, q) and random regular graphs.</summary>
public class RandomFamilyTests
{
    private static OpenGraph Make(string family, string size, ulong seed, string? q = null, int? degree = null, int? inputs = null, int? outputs = null)
        => FamilyGenerator.Generate(new FamilyRequest
        {
            Family = family, Size = size, Seed = seed, Probability = q, Degree = degree, InputCount = inputs, OutputCount = outputs,
        });

    /// <summary>
    /// The first outputs of SplitMix64 seeded with 0 (the reference sequence of "Fast splittable
    /// pseudorandom number generators", OOPSLA 2014; values from memory). A wrong constant or shift
    /// changes every one of them.
    /// </summary>
    [Fact]
    public void SplitMix64MatchesTheReferenceSequenceForSeedZero()
    {
        var rng = new SplitMix64(0);
        Assert.Equal(0xE220A8397B1DCDAFUL, rng.Next());
        Assert.Equal(0x6E789E6AA1B965F4UL, rng.Next());
        Assert.Equal(0x06C45D188009454FUL, rng.Next());
    }

    [Fact]
    public void BoundedDrawsStayInRangeAndCoverIt()
    {
        var rng = new SplitMix64(5);
        var seen = new int[7];
        for (int k = 0; k < 7000; k++) seen[rng.NextBelow(7UL)]++;
        Assert.All(seen, count => Assert.InRange(count, 850, 1150)); // 1000 expected, sd about 29
        var big = System.Numerics.BigInteger.Pow(10, 30) + 7;
        for (int k = 0; k < 200; k++)
        {
            var r = rng.NextBelow(big);
            Assert.True(r >= 0 && r < big);
        }
    }

    // Common practice: G(n, 0) is empty, G(n, 1) complete with n(n-1)/2 edges.
    [Theory]
    [InlineData(1)]
    [InlineData(12)]
    [InlineData(40)]
    public void ProbabilityZeroAndOneGiveTheEmptyAndCompleteGraphs(int n)
    {
        Assert.Empty(Make("random", $"{n}", 3, q: "0").Edges);
        Assert.Equal(n * (n - 1) / 2, Make("random", $"{n}", 3, q: "1").Edges.Count);
    }

    /// <summary>
    /// The edge count of G(n, q) is binomial with mean q n(n-1)/2 (common practice): for n = 200 and
    /// q = 1/4 the mean is 4975 and the standard deviation about 61. Five seeds must each land within
    /// five deviations, and their mean within three deviations of the mean of five.
    /// </summary>
    [Fact]
    public void EdgeCountsOfGnqFollowTheBinomialMean()
    {
        var counts = Enumerable.Range(1, 5).Select(s => Make("random", "200", (ulong)s, q: "1/4").Edges.Count).ToArray();
        Assert.All(counts, c => Assert.InRange(c, 4975 - 305, 4975 + 305));
        Assert.InRange(counts.Average(), 4975 - 82, 4975 + 82);
        Assert.Equal(counts.Length, counts.Distinct().Count()); // different seeds, different graphs
    }

    [Fact]
    public void ExactProbabilitiesWithLargeDenominatorsAreAccepted()
    {
        var q = "0.000000000000000000000000000001"; // 10^-30: its denominator is beyond 64 bits
        Assert.Empty(Make("random", "60", 1, q: q).Edges);
        Assert.Equal(Rational.Create(1, System.Numerics.BigInteger.Pow(10, 30)), FamilyGenerator.ParseProbability(q));
    }

    [Theory]
    [InlineData(10, 3)]
    [InlineData(50, 4)]
    [InlineData(101, 6)]
    [InlineData(7, 6)]
    [InlineData(9, 0)]
    public void RegularGraphsHaveEveryDegreeEqualAndNdOver2Edges(int n, int d)
    {
        var g = Make("regular", $"{n}", 9, degree: d);
        Assert.Equal(n, g.NodeCount);
        Assert.Equal(n * d / 2, g.Edges.Count);
        Assert.All(LatticeFamilyTests.Degrees(g), degree => Assert.Equal(d, degree));
    }

    [Fact]
    public void SameSeedSameBytesAndTerminalsAreTheFirstAndLastNodes()
    {
        string Text(ulong seed) => OgraphWriter.Write(Make("regular", "30", seed, degree: 3, inputs: 2, outputs: 3));
        Assert.Equal(Text(17), Text(17));
        Assert.NotEqual(Text(17), Text(18));
        var g = Make("random", "12", 4, q: "1/3", inputs: 2, outputs: 3);
        Assert.Equal(["v0", "v1"], g.SortedInputs.Select(v => g.Names[v]));
        Assert.Equal(["v10", "v11", "v9"], g.SortedOutputs.Select(v => g.Names[v]));
        Assert.Empty(g.Positions);
    }

    [Theory]
    [InlineData("regular", "7", null, 3, "must be even")]
    [InlineData("regular", "7", null, 7, "degree < 7")]
    [InlineData("regular", "7", null, null, "needs a degree")]
    [InlineData("random", "7", "3/2", null, "bad probability")]
    [InlineData("random", "7", null, null, "needs an edge probability")]
    [InlineData("square", "7x7", "1/2", null, "takes no probability")]
    public void BadRandomParametersAreRefused(string family, string size, string? q, int? degree, string expected)
    {
        var e = Assert.Throws<FamilyParameterException>(() => Make(family, size, 1, q: q, degree: degree));
        Assert.Contains(expected, e.Message);
    }
}
