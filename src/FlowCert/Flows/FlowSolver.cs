using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>Finds a minimum-depth flow of the asked kind over the asked field, or proves there is none.</summary>
public static class FlowSolver
{
    /// <summary>
    /// Solves one open graph. Throws <see cref="WeightNotInFieldException"/> when a weight has no value in
    /// the field (its denominator is divisible by p). <paramref name="progress"/>, when given, hears after
    /// every layer how far the search has come (synchronously, on the calling thread).
    /// </summary>
    public static FlowResult Solve(OpenGraph graph, FieldSpec field, FlowKind kind, IProgress<SolveProgress>? progress = null)
        => field.Accept(new Run(graph, field, kind, progress));

    private sealed class Run(OpenGraph graph, FieldSpec spec, FlowKind kind, IProgress<SolveProgress>? progress) : IFieldVisitor<FlowResult>
    {
        public FlowResult Visit<T, TField>(TField field) where T : struct where TField : struct, IField<T>
        {
            var g = new FieldGraph<T, TField>(graph, field, spec);
            return kind == FlowKind.Causal ? CausalFlowFinder.Find(g, progress) : GeneralFlowFinder.Find(g, progress);
        }
    }
}
