using System.Numerics;
using FlowCert.Algebra;
using FlowCert.Circuits;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Simulation;
using FlowCert.Tests.Circuits;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// The implemented map of wires, against matrices written by hand. Conventions (docs/circuits.md): a
/// qubit measured at angle a in the XY plane has outcome-0 vector (|0> + e^(i a)|1>)/sqrt 2; a qudit's
/// parameter is the diagonal D with outcome-k vector D^dagger Z^k |+> (flows.md section 7).
/// </summary>
public class WireMapTests
{
    private static readonly MatrixBuilder<Complex> M = Matrix<Complex>.Build;

    private static FlowResult Wire(int length, int p, int weight = 1)
    {
        var text = $"input a0\noutput a{length - 1}\n" + string.Concat(Enumerable.Range(0, length - 1).Select(k => $"edge a{k} a{k + 1} {weight}\n"));
        return FlowSolver.Solve(OgraphReader.Parse(text, "wire.ograph"), FieldSpec.PrimeField((ulong)p), FlowKind.Causal);
    }

    private static Matrix<Complex> Map(FlowResult r, MeasurementAngles angles)
        => ImplementedMap.Of(QuditPattern.FromFlow(r, null, 1, angles.Diagonals())).Matrix;

    /// <summary>Every branch, compared with the claim (what --expect does); returns the largest entry difference.</summary>
    private static MapComparison Expect(FlowResult r, MeasurementAngles angles, Matrix<Complex> claim)
        => MapComparison.Run(QuditPattern.FromFlow(r, null, 1, angles.Diagonals()), claim, OutcomeBranches.All);

    private static Matrix<Complex> FourierByHand(int p)
    {
        var w = Complex.FromPolarCoordinates(1, 2 * Math.PI / p);
        return M.Dense(p, p, (k, j) => Complex.Pow(w, j * k) / Math.Sqrt(p));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.7)]
    [InlineData(-2.3)]
    [InlineData(Math.PI / 2)]
    public void ATwoNodeQubitWireImplementsHTimesPOfMinusA(double a)
    {
        // "Determinism in the one-way model", arXiv:quant-ph/0506062: the two-node pattern implements
        // J(-a) = H P(-a) when measured at angle a (common practice for the sign).
        var r = Wire(2, 2);
        var angles = new MeasurementAngles(2, new Dictionary<int, double[]> { [r.Graph.IndexOf("a0")] = MeasurementAngles.QubitAngle(a) });
        double s = 1 / Math.Sqrt(2);
        var h = M.DenseOfArray(new Complex[,] { { s, s }, { s, -s } });
        var phase = M.DenseOfDiagonalArray([Complex.One, Complex.FromPolarCoordinates(1, -a)]);
        var claim = h * phase;
        var comparison = Expect(r, angles, claim);
        Assert.True(comparison.Agrees, $"largest difference {comparison.Largest}");
        Assert.True(CircuitMatrix.DistanceUpToPhase(Map(r, angles), claim) < 1e-12);
        if (Math.Abs(Math.Sin(a)) > 0.1)
        {
            // The opposite sign, H P(a), is a different gate unless a = 0 or pi: the sign is tested, not assumed.
            var opposite = h * M.DenseOfDiagonalArray([Complex.One, Complex.FromPolarCoordinates(1, a)]);
            Assert.False(Expect(r, angles, opposite).Agrees);
        }
    }

    [Fact]
    public void AThreeNodeQubitWireAtAngleZeroIsTheIdentity()
    {
        // arXiv:quant-ph/0506062: H P(0) H P(0) = 1.
        var r = Wire(3, 2);
        var comparison = Expect(r, new MeasurementAngles(2, new Dictionary<int, double[]>()), M.DenseIdentity(2));
        Assert.True(comparison.Agrees, $"largest difference {comparison.Largest}");
    }

    [Theory]
    [InlineData(3, 1)]
    [InlineData(3, 2)]
    [InlineData(5, 1)]
    [InlineData(5, 3)]
    public void ATwoNodeQuditWireImplementsTheFourierGateTimesTheDiagonalPhase(int p, int weight)
    {
        // flows.md section 7: outcome 0 projects on D^dagger |+>, leaving F_a D with F_a[k][j] = w^(a j k) / sqrt p
        // (for weight a = 1 the Fourier gate F; common knowledge for the qudit teleportation step).
        var r = Wire(2, p, weight);
        var random = new SeededRandom((ulong)(10 * p + weight));
        var theta = Enumerable.Range(0, p).Select(_ => 2 * Math.PI * random.NextDouble()).ToArray();
        var angles = new MeasurementAngles(p, new Dictionary<int, double[]> { [r.Graph.IndexOf("a0")] = theta });
        var f = FourierByHand(p);
        var scaled = M.Dense(p, p, (k, j) => f[(k * weight) % p, j]); // F_a[k][j] = F[a k][j]
        var claim = scaled * M.DenseOfDiagonalArray(theta.Select(t => Complex.FromPolarCoordinates(1, t)).ToArray());
        var comparison = Expect(r, angles, claim);
        Assert.True(comparison.Agrees, $"largest difference {comparison.Largest}");
    }

    [Theory]
    [InlineData(3)]
    [InlineData(5)]
    public void AFiveNodeQuditWireAtPhaseZeroIsTheIdentityAndAThreeNodeWireIsTheParity(int p)
    {
        // Common knowledge: F^4 = 1 and F^2 |j> = |-j> (the parity map) for the p x p Fourier matrix.
        var none = new MeasurementAngles(p, new Dictionary<int, double[]>());
        Assert.True(Expect(Wire(5, p), none, M.DenseIdentity(p)).Agrees);
        var parity = M.Dense(p, p, (k, j) => (j + k) % p == 0 ? Complex.One : Complex.Zero);
        Assert.True(Expect(Wire(3, p), none, parity).Agrees);
        Assert.False(Expect(Wire(3, p), none, M.DenseIdentity(p)).Agrees); // F^2 is not 1 for p > 2
        var f = FourierByHand(p);
        Assert.True(CircuitMatrix.DistanceUpToPhase(f * f, parity) < 1e-12);
    }

    [Fact]
    public void TheCircuitOfAWireIsItsFourierSteps()
    {
        var r = Wire(4, 3, 2);
        var circuit = CausalCircuit.Extract(r);
        Assert.Single(circuit.Wires);
        Assert.Equal(3, circuit.Gates.Count);
        Assert.All(circuit.Gates, g => Assert.Equal(2, Assert.IsType<FourierStep>(g).Weight));
    }
}
