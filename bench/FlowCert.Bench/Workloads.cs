using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;

namespace FlowCert.Bench;

/// <summary>The benchmark workloads, all built by the project's own family generator (deterministic).</summary>
public static class Workloads
{
    public static OpenGraph Square(int side) => FamilyGenerator.Generate(new FamilyRequest { Family = "square", Size = $"{side}x{side}" });

    public static OpenGraph Brickwork(int rows, int cols) => FamilyGenerator.Generate(new FamilyRequest { Family = "brickwork", Size = $"{rows}x{cols}" });

    /// <summary>G(n, 1/2) with a third of the nodes as outputs and a sixth as inputs: dense frontier blocks.</summary>
    public static OpenGraph Dense(int n) => FamilyGenerator.Generate(new FamilyRequest
    {
        Family = "random", Size = n.ToString(), Probability = "1/2", InputCount = n / 6, OutputCount = n / 3, Seed = 7,
    });

    public static FieldSpec Field(string name) => FieldSpec.Parse(name);
}
