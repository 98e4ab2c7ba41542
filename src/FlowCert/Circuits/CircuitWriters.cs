using System.Globalization;
using System.Text;
using Newtonsoft.Json;

namespace FlowCert.Circuits;

/// <summary>
/// The circuit as text (every field), JSON (format "flowcert-circuit", version 1; every field) and, for
/// qubits, OpenQASM 3.0 using only gates of its standard library stdgates.inc (h, p, cz). Angles are
/// written with the shortest text that reads back to the same double. LF line ends throughout.
/// </summary>
public static class CircuitWriters
{
    /// <summary>The value of the JSON <c>format</c> key.</summary>
    public const string Format = "flowcert-circuit";

    /// <summary>A double as the shortest round-trip text (invariant culture, no negative zero).</summary>
    public static string Number(double x) => (x == 0 ? 0.0 : x).ToString("R", CultureInfo.InvariantCulture);

    private static string Wire(int k) => $"q{k}";

    /// <summary>A one-line description of the wire: where it starts, the nodes it passes, its output.</summary>
    private static string Path(CausalCircuit c, CircuitWire w)
        => (w.IsInput ? "input " : "prepared |+> at ") + c.Graph.Names[w.Start] + ": " + string.Join(" -> ", w.Nodes.Select(v => c.Graph.Names[v])) +
           " (output " + c.Graph.Names[w.Output] + ")";

    /// <summary>The circuit as a readable table of wires and gates in order.</summary>
    public static string Text(CausalCircuit c)
    {
        var g = c.Graph;
        var t = new StringBuilder();
        t.Append($"circuit of a causal flow: field {c.Field.Name}, {Graphs.Formats.Counted.Of(c.Wires.Count, "wire")}, {Graphs.Formats.Counted.Of(c.Gates.Count, "gate")}; w = exp(2 pi i / {c.Dimension})\n");
        t.Append("wires\n");
        foreach (var w in c.Wires) t.Append($"  {Wire(w.Index),-4} {Path(c, w)}\n");
        t.Append("gates (in order; F_a|j> = sum_k w^(a j k)|k> / sqrt p, D = diag(e^(i theta_j)), CZ^a|j,k> = w^(a j k)|j,k>)\n");
        int k = 0;
        foreach (var gate in c.Gates)
        {
            k++;
            t.Append($"  {k,4}  ").Append(gate switch
            {
                PreparePlus x => $"prepare  {Wire(x.Wire)} in |+>  (node {g.Names[x.Node]})",
                DiagonalPhase x => $"D        {Wire(x.Wire)} theta = ({string.Join(", ", x.Theta.Select(Number))})  (measurement of {g.Names[x.Node]})",
                FourierStep x => $"F_{x.Weight,-6} {Wire(x.Wire)}  (flow step {g.Names[x.From]} -> {g.Names[x.To]}, weight {x.Weight})",
                ControlledPhase x => $"CZ^{x.Weight,-5} {Wire(x.Wire1)} {Wire(x.Wire2)}  (edge {g.Names[x.U]} - {g.Names[x.V]}, weight {x.Weight})",
                _ => throw new InvalidOperationException("unknown gate"),
            }).Append('\n');
        }
        return t.ToString();
    }

    /// <summary>The circuit as JSON: format, version, field, dimension, wires, gates (one per line).</summary>
    public static string Json(CausalCircuit c)
    {
        var g = c.Graph;
        string N(int v) => JsonConvert.ToString(g.Names[v]);
        var t = new StringBuilder();
        t.Append("{\n");
        t.Append($"  \"format\": \"{Format}\",\n  \"version\": 1,\n  \"field\": {JsonConvert.ToString(c.Field.Name)},\n  \"dimension\": {c.Dimension},\n");
        t.Append("  \"wires\": [\n");
        for (int i = 0; i < c.Wires.Count; i++)
        {
            var w = c.Wires[i];
            t.Append($"    {{\"wire\": {w.Index}, \"start\": \"{(w.IsInput ? "input" : "plus")}\", \"nodes\": [{string.Join(", ", w.Nodes.Select(N))}], \"output\": {N(w.Output)}}}");
            t.Append(i + 1 < c.Wires.Count ? ",\n" : "\n");
        }
        t.Append("  ],\n  \"gates\": [\n");
        for (int i = 0; i < c.Gates.Count; i++)
        {
            t.Append("    ").Append(c.Gates[i] switch
            {
                PreparePlus x => $"{{\"gate\": \"prepare\", \"wire\": {x.Wire}, \"node\": {N(x.Node)}}}",
                DiagonalPhase x => $"{{\"gate\": \"phase\", \"wire\": {x.Wire}, \"node\": {N(x.Node)}, \"theta\": [{string.Join(", ", x.Theta.Select(Number))}]}}",
                FourierStep x => $"{{\"gate\": \"fourier\", \"wire\": {x.Wire}, \"weight\": {x.Weight}, \"from\": {N(x.From)}, \"to\": {N(x.To)}}}",
                ControlledPhase x => $"{{\"gate\": \"cz\", \"wires\": [{x.Wire1}, {x.Wire2}], \"weight\": {x.Weight}, \"edge\": [{N(x.U)}, {N(x.V)}]}}",
                _ => throw new InvalidOperationException("unknown gate"),
            });
            t.Append(i + 1 < c.Gates.Count ? ",\n" : "\n");
        }
        t.Append("  ]\n}\n");
        return t.ToString();
    }

    /// <summary>
    /// OpenQASM 3.0 for a qubit circuit: <c>h</c> for |+> and for F_1 = H, <c>p(theta_1 - theta_0)</c>
    /// for D (dropping the global phase e^(i theta_0)), <c>cz</c> for CZ^1. Qubit q[k] is wire qk; input
    /// and ancilla qubits start in |0>. Comments name each wire's path and each gate's node or edge.
    /// Throws <see cref="CircuitException"/> for p != 2.
    /// </summary>
    public static string Qasm(CausalCircuit c)
    {
        if (c.Dimension != 2)
            throw new CircuitException($"OpenQASM describes qubits; this circuit is over {c.Field.Name}: write it with --format text or json");
        var g = c.Graph;
        var t = new StringBuilder();
        t.Append("OPENQASM 3.0;\ninclude \"stdgates.inc\";\n");
        t.Append($"// circuit of a causal flow over {c.Field.Name}; ancilla wires start in |0> and are put in |+> by h\n");
        foreach (var w in c.Wires) t.Append($"// q[{w.Index}]: {Path(c, w)}\n");
        t.Append($"qubit[{c.Wires.Count}] q;\n");
        foreach (var gate in c.Gates)
            t.Append(gate switch
            {
                PreparePlus x => $"h q[{x.Wire}]; // |+> at {g.Names[x.Node]}\n",
                DiagonalPhase x => $"p({Number(x.Theta[1] - x.Theta[0])}) q[{x.Wire}]; // measurement of {g.Names[x.Node]}\n",
                FourierStep x => $"h q[{x.Wire}]; // {g.Names[x.From]} -> {g.Names[x.To]}\n",
                ControlledPhase x => $"cz q[{x.Wire1}], q[{x.Wire2}]; // edge {g.Names[x.U]} - {g.Names[x.V]}\n",
                _ => throw new InvalidOperationException("unknown gate"),
            });
        return t.ToString();
    }
}
