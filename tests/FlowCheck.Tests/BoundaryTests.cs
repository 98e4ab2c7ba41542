using System.Diagnostics;
using System.Numerics;
using System.Text;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>Edges of the JSON grammar ("The JavaScript Object Notation (JSON) Data Interchange Format", RFC 8259,
/// DOI 10.17487/RFC8259) where a reader goes wrong by one: nesting depth, hex digits, surrogates, columns of
/// characters that take several bytes, a second value after the first, and input that cannot be re-read.</summary>
public class JsonBoundaryTests
{
    static string Wire => Examples.WireCausal().ToString(Formatting.None);

    static Result Unknown(string flowText) => CheckText(Wire.Replace("\"flow\":\"causal\"", $"\"flow\":\"{flowText}\""));

    [Theory]
    [InlineData(" {}")]
    [InlineData("1")]
    [InlineData("\"x\"")]
    [InlineData("[]")]
    public void ASecondValueAfterTheDocumentIsRefused(string second)
    {
        var r = CheckText(Wire + second);
        Assert.Equal(2, r.Code);
        Assert.Contains($":1:{Wire.Length + 1 + (second[0] == ' ' ? 1 : 0)}: not JSON: content after the JSON value", r.Err);
    }

    [Fact]
    public void NestingOf64LevelsIsReadAnd65IsRefused()
    {
        // The top object is level 0; k arrays under a member reach level k. The member is unknown, so a
        // document that is read ends in a verdict (exit 1), one that is refused in a syntax error (exit 2).
        string Deep(int k) => Wire.Replace("\"producer\":", "\"extra\":" + new string('[', k) + new string(']', k) + ",\"producer\":");
        AssertInvalid(CheckText(Deep(64)), "unknown key \"extra\" in certificate");
        var refused = CheckText(Deep(65));
        Assert.Equal(2, refused.Code);
        Assert.Contains("not JSON: nesting deeper than 64 levels", refused.Err);
    }

    [Fact]
    public void HexDigitsAtEachEndOfTheirRangesAreRead()
    {
        // \u0039 is '9', \u00af and \u00AF are U+00AF; \u0030 is '0' (RFC 8259 section 7: hex digits in either case).
        var r = Unknown("\\u0039\\u00af\\u00AF\\u0030\\u00aF\\u00Fa");
        AssertInvalid(r, "unknown flow \"9\u00af\u00af0\u00af\u00fa\"");
        foreach (var bad in new[] { "/", ":", "`", "g", "@", "G" })
        {
            var refused = Unknown($"\\u00{bad}0");
            Assert.Equal(2, refused.Code);
            Assert.Contains("not JSON: \\u needs four hex digits", refused.Err);
        }
    }

    [Fact]
    public void SurrogatesArePairedExactly()
    {
        // RFC 8259 section 7: a character outside the BMP is a high surrogate D800-DBFF then a low one DC00-DFFF.
        AssertInvalid(Unknown("\\ud800\\udc00"), "unknown flow \"\U00010000\"");
        AssertInvalid(Unknown("\\udbff\\udfff"), "unknown flow \"\U0010FFFF\"");
        foreach (var bad in new[] { "\\ud800x", "\\ud800\\n", "\\ud800\\udbff", "\\ud800\\ue000", "\\udbffu" })
        {
            var r = Unknown(bad);
            Assert.Equal(2, r.Code);
            Assert.Contains("not JSON: lone high surrogate", r.Err);
        }
        // U+DFFF is the last low surrogate; U+E000, the first character after the surrogates, stands alone.
        AssertInvalid(Unknown("\\ue000"), "unknown flow \"\ue000\"");
        foreach (var bad in new[] { "\\udc00", "\\udfff" })
            Assert.Contains("not JSON: lone low surrogate", Unknown(bad).Err);
    }

    [Theory]
    [InlineData("{\"format\": \"\u00e9\u00e9\" 'x'}", 17)]                 // read in place
    [InlineData("{\"format\": \"\\u00e9\u00e9\" 'x'}", 22)]                // read by the slow path (an escape)
    [InlineData("{\"format\": \"\U0001F600\" 'x'}", 16)]                  // one character of four bytes
    [InlineData("{\"format\": \"\\n\U0001F600\" 'x'}", 18)]
    public void AColumnCountsCharactersNotBytes(string text, int column)
    {
        var r = CheckText(text);
        Assert.Equal(2, r.Code);
        Assert.Contains($":1:{column}: not JSON: expected ',' or '}}'", r.Err);
    }

    [Fact]
    public void EndsAndBytesThatCannotStartAValue()
    {
        foreach (var text in new[] { "{\"format\":", "{\"format\":  \n " })
        {
            var r = CheckText(text);
            Assert.Equal(2, r.Code);
            Assert.Contains("not JSON: unexpected end of the text", r.Err);
        }
        var path = Write("", ".json");
        File.WriteAllBytes(path, [.. Encoding.ASCII.GetBytes("{\"format\": "), 0x80, (byte)'}']);
        var high = Run(path);
        Assert.Equal(2, high.Code);
        Assert.Contains(":1:12: not JSON: unexpected byte", high.Err);
        File.WriteAllBytes(path, [.. Encoding.ASCII.GetBytes("{\"format\": \"\\n"), 0xC3, 0x28, (byte)'"', (byte)'}']);
        var broken = Run(path);
        Assert.Equal(2, broken.Code);
        Assert.Contains("not JSON: a string that is not UTF-8", broken.Err);
    }

    [Fact]
    public void AValueOf80CharactersIsEchoedWhole()
    {
        var (whole, cut) = (new string('k', 80), new string('k', 81));
        AssertInvalid(CheckText(Wire.Replace("\"producer\":", $"\"{whole}\":1,\"producer\":")), $"unknown key \"{whole}\" in certificate");
        AssertInvalid(CheckText(Wire.Replace("\"producer\":", $"\"{cut}\":1,\"producer\":")), $"unknown key \"{whole}...\" in certificate");
    }

    [Fact]
    public void KeysNamedLikeTheRememberedObjectsDoNotStandInForThem()
    {
        // Node names "graph" and "nodes": the correction of node graph is an object with a key "nodes", deeper
        // than the real graph.nodes and later in the file; so is a "graph" object inside producer.
        var cert = Cert("causal", "Q", "{'inputs':['graph'],'outputs':['o'],'nodes':['graph','nodes','o'],'edges':[['graph','nodes','1'],['nodes','o','1']]}",
            "'verdict':'flow','depth':2,'rounds':[['graph'],['nodes']],'corrections':{'graph':{'nodes':'1'},'nodes':{'o':'1'}}");
        AssertValid(cert, "valid: causal flow over Q, depth 2");
        var text = cert.ToString(Formatting.None).Replace("\"producer\":{", "\"producer\":{\"graph\":{\"nodes\":1,\"edges\":2},");
        AssertInvalid(CheckText(text), "unknown key \"graph\" in producer");
    }

    [Fact]
    public async Task ACertificateFromAPipeIsReadWhole()
    {
        // A FIFO cannot seek: the reader copies it first (mkfifo, GNU coreutils, as on every Debian system).
        var fifo = Path.Combine(Path.GetTempPath(), "flowcheck-fifo-" + Guid.NewGuid().ToString("N"));
        using (var mk = Process.Start("mkfifo", fifo)) mk.WaitForExit();
        try
        {
            var writer = Task.Run(() => File.WriteAllText(fifo, Wire));
            var r = Run(fifo);
            await writer;
            Assert.Equal("", r.Err);
            Assert.StartsWith("valid: causal flow over Q, depth 2", r.First);
        }
        finally { File.Delete(fifo); }
    }
}

/// <summary>The message of each shape rule names the value it is about (docs/checker.md: "a wrong shape is a
/// verdict"; the wording is the checker's own, pinned here so a change to it is deliberate: common practice).</summary>
public class ShapeMessageTests
{
    [Theory]
    [InlineData("flow")]
    [InlineData("field")]
    [InlineData("graphSha256")]
    public void AMissingOrMistypedHeaderIsNamed(string key)
    {
        AssertInvalid(Edit(Examples.WireCausal(), c => c.Remove(key), rehash: false), $"invalid: missing {key}");
        AssertInvalid(Edit(Examples.WireCausal(), c => c[key] = 1.5, rehash: false), $"invalid: {key} must be a string, found float");
        AssertInvalid(Edit(Examples.WireCausal(), c => c[key] = true, rehash: false), $"invalid: {key} must be a string, found boolean");
        AssertInvalid(Edit(Examples.WireCausal(), c => c[key] = false, rehash: false), $"invalid: {key} must be a string, found boolean");
        AssertInvalid(Edit(Examples.WireCausal(), c => c[key] = 7, rehash: false), $"invalid: {key} must be a string, found integer");
    }

    [Fact]
    public void ItemsAreNamedByTheirIndexFromZero()
    {
        AssertInvalid(Edit(Examples.WireCausal(), c => c["rounds"] = JArray.Parse("[[1],['b']]")), "invalid: rounds[0][0] must be a string, found integer");
        AssertInvalid(Edit(Examples.WireCausal(), c => c["rounds"] = JArray.Parse("[['a', 2],['b']]")), "invalid: rounds[0][1] must be a string, found integer");
        AssertInvalid(Edit(Examples.WireCausal(), c => c["graph"]!["edges"] = JArray.Parse("[1]"), rehash: false), "invalid: graph.edges[0] must be an array, found integer");
        AssertInvalid(Edit(Examples.WireCausal(), c => c["graph"]!["edges"]![1] = "b c 1", rehash: false), "invalid: graph.edges[1] must be an array, found string");
    }

    [Fact]
    public void LabelsMustBeAnObjectOfStrings()
    {
        var v2 = Edit(Examples.WireCausal(), c => { c["version"] = 2; c["flow"] = "pauli"; c["field"] = "F2"; });
        AssertInvalid(Edit(v2, c => c["graph"]!["labels"] = new JArray()), "invalid: graph.labels must be an object, found array");
        AssertInvalid(Edit(v2, c => c["graph"]!["labels"] = JObject.Parse("{'a': 1}")), "invalid: graph.labels.a must be a string, found integer");
    }
}

/// <summary>Rules of flows.md section 3 at the edges of the correction map and the field (F_p elements are
/// residues 1..p-1, Q elements reduced fractions: flows.md section 1).</summary>
public class CorrectionEdgeTests
{
    /// <summary>Path a - b - c - d - o, input a, output o: causal flow f(v) = the next node, depth 4 (common practice:
    /// a wire, "Determinism in the one-way model", arXiv:quant-ph/0506062).</summary>
    static JObject Chain() => Cert("causal", "Q",
        "{'inputs':['a'],'outputs':['o'],'nodes':['a','b','c','d','o'],'edges':[['a','b','1'],['b','c','1'],['c','d','1'],['d','o','1']]}",
        "'verdict':'flow','depth':4,'rounds':[['a'],['b'],['c'],['d']],'corrections':{'a':{'b':'1'},'b':{'c':'1'},'c':{'d':'1'},'d':{'o':'1'}}");

    [Theory]
    [InlineData("a", "a")]
    [InlineData("b", "b")]
    [InlineData("d", "d")]
    [InlineData("a c", "a")]
    [InlineData("b d", "b")]
    [InlineData("a b", "a")]
    public void TheFirstNodeWithoutACorrectionIsNamed(string dropped, string first)
    {
        AssertValid(Chain(), "valid: causal flow over Q, depth 4");
        var cert = Edit(Chain(), c => { foreach (var v in dropped.Split(' ')) ((JObject)c["corrections"]!).Remove(v); });
        AssertInvalid(cert, $"invalid: node {first}: no correction vector");
    }

    [Theory]
    [InlineData("F5", "0")]
    [InlineData("F5", "5")]
    [InlineData("F5", "-1")]
    [InlineData("F5", "1/2")]
    [InlineData("Q", "0")]
    [InlineData("Q", "2/4")]
    [InlineData("Q", "4/1")]
    [InlineData("Q", "1/1")]
    public void OnlyCanonicalNonZeroElementsAreCorrections(string field, string value)
    {
        var cert = Edit(Examples.WireCausal(field), c => c["corrections"]!["a"]!["b"] = value);
        AssertInvalid(cert, $"c_a(b) = \"{value}\" is not a canonical non-zero element of {field}");
    }

    [Fact]
    public void LongValuesAreShownByTheirSizeFrom3000Bits()
    {
        // (2^1499 + 1) / (2^1499 + 3) is reduced (both odd, they differ by 2); numerator and denominator have
        // 1500 bits each, 3000 together, so the message shows each part cut, not the fraction's text.
        var (num, den) = (BigInteger.Pow(2, 1499) + 1, BigInteger.Pow(2, 1499) + 3);
        var cert = Edit(Examples.WireGeneral(), c => c["corrections"]!["a"]!["b"] = $"{num}/{den}");
        AssertInvalid(cert, $"(A c_a)(a) = ({num.ToString()[..80]}...)/({den.ToString()[..80]}...), not 1");
        var small = (BigInteger.Pow(2, 1498) + 1, BigInteger.Pow(2, 1499) + 3);
        AssertInvalid(Edit(Examples.WireGeneral(), c => c["corrections"]!["a"]!["b"] = $"{small.Item1}/{small.Item2}"),
            $"(A c_a)(a) = {small.Item1.ToString()[..80]}..., not 1");
        string Depth(BigInteger d) => Examples.WireCausal().ToString(Formatting.None).Replace("\"depth\":2", $"\"depth\":{d}");
        AssertInvalid(CheckText(Depth(BigInteger.Pow(2, 2999))), "depth is a number of 3000 bits but there are 2 rounds");
        var below = BigInteger.Pow(2, 2999) - 1;
        AssertInvalid(CheckText(Depth(below)), $"depth is {below.ToString()[..80]}... but there are 2 rounds");
    }
}

/// <summary>Witness objects of a labelled proof of absence (flows.md 9.5, docs/checker.md rule 9): each shape
/// fault is named (the wording is the checker's own: common practice).</summary>
public class LabelledWitnessShapeTests
{
    // i - a - b - o, i an input, a labelled XZ, b labelled Y: U = {a, i} is blocked (LabelledTests.PerNodeWitnessesOfAbsence).
    const string Graph = "{'inputs':['i'],'outputs':['o'],'nodes':['a','b','i','o'],'edges':[['a','b','1'],['a','i','1'],['b','o','1']],'labels':{'a':'XZ','b':'Y'}}";

    static JObject Proof(string obstruction)
    {
        var c = Cert("pauli", "F2", Graph, $"'verdict':'noflow','obstruction':{obstruction}");
        c["version"] = 2;
        return c;
    }

    static JObject With(string witnesses) => Proof($"{{'blocked':['a','i'],'witnesses':{witnesses}}}");

    [Fact]
    public void EachShapeFaultIsNamed()
    {
        AssertValid(With("{'a':{'rows':['i'],'self':true},'i':{'rows':['i'],'self':false}}"), "valid: no Pauli flow over F2, blocked set of 2 nodes");
        AssertInvalid(Proof("{'blocked':['a','i']}"), "invalid: missing obstruction.witnesses");
        AssertInvalid(With("[]"), "invalid: obstruction.witnesses must be an object, found array");
        AssertInvalid(With("{'i':{'rows':['i'],'self':false},'a':{'rows':['i'],'self':true}}"), "invalid: obstruction.witnesses: \"a\" after \"i\"");
        AssertInvalid(With("{'a':[],'i':{'rows':['i'],'self':false}}"), "invalid: obstruction.witnesses.a must be an object, found array");
        AssertInvalid(With("{'a':{'rows':['i'],'self':true,'x':1},'i':{'rows':['i'],'self':false}}"), "invalid: unknown key \"x\" in obstruction.witnesses.a");
        AssertInvalid(With("{'a':{'self':true},'i':{'rows':['i'],'self':false}}"), "invalid: missing obstruction.witnesses.a.rows");
        AssertInvalid(With("{'a':{'rows':['i']},'i':{'rows':['i'],'self':false}}"), "invalid: missing obstruction.witnesses.a.self");
        AssertInvalid(With("{'a':{'rows':'i','self':true},'i':{'rows':['i'],'self':false}}"), "invalid: obstruction.witnesses.a.rows must be an array, found string");
        AssertInvalid(With("{'a':{'rows':['i'],'self':1},'i':{'rows':['i'],'self':false}}"), "invalid: obstruction.witnesses.a.self must be true or false, found integer");
        AssertInvalid(With("{'a':{'rows':['i','a'],'self':true},'i':{'rows':['i'],'self':false}}"), "invalid: obstruction.witnesses.a.rows: \"a\" after \"i\"");
        AssertInvalid(With("{'a':{'rows':['i','i'],'self':true},'i':{'rows':['i'],'self':false}}"), "invalid: obstruction.witnesses.a.rows: \"i\" after \"i\"");
        AssertInvalid(With("{'a':{'rows':['i'],'self':true},'o':{'rows':['i'],'self':false}}"), "invalid: obstruction.witnesses: o is not in the blocked set");
    }
}

/// <summary>The progress line on a terminal (docs/checker.md; issue 11, target 5): shown as the run goes, erased
/// at the end whatever the verdict, silent with --quiet. Timing is passed in: after 0 ms, redrawn every time.</summary>
public class ProgressLineTests
{
    static Result RunShowing(params string[] args) => RunTimed((0, 0), args);

    static Result RunTimed((long AfterMs, long EveryMs) timing, params string[] args)
    {
        var (stdout, stderr) = (new StringWriter(), new StringWriter());
        var code = Program.Run(args, stdout, stderr, progress: timing);
        return new Result(code, stdout.ToString(), stderr.ToString());
    }

    const string Erase = "\r                                                                               \r";

    [Fact]
    public void AValidRunShowsEachStageAndErasesItsLine()
    {
        var r = RunShowing(Write(Examples.WireCausal().ToString(), ".json"));
        Assert.Equal(0, r.Code);
        Assert.StartsWith("valid: causal flow over Q, depth 2", r.First);
        Assert.Contains("\rflowcheck: reading: byte ", r.Err);
        Assert.Contains("\rflowcheck: correction vectors checked up to node 2 of 3, ", r.Err);
        Assert.EndsWith(Erase, r.Err);
        foreach (var line in r.Err.Split('\r').Where(l => l.StartsWith("flowcheck: ")))
        {
            Assert.Equal(79, line.Length);
            var seconds = double.Parse(line.TrimEnd().Split(", ")[^1].Replace(" s elapsed", ""), System.Globalization.CultureInfo.InvariantCulture);
            Assert.InRange(seconds, 0, 100);
        }
    }

    [Fact]
    public void WitnessesAreCountedAndInvalidAndUnreadableRunsEraseTheLineToo()
    {
        var noflow = RunShowing(Write(Examples.FanGeneralNoFlow().ToString(), ".json"));
        Assert.Equal(0, noflow.Code);
        Assert.Contains("\rflowcheck: witnesses checked: 1 (blocked set of 2), ", noflow.Err);
        var invalid = RunShowing(Write(Edit(Examples.WireCausal(), c => c["depth"] = 3).ToString(), ".json"));
        Assert.Equal(1, invalid.Code);
        Assert.EndsWith(Erase, invalid.Err);
        var unreadable = RunShowing(Write(Examples.WireCausal().ToString() + "x", ".json"));
        Assert.Equal(2, unreadable.Code);
        Assert.Matches("^\rflowcheck: reading: .*\r {79}\runreadable: .*content after the JSON value", unreadable.Err);
    }

    static int Lines(string err) => err.Split("\rflowcheck: ").Length - 1;

    [Fact]
    public void ALineWaitsForItsDelayAndIsRedrawnNoSoonerThanItsInterval()
    {
        var cert = Write(Examples.WireCausal().ToString(), ".json");
        var late = RunTimed((3_600_000, 0), cert);
        Assert.Equal(0, late.Code);
        Assert.Equal("", late.Err);
        Assert.True(Lines(RunShowing(cert).Err) >= 2);
        var sparse = RunTimed((0, 3_600_000), cert);
        Assert.Equal(0, sparse.Code);
        Assert.Equal(1, Lines(sparse.Err));
    }

    [Fact]
    public void ALineIsErasedOnce()
    {
        var terminal = new StringWriter();
        var meter = new Progress(terminal, (0, 0));
        meter.Done();
        Assert.Equal("", terminal.ToString());
        meter.Show("stage");
        meter.Done();
        meter.Done();
        Assert.Matches(@"^\rflowcheck: stage, \d+\.\d s elapsed +\r {79}\r$", terminal.ToString());
    }

    [Fact]
    public void QuietAndANonTerminalShowNothing()
    {
        var cert = Write(Examples.WireCausal().ToString(), ".json");
        var quiet = RunShowing(cert, "--quiet");
        Assert.Equal((0, ""), (quiet.Code, quiet.Err));
        var plain = Run(cert);
        Assert.Equal((0, ""), (plain.Code, plain.Err));
    }

    [Fact]
    public void HelpListsEachOption()
    {
        var r = Run("--help");
        Assert.Equal(
            [Program.Usage, "Checks a flowcert certificate: exit 0 valid, 1 invalid, 2 unreadable input.",
             "--graph GRAPH: the certificate must be about exactly this .ograph file.", "--quiet: no progress lines on a terminal.", ""],
            r.Out.ReplaceLineEndings("\n").Split('\n'));
    }
}
