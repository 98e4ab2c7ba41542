using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Drawing;

/// <summary>
/// Places the nodes of a picture. With a flow, column k holds the nodes measured in round k + 1 and the
/// last column the outputs. Otherwise the graph's position hints are used when every node has one, and
/// else columns by distance from the inputs. Inside a column, nodes are stacked by their hints when all
/// have one, else by a few sweeps that move each node towards the mean height of its neighbours in
/// earlier (then later) columns, ties broken by natural name order. Everything is deterministic.
/// </summary>
public static class PictureLayout
{
    /// <summary>Spacing and margins in pixels: between columns, between rows, per unit of a position hint, left and top margins.</summary>
    public const double ColumnGap = 120, RowGap = 58, HintUnit = 64, Left = 70, Top = 112;

    /// <summary>Small graphs are drawn roomier, so that crossing arrows and their labels stay apart.</summary>
    public const int RoomyNodes = 16;
    /// <summary>The factor applied to the spacing of graphs with at most <see cref="RoomyNodes"/> nodes.</summary>
    public const double RoomyScale = 1.5;

    private static double Scale(OpenGraph g) => g.NodeCount <= RoomyNodes ? RoomyScale : 1.0;

    /// <summary>Places the nodes of <paramref name="g"/>: by the result's rounds when it has a flow, else by hints or distance from the inputs.</summary>
    public static FlowPicture Arrange(OpenGraph g, FlowResult? result, string title)
    {
        if (result is { HasFlow: true })
        {
            var column = new int[g.NodeCount];
            Array.Fill(column, result.Depth);
            for (int k = 0; k < result.Rounds.Count; k++)
                foreach (var v in result.Rounds[k]) column[v] = k;
            var titles = Enumerable.Range(0, result.Depth + 1).Select(k => k < result.Depth ? $"round {k + 1}" : "outputs").ToArray();
            return Columns(g, result, title, column, titles, PictureArrangement.Rounds);
        }
        if (g.NodeCount > 0 && g.Positions.Count == g.NodeCount)
        {
            decimal minX = g.Positions.Values.Min(p => p.X), minY = g.Positions.Values.Min(p => p.Y);
            var x = new double[g.NodeCount];
            var y = new double[g.NodeCount];
            for (int v = 0; v < g.NodeCount; v++)
            {
                x[v] = Left + (double)(g.Positions[v].X - minX) * HintUnit * Scale(g);
                y[v] = Top + (double)(g.Positions[v].Y - minY) * HintUnit * Scale(g);
            }
            return new FlowPicture { Graph = g, Result = result, Title = title, Arrangement = PictureArrangement.PositionHints, X = x, Y = y, ColumnTitles = [] };
        }
        var distance = DistanceColumns(g);
        int count = g.NodeCount == 0 ? 0 : distance.Max() + 1;
        return Columns(g, result, title, distance, Enumerable.Range(0, count).Select(k => $"distance {k}").ToArray(), PictureArrangement.DistanceFromInputs);
    }

    /// <summary>
    /// Breadth-first distance from the inputs. Components that no input reaches start together in the
    /// column after the farthest reached node, each from its first node in natural order.
    /// </summary>
    internal static int[] DistanceColumns(OpenGraph g)
    {
        var neighbours = Neighbours(g);
        var column = new int[g.NodeCount];
        Array.Fill(column, -1);
        var queue = new Queue<int>();
        void Spread()
        {
            while (queue.Count > 0)
            {
                int v = queue.Dequeue();
                foreach (var w in neighbours[v])
                    if (column[w] < 0) { column[w] = column[v] + 1; queue.Enqueue(w); }
            }
        }
        foreach (var i in g.SortedInputs) { column[i] = 0; queue.Enqueue(i); }
        Spread();
        int start = column.DefaultIfEmpty(-1).Max() + 1;
        foreach (var v in NaturalNameOrder.Sort(g))
        {
            if (column[v] >= 0) continue;
            column[v] = start;
            queue.Enqueue(v);
            Spread();
        }
        return column;
    }

    private static FlowPicture Columns(OpenGraph g, FlowResult? result, string title, int[] column, string[] titles, PictureArrangement arrangement)
    {
        int count = titles.Length;
        var members = Enumerable.Range(0, count).Select(_ => new List<int>()).ToArray();
        var natural = NaturalNameOrder.Sort(g);
        foreach (var v in natural) members[column[v]].Add(v);
        int tallest = Math.Max(1, members.Select(m => m.Count).DefaultIfEmpty(0).Max());
        var x = new double[g.NodeCount];
        var y = new double[g.NodeCount];
        double columnGap = ColumnGap * Scale(g), rowGap = RowGap * Scale(g);
        void Place(int c)
        {
            double offset = (tallest - members[c].Count) * rowGap / 2;
            for (int k = 0; k < members[c].Count; k++)
            {
                x[members[c][k]] = Left + c * columnGap;
                y[members[c][k]] = Top + offset + k * rowGap;
            }
        }
        bool hinted = g.NodeCount > 0 && g.Positions.Count == g.NodeCount;
        if (hinted)
            foreach (var m in members)
                m.Sort((a, b) => g.Positions[a].Y != g.Positions[b].Y ? g.Positions[a].Y.CompareTo(g.Positions[b].Y)
                    : g.Positions[a].X != g.Positions[b].X ? g.Positions[a].X.CompareTo(g.Positions[b].X)
                    : NaturalNameOrder.Instance.Compare(g.Names[a], g.Names[b]));
        for (int c = 0; c < count; c++) Place(c);
        if (!hinted)
        {
            var neighbours = Neighbours(g);
            for (int sweep = 0; sweep < 4; sweep++)
            {
                bool forward = sweep % 2 == 0;
                for (int step = 1; step < count; step++)
                {
                    int c = forward ? step : count - 1 - step;
                    var key = new Dictionary<int, double>();
                    foreach (var v in members[c])
                    {
                        var side = neighbours[v].Where(w => forward ? column[w] < c : column[w] > c).ToList();
                        key[v] = side.Count > 0 ? side.Average(w => y[w]) : y[v];
                    }
                    var rank = members[c].Select((v, k) => (v, k)).ToDictionary(p => p.v, p => p.k);
                    members[c].Sort((a, b) => key[a] != key[b] ? key[a].CompareTo(key[b]) : rank[a].CompareTo(rank[b]));
                    Place(c);
                }
            }
        }
        var headings = Enumerable.Range(0, count).Select(c => (Left + c * columnGap, titles[c])).ToList();
        return new FlowPicture { Graph = g, Result = result, Title = title, Arrangement = arrangement, X = x, Y = y, ColumnTitles = headings };
    }

    internal static List<int>[] Neighbours(OpenGraph g)
    {
        var nb = Enumerable.Range(0, g.NodeCount).Select(_ => new List<int>()).ToArray();
        foreach (var e in g.Edges) { nb[e.U].Add(e.V); nb[e.V].Add(e.U); }
        return nb;
    }
}
