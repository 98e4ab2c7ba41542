using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>Finds a minimum-depth flow of the asked kind over the asked field, or proves there is none.</summary>
public static class FlowSolver
{
    /// <summary>
    /// Solves one open graph. Throws <see cref="WeightNotInFieldException"/> when a weight has no value in
    /// the field (its denominator is divisible by p).
    /// </summary>
    public static FlowResult Solve(OpenGraph graph, FieldSpec field, FlowKind kind)
        => field.Accept(new Run(graph, field, kind));

    private sealed class Run(OpenGraph graph, FieldSpec spec, FlowKind kind) : IFieldVisitor<FlowResult>
    {
        public FlowResult Visit<T, TField>(TField field) where T : struct where TField : struct, IField<T>
        {
            var g = new FieldGraph<T, TField>(graph, field, spec);
            return kind == FlowKind.Causal ? CausalFlowFinder.Find(g) : GeneralFlowFinder.Find(g);
        }
    }
}
