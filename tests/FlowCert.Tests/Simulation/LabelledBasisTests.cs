using System.Numerics;
using FlowCert.Graphs;
using FlowCert.Simulation;
using MathNet.Numerics.LinearAlgebra;
using Vector = MathNet.Numerics.LinearAlgebra.Vector<System.Numerics.Complex>;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// The measured states of each label are the eigenvectors of that label's observable, with the angle's
/// sign as published: outcome 0 is the +1 eigenvector of cos(a) X + sin(a) Y (XY), cos(a) Z + sin(a) X (XZ),
/// cos(a) Z + sin(a) Y (YZ), and of X, Y, Z for the Pauli labels; outcome 1 is the -1 eigenvector. The
/// planes and their states |+_(XY,a)&gt; = (|0&gt; + e^(ia)|1&gt;)/sqrt 2, |+_(XZ,a)&gt; = cos(a/2)|0&gt; + sin(a/2)|1&gt;,
/// |+_(YZ,a)&gt; = cos(a/2)|0&gt; + i sin(a/2)|1&gt; are those of "Generalized flow and determinism in
/// measurement-based quantum computation" (arXiv:quant-ph/0702212; the observables written from memory
/// of that definition). The products are computed with MathNet.Numerics, outside the project.
/// </summary>
public class LabelledBasisTests
{
    private static readonly Complex I = Complex.ImaginaryOne;
    private static readonly Matrix<Complex> X = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { 0, 1 }, { 1, 0 } });
    private static readonly Matrix<Complex> Y = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { 0, -I }, { I, 0 } });
    private static readonly Matrix<Complex> Z = Matrix<Complex>.Build.DenseOfArray(new Complex[,] { { 1, 0 }, { 0, -1 } });

    private static Matrix<Complex> Observable(MeasurementLabel label, double a) => label switch
    {
        MeasurementLabel.XY => X * Math.Cos(a) + Y * Math.Sin(a),
        MeasurementLabel.XZ => Z * Math.Cos(a) + X * Math.Sin(a),
        MeasurementLabel.YZ => Z * Math.Cos(a) + Y * Math.Sin(a),
        MeasurementLabel.X => X,
        MeasurementLabel.Y => Y,
        _ => Z,
    };

    [Fact]
    public void EachOutcomeIsAnEigenvectorOfItsLabelsObservable()
    {
        var rng = new Random(20261202);
        var checks = 0;
        foreach (var label in Enum.GetValues<MeasurementLabel>())
            for (var trial = 0; trial < 60; trial++)
            {
                // D = e^(i phi) diag(1, e^(-i a)) (MeasurementAngles): a global phase on D must not matter.
                var (a, phi) = ((rng.NextDouble() * 2 - 1) * Math.PI, rng.NextDouble() * 2 * Math.PI);
                Complex[] d = [Complex.FromPolarCoordinates(1, phi), Complex.FromPolarCoordinates(1, phi - a)];
                var m = Observable(label, a);
                for (var k = 0; k < 2; k++)
                {
                    var v = Vector.Build.DenseOfArray(LabelledBasis.Ket(label, d, k));
                    Assert.Equal(1, v.L2Norm(), 12);
                    var residual = (m * v - v * (k == 0 ? 1 : -1)).L2Norm();
                    Assert.True(residual < 1e-12, $"{label}, a = {a}, outcome {k}: |M v - (-1)^k v| = {residual}");
                    checks++;
                }
            }
        Assert.Equal(6 * 60 * 2, checks);
    }

    [Fact]
    public void TheFrameIsAppliedAsAnOperatorToTheBasis()
    {
        // FramedBra(k, a, b) is the bra of X^a Z^b |psi_k>: checked against the MathNet product for every
        // label, frame and outcome at one angle (common practice: a Pauli frame conjugates the measurement).
        const double angle = 0.7;
        Complex[] d = [1, Complex.FromPolarCoordinates(1, -angle)];
        foreach (var label in Enum.GetValues<MeasurementLabel>())
            for (var a = 0; a < 2; a++)
                for (var b = 0; b < 2; b++)
                    for (var k = 0; k < 2; k++)
                    {
                        var frame = (a == 1 ? X : Matrix<Complex>.Build.DenseIdentity(2)) * (b == 1 ? Z : Matrix<Complex>.Build.DenseIdentity(2));
                        var expected = (frame * Vector.Build.DenseOfArray(LabelledBasis.Ket(label, d, k))).Conjugate();
                        var bra = Vector.Build.DenseOfArray(LabelledBasis.FramedBra(label, d, a, b, k));
                        Assert.True((bra - expected).L2Norm() < 1e-12, $"{label}, frame X^{a} Z^{b}, outcome {k}");
                    }
    }
}
