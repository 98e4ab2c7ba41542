using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Circuits;

/// <summary>A certificate the circuit cannot be read off (not causal, not a flow, not over F_p).</summary>
public sealed class CircuitException(string message) : Exception(message);

/// <summary>
/// One wire: the path i, f(i), f(f(i)), ... of the flow from an input or a prepared node to an output.
/// </summary>
/// <param name="Index">The wire's number q0, q1, ...: inputs first (sorted), then prepared wires by start node.</param>
/// <param name="Nodes">The nodes the wire passes through, start first, output last.</param>
/// <param name="IsInput">True when the wire starts at an input; otherwise it starts in |+>.</param>
public sealed record CircuitWire(int Index, IReadOnlyList<int> Nodes, bool IsInput)
{
    /// <summary>The node the wire starts at.</summary>
    public int Start => Nodes[0];
    /// <summary>The output the wire ends at.</summary>
    public int Output => Nodes[^1];
}

/// <summary>One gate of the circuit, in order.</summary>
public abstract record CircuitGate;

/// <summary>Starts wire <see cref="Wire"/> in |+> = F|0> (node <see cref="Node"/> is prepared).</summary>
public sealed record PreparePlus(int Wire, int Node) : CircuitGate;

/// <summary>D = diag(e^(i theta_0), ..., e^(i theta_(p-1))) on the wire while it carries <see cref="Node"/> (its measurement parameter).</summary>
public sealed record DiagonalPhase(int Wire, int Node, IReadOnlyList<double> Theta) : CircuitGate;

/// <summary>
/// F_a on the wire: |j> -> p^(-1/2) sum_k w^(a j k) |k>, with a = A[From][To] mod p, the weight of the
/// flow edge; the wire moves from node <see cref="From"/> (measured) to <see cref="To"/> = f(From).
/// </summary>
public sealed record FourierStep(int Wire, int From, int To, int Weight) : CircuitGate;

/// <summary>CZ^a between two wires: |j, k> -> w^(a j k) |j, k>, for the edge U - V of weight a mod p.</summary>
public sealed record ControlledPhase(int Wire1, int Wire2, int U, int V, int Weight) : CircuitGate;

/// <summary>
/// The circuit of a causal flow over F_p (docs/circuits.md; the construction of "Determinism in the
/// one-way model", arXiv:quant-ph/0506062, in qudit form). Its matrix, from input wires (ancillas in |0>)
/// to the wires' ends read in sorted output order, is the pattern's implemented map up to a global phase.
/// </summary>
public sealed record CausalCircuit(OpenGraph Graph, FieldSpec Field, int Dimension, IReadOnlyList<CircuitWire> Wires, IReadOnlyList<CircuitGate> Gates)
{
    /// <summary>The wire of every sorted input, in order.</summary>
    public IReadOnlyList<int> InputWires => Graph.SortedInputs.Select(i => Wires.Single(w => w.IsInput && w.Start == i).Index).ToArray();
    /// <summary>The wire ending at every sorted output, in order.</summary>
    public IReadOnlyList<int> OutputWires => Graph.SortedOutputs.Select(o => Wires.Single(w => w.Output == o).Index).ToArray();

