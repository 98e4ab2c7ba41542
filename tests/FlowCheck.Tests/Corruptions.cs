using Newtonsoft.Json.Linq;

namespace FlowCheck.Tests;

/// <summary>Ways to spoil a certificate. Each takes a copy of a valid certificate and a random source and
/// returns the changed JSON object (or null when it does not apply to that certificate). Object-level
/// corruptions recompute graphSha256 unless the point is the hash, so that the mathematics is what
/// fails; text-level corruptions spoil the bytes.</summary>
public static class Corruptions
{
    public delegate JObject? ObjectCorruption(JObject cert, Random rng);
    public delegate string? TextCorruption(string text, Random rng);

    public static readonly (string Name, ObjectCorruption Apply)[] OnObjects =
    [
        ("change a coefficient", ChangeCoefficient),
        ("drop an entry", DropEntry),
        ("add an entry anywhere", (c, r) => AddEntry(c, r, _ => true)),
        ("put an input in a support", (c, r) => AddEntry(c, r, (n, v) => Names(c, "inputs").Contains(n))),
        ("put an earlier node in a support", (c, r) => AddEntry(c, r, (n, v) => Round(c, n) is { } rn && rn <= Round(c, v)!.Value)),
        ("move a node to another round", MoveToRound),
        ("drop a node from its round", DropFromRound),
        ("duplicate a node in another round", DuplicateInRound),
        ("swap two rounds", SwapRounds),
        ("change the depth", (c, r) => c["depth"] is null ? null : Set(c, "depth", (int)c["depth"]! + (r.Next(2) == 0 ? 1 : -1))),
        ("drop a correction vector", DropCorrection),
        ("swap the verdict with a made-up proof", SwapVerdict),
        ("swap only the verdict string", (c, _) => Set(c, "verdict", (string)c["verdict"]! == "flow" ? "noflow" : "flow")),
        ("swap the flow kind", (c, _) => Set(c, "flow", (string)c["flow"]! == "causal" ? "general" : "causal")),
        ("change the field", (c, r) => Set(c, "field", Pick(r, ["Q", "F2", "F3", "F5", "F7", "F4", "F9", "F1"], (string)c["field"]!))),
        ("change a graph weight", ChangeWeight),
        ("remove a graph edge", RemoveEdge),
        ("add a graph edge", AddEdge),
        ("toggle an input or output", ToggleRole),
        ("alter the hash", AlterHash),
        ("drop a blocked node", (c, r) => RemoveAt(c["obstruction"]?["blocked"] as JArray, r) ? Clean(c) : null),
        ("add a blocked node", AddBlocked),
        ("truncate a witness", TruncateWitness),
        ("add an unknown key", AddUnknownKey),
        ("change a value's JSON type", ChangeType),
        ("unsort a list", Unsort),
    ];

    public static readonly (string Name, TextCorruption Apply)[] OnText =
    [
        ("truncate the text", (t, r) => t[..r.Next(t.Length - 1)]),
        ("delete a character", (t, r) => t.Remove(r.Next(t.Length), 1)),
        ("insert a character", (t, r) => t.Insert(r.Next(t.Length), "{}[],:\"0x-/ "[r.Next(12)].ToString())),
        ("duplicate a key", (t, _) => t.Insert(t.IndexOf('{') + 1, "\"flow\": \"general\",")),
    ];

    // ---- helpers -------------------------------------------------------------------------------

    static List<string> Names(JObject c, string key) => c["graph"]![key]!.Select(x => (string)x!).ToList();

    static List<string> Measured(JObject c) => Names(c, "nodes").Except(Names(c, "outputs")).ToList();

    static int? Round(JObject c, string node)
    {
        var rounds = c["rounds"] as JArray;
        for (var i = 0; rounds is not null && i < rounds.Count; i++)
            if (rounds[i].Any(x => (string)x! == node)) return i + 1;
        return null;
    }

    static string Pick(Random r, IReadOnlyList<string> pool, string? not = null)
    {
        var choices = pool.Where(x => x != not).ToList();
        return choices[r.Next(choices.Count)];
    }

    static T PickOne<T>(Random r, IReadOnlyList<T> items) => items[r.Next(items.Count)];

