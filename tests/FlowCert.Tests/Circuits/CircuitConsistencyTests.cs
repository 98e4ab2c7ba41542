using FlowCert.Circuits;
using FlowCert.Flows;
using FlowCert.Simulation;
using FlowCert.Tests.Simulation;

namespace FlowCert.Tests.Circuits;

/// <summary>
/// The circuit read off a causal flow ("Determinism in the one-way model", arXiv:quant-ph/0506062, in the
/// qudit form of docs/circuits.md), multiplied out with MathNet.Numerics, equals the map the pattern
/// implements (the simulator's all-zero branch, normalised) up to a global phase, for random certified
/// graphs over F_2, F_3 and F_5 with random measurement parameters. Over F_2 the OpenQASM 3.0 text, read
/// back by <see cref="QasmReader"/>, gives the same matrix.
/// </summary>
public class CircuitConsistencyTests
{
    private const double Tolerance = 1e-9;

    public static IEnumerable<(string Name, FlowResult Result)> CausalCorpus(int p, int count, int seed)
        => RandomFlowCorpus.Certificates(p, 3 * count, seed).Where(x => x.Result.Kind == FlowKind.Causal).Take(count);

    public static MeasurementAngles RandomAngles(FlowResult r, SeededRandom random)
    {
        int p = (int)r.Field.Prime;
        var phases = new Dictionary<int, double[]>();
        foreach (var v in r.Graph.Measured)
            phases[v] = Enumerable.Range(0, p).Select(_ => 2 * Math.PI * random.NextDouble() - Math.PI).ToArray();
        return new MeasurementAngles(p, phases);
    }

    [Theory]
    [InlineData(2, 40, 9202)]
    [InlineData(3, 35, 9303)]
    [InlineData(5, 30, 9505)]
    public void TheExtractedCircuitImplementsThePatternsMap(int p, int count, int seed)
    {
        var corpus = CausalCorpus(p, count, seed).ToList();
        Assert.Equal(count, corpus.Count);
        var random = new SeededRandom((ulong)seed);
        int withPrepared = 0, withEdges = 0;
        foreach (var (name, result) in corpus)
        {
            var angles = RandomAngles(result, random);
            var map = ImplementedMap.Of(QuditPattern.FromFlow(result, null, 1, angles.Diagonals())).Matrix;
            var circuit = CausalCircuit.Extract(result, angles);
            var matrix = CircuitMatrix.Of(circuit);
            Assert.Equal(map.RowCount, matrix.RowCount);
            Assert.Equal(map.ColumnCount, matrix.ColumnCount);
            double distance = CircuitMatrix.DistanceUpToPhase(matrix, map);
            Assert.True(distance < Tolerance, $"{name}: circuit and pattern differ by {distance}\n{CircuitWriters.Text(circuit)}");
            if (circuit.Gates.OfType<PreparePlus>().Any()) withPrepared++;
            if (circuit.Gates.OfType<ControlledPhase>().Any()) withEdges++;
            if (p == 2)
            {
                var (qubits, gates) = QasmReader.Read(CircuitWriters.Qasm(circuit));
                Assert.Equal(circuit.Wires.Count, qubits);
                var read = CircuitMatrix.Isometry(2, qubits, CircuitMatrix.Unitary(2, qubits, gates), circuit.InputWires, circuit.OutputWires);
                double qasmDistance = CircuitMatrix.DistanceUpToPhase(read, map);
                Assert.True(qasmDistance < Tolerance, $"{name}: the OpenQASM text differs from the pattern by {qasmDistance}");
            }
        }
        // The corpus must exercise both kinds of wire start and the controlled phases, or the test proves little.
        Assert.True(withPrepared > 0 && withEdges > count / 4, $"F{p}: {withPrepared} circuits with prepared wires, {withEdges} with controlled phases");
    }

    [Theory]
    [InlineData(3, 10, 9313)]
    [InlineData(5, 10, 9515)]
    public void ADifferentWeightOnAFlowStepChangesTheMatrix(int p, int count, int seed)
    {
        // Negative control for the consistency test: replacing F_a by F_1 on a step with a != 1 must show.
        var random = new SeededRandom((ulong)seed);
        int checkedSteps = 0;
        foreach (var (name, result) in CausalCorpus(p, count, seed))
        {
            var angles = RandomAngles(result, random);
            var circuit = CausalCircuit.Extract(result, angles);
            var map = ImplementedMap.Of(QuditPattern.FromFlow(result, null, 1, angles.Diagonals())).Matrix;
            int k = circuit.Gates.ToList().FindIndex(g => g is FourierStep { Weight: not 1 });
            if (k < 0) continue;
            var gates = circuit.Gates.ToList();
            gates[k] = ((FourierStep)gates[k]) with { Weight = 1 };
            var wrong = CircuitMatrix.Of(circuit with { Gates = gates });
            Assert.True(CircuitMatrix.DistanceUpToPhase(wrong, map) > 1e-3, $"{name}: a wrong weight went unseen");
            checkedSteps++;
        }
        Assert.True(checkedSteps > 0);
    }
}
