using FlowCert.Algebra;
using FlowCert.Algebra.Factoring;
using FlowCert.Flows;
using FlowCert.Flows.Primes;
using FlowCert.Graphs;

namespace FlowCert.Tests.Flows.Primes;

/// <summary>
/// Small graphs whose exceptional primes are worked out by hand in the comments (flows.md sections 5, 6 and
/// 10; docs/primes.md). Each test also solves several primes directly, so a wrong claim fails.
/// </summary>
public class PrimeSurveyHandCheckedTests
{
    private static OpenGraph Parse(string text) => OgraphReader.Parse(text, "hand.ograph");
    private static PrimeSurvey Survey(OpenGraph g, FlowKind kind = FlowKind.General)
        => PrimeSurvey.Run(g, kind, new FactoringBudget(TimeSpan.FromSeconds(10)));
    private static ulong[] E(PrimeSurvey s) => s.Exceptional.Select(a => a.Prime).ToArray();

    /// <summary>Checks the claim against a direct solve at every prime below 100.</summary>
    private static void AuditBelow100(PrimeSurvey s)
    {
        var audit = PrimeAudit.Run(s, 100);
        Assert.Equal(25, audit.PrimesSolved);
        Assert.Empty(audit.Disagreements);
    }

    [Fact]
    public void AWeightTwoEdgeVanishesAtTwoAndTakesTheFlowWithIt()
    {
        // Input a, output b, one edge of weight 2. Over Q (and every odd p) b corrects a: c_a = e_b / 2,
        // depth 1. At p = 2 the weight is 0, the edge vanishes, a has no corrector: no flow. The only
        // integer is the numerator 2, so E = {2}.
        var s = Survey(Parse("input a\noutput b\nedge a b 2\n"));
        Assert.True(s.Rational.HasFlow);
        Assert.Equal(1, s.Rational.Depth);
        Assert.Equal([2UL], E(s));
        var at2 = s.Exceptional[0].Result!;
        Assert.False(at2.HasFlow);
        Assert.Single(at2.VanishedEdges);
        Assert.Equal(PrimeClaimKind.SameAsRationals, s.ClaimAt(3).Kind);
        Assert.True(s.IsComplete);
        AuditBelow100(s);
    }

    [Fact]
    public void AWeightOneThirdIsUndefinedAtThree()
    {
        // Weight 1/3 on a wire a - b - c: at p = 3 the denominator has no inverse, so the graph has no meaning
        // in F_3 (an input error for solve; "undefined at 3" here). Everywhere else 1/3 is a unit: depth 2.
        var s = Survey(Parse("input a\noutput c\nedge a b 1\nedge b c 1/3\n"));
        Assert.Equal([3UL], E(s));
        var at3 = s.Exceptional[0];
        Assert.False(at3.IsDefined);
        Assert.Equal(["b", "c"], at3.UndefinedEdges.Select(e => new[] { s.Graph.Names[e.U], s.Graph.Names[e.V] }).Single());
        Assert.False(s.ClaimAt(3).Defined);
        Assert.Equal(2, s.ClaimAt(5).Depth);
        AuditBelow100(s);
    }

    // The 4 x 4 block A[{a1..a4}, {o1..o4}] below, rows (1 1 0 1), (0 0 1 -1), (0 -1 1 1), (1 -1 0 0), has
    // determinant -5 (computed with python3-sympy's Matrix.det while writing the test; the survey must find
    // the pivot minor 5). Entries are 0 and +-1, so no weight contributes a prime.
    private const string DeterminantFive = """
        input a1 a2 a3 a4
        output o1 o2 o3 o4
        edge a1 o1 1
        edge a1 o2 1
        edge a1 o4 1
        edge a2 o3 1
        edge a2 o4 -1
        edge a3 o2 -1
        edge a3 o3 1
        edge a3 o4 1
        edge a4 o1 1
        edge a4 o2 -1
        """;

    [Fact]
    public void ABlockOfDeterminantFiveLosesRankAtFiveOnly()
    {
        // Over Q the block A[{a1..a4}, {o1..o4}] is invertible: every a_i is corrected by the outputs in one
        // round. Mod p it stays invertible unless p divides det = -5. At p = 5 its rank is 3: some a_i has
        // a left-kernel vector non-zero at it, and since the a_i are inputs (never correctors) nothing
        // later can help: no flow. So E = {5}, and at 5 the verdict changes.
        var g = Parse(DeterminantFive);
        var s = Survey(g);
        Assert.True(s.Rational.HasFlow);
        Assert.Equal(1, s.Rational.Depth);
        Assert.Equal([5UL], E(s));
        Assert.Contains(s.Integers, i => i.Origin == IntegerOrigin.PivotMinor && i.Value == 5);
        Assert.False(s.Exceptional[0].Result!.HasFlow);
        Assert.Empty(s.Exceptional[0].Result!.VanishedEdges);
        foreach (var p in new ulong[] { 2, 3, 7, 11, 13, (1UL << 61) - 1 })
            Assert.True(FlowSolver.Solve(g, FieldSpec.PrimeField(p), FlowKind.General).HasFlow, $"p = {p}");
        AuditBelow100(s);
    }

