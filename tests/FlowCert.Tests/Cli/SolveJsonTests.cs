using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>`flowcert solve --json`: one JSON object (parsed with Newtonsoft.Json) with every promised field.</summary>
public class SolveJsonTests
{
    private static JObject SolveJson(Workspace w, string graph, params string[] extra)
    {
        var run = Flowcert.InProcess(["solve", graph, "--json", .. extra]);
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
        Assert.Equal("", run.Stderr);
        Assert.Single(run.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries)); // one object, one line
        var json = JObject.Parse(run.Stdout);
        foreach (var key in new[] { "verdict", "depth", "flow", "field", "nodes", "edges", "measured", "graphSha256", "seconds" })
            Assert.True(json.ContainsKey(key), $"--json output lacks \"{key}\": {run.Stdout}");
        foreach (var phase in new[] { "parse", "solve", "write" })
        {
            var s = json["seconds"]![phase];
            Assert.NotNull(s);
            Assert.True(s!.Type is JTokenType.Float or JTokenType.Integer, $"seconds.{phase} is not a number");
            Assert.True((double)s >= 0);
        }
        Assert.Equal(run.ExitCode == 0 ? "flow" : "noflow", (string?)json["verdict"]);
        return json;
    }

    [Fact]
    public void AFlowReportsTheGraphAndTheDepth()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var json = SolveJson(w, graph, "--field", "5", "--flow", "causal", "--out", w.PathOf("wire.json"));
        Assert.Equal("flow", (string?)json["verdict"]);
        Assert.Equal(3, (int)json["depth"]!);
        Assert.Equal("causal", (string?)json["flow"]);
        Assert.Equal("F5", (string?)json["field"]);
        Assert.Equal(5, (int)json["nodes"]!);       // a b c d spare
        Assert.Equal(3, (int)json["edges"]!);
        Assert.Equal(3, (int)json["measured"]!);    // outputs d and spare are not measured
        Assert.Equal(Hashes.Sha256Hex(Designs.WireCanonical), (string?)json["graphSha256"]);
        // The hash printed is the one in the certificate written at the same time.
        Assert.Equal((string?)json["graphSha256"], (string?)JObject.Parse(w.Read("wire.json"))["graphSha256"]);
        w.AssertExactly("wire.ograph", "wire.json");
    }

    [Fact]
    public void NoFlowHasANullDepth()
    {
        using var w = new Workspace();
        var graph = w.Write("merge.ograph", Designs.Merge);
        var json = SolveJson(w, graph);
        Assert.Equal("noflow", (string?)json["verdict"]);
        Assert.Equal(JTokenType.Null, json["depth"]!.Type);
        Assert.Equal("general", (string?)json["flow"]);
        Assert.Equal("Q", (string?)json["field"]);
        Assert.Equal(4, (int)json["nodes"]!);
        Assert.Equal(3, (int)json["edges"]!);
        Assert.Equal(3, (int)json["measured"]!);
        Assert.Equal(Hashes.Sha256Hex(Designs.MergeCanonical), (string?)json["graphSha256"]);
        w.AssertExactly("merge.ograph");
    }

    [Fact]
    public void TheHashIgnoresCommentsLayoutAndWeightSpelling()
    {
        using var w = new Workspace();
        var respelled = w.Write("respelled.ograph",
            "node spare\r\nedge d c -2/6\r\nedge c b 2.0\r\n\r\n# same wire\r\nedge b a 1/1\r\noutput spare\r\noutput d\r\ninput a\r\nat a 0 0\r\n");
        var json = SolveJson(w, respelled);
        Assert.Equal(Hashes.Sha256Hex(Designs.WireCanonical), (string?)json["graphSha256"]);
    }
}
