using System.Collections.Concurrent;
using System.Diagnostics;
using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Tests.Oracles;
using Xunit.Abstractions;

namespace FlowCert.Tests.Validation;

/// <summary>
/// Every graph on up to 5 nodes (nauty-geng, up to isomorphism) with every choice of inputs and outputs
/// (all 4^n pairs of subsets, overlaps included), and a seeded sample on 6 and 7 nodes: the solver
/// (certificates verified) against <see cref="SubsetDepthOracle"/> over F_2, F_3 and Q, both kinds, with
/// unit weights and again with seeded random non-zero weights (validation issue 4).
/// </summary>
public sealed class ExhaustiveSmallGraphTests(ITestOutputHelper output)
{
    private static readonly string[] Fields = ["F2", "F3", "Q"];
    private static readonly ReferenceKind[] Kinds = [ReferenceKind.General, ReferenceKind.Causal];
    /// <summary>Non-zero over Q and defined in F_2, F_3; 2 and 4 vanish in F_2, 3 in F_3 (vanishing edges are exercised).</summary>
    private static readonly string[] RandomWeights = ["1", "-1", "2", "3", "4", "-1/5", "5/7", "-7"];

    private static List<Graph6Reader.SimpleGraph> Graphs(int order)
        => order == 0 ? [Graph6Reader.ParseLine("?")] : Graph6Reader.ParseAll(PipedProgram.Run("nauty-geng", "nauty", ["-q", order.ToString()]));

    private static OpenGraph Build(Graph6Reader.SimpleGraph g, int inputs, int outputs, string[] weights)
    {
        var names = Enumerable.Range(0, g.Order).Select(i => "n" + i).ToArray();
        var edges = g.Edges.Select((e, k) => { Rational.TryParse(weights[k], out var w); return (names[e.U], names[e.V], w); });
        return new OpenGraph(names, edges, names.Where((_, i) => (inputs >> i & 1) != 0), names.Where((_, i) => (outputs >> i & 1) != 0));
    }

    /// <summary>Compares one open graph over every field and kind; returns the number of comparisons.</summary>
    private static int Compare(OpenGraph g, ConcurrentBag<string> failures, ConcurrentDictionary<string, int> tally)
    {
        var rg = ReferenceGraph.From(g);
        int count = 0;
        foreach (var field in Fields)
            foreach (var kind in Kinds)
            {
                var expected = SubsetDepthOracle.Analyse(rg, field, kind);
                var actual = CertifiedSolve.Run(g, field, kind);
                if (expected != actual)
                    failures.Add($"over {field}, {kind}: oracle says {expected?.ToString() ?? "refused"}, solver says {actual?.ToString() ?? "refused"}\n{rg.ToOgraph()}");
                if (expected is { Exists: true }) tally.AddOrUpdate($"{kind} flow", 1, (_, x) => x + 1);
                count++;
            }
        return count;
    }

    [ToolTheory("nauty-geng")]
    [InlineData(false)]
    [InlineData(true)]
    public void EveryGraphUpToFiveNodesWithEveryInputOutputChoice(bool randomWeights)
    {
        var clock = Stopwatch.StartNew();
        var failures = new ConcurrentBag<string>();
        var tally = new ConcurrentDictionary<string, int>();
        var rng = new Random(randomWeights ? 6007 : 0);
        var work = new List<(Graph6Reader.SimpleGraph Graph, string[] Weights)>();
        for (int n = 0; n <= 5; n++)
            foreach (var g in Graphs(n))
                work.Add((g, g.Edges.Select(_ => randomWeights ? RandomWeights[rng.Next(RandomWeights.Length)] : "1").ToArray()));
        long comparisons = 0, openGraphs = 0;
        Parallel.ForEach(work, new ParallelOptions { MaxDegreeOfParallelism = 2 }, item =>
        {
            int n = item.Graph.Order, local = 0, graphsHere = 0;
            for (int inputs = 0; inputs < 1 << n; inputs++)
                for (int outputs = 0; outputs < 1 << n; outputs++)
                {
                    local += Compare(Build(item.Graph, inputs, outputs, item.Weights), failures, tally);
                    graphsHere++;
                }
            Interlocked.Add(ref comparisons, local);
            Interlocked.Add(ref openGraphs, graphsHere);
        });
        output.WriteLine($"exhaustive n <= 5 ({(randomWeights ? "random" : "unit")} weights): {work.Count} graphs, {openGraphs} open graphs, {comparisons} comparisons " +
                         $"({string.Join(", ", tally.OrderBy(kv => kv.Key).Select(kv => $"{kv.Key}: {kv.Value}"))}); {clock.Elapsed.TotalSeconds:F1} s");
        Assert.True(failures.IsEmpty, $"{failures.Count} disagreements, first ones:\n{string.Join("\n", failures.Take(3))}");
    }

    [ToolTheory("nauty-geng")]
    [InlineData(6, 12)]
    [InlineData(7, 3)]
    public void SeededSampleOnSixAndSevenNodes(int order, int choicesPerGraph)
    {
        // every graph of the order (156 on 6 nodes, 1044 on 7), each with a few seeded input/output choices;
        // the first half of the choices use unit weights, the rest seeded random weights
        int perGraph = choicesPerGraph * ValidationScale.Factor;
        var clock = Stopwatch.StartNew();
        var failures = new ConcurrentBag<string>();
        var tally = new ConcurrentDictionary<string, int>();
        var rng = new Random(order * 1000 + 17);
        var work = new List<OpenGraph>();
        foreach (var g in Graphs(order))
            for (int k = 0; k < perGraph; k++)
            {
                var weights = g.Edges.Select(_ => RandomWeights[rng.Next(RandomWeights.Length)]).ToArray();
                if (k < (perGraph + 1) / 2) Array.Fill(weights, "1");
                work.Add(Build(g, rng.Next(1 << order), rng.Next(1 << order), weights));
            }
        long comparisons = 0;
        Parallel.ForEach(work, new ParallelOptions { MaxDegreeOfParallelism = 2 }, g => Interlocked.Add(ref comparisons, Compare(g, failures, tally)));
        output.WriteLine($"sample n = {order}: {work.Count} open graphs ({perGraph} per graph), {comparisons} comparisons " +
                         $"({string.Join(", ", tally.OrderBy(kv => kv.Key).Select(kv => $"{kv.Key}: {kv.Value}"))}); {clock.Elapsed.TotalSeconds:F1} s");
        Assert.True(failures.IsEmpty, $"{failures.Count} disagreements, first ones:\n{string.Join("\n", failures.Take(3))}");
    }
}
