using System.Numerics;
using FlowCert.Graphs;

namespace FlowCert.Simulation;

/// <summary>
/// Runs a compiled pattern branch by branch (flows.md section 7), following the schedule: each node is
/// prepared just before it is first needed (<see cref="LivePlan"/>), inputs entangled with a reference;
/// nodes are measured in measurement order with each basis adapted to the node's frame (D' = X^a D X^-a),
/// each outcome re-read as raw - b, X^(m c_v) Z^(m A c_v) folded into the frames of the other nodes, and
/// finally (X^a Z^b)^-1 applied to the outputs. A measured node leaves the register, so memory follows
/// the number of live nodes. Branches share their common prefix (depth-first).
/// </summary>
public static class OutcomeTreeSimulator
{
    /// <summary>Simulates the selected branches, the all-zero branch first, and compares them.</summary>
    public static DeterminismReport Run(QuditPattern pattern, OutcomeBranches branches, Action<BranchRecord>? observer = null)
        => Run(pattern, branches, FrameFault.None, observer);

    internal static DeterminismReport Run(QuditPattern pattern, OutcomeBranches branches, FrameFault faults, Action<BranchRecord>? observer = null)
    {
        var comparison = new DeterminismComparison(pattern, branches);
        Explore(pattern, branches, faults, record => { comparison.Add(record); observer?.Invoke(record); });
        return comparison.Report();
    }

    /// <summary>Visits the selected branches depth-first, outcome 0 first at every level.</summary>
    internal static void Explore(QuditPattern pattern, OutcomeBranches branches, FrameFault faults, Action<BranchRecord> visit)
    {
        var g = pattern.Graph;
        int n = g.NodeCount, depth = pattern.Order.Count;
        List<int[]>? sample = null;
        if (!branches.IsExhaustive) sample = Sample(pattern, branches);
        else if (Math.Pow(pattern.Dimension, depth) > OutcomeBranches.MaxExhaustive)
            throw new SimulationException($"--branches all would enumerate {pattern.Dimension}^{depth} outcome strings, more than 2^20: sample some with --branches K");
        var state = new Walk(pattern, faults, visit, new int[n], new int[n], new int[n], new int[n], new int[n], new int[n]);
        state.Step(0, pattern.Plan.Start(), sample);
    }

    private static List<int[]> Sample(QuditPattern pattern, OutcomeBranches branches)
    {
        var random = new SeededRandom(branches.Seed ^ 0x5EEDB4A7C4E5UL);
        var strings = new List<int[]> { new int[pattern.Order.Count] };
        for (int k = 0; k < branches.SampleSize; k++)
            strings.Add(pattern.Order.Select(_ => random.NextInt(pattern.Dimension)).ToArray());
        return strings;
    }

    /// <summary>
    /// The measurement basis, in one place: the bra of raw outcome <paramref name="raw"/> when node v is
    /// measured under frame X^a Z^b; for an XY-type measurement that is &lt;b_raw| for D' = X^a D X^-a
    /// (flows.md section 7), which needs a only (b re-reads the outcome afterwards).
    /// </summary>
    internal static Complex[] MeasurementBra(QuditPattern pattern, FrameFault faults, int v, int a, int b, int raw)
    {
        int shift = faults.HasFlag(FrameFault.SkipAngleAdaptation) ? 0 : faults.HasFlag(FrameFault.FlipAngleAdaptation) ? -a : a;
        var adapted = QuditOperators.AdaptedAngle(pattern.Angles[v], shift);
        return QuditOperators.OutcomeBra(adapted, raw);
    }

    private sealed record Walk(QuditPattern P, FrameFault Faults, Action<BranchRecord> Visit,
        int[] A, int[] B, int[] Raw, int[] Outcome, int[] UsedA, int[] UsedB)
    {
        private int Mod(long x) => QuditOperators.Mod(x, P.Dimension);

        public void Step(int level, QuditRegister register, List<int[]>? sample)
        {
            int p = P.Dimension;
            register = P.Plan.Prepare(register, level);
            if (level == P.Order.Count) { Leaf(register); return; }
            int v = P.Order[level];
            IEnumerable<int> outcomes = sample is null ? Enumerable.Range(0, p) : sample.Select(s => s[level]).Distinct().Order();
            foreach (var raw in outcomes)
            {
                var child = register.Project(v, MeasurementBra(P, Faults, v, A[v], B[v], raw));
                int m = Mod(Faults.HasFlag(FrameFault.FlipReadout) ? raw + B[v] : raw - B[v]);
                int sign = Faults.HasFlag(FrameFault.FlipCorrectionSign) ? -1 : 1;
                var next = this with { A = (int[])A.Clone(), B = (int[])B.Clone(), Raw = (int[])Raw.Clone(), Outcome = (int[])Outcome.Clone(), UsedA = (int[])UsedA.Clone(), UsedB = (int[])UsedB.Clone() };
                next.Raw[v] = raw; next.Outcome[v] = m; next.UsedA[v] = A[v]; next.UsedB[v] = B[v];
                var c = P.Correction[v];
                var image = P.Image[v];
                for (int w = 0; w < A.Length; w++)
                {
                    if (w == v) continue;
                    next.A[w] = Mod(A[w] + (long)sign * m * c[w]);
                    next.B[w] = Mod(B[w] + (long)sign * m * image[w]);
                }
                next.Step(level + 1, child, sample?.Where(s => s[level] == raw).ToList());
            }
        }

        private void Leaf(QuditRegister register)
        {
            var g = P.Graph;
            int p = P.Dimension;
            var outputs = g.SortedOutputs;
            foreach (var o in outputs)
            {
                UsedA[o] = A[o]; UsedB[o] = B[o];
                var undo = QuditOperators.Clock(p, -B[o]) * QuditOperators.Shift(p, -A[o]);
                register.Apply(o, undo);
            }
            double scale = Math.Sqrt(Math.Pow(p, g.Inputs.Count));
            var map = register.ToMatrix(outputs, g.SortedInputs.Select(LivePlan.ReferenceLabel).ToArray()) * new Complex(scale, 0);
            Visit(new BranchRecord((int[])Raw.Clone(), (int[])Outcome.Clone(), (int[])UsedA.Clone(), (int[])UsedB.Clone(), map));
        }
    }
}
