using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>Hand-written valid certificates (each verified by hand from flows.md and re-checked by the
/// brute-force oracle in ExamplesTests). Graphs are small and invented unless a source is named.</summary>
public static class Examples
{
    /// <summary>Path a-b-c, input a, output c: causal flow of depth 2, f(a) = b, f(b) = c. Common practice:
    /// "Determinism in the one-way model", arXiv:quant-ph/0506062.</summary>
    public const string WireGraph = "{'inputs':['a'],'outputs':['c'],'nodes':['a','b','c'],'edges':[['a','b','1'],['b','c','1']]}";

    public static JObject WireCausal(string field = "Q") => Cert("causal", field, WireGraph,
        "'verdict':'flow','depth':2,'rounds':[['a'],['b']],'corrections':{'a':{'b':'1'},'b':{'c':'1'}}");

    /// <summary>A causal flow is a generalized flow with one-entry vectors (flows.md section 4;
    /// "Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212).</summary>
    public static JObject WireGeneral() => Cert("general", "Q", WireGraph,
        "'verdict':'flow','depth':2,'rounds':[['a'],['b']],'corrections':{'a':{'b':'1'},'b':{'c':'1'}}");

    /// <summary>The wire with weights 2 and -1/2 over Q: c_a(b) = 1/2 and c_b(c) = -2 (hand computed).</summary>
    public static JObject WeightedWire() => Cert("causal", "Q",
        "{'inputs':['a'],'outputs':['c'],'nodes':['a','b','c'],'edges':[['a','b','2'],['b','c','-1/2']]}",
        "'verdict':'flow','depth':2,'rounds':[['a'],['b']],'corrections':{'a':{'b':'1/2'},'b':{'c':'-2'}}");

    /// <summary>K_{2,2} between measured a, b and outputs x, y, with weight -1 on b-y. Over Q (and F3) both
    /// are corrected in one round: c_a = (x + y)/2, c_b = (x - y)/2. No causal flow in any field, and no
    /// general flow over F2 where -1 = 1 (hand computed from flows.md sections 3, 4, 6).</summary>
    public const string SignedSquare = "{'inputs':[],'outputs':['x','y'],'nodes':['a','b','x','y']," +
                                       "'edges':[['a','x','1'],['a','y','1'],['b','x','1'],['b','y','-1']]}";

    public static JObject SquareQ() => Cert("general", "Q", SignedSquare,
        "'verdict':'flow','depth':1,'rounds':[['a','b']],'corrections':{'a':{'x':'1/2','y':'1/2'},'b':{'x':'1/2','y':'-1/2'}}");

    public static JObject SquareF3() => Cert("general", "F3", SignedSquare,
        "'verdict':'flow','depth':1,'rounds':[['a','b']],'corrections':{'a':{'x':'2','y':'2'},'b':{'x':'2','y':'1'}}");

    public static JObject SquareF2NoFlow() => Cert("general", "F2", SignedSquare,
        "'verdict':'noflow','obstruction':{'blocked':['a','b'],'witnesses':[{'a':'1','b':'1'}]}");

    public static JObject SquareCausalNoFlow() => Cert("causal", "Q", SignedSquare,
        "'verdict':'noflow','obstruction':{'blocked':['a','b']}");

    /// <summary>Two measured nodes whose only neighbour is the output o: neither kind of flow exists.</summary>
    public const string FanGraph = "{'inputs':[],'outputs':['o'],'nodes':['a','b','o'],'edges':[['a','o','1'],['b','o','1']]}";

    public static JObject FanCausalNoFlow() => Cert("causal", "Q", FanGraph, "'verdict':'noflow','obstruction':{'blocked':['a','b']}");

    public static JObject FanGeneralNoFlow() => Cert("general", "Q", FanGraph,
        "'verdict':'noflow','obstruction':{'blocked':['a','b'],'witnesses':[{'a':'1','b':'-1'}]}");

    /// <summary>Five nodes with a generalized flow over F2 of depth 2 but no causal flow (found by a brute-force
    /// search over small graphs, re-verified by the oracle): c_a = {c}, c_b = {c, x}, c_c = {x, y}.</summary>
    public const string GflowGraph = "{'inputs':[],'outputs':['x','y'],'nodes':['a','b','c','x','y']," +
        "'edges':[['a','c','1'],['a','x','1'],['a','y','1'],['b','x','1'],['b','y','1'],['c','x','1']]}";

    public static JObject GflowF2() => Cert("general", "F2", GflowGraph,
        "'verdict':'flow','depth':2,'rounds':[['a','b'],['c']],'corrections':{'a':{'c':'1'},'b':{'c':'1','x':'1'},'c':{'x':'1','y':'1'}}");

    public static JObject GflowCausalNoFlow() => Cert("causal", "F2", GflowGraph,
        "'verdict':'noflow','obstruction':{'blocked':['a','b','c']}");

    /// <summary>Only outputs: nothing is measured, depth 0 (flows.md section 2).</summary>
    public static JObject NothingMeasured() => Cert("general", "Q",
        "{'inputs':['o'],'outputs':['o'],'nodes':['o'],'edges':[]}", "'verdict':'flow','depth':0,'rounds':[],'corrections':{}");

    public static IEnumerable<(string Name, JObject Cert)> AllValid() =>
    [
        ("wire causal Q", WireCausal()), ("wire causal F2", WireCausal("F2")), ("wire causal F5", WireCausal("F5")),
        ("wire general Q", WireGeneral()), ("weighted wire", WeightedWire()), ("square Q", SquareQ()),
        ("square F3", SquareF3()), ("square F2 noflow", SquareF2NoFlow()), ("square causal noflow", SquareCausalNoFlow()),
        ("fan causal noflow", FanCausalNoFlow()), ("fan general noflow", FanGeneralNoFlow()), ("gflow F2", GflowF2()),
        ("gflow causal noflow", GflowCausalNoFlow()), ("nothing measured", NothingMeasured()),
    ];
}