    [Fact]
    public void ARowUnsolvableOverQBecomesSolvableAtTwo()
    {
        // Outputs x, y; measured a, b, c (no inputs). First layer: rows a, b, c against columns x, y:
        //   a: (1, 1), b: (1, -1), c: (0, 1).  Rank 2; every 2 x 2 minor is -2, 1 or 1, so d_2 = 1 and the
        // rank never drops. The left kernel is spanned by y = (1, -1, -2): non-zero at a, b and c, so over Q
        // no row is solvable and there is no flow (blocked {a, b, c}). Mod p the same y stays non-zero at
        // every row unless p = 2, where y = (1, 1, 0): c becomes solvable (c_c = e_x + e_y gives
        // B c_c = (2, 0, 1) = (0, 0, 1) mod 2). Then c corrects too: rows a: (1, 1, 1), b: (1, 1, 0) on
        // columns x, y, c have rank 2 mod 2, so a and b follow: a flow of depth 2 appears at p = 2 only.
        var g = Parse("output x y\nedge a x 1\nedge a y 1\nedge b x 1\nedge b y -1\nedge c y 1\nedge a c 1\n");
        var s = Survey(g);
        Assert.False(s.Rational.HasFlow);
        Assert.Equal([2UL], E(s));
        Assert.Contains(s.Integers, i => i.Origin == IntegerOrigin.KernelCoordinate && i.Value == 2 && i.Where.EndsWith("row c"));
        var at2 = s.Exceptional[0].Result!;
        Assert.True(at2.HasFlow);
        Assert.Equal(2, at2.Depth);
        Assert.Empty(at2.VanishedEdges);
        foreach (var p in new ulong[] { 3, 5, 7, (1UL << 61) - 1 })
            Assert.False(FlowSolver.Solve(g, FieldSpec.PrimeField(p), FlowKind.General).HasFlow, $"p = {p}");
        AuditBelow100(s);
    }

    [Fact]
    public void CausalFlowTakesItsExceptionalPrimesFromTheWeightsAlone()
    {
        // Causal flow depends only on which weights are non-zero (flows.md section 4), so its E is exactly
        // the primes of the weights' numerators and denominators: for the determinant-5 block and the
        // row-c graph (all weights +-1) it is empty, while the general survey's is {5} and {2}.
        foreach (var text in new[] { DeterminantFive, "output x y\nedge a x 1\nedge a y 1\nedge b x 1\nedge b y -1\nedge c y 1\nedge a c 1\n" })
        {
            var s = Survey(Parse(text), FlowKind.Causal);
            Assert.Empty(s.Exceptional);
            Assert.All(s.Integers, i => Assert.True(i.Origin is IntegerOrigin.WeightNumerator or IntegerOrigin.WeightDenominator));
            AuditBelow100(s);
        }
        // With weights 6 and 5/3 the causal E is exactly {2, 3, 5}: the primes of 6, 5 and 3.
        var mixed = Survey(Parse("input a\noutput c\nedge a b 6\nedge b c 5/3\nedge a c 1\n"), FlowKind.Causal);
        Assert.Equal([2UL, 3, 5], E(mixed));
        AuditBelow100(mixed);
    }

    [Fact]
    public void AnIntegerThatCannotBeFactoredInTimeIsReportedAndMakesNoClaim()
    {
        // A weight whose numerator is the product of two 20-digit primes (confirmed by coreutils factor in
        // IntegerFactoringTests): with no factoring time the product is left whole, and no prime dividing it
        // is claimed. Primes below 2^16 are still classified (trial division always runs).
        const string p20 = "30000000000000012347", p21 = "300000000000000012367";
        var n = System.Numerics.BigInteger.Parse(p20) * System.Numerics.BigInteger.Parse(p21);
        var s = PrimeSurvey.Run(Parse($"input a\noutput b\nedge a b {n * 6}\n"), FlowKind.General, new FactoringBudget(TimeSpan.Zero));
        Assert.False(s.IsComplete);
        Assert.Equal(n, Assert.Single(s.Unclassified).Value);
        Assert.Equal([2UL, 3], E(s));
        Assert.Equal(PrimeClaimKind.SameAsRationals, s.ClaimAt(5).Kind);
    }

    [Fact]
    public void PrimesBeyondTheFieldRangeAreReportedNotSolved()
    {
        // 4611686018427388039 is the first prime above 2^62 (python3-sympy's nextprime; coreutils factor
        // agrees): prime, but beyond F_p arithmetic (p < 2^62), so it is listed as not classified. A 20-digit
        // prime above 2^64 can only pass the probable-prime test: listed as such, never claimed.
        const string above62 = "4611686018427388039", p20 = "30000000000000012347";
        var s = Survey(Parse($"input a\noutput c\nedge a b {above62}\nedge b c 1/{p20}\n"));
        Assert.Empty(s.Exceptional);
        Assert.Equal([above62, p20], s.Unclassified.Select(u => u.Value.ToString()).ToArray());
        Assert.Contains("2^62 or more", s.Unclassified[0].Reason);
        Assert.Contains("probable prime", s.Unclassified[1].Reason);
        Assert.False(s.IsComplete);
        AuditBelow100(s);
    }

    [Fact]
    public void TheAuditCatchesAClaimThatLeavesOutAnExceptionalPrime()
    {
        // The weight-2 edge again, with p = 2 removed from E by hand: the survey would then claim "same as Q"
        // (depth 1) at 2, but the direct solve finds no flow there. The audit must report exactly that prime.
        var honest = Survey(Parse("input a\noutput b\nedge a b 2\n"));
        var wrong = new PrimeSurvey
        {
            Graph = honest.Graph, Kind = honest.Kind, Rational = honest.Rational, Integers = honest.Integers,
            Exceptional = [], Unclassified = [],
        };
        var audit = PrimeAudit.Run(wrong, 30);
        var d = Assert.Single(audit.Disagreements);
        Assert.Equal(2UL, d.Claim.Prime);
        Assert.Equal(PrimeClaimKind.SameAsRationals, d.Claim.Kind);
        Assert.False(d.Direct.Result!.HasFlow);
    }
}
