using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Simulation;

/// <summary>
/// When the width-following simulator prepares each node (docs/schedule.md, "Simulation"). Before node
/// v is measured, v and every neighbour of v (weight non-zero mod p) are live: a node not yet live is
/// prepared then, in index order, in |+> (an input: maximally entangled with its reference qudit), and
/// CZ^A[u][x] is applied between it and every live neighbour x. After the last measurement the nodes
/// never needed (outputs away from every measured node) are prepared the same way. Every edge is thus
/// applied once, before either end is measured; CZ gates commute, so the state of the unmeasured nodes
/// is always that of the full graph state after the same projections, and the memory follows the number
/// of live qudits, not the size of the graph. The plan depends on the order only, not on outcomes.
/// </summary>
public sealed class LivePlan
{
    private readonly int p;
    private readonly int[] inputs;
    private readonly List<(int U, int Weight)>[] neighbours;
    // steps[k]: the nodes to prepare before measurement k; steps[order.Count]: before the leaf.
    private readonly int[][] steps;

    /// <summary>The most graph nodes live at once (prepared and not yet measured).</summary>
    public int PeakLive { get; }
    /// <summary>The most qudits held at once: live graph nodes plus the reference qudits of the inputs prepared so far.</summary>
    public int PeakQudits { get; }

    /// <summary>The reference qudit's label for input node v (column index of the output map).</summary>
    public static int ReferenceLabel(int input) => -1 - input;

    /// <summary>
    /// Plans the preparations for the measurement order (measured nodes, each once). Throws
    /// <see cref="NotInFieldException"/> when a weight has no value mod p.
    /// </summary>
    public LivePlan(OpenGraph g, int p, IReadOnlyList<int> order)
    {
        this.p = p;
        var field = new PrimeField((ulong)p);
        int n = g.NodeCount;
        inputs = new int[n];
        foreach (var i in g.Inputs) inputs[i] = 1;
        neighbours = new List<(int, int)>[n];
        for (int v = 0; v < n; v++) neighbours[v] = [];
        foreach (var e in g.Edges)
        {
            int w = (int)field.FromRational(e.Weight);
            if (w == 0) continue;
            neighbours[e.U].Add((e.V, w));
            neighbours[e.V].Add((e.U, w));
        }
        var live = new bool[n];
        var prepared = new bool[n];
        int liveCount = 0, references = 0, peak = 0, peakQudits = 0;
        steps = new int[order.Count + 1][];
        void Prepare(int u, List<int> step)
        {
            if (prepared[u]) return;
            prepared[u] = live[u] = true;
            liveCount++;
            references += inputs[u];
            step.Add(u);
        }
        for (int k = 0; k <= order.Count; k++)
        {
            var step = new List<int>();
            if (k < order.Count)
            {
                int v = order[k];
                var needed = neighbours[v].Select(x => x.Item1).Append(v).Distinct().Order();
                foreach (var u in needed) Prepare(u, step);
            }
            else
                for (int u = 0; u < n; u++) Prepare(u, step);
            steps[k] = step.ToArray();
            peak = Math.Max(peak, liveCount);
            peakQudits = Math.Max(peakQudits, liveCount + references);
            if (k < order.Count) { live[order[k]] = false; liveCount--; }
        }
        PeakLive = peak;
        PeakQudits = peakQudits;
    }

    /// <summary>The register before anything is prepared: no qudits, the single amplitude 1.</summary>
    public QuditRegister Start() => new(p, [], [Complex.One]);

    /// <summary>
    /// Prepares the nodes of step k (k = the index of the next measurement, or the order's length for the
    /// final step) and entangles each with the live nodes; returns the grown register (the given one when
    /// nothing is to prepare).
    /// </summary>
    public QuditRegister Prepare(QuditRegister register, int k)
    {
        if (steps[k].Length == 0) return register;
        var plus = Enumerable.Repeat(new Complex(1 / Math.Sqrt(p), 0), p).ToArray();
        foreach (var u in steps[k])
        {
            register = inputs[u] == 1 ? register.ExtendEntangled(ReferenceLabel(u), u) : register.Extend(u, plus);
            foreach (var (x, w) in neighbours[u])
                if (x != u && register.Labels.Contains(x)) register.ApplyControlledPhase(u, x, w);
        }
        return register;
    }
}
