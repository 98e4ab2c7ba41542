using FlowCert.Flows;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Tests.Noise;

/// <summary>
/// An independent floating-point Gaussian-state simulator (MathNet.Numerics): mean vector and covariance
/// matrix of all modes in the order (q_0, p_0, q_1, p_1, ...), hbar = 1, vacuum 1/2. It prepares the
/// squeezed modes, applies every edge and phase as a symplectic matrix in the Schrödinger picture, then
/// performs the homodyne measurements one at a time, round by round: it samples each outcome from the
/// current Gaussian, conditions the state on it, and displaces the later modes by the feed-forward of
/// flows.md section 7. It shares no code with src/FlowCert/Noise (it reads only the certificate).
/// </summary>
public sealed class GaussianPatternSimulator
{
    private readonly FlowResult flow;
    private readonly double r;
    private readonly IReadOnlyDictionary<int, double> phases;
    private readonly int n;

    public GaussianPatternSimulator(FlowResult flow, double r, IReadOnlyDictionary<int, double> phases)
    {
        this.flow = flow;
        this.r = r;
        this.phases = phases;
        n = flow.Graph.NodeCount;
    }

    private static int Q(int v) => 2 * v;
    private static int P(int v) => 2 * v + 1;

    /// <summary>
    /// The output modes' mean and covariance after one run with sampled outcomes, and the standardized
    /// innovations z = (outcome - predicted mean) / predicted standard deviation, one per measurement in order
    /// (independent standard normals by construction).
    /// </summary>
    public (Vector<double> Mean, Matrix<double> Covariance, double[] Innovations) Run(Vector<double> inputMean, Matrix<double> inputCovariance, Random random)
    {
        var g = flow.Graph;
        var inputs = g.SortedInputs;
        var mean = Vector<double>.Build.Dense(2 * n);
        var cov = Matrix<double>.Build.Dense(2 * n, 2 * n);
        for (int v = 0; v < n; v++)
            if (!g.Inputs.Contains(v))
            {
                cov[Q(v), Q(v)] = Math.Exp(2 * r) / 2;
                cov[P(v), P(v)] = Math.Exp(-2 * r) / 2;
            }
        for (int i = 0; i < inputs.Length; i++)
            for (int a = 0; a < 2; a++)
            {
                mean[2 * inputs[i] + a] = inputMean[2 * i + a];
                for (int j = 0; j < inputs.Length; j++)
                    for (int b = 0; b < 2; b++)
                        cov[2 * inputs[i] + a, 2 * inputs[j] + b] = inputCovariance[2 * i + a, 2 * j + b];
            }
        // exp(i a q_u q_v): the Heisenberg map x -> M x with p_u += a q_v, p_v += a q_u (two shears).
        foreach (var e in g.Edges)
        {
            double w = (double)e.Weight.Numerator / (double)e.Weight.Denominator;
            Shear(mean, cov, P(e.U), Q(e.V), w);
            Shear(mean, cov, P(e.V), Q(e.U), w);
        }
        var innovations = new List<double>();
        var later = new bool[n];
        for (int v = 0; v < n; v++) later[v] = true;
        foreach (var round in flow.Rounds)
        {
            foreach (var v in round) later[v] = false;
            foreach (var v in round)
            {
                if (phases.TryGetValue(v, out var t) && t != 0)
                {
                    Shear(mean, cov, P(v), Q(v), t);
                }
                // Homodyne detection of p_v: sample the outcome, then condition the Gaussian on it.
                int k = P(v);
                double variance = cov[k, k];
                double innovation = Normal.Sample(random, 0, 1);
                double outcome = mean[k] + Math.Sqrt(variance) * innovation;
                innovations.Add(innovation);
                var column = cov.Column(k);
                mean.Add(column * ((outcome - mean[k]) / variance), mean);
                cov.Subtract(column.OuterProduct(column) / variance, cov);
                // Feed-forward: X_u(-m c_v(u)) shifts q_u by -m c_v(u); Z_w(-m (A c_v)(w)) shifts p_w.
                if (!flow.Corrections.TryGetValue(v, out var c)) continue;
                var z = new double[n];
                foreach (var (u, value) in c.Entries)
                {
                    double cu = Value(value);
                    if (later[u]) mean[Q(u)] -= cu * outcome;
                    foreach (var e in g.Edges)
                    {
                        double w = (double)e.Weight.Numerator / (double)e.Weight.Denominator;
                        if (e.U == u) z[e.V] += w * cu;
                        if (e.V == u) z[e.U] += w * cu;
                    }
                }
                for (int w = 0; w < n; w++)
                    if (w != v && later[w] && z[w] != 0) mean[P(w)] -= z[w] * outcome;
            }
            // Measured modes are done; nothing acts on them again.
        }
        var outputs = g.SortedOutputs;
        var outMean = Vector<double>.Build.Dense(2 * outputs.Length);
        var outCov = Matrix<double>.Build.Dense(2 * outputs.Length, 2 * outputs.Length);
        for (int i = 0; i < outputs.Length; i++)
            for (int a = 0; a < 2; a++)
            {
                outMean[2 * i + a] = mean[2 * outputs[i] + a];
                for (int j = 0; j < outputs.Length; j++)
                    for (int b = 0; b < 2; b++)
                        outCov[2 * i + a, 2 * j + b] = cov[2 * outputs[i] + a, 2 * outputs[j] + b];
            }
        return (outMean, outCov, innovations.ToArray());
    }

    /// <summary>
    /// The symplectic shear M = I + a E[target, source] (x_target += a x_source, source != target) on the
    /// moments: mean -> M mean, covariance -> M cov M^T, done as a row and a column operation.
    /// </summary>
    private static void Shear(Vector<double> mean, Matrix<double> cov, int target, int source, double a)
    {
        mean[target] += a * mean[source];
        int size = cov.RowCount;
        for (int j = 0; j < size; j++) cov[target, j] += a * cov[source, j];
        for (int i = 0; i < size; i++) cov[i, target] += a * cov[i, source];
    }

    // A correction coefficient as the certificate holds it: a typed element of Q.
    private static double Value(FlowCert.Algebra.FieldElement value)
    {
        var x = value.AsRational;
        return (double)x.Numerator / (double)x.Denominator;
    }
}
