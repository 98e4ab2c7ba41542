using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Noise;
using Xunit.Abstractions;

namespace FlowCert.Tests.Noise;

/// <summary>
/// More outputs than inputs (docs/noise.md, "More outputs than inputs"): the ideal output embeds the inputs
/// in |O| modes with |O| - |I| nullifiers, K is not zero, and the noise lives on the |O| + |I| finite
/// directions F = { f : f^T K in the row space of K_M }. Valid flows have f^T K = 0 on all of F; the noise
/// there does not depend on the flow.
/// </summary>
public class EmbeddingTests(ITestOutputHelper output)
{
    internal static int Rank(Rational[,] m)
    {
        var rows = new List<SparseVector<Rational>>();
        for (int i = 0; i < m.GetLength(0); i++)
        {
            var idx = new List<int>();
            var val = new List<Rational>();
            for (int j = 0; j < m.GetLength(1); j++) if (!m[i, j].IsZero) { idx.Add(j); val.Add(m[i, j]); }
            rows.Add(new SparseVector<Rational>(idx.ToArray(), val.ToArray()));
        }
        return new SparseElimination<Rational, RationalField>(default, rows).Rank;
    }

    private static Rational[,] Product(Rational[,] a, Rational[,] b, bool transposeB = false)
    {
        int n = a.GetLength(0), inner = a.GetLength(1), m = transposeB ? b.GetLength(0) : b.GetLength(1);
        var p = new Rational[n, m];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < m; j++)
            {
                var sum = Rational.Zero;
                for (int t = 0; t < inner; t++) sum += a[i, t] * (transposeB ? b[j, t] : b[t, j]);
                p[i, j] = sum;
            }
        return p;
    }

    private static bool IsZero(Rational[,] m) => m.Cast<Rational>().All(x => x.IsZero);

    // The smallest case, worked by hand in docs/noise.md: I = {}, O = {b}, edge a - b of weight 1, c_a = e_b.
    // q_b = -delta_a (a nullifier, the ideal state is the q_b = 0 eigenstate), p_b = q_a^0 + delta_b (infinite).
    [Fact]
    public void OneMeasuredNodeAndOneOutputLeaveOneNullifier()
    {
        var report = NoiseAnalysis.Analyze(PublishedNoiseTests.Certify("output b\nedge a b 1\n"));
        Assert.True(report.Valid);
        Assert.True(report.IsEmbedding);
        Assert.Equal(1, report.DirectionCount);
        Assert.Equal(new Rational[,] { { 1, 0 } }, report.Directions); // f1 = q_b
        Assert.True(report.IsNullifier(0));
        Assert.Equal(Rational.One, report.DirectionVariance(0));
        Assert.Equal(new Rational[,] { { -1, 0 } }, report.DirectionL); // squeezed columns a, b
        Assert.Equal(new Rational[,] { { 0, 0 }, { 1, 0 } }, report.K);  // p_b carries q_a^0
    }

    // One input, two outputs: a - b, a - c. The ideal output embeds the input in two modes with one nullifier.
    [Fact]
    public void ATeleportationIntoTwoModesHasTwoLogicalDirectionsAndOneNullifier()
    {
        var report = NoiseAnalysis.Analyze(PublishedNoiseTests.Certify("input a\noutput b c\nedge a b 1\nedge a c 1\n"));
        Assert.True(report.Valid);
        Assert.Equal(3, report.DirectionCount);
        Assert.False(report.IsNullifier(0));
        Assert.False(report.IsNullifier(1));
        Assert.True(report.IsNullifier(2));
        // Logical rows carry q_a and p_a exactly (D S is the identity on them).
        Assert.Equal(new Rational[,] { { 1, 0 }, { 0, 1 }, { 0, 0 } }, report.DirectionS);
        Assert.Equal(1, Rank(report.K));
    }

    /// <summary>
    /// The checks every valid certificate with |O| > |I| passes: D K = 0, |O| + |I| finite directions, rank K =
    /// |O| - |I|, D S of rank 2|I| with a unit row per logical direction, |O| - |I| nullifiers, and D J D^T =
    /// (D S) J (D S)^T exactly (the finite directions commute as the input quadratures they carry).
    /// </summary>
    internal static void AssertEmbeddingShape(NoiseReport report, string name)
    {
        int o = report.Outputs.Count, i = report.Inputs.Count;
        Assert.True(report.Valid, name);
        Assert.True(IsZero(report.DirectionK), name);
        Assert.True(report.DirectionCount == o + i, $"{name}: {report.DirectionCount} finite directions");
        Assert.True(Rank(report.K) == o - i, $"{name}: rank K = {Rank(report.K)}");
        Assert.True(Rank(report.DirectionS) == 2 * i, name);
        Assert.Equal(o - i, Enumerable.Range(0, report.DirectionCount).Count(report.IsNullifier));
        for (int j = 0; j < 2 * i; j++)
            for (int c = 0; c < 2 * i; c++)
                Assert.Equal(j == c ? Rational.One : Rational.Zero, report.DirectionS[j, c]);
        // Commutators: f^T J_O g = (S^T f)^T J_I (S^T g), J = block-diagonal [[0, 1], [-1, 0]].
        var d = report.Directions;
        var ds = report.DirectionS;
        for (int a = 0; a < report.DirectionCount; a++)
            for (int b = 0; b < report.DirectionCount; b++)
            {
                var outside = Rational.Zero;
                for (int k = 0; k < report.Rows; k += 2) outside += d[a, k] * d[b, k + 1] - d[a, k + 1] * d[b, k];
                var inside = Rational.Zero;
                for (int k = 0; k < 2 * i; k += 2) inside += ds[a, k] * ds[b, k + 1] - ds[a, k + 1] * ds[b, k];
                Assert.True(outside == inside, $"{name}: [f{a + 1}, f{b + 1}]");
            }
    }

    [Fact]
    public void SolverCertificatesWithMoreOutputsHaveTheExpectedFiniteDirections()
    {
        int orthogonal = 0, total = 0;
        foreach (var (name, flow, phases) in QCertificateCorpus.Certificates(60, seed: 1307, moreOutputs: 2))
        {
            var report = NoiseAnalysis.Analyze(flow, phases);
            AssertEmbeddingShape(report, name);
            // The sketch's leading-order condition K K_M^T = 0 is not what a valid flow satisfies.
            if (IsZero(Product(report.K, report.MeasuredK, transposeB: true))) orthogonal++;
            total++;
        }
        output.WriteLine($"{total} certificates, {orthogonal} with K K_M^T = 0");
        Assert.True(orthogonal < total, "every certificate had K K_M^T = 0");
    }

    // A continuous-variable cluster state is defined by its nullifiers p_v - sum_u A[v][u] q_u, which are 0
    // at infinite squeezing ("Universal quantum computation with continuous-variable cluster states",
    // arXiv:quant-ph/0605198) and carry the squeezed variance e^(-2r)/2 at finite squeezing ("Quantum
    // computing with continuous-variable clusters", arXiv:0903.3233). A pattern that measures nothing and
    // has no input outputs that state: every one of its |O| finite directions is a nullifier, and each
    // n_v has n_v^T K = 0 and n_v^T L = e_v.
    [Fact]
    public void AClusterStateOutputHasTheClusterNullifiersAsFiniteDirections()
    {
        var text = "output a b c d\nedge a b 1\nedge b c -2\nedge c d 1/2\nedge a d 3\n";
        var g = FlowCert.Graphs.OgraphReader.Parse(text, "cluster.ograph");
        var flow = FlowSolver.Solve(g, FieldSpec.Rationals, FlowKind.General);
        Assert.True(flow.HasFlow);
        var report = NoiseAnalysis.Analyze(flow);
        Assert.True(report.Valid);
        Assert.Equal(4, report.DirectionCount);
        Assert.All(Enumerable.Range(0, 4), j => Assert.True(report.IsNullifier(j)));
        var span = Rank(report.Directions);
        foreach (var v in report.Outputs)
        {
            var n = new Rational[1, report.Rows];
            for (int k = 0; k < report.Rows; k++) n[0, k] = Rational.Zero;
            int row = 2 * report.Outputs.ToList().IndexOf(v);
            n[0, row + 1] = Rational.One;
            foreach (var e in g.Edges)
            {
                int other = e.U == v ? e.V : e.V == v ? e.U : -1;
                if (other >= 0) n[0, 2 * report.Outputs.ToList().IndexOf(other)] -= e.Weight;
            }
            Assert.True(IsZero(Product(n, report.K)));
            var nl = Product(n, report.L);
            for (int j = 0; j < report.Squeezed.Count; j++)
                Assert.Equal(report.Squeezed[j] == v ? Rational.One : Rational.Zero, nl[0, j]);
            // n_v lies in the span of the reported directions.
            var both = new Rational[5, report.Rows];
            for (int i = 0; i < 4; i++) for (int k = 0; k < report.Rows; k++) both[i, k] = report.Directions[i, k];
            for (int k = 0; k < report.Rows; k++) both[4, k] = n[0, k];
            Assert.Equal(span, Rank(both));
        }
    }

    // No flow has fewer outputs than inputs; a certificate claiming one is refused as bad input.
    [Fact]
    public void FewerOutputsThanInputsAreRefused()
    {
        var flow = PublishedNoiseTests.Certify("input a\noutput b\nedge a b 1\n");
        var g = new FlowCert.Graphs.OpenGraph(["a", "b", "c"], [("a", "b", Rational.One), ("c", "b", Rational.One)], ["a", "c"], ["b"]);
        var e = Assert.Throws<NoiseInputException>(() => NoiseAnalysis.Analyze(flow with { Graph = g }));
        Assert.Contains("2 inputs and 1 output", e.Message);
    }

    // The same fact on the smallest example: a - b, a - c, no input, c_a = e_b is a valid generalized flow.
    // K K_M^T != 0, yet q_b + q_c = -delta_a and p_b - p_c = delta_b - delta_c are finite: valid.
    [Fact]
    public void AValidFlowNeedNotMakeKOrthogonalToTheMeasuredOutcomes()
    {
        var flow = PublishedNoiseTests.Certify("output b c\nedge a b 1\nedge a c 1\n");
        var report = NoiseAnalysis.Analyze(flow);
        AssertEmbeddingShape(report, "a-b, a-c");
        Assert.False(IsZero(Product(report.K, report.MeasuredK, transposeB: true)));
        Assert.Equal(new Rational[,] { { 1, 0, 1, 0 }, { 0, 1, 0, -1 } }, report.Directions);
    }

    /// <summary>
    /// Other generalized flows of the same certificate: c_v plus a vector d supported on non-inputs later than v
    /// with (A d)(w) = 0 for every w measured no later than v (the gflow conditions of flows.md section 3 still
    /// hold). Returns null when no c_v can change.
    /// </summary>
    internal static FlowResult? AnotherGeneralizedFlow(FlowResult flow, Random random)
    {
        var g = flow.Graph;
        var round = new int[g.NodeCount];
        Array.Fill(round, int.MaxValue);
        for (int k = 0; k < flow.Rounds.Count; k++) foreach (var v in flow.Rounds[k]) round[v] = k;
        var corrections = flow.Corrections.ToDictionary(p => p.Key, p => p.Value);
        bool changed = false;
        foreach (var v in g.Measured)
        {
            var later = Enumerable.Range(0, g.NodeCount).Where(u => round[u] > round[v] && !g.Inputs.Contains(u)).ToArray();
            var notLater = Enumerable.Range(0, g.NodeCount).Where(w => round[w] <= round[v]).ToArray();
            // Right kernel of A[notLater, later]: the left kernel of its transpose (one row per later node).
            var rows = later.Select(u =>
            {
                var entries = new SortedDictionary<int, Rational>();
                foreach (var e in g.Edges)
                {
                    int other = e.U == u ? e.V : e.V == u ? e.U : -1;
                    if (other >= 0 && round[other] <= round[v]) entries[other] = (entries.TryGetValue(other, out var x) ? x : Rational.Zero) + e.Weight;
                }
                var nz = entries.Where(p => !p.Value.IsZero).ToArray();
                return new SparseVector<Rational>(nz.Select(p => p.Key).ToArray(), nz.Select(p => p.Value).ToArray());
            }).ToList();
            var kernel = new SparseElimination<Rational, RationalField>(default, rows).LeftKernel();
            if (kernel.Count == 0 || random.Next(3) == 0) continue;
            var c = new Dictionary<int, Rational>();
            if (corrections.TryGetValue(v, out var old))
                foreach (var (u, value) in old.Entries) c[u] = value.AsRational;
            foreach (var y in kernel)
            {
                Rational factor = random.Next(-2, 3);
                for (int t = 0; t < y.Count; t++)
                {
                    int u = later[y.Indices[t]];
                    c[u] = (c.TryGetValue(u, out var x) ? x : Rational.Zero) + factor * y.Values[t];
                }
            }
            var kept = c.Where(p => !p.Value.IsZero).OrderBy(p => p.Key).ToArray();
            corrections[v] = NodeVector.Create(flow.Field, kept.Select(p => p.Key).ToArray(), kept.Select(p => p.Value).ToArray());
            changed = true;
        }
        return changed ? flow with { Corrections = corrections, Kind = FlowKind.General } : null;
    }

    // Item 4 of the issue for |O| > |I|: the proof in docs/noise.md says F, D S and D L do not depend on the
    // valid corrections. Compared on causal vs generalized certificates and on further generalized flows.
    [Fact]
    public void DifferentValidFlowsGiveTheSameNoiseOnTheFiniteDirections()
    {
        var corpus = QCertificateCorpus.Certificates(80, seed: 2611, moreOutputs: 2);
        var random = new Random(7);
        int pairs = 0, differentK = 0, differentCorrections = 0, causal = 0;
        for (int c = 0; c < corpus.Count; c++)
        {
            var (name, flow, phases) = corpus[c];
            var reference = NoiseAnalysis.Analyze(flow, phases);
            var others = new List<(string, FlowResult)>();
            // The corpus lists the generalized and the causal certificate of a graph next to each other.
            if (c + 1 < corpus.Count && corpus[c + 1].Name == name.Replace(" general", " causal")) { others.Add((corpus[c + 1].Name, corpus[c + 1].Flow)); causal++; }
            for (int t = 0; t < 3; t++)
                if (AnotherGeneralizedFlow(flow, random) is { } other) others.Add(($"{name} variant {t}", other));
            foreach (var (otherName, other) in others)
            {
                var report = NoiseAnalysis.Analyze(other, phases);
                AssertEmbeddingShape(report, otherName);
                Assert.Equal(reference.Directions, report.Directions);
                Assert.Equal(reference.DirectionS, report.DirectionS);
                Assert.Equal(reference.DirectionL, report.DirectionL);
                pairs++;
                if (!reference.K.Cast<Rational>().SequenceEqual(report.K.Cast<Rational>())) differentK++;
                if (flow.Corrections.Any(p => !other.Corrections[p.Key].Entries.Select(e => (e.Node, e.Value.AsRational))
                        .SequenceEqual(p.Value.Entries.Select(e => (e.Node, e.Value.AsRational))))) differentCorrections++;
            }
        }
        output.WriteLine($"{pairs} pairs ({causal} causal against generalized), {differentCorrections} with different corrections, {differentK} with different K");
        Assert.True(causal >= 20, $"{causal} causal certificates compared");
        // The comparison has teeth: the corrections, and with them the anti-squeezed part K, really differ.
        Assert.True(differentCorrections >= 100, $"{differentCorrections} pairs with different corrections");
        Assert.True(differentK >= 50, $"{differentK} pairs with different K");
    }

    /// <summary>The generalized-flow conditions of flows.md section 3 on the certificate's own rounds and vectors.</summary>
    internal static bool IsGeneralizedFlow(FlowResult flow)
    {
        var g = flow.Graph;
        var round = new int[g.NodeCount];
        Array.Fill(round, int.MaxValue);
        for (int k = 0; k < flow.Rounds.Count; k++) foreach (var v in flow.Rounds[k]) round[v] = k;
        foreach (var v in g.Measured)
        {
            var c = new Dictionary<int, Rational>();
            if (flow.Corrections.TryGetValue(v, out var vector))
                foreach (var (u, value) in vector.Entries)
                {
                    if (round[u] <= round[v] || g.Inputs.Contains(u)) return false;
                    c[u] = value.AsRational;
                }
            foreach (var w in g.Measured.Where(w => round[w] <= round[v]))
            {
                var sum = Rational.Zero;
                foreach (var e in g.Edges)
                {
                    if (e.U == w && c.TryGetValue(e.V, out var x)) sum += e.Weight * x;
                    if (e.V == w && c.TryGetValue(e.U, out var y)) sum += e.Weight * y;
                }
                if (sum != (w == v ? Rational.One : Rational.Zero)) return false;
            }
        }
        return true;
    }

    // Negative control with more outputs than inputs: a corrupted correction makes an anti-squeezed quadrature
    // reach a finite direction; the report names the node and the noise there grows as e^(2r). A corruption
    // that happens to leave a generalized flow (possible now: c_v is not unique) must stay valid.
    [Fact]
    public void ACorruptedCorrectionIsCaughtOnTheFiniteDirections()
    {
        int seen = 0, stillFlows = 0;
        foreach (var (name, flow, phases) in QCertificateCorpus.Certificates(30, seed: 4243, moreOutputs: 2))
        {
            var corrupted = NegativeControlTests.Corrupt(flow);
            if (corrupted is null) continue;
            var report = NoiseAnalysis.Analyze(corrupted, phases);
            if (IsGeneralizedFlow(corrupted))
            {
                AssertEmbeddingShape(report, name + " corrupted, still a flow");
                stillFlows++;
                continue;
            }
            Assert.False(report.Valid, name);
            var leak = report.Leaks[0];
            Assert.False(corrupted.Graph.Inputs.Contains(leak.Node));
            Assert.True(report.DirectionCount == report.Outputs.Count + report.Inputs.Count, name); // F does not depend on the corrections
            double ratio = NoiseFigures.DirectionAddedVariance(report, leak.Row, 4) / NoiseFigures.DirectionAddedVariance(report, leak.Row, 3);
            Assert.Equal(Math.Exp(2), ratio, 2);
            Assert.Null(NoiseFigures.TargetDecibels(report, Rational.One));
            seen++;
        }
        output.WriteLine($"{seen} corrupted certificates caught, {stillFlows} corruptions that still satisfy the flow conditions");
        Assert.True(seen >= 20, $"{seen} corrupted certificates");
    }
}
