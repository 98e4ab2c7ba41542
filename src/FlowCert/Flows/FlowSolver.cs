using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>Finds a minimum-depth flow of the asked kind over the asked field, or proves there is none.</summary>
public static class FlowSolver
{
    /// <summary>
    /// Solves one open graph. Throws <see cref="WeightNotInFieldException"/> when a weight has no value in
    /// the field (its denominator is divisible by p), and <see cref="UnsupportedLabelsException"/> when
    /// the labels or the kind need qubits or Pauli flow (<see cref="LabelRules"/>). <paramref name="progress"/>,
    /// when given, hears after every layer how far the search has come (synchronously, on the calling thread).
    /// </summary>
    public static FlowResult Solve(OpenGraph graph, FieldSpec field, FlowKind kind, IProgress<SolveProgress>? progress = null)
        => Solve(graph, field, kind, progress, CarryRule.Default);

    /// <summary>As above, with the rule for carrying the reduced form between layers of a generalized flow.</summary>
    internal static FlowResult Solve(OpenGraph graph, FieldSpec field, FlowKind kind, IProgress<SolveProgress>? progress, CarryRule carry)
    {
        LabelRules.Check(graph, field, kind);
        return field.Accept(new Run(graph, field, kind, progress, carry));
    }

    private sealed class Run(OpenGraph graph, FieldSpec spec, FlowKind kind, IProgress<SolveProgress>? progress, CarryRule carry) : IFieldVisitor<FlowResult>
    {
        public FlowResult Visit<T, TField>(TField field) where T : struct where TField : struct, IField<T>
        {
            var g = new FieldGraph<T, TField>(graph, field, spec);
            if (kind == FlowKind.Pauli || graph.HasLabels) return LabelledFlowFinder.Find(g, kind);
            return kind == FlowKind.Causal ? CausalFlowFinder.Find(g, progress) : GeneralFlowFinder.Find(g, progress, carry);
        }
    }
}
