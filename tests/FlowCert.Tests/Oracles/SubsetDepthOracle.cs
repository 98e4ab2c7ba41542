using Fractions;

namespace FlowCert.Tests.Oracles;

/// <summary>
/// The brute-force minimum depth by dynamic programming over every processed set P (O ⊆ P ⊆ V):
/// depth(V) = 0, depth(P) = min over non-empty R ⊆ correctable(P) of 1 + depth(P ∪ R), and no flow when
/// no choice reaches V. Every schedule is explored, not only the greedy one of flows.md section 5.
/// v is correctable from P when there is c supported on P \ I with (A c)(v) = 1 and (A c)(w) = 0 for
/// every measured w not in P other than v (generalized), or some u in P \ I with A[v][u] != 0 whose
/// measured neighbours other than v all lie in P (causal).
/// </summary>
public static class SubsetDepthOracle
{
    /// <summary>Runs over "Q" or "F" + p; null when a weight has no value in the field.</summary>
    public static OracleAnswer? Analyse(ReferenceGraph g, string field, ReferenceKind kind)
        => field == "Q" ? Analyse(g, FractionArithmetic.Instance, kind)
                        : Analyse(g, new ModularArithmetic(long.Parse(field[1..])), kind);

    public static OracleAnswer? Analyse<T>(ReferenceGraph g, IReferenceArithmetic<T> f, ReferenceKind kind)
    {
        var a = g.Matrix(f);
        if (a is null) return null;
        var measured = g.Measured;
        int m = measured.Length;
        if (m > 20) throw new ArgumentException("the subset oracle is exponential: at most 20 measured nodes");
        int full = (1 << m) - 1;
        var memo = new int[1 << m]; // 0 = unknown, else depth + 1; int.MaxValue = no flow
        int Depth(int mask)
        {
            if (mask == full) return 0;
            if (memo[mask] != 0) return memo[mask] == int.MaxValue ? int.MaxValue : memo[mask] - 1;
            int correctable = Correctable(f, a, g, kind, measured, mask);
            int best = int.MaxValue;
            // every non-empty subset R of the correctable set
            for (int r = correctable; r != 0; r = (r - 1) & correctable)
            {
                int d = Depth(mask | r);
                if (d != int.MaxValue && d + 1 < best) best = d + 1;
            }
            memo[mask] = best == int.MaxValue ? int.MaxValue : best + 1;
            return best;
        }
        int depth = Depth(0);
        return depth == int.MaxValue ? OracleAnswer.None : new OracleAnswer(true, depth);
    }

    /// <summary>The correctable unprocessed measured nodes as a bit mask over <paramref name="measured"/>.</summary>
    private static int Correctable<T>(IReferenceArithmetic<T> f, T[][] a, ReferenceGraph g, ReferenceKind kind, int[] measured, int mask)
    {
        int n = g.Count;
        var processed = new bool[n];
        foreach (var o in g.Outputs) processed[o] = true;
        for (int i = 0; i < measured.Length; i++) if ((mask >> i & 1) != 0) processed[measured[i]] = true;
        var unprocessed = Enumerable.Range(0, measured.Length).Where(i => (mask >> i & 1) == 0).ToArray();
        int result = 0;
        if (kind == ReferenceKind.Causal)
        {
            foreach (var i in unprocessed)
                if (CorrectionRule.CanCorrect(f, a, g, kind, measured[i], u => processed[u])) result |= 1 << i;
            return result;
        }
        // generalized: one elimination of A[U, P \ I] answers every v in U at once
        var columns = Enumerable.Range(0, n).Where(u => processed[u] && !g.Inputs.Contains(u)).ToArray();
        var b = unprocessed.Select(i => columns.Select(c => a[measured[i]][c]).ToArray()).ToArray();
        var ok = ReferenceElimination.UnitRowsSolvable(f, b, columns.Length);
        for (int k = 0; k < unprocessed.Length; k++) if (ok[k]) result |= 1 << unprocessed[k];
        return result;
    }
}
