using System.Numerics;
using FlowCert.Graphs;
using FlowCert.Simulation;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// Textbook check of the simulator's primitives with no flow machinery (common practice: one-bit
/// teleportation). Input a, output b, edge a-b: measuring a in the basis |b_s> = D^dagger Z^s |+> with
/// D = diag(1, e^(i alpha)) leaves (1/sqrt 2) X^s H P(alpha) as the map from a to b, where
/// P(alpha) = diag(1, e^(i alpha)) and X^s is the known byproduct. The qutrit analogue leaves
/// (1/sqrt 3) X^s F D with F the 3 x 3 Fourier matrix F[y][x] = w^(x y) / sqrt 3.
/// Matrices below are written by hand, entry by entry, and compared exactly (no phase freedom).
/// </summary>
public class TeleportationTests
{
    private static readonly OpenGraph Wire = OgraphReader.Parse("input a\noutput b\nedge a b\n", "wire.ograph");

    /// <summary>The map a -> b of outcome s, from the primitives alone: prepare, project, read out.</summary>
    private static Matrix<Complex> Simulated(int p, Complex[] diagonal, int s)
    {
        int a = Wire.IndexOf("a"), b = Wire.IndexOf("b");
        var register = GraphState.Prepare(Wire, p).Project(a, QuditOperators.OutcomeBra(diagonal, s));
        // The reference holds 1/sqrt(p) of every input basis state: scale back to the map itself.
        return register.ToMatrix([b], [GraphState.ReferenceLabel(a)]) * new Complex(Math.Sqrt(p), 0);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.7)]
    [InlineData(-2.3)]
    public void AQubitWireTeleportsHTimesThePhaseGateUpToTheXByproduct(double alpha)
    {
        var e = Complex.FromPolarCoordinates(1, alpha);
        double r = 1 / Math.Sqrt(2);
        // H P(alpha) = (1/sqrt 2) [[1, e], [1, -e]] by hand; with 1/sqrt 2 from the measurement: factor 1/2.
        var hp = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { r, r * e }, { r, -r * e } });
        var byproduct = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { 0, 1 }, { 1, 0 } });
        for (int s = 0; s < 2; s++)
        {
            var expected = (s == 0 ? hp : byproduct * hp) * new Complex(r, 0);
            var actual = Simulated(2, [Complex.One, e], s);
            Assert.True((actual - expected).FrobeniusNorm() < 1e-12, $"outcome {s}: got {actual}, expected {expected}");
        }
    }

    [Fact]
    public void AQutritWireTeleportsTheFourierMatrixTimesDUpToTheXByproduct()
    {
        var w = new Complex(-0.5, Math.Sqrt(3) / 2); // exp(2 pi i / 3), by hand
        var w2 = new Complex(-0.5, -Math.Sqrt(3) / 2);
        double r = 1 / Math.Sqrt(3);
        var f = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { r, r, r }, { r, r * w, r * w2 }, { r, r * w2, r * w } });
        Complex[] d = [Complex.FromPolarCoordinates(1, 0.4), Complex.FromPolarCoordinates(1, -1.1), Complex.FromPolarCoordinates(1, 2.5)];
        var dm = Matrix<Complex>.Build.DenseOfDiagonalArray(d);
        var shift = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { 0, 0, 1 }, { 1, 0, 0 }, { 0, 1, 0 } }); // X|j> = |j+1>
        var byproduct = Matrix<Complex>.Build.DenseIdentity(3);
        for (int s = 0; s < 3; s++)
        {
            var expected = byproduct * f * dm * new Complex(r, 0);
            var actual = Simulated(3, d, s);
            Assert.True((actual - expected).FrobeniusNorm() < 1e-12, $"outcome {s}: got {actual}, expected {expected}");
            byproduct = shift * byproduct;
        }
    }

    [Fact]
    public void TheOperatorsMatchTheirDefinitions()
    {
        // flows.md section 7: X|j> = |j+1>, Z|j> = w^j |j>, so Z X = w X Z (common practice).
        for (int p = 2; p <= 5; p += p == 2 ? 1 : 2)
        {
            var x = QuditOperators.Shift(p, 1);
            var z = QuditOperators.Clock(p, 1);
            for (int j = 0; j < p; j++) Assert.Equal(Complex.One, x[(j + 1) % p, j]);
            Assert.True((z * x - x * z * QuditOperators.RootOfUnity(p, 1)).FrobeniusNorm() < 1e-12);
            // D' = X^a D X^-a has D's (j - a)-th entry at j.
            Complex[] d = Enumerable.Range(0, p).Select(k => Complex.FromPolarCoordinates(1, 0.3 * k + 0.1)).ToArray();
            var adapted = Matrix<Complex>.Build.DenseOfDiagonalArray(QuditOperators.AdaptedAngle(d, 1));
            Assert.True((adapted - x * Matrix<Complex>.Build.DenseOfDiagonalArray(d) * QuditOperators.Shift(p, -1)).FrobeniusNorm() < 1e-12);
        }
    }
}
