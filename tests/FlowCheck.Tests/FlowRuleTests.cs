using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>The "flow" verdict: schedules (flows.md section 2), generalized flow (section 3, from
/// "Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212)
/// and causal flow (section 4, from "Determinism in the one-way model", arXiv:quant-ph/0506062).</summary>
public class FlowRuleTests
{
    static JObject With(JObject cert, string key, string json) => Edit(cert, c => c[key] = JToken.Parse(json));

    [Theory]
    [InlineData("[['a'],[]]", "round 2 is empty")]
    [InlineData("[['a']]", "measured node b is in no round")]
    [InlineData("[['a','b']]", "depth is 2 but there are 1 rounds")]
    [InlineData("[['a'],['b'],['c']]", "round 3: c is not a measured node")]
    [InlineData("[['a'],['b'],['z']]", "round 3: z is not a measured node")]
    [InlineData("[['a'],['a','b']]", "node a is in round 1 and in round 2")]
    [InlineData("[['b','a']]", "round 1: \"a\" after \"b\" (must be sorted, no duplicates)")]
    [InlineData("[['a','a'],['b']]", "round 1: \"a\" after \"a\"")]
    [InlineData("[['a'],'b']", "rounds[1] must be an array, found string")]
    [InlineData("{}", "rounds must be an array, found object")]
    public void RoundsPartitionTheMeasuredNodes(string rounds, string message) =>
        AssertInvalid(With(Examples.WireCausal(), "rounds", rounds), "invalid: " + message);

    [Theory]
    [InlineData("3", "depth is 3 but there are 2 rounds")]
    [InlineData("-2", "depth is -2 but there are 2 rounds")]
    [InlineData("2.0", "depth must be an integer, found float")]
    [InlineData("'2'", "depth must be an integer, found string")]
    [InlineData("123456789012345678901234567890", "depth is 123456789012345678901234567890 but there are 2 rounds")]
    public void DepthIsTheNumberOfRounds(string depth, string message) =>
        AssertInvalid(With(Examples.WireCausal(), "depth", depth), "invalid: " + message);

    [Theory]
    [InlineData("{'a':{'b':'1'}}", "node b: no correction vector")]
    [InlineData("{'a':{'b':'1'},'b':{'c':'1'},'c':{'b':'1'}}", "corrections: c is not a measured node")]
    [InlineData("{'a':{'b':'1'},'b':{'c':'1'},'q':{'b':'1'}}", "corrections: q is not a measured node")]
    [InlineData("{'b':{'c':'1'},'a':{'b':'1'}}", "corrections: \"a\" after \"b\" (must be sorted, no duplicates)")]
    [InlineData("{'a':{'b':'1'},'b':['c']}", "corrections.b must be an object, found array")]
    [InlineData("[]", "corrections must be an object, found array")]
    [InlineData("{'a':{'b':'1'},'b':{'c':1}}", "corrections.b.c must be a string, found integer")]
    [InlineData("{'a':{'b':'1'},'b':{'z':'1'}}", "node b: correction on unknown node z")]
    [InlineData("{'a':{'b':'1'},'b':{'c':'0'}}", "node b: c_b(c) = \"0\" is not a canonical non-zero element of Q")]
    [InlineData("{'a':{'b':'1'},'b':{'c':'2/2'}}", "node b: c_b(c) = \"2/2\" is not a canonical non-zero element of Q")]
    [InlineData("{'a':{'b':'1'},'b':{'a':'1','c':'1'}}", "node b: correction on input a")]
    [InlineData("{'a':{'b':'1'},'b':{'b':'1'}}", "node b (round 2): correction on b (in round 2), which is not later")]
    [InlineData("{'a':{'b':'1','c':'1'},'b':{'c':'1'}}", "node a: a causal correction has exactly one entry, found 2")]
    [InlineData("{'a':{},'b':{'c':'1'}}", "node a: a causal correction has exactly one entry, found 0")]
    [InlineData("{'a':{'c':'1'},'b':{'c':'1'}}", "node a: f(a) = c is not a neighbour of a in Q")]
    [InlineData("{'a':{'b':'2'},'b':{'c':'1'}}", "node a: c_a(b) = 2 but 1/A[a][b] = 1")]
    public void CausalCorrectionsAreCheckedPerNode(string corrections, string message) =>
        AssertInvalid(With(Examples.WireCausal(), "corrections", corrections), "invalid: " + message);

    [Fact]
    public void CorrectionOnAnEarlierNodeNamesBothRounds()
    {
        var cert = With(Examples.WireGeneral(), "corrections", "{'a':{'b':'1'},'b':{'c':'1','b':'1'}}");
        AssertInvalid(cert, "invalid: corrections.b: \"b\" after \"c\"");
        var earlier = With(Examples.GflowF2(), "corrections", "{'a':{'c':'1'},'b':{'c':'1','x':'1'},'c':{'a':'1','x':'1','y':'1'}}");
        AssertInvalid(earlier, "invalid: node c (round 2): correction on a (in round 1), which is not later");
    }

    [Fact]
    public void CausalInverseIsTakenInTheField()
    {
        // Weighted wire over Q: A[a][b] = 2, so c_a(b) must be 1/2.
        AssertInvalid(With(Examples.WeightedWire(), "corrections", "{'a':{'b':'2'},'b':{'c':'-2'}}"), "invalid: node a: c_a(b) = 2 but 1/A[a][b] = 1/2");
        AssertInvalid(With(Examples.WeightedWire(), "corrections", "{'a':{'b':'1/2'},'b':{'c':'2'}}"), "invalid: node b: c_b(c) = 2 but 1/A[b][c] = -2");
        // Over F5: A[a][b] = 2, inverse 3; A[b][c] = -1/2 = -3 = 2, inverse 3.
        var f5 = Edit(Examples.WeightedWire(), c => c["field"] = "F5");
        f5["corrections"] = JObject.Parse("{'a':{'b':'3'},'b':{'c':'3'}}");
        AssertValid(f5, "valid: causal flow over F5, depth 2");
        f5["corrections"] = JObject.Parse("{'a':{'b':'3'},'b':{'c':'2'}}");
        AssertInvalid(f5, "invalid: node b: c_b(c) = 2 but 1/A[b][c] = 3");
        f5["corrections"] = JObject.Parse("{'a':{'b':'3'},'b':{'c':'5'}}");
        AssertInvalid(f5, "invalid: node b: c_b(c) = \"5\" is not a canonical non-zero element of F5");
        f5["corrections"] = JObject.Parse("{'a':{'b':'3'},'b':{'c':'-2'}}");
        AssertInvalid(f5, "invalid: node b: c_b(c) = \"-2\" is not a canonical non-zero element of F5");
    }

    [Fact]
    public void CausalNeighbourhoodConditionNamesTheEarlierNeighbour()
    {
        // Square, causal: f(a) = x, but x's other neighbour b is measured in the same round as a.
        var cert = Cert("causal", "Q", Examples.SignedSquare,
            "'verdict':'flow','depth':1,'rounds':[['a','b']],'corrections':{'a':{'x':'1'},'b':{'y':'-1'}}");
        AssertInvalid(cert, "invalid: node a (round 1): (A c_a)(b) = 1 is non-zero but b is in round 1, not later");
        // Two rounds do not help: the last one fails on the first.
        var two = Edit(cert, c => { c["depth"] = 2; c["rounds"] = JArray.Parse("[['a'],['b']]"); });
        AssertInvalid(two, "invalid: node b (round 2): (A c_b)(a) = -1 is non-zero but a is in round 1, not later");
    }

    [Fact]
    public void GeneralFlowNeedsOneOnTheNodeItself()
    {
        AssertInvalid(With(Examples.SquareQ(), "corrections", "{'a':{'x':'1','y':'1'},'b':{'x':'1/2','y':'-1/2'}}"),
            "invalid: node a: (A c_a)(a) = 2, not 1");
        AssertInvalid(With(Examples.SquareF3(), "corrections", "{'a':{'x':'1','y':'1'},'b':{'x':'2','y':'1'}}"),
            "invalid: node a: (A c_a)(a) = 2, not 1");
        AssertInvalid(With(Examples.GflowF2(), "corrections", "{'a':{'c':'1'},'b':{'c':'1','x':'1'},'c':{'y':'1'}}"),
            "invalid: node c: (A c_c)(c) = 0, not 1");
    }

    [Fact]
    public void GeneralFlowOddNeighbourhoodMustBeLater()
    {
        // c_a = x over Q: (A c_a)(b) = 1 while b is in a's round.
        AssertInvalid(With(Examples.SquareQ(), "corrections", "{'a':{'x':'1'},'b':{'x':'1/2','y':'-1/2'}}"),
            "invalid: node a (round 1): (A c_a)(b) = 1 is non-zero but b is in round 1, not later");
        // Over F2 the gflow example with a and b swapped in rounds fails on b's earlier neighbour.
        var swapped = With(Examples.GflowF2(), "corrections", "{'a':{'c':'1'},'b':{'x':'1'},'c':{'x':'1','y':'1'}}");
        AssertInvalid(swapped, "invalid: node b (round 1): (A c_b)(a) = 1 is non-zero but a is in round 1, not later");
    }

    [Fact]
    public void FirstFailingNodeIsTheFirstInOrdinalOrder()
    {
        // a, b, d all adjacent to the output x and measured together: c_a = x touches both b and d; b is named.
        var cert = Cert("general", "Q", "{'inputs':[],'outputs':['x'],'nodes':['a','b','d','x'],'edges':[['a','x','1'],['b','x','1'],['d','x','1']]}",
            "'verdict':'flow','depth':1,'rounds':[['a','b','d']],'corrections':{'a':{'x':'1'},'b':{'x':'1'},'d':{'x':'1'}}");
        AssertInvalid(cert, "invalid: node a (round 1): (A c_a)(b) = 1 is non-zero but b is in round 1, not later");
    }

    [Fact]
    public void OutputsAreAlwaysLater()
    {
        // (A c_a)(c) = -1/4 on the output c of the weighted wire is fine.
        AssertValid(Examples.WeightedWire(), "valid: causal flow over Q, depth 2");
    }

    [Fact]
    public void NoFlowKeysDoNotBelongToAFlow()
    {
        var cert = Edit(Examples.WireCausal(), c => c["obstruction"] = JObject.Parse("{'blocked':['a']}"));
        AssertInvalid(cert, "invalid: key \"obstruction\" does not belong to a \"flow\" certificate");
        AssertInvalid(Edit(Examples.WireCausal(), c => c.Remove("rounds")), "invalid: missing rounds");
        AssertInvalid(Edit(Examples.WireCausal(), c => c.Remove("depth")), "invalid: missing depth");
        AssertInvalid(Edit(Examples.WireCausal(), c => c.Remove("corrections")), "invalid: missing corrections");
    }
}
