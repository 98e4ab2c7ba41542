using FlowCert.Flows;
using System.Text;
using FlowCert.Graphs.Formats;
using FlowCert.Certificates;
using FlowCert.Graphs;

namespace FlowCert.Schedules;

/// <summary>The readable table of a schedule (docs/schedule.md, "Reading the table"). LF line ends.</summary>
public static class ScheduleText
{
    /// <summary>A linear form as text: <c>m_a + 2*m_b</c>, <c>-1/2*m_a</c>, or <c>0</c>.</summary>
    public static string Form(LinearForm form, IReadOnlyList<string> names)
    {
        if (form.IsZero) return "0";
        var sb = new StringBuilder();
        foreach (var (v, coefficient) in form.Terms)
        {
            bool negative = coefficient.IsNegative;
            var magnitude = negative ? coefficient.Negate() : coefficient;
            if (sb.Length > 0) sb.Append(negative ? " - " : " + ");
            else if (negative) sb.Append('-');
            if (!magnitude.IsOne) sb.Append(magnitude).Append('*');
            sb.Append("m_").Append(names[v]);
        }
        return sb.ToString();
    }

    /// <summary>The readable table of a schedule.</summary>
    public static string Write(FeedForwardSchedule s)
    {
        var g = s.Graph;
        var st = s.Statistics;
        var o = new StringBuilder();
        void Line(string text = "") => o.Append(text).Append('\n');
        string When(NodeFrame fr) => fr.IsOutput ? "output" : $"round {fr.Round}";

        Line($"feed-forward schedule: field {s.Field.Name}, {FlowKinds.Adjective(s.Kind)} flow, depth {st.Depth}; " +
             $"{Counted.Of(g.NodeCount, "node")}: {Counted.Of(g.Inputs.Count, "input")}, {Counted.Of(g.Outputs.Count, "output")}, {g.NodeCount - g.Outputs.Count} measured");
        if (s.VanishedEdges.Count > 0) Line("warning: " + VanishingEdges.Warning(g, s.Field, s.VanishedEdges));
        Line($"m_v = outcome of v re-read through its frame (raw outcome - b_v); all arithmetic exact, in {s.Field.Name}");
        Line();
        Line("rounds (round 1 is measured first; nodes of one round in parallel)");
        Table(o, ["round", "nodes"], s.Rounds.Select((r, k) => new[] { (k + 1).ToString(), string.Join(" ", r.Select(v => g.Names[v])) }));
        Line();
        Line("corrections triggered by outcome m_v: X_u^(x*m_v) Z_u^(z*m_v) on node u, or add -x*m_v, -z*m_v to u's frame");
        Table(o, ["outcome", "node", "x", "z"], s.Corrections.Select(c => new[] { "m_" + g.Names[c.Source], g.Names[c.Target], c.X.ToString(), c.Z.ToString() }));
        Line();
        Line("frames: node w holds X^a Z^b on its ideal state. Measure w with D' = X^a D X^-a (entry j of D' is entry j-a of D)");
        Line("and read m_w = raw - b; after the last round apply (X^a Z^b)^-1 to each output.");
        Table(o, ["node", "when", "a (angle, X)", "b (outcome, Z)"], s.Frames.Select(fr => new[] { g.Names[fr.Node], When(fr), Form(fr.X, g.Names), Form(fr.Z, g.Names) }));
        Line();
        Line("statistics");
        Table(o, ["quantity", "value"],
        [
            ["depth", st.Depth.ToString()],
            ["nodes per round", string.Join(" ", st.NodesPerRound)],
            ["most outcomes in one angle adaptation", st.MaxAngleDependencies.ToString()],
            ["most outcomes in one outcome re-reading", st.MaxReadoutDependencies.ToString()],
            ["most outcomes in one output correction", st.MaxOutputDependencies.ToString()],
            ["non-zero corrections (X + Z)", $"{st.NonZeroCorrections} ({st.NonZeroX} + {st.NonZeroZ})"],
            ["longest chain of dependencies", st.LongestChain.Count == 0 ? "0" : $"{st.LongestChain.Count}: {string.Join(" -> ", st.LongestChain.Select(v => g.Names[v]))}"],
        ]);
        return o.ToString();
    }

    private static void Table(StringBuilder o, string[] header, IEnumerable<string[]> rows)
    {
        var all = rows.Prepend(header).ToList();
        var width = new int[header.Length];
        foreach (var row in all) for (int i = 0; i < row.Length; i++) width[i] = Math.Max(width[i], row[i].Length);
        foreach (var row in all)
        {
            var cells = row.Select((cell, i) => i == row.Length - 1 ? cell : cell.PadRight(width[i]));
            o.Append("  ").Append(string.Join("  ", cells).TrimEnd()).Append('\n');
        }
        if (all.Count == 1) o.Append("  (none)\n");
    }
}
