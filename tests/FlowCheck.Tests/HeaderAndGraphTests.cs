using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>Rules of docs/formats.md on the certificate header and the embedded graph (common practice:
/// a checker accepts nothing it does not understand).</summary>
public class HeaderAndGraphTests
{
    static readonly JObject Wire = Examples.WireCausal();

    [Theory]
    [InlineData("format", "\"flowcert-certificat\"", "unknown format \"flowcert-certificat\"")]
    [InlineData("format", "7", "format must be a string, found integer")]
    [InlineData("version", "3", "unknown version 3 (this checker knows versions 1 and 2)")]
    [InlineData("version", "2", "version 2: version 2 is exactly for graphs with a label other than XY and for pauli flow")]
    [InlineData("version", "1.0", "version must be an integer, found float")]
    [InlineData("version", "\"1\"", "version must be an integer, found string")]
    [InlineData("flow", "\"spiral\"", "unknown flow \"spiral\" (expected general, causal or pauli)")]
    [InlineData("field", "\"R\"", "unknown field \"R\" (expected \"Q\" or \"F\" and a prime)")]
    [InlineData("field", "\"F03\"", "unknown field \"F03\"")]
    [InlineData("field", "\"F\"", "unknown field \"F\"")]
    [InlineData("field", "\"f3\"", "unknown field \"f3\"")]
    [InlineData("field", "\"F3 \"", "unknown field \"F3 \"")]
    [InlineData("field", "\"F1\"", "field F1: 1 is not a prime")]
    [InlineData("field", "\"F9\"", "field F9: 9 is not a prime")]
    [InlineData("field", "\"F3215031751\"", "field F3215031751: 3215031751 is not a prime")]
    [InlineData("field", "\"F3317044064679887385961981\"", "field F3317044064679887385961981: p is beyond the deterministic primality test")]
    [InlineData("verdict", "\"maybe\"", "unknown verdict \"maybe\" (expected flow or noflow)")]
    [InlineData("verdict", "null", "verdict must be a string, found null")]
    [InlineData("producer", "{\"name\":\"x\"}", "missing producer.version")]
    [InlineData("producer", "{\"name\":\"x\",\"version\":\"1\",\"when\":\"now\"}", "unknown key \"when\" in producer")]
    [InlineData("producer", "{\"name\":1,\"version\":\"1\"}", "producer.name must be a string, found integer")]
    [InlineData("producer", "[]", "producer must be an object, found array")]
    [InlineData("extra", "1", "unknown key \"extra\" in certificate")]
    [InlineData("graphSha256", "\"00\"", "graphSha256 is 00 but the embedded graph hashes to 6385fa1c")]
    public void HeaderValuesAreCheckedExactly(string key, string json, string message)
    {
        var cert = Edit(Wire, c => c[key] = JToken.Parse(json), rehash: false);
        AssertInvalid(cert, "invalid: " + message);
    }

    [Theory]
    [InlineData("format")]
    [InlineData("version")]
    [InlineData("flow")]
    [InlineData("field")]
    [InlineData("graph")]
    [InlineData("graphSha256")]
    [InlineData("verdict")]
    public void MissingRequiredKeysAreNamed(string key) =>
        AssertInvalid(Edit(Wire, c => c.Remove(key), rehash: false), $"invalid: missing {key}");

    [Fact]
    public void ProducerIsOptional() =>
        AssertValid(Edit(Wire, c => c.Remove("producer")), "valid: causal flow over Q, depth 2");

    [Fact]
    public void CertificateMustBeAnObject()
    {
        AssertInvalid(CheckText("[1, 2]"), "invalid: certificate must be an object, found array");
        AssertInvalid(CheckText("\"text\""), "invalid: certificate must be an object, found string");
    }

    [Theory]
    [InlineData("nodes", "['a','c','b']", "graph.nodes: \"b\" after \"c\" (must be sorted, no duplicates)")]
    [InlineData("nodes", "['a','b','b','c']", "graph.nodes: \"b\" after \"b\"")]
    [InlineData("nodes", "['1a','b','c']", "graph.nodes: \"1a\" is not a valid node name")]
    [InlineData("nodes", "['a','b','c d']", "graph.nodes: \"c d\" is not a valid node name")]
    [InlineData("nodes", "['a','b','c\\n']", "graph.nodes: \"c\\u000a\" is not a valid node name")]
    [InlineData("nodes", "['a','b','\u00e9']", "graph.nodes: \"\u00e9\" is not a valid node name")]
    [InlineData("nodes", "'abc'", "graph.nodes must be an array, found string")]
    [InlineData("nodes", "['a',1]", "graph.nodes[1] must be a string, found integer")]
    [InlineData("inputs", "['z']", "graph: input/output z is not in graph.nodes")]
    [InlineData("outputs", "['c','z']", "graph: input/output z is not in graph.nodes")]
    [InlineData("inputs", "['b','a']", "graph.inputs: \"a\" after \"b\"")]
    [InlineData("outputs", "['c','c']", "graph.outputs: \"c\" after \"c\"")]
    [InlineData("edges", "[['a','b','1'],['b','c']]", "graph.edges[1] must be [u, v, weight], found 2 items")]
    [InlineData("edges", "[['a','b','1'],['b','c','1','x']]", "graph.edges[1] must be [u, v, weight], found 4 items")]
    [InlineData("edges", "[['a','b','1'],['b','z','1']]", "graph.edges[1]: b z names a node not in graph.nodes")]
    [InlineData("edges", "[['a','b','1'],['z','c','1']]", "graph.edges[1]: z c names a node not in graph.nodes")]
    [InlineData("edges", "[['b','a','1'],['b','c','1']]", "graph.edges[0]: b a must have u < v")]
    [InlineData("edges", "[['a','b','1'],['b','b','1']]", "graph.edges[1]: b b must have u < v")]
    [InlineData("edges", "[['b','c','1'],['a','b','1']]", "graph.edges[1]: a b after b c (must be sorted, no duplicates)")]
    [InlineData("edges", "[['a','c','1'],['a','b','1']]", "graph.edges[1]: a b after a c")]
    [InlineData("edges", "[['a','b','1'],['a','b','1']]", "graph.edges[1]: a b after a b")]
    [InlineData("edges", "[['a','b','0'],['b','c','1']]", "graph.edges[0]: weight \"0\" of a b is not a canonical non-zero rational")]
    [InlineData("edges", "[['a','b','2/4'],['b','c','1']]", "graph.edges[0]: weight \"2/4\" of a b is not a canonical")]
    [InlineData("edges", "[['a','b','0.5'],['b','c','1']]", "graph.edges[0]: weight \"0.5\" of a b")]
    [InlineData("edges", "[['a','b','1/1'],['b','c','1']]", "graph.edges[0]: weight \"1/1\" of a b")]
    [InlineData("edges", "[['a','b','01'],['b','c','1']]", "graph.edges[0]: weight \"01\" of a b")]
    [InlineData("edges", "[['a','b','+1'],['b','c','1']]", "graph.edges[0]: weight \"+1\" of a b")]
    [InlineData("edges", "[['a','b','1/-2'],['b','c','1']]", "graph.edges[0]: weight \"1/-2\" of a b")]
    [InlineData("edges", "[['a','b',1],['b','c','1']]", "graph.edges[0][2] must be a string, found integer")]
    [InlineData("edges", "{}", "graph.edges must be an array, found object")]
    public void EmbeddedGraphMustBeCanonical(string key, string json, string message)
    {
        var cert = Edit(Wire, c => c["graph"]![key] = JToken.Parse(json));
        AssertInvalid(cert, "invalid: " + message);
    }

    [Fact]
    public void EmbeddedGraphKeysAreExact()
    {
        AssertInvalid(Edit(Wire, c => ((JObject)c["graph"]!).Remove("edges"), rehash: false), "invalid: missing graph.edges");
        AssertInvalid(Edit(Wire, c => c["graph"]!["at"] = new JArray(), rehash: false), "invalid: unknown key \"at\" in graph");
        AssertInvalid(Edit(Wire, c => c["graph"] = new JArray(), rehash: false), "invalid: graph must be an object, found array");
    }

    [Fact]
    public void HashIsOfTheCanonicalForm()
    {
        // A different weight with the old hash: the hash no longer matches.
        var cert = Edit(Wire, c => c["graph"]!["edges"]![1]![2] = "2", rehash: false);
        AssertInvalid(cert, "invalid: graphSha256 is 6385fa1c", "but the embedded graph hashes to ");
        // Upper-case hex is not the canonical lowercase hash.
        AssertInvalid(Edit(Wire, c => c["graphSha256"] = c["graphSha256"]!.ToString().ToUpperInvariant(), rehash: false), "invalid: graphSha256 is 6385FA1C");
    }

    [Fact]
    public void IsolatedNodesAreHashedAsNodeLines()
    {
        var cert = Edit(Wire, c =>
        {
            c["graph"]!["nodes"] = new JArray("a", "b", "c", "d");
            c["graph"]!["outputs"] = new JArray("c", "d");
        });
        // "input a\noutput c d\nnode d\nedge a b 1\nedge b c 1\n" hashed by coreutils sha256sum.
        Assert.Equal("32fb897c2d5aa7102767aa8570ca8b1db5f16f140d9ef5f70b53dacb3923ae23", cert["graphSha256"]!.ToString());
        AssertValid(cert, "valid: causal flow over Q, depth 2");
    }

    [Fact]
    public void WeightWhoseDenominatorIsDivisibleByPIsMeaningless()
    {
        var cert = Edit(Examples.SquareF3(), c => c["graph"]!["edges"]![0]![2] = "1/3");
        AssertInvalid(cert, "invalid: edge a x: weight 1/3 has no meaning in F3 (p divides the denominator)");
    }

    [Fact]
    public void WeightsAreReducedIntoTheField()
    {
        // 4 = 1 and -1/2 = 1 in F3 (2^-1 = 2, -2 = 1), so the square's weights read the same in F3.
        var cert = Edit(Examples.SquareF3(), c =>
        {
            c["graph"]!["edges"]![0]![2] = "4";
            c["graph"]!["edges"]![3]![2] = "1/2";
        });
        AssertValid(cert, "valid: generalized flow over F3, depth 1");
    }

    [Fact]
    public void VanishingEdgesAreReported()
    {
        // Edge a-b of weight 6 is 0 in F3: it vanishes, the flow stays valid, and the checker says so.
        var cert = Edit(Examples.SquareF3(), c =>
            c["graph"]!["edges"] = JArray.Parse("[['a','b','6'],['a','x','1'],['a','y','1'],['b','x','1'],['b','y','-1']]"));
        var r = Check(cert);
        Assert.Equal(0, r.Code);
        Assert.Equal(["valid: generalized flow over F3, depth 1, graph sha256 " + cert["graphSha256"], "note: edge a b (weight 6) vanishes in F3"],
            r.Out.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void VanishedEdgeCannotCarryACorrection()
    {
        var cert = Edit(Examples.WireCausal("F3"), c => c["graph"]!["edges"]![1]![2] = "3");
        AssertInvalid(cert, "invalid: node b: f(b) = c is not a neighbour of b in F3");
    }
}
