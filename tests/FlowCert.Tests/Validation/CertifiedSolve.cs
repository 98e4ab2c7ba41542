using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Oracles;

namespace FlowCert.Tests.Validation;

/// <summary>
/// Runs the solver and sends the certificate it writes through <see cref="CertificateVerifier"/>:
/// every solver call in the validation tests goes through here, so every certificate is checked.
/// </summary>
public static class CertifiedSolve
{
    /// <summary>
    /// The solver's answer, after its certificate passed the verifier and agrees with the result object;
    /// null when the solver refuses the field (a weight's denominator is divisible by p).
    /// </summary>
    public static OracleAnswer? Run(OpenGraph graph, string field, ReferenceKind kind)
    {
        FlowResult result;
        try
        {
            result = FlowSolver.Solve(graph, FieldSpec.Parse(field), kind == ReferenceKind.Causal ? FlowKind.Causal : FlowKind.General);
        }
        catch (WeightNotInFieldException)
        {
            return null;
        }
        var json = CertificateWriter.Write(result);
        CertificateVerifier.Verdict verdict;
        try
        {
            verdict = CertificateVerifier.Verify(json);
        }
        catch (CertificateRejectedException e)
        {
            throw new Xunit.Sdk.XunitException(
                $"certificate rejected: {e.Message}\nfield {field}, {kind}\ngraph:\n{ReferenceGraph.From(graph).ToOgraph()}\ncertificate:\n{json}");
        }
        var expectedFlow = kind == ReferenceKind.Causal ? "causal" : "general";
        if (verdict.Flow != expectedFlow || verdict.Field != FieldName(field) || verdict.HasFlow != result.HasFlow || (result.HasFlow && verdict.Depth != result.Depth))
            throw new Xunit.Sdk.XunitException($"certificate ({verdict}) does not match the result object for\n{ReferenceGraph.From(graph).ToOgraph()}");
        if (verdict.CanonicalGraph != ReferenceCanonical(graph))
            throw new Xunit.Sdk.XunitException($"certificate embeds another graph:\n{verdict.CanonicalGraph}");
        return result.HasFlow ? new OracleAnswer(true, result.Depth) : OracleAnswer.None;
    }

    /// <summary>"3" or "F3" -> "F3"; "Q" -> "Q".</summary>
    public static string FieldName(string field) => field == "Q" ? "Q" : field.StartsWith('F') ? field : "F" + field;

    /// <summary>The canonical text (docs/formats.md) computed from the graph's plain data, not by src's writer.</summary>
    private static string ReferenceCanonical(OpenGraph g)
    {
        var names = g.Names;
        var sb = new System.Text.StringBuilder();
        sb.Append("input").Append(string.Concat(g.Inputs.Select(i => names[i]).Order(StringComparer.Ordinal).Select(x => " " + x))).Append('\n');
        sb.Append("output").Append(string.Concat(g.Outputs.Select(i => names[i]).Order(StringComparer.Ordinal).Select(x => " " + x))).Append('\n');
        var edges = g.Edges.Select(e =>
        {
            var (a, b) = string.CompareOrdinal(names[e.U], names[e.V]) < 0 ? (names[e.U], names[e.V]) : (names[e.V], names[e.U]);
            var w = CertificateVerifier.FormatRational(new Fractions.Fraction(e.Weight.Numerator, e.Weight.Denominator));
            return (a, b, w);
        }).OrderBy(e => e.a, StringComparer.Ordinal).ThenBy(e => e.b, StringComparer.Ordinal).ToList();
        var touched = edges.SelectMany(e => new[] { e.a, e.b }).ToHashSet();
        foreach (var x in names.Where(x => !touched.Contains(x)).Order(StringComparer.Ordinal)) sb.Append("node ").Append(x).Append('\n');
        foreach (var (a, b, w) in edges) sb.Append($"edge {a} {b} {w}\n");
        return sb.ToString();
    }
}
