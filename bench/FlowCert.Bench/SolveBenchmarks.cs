using BenchmarkDotNet.Attributes;
using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Bench;

/// <summary>FlowSolver.Solve on lattices (sparse frontier) and dense random graphs, both kinds of flow.</summary>
[MemoryDiagnoser]
public class SolveBenchmarks
{
    private OpenGraph graph = null!;
    private FieldSpec field = null!;

    [Params("square100", "square300", "brickwork50x101", "dense300")]
    public string Workload { get; set; } = "";

    [Params("Q", "2", "3")]
    public string Field { get; set; } = "";

    [Params(FlowKind.General, FlowKind.Causal)]
    public FlowKind Kind { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        graph = Workload switch
        {
            "square100" => Workloads.Square(100),
            "square300" => Workloads.Square(300),
            "brickwork50x101" => Workloads.Brickwork(50, 101),
            "dense300" => Workloads.Dense(300),
            _ => throw new ArgumentException(Workload),
        };
        field = Workloads.Field(Field);
    }

    [Benchmark]
    public int Solve() => FlowSolver.Solve(graph, field, Kind).Depth;
}
