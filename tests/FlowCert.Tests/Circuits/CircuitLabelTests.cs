using FlowCert.Algebra;
using FlowCert.Circuits;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests.Circuits;

/// <summary>
/// Circuits are read off XY measurements only: a flow of a graph with an XZ or YZ label (flows.md section 9)
/// is refused in one sentence naming the node, while the same graph without its labels still gives a circuit
/// when it has a causal flow (common practice: the circuit of docs/circuits.md is that of XY measurements).
/// </summary>
public class CircuitLabelTests
{
    [Fact]
    public void AFlowWithPlaneLabelsIsRefusedNamingTheNode()
    {
        var g = OgraphReader.ReadFile(Path.Combine(CorpusTests.RepositoryRoot(), "certificates", "plane-relay.ograph"));
        Assert.True(g.HasLabels);
        var result = FlowSolver.Solve(g, FieldSpec.PrimeField(2), FlowKind.General);
        Assert.True(result.HasFlow);
        var e = Assert.Throws<CircuitException>(() => CausalCircuit.Extract(result));
        var first = g.Labels.Where(kv => kv.Value != MeasurementLabel.XY).MinBy(kv => kv.Key);
        Assert.Contains($"node {g.Names[first.Key]} is measured with label {MeasurementLabels.Name(first.Value)}", e.Message);
        Assert.Contains("XY plane", e.Message);
    }
}
