using System.Security.Cryptography;
using System.Text;
using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Tests.Graphs;

/// <summary>
/// The canonical .ograph text (docs/formats.md, "Canonical form") byte for byte, and its SHA-256
/// (FIPS 180-4) checked against System.Security.Cryptography and the coreutils sha256sum program.
/// </summary>
public class CanonicalFormTests
{
    // Scrambled order, both edge orientations, weights written as 0.50, -2/4, 3/1, a default weight,
    // tabs, a CRLF line, comments and an `at` hint. Names chosen so that ordinal order ('Z' < '_' < 'a',
    // '-' < '.' < '0' < ':') differs from any culture's alphabetical order.
    private const string HandExample =
        "# Merrow Reach (fictional) test patch\n" +
        "output  z1 Z0\n" +
        "input\t_in a.b\n" +
        "edge a.b _in 0.50\r\n" +
        "edge Z0 a.b -2/4\n" +
        "edge a:b a-b 3/1\n" +
        "at a.b 1.5 -2\n" +
        "node iso2 iso1 _in\n" +
        "edge z1 a:b\n" +
        "edge a-b Z0 7\n" +
        "node a0\n";

    private const string HandCanonical =
        "input _in a.b\n" +
        "output Z0 z1\n" +
        "node a0\n" +
        "node iso1\n" +
        "node iso2\n" +
        "edge Z0 a-b 7\n" +
        "edge Z0 a.b -1/2\n" +
        "edge _in a.b 1/2\n" +
        "edge a-b a:b 3\n" +
        "edge a:b z1 1\n";

    // sha256sum of HandCanonical's bytes, computed once with coreutils sha256sum; re-derived below too.
    private const string HandSha256 = "f4fcf881a74c25be8e771ce783a92ee78087670598dc7d2f5ec26477523660f9";

    [Fact]
    public void TheHandExampleHasExactlyTheExpectedBytes()
    {
        var g = OgraphReader.Parse(HandExample, "hand.ograph");
        Assert.Equal(HandCanonical, CanonicalForm.Write(g));
    }

