using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>The "noflow" verdict: blocked sets and left-kernel witnesses (flows.md section 6; the
/// Fredholm alternative, common practice in linear algebra over any field).</summary>
public class NoFlowRuleTests
{
    static JObject WithObstruction(JObject cert, string json) => Edit(cert, c => c["obstruction"] = JToken.Parse(json));

    [Theory]
    [InlineData("{'blocked':[]}", "obstruction.blocked is empty")]
    [InlineData("{'blocked':['b','a']}", "obstruction.blocked: \"a\" after \"b\"")]
    [InlineData("{'blocked':['a','a','b']}", "obstruction.blocked: \"a\" after \"a\"")]
    [InlineData("{'blocked':['a','o']}", "obstruction.blocked: o is not a measured node")]
    [InlineData("{'blocked':['a','z']}", "obstruction.blocked: z is not a measured node")]
    [InlineData("{'blocked':['a']}", "corrector o has exactly one neighbour in the blocked set (a), so it could correct a")]
    [InlineData("{'blocked':['a','b'],'witnesses':[]}", "unknown key \"witnesses\" in obstruction")]
    [InlineData("{}", "missing obstruction.blocked")]
    [InlineData("{'blocked':'a'}", "obstruction.blocked must be an array, found string")]
    [InlineData("[]", "obstruction must be an object, found array")]
    public void CausalObstructionRules(string obstruction, string message) =>
        AssertInvalid(WithObstruction(Examples.FanCausalNoFlow(), obstruction), "invalid: " + message);

    [Fact]
    public void CausalObstructionNamesTheLoneNeighbour()
    {
        // Blocked {a}: C = {b, o}; o has exactly one neighbour (a) in U, so o could correct a.
        var cert = WithObstruction(Examples.FanCausalNoFlow(), "{'blocked':['a']}");
        AssertInvalid(cert, "invalid: corrector o has exactly one neighbour in the blocked set (a), so it could correct a");
        // Blocked {b} of the gflow graph: corrector x has exactly one neighbour b there.
        var gflow = WithObstruction(Examples.GflowCausalNoFlow(), "{'blocked':['b','c']}");
        AssertInvalid(gflow, "invalid: corrector a has exactly one neighbour in the blocked set (c), so it could correct c");
    }

    [Fact]
    public void InputsAreNotCorrectors()
    {
        // With o an input as well as an output, o is not a corrector: {a} is then blocked (C = {b}, no edge a-b).
        var cert = Edit(Examples.FanCausalNoFlow(), c => c["graph"]!["inputs"] = new JArray("o"));
        cert["obstruction"] = JObject.Parse("{'blocked':['a']}");
        AssertValid(cert, "valid: no causal flow over Q, blocked set of 1 node");
        var general = Edit(Examples.FanGeneralNoFlow(), c => c["graph"]!["inputs"] = new JArray("o"));
        general["obstruction"] = JObject.Parse("{'blocked':['a'],'witnesses':[{'a':'1'}]}");
        AssertValid(general, "valid: no generalized flow over Q, blocked set of 1 node");
    }

    [Theory]
    [InlineData("{'blocked':['a','b']}", "missing obstruction.witnesses")]
    [InlineData("{'blocked':['a','b'],'witnesses':{}}", "obstruction.witnesses must be an array, found object")]
    [InlineData("{'blocked':['a','b'],'witnesses':[]}", "blocked node a is in no witness's support")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{}]}", "blocked node a is in no witness's support")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1'}]}", "obstruction.witnesses[0]: (y^T A)(o) = 1 for corrector o, not 0")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1','b':'1'}]}", "obstruction.witnesses[0]: (y^T A)(o) = 2 for corrector o, not 0")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1','b':'-1'},{'a':'2'}]}", "obstruction.witnesses[1]: (y^T A)(o) = 2 for corrector o, not 0")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1','b':'-1','o':'1'}]}", "obstruction.witnesses[0]: entry on o, which is not in the blocked set")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'b':'-1','a':'1'}]}", "obstruction.witnesses[0]: \"a\" after \"b\"")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1','b':'0'}]}", "obstruction.witnesses[0]: y(b) = \"0\" is not a canonical non-zero element of Q")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1','b':-1}]}", "obstruction.witnesses[0].b must be a string, found integer")]
    [InlineData("{'blocked':['a','b'],'witnesses':[['a']]}", "obstruction.witnesses[0] must be an object, found array")]
    [InlineData("{'blocked':['a','b'],'witnesses':[{'a':'1','b':'-1'}],'why':1}", "unknown key \"why\" in obstruction")]
    public void GeneralObstructionRules(string obstruction, string message) =>
        AssertInvalid(WithObstruction(Examples.FanGeneralNoFlow(), obstruction), "invalid: " + message);

    [Fact]
    public void FirstFailingCorrectorIsTheFirstInOrdinalOrder()
    {
        // a is adjacent to the outputs o and p; the witness y = e_a has (y^T A)(o) = (y^T A)(p) = 1; o is named.
        var cert = Cert("general", "Q", "{'inputs':[],'outputs':['o','p'],'nodes':['a','o','p'],'edges':[['a','o','1'],['a','p','1']]}",
            "'verdict':'noflow','obstruction':{'blocked':['a'],'witnesses':[{'a':'1'}]}");
        AssertInvalid(cert, "invalid: obstruction.witnesses[0]: (y^T A)(o) = 1 for corrector o, not 0");
    }

    [Fact]
    public void WitnessesMayBeSeveralAndScaled()
    {
        var cert = WithObstruction(Examples.FanGeneralNoFlow(), "{'blocked':['a','b'],'witnesses':[{'a':'-2/3','b':'2/3'},{'a':'5','b':'-5'}]}");
        AssertValid(cert, "valid: no generalized flow over Q, blocked set of 2 nodes");
    }

    [Fact]
    public void WitnessArithmeticIsInTheField()
    {
        // Over F2 the square's witness (1, 1) works; over Q it does not (b-y has weight -1).
        var q = Edit(Examples.SquareF2NoFlow(), c => c["field"] = "Q");
        AssertInvalid(q, "invalid: obstruction.witnesses[0]: (y^T A)(x) = 2 for corrector x, not 0");
        // Over F3 (1, 1) fails on x too, where 1 + 1 = 2.
        var f3 = Edit(Examples.SquareF2NoFlow(), c => c["field"] = "F3");
        AssertInvalid(f3, "invalid: obstruction.witnesses[0]: (y^T A)(x) = 2 for corrector x, not 0");
        // Over F2, "2" is not a residue.
        var bad = WithObstruction(Examples.SquareF2NoFlow(), "{'blocked':['a','b'],'witnesses':[{'a':'1','b':'2'}]}");
        AssertInvalid(bad, "invalid: obstruction.witnesses[0]: y(b) = \"2\" is not a canonical non-zero element of F2");
    }

    [Fact]
    public void FlowKeysDoNotBelongToANoFlow()
    {
        foreach (var key in new[] { "depth", "rounds", "corrections" })
        {
            var cert = Edit(Examples.FanCausalNoFlow(), c => c[key] = new JArray());
            AssertInvalid(cert, $"invalid: key \"{key}\" does not belong to a \"noflow\" certificate");
        }
        AssertInvalid(Edit(Examples.FanCausalNoFlow(), c => c.Remove("obstruction")), "invalid: missing obstruction");
    }
}