    /// <summary>
    /// Reads the circuit off a certificate. Accepted: a causal-flow certificate, or a generalized one whose
    /// every correction vector has one entry (that is a causal flow, flows.md section 4). Throws
    /// <see cref="CircuitException"/> otherwise (one sentence), and for a certificate over Q, a noflow
    /// certificate or corrections that fail the flow conditions.
    /// </summary>
    public static CausalCircuit Extract(FlowResult r, MeasurementAngles? angles = null)
    {
        if (r.Field.IsRationals)
            throw new CircuitException("the certificate is over Q: circuits are read off flows over F_p (qudits); solve the graph over a prime, for example --field 3");
        if (!r.HasFlow) throw new CircuitException("the certificate says no flow exists (verdict noflow): there is no circuit to read off");
        if (r.Field.Prime > int.MaxValue) throw new CircuitException($"the certificate is over {r.Field.Name}: circuits are written for primes below 2^31");
        int p = (int)r.Field.Prime;
        var field = new PrimeField((ulong)p);
        CorrectionSystem<ulong, PrimeField> s;
        try { s = CorrectionSystem<ulong, PrimeField>.Create(r, field); }
        catch (ScheduleException e) { throw new CircuitException(e.Message); }
        var g = r.Graph;
        foreach (var v in s.Order)
            if (s.Correction[v].Count != 1)
                throw new CircuitException($"the flow is not causal: the correction of {g.Names[v]} has {s.Correction[v].Count} entries, not one " +
                    "(circuits are read off causal flows; extraction from generalized flow is not implemented)");
        var problems = FlowConditionCheck.Violations(s);
        if (problems.Count > 0) throw new CircuitException($"the corrections are not a flow: {problems[0]}");
        angles ??= new MeasurementAngles(p, new Dictionary<int, double[]>());

        int n = g.NodeCount;
        var next = Enumerable.Repeat(-1, n).ToArray();
        var hasPredecessor = new bool[n];
        foreach (var v in s.Order) { next[v] = s.Correction[v].Indices[0]; hasPredecessor[next[v]] = true; }
        var weight = new Dictionary<(int, int), int>();
        foreach (var e in g.Edges)
        {
            int w = (int)field.FromRational(e.Weight);
            if (w != 0) weight[(Math.Min(e.U, e.V), Math.Max(e.U, e.V))] = w;
        }
        int Weight(int u, int v) => weight[(Math.Min(u, v), Math.Max(u, v))];

        // Wires: inputs first (sorted), then every other node that no flow step reaches, by index.
        var starts = g.SortedInputs.Concat(Enumerable.Range(0, n).Where(u => !g.Inputs.Contains(u) && !hasPredecessor[u])).ToArray();
        var wires = new List<CircuitWire>();
        var wireOf = Enumerable.Repeat(-1, n).ToArray();
        foreach (var start in starts)
        {
            var path = new List<int> { start };
            while (next[path[^1]] >= 0) path.Add(next[path[^1]]);
            foreach (var u in path) wireOf[u] = wires.Count;
            wires.Add(new CircuitWire(wires.Count, path, g.Inputs.Contains(start)));
        }
        if (wireOf.Any(x => x < 0)) throw new InvalidOperationException("a node lies on no wire: the flow is not injective");

        // The wire carries a node from its arrival (start, or the step into it) until the step out of it.
        var present = new bool[n];
        foreach (var wire in wires) present[wire.Start] = true;
        var applied = new HashSet<(int, int)>();
        var gates = new List<CircuitGate>();
        foreach (var wire in wires.Where(w => !w.IsInput)) gates.Add(new PreparePlus(wire.Index, wire.Start));
        void Entangle(int v)
        {
            foreach (var ((a, b), w) in weight.OrderBy(kv => kv.Key))
            {
                if (a != v && b != v) continue;
                int x = a == v ? b : a;
                if (next[v] == x || next[x] == v || !applied.Add((a, b))) continue;
                if (!present[x] || !present[v]) throw new InvalidOperationException($"edge {g.Names[a]}-{g.Names[b]} comes when an end is not on its wire");
                gates.Add(new ControlledPhase(wireOf[a], wireOf[b], a, b, w));
            }
        }
        foreach (var v in s.Order)
        {
            Entangle(v);
            var theta = angles.Of(v);
            if (theta.Any(t => t != 0)) gates.Add(new DiagonalPhase(wireOf[v], v, theta));
            gates.Add(new FourierStep(wireOf[v], v, next[v], Weight(v, next[v])));
            present[v] = false;
            present[next[v]] = true;
        }
        foreach (var o in g.SortedOutputs) Entangle(o);
        return new CausalCircuit(g, r.Field, p, wires, gates);
    }
}
