using System.Numerics;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Simulation;

/// <summary>
/// Measurement parameters per measured node as the diagonal phases theta_0..theta_(p-1) of
/// D = diag(e^(i theta_j)): the outcome-k basis vector is D^dagger Z^k |+> (flows.md section 7). A node
/// without an entry has D = 1 (angle 0). For qubits the angle a in the XY plane is D = diag(1, e^(-i a)),
/// so outcome 0 is (|0> + e^(i a) |1>) / sqrt 2 (common practice for the sign).
/// </summary>
public sealed class MeasurementAngles
{
    /// <summary>The qudit dimension p.</summary>
    public int Dimension { get; }
    /// <summary>theta_0..theta_(p-1) of every node with an entry.</summary>
    public IReadOnlyDictionary<int, double[]> Phases { get; }

    /// <summary>Wraps phases per node (each array of length p).</summary>
    public MeasurementAngles(int dimension, IReadOnlyDictionary<int, double[]> phases)
    {
        foreach (var (_, theta) in phases)
            if (theta.Length != dimension) throw new ArgumentException($"a diagonal phase over dimension {dimension} has {dimension} entries");
        Dimension = dimension; Phases = phases;
    }

    /// <summary>The phases of a qubit measured at angle a in the XY plane: (0, -a).</summary>
    public static double[] QubitAngle(double a) => [0, a == 0 ? 0 : -a];

    /// <summary>The phases of node v: its entry, or all 0.</summary>
    public double[] Of(int v) => Phases.TryGetValue(v, out var theta) ? theta : new double[Dimension];

    /// <summary>The diagonals of D per node, as the simulator takes them.</summary>
    public IReadOnlyDictionary<int, Complex[]> Diagonals()
        => Phases.ToDictionary(kv => kv.Key, kv => kv.Value.Select(t => Complex.FromPolarCoordinates(1, t)).ToArray());

    /// <summary>Reads the angles file at <paramref name="path"/> as <see cref="Parse"/> does.</summary>
    public static MeasurementAngles Read(string path, OpenGraph g, int p) => FromLines(Syntax(p).Read(path, g), p);

    /// <summary>
    /// Reads <c>NODE VALUE</c> lines (docs/circuits.md, "Angles"): for qubits VALUE is the angle a; for
    /// p &gt;= 3 it is theta_0,...,theta_(p-1) separated by commas. Each number follows the grammar of
    /// <see cref="ComplexExpression"/> and must be real (pi/4, -3*pi/4, 0.5). Blank lines and text from
    /// '#' on are ignored. Throws <see cref="GraphFormatException"/> (file, line, column) for a node not in
    /// the graph, an output, a node given twice, a wrong count of values or a malformed number.
    /// </summary>
    public static MeasurementAngles Parse(string text, string fileName, OpenGraph g, int p) => FromLines(Syntax(p).Lines(text, fileName, g), p);

    private static NodeValueFile Syntax(int p) => new("an angles file",
        p == 2 ? "NODE VALUE, VALUE its angle such as pi/4" : $"NODE VALUE, VALUE {p} phases separated by commas", "angle", ValueIsRestOfLine: true);

    private static MeasurementAngles FromLines(IEnumerable<NodeValueLine> lines, int p)
    {
        var phases = new Dictionary<int, double[]>();
        foreach (var line in lines)
        {
            var parts = new List<(int Start, string Text)>();
            int start = 0;
            for (int i = 0; i <= line.Value.Length; i++)
                if (i == line.Value.Length || line.Value[i] == ',') { parts.Add((start, line.Value[start..i])); start = i + 1; }
            int expected = p == 2 ? 1 : p;
            if (parts.Count != expected)
                throw line.Error(0, p == 2
                    ? $"a qubit takes one angle in its plane, not {parts.Count} values"
                    : $"a qudit of dimension {p} takes {p} diagonal phases theta_0,...,theta_{p - 1} separated by commas, not {parts.Count}");
            var values = new double[parts.Count];
            for (int i = 0; i < parts.Count; i++)
            {
                try { values[i] = ComplexExpression.ParseReal(parts[i].Text, p); }
                catch (ExpressionException e) { throw line.Error(parts[i].Start + e.Offset, $"value of '{line.Name}': {e.Message}"); }
            }
            phases[line.Node] = p == 2 ? QubitAngle(values[0]) : values;
        }
        return new MeasurementAngles(p, phases);
    }
}
