namespace FlowCert.Tests.Oracles;

/// <summary>
/// When can measured node v be corrected, given which nodes are "later" than v? Straight from
/// flows.md: generalized (section 3) needs c supported on later non-inputs with (A c)(v) = 1 and
/// (A c)(w) = 0 for every measured w != v that is not later; causal (section 4) needs one later
/// non-input u with A[v][u] != 0 whose measured neighbours other than v are all later.
/// </summary>
public static class CorrectionRule
{
    public static bool CanCorrect<T>(IReferenceArithmetic<T> f, T[][] a, ReferenceGraph g, ReferenceKind kind, int v, Func<int, bool> later)
    {
        int n = g.Count;
        if (kind == ReferenceKind.Causal)
        {
            for (int u = 0; u < n; u++)
            {
                if (g.Inputs.Contains(u) || !later(u) || f.IsZero(a[v][u])) continue;
                bool ok = true;
                for (int w = 0; w < n && ok; w++)
                    if (w != v && !g.Outputs.Contains(w) && !f.IsZero(a[u][w]) && !later(w)) ok = false;
                if (ok) return true;
            }
            return false;
        }
        var columns = Enumerable.Range(0, n).Where(u => !g.Inputs.Contains(u) && later(u)).ToArray();
        var rows = new List<int> { v };
        for (int w = 0; w < n; w++)
            if (w != v && !g.Outputs.Contains(w) && !later(w)) rows.Add(w);
        var b = rows.Select(r => columns.Select(c => a[r][c]).ToArray()).ToArray();
        return ReferenceElimination.UnitRowsSolvable(f, b, columns.Length)[0];
    }
}
