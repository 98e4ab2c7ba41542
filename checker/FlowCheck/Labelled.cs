namespace FlowCheck;

/// <summary>Measurement labels over F2 (flows.md section 9; Certificate.cs says which certificates may carry them): the
/// conditions of generalized flow with planes (9.2) and Pauli flow (9.3) on one correction set, and the
/// per-node witnesses of a proof of absence (9.5, the systems of docs/algorithms.md).</summary>
public static class Labelled
{
    /// <summary>P1-P9 of flows.md 9.3 (with plane labels only they are G1-G3 of 9.2), for v and its set p;
    /// Odd(p) is the set of nodes with an odd number of neighbours in p (weights non-zero in F2).</summary>
    public static void CheckCorrection(FieldGraph g, int v, HashSet<int> p, Func<int, bool> later, string who)
    {
        var odd = p.SelectMany(u => g.Neighbours(u)).GroupBy(e => e.Node).Where(e => e.Count() % 2 == 1).Select(e => e.Key).ToHashSet();
        var name = g.Name(v);
        foreach (var w in Enumerable.Range(0, g.Count).Where(w => w != v && !g.IsOutput(w) && !later(w)))
        {
            var l = g.Graph.Label(w);
            if (p.Contains(w) && l is not ("X" or "Y")) throw new InvalidCertificate($"{who}: {g.Name(w)} (labelled {l}) is in p_{name} but not later");
            if (odd.Contains(w) && l is not ("Y" or "Z")) throw new InvalidCertificate($"{who}: {g.Name(w)} (labelled {l}) is in Odd(p_{name}) but not later");
            if (l == "Y" && p.Contains(w) != odd.Contains(w)) throw new InvalidCertificate($"{who}: {g.Name(w)} is labelled Y and not later, but is in only one of p_{name} and Odd(p_{name})");
        }
        var (lv, inP, inOdd) = (g.Graph.Label(v), p.Contains(v), odd.Contains(v));
        if (!(lv switch { "XY" => !inP && inOdd, "XZ" => inP && inOdd, "YZ" => inP && !inOdd, "X" => inOdd, "Z" => inP, _ => inP != inOdd })) throw new InvalidCertificate($"{who}: labelled {lv}, but {name} in p_{name} is {inP} and {name} in Odd(p_{name}) is {inOdd}");
    }

    /// <summary>Flows.md 9.5: for each v in U, y_v (rows of v's system, and its self row) has y^T M_v = 0 and y^T b_v = 1.</summary>
    public static void CheckWitnesses(FieldGraph g, Json json, List<int> blocked, bool[] u)
    {
        var seen = new bool[g.Count];
        foreach (var key in json.At("obstruction", "witnesses", "obstruction.witnesses").NodeMap("obstruction.witnesses"))
        {
            var v = g.Graph.Index.TryGetValue(key, out var x) && u[x] ? x : throw new InvalidCertificate($"obstruction.witnesses: {Json.Cut(key)} is not in the blocked set");
            var (what, rows, self) = ($"obstruction.witnesses.{key}", (List<string>?)null, (bool?)null);
            foreach (var k in json.Members(what))
                if (k == "rows") rows = json.Strings($"{what}.rows");
                else if (k == "self") self = json.Boolean($"{what}.self");
                else throw new InvalidCertificate($"unknown key \"{Json.Cut(k)}\" in {what}");
            if (rows is null || self is null) throw new InvalidCertificate($"missing {what}.{(rows is null ? "rows" : "self")}");
            Json.SortedUnique(rows, $"{what}.rows");
            var (lv, odd, rhs) = (g.Graph.Label(v), new bool[g.Count], self.Value); // odd[c]: y^T M at column c, in F2
            var hasSelfRow = lv is "XZ" or "YZ" or "Z";
            if (rhs) odd[v] = hasSelfRow ? true : throw new InvalidCertificate($"{what}: {key} is labelled {lv} and has no self row");
            foreach (var row in rows)
            {
                if (!g.Graph.Index.TryGetValue(row, out var r) || !u[r] || g.Graph.Label(r) == "Z") throw new InvalidCertificate($"{what}: {Json.Cut(row)} has no row in the system of {key}");
                foreach (var (c, _) in g.Neighbours(r)) odd[c] = !odd[c];
                if (g.Graph.Label(r) == "Y") odd[r] = !odd[r];
                if (r == v && lv != "YZ") rhs = !rhs;
            }
            for (var c = 0; c < g.Count; c++)
                if (odd[c] && !g.IsInput(c) && (!u[c] || g.Graph.Label(c) is "X" or "Y" || (c == v && hasSelfRow)))
                    throw new InvalidCertificate($"{what}: (y^T M)({g.Name(c)}) = 1 for unknown p({g.Name(c)}), not 0");
            if (!rhs) throw new InvalidCertificate($"{what}: y^T b = 0, not 1");
            seen[v] = true;
        }
        foreach (var v in blocked.Where(v => !seen[v])) throw new InvalidCertificate($"blocked node {g.Name(v)} has no witness");
    }
}
