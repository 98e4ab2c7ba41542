using FlowCert.Algebra;

namespace FlowCert.Schedules;

/// <summary>
/// Re-tests the three conditions of a generalized flow (flows.md section 3) on parsed correction vectors.
/// A schedule is refused when any fails; the simulator runs anyway, to show what goes wrong.
/// </summary>
internal static class FlowConditionCheck
{
    /// <summary>One sentence per violated condition, in measurement order; empty for a valid flow.</summary>
    public static IReadOnlyList<string> Violations<T, TField>(CorrectionSystem<T, TField> s)
        where T : struct where TField : struct, IField<T>
    {
        var f = s.Graph.Field;
        var g = s.Graph.Graph;
        var problems = new List<string>();
        foreach (var v in s.Order)
        {
            var c = s.Correction[v];
            for (int k = 0; k < c.Count; k++)
            {
                int u = c.Indices[k];
                if (g.Inputs.Contains(u)) problems.Add($"correction of {g.Names[v]} acts on input {g.Names[u]} (condition 1)");
                else if (!s.IsLater(u, v)) problems.Add($"correction of {g.Names[v]} acts on {g.Names[u]}, which is not later (condition 1)");
            }
            var image = s.Image[v];
            var own = image.Get(f, v);
            if (!f.AreEqual(own, f.One))
                problems.Add($"correction of {g.Names[v]} gives (A c)({g.Names[v]}) = {f.Format(own)}, not 1 (condition 2)");
            for (int k = 0; k < image.Count; k++)
            {
                int w = image.Indices[k];
                if (w != v && !g.Outputs.Contains(w) && !s.IsLater(w, v))
                    problems.Add($"correction of {g.Names[v]} gives (A c)({g.Names[w]}) = {f.Format(image.Values[k])} on a node that is not later (condition 3)");
            }
        }
        return problems;
    }
}
