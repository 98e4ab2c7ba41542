using FlowCert.Circuits;
using FlowCert.Simulation;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Circuits;

/// <summary>
/// The JSON circuit is valid JSON (RFC 8259, read with Newtonsoft.Json) describing the same wires and gates,
/// whose angles read back to the same doubles; the writers are deterministic; OpenQASM is refused for p != 2.
/// </summary>
public class CircuitFormatTests
{
    [Theory]
    [InlineData(2, 9602)]
    [InlineData(3, 9603)]
    [InlineData(5, 9605)]
    public void TheJsonCircuitDescribesTheSameGates(int p, int seed)
    {
        var random = new SeededRandom((ulong)seed);
        foreach (var (name, result) in CircuitConsistencyTests.CausalCorpus(p, 10, seed))
        {
            var circuit = CausalCircuit.Extract(result, CircuitConsistencyTests.RandomAngles(result, random));
            var text = CircuitWriters.Json(circuit);
            Assert.Equal(text, CircuitWriters.Json(circuit));
            var json = JObject.Parse(text);
            Assert.Equal("flowcert-circuit", (string?)json["format"]);
            Assert.Equal(p, (int)json["dimension"]!);
            var gates = (JArray)json["gates"]!;
            Assert.Equal(circuit.Gates.Count, gates.Count);
            for (int k = 0; k < gates.Count; k++)
            {
                var g = gates[k];
                switch (circuit.Gates[k])
                {
                    case FourierStep f:
                        Assert.Equal("fourier", (string?)g["gate"]);
                        Assert.Equal(f.Weight, (int)g["weight"]!);
                        Assert.Equal(result.Graph.Names[f.To], (string?)g["to"]);
                        break;
                    case DiagonalPhase d:
                        Assert.Equal("phase", (string?)g["gate"]);
                        Assert.Equal(d.Theta, ((JArray)g["theta"]!).Select(t => (double)t).ToArray());
                        break;
                    case ControlledPhase c:
                        Assert.Equal("cz", (string?)g["gate"]);
                        Assert.Equal(c.Weight, (int)g["weight"]!);
                        break;
                    case PreparePlus x:
                        Assert.Equal("prepare", (string?)g["gate"]);
                        Assert.Equal(x.Wire, (int)g["wire"]!);
                        break;
                }
            }
            Assert.Equal(circuit.Wires.Count, ((JArray)json["wires"]!).Count);
            if (p != 2) Assert.Throws<CircuitException>(() => CircuitWriters.Qasm(circuit));
            Assert.Contains($"field F{p}", CircuitWriters.Text(circuit));
        }
    }
}
