using FlowCert.Algebra;
using FlowCert.Graphs;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>`flowcert demo --out-dir DIR`: exit 0, exactly the expected files, each certificate what `solve` writes.</summary>
public class DemoCommandTests
{
    // The fields and kinds the demo command promises in its description: "over Q, F2, F3 and F5".
    private static readonly string[] Fields = ["Q", "F2", "F3", "F5"];
    private static readonly string[] Kinds = ["general", "causal"];

    /// <summary>The certificate files the demo must write for the graphs it wrote: one per field and kind
    /// in which every weight has a value (docs/formats.md: the solver refuses a weight whose denominator p divides).</summary>
    private static List<string> ExpectedCertificates(Workspace w, string folder, IEnumerable<string> graphFiles)
    {
        var expected = new List<string>();
        foreach (var file in graphFiles)
        {
            var design = Path.GetFileNameWithoutExtension(file);
            var g = OgraphReader.ReadFile(w.PathOf($"{folder}/{file}"));
            foreach (var field in Fields)
            {
                bool defined = field == "Q" || g.Edges.All(e => e.Weight.Denominator % ulong.Parse(field[1..]) != 0);
                if (!defined) continue;
                foreach (var kind in Kinds) expected.Add($"{folder}/{design}.{field}.{kind}.json");
            }
        }
        return expected;
    }

    [Fact]
    public void TheDemoWritesExactlyItsGraphsAndCertificates()
    {
        using var w = new Workspace();
        var run = Flowcert.InProcess("demo", "--out-dir", w.PathOf("demo"));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("Merrow Reach", run.Stdout);

        var graphs = Directory.GetFiles(w.PathOf("demo"), "*.ograph").Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(["delay-pair.ograph", "loop-wire.ograph", "merge-attempt.ograph", "qutrit-patch.ograph", "splitter-pair.ograph"], graphs.Select(n => n!).ToArray());
        var certificates = ExpectedCertificates(w, "demo", graphs!);
        w.AssertExactly(["demo/", .. graphs.Select(g => "demo/" + g), .. certificates]);
        Assert.Contains($"{certificates.Count} certificates written", run.Stdout);
        // loop-wire has weights -1/2 and 0.75: it has no meaning in F2, and the summary says so.
        Assert.DoesNotContain("demo/loop-wire.F2.general.json", certificates);
        Assert.Contains("F2  not defined: edge t1 t2 has weight -1/2, which has no value in F2", run.Stdout);

        foreach (var cert in certificates)
        {
            // design.field.kind.json
            var parts = Path.GetFileName(cert).Split('.');
            var json = JObject.Parse(w.Read(cert));
            Assert.Equal(parts[1], (string?)json["field"]);
            Assert.Equal(parts[2], (string?)json["flow"]);
            var graphText = w.Read($"demo/{parts[0]}.ograph");
            Assert.Equal(Hashes.Sha256Hex(CanonicalForm.Write(OgraphReader.Parse(graphText, "g"))), (string?)json["graphSha256"]);

            // The demo's certificate is byte for byte what `solve` writes for the same graph, field and kind.
            var again = w.PathOf("again.json");
            var solve = Flowcert.InProcess("solve", w.PathOf($"demo/{parts[0]}.ograph"), "--field", parts[1], "--flow", parts[2], "--out", again);
            Assert.Equal((string?)json["verdict"] == "flow" ? 0 : 1, solve.ExitCode);
            Assert.Equal(w.Bytes(cert), File.ReadAllBytes(again));
            File.Delete(again);
        }
    }

    [Fact]
    public void TwoDemoRunsWriteIdenticalBytes()
    {
        using var w = new Workspace();
        Assert.Equal(0, Flowcert.InProcess("demo", "--out-dir", w.PathOf("one")).ExitCode);
        Assert.Equal(0, Flowcert.InProcess("demo", "--out-dir", w.PathOf("two")).ExitCode);
        var one = Directory.GetFiles(w.PathOf("one")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        var two = Directory.GetFiles(w.PathOf("two")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(one, two);
        Assert.All(one, f => Assert.Equal(w.Bytes("one/" + f), w.Bytes("two/" + f)));
        // A second run into the same folder replaces the files in place and leaves nothing else behind.
        Assert.Equal(0, Flowcert.InProcess("demo", "--out-dir", w.PathOf("one")).ExitCode);
        Assert.Equal(one, Directory.GetFiles(w.PathOf("one")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray());
        Assert.DoesNotContain(w.Listing(), f => f.EndsWith(".tmp"));
    }
}