    /// <summary>Non-zero elements of the certificate's field (a sample for Q).</summary>
    static string[] Elements(JObject c)
    {
        var field = (string)c["field"]!;
        if (field == "Q") return ["1", "-1", "2", "1/2", "-1/2", "3", "-2/3", "5/4"];
        var p = int.Parse(field[1..]);
        return Enumerable.Range(1, p - 1).Select(i => i.ToString()).ToArray();
    }

    static JObject Set(JObject c, string key, JToken value) { c[key] = value; return c; }

    static JObject Clean(JObject c) => Support.Rehash(c);

    static bool RemoveAt(JArray? array, Random r)
    {
        if (array is null || array.Count == 0) return false;
        array.RemoveAt(r.Next(array.Count));
        return true;
    }

    static JObject SortedObject(IEnumerable<KeyValuePair<string, JToken?>> entries) =>
        new(entries.OrderBy(e => e.Key, StringComparer.Ordinal).Select(e => new JProperty(e.Key, e.Value)));

    static JArray SortedArray(IEnumerable<string> names) => new(names.Order(StringComparer.Ordinal).Cast<object>().ToArray());

    /// <summary>Every correction vector and witness of the certificate, with the node it belongs to (or null).</summary>
    static List<(JObject Vector, string? Owner)> Vectors(JObject c)
    {
        var list = new List<(JObject, string?)>();
        if (c["corrections"] is JObject corr) list.AddRange(corr.Properties().Select(p => ((JObject)p.Value, (string?)p.Name)));
        if (c["obstruction"]?["witnesses"] is JArray ws) list.AddRange(ws.Select(w => ((JObject)w, (string?)null)));
        return list;
    }

    // ---- corruptions -----------------------------------------------------------------------------

    static JObject? ChangeCoefficient(JObject c, Random r)
    {
        var entries = Vectors(c).SelectMany(v => v.Vector.Properties()).ToList();
        if (entries.Count == 0) return null;
        var e = PickOne(r, entries);
        var others = Elements(c).Where(x => x != (string)e.Value!).ToList();
        if (others.Count == 0) e.Remove(); else e.Value = PickOne(r, others);
        return c;
    }

    static JObject? DropEntry(JObject c, Random r)
    {
        var entries = Vectors(c).SelectMany(v => v.Vector.Properties()).ToList();
        if (entries.Count == 0) return null;
        PickOne(r, entries).Remove();
        return c;
    }

    /// <summary>Adds an entry to a correction vector, on a node that <paramref name="where"/> allows for its owner.</summary>
    static JObject? AddEntry(JObject c, Random r, Func<string, string, bool> where)
    {
        var vectors = Vectors(c).Where(v => v.Owner is not null).ToList();
        if (vectors.Count == 0) return null;
        var (vector, owner) = PickOne(r, vectors);
        var candidates = Names(c, "nodes").Where(n => vector[n] is null && where(n, owner!)).ToList();
        if (candidates.Count == 0) return null;
        var entries = vector.Properties().Select(p => new KeyValuePair<string, JToken?>(p.Name, p.Value)).ToList();
        entries.Add(new(PickOne(r, candidates), Pick(r, Elements(c))));
        vector.Replace(SortedObject(entries));
        return c;
    }

    /// <summary>Adds an entry on any node to any correction vector or witness.</summary>
    static JObject? AddEntry(JObject c, Random r, Func<string, bool> where)
    {
        var vectors = Vectors(c);
        if (vectors.Count == 0) return null;
        var (vector, _) = PickOne(r, vectors);
        var candidates = Names(c, "nodes").Where(n => vector[n] is null && where(n)).ToList();
        if (candidates.Count == 0) return null;
        var entries = vector.Properties().Select(p => new KeyValuePair<string, JToken?>(p.Name, p.Value)).ToList();
        entries.Add(new(PickOne(r, candidates), Pick(r, Elements(c))));
        vector.Replace(SortedObject(entries));
        return c;
    }

    static JObject? MoveToRound(JObject c, Random r)
    {
        if (c["rounds"] is not JArray rounds || rounds.Count == 0) return null;
        var from = r.Next(rounds.Count);
        var node = PickOne(r, rounds[from].Select(x => (string)x!).ToList());
        var to = r.Next(rounds.Count + 1);
        if (to == from) return null;
        var lists = rounds.Select(x => x.Select(y => (string)y!).ToList()).ToList();
        lists[from].Remove(node);
        if (to == rounds.Count) lists.Add([node]); else lists[to].Add(node);
        var kept = r.Next(2) == 0 ? lists.Where(l => l.Count > 0).ToList() : lists;
        c["rounds"] = new JArray(kept.Select(SortedArray));
        if (r.Next(4) != 0) c["depth"] = kept.Count;
        return c;
    }

