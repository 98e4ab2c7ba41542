using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// The full state-vector preparation of the reference simulator (moved from the library unchanged).
/// Prepares the graph state of flows.md section 7 over qudits of prime dimension p: every non-input in |+>,
/// every input maximally entangled with a reference qudit (label -1 - v for input v), then
/// prod CZ^A[u][v] with the weights reduced mod p. Reading the reference as the column index of the
/// output map turns one simulation into the whole input-to-output matrix.
/// </summary>
public static class GraphStateVector
{
    /// <summary>The reference qudit's label for input node v.</summary>
    public static int ReferenceLabel(int input) => -1 - input;

    /// <summary>
    /// The normalized state over the reference qudits (sorted inputs first) and all graph nodes (by index).
    /// Throws <see cref="NotInFieldException"/> when a weight has no value mod p.
    /// </summary>
    public static QuditRegister Prepare(OpenGraph g, int p)
    {
        var field = new PrimeField((ulong)p);
        var inputs = g.SortedInputs;
        int n = g.NodeCount, r = inputs.Length;
        var edges = g.Edges.Select(e => (e.U, e.V, W: (long)field.FromRational(e.Weight))).Where(e => e.W != 0).ToArray();
        var labels = inputs.Select(ReferenceLabel).Concat(Enumerable.Range(0, n)).ToArray();
        long size = (long)Math.Pow(p, n + r);
        var amplitudes = new Complex[size];
        // Reference qudits take the lowest positions, graph node v the position r + v. With no nodes the
        // state is the single amplitude 1 (the empty product).
        var stride = new long[n];
        for (int v = 0; v < n; v++) stride[v] = v == 0 ? (long)Math.Pow(p, r) : stride[v - 1] * p;
        var inputStride = inputs.Select((_, i) => (long)Math.Pow(p, i)).ToArray();
        double norm = 1.0 / Math.Sqrt(Math.Pow(p, n));
        var phases = Enumerable.Range(0, p).Select(k => QuditOperators.RootOfUnity(p, k) * norm).ToArray();
        var digits = new int[n];
        long configurations = (long)Math.Pow(p, n);
        for (long c = 0; c < configurations; c++)
        {
            long exponent = 0;
            foreach (var (u, v, w) in edges) exponent += w * digits[u] * digits[v];
            long index = 0;
            for (int v = 0; v < n; v++) index += digits[v] * stride[v];
            for (int i = 0; i < r; i++) index += digits[inputs[i]] * inputStride[i];
            amplitudes[index] = phases[(int)(exponent % p)];
            for (int v = 0; v < n && ++digits[v] == p; v++) digits[v] = 0;
        }
        return new QuditRegister(p, labels, amplitudes);
    }
}
