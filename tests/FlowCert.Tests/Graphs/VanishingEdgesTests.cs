using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Graphs;
using Fractions;

namespace FlowCert.Tests.Graphs;

/// <summary>
/// The edges that vanish in a field (flows.md section 1: a weight a/b is 0 in F_p when p divides a; over
/// Q no non-zero weight vanishes), checked against weights read by the Fractions package and reduced by
/// hand with BigInteger remainders (common practice).
/// </summary>
public class VanishingEdgesTests
{
    private static readonly (string U, string V, string Weight)[] Edges =
    [
        ("a", "b", "3"), ("b", "c", "6/5"), ("c", "d", "-9/2"), ("d", "e", "1"), ("e", "f", "2/3"),
        ("f", "g", "-15"), ("g", "h", "0.25"), ("h", "i", "35/4"),
    ];

    private static OpenGraph Graph()
        => OgraphReader.Parse(string.Concat(Edges.Select(e => $"edge {e.U} {e.V} {e.Weight}\n")), "weights.ograph");

    /// <summary>Edges whose weight is 0 mod p, by the Fractions package: p divides the numerator and not the denominator.</summary>
    private static string[] Expected(ulong p)
        => Edges.Where(e =>
            {
                var f = Fraction.FromString(e.Weight, System.Globalization.CultureInfo.InvariantCulture);
                return BigInteger.Remainder(f.Numerator, p).IsZero && !BigInteger.Remainder(f.Denominator, p).IsZero;
            })
            .Select(e => $"{e.U}-{e.V}").ToArray();

    [Theory]
    [InlineData(2UL)]
    [InlineData(3UL)]
    [InlineData(5UL)]
    [InlineData(7UL)]
    public void AnEdgeVanishesInFpExactlyWhenPDividesTheNumeratorOfItsWeight(ulong p)
    {
        var g = Graph();
        var found = VanishingEdges.In(g, FieldSpec.PrimeField(p)).Select(e => $"{g.Names[e.U]}-{g.Names[e.V]}").ToArray();
        Assert.Equal(Expected(p).Order(StringComparer.Ordinal), found.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void TheCasesAboveAreNotVacuous()
    {
        Assert.Equal(["a-b", "b-c", "c-d", "f-g"], Expected(3));
        Assert.Equal(["b-c", "e-f"], Expected(2));
        Assert.Equal(["h-i"], Expected(7));
    }

    [Fact]
    public void NothingVanishesOverTheRationals()
        => Assert.Empty(VanishingEdges.In(Graph(), FieldSpec.Rationals));

    [Fact]
    public void TheWarningNamesEveryEdgeWithItsWeightUpToTenThenSaysHowManyInAll()
    {
        var g = Graph();
        var few = VanishingEdges.In(g, FieldSpec.PrimeField(3));
        Assert.Equal("4 edges have weight 0 in F3 and vanish: a-b (3), b-c (6/5), c-d (-9/2), f-g (-15)", VanishingEdges.Warning(g, FieldSpec.PrimeField(3), few));

        var ladder = OgraphReader.Parse(string.Concat(Enumerable.Range(0, 12).Select(i => $"edge n{i:00} m{i:00} 2\n")), "ladder.ograph");
        var all = VanishingEdges.In(ladder, FieldSpec.PrimeField(2));
        Assert.Equal(12, all.Count);
        var text = VanishingEdges.Describe(ladder, all);
        Assert.EndsWith(", ... (12 in all)", text);
        Assert.Equal(VanishingEdges.MaxListed, text.Split(", ").Count(part => part.EndsWith("(2)")));
        Assert.DoesNotContain("...", VanishingEdges.Describe(ladder, all.Take(VanishingEdges.MaxListed).ToList()));
    }
}
