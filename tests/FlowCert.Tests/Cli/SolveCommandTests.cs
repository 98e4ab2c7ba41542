using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>
/// `flowcert solve` end to end, in-process: exit codes 0 (flow), 1 (no flow), 2 (bad input), what the
/// certificate says, and that nothing but the promised files is ever left in the output folder.
/// </summary>
public class SolveCommandTests
{
    [Fact]
    public void AFlowExitsZeroAndWritesItsCertificate()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("wire.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("flow of minimum depth 3", run.Stdout);
        Assert.Contains("certificate " + w.PathOf("wire.json"), run.Stdout);
        Assert.Equal("", run.Stderr);
        var cert = JObject.Parse(w.Read("wire.json"));
        Assert.Equal("flowcert-certificate", (string?)cert["format"]);
        Assert.Equal("flow", (string?)cert["verdict"]);
        Assert.Equal(3, (int?)cert["depth"]);
        Assert.Equal("Q", (string?)cert["field"]);
        Assert.Equal("general", (string?)cert["flow"]);
        Assert.Equal(Hashes.Sha256Hex(Designs.WireCanonical), (string?)cert["graphSha256"]);
        Assert.Equal(["a", "b", "c"], cert["rounds"]!.SelectMany(r => r.Values<string>()).Select(n => n!).Order().ToArray());
        w.AssertExactly("wire.ograph", "wire.json");
    }

    [Fact]
    public void NoFlowExitsOneAndStillWritesTheCertificate()
    {
        using var w = new Workspace();
        var graph = w.Write("merge.ograph", Designs.Merge);
        foreach (var kind in new[] { "general", "causal" })
        {
            var run = Flowcert.InProcess("solve", graph, "--flow", kind, "--out", w.PathOf($"merge.{kind}.json"));
            Assert.True(run.ExitCode == 1, run.ToString());
            Assert.Contains("NO FLOW", run.Stdout);
            var cert = JObject.Parse(w.Read($"merge.{kind}.json"));
            Assert.Equal("noflow", (string?)cert["verdict"]);
            Assert.Equal(kind, (string?)cert["flow"]);
            Assert.Null(cert["depth"]);
            Assert.Equal(["in1", "in2"], cert["obstruction"]!["blocked"]!.Values<string>().Select(n => n!).ToArray());
            if (kind == "general")
            {
                // Each witness y must satisfy y(in1) * A[in1][mid] + y(in2) * A[in2][mid] = 0 over Q, i.e. y(in1) = -y(in2).
                var witnesses = cert["obstruction"]!["witnesses"]!.Children<JObject>().ToList();
                Assert.NotEmpty(witnesses);
                foreach (var y in witnesses)
                {
                    Assert.True(FlowCert.Algebra.Rational.TryParse((string)y["in1"]!, out var y1));
                    Assert.True(FlowCert.Algebra.Rational.TryParse((string)y["in2"]!, out var y2));
                    Assert.Equal(y1, -y2);
                    Assert.False(y1.IsZero);
                }
            }
            else Assert.Null(cert["obstruction"]!["witnesses"]);
        }
        w.AssertExactly("merge.ograph", "merge.general.json", "merge.causal.json");
    }

    [Fact]
    public void ABadFileExitsTwoWithFileLineAndColumnAndWritesNothing()
    {
        using var w = new Workspace();
        var graph = w.Write("broken.ograph", Designs.Broken);
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("broken.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains($"{graph}:3:10: ", run.Stderr);
        Assert.Contains("zero", run.Stderr);
        Assert.Equal("", run.Stdout);
        w.AssertExactly("broken.ograph");
    }

    [Fact]
    public void ABadFileLeavesAnEarlierCertificateUntouched()
    {
        using var w = new Workspace();
        var good = w.Write("wire.ograph", Designs.Wire);
        Assert.Equal(0, Flowcert.InProcess("solve", good, "--out", w.PathOf("cert.json")).ExitCode);
        var before = w.Bytes("cert.json");
        var bad = w.Write("broken.ograph", Designs.Broken);
        Assert.Equal(2, Flowcert.InProcess("solve", bad, "--out", w.PathOf("cert.json")).ExitCode);
        Assert.Equal(before, w.Bytes("cert.json"));
        w.AssertExactly("wire.ograph", "broken.ograph", "cert.json");
    }

    [Theory]
    [InlineData("--bogus")]
    [InlineData("--fields")]
    [InlineData("-x")]
    public void AnUnknownOptionExitsTwo(string option)
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, option, "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains(option, run.Stderr);
        Assert.Contains("flowcert --help", run.Stderr);
        w.AssertExactly("wire.ograph");
    }

