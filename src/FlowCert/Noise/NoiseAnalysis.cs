using FlowCert.Algebra;
using FlowCert.Flows;

namespace FlowCert.Noise;

/// <summary>
/// Runs a flow certificate's pattern over Q in the Heisenberg picture with deferred measurements
/// (flows.md section 11, docs/noise.md) and reads off the exact S, K and L of <see cref="NoiseReport"/>.
/// </summary>
public static class NoiseAnalysis
{
    /// <summary>
    /// The exact model. Throws <see cref="NoiseInputException"/> for a certificate over another field, a
    /// proof of absence, fewer outputs than inputs (no flow has that), or a phase on a node that is not
    /// measured. More outputs than inputs are accepted: the noise is then reported on the finite directions. A certificate whose corrections fail is not an exception: see
    /// <see cref="NoiseReport.Valid"/>.
    /// </summary>
    public static NoiseReport Analyze(FlowResult flow, IReadOnlyDictionary<int, Rational>? phases = null)
    {
        phases ??= new Dictionary<int, Rational>();
        var g = flow.Graph;
        if (!flow.Field.IsRationals)
            throw new NoiseInputException($"the certificate is over {flow.Field.Name}, and finite squeezing is a continuous-variable notion: give a certificate over Q.");
        if (!flow.HasFlow)
            throw new NoiseInputException("the certificate proves that no flow exists: there is no pattern whose noise could be computed.");
        if (g.Outputs.Count < g.Inputs.Count)
            throw new NoiseInputException($"the graph has {Graphs.Formats.Counted.Of(g.Inputs.Count, "input")} and {Graphs.Formats.Counted.Of(g.Outputs.Count, "output")}: no flow has fewer outputs than inputs, so this certificate cannot be right.");
        foreach (var (v, _) in phases)
            if (g.Outputs.Contains(v)) throw new NoiseInputException($"{g.Names[v]} is an output and is never measured: it has no measurement phase.");

        var round = new int[g.NodeCount];
        Array.Fill(round, int.MaxValue); // outputs: later than everything
        for (int k = 0; k < flow.Rounds.Count; k++)
            foreach (var v in flow.Rounds[k]) round[v] = k;
        var neighbours = Neighbours(flow);

        var forms = new LinearForms(g.NodeCount);
        foreach (var e in g.Edges) forms.Edge(e.U, e.V, e.Weight);
        var outcomes = new List<(int V, Rational[] M)>(); // every measured operator M_v, in measurement order
        for (int k = 0; k < flow.Rounds.Count; k++)
        {
            // Nodes of one round are measured together: every measured operator first, then every correction
            // (a correction only ever acts on strictly later nodes, so the order inside a round is irrelevant).
            var measured = new List<(int V, Rational[] M)>();
            foreach (var v in flow.Rounds[k])
            {
                if (phases.TryGetValue(v, out var t)) forms.Phase(v, t);
                measured.Add((v, forms.Copy(LinearForms.P(v))));
            }
            outcomes.AddRange(measured);
            foreach (var (v, m) in measured)
            {
                if (!flow.Corrections.TryGetValue(v, out var c)) continue;
                var z = new SortedDictionary<int, Rational>();
                foreach (var (u, value) in c.Entries)
                {
                    var cu = CorrectionValue(value);
                    if (round[u] > k) forms.AddTo(LinearForms.Q(u), -cu, m); // X_u(-m c_v(u)): q_u -> q_u - c_v(u) m
                    foreach (var (w, a) in neighbours[u])
                        z[w] = (z.TryGetValue(w, out var old) ? old : Rational.Zero) + a * cu;
                }
                foreach (var (w, acw) in z)
                    if (w != v && round[w] > k) forms.AddTo(LinearForms.P(w), -acw, m); // Z_w(-m (A c_v)(w))
            }
        }
        return Read(flow, phases, forms, outcomes);
    }

    /// <summary>The one place a correction coefficient is read: a typed element of Q.</summary>
    internal static Rational CorrectionValue(FieldElement value) => value.AsRational;

    private static List<(int, Rational)>[] Neighbours(FlowResult flow)
    {
        var list = new List<(int, Rational)>[flow.Graph.NodeCount];
        for (int v = 0; v < list.Length; v++) list[v] = [];
        foreach (var e in flow.Graph.Edges)
        {
            list[e.U].Add((e.V, e.Weight));
            list[e.V].Add((e.U, e.Weight));
        }
        return list;
    }

    private static NoiseReport Read(FlowResult flow, IReadOnlyDictionary<int, Rational> phases, LinearForms forms, List<(int V, Rational[] M)> outcomes)
    {
        var g = flow.Graph;
        var inputs = g.SortedInputs;
        var outputs = g.SortedOutputs;
        var squeezed = Enumerable.Range(0, g.NodeCount).Where(v => !g.Inputs.Contains(v)).ToArray();
        int rows = 2 * outputs.Length;
        var s = new Rational[rows, 2 * inputs.Length];
        var k = new Rational[rows, squeezed.Length];
        var l = new Rational[rows, squeezed.Length];
        for (int row = 0; row < rows; row++)
        {
            var o = outputs[row / 2];
            var form = forms.Form(row % 2 == 0 ? LinearForms.Q(o) : LinearForms.P(o));
            for (int i = 0; i < inputs.Length; i++)
            {
                s[row, 2 * i] = form[LinearForms.Q(inputs[i])];
                s[row, 2 * i + 1] = form[LinearForms.P(inputs[i])];
            }
            for (int j = 0; j < squeezed.Length; j++)
            {
                k[row, j] = form[LinearForms.Q(squeezed[j])];
                l[row, j] = form[LinearForms.P(squeezed[j])];
            }
        }
        var measuredK = new Rational[outcomes.Count, squeezed.Length];
        for (int i = 0; i < outcomes.Count; i++)
            for (int j = 0; j < squeezed.Length; j++) measuredK[i, j] = outcomes[i].M[LinearForms.Q(squeezed[j])];
        // As many outputs as inputs: K_M is square and invertible (docs/noise.md), every output quadrature is
        // a finite direction and the basis is the identity, so directions are rows.
        var d = outputs.Length == inputs.Length ? FiniteDirections.Identity(rows) : FiniteDirections.Basis(k, measuredK, s);
        var dk = FiniteDirections.Times(d, k);
        var leaks = new List<AntiSqueezedLeak>();
        for (int i = 0; i < dk.GetLength(0); i++)
            for (int j = 0; j < squeezed.Length; j++)
                if (!dk[i, j].IsZero) leaks.Add(new AntiSqueezedLeak(squeezed[j], i, dk[i, j]));
        return new NoiseReport
        {
            Flow = flow, Phases = phases, Inputs = inputs, Outputs = outputs, Squeezed = squeezed,
            S = s, K = k, L = l, Leaks = leaks,
            MeasuredNodes = outcomes.Select(o => o.V).ToArray(), MeasuredK = measuredK,
            Directions = d, DirectionS = FiniteDirections.Times(d, s), DirectionL = FiniteDirections.Times(d, l), DirectionK = dk,
        };
    }
}
