using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Schedules;

/// <summary>
/// Re-tests the conditions of flows.md 9.3 (which are those of 9.2 when every label is a plane) on the
/// parsed correction sets of a labelled certificate over F_2.
/// </summary>
internal static class LabelledConditionCheck
{
    /// <summary>One sentence per violated condition, in measurement order; empty for a valid flow.</summary>
    public static IReadOnlyList<string> Violations<T, TField>(CorrectionSystem<T, TField> s)
        where T : struct where TField : struct, IField<T>
    {
        var g = s.Graph.Graph;
        if (s.Graph.Spec.Prime != 2) throw new ScheduleException(LabelRules.QubitsOnly);
        var problems = new List<string>();
        foreach (var v in s.Order)
        {
            var p = s.Correction[v].Indices.ToHashSet();
            var odd = s.Image[v].Indices.ToHashSet();
            string N(int x) => g.Names[x];
            foreach (var u in p.Where(g.Inputs.Contains).Order()) problems.Add($"correction of {N(v)} acts on input {N(u)}");
            foreach (var w in s.Order.Where(w => w != v && !s.IsLater(w, v)))
            {
                var l = g.Label(w);
                if (p.Contains(w) && l is not (MeasurementLabel.X or MeasurementLabel.Y))
                    problems.Add($"correction of {N(v)} acts on {N(w)} ({MeasurementLabels.Name(l)}), which is not later (P1)");
                if (odd.Contains(w) && l is not (MeasurementLabel.Y or MeasurementLabel.Z))
                    problems.Add($"correction of {N(v)} has {N(w)} ({MeasurementLabels.Name(l)}) in its odd neighbourhood, which is not later (P2)");
                if (l == MeasurementLabel.Y && p.Contains(w) != odd.Contains(w))
                    problems.Add($"correction of {N(v)} has the Y node {N(w)} in only one of the set and its odd neighbourhood (P3)");
            }
            bool inP = p.Contains(v), inOdd = odd.Contains(v);
            bool ok = g.Label(v) switch
            {
                MeasurementLabel.XY => !inP && inOdd,
                MeasurementLabel.XZ => inP && inOdd,
                MeasurementLabel.YZ => inP && !inOdd,
                MeasurementLabel.X => inOdd,
                MeasurementLabel.Z => inP,
                _ => inP != inOdd,
            };
            if (!ok) problems.Add($"correction of {N(v)} does not meet its own {MeasurementLabels.Name(g.Label(v))} condition (P4-P9)");
        }
        return problems;
    }
}
