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

    // More outputs than inputs (docs/noise.md): along every reported finite direction f the sampled
    // outcome-averaged variance is f^T S V_in S^T f + (e^(-2r)/2) |f^T L|^2, and every output quadrature with
    // an anti-squeezed part has (e^(2r)/2) |K_row|^2 on top, at every level: it grows as e^(2r).
    [Fact]
    public void SimulatorMatchesTheFiniteDirectionsWithMoreOutputsThanInputs()
    {
        var corpus = QCertificateCorpus.Certificates(40, seed: 1314, moreOutputs: 2);
        int directions = 0, withNoise = 0, resolved = 0, antiSqueezedRows = 0;
        for (int c = 0; c < corpus.Count; c++)
        {
            var (name, flow, phases) = corpus[c];
            var report = NoiseAnalysis.Analyze(flow, phases);
            Assert.True(report.Valid, name);
            double r = Levels[c % Levels.Length];
            // The whole output covariance, with its e^(2r) part, as for the square case.
            Assert.True(Compare(report, phases, r, new Random(c), name).Agrees, name);
            var run = Sample(report, phases, r, new Random(1000 + c));
            var d = Matrix<double>.Build.DenseOfArray(ToDoubles(report.Directions));
            var dl = Matrix<double>.Build.DenseOfArray(ToDoubles(report.DirectionL));
            var ideal = d * run.S * run.InputCovariance * run.S.Transpose() * d.Transpose();
            var exact = ideal + dl * dl.Transpose() * (Math.Exp(-2 * r) / 2);
            var plain = d * (run.Conditional + run.Spread) * d.Transpose();
            var spread = d * run.Spread * d.Transpose();
            var cv = d * run.ControlVariate * d.Transpose();
            double scale = 1 + exact.Enumerate().Select(Math.Abs).Max();
            double full = 1 + (run.S * run.InputCovariance * run.S.Transpose()).Enumerate().Select(Math.Abs).Max() + Math.Exp(2 * r) * report.Rows;
            for (int i = 0; i < report.DirectionCount; i++)
            {
                directions++;
                // Plain estimate within 6 standard errors of a sample variance; control variate to rounding of the
                // full (anti-squeezed) covariance it is projected from.
                double tolerance = 6 * Math.Sqrt(2 * spread[i, i] * spread[i, i] / Samples) + 1e-9 * full;
                Assert.True(Math.Abs(plain[i, i] - exact[i, i]) <= tolerance, $"{name} {report.DirectionName(i)}: plain {plain[i, i]} exact {exact[i, i]}");
                Assert.True(Math.Abs(cv[i, i] - exact[i, i]) <= 1e-9 * full, $"{name} {report.DirectionName(i)}: cv {cv[i, i]} exact {exact[i, i]}");
                if (report.DirectionVariance(i).IsZero) continue;
                withNoise++;
                if (Math.Abs(cv[i, i] - ideal[i, i]) > 1e-5 * scale) resolved++;
                else output.WriteLine($"{name} {report.DirectionName(i)}: the added noise {exact[i, i] - ideal[i, i]:G3} is not resolved");
            }
            var finite = run.S * run.InputCovariance * run.S.Transpose()
                + Matrix<double>.Build.DenseOfArray(ToDoubles(report.Covariance)) * (Math.Exp(-2 * r) / 2);
            for (int row = 0; row < report.Rows; row++)
            {
                if (report.AntiSqueezedVariance(row).IsZero) continue;
                antiSqueezedRows++;
                double measured = (run.ControlVariate[row, row] - finite[row, row]) / (Math.Exp(2 * r) / 2);
                Assert.Equal(NoiseFigures.ToDouble(report.AntiSqueezedVariance(row)), measured, 6);
            }
        }
        output.WriteLine($"{corpus.Count} certificates, {directions} finite directions, {withNoise} with added noise, {resolved} of them where dropping D L would be detected, {antiSqueezedRows} anti-squeezed output quadratures");
        // The comparison has teeth: leaving the added noise out is detected on every direction that has any.
        Assert.Equal(withNoise, resolved);
        Assert.True(withNoise >= directions / 2, $"{withNoise} of {directions}");
        Assert.True(antiSqueezedRows >= corpus.Count);
    }

    private static double[,] ToDoubles(Rational[,] m)
    {
        var d = new double[m.GetLength(0), m.GetLength(1)];
        for (int i = 0; i < m.GetLength(0); i++)
            for (int j = 0; j < m.GetLength(1); j++) d[i, j] = NoiseFigures.ToDouble(m[i, j]);
        return d;
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
        var run = Sample(report, phases, r, random);
        var (s, inMean, inCov, average, spread, conditional) = (run.S, run.InputMean, run.InputCovariance, run.Average, run.Spread, run.Conditional);
        int rows = report.Rows;
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

        // (2) Control variate (see Sample).
        var (cvMean, cvTotal, residual) = (run.ControlVariateMean, run.ControlVariate, run.Residual);
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

    /// <summary>The moments of one certificate's simulated outputs over <see cref="Samples"/> runs.</summary>
    internal sealed record Moments(Matrix<double> S, Vector<double> InputMean, Matrix<double> InputCovariance, Vector<double> Average,
        Matrix<double> Spread, Matrix<double> Conditional, Vector<double> ControlVariateMean, Matrix<double> ControlVariate, double Residual);

    /// <summary>
    /// Runs the simulator <see cref="Samples"/> times on a random input state: the sample mean and spread of the
    /// conditional means, the mean conditional covariance, and the control-variate estimate, which regresses
    /// the conditional means on [1, z] by least squares (mean: the intercept; spread: B^T B of the slopes B).
    /// </summary>
    internal static Moments Sample(NoiseReport report, IReadOnlyDictionary<int, Rational> phases, double r, Random random)
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
        var s = Matrix<double>.Build.Dense(rows, Math.Max(2 * k, 2), (i, j) => j < 2 * k ? ToDouble(report.S[i, j]) : 0);
        int d = innovations[0].Length;
        var x = Matrix<double>.Build.Dense(Samples, d + 1, (n, c) => c == 0 ? 1 : innovations[n][c - 1]);
        var y = Matrix<double>.Build.Dense(Samples, rows, (n, c) => means[n][c]);
        var coefficients = x.QR().Solve(y); // (d + 1) x rows
        var residual = (x * coefficients - y).Enumerate().Select(Math.Abs).DefaultIfEmpty(0).Max();
        var b = coefficients.SubMatrix(1, d, 0, rows);
        return new Moments(s, inMean, inCov, average, spread, conditional, coefficients.Row(0), conditional + b.TransposeThisAndMultiply(b), residual);
    }

    /// <summary>A random input state: thermal-like diagonal covariance (each nu >= 1) through random symplectic shears.</summary>
    private static (Vector<double>, Matrix<double>) RandomInputState(int modes, Random random)
    {
        // No input: a placeholder mode that no node reads (the S of the report is padded with zero columns).
        if (modes == 0) return (Vector<double>.Build.Dense(2), Matrix<double>.Build.Dense(2, 2));
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