    static JObject? DropFromRound(JObject c, Random r)
    {
        if (c["rounds"] is not JArray rounds || rounds.Count == 0) return null;
        return RemoveAt((JArray)rounds[r.Next(rounds.Count)], r) ? c : null;
    }

    static JObject? DuplicateInRound(JObject c, Random r)
    {
        if (c["rounds"] is not JArray rounds || rounds.Count < 2) return null;
        var (from, to) = (r.Next(rounds.Count), r.Next(rounds.Count));
        if (from == to) return null;
        var node = PickOne(r, rounds[from].Select(x => (string)x!).ToList());
        rounds[to] = SortedArray(rounds[to].Select(x => (string)x!).Append(node));
        return c;
    }

    static JObject? SwapRounds(JObject c, Random r)
    {
        if (c["rounds"] is not JArray rounds || rounds.Count < 2) return null;
        var (i, j) = (r.Next(rounds.Count), r.Next(rounds.Count));
        if (i == j) return null;
        (rounds[i], rounds[j]) = (rounds[j].DeepClone(), rounds[i].DeepClone());
        return c;
    }

    static JObject? DropCorrection(JObject c, Random r)
    {
        if (c["corrections"] is not JObject corr || !corr.HasValues) return null;
        PickOne(r, corr.Properties().ToList()).Remove();
        return c;
    }

    /// <summary>Replaces a flow by a made-up obstruction, or an obstruction by a made-up flow. By the lemma
    /// of flows.md section 6 both cannot be valid for one graph, field and kind.</summary>
    static JObject? SwapVerdict(JObject c, Random r)
    {
        var measured = Measured(c);
        if (measured.Count == 0) return null;
        var causal = (string)c["flow"]! == "causal";
        if ((string)c["verdict"]! == "flow")
        {
            foreach (var key in new[] { "depth", "rounds", "corrections" }) c.Remove(key);
            var blocked = measured.Where(_ => r.Next(2) == 0).DefaultIfEmpty(measured[0]).ToList();
            var obstruction = new JObject { ["blocked"] = SortedArray(blocked) };
            if (!causal)
                obstruction["witnesses"] = new JArray(Enumerable.Range(0, r.Next(1, 3)).Select(_ =>
                    SortedObject(blocked.Where(_ => r.Next(3) > 0).Select(n => new KeyValuePair<string, JToken?>(n, Pick(r, Elements(c)))))));
            c["verdict"] = "noflow";
            c["obstruction"] = obstruction;
            return c;
        }
        c.Remove("obstruction");
        var rounds = measured.GroupBy(_ => r.Next(1, 3)).OrderBy(g => g.Key).Select(g => SortedArray(g)).ToList();
        var laterOrOutput = Names(c, "nodes").Except(Names(c, "inputs")).ToList();
        c["verdict"] = "flow";
        c["depth"] = rounds.Count;
        c["rounds"] = new JArray(rounds);
        c["corrections"] = SortedObject(measured.Select(v => new KeyValuePair<string, JToken?>(v,
            SortedObject(laterOrOutput.Where(_ => r.Next(3) == 0).Take(causal ? 1 : 3)
                .Select(u => new KeyValuePair<string, JToken?>(u, Pick(r, Elements(c))))))));
        return c;
    }

    static JObject? ChangeWeight(JObject c, Random r)
    {
        var edges = (JArray)c["graph"]!["edges"]!;
        if (edges.Count == 0) return null;
        var e = edges[r.Next(edges.Count)];
        e[2] = Pick(r, ["1", "-1", "2", "1/2", "3", "-1/3", "5", "6", "1/5", "4/7"], (string)e[2]!);
        return Clean(c);
    }

    static JObject? RemoveEdge(JObject c, Random r) => RemoveAt((JArray)c["graph"]!["edges"]!, r) ? Clean(c) : null;

