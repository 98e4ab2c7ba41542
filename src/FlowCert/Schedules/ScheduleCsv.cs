using System.Text;

namespace FlowCert.Schedules;

/// <summary>
/// The schedule as one CSV table (RFC 4180, LF line ends) with header <c>kind,node,round,source,x,z</c>;
/// docs/schedule.md defines each kind of row. Stable: new kinds of row may be added, columns never change.
/// </summary>
public static class ScheduleCsv
{
    /// <summary>The header row of the table.</summary>
    public const string Header = "kind,node,round,source,x,z";

    /// <summary>The CSV text of a schedule.</summary>
    public static string Write(FeedForwardSchedule s)
    {
        var g = s.Graph;
        var st = s.Statistics;
        var roundOf = new string[g.NodeCount];
        foreach (var o in g.Outputs) roundOf[o] = "output";
        for (int k = 0; k < s.Rounds.Count; k++) foreach (var v in s.Rounds[k]) roundOf[v] = (k + 1).ToString();
        var rank = new int[g.NodeCount];
        int next = 0;
        foreach (var v in s.Rounds.SelectMany(r => r)) rank[v] = next++;
        var sb = new StringBuilder();
        void Row(params string[] cells) => sb.Append(string.Join(",", cells.Select(Quote))).Append('\n');

        Row(Header.Split(','));
        for (int k = 0; k < s.Rounds.Count; k++) foreach (var v in s.Rounds[k]) Row("measure", g.Names[v], roundOf[v], "", "", "");
        foreach (var o in g.SortedOutputs) Row("output", g.Names[o], "output", "", "", "");
        foreach (var e in s.VanishedEdges) Row("vanished", g.Names[e.U], "", g.Names[e.V], e.Weight.ToString(), "");
        foreach (var c in s.Corrections) Row("correction", g.Names[c.Target], roundOf[c.Target], g.Names[c.Source], c.X.ToString(), c.Z.ToString());
        foreach (var fr in s.Frames)
        {
            var x = fr.X.Terms.ToDictionary(t => t.Node, t => t.Coefficient.ToString());
            var z = fr.Z.Terms.ToDictionary(t => t.Node, t => t.Coefficient.ToString());
            var sources = fr.X.Terms.Select(t => t.Node).Union(fr.Z.Terms.Select(t => t.Node)).OrderBy(v => rank[v]);
            foreach (var v in sources)
                Row("frame", g.Names[fr.Node], roundOf[fr.Node], g.Names[v], x.GetValueOrDefault(v, "0"), z.GetValueOrDefault(v, "0"));
        }
        Row("statistic", "depth", "", "", st.Depth.ToString(), "");
        Row("statistic", "nodes_per_round", "", "", string.Join(" ", st.NodesPerRound), "");
        Row("statistic", "max_angle_dependencies", "", "", st.MaxAngleDependencies.ToString(), "");
        Row("statistic", "max_readout_dependencies", "", "", st.MaxReadoutDependencies.ToString(), "");
        Row("statistic", "max_output_dependencies", "", "", st.MaxOutputDependencies.ToString(), "");
        Row("statistic", "nonzero_corrections", "", "", st.NonZeroX.ToString(), st.NonZeroZ.ToString());
        Row("statistic", "longest_chain", "", "", st.LongestChain.Count.ToString(), string.Join(" ", st.LongestChain.Select(v => g.Names[v])));
        return sb.ToString();
    }

    private static string Quote(string cell)
        => cell.IndexOfAny([',', '"', '\n', '\r']) < 0 ? cell : "\"" + cell.Replace("\"", "\"\"") + "\"";
}
