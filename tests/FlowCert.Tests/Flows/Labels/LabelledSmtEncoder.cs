using System.Text;
using FlowCert.Tests.Oracles;

namespace FlowCert.Tests.Flows.Labels;

/// <summary>
/// SMT-LIB 2 for "a generalized flow with planes (flows.md 9.2) or a Pauli flow (9.3) of depth at most k
/// exists", written from flows.md section 9 alone: an integer round r_v in 1..k per measured v, a Boolean
/// p_v_u per measured v and non-input u (u in p(v)), Odd as an exclusive or over the neighbours, and each
/// condition as an implication. Empty rounds can be removed without changing "later than", so this says
/// "depth at most k".
/// </summary>
public static class LabelledSmtEncoder
{
    public static string Encode(LabelledReference r, bool pauli, int k)
    {
        var sb = new StringBuilder($"; {(pauli ? "Pauli flow" : "generalized flow with planes")} of depth at most {k}\n");
        var measured = Enumerable.Range(0, r.Count).Where(v => r.Has(r.Measured, v)).ToArray();
        var nonInputs = Enumerable.Range(0, r.Count).Where(u => !r.Has(r.Inputs, u)).ToArray();
        foreach (var v in measured) sb.Append($"(declare-const r{v} Int)\n(assert (and (<= 1 r{v}) (<= r{v} {k})))\n");
        string Later(int w, int v) => r.Has(r.Outputs, w) ? "true" : $"(> r{w} r{v})";
        foreach (var v in measured)
        {
            foreach (var u in nonInputs) sb.Append($"(declare-const p{v}_{u} Bool)\n");
            string In(int u) => r.Has(r.Inputs, u) ? "false" : $"p{v}_{u}";
            string Odd(int w)
            {
                var terms = nonInputs.Where(u => r.Has(r.Adjacency[w], u)).Select(u => $"p{v}_{u}").ToList();
                return terms.Count switch { 0 => "false", 1 => terms[0], _ => $"(xor {string.Join(' ', terms)})" };
            }
            foreach (var w in measured.Where(w => w != v))
            {
                var l = r.Labels[w];
                if (!pauli)
                {
                    sb.Append($"(assert (=> {In(w)} {Later(w, v)}))\n");   // G1
                    sb.Append($"(assert (=> {Odd(w)} {Later(w, v)}))\n");  // G2
                    continue;
                }
                if (l is not ("X" or "Y")) sb.Append($"(assert (=> {In(w)} {Later(w, v)}))\n");  // P1
                if (l is not ("Y" or "Z")) sb.Append($"(assert (=> {Odd(w)} {Later(w, v)}))\n"); // P2
                if (l == "Y") sb.Append($"(assert (=> (not {Later(w, v)}) (= {In(w)} {Odd(w)})))\n"); // P3
            }
            string a = In(v), b = Odd(v);
            sb.Append(r.Labels[v] switch // G3, P4-P9
            {
                "XY" => $"(assert (and (not {a}) {b}))\n",
                "XZ" => $"(assert (and {a} {b}))\n",
                "YZ" => $"(assert (and {a} (not {b})))\n",
                "X" => $"(assert {b})\n",
                "Z" => $"(assert {a})\n",
                _ => $"(assert (xor {a} {b}))\n",
            });
        }
        return sb.ToString();
    }
}
