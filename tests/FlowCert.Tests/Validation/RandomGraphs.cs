using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Tests.Validation;

/// <summary>Seeded random open graphs for the comparison tests (System.Random with a seed is deterministic).</summary>
public static class RandomGraphs
{
    /// <summary>Weights including fractions and negatives (the set named in the validation task).</summary>
    public static readonly string[] Weights = ["1", "-1", "2", "-1/2", "3/4", "5", "1/3"];

    /// <summary>The integer part of <see cref="Weights"/>: every weight has a value in every F_p.</summary>
    public static readonly string[] IntegerWeights = ["1", "-1", "2", "5"];

    /// <summary>Half the graphs draw from <see cref="Weights"/>, half from <see cref="IntegerWeights"/>, so F_2 and F_3 are not mostly skipped.</summary>
    public static string[] PickWeights(Random rng) => rng.Next(2) == 0 ? Weights : IntegerWeights;

    /// <summary>
    /// A graph with <paramref name="nodes"/> nodes, each edge present with probability
    /// <paramref name="density"/>, random weights from <paramref name="weights"/>, random inputs and outputs
    /// (they may overlap) with at most <paramref name="maxMeasured"/> measured nodes.
    /// </summary>
    public static OpenGraph Make(Random rng, int nodes, double density, int maxMeasured, string[] weights, double outputShare = 0.45, double inputShare = 0.25)
    {
        var names = Enumerable.Range(0, nodes).Select(i => "v" + i).ToArray();
        var edges = new List<(string, string, Rational)>();
        for (int i = 0; i < nodes; i++)
            for (int j = i + 1; j < nodes; j++)
                if (rng.NextDouble() < density)
                {
                    Rational.TryParse(weights[rng.Next(weights.Length)], out var w);
                    edges.Add((names[i], names[j], w));
                }
        var outputs = names.Where(_ => rng.NextDouble() < outputShare).ToList();
        // top up the outputs until at most maxMeasured nodes are measured
        var rest = names.Except(outputs).OrderBy(_ => rng.Next()).ToList();
        while (nodes - outputs.Count > maxMeasured) { outputs.Add(rest[0]); rest.RemoveAt(0); }
        var inputs = names.Where(_ => rng.NextDouble() < inputShare).ToList();
        return new OpenGraph(names, edges, inputs, outputs);
    }

    /// <summary>
    /// A graph that often has a flow with many measured nodes: <paramref name="chains"/> disjoint paths
    /// (each starts at an input and ends at an output) cover the nodes, then extra edges are added with
    /// probability <paramref name="extraDensity"/>. Random weights from <paramref name="weights"/>.
    /// </summary>
    public static OpenGraph MakeWithChains(Random rng, int nodes, int chains, double extraDensity, string[] weights)
    {
        var names = Enumerable.Range(0, nodes).Select(i => "v" + i).ToArray();
        var order = names.OrderBy(_ => rng.Next()).ToArray();
        var chainOf = new List<string>[chains];
        for (int c = 0; c < chains; c++) chainOf[c] = [];
        for (int i = 0; i < nodes; i++) chainOf[i < chains ? i : rng.Next(chains)].Add(order[i]);
        var edges = new Dictionary<(string, string), Rational>();
        Rational W() { Rational.TryParse(weights[rng.Next(weights.Length)], out var w); return w; }
        (string, string) Key(string a, string b) => string.CompareOrdinal(a, b) < 0 ? (a, b) : (b, a);
        foreach (var chain in chainOf)
            for (int k = 0; k + 1 < chain.Count; k++) edges[Key(chain[k], chain[k + 1])] = W();
        for (int i = 0; i < nodes; i++)
            for (int j = i + 1; j < nodes; j++)
                if (rng.NextDouble() < extraDensity) edges.TryAdd(Key(names[i], names[j]), W());
        return new OpenGraph(names, edges.Select(kv => (kv.Key.Item1, kv.Key.Item2, kv.Value)),
            chainOf.Select(c => c[0]), chainOf.Select(c => c[^1]));
    }
}
