using System.Globalization;
using System.Text;
using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Noise;

namespace FlowCert.Demo;

/// <summary>
/// The demo's finite-squeezing scene: the exact added noise of the causal and the generalized flow of the
/// lab's continuous-variable designs (loop-wire, delay-pair), compared (docs/noise.md).
/// </summary>
public static class NoiseScene
{
    /// <summary>The designs the scene compares.</summary>
    public static readonly string[] DesignNames = ["loop-wire", "delay-pair"];

    /// <summary>The scene as text (no console I/O); 10 dB is the level at which the fidelity is shown.</summary>
    public static string Text()
    {
        var o = new StringBuilder();
        o.Append("Finite squeezing (flowcert noise): added noise per output quadrature, exact, in units of e^(-2r)/2\n");
        bool allSame = true;
        foreach (var name in DesignNames)
        {
            var design = DemoScenario.Designs().Single(d => d.Name == name);
            var reports = DemoScenario.Kinds.Select(k => NoiseAnalysis.Analyze(FlowSolver.Solve(design.Graph, FieldSpec.Rationals, k))).ToArray();
            foreach (var report in reports)
            {
                var cells = Enumerable.Range(0, report.Rows).Select(row => $"{report.RowName(row)} {report.AddedVariance(row)}");
                double fidelity = NoiseFigures.CoherentStateFidelity(report, NoiseFigures.SqueezingParameter(10));
                o.Append($"  {name,-11} {FlowKinds.Name(report.Flow.Kind),-8} depth {report.Flow.Depth}: {string.Join(", ", cells)}; "
                    + $"at 10 dB, coherent-state fidelity {fidelity.ToString("0.0000", CultureInfo.InvariantCulture)}\n");
            }
            allSame &= reports.All(r => r.L.Cast<Rational>().SequenceEqual(reports[0].L.Cast<Rational>()));
        }
        o.Append(allSame
            ? "  Different flows, the same noise: with as many outputs as inputs, the noise is fixed by the graph and the\n"
              + "  phases, whichever flow corrects it (proof in docs/noise.md). Choose the flow for depth, not for noise.\n"
            : "  The choice of flow changes the noise here.\n");
        return o.ToString();
    }
}
