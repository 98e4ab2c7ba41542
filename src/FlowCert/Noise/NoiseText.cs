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
        o.Append($"  inputs {(report.Inputs.Count == 0 ? "(none)" : Names(report.Inputs))}; outputs {Names(report.Outputs)}; {Graphs.Formats.Counted.Of(report.Squeezed.Count, "squeezed node")}\n");
        o.Append(report.Phases.Count == 0
            ? "  phases: t = 0 on every measured node\n"
            : $"  phases: {string.Join(", ", report.Phases.Select(p => $"{g.Names[p.Key]} {p.Value}"))}; 0 elsewhere\n");
        if (report.IsEmbedding)
        {
            Embedding(report, request, o);
            return o.ToString();
        }
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
            AppendTable(o, table);
        }
        if (request.Target is { } target)
        {
            o.Append(NoiseFigures.TargetDecibels(report, target) is { } need
                ? $"target: added variance at most {target} vacuum units on every output quadrature needs at least {Num(need, "0.00")} dB of squeezing (r = {Num(NoiseFigures.SqueezingParameter(need), "0.0000")})\n"
                : $"target: no squeezing level meets {target} vacuum units: the anti-squeezed noise grows with r\n");
        }
        return o.ToString();
    }

    // More outputs than inputs: the report lives on the finite directions (docs/noise.md).
    private static void Embedding(NoiseReport report, NoiseRequest request, StringBuilder o)
    {
        var g = report.Flow.Graph;
        int n = report.DirectionCount;
        int nullifiers = Enumerable.Range(0, n).Count(report.IsNullifier);
        if (report.Valid)
            o.Append("corrections: every direction the measurements leave finite stays finite (the pattern is deterministic)\n");
        else
        {
            var first = report.Leaks[0];
            o.Append($"invalid: the anti-squeezed quadrature q of {g.Names[first.Node]} reaches {report.DirectionName(first.Row)} = {DirectionForm(report, first.Row)}, a direction the measurements leave finite, "
                + $"with coefficient {first.Coefficient}: the corrections do not cancel it, so this noise grows as e^(2r) ({Graphs.Formats.Counted.Of(report.Leaks.Count, "such term")} in all)\n");
        }
        o.Append($"more outputs than inputs: the ideal output embeds {Graphs.Formats.Counted.Of(report.Inputs.Count, "input")} in {Graphs.Formats.Counted.Of(report.Outputs.Count, "output")}; "
            + $"{Graphs.Formats.Counted.Of(n, "finite direction")} ({n - nullifiers} logical, {Graphs.Formats.Counted.Of(nullifiers, "nullifier")}) and {report.Rows - n} anti-squeezed, whose variance grows as e^(2r)\n");
        o.Append("finite directions f (combinations of output quadratures: ideal value plus the row of D L in the squeezed d_u); added noise, exact, as a multiple of the squeezed variance e^(-2r)/2:\n");
        for (int j = 0; j < n; j++)
        {
            var ideal = Form(Enumerable.Range(0, report.DirectionS.GetLength(1)).Select(k => (report.DirectionS[j, k], InputName(report, k))));
            var lRow = Form(Enumerable.Range(0, report.Squeezed.Count).Select(k => (report.DirectionL[j, k], "d_" + g.Names[report.Squeezed[k]])));
            o.Append($"  {report.DirectionName(j)} = {DirectionForm(report, j)}: {(report.IsNullifier(j) ? "nullifier, ideal value 0" : "logical, ideal value " + ideal)}; "
                + $"{report.DirectionVariance(j)} e^(-2r)/2   (L: {lRow})");
            if (!report.DirectionAntiSqueezedVariance(j).IsZero) o.Append($"   plus {report.DirectionAntiSqueezedVariance(j)} e^(2r)/2 anti-squeezed");
            o.Append('\n');
        }
        o.Append("anti-squeezed parts of the output quadratures (they depend on the flow; coefficients of the anti-squeezed q0_u, variance as a multiple of e^(2r)/2):\n");
        for (int row = 0; row < report.Rows; row++)
        {
            if (report.AntiSqueezedVariance(row).IsZero) continue;
            var kRow = Form(Enumerable.Range(0, report.Squeezed.Count).Select(k => (report.K[row, k], "q0_" + g.Names[report.Squeezed[k]])));
            o.Append($"  {report.RowName(row)}: {report.AntiSqueezedVariance(row)} e^(2r)/2   (K: {kRow})\n");
        }
        const string noFidelity = "fidelity for coherent-state inputs: not defined with more outputs than inputs (the ideal output has infinitely squeezed nullifiers)";
        if (request.Decibels is { } db)
        {
            double r = NoiseFigures.SqueezingParameter(db);
            o.Append($"at {Num(db, "0.###")} dB of squeezing (r = {Num(r, "0.0000")}):\n");
            for (int j = 0; j < n; j++)
            {
                double x = NoiseFigures.DirectionAddedVariance(report, j, r);
                o.Append($"  {report.DirectionName(j)}: added variance {Num(x, "G5")} vacuum units ({Decibels(x)} relative to vacuum)\n");
            }
            o.Append($"  {noFidelity}\n");
        }
        if (request.Sweep is { } levels)
        {
            o.Append("sweep (added variance of each finite direction in vacuum units; each column times e^(2r) is constant, the noise falls as e^(-2r)):\n");
            var header = new List<string> { "dB", "r", "e^(-2r)" };
            header.AddRange(Enumerable.Range(0, n).Select(report.DirectionName));
            var table = new List<string[]> { header.ToArray() };
            foreach (var level in levels)
            {
                double r = NoiseFigures.SqueezingParameter(level);
                var cells = new List<string> { Num(level, "0.###"), Num(r, "0.0000"), Num(Math.Exp(-2 * r), "G5") };
                cells.AddRange(Enumerable.Range(0, n).Select(j => Num(NoiseFigures.DirectionAddedVariance(report, j, r), "G5")));
                table.Add(cells.ToArray());
            }
            AppendTable(o, table);
            o.Append($"  {noFidelity}\n");
        }
        if (request.Target is { } target)
        {
            o.Append(NoiseFigures.TargetDecibels(report, target) is { } need
                ? $"target: added variance at most {target} vacuum units on every finite direction needs at least {Num(need, "0.00")} dB of squeezing (r = {Num(NoiseFigures.SqueezingParameter(need), "0.0000")})\n"
                : $"target: no squeezing level meets {target} vacuum units: the anti-squeezed noise grows with r\n");
        }
    }

    // Right-aligned columns, two spaces apart, indented by two.
    private static void AppendTable(StringBuilder o, List<string[]> table)
    {
        var widths = Enumerable.Range(0, table[0].Length).Select(c => table.Max(t => t[c].Length)).ToArray();
        foreach (var line in table)
            o.Append("  " + string.Join("  ", line.Select((cell, c) => cell.PadLeft(widths[c]))).TrimEnd() + "\n");
    }

    /// <summary>Direction j as a form in the output quadratures, such as "q_b + q_c".</summary>
    internal static string DirectionForm(NoiseReport report, int j)
        => Form(Enumerable.Range(0, report.Rows).Select(row => (report.Directions[j, row], OutputName(report, row))));

    /// <summary>The name of output quadrature row as a variable: q_o or p_o.</summary>
    internal static string OutputName(NoiseReport report, int row)
        => $"{(row % 2 == 0 ? 'q' : 'p')}_{report.Flow.Graph.Names[report.Outputs[row / 2]]}";

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
