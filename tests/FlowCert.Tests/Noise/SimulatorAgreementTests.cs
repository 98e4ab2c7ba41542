using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Noise;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using Xunit.Abstractions;

namespace FlowCert.Tests.Noise;

/// <summary>
/// The exact model against the independent Gaussian simulator: over many sampled outcome records, the
/// outcome-averaged output covariance (mean conditional covariance plus the spread of the conditional
/// means) must equal S V_in S^T + (e^(-2r)/2) L L^T (+ (e^(2r)/2) K K^T), and the average mean S mu_in,
/// within statistical error.
/// </summary>
public class SimulatorAgreementTests(ITestOutputHelper output)
{
    private const int Samples = 400;
    // Squeezing levels r (0.87, 3.0, 6.1 and 10 dB): at low squeezing the added noise stands well above the
    // statistical error of the sampled means; at 10 dB the comparison still has to agree.
    private static readonly double[] Levels = [0.1, 0.35, 0.7, NoiseFigures.SqueezingParameter(10)];

    [Fact]
    public void SimulatorMatchesTheExactNoiseOnFiftySixCertificates()
    {
        var corpus = QCertificateCorpus.Certificates(56, seed: 1313);
        Assert.True(corpus.Count >= 50);
        int resolved = 0, withNoise = 0, resolvedAt10 = 0, at10 = 0;
        for (int c = 0; c < corpus.Count; c++)
        {
            var (name, flow, phases) = corpus[c];
            var report = NoiseAnalysis.Analyze(flow, phases);
            Assert.True(report.Valid, name);
            double r = Levels[c % Levels.Length];
            var (agrees, withoutNoiseFails) = Compare(report, phases, r, new Random(c), name);
            Assert.True(agrees, name);
            if (!report.Covariance.Cast<Rational>().Any(x => !x.IsZero)) continue;
            if (c % Levels.Length == Levels.Length - 1)
            {
                at10++;
                if (withoutNoiseFails) resolvedAt10++;
            }
            else
            {
                withNoise++;
                if (withoutNoiseFails) resolved++;
            }
        }
        output.WriteLine($"{corpus.Count} certificates; below 10 dB: {withNoise} with added noise, {resolved} where dropping L would be detected; at 10 dB: {resolvedAt10} of {at10}");
        // The comparison has teeth: leaving the added noise out is detected on every certificate that has any.
        Assert.Equal(withNoise, resolved);
        Assert.Equal(at10, resolvedAt10);
    }

    [Fact]
    public void SimulatorSeesTheAntiSqueezedNoiseOfACorruptedCertificate()
    {
        int checkedCount = 0;
        foreach (var (name, flow, phases) in QCertificateCorpus.Certificates(12, seed: 77))
        {
            var corrupted = NegativeControlTests.Corrupt(flow);
            if (corrupted is null) continue;
            var report = NoiseAnalysis.Analyze(corrupted, phases);
            Assert.False(report.Valid, name);
            Assert.True(Compare(report, phases, 0.6, new Random(checkedCount), name).Agrees, name);
            checkedCount++;
        }
        Assert.True(checkedCount >= 5);
    }

