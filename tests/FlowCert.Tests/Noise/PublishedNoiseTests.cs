using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Noise;

namespace FlowCert.Tests.Noise;

public class PublishedNoiseTests
{
    internal static FlowResult Certify(string ograph, FlowKind kind = FlowKind.General)
    {
        var g = OgraphReader.Parse(ograph, "test.ograph");
        var solved = FlowSolver.Solve(g, FieldSpec.Rationals, kind);
        Assert.True(solved.HasFlow);
        return CertificateReader.Parse(CertificateWriter.Write(solved), "test.json");
    }

    // "Quantum computing with continuous-variable clusters", Phys. Rev. A 79, 062318 (2009), arXiv:0903.3233:
    // one teleportation step through a weight-1 edge with phase 0 implements a Fourier transform and adds
    // the squeezed variance e^(-2r)/2 to one output quadrature only.
    [Fact]
    public void OneTeleportationStepAddsTheSqueezedVarianceToOneQuadratureOnly()
    {
        var report = NoiseAnalysis.Analyze(Certify("input a\noutput b\nedge a b 1\n"));
        Assert.True(report.Valid);
        Assert.Equal(Rational.Zero, report.AddedVariance(0));  // b q = -p_a: noiseless
        Assert.Equal(Rational.One, report.AddedVariance(1));   // b p = q_a + delta_b: one e^(-2r)/2
        Assert.Equal(Rational.Zero, report.Covariance[0, 1]);
        // The ideal map is the Fourier transform q -> -p, p -> q.
        Assert.Equal(new Rational[,] { { 0, -1 }, { 1, 0 } }, report.S);
    }

    // "Teleportation of continuous quantum variables", Phys. Rev. Lett. 80, 869 (1998),
    // doi:10.1103/PhysRevLett.80.869: with an EPR resource of squeezing r' the coherent-state fidelity is
    // 1/(1 + e^(-2r')). A three-node weight-1 wire adds e^(-2r)/2 to each quadrature; the teleporter of that
    // paper adds 2 e^(-2r') vacuum variances = e^(-2r'), so the wire is that teleporter with
    // r' = r + ln(2)/2 (derived in docs/noise.md).
    [Theory]
    [InlineData(0.0)]
    [InlineData(3.0)]
    [InlineData(10.0)]
    [InlineData(15.5)]
    public void ThreeNodeWireHasTheCoherentStateTeleportationFidelity(double decibels)
    {
        var report = NoiseAnalysis.Analyze(Certify("input a\noutput c\nedge a b 1\nedge b c 1\n"));
        Assert.True(report.Valid);
        Assert.Equal(Rational.One, report.AddedVariance(0));
        Assert.Equal(Rational.One, report.AddedVariance(1));
        double r = NoiseFigures.SqueezingParameter(decibels);
        double rPrime = r + Math.Log(2) / 2;
        double published = 1 / (1 + Math.Exp(-2 * rPrime));
        Assert.Equal(published, NoiseFigures.CoherentStateFidelity(report, r), 12);
        // And the relation is not an identity that any r' would satisfy: r' = r gives another number.
        Assert.NotEqual(1 / (1 + Math.Exp(-2 * r)), NoiseFigures.CoherentStateFidelity(report, r), 6);
    }

    // 10 dB of squeezing is r = ln(10)/2 ~ 1.1513 (common practice: dB = 10 log10(e^(2r))).
    [Fact]
    public void TenDecibelsIsROfHalfLnTenBothWays()
    {
        Assert.Equal(1.1513, NoiseFigures.SqueezingParameter(10), 4);
        Assert.Equal(Math.Log(10) / 2, NoiseFigures.SqueezingParameter(10), 14);
        Assert.Equal(10, NoiseFigures.Decibels(Math.Log(10) / 2), 12);
        Assert.Equal(3, NoiseFigures.Decibels(NoiseFigures.SqueezingParameter(3)), 12);
    }
}

public class FidelityFormulaTests
{
    // The fidelity of a pure state with a state rho is the overlap Tr(rho_1 rho_2) = 2 pi * integral of
    // W_1 W_2 over phase space (hbar = 1; common practice). Integrating the two Gaussian Wigner functions
    // numerically (MathNet.Numerics quadrature rule) checks the closed form 1/sqrt(det(S S^T + N)) on the
    // loop wire, whose S = diag(-3/4, -4/3) is not orthogonal.
    [Theory]
    [InlineData(0.0)]
    [InlineData(6.0)]
    public void TheClosedFormMatchesTheWignerOverlap(double decibels)
    {
        var report = NoiseAnalysis.Analyze(PublishedNoiseTests.Certify(
            "input t0\noutput t4\nedge t0 t1 1\nedge t1 t2 -1/2\nedge t2 t3 0.75\nedge t3 t4 2\n"));
        double r = NoiseFigures.SqueezingParameter(decibels);
        var n = NoiseFigures.AddedCovariance(report, r);
        double s00 = NoiseFigures.ToDouble(report.S[0, 0]), s01 = NoiseFigures.ToDouble(report.S[0, 1]);
        double s10 = NoiseFigures.ToDouble(report.S[1, 0]), s11 = NoiseFigures.ToDouble(report.S[1, 1]);
        // Ideal output S|alpha> (alpha = 0 suffices: both states have the same mean) and the noisy one.
        double[,] ideal = { { (s00 * s00 + s01 * s01) / 2, (s00 * s10 + s01 * s11) / 2 }, { (s00 * s10 + s01 * s11) / 2, (s10 * s10 + s11 * s11) / 2 } };
        double[,] noisy = { { ideal[0, 0] + n[0, 0], ideal[0, 1] + n[0, 1] }, { ideal[1, 0] + n[1, 0], ideal[1, 1] + n[1, 1] } };
        double overlap = 2 * Math.PI * MathNet.Numerics.Integration.GaussLegendreRule.Integrate(
            (q, p) => Wigner(ideal, q, p) * Wigner(noisy, q, p), -12, 12, -12, 12, 128);
        Assert.Equal(overlap, NoiseFigures.CoherentStateFidelity(report, r), 8);
    }

    private static double Wigner(double[,] c, double q, double p)
    {
        double det = c[0, 0] * c[1, 1] - c[0, 1] * c[1, 0];
        double quadratic = (c[1, 1] * q * q - 2 * c[0, 1] * q * p + c[0, 0] * p * p) / det;
        return Math.Exp(-quadratic / 2) / (2 * Math.PI * Math.Sqrt(det));
    }
}
