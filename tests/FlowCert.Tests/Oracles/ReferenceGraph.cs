using System.Numerics;
using System.Text;
using FlowCert.Graphs;

namespace FlowCert.Tests.Oracles;

/// <summary>
/// An open graph as the oracles see it: names, exact rational weights (numerator, denominator),
/// inputs and outputs. Built from the solver's <see cref="OpenGraph"/> only as plain data.
/// </summary>
public sealed record ReferenceGraph(
    IReadOnlyList<string> Names,
    IReadOnlyList<(int U, int V, BigInteger Num, BigInteger Den)> Edges,
    IReadOnlySet<int> Inputs,
    IReadOnlySet<int> Outputs)
{
    public int Count => Names.Count;

    public static ReferenceGraph From(OpenGraph g)
        => new(g.Names.ToArray(),
               g.Edges.Select(e => (e.U, e.V, e.Weight.Numerator, e.Weight.Denominator)).ToArray(),
               g.Inputs.ToHashSet(), g.Outputs.ToHashSet());

    /// <summary>Measured nodes M = V \ O, in index order.</summary>
    public int[] Measured => Enumerable.Range(0, Count).Where(v => !Outputs.Contains(v)).ToArray();

    /// <summary>The weight matrix in the field, or null when a weight has no value there.</summary>
    public T[][]? Matrix<T>(IReferenceArithmetic<T> f)
    {
        var a = new T[Count][];
        for (int i = 0; i < Count; i++) { a[i] = new T[Count]; Array.Fill(a[i], f.Zero); }
        foreach (var (u, v, num, den) in Edges)
        {
            if (!f.TryFromRational(num, den, out var w)) return null;
            a[u][v] = w; a[v][u] = w;
        }
        return a;
    }

    /// <summary>The graph as <c>.ograph</c> text (for failure messages and data files).</summary>
    public string ToOgraph()
    {
        var sb = new StringBuilder();
        sb.Append("input");
        foreach (var i in Inputs.Order()) sb.Append(' ').Append(Names[i]);
        sb.Append("\noutput");
        foreach (var o in Outputs.Order()) sb.Append(' ').Append(Names[o]);
        sb.Append('\n');
        var touched = new HashSet<int>();
        foreach (var (u, v, num, den) in Edges)
        {
            touched.Add(u); touched.Add(v);
            sb.Append($"edge {Names[u]} {Names[v]} {num}{(den.IsOne ? "" : "/" + den)}\n");
        }
        for (int v = 0; v < Count; v++) if (!touched.Contains(v)) sb.Append($"node {Names[v]}\n");
        return sb.ToString();
    }
}
