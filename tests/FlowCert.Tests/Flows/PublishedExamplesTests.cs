using FlowCert.Graphs;
using FlowCert.Tests.Oracles;
using FlowCert.Tests.Validation;

namespace FlowCert.Tests.Flows;

/// <summary>
/// Open graphs under Data/published, each tied to a published statement (see the comment in each file):
/// only what the source states is asserted, and every answer is checked by the solver (certificate
/// verified) and by the brute-force oracle.
/// </summary>
public sealed class PublishedExamplesTests
{
    private static OpenGraph Load(string name)
    {
        var path = Path.Combine(AppContext.BaseDirectory, "Data", "published", name);
        return OgraphReader.ReadFile(path);
    }

    private static OracleAnswer Both(OpenGraph g, string field, ReferenceKind kind)
    {
        var solver = CertifiedSolve.Run(g, field, kind)!.Value;
        Assert.Equal(SubsetDepthOracle.Analyse(ReferenceGraph.From(g), field, kind), solver);
        return solver;
    }

    [Fact]
    public void AGraphWithGeneralizedFlowButNoCausalFlow()
    {
        // "Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212 (abstract)
        var g = Load("gflow-without-causal-flow.ograph");
        Assert.True(Both(g, "F2", ReferenceKind.General).Exists);
        Assert.False(Both(g, "F2", ReferenceKind.Causal).Exists);
    }

    [Fact]
    public void AGraphWhereGeneralizedFlowIsShallowerThanCausalFlow()
    {
        // "Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212 (abstract)
        var g = Load("gflow-shallower-than-causal.ograph");
        var general = Both(g, "F2", ReferenceKind.General);
        var causal = Both(g, "F2", ReferenceKind.Causal);
        Assert.True(general.Exists && causal.Exists);
        Assert.True(general.Depth < causal.Depth, $"general {general}, causal {causal}");
    }

    [Fact]
    public void EveryPublishedFileNamesItsSourceByTitleAndArxivId()
    {
        var dir = Path.Combine(AppContext.BaseDirectory, "Data", "published");
        var files = Directory.GetFiles(dir, "*.ograph");
        Assert.NotEmpty(files);
        foreach (var f in files)
        {
            var text = File.ReadAllText(f);
            Assert.Matches(@"arXiv:[a-z\-]*/?\d{4}\.?\d+", text);
            Assert.Contains("\"", text); // a quoted title
            OgraphReader.Parse(text, f); // and it is a valid graph file
        }
    }
}