    /// <summary>
    /// Runs the simulator and compares two estimates of the outcome-averaged output moments with the exact
    /// model: (1) the plain sample estimate, within 6 standard errors; (2) a control-variate estimate that
    /// regresses the conditional means on the sampled innovations z (whose covariance is the identity by
    /// construction): mean a and spread B B^T, exact up to rounding when the conditional mean is affine in z,
    /// which the residuals check. Agrees only when both agree; WithoutNoiseFails: estimate (2) would
    /// reject the model with the added noise left out.
    /// </summary>
    private static (bool Agrees, bool WithoutNoiseFails) Compare(NoiseReport report, IReadOnlyDictionary<int, Rational> phases, double r, Random random, string name)
    {
        int k = report.Inputs.Count;
        var (inMean, inCov) = RandomInputState(k, random);
        var sim = new GaussianPatternSimulator(report.Flow, r, phases.ToDictionary(p => p.Key, p => ToDouble(p.Value)));
        int rows = report.Rows;
        var means = new List<Vector<double>>();
        var innovations = new List<double[]>();
        var conditional = Matrix<double>.Build.Dense(rows, rows);
        for (int sample = 0; sample < Samples; sample++)
        {
            var (m, cov, z) = sim.Run(inMean, inCov, random);
            means.Add(m);
            innovations.Add(z);
            conditional += cov / Samples;
        }
        var average = means.Aggregate(Vector<double>.Build.Dense(rows), (a, b) => a + b) / Samples;
        var spread = Matrix<double>.Build.Dense(rows, rows);
        foreach (var m in means) spread += (m - average).OuterProduct(m - average) / (Samples - 1);

        var s = Matrix<double>.Build.Dense(rows, 2 * k, (i, j) => ToDouble(report.S[i, j]));
        var ideal = s * inCov * s.Transpose();
        var exact = ideal + Matrix<double>.Build.DenseOfArray(NoiseFigures.AddedCovariance(report, r));
        var exactMean = s * inMean;

        // (1) Plain estimate: statistical tolerance of a sample mean and a sample covariance of Gaussians.
        bool agrees = true;
        for (int i = 0; i < rows; i++)
        {
            if (Math.Abs(average[i] - exactMean[i]) > 6 * Math.Sqrt(spread[i, i] / Samples) + 1e-7 * (1 + Math.Abs(exactMean[i]))) agrees = false;
            for (int j = 0; j < rows; j++)
            {
                double tolerance = 6 * Math.Sqrt((spread[i, i] * spread[j, j] + spread[i, j] * spread[i, j]) / Samples) + 1e-7 * (1 + Math.Abs(exact[i, j]));
                if (Math.Abs(conditional[i, j] + spread[i, j] - exact[i, j]) > tolerance) agrees = false;
            }
        }

        // (2) Control variate: least squares of the means on [1, z].
        int d = innovations[0].Length;
        var x = Matrix<double>.Build.Dense(Samples, d + 1, (n, c) => c == 0 ? 1 : innovations[n][c - 1]);
        var y = Matrix<double>.Build.Dense(Samples, rows, (n, c) => means[n][c]);
        var coefficients = x.QR().Solve(y); // (d + 1) x rows
        var residual = (x * coefficients - y).Enumerate().Select(Math.Abs).DefaultIfEmpty(0).Max();
        var b = coefficients.SubMatrix(1, d, 0, rows);
        var cvMean = coefficients.Row(0);
        var cvTotal = conditional + b.TransposeThisAndMultiply(b);
        double scale = 1 + exact.Enumerate().Select(Math.Abs).Max();
        if (residual > 1e-8 * scale * 100) agrees = false;
        bool withoutNoiseFails = false;
        for (int i = 0; i < rows; i++)
        {
            if (Math.Abs(cvMean[i] - exactMean[i]) > 1e-7 * scale) agrees = false;
            for (int j = 0; j < rows; j++)
            {
                if (Math.Abs(cvTotal[i, j] - exact[i, j]) > 1e-7 * scale) agrees = false;
                if (Math.Abs(cvTotal[i, j] - ideal[i, j]) > 1e-5 * scale) withoutNoiseFails = true;
            }
        }
        if (!agrees || Environment.GetEnvironmentVariable("NOISE_DEBUG") is not null)
            Console.Error.WriteLine($"{name} r={r:F2} residual={residual:G3} max|cv-exact|={(cvTotal - exact).Enumerate().Select(Math.Abs).Max():G3} max|plain-exact|={(conditional + spread - exact).Enumerate().Select(Math.Abs).Max():G3} scale={scale:G3}");
        return (agrees, withoutNoiseFails);
    }

    /// <summary>A random input state: thermal-like diagonal covariance (each nu >= 1) through random symplectic shears.</summary>
    private static (Vector<double>, Matrix<double>) RandomInputState(int modes, Random random)
    {
        var mean = Vector<double>.Build.Dense(2 * modes, _ => Normal.Sample(random, 0, 1));
        var d = Matrix<double>.Build.Dense(2 * modes, 2 * modes);
        for (int i = 0; i < modes; i++)
        {
            double nu = 1 + 2 * random.NextDouble();
            d[2 * i, 2 * i] = nu / 2;
            d[2 * i + 1, 2 * i + 1] = nu / 2;
        }
        var t = Matrix<double>.Build.DenseIdentity(2 * modes);
        for (int step = 0; step < 3 * modes; step++)
        {
            var m = Matrix<double>.Build.DenseIdentity(2 * modes);
            int a = random.Next(modes), b = random.Next(modes);
            double x = 2 * random.NextDouble() - 1;
            if (a == b) { if (random.Next(2) == 0) m[2 * a + 1, 2 * a] = x; else m[2 * a, 2 * a + 1] = x; }
            else { m[2 * a + 1, 2 * b] = x; m[2 * b + 1, 2 * a] = x; }
            t = m * t;
        }
        return (mean, t * d * t.Transpose());
    }

    private static double ToDouble(Rational x) => (double)x.Numerator / (double)x.Denominator;
}