    [Fact]
    public void TheHashIsSha256OfTheUtf8CanonicalText()
    {
        var g = OgraphReader.Parse(HandExample, "hand.ograph");
        var expected = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(HandCanonical)));
        Assert.Equal(expected, CanonicalForm.Sha256(g));
        Assert.Equal(HandSha256, CanonicalForm.Sha256(g));
    }

    [Fact]
    public void TheHashAgreesWithCoreutilsSha256sumOnAFile()
    {
        var dir = Directory.CreateTempSubdirectory("flowcert-canonical-");
        try
        {
            var graphs = new[] { HandExample, "", "node lonely\n", "input a\noutput b\nedge b a -7/3\n" }
                .Select(t => OgraphReader.Parse(t, "g.ograph")).ToArray();
            var files = new List<string>();
            for (int i = 0; i < graphs.Length; i++)
            {
                var path = Path.Combine(dir.FullName, $"g{i}.ograph");
                File.WriteAllBytes(path, Encoding.UTF8.GetBytes(CanonicalForm.Write(graphs[i])));
                files.Add(path);
            }
            var run = ExternalProgram.Run("sha256sum", "coreutils", files);
            Assert.Equal(0, run.ExitCode);
            var lines = run.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
            Assert.Equal(graphs.Length, lines.Length);
            for (int i = 0; i < graphs.Length; i++)
            {
                var parts = lines[i].Split("  ", 2);
                Assert.Equal(files[i], parts[1]);
                Assert.Equal(parts[0], CanonicalForm.Sha256(graphs[i]));
            }
        }
        finally { dir.Delete(true); }
    }

    [Theory]
    [InlineData("node b a\n", "input\noutput\nnode a\nnode b\n")]
    [InlineData("input b\noutput a\nnode a b\n", "input b\noutput a\nnode a\nnode b\n")]
    [InlineData("edge a b\n", "input\noutput\nedge a b 1\n")]
    [InlineData("output c b\nedge c b 0.125\nedge a b\n", "input\noutput b c\nedge a b 1\nedge b c 1/8\n")]
    [InlineData("input x\noutput x\nnode x\n", "input x\noutput x\nnode x\n")]
    [InlineData("edge a b -12/8\n", "input\noutput\nedge a b -3/2\n")]
    public void SmallCases(string text, string canonical)
        => Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.Parse(text, "g.ograph")));

    /// <summary>A random graph written as .ograph text in random order, with random weight spellings.</summary>
    private static string RandomGraphText(Random rng)
    {
        string[] pool = ["a", "b", "B", "_x", "a.1", "a-1", "a:1", "a0", "n10", "n9", "Z", "z", "q_r.s"];
        var names = pool.OrderBy(_ => rng.Next()).Take(rng.Next(1, pool.Length + 1)).ToArray();
        var lines = new List<string>();
        var used = new HashSet<(string, string)>();
        int edgeCount = rng.Next(0, names.Length * 2);
        for (int k = 0; k < edgeCount; k++)
        {
            var u = names[rng.Next(names.Length)];
            var v = names[rng.Next(names.Length)];
            if (u == v || used.Contains((u, v)) || used.Contains((v, u))) continue;
            used.Add((u, v));
            int num = rng.Next(1, 9) * (rng.Next(2) == 0 ? 1 : -1), den = rng.Next(1, 5);
            string weight = rng.Next(4) switch
            {
                0 => "",
                1 => $" {num}/{den}",
                2 => $" {num * 2}/{den * 2}",
                _ => $" {num}.{rng.Next(0, 100):D2}",
            };
            lines.Add($"edge {u} {v}{weight}");
        }
        foreach (var n in names) if (rng.Next(2) == 0 || !used.Any(e => e.Item1 == n || e.Item2 == n)) lines.Add("node " + n);
        var inputs = names.Where(_ => rng.Next(3) == 0).ToArray();
        var outputs = names.Where(_ => rng.Next(3) == 0).ToArray();
        foreach (var i in inputs) lines.Add("input " + i);
        lines.Add("output " + string.Join(" ", outputs));
        foreach (var n in names.Where(_ => rng.Next(4) == 0)) lines.Add($"at {n} {rng.Next(-5, 6)} {rng.Next(0, 9)}.5");
        lines = lines.OrderBy(_ => rng.Next()).ToList();
        return string.Join(rng.Next(2) == 0 ? "\n" : "\r\n", lines) + "\n";
    }

    [Fact]
    public void ParsingTheCanonicalFormGivesTheSameGraph()
    {
        var rng = new Random(5150);
        for (int t = 0; t < 300; t++)
        {
            var text = RandomGraphText(rng);
            var g = OgraphReader.Parse(text, "random.ograph");
            var canonical = CanonicalForm.Write(g);
            var h = OgraphReader.Parse(canonical, "canonical.ograph");
            Assert.Equal(g.Names, h.Names);
            Assert.Equal(g.Edges, h.Edges);
            Assert.Equal(g.SortedInputs, h.SortedInputs);
            Assert.Equal(g.SortedOutputs, h.SortedOutputs);
            Assert.Equal(canonical, CanonicalForm.Write(h));

            // The text is in canonical shape: LF only, no comments or hints, sections in order.
            Assert.DoesNotContain("\r", canonical);
            Assert.EndsWith("\n", canonical);
            var lines = canonical.Split('\n')[..^1];
            Assert.StartsWith("input", lines[0]);
            Assert.StartsWith("output", lines[1]);
            var kinds = lines.Skip(2).Select(l => l.Split(' ')[0]).ToArray();
            Assert.Equal(kinds.OrderBy(k => k == "edge" ? 1 : 0), kinds);
            Assert.All(lines, l => Assert.DoesNotContain("  ", l));
            Assert.All(lines, l => Assert.False(l.EndsWith(' ')));
            foreach (var l in lines.Where(l => l.StartsWith("edge")))
            {
                var p = l.Split(' ');
                Assert.Equal(4, p.Length);
                Assert.True(string.CompareOrdinal(p[1], p[2]) < 0);
                Assert.True(Rational.TryParse(p[3], out var w) && w.ToString() == p[3], $"weight {p[3]} not reduced");
            }

            // The same lines in another order give the same canonical text.
            var reordered = string.Join("\n", text.Split('\n').OrderBy(_ => rng.Next()));
            Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.Parse(reordered, "reordered.ograph")));
        }
    }
}
