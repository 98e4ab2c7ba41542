using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using Vector = MathNet.Numerics.LinearAlgebra.Vector<System.Numerics.Complex>;

namespace FlowCert.Simulation;

/// <summary>
/// The verdict of a simulation. The deviation of branch s is min over t of |M_s - e^(it) M_0| / N, with
/// M_0 the all-zero branch, |.| the Frobenius norm and N = sqrt(d_in / p^|M|) the norm every branch has
/// when the pattern is deterministic. Probabilities are Born-rule weights |M_s psi|^2 of one random
/// input state psi; their relative spread is (max - min) * p^|M| (zero when every branch is as likely).
/// <see cref="Amplitudes"/> is the peak size of the state, p^(<see cref="PeakLive"/> + reference qudits).
/// </summary>
public sealed record DeterminismReport(
    int Dimension, int Qudits, int ReferenceQudits, long Amplitudes, int MeasuredNodes,
    bool Exhaustive, int BranchesCompared, double MaxDeviation, int[]? WorstBranch,
    double MinProbability, double MaxProbability, double ProbabilitySum, double RelativeSpread, int PeakLive)
{
    /// <summary>Deviations and relative spreads at most this are rounding, not physics.</summary>
    public const double Tolerance = 1e-9;

    /// <summary>Every compared branch agrees with the all-zero one, with equal probability.</summary>
    public bool Deterministic => MaxDeviation <= Tolerance && RelativeSpread <= Tolerance;

    /// <summary>p^|M|, the number of outcome strings.</summary>
    public double TotalBranches => Math.Pow(Dimension, MeasuredNodes);
}

/// <summary>Accumulates branches against the first one (the all-zero branch) into a <see cref="DeterminismReport"/>.</summary>
internal sealed class DeterminismComparison(QuditPattern pattern, OutcomeBranches selection)
{
    private Matrix<Complex>? reference;
    private readonly Vector input = Vector.Build.DenseOfArray(pattern.InputState);
    private readonly double expectedNorm = Math.Sqrt(Math.Pow(pattern.Dimension, pattern.Graph.Inputs.Count - pattern.Order.Count));
    private int count;
    private double maxDeviation, minProbability = double.PositiveInfinity, maxProbability, probabilitySum;
    private int[]? worst;

    public void Add(BranchRecord branch)
    {
        var m = branch.OutputMap;
        if (reference is null)
        {
            if (branch.Raw.Any(x => x != 0)) throw new InvalidOperationException("the first branch must be the all-zero one");
            reference = m;
        }
        else
        {
            var overlap = Complex.Zero;
            for (int i = 0; i < m.RowCount; i++)
                for (int j = 0; j < m.ColumnCount; j++) overlap += Complex.Conjugate(reference[i, j]) * m[i, j];
            // The best phase is that of the overlap; subtracting directly avoids the cancellation of
            // |a|^2 + |b|^2 - 2|overlap|, which would lose half the digits.
            var phase = overlap.Magnitude > 0 ? overlap / overlap.Magnitude : Complex.One;
            double deviation = (m - reference * phase).FrobeniusNorm() / expectedNorm;
            if (worst is null || deviation > maxDeviation) { maxDeviation = deviation; worst = branch.Raw; }
        }
        double probability = Math.Pow((m * input).L2Norm(), 2);
        minProbability = Math.Min(minProbability, probability);
        maxProbability = Math.Max(maxProbability, probability);
        probabilitySum += probability;
        count++;
    }

    public DeterminismReport Report()
    {
        var g = pattern.Graph;
        double branches = Math.Pow(pattern.Dimension, pattern.Order.Count);
        return new DeterminismReport(pattern.Dimension, g.NodeCount, g.Inputs.Count, pattern.Amplitudes, pattern.Order.Count,
            selection.IsExhaustive, count, maxDeviation, worst, minProbability, maxProbability, probabilitySum,
            (maxProbability - minProbability) * branches, pattern.Plan.PeakLive);
    }
}
