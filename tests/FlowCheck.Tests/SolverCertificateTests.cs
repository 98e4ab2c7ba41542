using Newtonsoft.Json.Linq;
using static FlowCheck.Tests.Support;

namespace FlowCheck.Tests;

/// <summary>Every certificate the solver writes is accepted by flowcheck (with --graph) and by the oracle.
/// A disagreement is a bug on one side: the message shows the checker's reason and the oracle's.</summary>
public class SolverCertificateTests
{
    static void AssertAccepted(SolverCertificates.Produced p)
    {
        var r = CheckText(p.Json, p.Ograph);
        var oracle = Oracle.Reason(JToken.Parse(p.Json));
        Assert.True(r.Code == 0 && oracle is null, $"{p.Name}: checker says \"{r.First}{r.Err}\", oracle says \"{oracle ?? "valid"}\"\n{p.Json}");
        Assert.StartsWith("valid: ", r.First);
        Assert.Contains("note: graph file ", r.Out);
    }

    [Fact]
    public void DemoCertificatesAreAccepted()
    {
        var all = SolverCertificates.Demo().ToList();
        Assert.True(all.Count >= 20, $"only {all.Count} demo certificates");
        foreach (var p in all) AssertAccepted(p);
    }

    [Fact]
    public void LargePrimeFieldCertificatesAreAccepted()
    {
        var all = SolverCertificates.DemoOverLargePrime().ToList();
        Assert.NotEmpty(all);
        foreach (var p in all)
        {
            Assert.Contains("\"field\": \"F2305843009213693951\"", p.Json);
            AssertAccepted(p);
        }
    }

    [Fact]
    public void RandomGraphCertificatesAreAccepted()
    {
        var all = SolverCertificates.Random(graphs: 80, seed: 20250601).ToList();
        foreach (var p in all) AssertAccepted(p);
        // The sample covers both verdicts, both kinds and all four fields.
        var parsed = all.Select(p => JObject.Parse(p.Json)).ToList();
        foreach (var (key, value) in new[] { ("verdict", "flow"), ("verdict", "noflow"), ("flow", "causal"), ("flow", "general"),
                     ("field", "Q"), ("field", "F2"), ("field", "F3"), ("field", "F5") })
            Assert.Contains(parsed, c => (string?)c[key] == value);
    }

    /// <summary>Certificates committed under certificates/ at the repository root (CI re-checks every one).</summary>
    [Fact]
    public void CommittedCertificatesAreAccepted()
    {
        var root = RepositoryRoot();
        var folder = Path.Combine(root, "certificates");
        var files = Directory.GetFiles(folder, "*.json", SearchOption.AllDirectories);
        Assert.NotEmpty(files);
        foreach (var file in files)
        {
            var graph = Path.Combine(Path.GetDirectoryName(file)!, Path.GetFileName(file).Split('.')[0] + ".ograph");
            var r = File.Exists(graph) ? Run(file, "--graph", graph) : Run(file);
            Assert.True(r.Code == 0, $"{file}: {r.First}{r.Err}");
            Assert.True(Oracle.Reason(JToken.Parse(File.ReadAllText(file))) is null, file);
            Assert.True(File.Exists(graph), $"{file}: no {graph} beside it");
        }
    }

    static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "FlowCert.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("FlowCert.sln not found above " + AppContext.BaseDirectory);
    }
}
