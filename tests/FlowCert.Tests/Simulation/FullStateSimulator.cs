using System.Numerics;
using FlowCert.Graphs;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// The reference for the width-following simulator (the library's OutcomeTreeSimulator before it
/// followed the schedule, kept unchanged but for its name): prepares the whole graph state at once.
/// Runs a compiled pattern branch by branch (flows.md section 7): prepares the graph state with the inputs
/// entangled to a reference, measures in measurement order with each basis adapted to the node's frame
/// (D' = X^a D X^-a), re-reads each outcome as raw - b, folds X^(m c_v) Z^(m A c_v) into the frames of
/// the other nodes, and finally applies (X^a Z^b)^-1 to the outputs. Branches share their common prefix
/// (depth-first), so enumerating all p^|M| of them costs about |M| times one preparation.
/// </summary>
internal static class FullStateSimulator
{
    /// <summary>Simulates the selected branches, the all-zero branch first, and compares them.</summary>

    public static DeterminismReport Run(QuditPattern pattern, OutcomeBranches branches, FrameFault faults, Action<BranchRecord>? observer = null)
    {
        var comparison = new DeterminismComparison(pattern, branches);
        Explore(pattern, branches, faults, record => { comparison.Add(record); observer?.Invoke(record); });
        return comparison.Report();
    }

    /// <summary>Visits the selected branches depth-first, outcome 0 first at every level.</summary>
    public static void Explore(QuditPattern pattern, OutcomeBranches branches, FrameFault faults, Action<BranchRecord> visit)
    {
        var g = pattern.Graph;
        int n = g.NodeCount, depth = pattern.Order.Count;
        List<int[]>? sample = null;
        if (!branches.IsExhaustive) sample = Sample(pattern, branches);
        else if (Math.Pow(pattern.Dimension, depth) > OutcomeBranches.MaxExhaustive)
            throw new SimulationException($"--branches all would enumerate {pattern.Dimension}^{depth} outcome strings, more than 2^20: sample some with --branches K");
        var state = new Walk(pattern, faults, visit, new int[n], new int[n], new int[n], new int[n], new int[n], new int[n]);
        state.Step(0, GraphStateVector.Prepare(g, pattern.Dimension), sample);
    }

    private static List<int[]> Sample(QuditPattern pattern, OutcomeBranches branches)
    {
        var random = new SeededRandom(branches.Seed ^ 0x5EEDB4A7C4E5UL);
        var strings = new List<int[]> { new int[pattern.Order.Count] };
        for (int k = 0; k < branches.SampleSize; k++)
            strings.Add(pattern.Order.Select(_ => random.NextInt(pattern.Dimension)).ToArray());
        return strings;
    }

    private sealed record Walk(QuditPattern P, FrameFault Faults, Action<BranchRecord> Visit,
        int[] A, int[] B, int[] Raw, int[] Outcome, int[] UsedA, int[] UsedB)
    {
        private int Mod(long x) => QuditOperators.Mod(x, P.Dimension);

        public void Step(int level, QuditRegister register, List<int[]>? sample)
        {
            int p = P.Dimension;
            if (level == P.Order.Count) { Leaf(register); return; }
            int v = P.Order[level];
            int shift = Faults.HasFlag(FrameFault.SkipAngleAdaptation) ? 0 : Faults.HasFlag(FrameFault.FlipAngleAdaptation) ? -A[v] : A[v];
            var adapted = QuditOperators.AdaptedAngle(P.Angles[v], shift);
            IEnumerable<int> outcomes = sample is null ? Enumerable.Range(0, p) : sample.Select(s => s[level]).Distinct().Order();
            foreach (var raw in outcomes)
            {
                var child = register.Project(v, QuditOperators.OutcomeBra(adapted, raw));
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
            var map = register.ToMatrix(outputs, g.SortedInputs.Select(GraphStateVector.ReferenceLabel).ToArray()) * new Complex(scale, 0);
            Visit(new BranchRecord((int[])Raw.Clone(), (int[])Outcome.Clone(), (int[])UsedA.Clone(), (int[])UsedB.Clone(), map));
        }
    }
}
