namespace FlowCert.Tests.Oracles;

/// <summary>
/// The most literal reference: every assignment of the measured nodes to rounds 1..k with every round
/// non-empty (every ordered set partition), checked against flows.md section 3 or 4 node by node.
/// The minimum k over valid schedules is the minimum depth. Exponential (Fubini numbers): for at most
/// 6 measured nodes; used to cross-check <see cref="SubsetDepthOracle"/>.
/// </summary>
public static class ScheduleEnumerationOracle
{
    public static OracleAnswer? Analyse(ReferenceGraph g, string field, ReferenceKind kind)
        => field == "Q" ? Analyse(g, FractionArithmetic.Instance, kind)
                        : Analyse(g, new ModularArithmetic(long.Parse(field[1..])), kind);

    public static OracleAnswer? Analyse<T>(ReferenceGraph g, IReferenceArithmetic<T> f, ReferenceKind kind)
    {
        var a = g.Matrix(f);
        if (a is null) return null;
        var measured = g.Measured;
        int m = measured.Length;
        if (m > 6) throw new ArgumentException("schedule enumeration is for at most 6 measured nodes");
        if (m == 0) return new OracleAnswer(true, 0);
        var round = new int[g.Count]; // 0 for outputs
        var assignment = new int[m];
        int best = int.MaxValue;
        // every map measured -> 1..m; keep those whose image is exactly 1..k
        int total = (int)Math.Pow(m, m);
        for (int code = 0; code < total; code++)
        {
            int x = code, k = 0, used = 0;
            for (int i = 0; i < m; i++) { assignment[i] = x % m + 1; x /= m; k = Math.Max(k, assignment[i]); used |= 1 << assignment[i]; }
            if (used != ((1 << (k + 1)) - 2) || k >= best) continue; // some round in 1..k empty, or no improvement
            for (int i = 0; i < m; i++) round[measured[i]] = assignment[i];
            if (IsFlow(f, a, g, kind, measured, round)) best = k;
        }
        return best == int.MaxValue ? OracleAnswer.None : new OracleAnswer(true, best);
    }

    /// <summary>Checks section 3 (or 4) for every measured node under the given rounds.</summary>
    public static bool IsFlow<T>(IReferenceArithmetic<T> f, T[][] a, ReferenceGraph g, ReferenceKind kind, int[] measured, int[] round)
    {
        foreach (var v in measured)
        {
            bool Later(int u) => g.Outputs.Contains(u) || round[u] > round[v];
            if (!CorrectionRule.CanCorrect(f, a, g, kind, v, Later)) return false;
        }
        return true;
    }
}
