using FlowCert.Tests.Oracles;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Validation;

/// <summary>
/// Re-checks a version-2 certificate text from flows.md section 9 alone, with the bit masks of
/// <see cref="LabelledReference"/>: a flow by the conditions of 9.2 or 9.3 on the written rounds and
/// correction sets; a proof of absence by building the system of 9.4 for every blocked node (unknowns and
/// equations as that section lists them) and checking the written witness: y^T M = 0 and y^T b = 1.
/// Returns null when the certificate holds, else what is wrong.
/// </summary>
public static class LabelledCertificateVerifier
{
    public static string? Check(string certificateText, LabelledReference r, IReadOnlyList<string> names)
    {
        var root = JObject.Parse(certificateText);
        if ((int)root["version"]! != 2) return "not version 2";
        bool pauli = (string)root["flow"]! == "pauli";
        int Index(string name) => names.ToList().IndexOf(name) is var i and >= 0 ? i : throw new ArgumentException(name);
        int Mask(JToken list) => list.Select(t => 1 << Index((string)t!)).Aggregate(0, (a, b) => a | b);
        if ((string)root["verdict"]! == "flow")
        {
            var round = new int[r.Count];
            var rounds = (JArray)root["rounds"]!;
            int seen = 0;
            for (int k = 0; k < rounds.Count; k++)
            {
                int m = Mask(rounds[k]);
                if (m == 0 || (m & seen) != 0 || (m & ~r.Measured) != 0) return $"round {k + 1} is empty, repeats a node or holds an output";
                seen |= m;
                for (int v = 0; v < r.Count; v++) if (r.Has(m, v)) round[v] = k + 1;
            }
            if (seen != r.Measured) return "the rounds do not cover the measured nodes";
            var corrections = (JObject)root["corrections"]!;
            for (int v = 0; v < r.Count; v++)
            {
                if (!r.Has(r.Measured, v)) continue;
                int later = 0;
                for (int w = 0; w < r.Count; w++) if (r.Has(r.Measured, w) && round[w] > round[v]) later |= 1 << w;
                var entries = (JObject?)corrections[names[v]];
                if (entries is null) return $"no correction for {names[v]}";
                if (entries.Properties().Any(p => (string)p.Value! != "1")) return $"a correction entry of {names[v]} is not 1";
                int p = entries.Properties().Select(x => 1 << Index(x.Name)).Aggregate(0, (a, b) => a | b);
                bool ok = pauli ? LabelledBruteForce.Pauli(r, v, p, later) : LabelledBruteForce.General(r, v, p, later);
                if (!ok) return $"the correction of {names[v]} breaks flows.md {(pauli ? "9.3" : "9.2")}";
            }
            return null;
        }
        var obstruction = (JObject)root["obstruction"]!;
        int u = Mask(obstruction["blocked"]!);
        if (u == 0 || (u & ~r.Measured) != 0) return "the blocked set is empty or holds an output";
        var witnesses = (JObject)obstruction["witnesses"]!;
        for (int v = 0; v < r.Count; v++)
        {
            if (!r.Has(u, v)) continue;
            if (witnesses[names[v]] is not JObject y) return $"no witness for {names[v]}";
            int rows = Mask(y["rows"]!);
            bool self = (bool)y["self"]!;
            if (!Refutes(r, u, v, rows, self)) return $"the witness of {names[v]} does not refute its system";
        }
        return null;
    }

    /// <summary>
    /// flows.md 9.4 with P = V \ U: unknowns p(c) for c in P minus inputs, for non-inputs of U labelled X
    /// or Y, and for v where its label allows (a label that puts v in p(v) makes p(v) an unknown fixed to
    /// 1 by its own equation, "v's self row"); equations (A p)(u) = 0 for u in U \ {v} not labelled Y or
    /// Z, p(u) + (A p)(u) = 0 for u labelled Y, and v's own condition from 9.3.
    /// </summary>
    public static bool Refutes(LabelledReference r, int u, int v, int rows, bool self)
    {
        string lv = r.Labels[v];
        bool selfRow = lv is "XZ" or "YZ" or "Z";
        if (self && !selfRow) return false;
        int unknowns = 0;
        for (int c = 0; c < r.Count; c++)
        {
            if (r.Has(r.Inputs, c)) continue;
            if (!r.Has(u, c) || r.Labels[c] is "X" or "Y" || (c == v && selfRow)) unknowns |= 1 << c;
        }
        int sum = 0;     // y^T M as a mask over nodes (only unknowns count)
        bool rhs = false; // y^T b
        for (int w = 0; w < r.Count; w++)
        {
            if (!r.Has(rows, w)) continue;
            if (!r.Has(u, w)) return false;
            string l = r.Labels[w];
            if (w != v && l == "Z") return false;      // no equation for a Z node other than v
            if (w == v && l == "Z") return false;      // Z at v: only "v in p(v)"
            sum ^= r.Adjacency[w];
            if (l == "Y") sum ^= 1 << w;               // p(w) + (A p)(w), and at v for Y: exactly one of the two
            if (w == v) rhs ^= lv != "YZ";             // v in Odd(p(v)) is 1 except for YZ
        }
        if (self) { sum ^= 1 << v; rhs = !rhs; }
        return (sum & unknowns) == 0 && rhs;
    }
}
