using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>A measurement label or flow kind that the chosen field or kind does not support; one sentence, exit 2.</summary>
public sealed class UnsupportedLabelsException(string message) : Exception(message);

/// <summary>Which labels each kind of flow and each field accepts (flows.md 9.2, 9.3, 9.6); the one place that says so.</summary>
public static class LabelRules
{
    /// <summary>The one-sentence reason for refusing labels and Pauli flow over fields other than F_2.</summary>
    public const string QubitsOnly =
        "measurement planes and Pauli measurements are defined here for qubits (field 2); for qudits and continuous " +
        "variables the right conditions are an open research question (README, \"Measurement labels and Pauli flow\").";

    /// <summary>Throws <see cref="UnsupportedLabelsException"/> when the graph's labels or the kind do not fit.</summary>
    public static void Check(OpenGraph graph, FieldSpec field, FlowKind kind)
    {
        bool qubits = field.Prime == 2;
        if (kind == FlowKind.Pauli && !qubits)
            throw new UnsupportedLabelsException($"Pauli flow needs field 2: {QubitsOnly}");
        if (!graph.HasLabels) return;
        var first = graph.Labels.OrderBy(kv => kv.Key).First();
        string Example() => $"node {graph.Names[first.Key]} is labelled {MeasurementLabels.Name(first.Value)}";
        if (!qubits)
            throw new UnsupportedLabelsException($"{Example()}, but over {field.Name} {QubitsOnly}");
        if (kind == FlowKind.Causal)
            throw new UnsupportedLabelsException($"{Example()}: causal flow is defined for XY measurements only; use --flow general (planes) or --flow pauli.");
        if (kind == FlowKind.General)
            foreach (var (v, label) in graph.Labels.OrderBy(kv => kv.Key))
                if (!MeasurementLabels.IsPlane(label))
                    throw new UnsupportedLabelsException(
                        $"node {graph.Names[v]} is labelled {MeasurementLabels.Name(label)}, a Pauli measurement: generalized flow takes the planes XY, XZ and YZ only; use --flow pauli.");
    }
}
