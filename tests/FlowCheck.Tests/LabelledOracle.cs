using Newtonsoft.Json.Linq;

namespace FlowCheck.Tests;

/// <summary>A naive judge of the mathematics of version-2 certificates, written in the tests from
/// docs/flows.md section 9 and docs/formats.md alone (it shares no code with the checker): dense 0/1
/// adjacency by node index, the conditions of 9.2 and 9.3 quantified over every node, and the system of
/// 9.4 built as a full matrix with a row per equation and a column per unknown, y^T M and y^T b computed
/// entry by entry. It assumes the header and graph block are well formed (the corruptions it judges
/// leave them so, or only rehash them); the hand-written tests cover the shape rules.</summary>
public static class LabelledOracle
{
    public static string? Reason(JObject c)
    {
        var g = (JObject)c["graph"]!;
        var nodes = g["nodes"]!.Select(t => (string)t!).ToList();
        int n = nodes.Count;
        var inputs = g["inputs"]!.Select(t => (string)t!).ToHashSet();
        var outputs = g["outputs"]!.Select(t => (string)t!).ToHashSet();
        var label = nodes.ToDictionary(v => v, _ => "XY");
        if (g["labels"] is JObject labels)
            foreach (var p in labels.Properties())
            {
                if (!label.ContainsKey(p.Name) || outputs.Contains(p.Name)) return "label on a node that is not measured";
                if ((string)p.Value! is not ("XZ" or "YZ" or "X" or "Y" or "Z")) return "bad label";
                label[p.Name] = (string)p.Value!;
            }
        var flow = (string)c["flow"]!;
        bool labelled = label.Values.Any(l => l != "XY") || flow == "pauli";
        if (!labelled || (int)c["version"]! != 2) return "version 2 is for labels or pauli";
        if ((string)c["field"]! != "F2" || flow is not ("general" or "pauli")) return "field or flow";
        if (flow == "general" && label.Values.Any(l => l is "X" or "Y" or "Z")) return "Pauli label under general flow";
        var A = new bool[n, n];
        foreach (var e in g["edges"]!)
        {
            var t = e.Select(x => (string)x!).ToList();
            var w = t[2].Split('/');
            if (System.Numerics.BigInteger.Parse(w[0]).IsEven) continue; // an even weight vanishes in F2
            A[nodes.IndexOf(t[0]), nodes.IndexOf(t[1])] = A[nodes.IndexOf(t[1]), nodes.IndexOf(t[0])] = true;
        }
        var measured = nodes.Where(v => !outputs.Contains(v)).ToList();
        bool[] Odd(HashSet<string> p)
        {
            var odd = new bool[n];
            for (int i = 0; i < n; i++) for (int j = 0; j < n; j++) if (p.Contains(nodes[j]) && A[i, j]) odd[i] = !odd[i];
            return odd;
        }
        if ((string)c["verdict"]! == "flow")
        {
            var round = new Dictionary<string, int>();
            var rounds = (JArray)c["rounds"]!;
            for (int k = 0; k < rounds.Count; k++)
            {
                var list = rounds[k].Select(t => (string)t!).ToList();
                if (list.Count == 0 || !list.SequenceEqual(list.Order(StringComparer.Ordinal).Distinct())) return "round not sorted or empty";
                foreach (var v in list) if (!measured.Contains(v) || !round.TryAdd(v, k + 1)) return "round node";
            }
            if (round.Count != measured.Count || (int)c["depth"]! != rounds.Count) return "rounds or depth";
            bool Later(string w, string v) => outputs.Contains(w) || round[w] > round[v];
            var corrections = (JObject)c["corrections"]!;
            if (corrections.Properties().Count() != measured.Count) return "corrections keys";
            foreach (var v in measured)
            {
                if (corrections[v] is not JObject entries) return $"no correction for {v}";
                var keys = entries.Properties().Select(p => p.Name).ToList();
                if (!keys.SequenceEqual(keys.Order(StringComparer.Ordinal))) return "correction keys not sorted";
                if (entries.Properties().Any(p => (string)p.Value! != "1" || !nodes.Contains(p.Name) || inputs.Contains(p.Name))) return $"entry of {v}";
                var p = keys.ToHashSet();
                var odd = Odd(p);
                foreach (var w in measured.Where(w => w != v && !Later(w, v)))
                {
                    bool inP = p.Contains(w), inOdd = odd[nodes.IndexOf(w)];
                    if (inP && label[w] is not ("X" or "Y")) return $"P1 at {v}";
                    if (inOdd && label[w] is not ("Y" or "Z")) return $"P2 at {v}";
                    if (label[w] == "Y" && inP != inOdd) return $"P3 at {v}";
                }
                bool a = p.Contains(v), b = odd[nodes.IndexOf(v)];
                bool ok = label[v] switch { "XY" => !a && b, "XZ" => a && b, "YZ" => a && !b, "X" => b, "Z" => a, _ => a != b };
                if (!ok) return $"P4-P9 at {v}";
            }
            return null;
        }
        var ob = (JObject)c["obstruction"]!;
        var blocked = ob["blocked"]!.Select(t => (string)t!).ToList();
        if (blocked.Count == 0 || !blocked.SequenceEqual(blocked.Order(StringComparer.Ordinal).Distinct()) || blocked.Any(v => !measured.Contains(v))) return "blocked";
        if (ob["witnesses"] is not JObject witnesses || witnesses.Properties().Any(p => !blocked.Contains(p.Name))) return "witnesses keys";
        foreach (var v in blocked)
        {
            if (witnesses[v] is not JObject y) return $"no witness for {v}";
            var chosen = y["rows"]!.Select(t => (string)t!).ToList();
            if (!chosen.SequenceEqual(chosen.Order(StringComparer.Ordinal).Distinct())) return "rows not sorted";
            // The system of 9.4 with P = V \ U: equations by name, unknowns by node.
            var unknowns = nodes.Where(u => !inputs.Contains(u) && (!blocked.Contains(u) || label[u] is "X" or "Y"
                || (u == v && label[v] is "XZ" or "YZ" or "Z"))).ToList();
            var rows = new List<(string Name, bool[] M, bool B)>();
            foreach (var u in blocked.Where(u => label[u] != "Z"))
            {
                var m = unknowns.Select(x => A[nodes.IndexOf(u), nodes.IndexOf(x)] ^ (x == u && label[u] == "Y")).ToArray();
                rows.Add((u, m, u == v && label[v] != "YZ"));
            }
            if (label[v] is "XZ" or "YZ" or "Z") rows.Add(("self", unknowns.Select(x => x == v).ToArray(), true));
            var picked = chosen.ToList();
            if ((bool)y["self"]!) picked.Add("self");
            if (picked.Any(r => !rows.Any(x => x.Name == r))) return $"witness of {v} names a row that does not exist";
            for (int k = 0; k < unknowns.Count; k++)
                if (rows.Where(r => picked.Contains(r.Name)).Count(r => r.M[k]) % 2 != 0) return $"y^T M != 0 for {v}";
            if (rows.Where(r => picked.Contains(r.Name)).Count(r => r.B) % 2 != 1) return $"y^T b != 1 for {v}";
        }
        return null;
    }
}
