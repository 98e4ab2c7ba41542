using FlowCert.Algebra;

namespace FlowCert.Graphs.Families;

/// <summary>
/// Random graphs on nodes <c>v0</c>..<c>v{n-1}</c> drawn from a <see cref="SplitMix64"/> stream. Inputs
/// are the first nodes and outputs the last ones (the models treat all nodes alike, so which nodes play
/// these roles does not change the distribution). No positions: drawings lay them out from the inputs.
/// </summary>
internal static class RandomGraphs
{
    internal static string Name(int v) => NumberedNames.Name(v);

    /// <summary>
    /// The binomial random graph G(n, q), with independent edges (common practice): every pair {u, v},
    /// u &lt; v, taken in order of v then u, is an edge with probability exactly q.
    /// </summary>
    public static GraphDraft Binomial(int n, Rational q, SplitMix64 rng)
    {
        var d = Nodes("random", n);
        for (int v = 1; v < n; v++)
            for (int u = 0; u < v; u++)
                if (rng.NextBernoulli(q)) d.Edge(Name(u), Name(v), "");
        return d;
    }

    /// <summary>
    /// A random d-regular graph by the pairing method of "Generating random regular graphs quickly"
    /// (Combinatorics, Probability and Computing 8, 1999; doi:10.1017/S0963548399003867, identifier from
    /// memory): n d points, d per node; repeatedly draw two unpaired points uniformly and pair them unless
    /// that makes a loop or a repeated edge; start again if no allowed pair is left.
    /// </summary>
    public static GraphDraft Regular(int n, int degree, SplitMix64 rng)
    {
        const int Attempts = 1000;
        for (int attempt = 0; attempt < Attempts; attempt++)
        {
            var pairs = TryPairing(n, degree, rng);
            if (pairs is null) continue;
            var d = Nodes("regular", n);
            foreach (var (u, v) in pairs) d.Edge(Name(u), Name(v), "");
            return d;
        }
        throw new FamilyParameterException($"no {degree}-regular graph on {n} nodes found in {Attempts} attempts: try a smaller degree");
    }

    private static List<(int, int)>? TryPairing(int n, int degree, SplitMix64 rng)
    {
        var points = new List<int>(n * degree);
        for (int v = 0; v < n; v++)
            for (int k = 0; k < degree; k++) points.Add(v);
        var edges = new HashSet<(int, int)>();
        var result = new List<(int, int)>();
        int failures = 0;
        while (points.Count > 0)
        {
            int i = (int)rng.NextBelow((ulong)points.Count), j = (int)rng.NextBelow((ulong)points.Count);
            int u = Math.Min(points[i], points[j]), v = Math.Max(points[i], points[j]);
            if (i == j || u == v || edges.Contains((u, v)))
            {
                // After many refusals in a row, check whether any allowed pair is left; if none, this attempt is stuck.
                if (++failures >= 64 + points.Count)
                {
                    if (!AnyAllowedPair(points, edges)) return null;
                    failures = 0;
                }
                continue;
            }
            failures = 0;
            edges.Add((u, v));
            result.Add((u, v));
            RemoveAt(points, Math.Max(i, j));
            RemoveAt(points, Math.Min(i, j));
        }
        return result;
    }

    private static bool AnyAllowedPair(List<int> points, HashSet<(int, int)> edges)
    {
        var distinct = points.Distinct().Order().ToArray();
        for (int a = 0; a < distinct.Length; a++)
            for (int b = a + 1; b < distinct.Length; b++)
                if (!edges.Contains((distinct[a], distinct[b]))) return true;
        return false;
    }

    /// <summary>Removes an element by moving the last one into its place.</summary>
    private static void RemoveAt(List<int> list, int index)
    {
        list[index] = list[^1];
        list.RemoveAt(list.Count - 1);
    }

    private static GraphDraft Nodes(string family, int n)
    {
        var d = new GraphDraft(family, []);
        for (int v = 0; v < n; v++) d.Node(Name(v));
        return d;
    }
}
