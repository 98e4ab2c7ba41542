using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Algebra.Factoring;
using FlowCert.Graphs;

namespace FlowCert.Flows.Primes;

/// <summary>
/// The answer over every prime at once (flows.md section 10, docs/primes.md): the answer over Q, the
/// integers whose prime factors form the candidate set E, each p in E solved directly over F_p, and any
/// integer that could not be fully classified. For every prime outside E that divides no unclassified
/// integer, the verdict and minimum depth over F_p are those over Q.
/// </summary>
public sealed class PrimeSurvey
{
    private static readonly BigInteger FieldLimit = PrimeField.Bound;

    /// <summary>The graph surveyed.</summary>
    public required OpenGraph Graph { get; init; }
    /// <summary>The flow condition.</summary>
    public required FlowKind Kind { get; init; }
    /// <summary>The answer over Q.</summary>
    public required FlowResult Rational { get; init; }
    /// <summary>The integers whose prime factors form E (each distinct origin and value once, 1 left out).</summary>
    public required IReadOnlyList<SurveyInteger> Integers { get; init; }
    /// <summary>Every prime of E (below 2^62), ascending, with its direct answer.</summary>
    public required IReadOnlyList<PrimeAnswer> Exceptional { get; init; }
    /// <summary>Integers whose prime divisors are not classified (empty when the classification is complete).</summary>
    public required IReadOnlyList<UnclassifiedPart> Unclassified { get; init; }

    /// <summary>True when every prime is classified.</summary>
    public bool IsComplete => Unclassified.Count == 0;

    /// <summary>Surveys <paramref name="graph"/> for flows of kind <paramref name="kind"/>; factoring stops when <paramref name="budget"/> is spent.</summary>
    public static PrimeSurvey Run(OpenGraph graph, FlowKind kind, FactoringBudget budget)
    {
        var rational = FlowSolver.Solve(graph, FieldSpec.Rationals, kind);
        var raw = new List<(IntegerOrigin Origin, int Layer, string Where, BigInteger Value)>();
        foreach (var e in graph.Edges)
        {
            var where = $"edge {graph.Names[e.U]} {graph.Names[e.V]} ({e.Weight})";
            raw.Add((IntegerOrigin.WeightNumerator, 0, where, BigInteger.Abs(e.Weight.Numerator)));
            raw.Add((IntegerOrigin.WeightDenominator, 0, where, e.Weight.Denominator));
        }
        if (kind == FlowKind.General)
        {
            var run = new RationalLayerRun(graph);
            CheckSameRun(run, rational);
            for (int k = 0; k < run.Blocks.Count; k++)
            {
                var (minor, unsolvable) = run.Blocks[k];
                // The rank matters only where some row is solvable (docs/primes.md, Lemma 3): not at the step
                // that finds nothing, where Lemma 4 alone keeps every row unsolvable.
                if (k < run.Layers.Count)
                    raw.Add((IntegerOrigin.PivotMinor, k + 1, $"layer {k + 1} block", minor));
                foreach (var (node, gcd) in unsolvable)
                    raw.Add((IntegerOrigin.KernelCoordinate, k + 1, $"layer {k + 1} row {graph.Names[node]}", gcd));
            }
        }
        var factors = new Dictionary<BigInteger, Factorisation>();
        var integers = new List<SurveyInteger>();
        var seen = new HashSet<(IntegerOrigin, BigInteger)>();
        foreach (var (origin, layer, where, value) in raw)
        {
            if (value.IsOne || !seen.Add((origin, value))) continue;
            if (!factors.TryGetValue(value, out var f)) factors[value] = f = IntegerFactoring.Factor(value, budget);
            integers.Add(new SurveyInteger(origin, layer, where, value, f));
        }
        var exceptional = new SortedSet<BigInteger>();
        var unclassified = new SortedDictionary<BigInteger, string>();
        foreach (var f in factors.Values)
        {
            foreach (var p in f.Primes)
                if (p < FieldLimit) exceptional.Add(p);
                else unclassified.TryAdd(p, "a prime of 2^62 or more: beyond the solver's F_p arithmetic, so not solved");
            foreach (var p in f.ProbablePrimes)
                unclassified.TryAdd(p, "a probable prime (Baillie-PSW) of 2^64 or more: beyond the solver's F_p arithmetic, so not solved");
            foreach (var c in f.Unfactored)
                unclassified.TryAdd(c, string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"composite, not factored within the {budget.Limit.TotalSeconds:0.###} s budget: primes dividing it are not classified"));
        }
        return new PrimeSurvey
        {
            Graph = graph,
            Kind = kind,
            Rational = rational,
            Integers = integers,
            Exceptional = exceptional.Select(p => SolveDirectly(graph, kind, (ulong)p)).ToList(),
            Unclassified = unclassified.Select(kv => new UnclassifiedPart(kv.Key, kv.Value)).ToList(),
        };
    }

    /// <summary>Solves over F_p directly; a weight with no value there gives an undefined answer naming its edges.</summary>
    public static PrimeAnswer SolveDirectly(OpenGraph graph, FlowKind kind, ulong p)
    {
        try { return new PrimeAnswer(p, FlowSolver.Solve(graph, FieldSpec.PrimeField(p), kind), []); }
        catch (WeightNotInFieldException)
        {
            return new PrimeAnswer(p, null, graph.Edges.Where(e => (e.Weight.Denominator % p).IsZero).ToList());
        }
    }

    /// <summary>What the survey claims at the prime p.</summary>
    public PrimeClaim ClaimAt(ulong p)
    {
        int k = BinarySearch(p);
        if (k >= 0)
        {
            var a = Exceptional[k];
            return new PrimeClaim(p, PrimeClaimKind.SolvedDirectly, a.IsDefined, a.Result?.HasFlow ?? false, a.Result?.Depth ?? 0);
        }
        if (Unclassified.Any(u => (u.Value % p).IsZero)) return new PrimeClaim(p, PrimeClaimKind.Unclassified, true, false, 0);
        return new PrimeClaim(p, PrimeClaimKind.SameAsRationals, true, Rational.HasFlow, Rational.Depth);
    }

    private int BinarySearch(ulong p)
    {
        int lo = 0, hi = Exceptional.Count - 1;
        while (lo <= hi)
        {
            int mid = (lo + hi) / 2;
            var q = Exceptional[mid].Prime;
            if (q == p) return mid;
            if (q < p) lo = mid + 1; else hi = mid - 1;
        }
        return -1;
    }

    // The integer replay and the solver must take the same layers over Q; anything else is a bug in one of them.
    private static void CheckSameRun(RationalLayerRun run, FlowResult rational)
    {
        bool same = rational.HasFlow
            ? run.Blocked.Length == 0 && run.Layers.Count == rational.Depth
              && run.Layers.Select((l, i) => l.SequenceEqual(rational.Rounds[rational.Depth - 1 - i].Order())).All(x => x)
            : run.Blocked.SequenceEqual(rational.Obstruction!.Nodes.Order());
        if (!same)
            throw new InvalidOperationException("internal error: the integer replay of the Q run and the solver reached different layers");
    }
}