    [Theory]
    [InlineData("")]
    [InlineData("frobnicate")]
    [InlineData("solve")]
    [InlineData("solve a.ograph b.ograph")]
    public void AMissingOrUnknownCommandOrArgumentExitsTwo(string commandLine)
    {
        var run = Flowcert.InProcess(commandLine.Split(' ', StringSplitOptions.RemoveEmptyEntries));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.NotEqual("", run.Stderr);
    }

    [Fact]
    public void AMissingFileExitsTwoNamingIt()
    {
        using var w = new Workspace();
        var missing = w.PathOf("nowhere.ograph");
        var run = Flowcert.InProcess("solve", missing, "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains(missing, run.Stderr);
        Assert.DoesNotContain("internal error", run.Stderr);
        w.AssertExactly();
    }

    [Theory]
    [InlineData("6")]
    [InlineData("4")]
    [InlineData("F9")]
    [InlineData("561")]
    public void ACompositeModulusIsRefusedInOneSentencePointingToCompositeDimensions(string modulus)
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--field", modulus, "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        var message = run.Stderr.TrimEnd('\n');
        Assert.DoesNotContain("\n", message);
        Assert.StartsWith("flowcert: ", message);
        Assert.Contains("composite", message);
        Assert.Contains("README section \"Composite dimensions\"", message);
        Assert.EndsWith(".", message);
        Assert.DoesNotContain(". ", message.TrimEnd('.'));
        Assert.Equal("", run.Stdout);
        w.AssertExactly("wire.ograph");
    }