    static JObject? AddEdge(JObject c, Random r)
    {
        var nodes = Names(c, "nodes");
        var edges = c["graph"]!["edges"]!.Select(e => (U: (string)e[0]!, V: (string)e[1]!, W: (string)e[2]!)).ToList();
        var missing = nodes.SelectMany(u => nodes.Where(v => string.CompareOrdinal(u, v) < 0).Select(v => (U: u, V: v)))
            .Where(p => !edges.Any(e => e.U == p.U && e.V == p.V)).ToList();
        if (missing.Count == 0) return null;
        var (a, b) = PickOne(r, missing);
        edges.Add((a, b, Pick(r, ["1", "-1", "2", "1/2"])));
        c["graph"]!["edges"] = new JArray(edges.OrderBy(e => e.U, StringComparer.Ordinal).ThenBy(e => e.V, StringComparer.Ordinal)
            .Select(e => new JArray(e.U, e.V, e.W)));
        return Clean(c);
    }

    static JObject? ToggleRole(JObject c, Random r)
    {
        var role = r.Next(2) == 0 ? "inputs" : "outputs";
        var node = PickOne(r, Names(c, "nodes"));
        var names = Names(c, role);
        if (!names.Remove(node)) names.Add(node);
        c["graph"]![role] = SortedArray(names);
        return Clean(c);
    }

    static JObject? AlterHash(JObject c, Random r)
    {
        var hash = ((string)c["graphSha256"]!).ToCharArray();
        var i = r.Next(hash.Length);
        hash[i] = Pick(r, "0123456789abcdef".Select(ch => ch.ToString()).ToList(), hash[i].ToString())[0];
        return Set(c, "graphSha256", new string(hash));
    }

    static JObject? AddBlocked(JObject c, Random r)
    {
        if (c["obstruction"]?["blocked"] is not JArray blocked) return null;
        var names = blocked.Select(x => (string)x!).ToList();
        var extra = Names(c, "nodes").Except(names).ToList();
        if (extra.Count == 0) return null;
        names.Add(PickOne(r, extra));
        c["obstruction"]!["blocked"] = SortedArray(names);
        return c;
    }

    static JObject? TruncateWitness(JObject c, Random r)
    {
        if (c["obstruction"]?["witnesses"] is not JArray ws || ws.Count == 0) return null;
        var w = (JObject)ws[r.Next(ws.Count)];
        if (r.Next(3) == 0 || !w.HasValues) ws.Remove(w);
        else PickOne(r, w.Properties().ToList()).Remove();
        return c;
    }

    static JObject? AddUnknownKey(JObject c, Random r)
    {
        var targets = new List<JObject> { c, (JObject)c["graph"]! };
        if (c["producer"] is JObject p) targets.Add(p);
        if (c["obstruction"] is JObject o) targets.Add(o);
        PickOne(r, targets)[Pick(r, ["comment", "Format", "witness", "round", "x"])] = 1;
        return c;
    }

    static JObject? ChangeType(JObject c, Random r)
    {
        var values = c.Descendants().OfType<JValue>().ToList();
        var v = PickOne(r, values);
        JToken replacement = v.Type == JTokenType.String ? (r.Next(2) == 0 ? new JValue(1) : new JArray(v.Value!)) : new JValue(v.ToString());
        v.Replace(replacement);
        return c;
    }

    static JObject? Unsort(JObject c, Random r)
    {
        var lists = c.Descendants().OfType<JArray>().Where(a => a.Count >= 2 && a.All(x => x.Type == JTokenType.String)).ToList();
        var maps = Vectors(c).Select(v => v.Vector).Where(v => v.Count >= 2).ToList();
        if (c["corrections"] is JObject corr && corr.Count >= 2) maps.Add(corr);
        if (r.Next(2) == 0 && maps.Count > 0)
        {
            var m = PickOne(r, maps);
            m.Replace(new JObject(m.Properties().Reverse().Select(p => new JProperty(p.Name, p.Value))));
            return c;
        }
        var edgesList = (JArray)c["graph"]!["edges"]!;
        if (lists.Count == 0 && edgesList.Count < 2) return null;
        var list = lists.Count > 0 && (edgesList.Count < 2 || r.Next(2) == 0) ? PickOne(r, lists) : edgesList;
        var i = r.Next(list.Count - 1);
        (list[i], list[i + 1]) = (list[i + 1].DeepClone(), list[i].DeepClone());
        return c;
    }
}
