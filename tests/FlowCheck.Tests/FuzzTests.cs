using FlowCert.Tests.Fuzz;

namespace FlowCheck.Tests;

/// <summary>
/// flowcheck on 1,000 seeded mutations of solver certificates and graph files (Mutator, shared with the
/// library's fuzz tests), through its entry point Program.Run: every outcome is a verdict (exit 0 or 1)
/// or "unreadable" (exit 2), never an exception (common practice for readers of untrusted input).
/// </summary>
public class FuzzTests
{
    private readonly Random bytes = new(4242);

    // The text as UTF-8 (a lone surrogate becomes U+FFFD), then, one time in four, a byte that is not
    // valid UTF-8 where it stands.
    private string WriteBytes(string text, string extension)
    {
        var data = new System.Text.UTF8Encoding(false).GetBytes(text);
        if (data.Length > 0 && bytes.Next(4) == 0) data[bytes.Next(data.Length)] = (byte)bytes.Next(0x80, 0x100);
        var path = Support.Write("", extension);
        File.WriteAllBytes(path, data);
        return path;
    }

    [Fact]
    public void MutatedCertificatesAndGraphsGiveAVerdictOrUnreadable()
    {
        var seeds = SolverCertificates.Demo().ToList();
        var mutator = new Mutator(2026);
        var codes = new int[3];
        var failures = new List<string>();
        for (int t = 0; t < 1000; t++)
        {
            var seed = seeds[t % seeds.Count];
            bool graph = t % 5 == 4;   // one in five mutates the graph file given with --graph
            var cert = graph ? seed.Json : mutator.Mutate(seed.Json);
            var ograph = graph ? mutator.Mutate(seed.Ograph) : (t % 5 == 3 ? seed.Ograph : null);
            var certPath = WriteBytes(cert, ".json");
            var graphPath = ograph is null ? null : WriteBytes(ograph, ".ograph");
            try
            {
                var r = graphPath is null ? Support.Run(certPath) : Support.Run(certPath, "--graph", graphPath);
                Assert.InRange(r.Code, 0, 2);
                if (r.Code == 2) Assert.StartsWith("unreadable: ", r.Err);
                else Assert.Matches(r.Code == 0 ? "^valid: " : "^invalid: ", r.First);
                codes[r.Code]++;
            }
            catch (Exception e) when (e is not Xunit.Sdk.XunitException)
            {
                failures.Add($"input #{t} ({(graph ? "graph" : "certificate")} mutated from {seed.Name}): {e.GetType().Name}: {e.Message}");
            }
            finally
            {
                File.Delete(certPath);
                if (graphPath is not null) File.Delete(graphPath);
            }
        }
        Assert.True(failures.Count == 0, $"{failures.Count} of 1000 inputs ended in an exception:\n{string.Join("\n", failures.Take(5))}");
        Assert.True(codes[1] + codes[2] > 100, $"exit codes 0/1/2: {string.Join("/", codes)}");
    }
}
