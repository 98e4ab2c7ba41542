using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows.Primes;

/// <summary>
/// The maximally delayed construction of generalized flow over Q (flows.md section 5), replayed on integers
/// so that every layer's block is available: rows are the unprocessed nodes next to a corrector (processed
/// non-input), columns the correctors next to them, each row scaled by the lcm of its denominators. For each
/// layer it records the block's pivot minor and, for each row unsolvable over Q, the gcd of that row's
/// coordinates in the integral left-kernel basis (docs/primes.md). It must reach the same layers as the
/// solver: <see cref="PrimeSurvey"/> compares the two and treats a difference as a bug.
/// </summary>
internal sealed class RationalLayerRun
{
    /// <summary>The layers found, first layer (next to the outputs) first; each sorted.</summary>
    public List<int[]> Layers { get; } = [];
    /// <summary>The unprocessed nodes when the run stopped (empty when a flow exists).</summary>
    public int[] Blocked { get; private set; } = [];
    /// <summary>Per step (including the final stuck one): the gcd of two non-zero r x r minors, and (row node, gcd over two kernel bases) for rows unsolvable over Q.</summary>
    public List<(BigInteger PivotMinor, List<(int Node, BigInteger Gcd)> Unsolvable)> Blocks { get; } = [];

    public RationalLayerRun(OpenGraph g)
    {
        int n = g.NodeCount;
        var adjacency = new List<(int Node, Rational Weight)>[n];
        for (int i = 0; i < n; i++) adjacency[i] = [];
        foreach (var e in g.Edges) { adjacency[e.U].Add((e.V, e.Weight)); adjacency[e.V].Add((e.U, e.Weight)); }
        var processed = new bool[n];
        foreach (var o in g.Outputs) processed[o] = true;
        int unprocessed = n - g.Outputs.Count;
        bool IsCorrector(int v) => processed[v] && !g.Inputs.Contains(v);
        // The frontier (unprocessed nodes next to a corrector) only grows when a node becomes a corrector,
        // and a node leaves it only when it is processed: kept incrementally, so a step costs its block.
        var frontier = new SortedSet<int>();
        void Promote(int v)
        {
            if (g.Inputs.Contains(v)) return;
            foreach (var (w, _) in adjacency[v]) if (!processed[w]) frontier.Add(w);
        }
        foreach (var o in g.Outputs.Order()) Promote(o);
        while (unprocessed > 0)
        {
            var rows = frontier.ToArray();
            var columns = rows.SelectMany(v => adjacency[v].Where(x => IsCorrector(x.Node)).Select(x => x.Node)).Distinct().Order().ToArray();
            var columnOf = new Dictionary<int, int>();
            for (int k = 0; k < columns.Length; k++) columnOf[columns[k]] = k;
            var block = new BigInteger[rows.Length][];
            for (int r = 0; r < rows.Length; r++)
            {
                var entries = adjacency[rows[r]].Where(x => IsCorrector(x.Node)).ToList();
                var scale = entries.Aggregate(BigInteger.One, (l, x) => l / BigInteger.GreatestCommonDivisor(l, x.Weight.Denominator) * x.Weight.Denominator);
                block[r] = new BigInteger[columns.Length];
                foreach (var (node, w) in entries) block[r][columnOf[node]] = w.Numerator * (scale / w.Denominator);
            }
            // Two eliminations, the second with rows and columns in opposite order, give two non-zero r x r
            // minors and two integral kernel bases; the gcds over both are still valid (docs/primes.md) and
            // drop most primes that only one pivot choice happens to pick up.
            var elimination = new FractionFreeElimination(block, columns.Length);
            var reversed = new FractionFreeElimination(
                block.Reverse().Select(row => row.Reverse().ToArray()).ToArray(), columns.Length);
            var layer = new List<int>();
            var unsolvable = new List<(int, BigInteger)>();
            for (int r = 0; r < rows.Length; r++)
            {
                int mirror = rows.Length - 1 - r;
                if (elimination.IsSolvable(r) != reversed.IsSolvable(mirror))
                    throw new InvalidOperationException("internal error: two eliminations of one block disagree on a row's solvability");
                if (elimination.IsSolvable(r)) layer.Add(rows[r]);
                else unsolvable.Add((rows[r], BigInteger.GreatestCommonDivisor(elimination.KernelCoordinateGcd(r), reversed.KernelCoordinateGcd(mirror))));
            }
            Blocks.Add((BigInteger.GreatestCommonDivisor(elimination.PivotMinor, reversed.PivotMinor), unsolvable));
            if (layer.Count == 0) break;
            Layers.Add(layer.ToArray());
            foreach (var v in layer) { processed[v] = true; frontier.Remove(v); }
            unprocessed -= layer.Count;
            foreach (var v in layer) Promote(v);
        }
        Blocked = Enumerable.Range(0, n).Where(v => !processed[v]).ToArray();
    }
}
