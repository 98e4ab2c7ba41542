using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Schedules;

namespace FlowCert.Simulation;

/// <summary>A request the simulator refuses (the continuous-variable case, a wrong dimension, too many amplitudes).</summary>
public sealed class SimulationException(string message) : Exception(message);

/// <summary>
/// A flow certificate compiled for simulation over qudits of prime dimension p: the measurement order,
/// c_v and A c_v as residues mod p, one random XY-type angle (a diagonal unitary D) per measured node and
/// a random input state, all drawn from one seed (or angles given per node). Nodes are prepared as the
/// schedule needs them (<see cref="LivePlan"/>): the limit is on the peak number of live qudits.
/// </summary>
public sealed class QuditPattern
{
    /// <summary>The most amplitudes a simulation may hold at its peak width (2^22).</summary>
    public const long MaxAmplitudes = 1L << 22;

    /// <summary>The graph of the certificate.</summary>
    public OpenGraph Graph { get; }
    /// <summary>The qudit dimension p.</summary>
    public int Dimension { get; }
    /// <summary>Measured nodes in measurement order (round by round, by index within a round).</summary>
    public IReadOnlyList<int> Order { get; }
    /// <summary>c_v(u) mod p, indexed [v][u] for measured v.</summary>
    public IReadOnlyDictionary<int, int[]> Correction { get; }
    /// <summary>(A c_v)(w) mod p, indexed [v][w] for measured v.</summary>
    public IReadOnlyDictionary<int, int[]> Image { get; }
    /// <summary>The diagonal of D for every measured node.</summary>
    public IReadOnlyDictionary<int, Complex[]> Angles { get; }
    /// <summary>A random normalized input state (first sorted input most significant).</summary>
    public Complex[] InputState { get; }
    /// <summary>Violations of flows.md section 3 (empty for a valid certificate; the simulator runs anyway).</summary>
    public IReadOnlyList<string> Violations { get; }
    /// <summary>The number of amplitudes at the peak: p^(live nodes + reference qudits).</summary>
    public long Amplitudes { get; }
    /// <summary>When each node is prepared, and the peak width.</summary>
    public LivePlan Plan { get; }

    private QuditPattern(OpenGraph graph, int p, int[] order, Dictionary<int, int[]> c, Dictionary<int, int[]> image,
        Dictionary<int, Complex[]> angles, Complex[] input, IReadOnlyList<string> violations, long amplitudes, LivePlan plan)
    {
        Graph = graph; Dimension = p; Order = order; Correction = c; Image = image; Angles = angles;
        InputState = input; Violations = violations; Amplitudes = amplitudes; Plan = plan;
    }

    /// <summary>
    /// Compiles a flow result for dimension p (null: the field's prime). Throws <see cref="SimulationException"/>
    /// over Q, over a prime above 2^31 - 1, when p differs from the field's prime, or when the peak width
    /// needs more than <see cref="MaxAmplitudes"/>; <see cref="ScheduleException"/> for a noflow or
    /// malformed certificate. With <paramref name="angles"/> null every measured node gets a random
    /// angle; otherwise the given diagonal where there is one and the identity (angle 0) elsewhere.
    /// </summary>
    public static QuditPattern FromFlow(FlowResult r, ulong? dimension, ulong seed, IReadOnlyDictionary<int, Complex[]>? angles = null)
    {
        if (r.Field.IsRationals)
            throw new SimulationException("the certificate is over Q, the continuous-variable case: its modes have an infinite-dimensional " +
                "state space, which no state vector can hold. Solve the graph over a prime instead (for example --field 3) and simulate that certificate.");
        if (!r.HasFlow) throw new ScheduleException("the certificate says no flow exists (verdict noflow): there is no pattern to simulate");
        if (r.Field.Prime > int.MaxValue)
            throw new SimulationException($"the certificate is over {r.Field.Name}: qudits of a dimension above 2^31 - 1 are beyond the simulator " +
                $"(its state holds at most 2^22 = {MaxAmplitudes} amplitudes). Solve the graph over a small prime (for example --field 3) and simulate that certificate.");
        int p = (int)r.Field.Prime;
        if (dimension is { } d && d != r.Field.Prime)
            throw new SimulationException($"--dim {d} does not match the certificate's field {r.Field.Name}: its corrections hold mod {p} only. " +
                $"Use --dim {p}, or solve the graph over {d} and simulate that certificate.");
        var g = r.Graph;
        var field = new PrimeField((ulong)p);
        var s = CorrectionSystem<ulong, PrimeField>.Create(r, field);
        var plan = new LivePlan(g, p, s.Order);
        double amplitudes = Math.Pow(p, plan.PeakQudits);
        if (amplitudes > MaxAmplitudes)
            throw new SimulationException($"the schedule keeps up to {plan.PeakLive} of {g.NodeCount} qudits of dimension {p} live at once, with " +
                $"{Graphs.Formats.Counted.Of(plan.PeakQudits - plan.PeakLive, "reference qudit")} for the inputs: {p}^{plan.PeakQudits} = {amplitudes:0} amplitudes, more than the limit of 2^22 = {MaxAmplitudes}: simulate a narrower design");
        int[] Dense(SparseVector<ulong> x)
        {
            var a = new int[g.NodeCount];
            for (int k = 0; k < x.Count; k++) a[x.Indices[k]] = (int)x.Values[k];
            return a;
        }
        var random = new SeededRandom(seed);
        var diagonals = new Dictionary<int, Complex[]>();
        foreach (var v in s.Order)
        {
            var randomAngle = QuditOperators.RandomAngle(p, random);
            diagonals[v] = angles is null ? randomAngle
                : angles.TryGetValue(v, out var given) ? given : Enumerable.Repeat(Complex.One, p).ToArray();
        }
        int dIn = (int)Math.Pow(p, g.Inputs.Count);
        var input = Enumerable.Range(0, dIn).Select(_ => new Complex(random.NextGaussian(), random.NextGaussian())).ToArray();
        double norm = Math.Sqrt(input.Sum(z => z.Magnitude * z.Magnitude));
        for (int i = 0; i < dIn; i++) input[i] /= norm;
        return new QuditPattern(g, p, s.Order,
            s.Order.ToDictionary(v => v, v => Dense(s.Correction[v])),
            s.Order.ToDictionary(v => v, v => Dense(s.Image[v])),
            diagonals, input, FlowConditionCheck.Violations(s), (long)amplitudes, plan);
    }
}
