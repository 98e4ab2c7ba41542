using System.Globalization;
using System.Text;
using FlowCert.Algebra;
using FlowCert.Flows;

namespace FlowCert.Noise;

/// <summary>The readable report of <c>flowcert noise</c>: exact noise per output quadrature, then floating-point figures.</summary>
public static class NoiseText
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>Formats a report; <paramref name="source"/> names the certificate.</summary>
    public static string Write(NoiseReport report, NoiseRequest request, string source)
    {
        var g = report.Flow.Graph;
        var o = new StringBuilder();
        string Names(IEnumerable<int> nodes) => string.Join(" ", nodes.Select(v => g.Names[v]));
        o.Append($"noise of {source}: {FlowKinds.Adjective(report.Flow.Kind)} flow over Q, depth {report.Flow.Depth}\n");
        o.Append($"  inputs {Names(report.Inputs)}; outputs {Names(report.Outputs)}; {Graphs.Formats.Counted.Of(report.Squeezed.Count, "squeezed node")}\n");
        o.Append(report.Phases.Count == 0
            ? "  phases: t = 0 on every measured node\n"
            : $"  phases: {string.Join(", ", report.Phases.Select(p => $"{g.Names[p.Key]} {p.Value}"))}; 0 elsewhere\n");
        if (report.Valid)
            o.Append("corrections: every anti-squeezed quadrature cancels (the pattern is deterministic)\n");
        else
        {
            var first = report.Leaks[0];
            o.Append($"invalid: the anti-squeezed quadrature q of {g.Names[first.Node]} reaches {report.RowName(first.Row)} with coefficient {first.Coefficient}: "
                + $"the corrections do not cancel it, so this noise grows as e^(2r) ({Graphs.Formats.Counted.Of(report.Leaks.Count, "such term")} in all)\n");
        }
        o.Append("ideal map S:\n");
        for (int row = 0; row < report.Rows; row++)
            o.Append($"  {report.RowName(row)} = {Form(Enumerable.Range(0, report.S.GetLength(1)).Select(k => (report.S[row, k], InputName(report, k))))}\n");
        o.Append("added noise, exact, as a multiple of the squeezed variance e^(-2r)/2 (row of L in the squeezed d_u):\n");
        for (int row = 0; row < report.Rows; row++)
        {
            var lRow = Form(Enumerable.Range(0, report.Squeezed.Count).Select(j => (report.L[row, j], "d_" + g.Names[report.Squeezed[j]])));
            o.Append($"  {report.RowName(row)}: {report.AddedVariance(row)} e^(-2r)/2   (L: {lRow})");
            if (!report.AntiSqueezedVariance(row).IsZero) o.Append($"   plus {report.AntiSqueezedVariance(row)} e^(2r)/2 anti-squeezed");
            o.Append('\n');
        }
        if (request.Decibels is { } db)
        {
            double r = NoiseFigures.SqueezingParameter(db);
            o.Append($"at {Num(db, "0.###")} dB of squeezing (r = {Num(r, "0.0000")}):\n");
            for (int row = 0; row < report.Rows; row++)
            {
                double x = NoiseFigures.AddedVariance(report, row, r);
                o.Append($"  {report.RowName(row)}: added variance {Num(x, "G5")} vacuum units ({Decibels(x)} relative to vacuum)\n");
            }
            o.Append($"  fidelity for coherent-state inputs: {Num(NoiseFigures.CoherentStateFidelity(report, r), "0.000000")}\n");
        }
        if (request.Sweep is { } levels)
        {
            o.Append("sweep (added variance in vacuum units; each column times e^(2r) is constant, the noise falls as e^(-2r)):\n");
            var header = new List<string> { "dB", "r", "e^(-2r)" };
            header.AddRange(Enumerable.Range(0, report.Rows).Select(report.RowName));
            header.Add("fidelity");
            var table = new List<string[]> { header.ToArray() };
            foreach (var level in levels)
            {
                double r = NoiseFigures.SqueezingParameter(level);
                var cells = new List<string> { Num(level, "0.###"), Num(r, "0.0000"), Num(Math.Exp(-2 * r), "G5") };
                cells.AddRange(Enumerable.Range(0, report.Rows).Select(row => Num(NoiseFigures.AddedVariance(report, row, r), "G5")));
                cells.Add(Num(NoiseFigures.CoherentStateFidelity(report, r), "0.000000"));
                table.Add(cells.ToArray());
            }
            var widths = Enumerable.Range(0, header.Count).Select(c => table.Max(t => t[c].Length)).ToArray();
            foreach (var line in table)
                o.Append("  " + string.Join("  ", line.Select((cell, c) => cell.PadLeft(widths[c]))).TrimEnd() + "\n");
        }
        if (request.Target is { } target)
        {
            o.Append(NoiseFigures.TargetDecibels(report, target) is { } need
                ? $"target: added variance at most {target} vacuum units on every output quadrature needs at least {Num(need, "0.00")} dB of squeezing (r = {Num(NoiseFigures.SqueezingParameter(need), "0.0000")})\n"
                : $"target: no squeezing level meets {target} vacuum units: the anti-squeezed noise grows with r\n");
        }
        return o.ToString();
    }

    /// <summary>The name of column k of S: q_i or p_i of an input.</summary>
    internal static string InputName(NoiseReport report, int column)
        => $"{(column % 2 == 0 ? 'q' : 'p')}_{report.Flow.Graph.Names[report.Inputs[column / 2]]}";

    /// <summary>An exact linear form such as "-q_a + 1/2 p_b", or "0".</summary>
    internal static string Form(IEnumerable<(Rational Coefficient, string Name)> terms)
    {
        var o = new StringBuilder();
        foreach (var (c, name) in terms)
        {
            if (c.IsZero) continue;
            var magnitude = c.Sign < 0 ? -c : c;
            o.Append(o.Length == 0 ? (c.Sign < 0 ? "-" : "") : (c.Sign < 0 ? " - " : " + "));
            if (magnitude != Rational.One) o.Append(magnitude).Append(' ');
            o.Append(name);
        }
        return o.Length == 0 ? "0" : o.ToString();
    }

    private static string Decibels(double vacuumUnits)
        => vacuumUnits > 0 ? Num(NoiseFigures.RelativeDecibels(vacuumUnits), "0.00") + " dB" : "no added noise, -inf dB";

    private static string Num(double x, string format) => x.ToString(format, Invariant);
}
