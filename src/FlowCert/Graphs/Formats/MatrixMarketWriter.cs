using System.Globalization;
using System.Text;
using FlowCert.Algebra;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// Writes the adjacency matrix of a graph as a symmetric Matrix Market coordinate file (NISTIR 5935):
/// nodes numbered 1..N in natural order of their names, the lower triangle (row &gt; column) sorted by row
/// then column. The field is <c>pattern</c> when every weight is 1, <c>integer</c> when every weight is an
/// integer, else <c>real</c> with exact decimals; a weight without a finite decimal form (1/3) is refused.
/// Comment lines list the node of every number and the inputs and outputs; readers ignore them.
/// </summary>
public static class MatrixMarketWriter
{
    /// <summary>The Matrix Market text of the graph; throws <see cref="GraphFileException"/> on a weight without a finite decimal form.</summary>
    public static string Write(OpenGraph g)
    {
        var order = NaturalNameOrder.Sort(g);
        var number = new int[g.NodeCount];
        for (int k = 0; k < order.Length; k++) number[order[k]] = k + 1;
        var values = new Dictionary<WeightedEdge, string>();
        bool allOne = true, allInteger = true;
        foreach (var e in g.Edges)
        {
            allOne &= e.Weight == Rational.One;
            allInteger &= e.Weight.Denominator.IsOne;
            if (!ExactDecimal.TryFormat(e.Weight, out var text))
                throw new GraphFileException(
                    $"edge {g.Names[e.U]} {g.Names[e.V]} has weight {e.Weight}, which has no finite decimal form: Matrix Market holds decimals, so use .ograph or .json");
            values[e] = text;
        }
        var field = allOne ? "pattern" : allInteger ? "integer" : "real";
        var sb = new StringBuilder();
        sb.Append($"{MatrixMarketReader.Banner} matrix coordinate {field} symmetric\n");
        sb.Append("% flowcert open graph; row and column k is the node named below (comments only: names, inputs and outputs are not read back)\n");
        foreach (var v in order) sb.Append("% ").Append(number[v].ToString(CultureInfo.InvariantCulture)).Append(' ').Append(g.Names[v]).Append('\n');
        sb.Append("% inputs").Append(Numbers(g.Inputs, number)).Append('\n');
        sb.Append("% outputs").Append(Numbers(g.Outputs, number)).Append('\n');
        sb.Append($"{g.NodeCount} {g.NodeCount} {g.Edges.Count}\n");
        var entries = g.Edges.Select(e => (Row: Math.Max(number[e.U], number[e.V]), Col: Math.Min(number[e.U], number[e.V]), Edge: e))
            .OrderBy(x => x.Row).ThenBy(x => x.Col);
        foreach (var (row, col, e) in entries)
        {
            sb.Append(row.ToString(CultureInfo.InvariantCulture)).Append(' ').Append(col.ToString(CultureInfo.InvariantCulture));
            if (!allOne) sb.Append(' ').Append(values[e]);
            sb.Append('\n');
        }
        return sb.ToString();
    }

    private static string Numbers(IEnumerable<int> nodes, int[] number)
        => string.Concat(nodes.Select(v => number[v]).Order().Select(k => " " + k.ToString(CultureInfo.InvariantCulture)));
}
