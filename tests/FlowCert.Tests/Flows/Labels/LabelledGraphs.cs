using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Tests.Flows.Labels;

/// <summary>Seeded random open graphs with measurement labels for the tests (System.Random with a seed is deterministic).</summary>
public static class LabelledGraphs
{
    /// <summary>Weights with a value in F_2; "2" and "-4" vanish there (the solver reports them).</summary>
    private static readonly string[] Weights = ["1", "1", "1", "-1", "3", "1/3", "2", "-4"];
    public static readonly MeasurementLabel[] Planes = [MeasurementLabel.XY, MeasurementLabel.XZ, MeasurementLabel.YZ];

    /// <summary>
    /// A graph of <paramref name="nodes"/> nodes with at most <paramref name="maxMeasured"/> measured, random
    /// inputs and outputs (they may overlap), and labels drawn from <paramref name="labels"/> for the measured
    /// nodes, at least one of them not XY.
    /// </summary>
    public static OpenGraph Make(Random rng, int nodes, int maxMeasured, MeasurementLabel[] labels)
    {
        var names = Enumerable.Range(0, nodes).Select(i => "n" + i).ToArray();
        double density = 0.2 + 0.5 * rng.NextDouble();
        var edges = new List<(string, string, Rational)>();
        for (int i = 0; i < nodes; i++)
            for (int j = i + 1; j < nodes; j++)
                if (rng.NextDouble() < density)
                {
                    Rational.TryParse(Weights[rng.Next(Weights.Length)], out var w);
                    edges.Add((names[i], names[j], w));
                }
        var outputs = names.Where(_ => rng.NextDouble() < 0.3).ToList();
        var rest = names.Except(outputs).OrderBy(_ => rng.Next()).ToList();
        while (nodes - outputs.Count > maxMeasured) { outputs.Add(rest[0]); rest.RemoveAt(0); }
        var inputs = names.Where(_ => rng.NextDouble() < 0.25).ToList();
        return WithRandomLabels(rng, new OpenGraph(names, edges, inputs, outputs), labels);
    }

    /// <summary>
    /// Paths from inputs to outputs covering the nodes plus random edges (flows are common there), with at
    /// most 6 measured nodes when <paramref name="nodes"/> is at most 8, labelled as <see cref="Make"/> does.
    /// </summary>
    public static OpenGraph MakeWithChains(Random rng, int nodes, MeasurementLabel[] labels, double xyShare = 0.4)
    {
        int chains = Math.Min(nodes, rng.Next(2, 4));
        var g = Validation.RandomGraphs.MakeWithChains(rng, nodes, chains, 0.35 * rng.NextDouble(), Validation.RandomGraphs.IntegerWeights);
        return WithRandomLabels(rng, g, labels, xyShare);
    }

    /// <summary>Labels from <paramref name="labels"/> on the measured nodes, at least one not XY.</summary>
    public static OpenGraph WithRandomLabels(Random rng, OpenGraph g, MeasurementLabel[] labels, double xyShare = 0.4)
    {
        var measured = g.Measured;
        if (measured.Length == 0) return g;
        var chosen = new Dictionary<int, MeasurementLabel>();
        // XY often (and mostly on inputs, which can never be corrected when measured in XZ, YZ or Z)
        foreach (var v in measured)
            chosen[v] = rng.NextDouble() < (g.Inputs.Contains(v) ? 0.8 : xyShare) ? MeasurementLabel.XY : labels[rng.Next(labels.Length)];
        if (chosen.Values.All(l => l == MeasurementLabel.XY))
            chosen[measured[rng.Next(measured.Length)]] = labels.Where(l => l != MeasurementLabel.XY).ElementAt(rng.Next(labels.Length - 1));
        return g.WithLabels(chosen);
    }

    /// <summary>Chains (as <see cref="MakeWithChains"/>) with 1 to 3 labels other than XY from
    /// <paramref name="labels"/>: each either on a measured non-input or on a new leaf ("gadget") attached to
    /// a random node, the rest XY. Flows stay common while labels are exercised.</summary>
    public static OpenGraph ChainsWithFewLabels(Random rng, int nodes, MeasurementLabel[] labels)
    {
        int chains = Math.Min(nodes, rng.Next(1, 4));
        var g = Validation.RandomGraphs.MakeWithChains(rng, nodes, chains, 0.12 * rng.NextDouble(), ["1", "-1", "3"]);
        var nonXy = labels.Where(l => l != MeasurementLabel.XY).ToArray();
        var names = g.Names.ToList();
        var edges = g.Edges.Select(e => (g.Names[e.U], g.Names[e.V], e.Weight)).ToList();
        var chosen = new Dictionary<string, MeasurementLabel>();
        int count = rng.Next(1, 4);
        for (int k = 0; k < count; k++)
        {
            var label = nonXy[rng.Next(nonXy.Length)];
            var candidates = g.Measured.Where(v => !g.Inputs.Contains(v)).Select(v => g.Names[v]).ToArray();
            if (rng.Next(2) == 0 || candidates.Length == 0)
            {
                var leaf = "g" + k;
                edges.Add((leaf, names[rng.Next(names.Count)], Rational.One));
                names.Add(leaf);
                chosen[leaf] = label;
            }
            else chosen[candidates[rng.Next(candidates.Length)]] = label;
        }
        var grown = new OpenGraph(names, edges, g.Inputs.Select(v => g.Names[v]), g.Outputs.Select(v => g.Names[v]));
        return grown.WithLabels(chosen.ToDictionary(kv => grown.IndexOf(kv.Key), kv => kv.Value));
    }
}
