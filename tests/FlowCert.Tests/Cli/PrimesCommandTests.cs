using FlowCert.Tests.Validation;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>
/// `flowcert primes` end to end: exit codes, the table's one sentence for every other prime, the --json
/// object, --check-up-to, and --out-dir certificates re-checked by the independent flowcheck program and by
/// the test-side CertificateVerifier (Fractions). The wire's exceptional primes, worked out by hand from
/// Designs.Wire: weights 1, 2, -1/3, so E holds 2 (the edge b c vanishes, and b then has no corrector:
/// no flow) and 3 (-1/3 has no value in F_3: undefined); every other prime has depth 3, as over Q.
/// </summary>
public class PrimesCommandTests
{
    private static string FlowcheckDll
    {
        get
        {
            // Built before the tests (a project reference that does not copy the assembly), as the README test finds it.
            var config = new DirectoryInfo(AppContext.BaseDirectory).Parent!.Name; // bin/<config>/net10.0
            var path = Path.Combine(FlowCert.Tests.Certificates.CorpusTests.RepositoryRoot(), "checker", "FlowCheck", "bin", config, "net10.0", "flowcheck.dll");
            Assert.True(File.Exists(path), $"{path} is not built; run dotnet test FlowCert.sln");
            return path;
        }
    }

    [Fact]
    public void TheTableNamesTheExceptionsAndSaysOnceThatEveryOtherPrimeIsAsOverQ()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("primes", graph);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Equal("", run.Stderr);
        Assert.Contains("over Q    flow, depth 3", run.Stdout);
        Assert.Contains("E         2 3: the prime factors of", run.Stdout);
        Assert.Matches(@"\n  2 +no flow \(blocked \d+ nodes?\) +DIFFERS +vanish: b-c \(2\)", run.Stdout);
        Assert.Matches(@"\n  3 +undefined at 3 ", run.Stdout);
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(run.Stdout, "every other prime: same verdict and depth as over Q"));
        w.AssertExactly("wire.ograph");
    }

    [Fact]
    public void JsonHasTheRationalAnswerTheExceptionsTheIntegersAndTheAudit()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("primes", graph, "--json", "--check-up-to", "50");
        Assert.True(run.ExitCode == 0, run.ToString());
        var o = JObject.Parse(run.Stdout);
        Assert.Equal(["graph", "graphSha256", "flow", "rational", "exceptional", "otherPrimes", "complete", "integers", "unclassified", "audit", "certificates"],
            o.Properties().Select(p => p.Name).ToArray());
        Assert.Equal(Hashes.Sha256Hex(Designs.WireCanonical), (string?)o["graphSha256"]);
        Assert.Equal("flow", (string?)o["rational"]!["verdict"]);
        Assert.Equal(3, (int?)o["rational"]!["depth"]);
        var exceptional = o["exceptional"]!.Children<JObject>().ToList();
        Assert.Equal([2, 3], exceptional.Select(e => (int)e["prime"]!).ToArray());
        Assert.Equal("noflow", (string?)exceptional[0]["answer"]!["verdict"]);
        Assert.Equal([["b", "c", "2"]], exceptional[0]["answer"]!["vanishedEdges"]!.ToObject<string[][]>()!);
        Assert.False((bool)exceptional[1]["defined"]!);
        Assert.Equal(JTokenType.Null, exceptional[1]["answer"]!.Type);
        Assert.Equal([["c", "d", "-1/3"]], exceptional[1]["undefinedEdges"]!.ToObject<string[][]>()!);
        Assert.True((bool)o["otherPrimes"]!["sameAsRational"]!);
        Assert.Equal(3, (int?)o["otherPrimes"]!["depth"]);
        Assert.True((bool)o["complete"]!);
        // The integers whose primes form E: the numerator 2 and the denominator 3 among them, each with its primes.
        var integers = o["integers"]!.Children<JObject>().ToList();
        Assert.Contains(integers, i => (string?)i["origin"] == "weightNumerator" && (string?)i["value"] == "2" && i["primes"]!.Values<string>().SequenceEqual(["2"]));
        Assert.Contains(integers, i => (string?)i["origin"] == "weightDenominator" && (string?)i["value"] == "3");
        Assert.All(integers, i => Assert.Empty(i["unfactored"]!));
        Assert.Empty(o["unclassified"]!);
        // 15 primes up to 50, each solved directly, none disagreeing.
        Assert.Equal(50, (int)o["audit"]!["upTo"]!);
        Assert.Equal(15, (int)o["audit"]!["primesSolved"]!);
        Assert.Empty(o["audit"]!["disagreements"]!);
        // Same input, same bytes.
        Assert.Equal(run.Stdout, Flowcert.InProcess("primes", graph, "--json", "--check-up-to", "50").Stdout);
    }

    [Fact]
    public void OutDirCertificatesAreValidForFlowcheckAndTheReferenceVerifier()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("primes", graph, "--out-dir", w.PathOf("certs"));
        Assert.True(run.ExitCode == 0, run.ToString());
        // Q and F2; F3 is undefined, so it has no certificate.
        w.AssertExactly("wire.ograph", "certs/", "certs/wire.Q.general.json", "certs/wire.F2.general.json");
        foreach (var (file, field, hasFlow) in new[] { ("wire.Q.general.json", "Q", true), ("wire.F2.general.json", "F2", false) })
        {
            var path = w.PathOf("certs/" + file);
            var check = ExternalProgram.Run("dotnet", "dotnet-sdk-10.0 (or the .NET 10 SDK from Microsoft)", [FlowcheckDll, path, "--graph", graph]);
            Assert.True(check.ExitCode == 0, $"flowcheck rejected {file}: {check.Stdout}{check.Stderr}");
            Assert.StartsWith("valid:", check.Stdout);
            var verdict = CertificateVerifier.Verify(File.ReadAllText(path));
            Assert.Equal(field, verdict.Field);
            Assert.Equal(hasFlow, verdict.HasFlow);
            if (hasFlow) Assert.Equal(3, verdict.Depth);
        }
        // Written again over the same folder: replaced (the folder was named), byte for byte the same.
        var before = w.Bytes("certs/wire.Q.general.json");
        Assert.Equal(0, Flowcert.InProcess("primes", graph, "--out-dir", w.PathOf("certs")).ExitCode);
        Assert.Equal(before, w.Bytes("certs/wire.Q.general.json"));
        w.AssertExactly("wire.ograph", "certs/", "certs/wire.Q.general.json", "certs/wire.F2.general.json");
    }

    [Fact]
    public void ASymbolicLinkAmongTheTargetsIsRefusedBeforeAnythingIsWritten()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        Directory.CreateDirectory(w.PathOf("certs"));
        File.CreateSymbolicLink(w.PathOf("certs/wire.F2.general.json"), graph);
        var run = Flowcert.InProcess("primes", graph, "--out-dir", w.PathOf("certs"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("symbolic link", run.Stderr);
        w.AssertExactly("wire.ograph", "certs/", "certs/wire.F2.general.json");
        Assert.Equal(Designs.Wire, w.Read("wire.ograph"));
    }

    [Fact]
    public void BadInputExitsTwoAndWritesNothing()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var broken = w.Write("broken.ograph", Designs.Broken);
        var cases = new (string[] Args, string Message)[]
        {
            (["primes", graph, "--flow", "pauli"], "not a kind of flow"),
            (["primes", graph, "--check-up-to", "ten"], "--check-up-to"),
            (["primes", graph, "--check-up-to", "1000000001"], "--check-up-to"),
            (["primes", graph, "--factor-seconds", "-1"], "--factor-seconds"),
            (["primes", w.PathOf("absent.ograph")], "absent.ograph"),
            (["primes", broken, "--out-dir", w.PathOf("certs")], "broken.ograph:3:"),
        };
        foreach (var (args, message) in cases)
        {
            var run = Flowcert.InProcess(args);
            Assert.True(run.ExitCode == 2, run.ToString());
            Assert.Contains(message, run.Stderr);
            Assert.Equal("", run.Stdout);
        }
        w.AssertExactly("wire.ograph", "broken.ograph");
    }

    [Fact]
    public void AnUnfactoredIntegerIsPrintedPlainlyAndExitsOne()
    {
        // The weight is 6 times the product of two 20-digit primes (confirmed prime by coreutils factor in
        // IntegerFactoringTests); with no factoring time the product stays whole.
        using var w = new Workspace();
        var n = System.Numerics.BigInteger.Parse("30000000000000012347") * System.Numerics.BigInteger.Parse("300000000000000012367");
        var graph = w.Write("big.ograph", $"input a\noutput b\nedge a b {n * 6}\n");
        var run = Flowcert.InProcess("primes", graph, "--factor-seconds", "0");
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.Contains($"NOT CLASSIFIED {n}: composite, not factored within the 0 s budget: primes dividing it are not classified", run.Stdout);
        Assert.Contains("does not cover primes dividing the unclassified integers above", run.Stdout);
        var json = JObject.Parse(Flowcert.InProcess("primes", graph, "--factor-seconds", "0", "--json").Stdout);
        Assert.False((bool)json["complete"]!);
        Assert.Equal(n.ToString(), (string?)json["unclassified"]![0]!["value"]);
    }

    [Fact]
    public void TheDemoSurveysTheQutritPatchOverEveryPrime()
    {
        // The scene's claims, checked against direct solves of the same design: at p = 2 the weight-2 edges
        // vanish and the flow is lost, at p = 3 the weight-3 edge vanishes but depth 3 remains, as over Q.
        using var w = new Workspace();
        var run = Flowcert.InProcess("demo", "--out-dir", w.PathOf("demo"));
        Assert.True(run.ExitCode == 0, run.ToString());
        var scene = run.Stdout[run.Stdout.IndexOf("Choosing a prime dimension", StringComparison.Ordinal)..];
        Assert.Contains("qutrit-patch.ograph", scene);
        Assert.Contains("every other prime: same verdict and depth as over Q: flow, depth 3", scene);
        var graph = w.PathOf("demo/qutrit-patch.ograph");
        Assert.Equal(0, Flowcert.InProcess("solve", graph).ExitCode);
        Assert.Equal(1, Flowcert.InProcess("solve", graph, "--field", "2").ExitCode);
        Assert.Contains("flow of minimum depth 3", Flowcert.InProcess("solve", graph, "--field", "3").Stdout);
        Assert.Matches(@"\n  2 +no flow \(blocked 3 nodes\) +DIFFERS", scene);
        Assert.Matches(@"\n  3 +flow, depth 3 +same", scene);
    }

    [Fact]
    public void StandardInputIsReadAndItsCertificatesAreNamedGraph()
    {
        using var w = new Workspace();
        var run = Flowcert.WithInput(Designs.Wire, "primes", "-", "--out-dir", w.PathOf("certs"));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("graph     standard input:", run.Stdout);
        w.AssertExactly("certs/", "certs/graph.Q.general.json", "certs/graph.F2.general.json");
    }

    [Fact]
    public void CausalSurveysSayTheirCandidatesAreTheWeightPrimes()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("primes", graph, "--flow", "causal", "--check-up-to", "30");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("causal flow depends only on which weights vanish", run.Stdout);
        Assert.Contains("E         2 3: the prime factors of", run.Stdout);
        Assert.Contains("all agree with the claim", run.Stdout);
    }
}
