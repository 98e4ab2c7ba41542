namespace FlowCert.Tests.Cli;

/// <summary>One command-line convention (README "One command-line convention"): new spellings, old ones kept, one warning shape, plurals, natural order.</summary>
public class ConventionTests
{
    private const string Wire = "input a\noutput c\nedge a b\nedge b c\n";

    private static Workspace Solved()
    {
        var w = new Workspace();
        w.Write("wire.ograph", Wire);
        Assert.Equal(0, Flowcert.InProcess("solve", w.PathOf("wire.ograph"), "--field", "3", "--out", w.PathOf("wire.json")).ExitCode);
        return w;
    }

    [Fact]
    public void TheCertificateIsPositionalAndCertStillWorks()
    {
        using var w = Solved();
        string g = w.PathOf("wire.ograph"), c = w.PathOf("wire.json");
        Assert.Equal(0, Flowcert.InProcess("draw", g, c, "--out", w.PathOf("a.svg")).ExitCode);
        Assert.Equal(0, Flowcert.InProcess("draw", g, "--cert", c, "--out", w.PathOf("b.svg")).ExitCode);
        Assert.Equal(w.Read("a.svg"), w.Read("b.svg"));
        var simulate = Flowcert.InProcess("simulate", g, c);
        Assert.Equal(0, simulate.ExitCode);
        Assert.Equal(simulate.Stdout, Flowcert.InProcess("simulate", g, "--cert", c).Stdout);
        var two = Flowcert.InProcess("simulate", g, c, "--cert", w.PathOf("other.json"));
        Assert.Equal(2, two.ExitCode);
        Assert.Contains("two certificates given", two.Stderr);
        var none = Flowcert.InProcess("simulate", g);
        Assert.Equal(2, none.ExitCode);
        Assert.Contains("simulate needs a certificate", none.Stderr);
    }

    [Fact]
    public void NoMessageInTheSourcesWritesAPluralAsParenthesisS()
    {
        // Every count goes through Counted.Of ("1 input", "2 inputs"); "(s)" or "(es)" after a word inside a
        // string literal is the old shape (a lowercase word, so calls such as Of(s) are not counted). Comments are not messages.
        var root = FlowCert.Tests.Certificates.CorpusTests.RepositoryRoot();
        var found = new List<string>();
        foreach (var file in Directory.EnumerateFiles(Path.Combine(root, "src"), "*.cs", SearchOption.AllDirectories))
        {
            if (file.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}")) continue;
            var lines = File.ReadAllLines(file);
            for (int i = 0; i < lines.Length; i++)
            {
                var code = lines[i].TrimStart();
                if (code.StartsWith("//")) continue;
                if (System.Text.RegularExpressions.Regex.IsMatch(code, @"""[^""]*\b[a-z]+\((s|es)\)")) found.Add($"{Path.GetRelativePath(root, file)}:{i + 1}");
            }
        }
        Assert.True(found.Count == 0, "plurals written as (s): " + string.Join(", ", found));
    }

    [Fact]
    public void NoiseAndPrimesTakeFormatJsonLikeSolveWithJsonKept()
    {
        using var w = new Workspace();
        w.Write("wire.ograph", Wire);
        Assert.Equal(0, Flowcert.InProcess("solve", w.PathOf("wire.ograph"), "--out", w.PathOf("wire.Q.json")).ExitCode);
        foreach (var args in new[] { new[] { "noise", w.PathOf("wire.Q.json") }, ["primes", w.PathOf("wire.ograph")] })
        {
            var format = Flowcert.InProcess([.. args, "--format", "json"]);
            Assert.Equal(0, format.ExitCode);
            Assert.StartsWith("{", format.Stdout.TrimStart());
            Assert.Equal(format.Stdout, Flowcert.InProcess([.. args, "--json"]).Stdout);
            Assert.DoesNotContain("{", Flowcert.InProcess([.. args, "--format", "text"]).Stdout.Split('\n')[0]);
            var bad = Flowcert.InProcess([.. args, "--format", "csv"]);
            Assert.Equal(2, bad.ExitCode);
            Assert.Contains($"not an output format of {args[0]}", bad.Stderr);
        }
    }

    [Fact]
    public void FieldFormatAndOutTakeOneShapeWithTheOldSpellingsKept()
    {
        using var w = Solved();
        string g = w.PathOf("wire.ograph"), c = w.PathOf("wire.json");
        // --field for simulate (--dim kept); the message names the spelling typed
        Assert.Equal(0, Flowcert.InProcess("simulate", g, c, "--field", "3").ExitCode);
        Assert.Contains("--field 4: 4 is composite", Flowcert.InProcess("simulate", g, c, "--field", "4").Stderr);
        Assert.Contains("--dim 4: 4 is composite", Flowcert.InProcess("simulate", g, c, "--dim", "4").Stderr);
        // --format json for solve (--json kept) and --json for schedule (--format json kept)
        var json = Flowcert.InProcess("solve", g, "--format", "json").Stdout;
        Assert.StartsWith("{\"verdict\":\"flow\"", json);
        Assert.StartsWith("{\"verdict\":\"flow\"", Flowcert.InProcess("solve", g, "--json").Stdout);
        Assert.Equal(Flowcert.InProcess("schedule", c, "--format", "json").Stdout, Flowcert.InProcess("schedule", c, "--json").Stdout);
        Assert.Contains("field F3, generalized flow, depth 2", Flowcert.InProcess("schedule", c).Stdout);   // one name per flow kind in prose
        Assert.Contains("disagree", Flowcert.InProcess("schedule", c, "--json", "--format", "csv").Stderr);
        Assert.Equal(2, Flowcert.InProcess("solve", g, "--format", "csv").ExitCode);
        // --out for convert (OUT kept)
        Assert.Equal(0, Flowcert.InProcess("convert", g, "--out", w.PathOf("a.json")).ExitCode);
        Assert.Equal(0, Flowcert.InProcess("convert", g, w.PathOf("b.json")).ExitCode);
        Assert.Equal(w.Read("a.json"), w.Read("b.json"));
        Assert.Contains("convert needs the file to write", Flowcert.InProcess("convert", g).Stderr);
    }

    [Fact]
    public void CountsArePluralOnlyAboveOneAndNodeListsAreInNaturalOrder()
    {
        using var w = new Workspace();
        // one input, one output; v2 before v10 in the blocked set and in the rounds
        w.Write("g.ograph", "input v0\noutput v11\nedge v0 v10\nedge v0 v2\nedge v10 v11\nedge v2 v11\nedge v10 v2 2\n");
        var run = Flowcert.InProcess("solve", w.PathOf("g.ograph"));
        Assert.Contains(": 4 nodes, 5 edges, 1 input, 1 output, 3 measured", run.Stdout);
        var listed = run.Stdout.Split('\n').Where(l => l.Contains("v10")).ToList();
        Assert.NotEmpty(listed);
        foreach (var line in listed.Where(l => l.Contains("v2 ")))
            Assert.True(line.IndexOf("v2 ", StringComparison.Ordinal) < line.IndexOf("v10", StringComparison.Ordinal), line);
        w.Write("f2.ograph", "input a\noutput c\nedge a b\nedge b c 2\n");
        var vanish = Flowcert.InProcess("solve", w.PathOf("f2.ograph"), "--field", "2");
        Assert.Contains("flowcert: warning: ", vanish.Stderr);
        Assert.Contains("1 edge has weight 0 in F2 and vanishes: b-c (2)", vanish.Stderr);
        Assert.DoesNotContain("(s)", vanish.Stdout + vanish.Stderr);
    }
}
