using Newtonsoft.Json.Linq;

namespace FlowCheck;

/// <summary>Measurement labels over F2 (flows.md section 9): which certificates may carry them, the
/// conditions of generalized flow with planes (9.2) and Pauli flow (9.3) on one correction set, and the
/// per-node witnesses of a proof of absence (9.5, the systems of docs/algorithms.md).</summary>
public static class Labelled
{
    static readonly string[] Pauli = ["X", "Y", "Z"];

    public static void CheckHeader(OpenGraph graph, Field field, string flow)
    {
        if (field.Name != "F2") throw new InvalidCertificate($"{flow} flow with labels over {field.Name}: labels and Pauli flow are defined for F2 only");
        if (flow == "causal") throw new InvalidCertificate("causal flow with labels: causal flow is XY-only");
        foreach (var (v, l) in graph.Labels.Where(kv => flow == "general" && Pauli.Contains(kv.Value)))
            throw new InvalidCertificate($"general flow with {v} labelled {l}: generalized flow takes the planes XY, XZ, YZ only");
    }

    /// <summary>Odd(p): the nodes with an odd number of neighbours in p (weights non-zero in F2).</summary>
    static HashSet<string> Odd(FieldGraph g, IEnumerable<string> p)
    {
        var odd = new HashSet<string>();
        foreach (var u in p)
            foreach (var w in g.Adjacent[u].Keys)
                if (!odd.Add(w)) odd.Remove(w);
        return odd;
    }

    /// <summary>P1-P9 of flows.md 9.3 (with plane labels only they are G1-G3 of 9.2), for v and its set p.</summary>
    public static void CheckCorrection(FieldGraph g, OpenGraph graph, string v, HashSet<string> p, Func<string, bool> later, string who)
    {
        var odd = Odd(g, p);
        foreach (var w in g.Nodes.Order(StringComparer.Ordinal).Where(w => w != v && g.IsMeasured(w) && !later(w)))
        {
            var l = graph.Label(w);
            if (p.Contains(w) && l is not ("X" or "Y")) throw new InvalidCertificate($"{who}: {w} (labelled {l}) is in p_{v} but not later");
            if (odd.Contains(w) && l is not ("Y" or "Z")) throw new InvalidCertificate($"{who}: {w} (labelled {l}) is in Odd(p_{v}) but not later");
            if (l == "Y" && p.Contains(w) != odd.Contains(w))
                throw new InvalidCertificate($"{who}: {w} is labelled Y and not later, but is in only one of p_{v} and Odd(p_{v})");
        }
        bool inP = p.Contains(v), inOdd = odd.Contains(v);
        var ok = graph.Label(v) switch
        {
            "XY" => !inP && inOdd,
            "XZ" => inP && inOdd,
            "YZ" => inP && !inOdd,
            "X" => inOdd,
            "Z" => inP,
            _ => inP != inOdd,
        };
        if (!ok) throw new InvalidCertificate($"{who}: labelled {graph.Label(v)}, but {v} in p_{v} is {inP} and {v} in Odd(p_{v}) is {inOdd}");
    }

    /// <summary>Flows.md 9.5: for each v in U, y_v (rows of v's system) has y^T M_v = 0 and y^T b_v = 1.</summary>
    public static void CheckWitnesses(FieldGraph g, OpenGraph graph, JObject witnesses, List<string> blocked, HashSet<string> u)
    {
        foreach (var p in witnesses.Properties().Where(p => !u.Contains(p.Name)))
            throw new InvalidCertificate($"obstruction.witnesses: {p.Name} is not in the blocked set");
        foreach (var v in blocked)
        {
            var what = $"obstruction.witnesses.{v}";
            var y = Json.Object(witnesses[v] ?? throw new InvalidCertificate($"blocked node {v} has no witness"), what, "rows", "self");
            var rows = Json.Strings(y["rows"], $"{what}.rows");
            Json.SortedUnique(rows, $"{what}.rows");
            var self = y["self"]?.Type == JTokenType.Boolean ? (bool)y["self"]! : throw new InvalidCertificate($"{what}.self must be true or false");
            string lv = graph.Label(v);
            bool hasSelfRow = lv is "XZ" or "YZ" or "Z";
            if (self && !hasSelfRow) throw new InvalidCertificate($"{what}: {v} is labelled {lv} and has no self row");
            // Column c sums the coefficients of the chosen rows; the right-hand side sums their b.
            var sum = new Dictionary<string, int>();
            bool rhs = self;
            if (self) sum[v] = 1;
            foreach (var r in rows)
            {
                if (!u.Contains(r) || graph.Label(r) == "Z") throw new InvalidCertificate($"{what}: {r} has no row in the system of {v}");
                foreach (var c in g.Adjacent[r].Keys) sum[c] = sum.GetValueOrDefault(c) + 1;
                if (graph.Label(r) == "Y") sum[r] = sum.GetValueOrDefault(r) + 1;
                if (r == v && lv != "YZ") rhs = !rhs;
            }
            bool IsColumn(string c) => !g.Inputs.Contains(c)
                && (!u.Contains(c) || graph.Label(c) is "X" or "Y" || (c == v && hasSelfRow));
            foreach (var c in sum.Keys.Order(StringComparer.Ordinal).Where(c => IsColumn(c) && sum[c] % 2 != 0))
                throw new InvalidCertificate($"{what}: (y^T M)({c}) = 1 for unknown p({c}), not 0");
            if (!rhs) throw new InvalidCertificate($"{what}: y^T b = 0, not 1");
        }
    }
}