    [Fact]
    public void AWeightWhoseDenominatorIsDivisibleByPIsRefusedNamingTheEdge()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--field", "3", "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains(graph, run.Stderr);
        Assert.Contains("edge c d", run.Stderr);
        Assert.Contains("-1/3", run.Stderr);
        Assert.Contains("F3", run.Stderr);
        w.AssertExactly("wire.ograph");
        // The same graph is fine where 3 is invertible.
        Assert.Equal(0, Flowcert.InProcess("solve", graph, "--field", "7").ExitCode);
    }

    [Theory]
    [InlineData("wire.ograph")]
    [InlineData("./wire.ograph")]
    [InlineData("sub/../wire.ograph")]
    public void TheInputGraphIsNeverOverwritten(string outRelative)
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        Directory.CreateDirectory(w.PathOf("sub"));
        var run = Flowcert.InProcess("solve", graph, "--out", Path.Combine(w.Root.FullName, outRelative));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("refusing to write", run.Stderr);
        Assert.Equal(Designs.Wire, w.Read("wire.ograph"));
        w.AssertExactly("wire.ograph", "sub/");
    }

    [Theory]
    [InlineData("graph")]
    [InlineData("out")]
    [InlineData("out-dir")]
    public void AnEmptyPathIsBadInputNotAnInternalError(string which)
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = which switch
        {
            "graph" => Flowcert.InProcess("solve", ""),
            "out" => Flowcert.InProcess("solve", graph, "--out", ""),
            _ => Flowcert.InProcess("demo", "--out-dir", ""),
        };
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.DoesNotContain("internal error", run.Stderr);
        Assert.DoesNotContain("   at ", run.Stderr); // no stack trace
        Assert.Contains("empty", run.Stderr);
        w.AssertExactly("wire.ograph");
    }

    [Fact]
    public void AnUnknownFlowKindExitsTwo()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--flow", "spiral", "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("'spiral' is not a kind of flow", run.Stderr);
        w.AssertExactly("wire.ograph");
    }

    [Fact]
    public void AnOutputFolderThatDoesNotExistExitsTwo()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("missing/c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("does not exist", run.Stderr);
        w.AssertExactly("wire.ograph");
    }

    [Fact]
    public void AFailedRenameLeavesNoTemporaryFileBehind()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        Directory.CreateDirectory(w.PathOf("taken.json")); // the certificate path is a folder: the rename must fail
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("taken.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.DoesNotContain("internal error", run.Stderr);
        w.AssertExactly("wire.ograph", "taken.json/");
    }

    [Fact]
    public void EdgesThatVanishInFpAreReportedAsAWarning()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--field", "2");
        Assert.DoesNotContain("warning", run.Stdout);
        Assert.Equal($"flowcert: warning: {graph}: 1 edge has weight 0 in F2 and vanishes: b-c (2)\n", run.Stderr.ReplaceLineEndings("\n"));
        // Without b - c the wire falls apart: b cannot be corrected (flows.md section 6).
        Assert.Equal(1, run.ExitCode);
        var clean = Flowcert.InProcess("solve", graph, "--field", "5");
        Assert.DoesNotContain("warning", clean.Stdout + clean.Stderr);
        Assert.DoesNotContain("vanish", clean.Stdout + clean.Stderr);

        var several = w.Write("several.ograph", "input a\noutput e\nedge a b 0.75\nedge b c 3\nedge c d 1\nedge d e 6/5\n");
        var run3 = Flowcert.InProcess("solve", several, "--field", "3");
        // 0.75 = 3/4, 3 and 6/5 all have a numerator divisible by 3; c - d stays.
        Assert.Contains("3 edges have weight 0 in F3 and vanish: a-b (3/4), b-c (3), d-e (6/5)", run3.Stderr);
        w.AssertExactly("wire.ograph", "several.ograph");
    }

    [Fact]
    public void CertificatesAreByteIdenticalAcrossRuns()
    {
        using var w = new Workspace();
        var wire = w.Write("wire.ograph", Designs.Wire);
        var merge = w.Write("merge.ograph", Designs.Merge);
        foreach (var (graph, name) in new[] { (wire, "wire"), (merge, "merge") })
            foreach (var field in new[] { "Q", "5", "2305843009213693951" })
                foreach (var kind in new[] { "general", "causal" })
                {
                    var first = w.PathOf($"{name}.{field}.{kind}.1.json");
                    var second = w.PathOf($"{name}.{field}.{kind}.2.json");
                    int code = Flowcert.InProcess("solve", graph, "--field", field, "--flow", kind, "--out", first).ExitCode;
                    Assert.Equal(code, Flowcert.InProcess("solve", graph, "--field", field, "--flow", kind, "--out", second).ExitCode);
                    Assert.Equal(File.ReadAllBytes(first), File.ReadAllBytes(second));
                    var text = File.ReadAllText(first);
                    Assert.EndsWith("}\n", text);
                    Assert.DoesNotContain("\r", text);
                }
        Assert.Equal(2 + 2 * 3 * 2 * 2, w.Listing().Length);
        Assert.DoesNotContain(w.Listing(), f => f.EndsWith(".tmp"));
    }

    // solve --out writes the certificate's head on a second core while solving, then the body: the bytes must
    // be those of the library's one-piece writer, for a flow and for a proof of absence.
    [Fact]
    public void TheCertificateWrittenBesideTheSolveIsTheLibrarysCertificate()
    {
        using var w = new Workspace();
        foreach (var (design, name) in new[] { (Designs.Wire, "wire"), (Designs.Merge, "merge") })
            foreach (var field in new[] { "Q", "2" })
            {
                var graph = w.Write($"{name}.ograph", design);
                var cert = w.PathOf($"{name}.{field}.json");
                Flowcert.InProcess("solve", graph, "--field", field, "--out", cert);
                var expected = FlowCert.Certificates.CertificateWriter.Write(FlowCert.Flows.FlowSolver.Solve(
                    FlowCert.Graphs.OgraphReader.Parse(design, graph), FlowCert.Algebra.FieldSpec.Parse(field), FlowCert.Flows.FlowKind.General));
                Assert.Equal(expected, File.ReadAllText(cert));
            }
    }

    [Fact]
    public void AnOutputPathThatIsAFolderIsRefusedNamingIt()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        Directory.CreateDirectory(w.PathOf("taken.json"));
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("taken.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains($"cannot write {w.PathOf("taken.json")}: it is a folder", run.Stderr);
    }

    [Fact]
    public void JsonListsTheEdgesThatVanishInFp()
    {
        using var w = new Workspace();
        var graph = w.Write("several.ograph", "input a\noutput e\nedge a b 0.75\nedge b c 3\nedge c d 1\nedge d e 6/5\n");
        var run = Flowcert.InProcess("solve", graph, "--field", "3", "--json");
        var vanished = JObject.Parse(run.Stdout)["vanishedEdges"]!.Select(e => string.Join(" ", e.Values<string>())).ToArray();
        // 3/4, 3 and 6/5 have numerators divisible by 3 (flows.md section 1); c - d stays.
        Assert.Equal(["a b 3/4", "b c 3", "d e 6/5"], vanished);
    }

    [Fact]
    public void ALongListOfVanishedEdgesIsCutAfterTenAndSaysHowManyThereAre()
    {
        using var w = new Workspace();
        // Twelve rungs of weight 2, all 0 in F2.
        var graph = w.Write("ladder.ograph", string.Concat(Enumerable.Range(0, 12).Select(i => $"edge n{i:00} m{i:00} 2\n")));
        var line = Flowcert.InProcess("solve", graph, "--field", "2").Stderr.Split('\n').Single(l => l.StartsWith("flowcert: warning: ") && l.Contains("vanish"));
        Assert.Contains("12 edges have weight 0 in F2 and vanish: m00-n00 (2), ", line);
        Assert.EndsWith(", ... (12 in all)", line);
        Assert.Equal(10, line.Split(", ").Count(part => part.EndsWith("(2)")));
    }
}
