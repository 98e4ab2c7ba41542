using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Schedules;

/// <summary>
/// Turns a flow certificate into its feed-forward schedule (flows.md section 7). Outcome m_v of v leaves
/// X^(m_v c_v) Z^(m_v A c_v) on the later nodes; the correction is the inverse, and a node's frame is the
/// sum of what earlier outcomes left on it: a_w = sum_v c_v(w) m_v, b_w = sum_v (A c_v)(w) m_v.
/// </summary>
public static class ScheduleBuilder
{
    /// <summary>
    /// Builds the schedule. Throws <see cref="ScheduleException"/> for a noflow certificate, a malformed
    /// schedule or correction vectors that fail the flow conditions (the message lists them).
    /// </summary>
    public static FeedForwardSchedule Build(FlowResult r) => r.Field.Accept(new Run(r));

    private sealed class Run(FlowResult r) : IFieldVisitor<FeedForwardSchedule>
    {
        public FeedForwardSchedule Visit<T, TField>(TField f) where T : struct where TField : struct, IField<T>
        {
            var s = CorrectionSystem<T, TField>.Create(r, f);
            var problems = FlowConditionCheck.Violations(s);
            if (problems.Count > 0)
                throw new ScheduleException($"the corrections are not a flow ({Graphs.Formats.Counted.Of(problems.Count, "violation")} of flows.md section 3): " +
                    string.Join("; ", problems.Take(5)) + (problems.Count > 5 ? "; ..." : ""));
            var g = r.Graph;

            // Per target w: the (source, coefficient) terms of a_w and b_w, sources in measurement order.
            var xTerms = new List<(int, FieldElement)>[g.NodeCount];
            var zTerms = new List<(int, FieldElement)>[g.NodeCount];
            FieldElement E(T x) => FieldElement.Of(r.Field, x);
            for (int w = 0; w < g.NodeCount; w++) { xTerms[w] = []; zTerms[w] = []; }
            var corrections = new List<TriggeredCorrection>();
            foreach (var v in s.Order)
            {
                var c = s.Correction[v];
                var image = s.Image[v];
                var targets = c.Indices.Concat(image.Indices).Where(w => w != v).Distinct().Order();
                foreach (var w in targets)
                {
                    T cx = c.Get(f, w), cz = image.Get(f, w);
                    corrections.Add(new TriggeredCorrection(v, w, E(f.Negate(cx)), E(f.Negate(cz))));
                    if (!f.IsZero(cx)) xTerms[w].Add((v, E(cx)));
                    if (!f.IsZero(cz)) zTerms[w].Add((v, E(cz)));
                }
            }
            var frames = new List<NodeFrame>();
            foreach (var w in s.Order.Where(w => s.RoundOf[w] > 1).Concat(g.SortedOutputs))
                frames.Add(new NodeFrame(w, s.RoundOf[w], new LinearForm(xTerms[w]), new LinearForm(zTerms[w])));
            return new FeedForwardSchedule
            {
                Graph = g, Field = r.Field, Kind = r.Kind, Rounds = r.Rounds.Select(x => (IReadOnlyList<int>)x.Order().ToArray()).ToList(),
                Corrections = corrections, Frames = frames,
                Statistics = StatisticsOf(r, s.Order, frames, corrections),
                VanishedEdges = r.VanishedEdges,
            };
        }
    }

    private static ScheduleStatistics StatisticsOf(FlowResult r, int[] order, List<NodeFrame> frames, List<TriggeredCorrection> corrections)
    {
        static int Sources(NodeFrame fr) => fr.X.Terms.Select(t => t.Node).Union(fr.Z.Terms.Select(t => t.Node)).Count();
        var measuredFrames = frames.Where(fr => !fr.IsOutput).ToList();
        var outputFrames = frames.Where(fr => fr.IsOutput).ToList();
        return new ScheduleStatistics(
            r.Depth,
            r.Rounds.Select(x => x.Count).ToArray(),
            measuredFrames.Select(fr => fr.X.Terms.Count).DefaultIfEmpty(0).Max(),
            measuredFrames.Select(fr => fr.Z.Terms.Count).DefaultIfEmpty(0).Max(),
            outputFrames.Select(Sources).DefaultIfEmpty(0).Max(),
            corrections.Count(c => !c.X.IsZero),
            corrections.Count(c => !c.Z.IsZero),
            LongestChain(r.Graph.NodeCount, order, frames));
    }

    /// <summary>
    /// Longest path in the DAG v -> w ("the outcome of v enters the frame of w"), counted in nodes. Frames
    /// only hold earlier outcomes, so one pass in measurement order (outputs last) suffices. Ties go to the
    /// predecessor, and then to the end node, that comes first in measurement order (outputs by index).
    /// </summary>
    private static IReadOnlyList<int> LongestChain(int n, int[] order, List<NodeFrame> frames)
    {
        var length = new int[n];
        var previous = new int[n];
        var sequence = new List<int>(order);
        foreach (var fr in frames) if (fr.IsOutput) sequence.Add(fr.Node);
        var rank = new int[n];
        for (int k = 0; k < sequence.Count; k++) rank[sequence[k]] = k;
        Array.Fill(previous, -1);
        foreach (var v in sequence) length[v] = 1;
        foreach (var fr in frames)
        {
            int w = fr.Node;
            foreach (var v in fr.X.Terms.Select(t => t.Node).Union(fr.Z.Terms.Select(t => t.Node)).OrderBy(v => rank[v]))
                if (length[v] + 1 > length[w]) { length[w] = length[v] + 1; previous[w] = v; }
        }
        if (sequence.Count == 0) return [];
        int end = sequence[0];
        foreach (var w in sequence) if (length[w] > length[end]) end = w;
        var chain = new List<int>();
        for (int x = end; x >= 0; x = previous[x]) chain.Add(x);
        chain.Reverse();
        return chain;
    }
}
