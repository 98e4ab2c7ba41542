namespace FlowCert.Graphs;

/// <summary>
/// Orders node names the way a reader counts: runs of digits compare by their value, everything else by
/// character code, so <c>v2</c> comes before <c>v10</c> and <c>r2c9</c> before <c>r2c10</c>. Names that tie
/// (<c>a01</c> and <c>a1</c>) fall back to ordinal order, so the order is total and the same everywhere.
/// Used to number nodes in formats that have numbers instead of names (graph6, sparse6, Matrix Market)
/// and to stack nodes in pictures.
/// </summary>
public sealed class NaturalNameOrder : IComparer<string>
{
    /// <summary>The one instance.</summary>
    public static readonly NaturalNameOrder Instance = new();

    private NaturalNameOrder() { }

    /// <summary>Compares two names in natural order (null first).</summary>
    public int Compare(string? x, string? y)
    {
        if (ReferenceEquals(x, y)) return 0;
        if (x is null) return -1;
        if (y is null) return 1;
        int i = 0, j = 0;
        while (i < x.Length && j < y.Length)
        {
            if (char.IsAsciiDigit(x[i]) && char.IsAsciiDigit(y[j]))
            {
                int si = i, sj = j;
                while (i < x.Length && char.IsAsciiDigit(x[i])) i++;
                while (j < y.Length && char.IsAsciiDigit(y[j])) j++;
                var a = x.AsSpan(si, i - si).TrimStart('0');
                var b = y.AsSpan(sj, j - sj).TrimStart('0');
                if (a.Length != b.Length) return a.Length.CompareTo(b.Length);
                int c = a.SequenceCompareTo(b);
                if (c != 0) return c;
            }
            else
            {
                if (x[i] != y[j]) return x[i].CompareTo(y[j]);
                i++; j++;
            }
        }
        if (i < x.Length || j < y.Length) return (x.Length - i).CompareTo(y.Length - j);
        return string.CompareOrdinal(x, y);
    }

    /// <summary>The node indices of a graph in natural order of their names.</summary>
    public static int[] Sort(OpenGraph g)
    {
        var order = Enumerable.Range(0, g.NodeCount).ToArray();
        Array.Sort(order, (a, b) => Instance.Compare(g.Names[a], g.Names[b]));
        return order;
    }
}
