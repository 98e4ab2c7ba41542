using BenchmarkDotNet.Attributes;
using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Bench;

/// <summary>The whole job on one lattice: read the text, solve, write the certificate.</summary>
[MemoryDiagnoser]
public class PipelineBenchmarks
{
    private string text = "";

    [Params(100, 300)]
    public int Side { get; set; }

    [GlobalSetup]
    public void Setup() => text = CanonicalForm.Write(Workloads.Square(Side));

    [Benchmark]
    public OpenGraph Parse() => OgraphReader.Parse(text, "square.ograph");

    [Benchmark]
    public int ParseSolveWrite()
        => CertificateWriter.Write(FlowSolver.Solve(OgraphReader.Parse(text, "square.ograph"), FieldSpec.Rationals, FlowKind.General)).Length;
}
