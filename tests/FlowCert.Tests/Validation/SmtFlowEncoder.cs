using System.Numerics;
using System.Text;
using FlowCert.Tests.Oracles;

namespace FlowCert.Tests.Validation;

/// <summary>
/// Writes plain SMT-LIB 2 for "a generalized (or causal) flow of depth at most k exists", straight from
/// flows.md sections 2-4: an integer round r_v in 1..k for every measured v, correction-vector variables
/// c_v_u (reals over Q, integers in 0..p-1 over F_p with sums taken mod p), and the conditions written as
/// implications. A c_v is linear because A is a constant. Rounds may leave some of 1..k empty: removing
/// the empty rounds keeps every "later than" relation, so this says "depth at most k".
/// </summary>
public static class SmtFlowEncoder
{
    /// <summary>The declarations and assertions (no check-sat), for use between push and pop.</summary>
    public static string Encode(ReferenceGraph g, string field, ReferenceKind kind, int k)
    {
        var prime = field == "Q" ? BigInteger.Zero : BigInteger.Parse(field[1..]);
        var sb = new StringBuilder();
        var measured = g.Measured;
        int n = g.Count;
        bool IsInput(int u) => g.Inputs.Contains(u);
        bool IsOutput(int u) => g.Outputs.Contains(u);
        // the weights in the field, as SMT-LIB constants; null where the weight is zero in the field
        var weight = new string?[n, n];
        foreach (var (u, v, num, den) in g.Edges)
        {
            string? w;
            if (prime.IsZero) w = RealConstant(num, den);
            else
            {
                var d = Mod(den, prime);
                if (d.IsZero) throw new ArgumentException($"weight {num}/{den} has no value in {field}");
                var r = Mod(Mod(num, prime) * BigInteger.ModPow(d, prime - 2, prime), prime);
                w = r.IsZero ? null : r.ToString();
            }
            weight[u, v] = weight[v, u] = w;
        }
        string Later(int u, int v) => IsOutput(u) ? "true" : $"(> r{u} r{v})"; // "later than": an output, or a larger round

        sb.Append($"; {(kind == ReferenceKind.Causal ? "causal" : "generalized")} flow of depth at most {k} over {field}\n");
        foreach (var v in measured)
            sb.Append($"(declare-const r{v} Int)\n(assert (and (<= 1 r{v}) (<= r{v} {k})))\n");

        foreach (var v in measured)
        {
            if (kind == ReferenceKind.Causal)
            {
                // section 4: f(v) is a non-input u with A[v][u] != 0, u later than v, and every measured
                // neighbour w != v of u later than v
                var correctors = Enumerable.Range(0, n).Where(u => !IsInput(u)).ToArray();
                sb.Append($"(declare-const f{v} Int)\n");
                sb.Append("(assert (or false").Append(string.Concat(correctors.Select(u => $" (= f{v} {u})"))).Append("))\n");
                foreach (var u in correctors)
                {
                    var conditions = new List<string> { weight[v, u] is null ? "false" : "true", Later(u, v) };
                    foreach (var w in measured)
                        if (w != v && weight[u, w] is not null) conditions.Add(Later(w, v));
                    sb.Append($"(assert (=> (= f{v} {u}) (and {string.Join(' ', conditions)})))\n");
                }
                continue;
            }
            // section 3.1: c_v(u) != 0 => u is not an input and u is later than v (inputs get no variable: c_v(u) = 0)
            var support = Enumerable.Range(0, n).Where(u => !IsInput(u)).ToArray();
            foreach (var u in support)
            {
                if (prime.IsZero) sb.Append($"(declare-const c{v}_{u} Real)\n");
                else sb.Append($"(declare-const c{v}_{u} Int)\n(assert (and (<= 0 c{v}_{u}) (<= c{v}_{u} {prime - 1})))\n");
                sb.Append($"(assert (=> (not (= c{v}_{u} {Zero(prime)})) {Later(u, v)}))\n");
            }
            string Ac(int w)
            {
                var terms = support.Where(u => weight[w, u] is not null).Select(u => $"(* {weight[w, u]} c{v}_{u})").ToList();
                var sum = terms.Count switch { 0 => Zero(prime), 1 => terms[0], _ => $"(+ {string.Join(' ', terms)})" };
                return prime.IsZero ? sum : $"(mod {sum} {prime})";
            }
            // section 3.2: (A c_v)(v) = 1
            sb.Append($"(assert (= {Ac(v)} {One(prime)}))\n");
            // section 3.3: (A c_v)(w) != 0 for a measured w != v => w is later than v
            foreach (var w in measured)
                if (w != v) sb.Append($"(assert (=> (not (= {Ac(w)} {Zero(prime)})) {Later(w, v)}))\n");
        }
        return sb.ToString();
    }

    private static string Zero(BigInteger prime) => prime.IsZero ? "0.0" : "0";
    private static string One(BigInteger prime) => prime.IsZero ? "1.0" : "1";
    private static BigInteger Mod(BigInteger a, BigInteger p) => ((a % p) + p) % p;

    private static string RealConstant(BigInteger num, BigInteger den)
    {
        string Abs(BigInteger x) => BigInteger.Abs(x) + ".0";
        var magnitude = den.IsOne ? Abs(num) : $"(/ {Abs(num)} {Abs(den)})";
        return num.Sign < 0 ? $"(- {magnitude})" : magnitude;
    }
}
