using System.Numerics;
using FlowCert.Algebra;

namespace FlowCert.Noise;

/// <summary>
/// The squeezing-dependent numbers of a <see cref="NoiseReport"/>, in floating point (the only place it is
/// used; L, K and S stay exact). Conventions (common practice): hbar = 1, vacuum variance 1/2, squeezing in
/// dB is 10 log10(e^(2r)).
/// </summary>
public static class NoiseFigures
{
    /// <summary>The squeezing parameter r of a level in dB: r = dB ln(10) / 20 (10 dB is r = ln(10)/2).</summary>
    public static double SqueezingParameter(double decibels) => decibels * Math.Log(10) / 20;

    /// <summary>The level in dB of a squeezing parameter r: 10 log10(e^(2r)) = 20 r / ln(10).</summary>
    public static double Decibels(double r) => 20 * r / Math.Log(10);

    /// <summary>
    /// The added variance of one output quadrature in vacuum units (a multiple of 1/2):
    /// diag(L L^T) e^(-2r) + diag(K K^T) e^(2r).
    /// </summary>
    public static double AddedVariance(NoiseReport report, int row, double r)
        => ToDouble(report.AddedVariance(row)) * Math.Exp(-2 * r) + ToDouble(report.AntiSqueezedVariance(row)) * Math.Exp(2 * r);

    /// <summary>
    /// The added variance of finite direction j (the combination f_j^T x_out as written) in vacuum units:
    /// |(D L)_j|^2 e^(-2r) + |(D K)_j|^2 e^(2r). With as many outputs as inputs this is <see cref="AddedVariance"/>.
    /// </summary>
    public static double DirectionAddedVariance(NoiseReport report, int direction, double r)
        => ToDouble(report.DirectionVariance(direction)) * Math.Exp(-2 * r) + ToDouble(report.DirectionAntiSqueezedVariance(direction)) * Math.Exp(2 * r);

    /// <summary>A variance in vacuum units as dB relative to the vacuum: 10 log10(x) (negative below vacuum).</summary>
    public static double RelativeDecibels(double vacuumUnits) => 10 * Math.Log10(vacuumUnits);

    /// <summary>
    /// The added covariance in absolute units (hbar = 1): (e^(-2r)/2) L L^T + (e^(2r)/2) K K^T.
    /// </summary>
    public static double[,] AddedCovariance(NoiseReport report, double r)
    {
        var l = report.Covariance;
        var k = report.AntiSqueezedCovariance;
        int n = report.Rows;
        var c = new double[n, n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                c[i, j] = ToDouble(l[i, j]) * Math.Exp(-2 * r) / 2 + ToDouble(k[i, j]) * Math.Exp(2 * r) / 2;
        return c;
    }

    /// <summary>
    /// The fidelity for coherent-state inputs: the overlap of the ideal output S|alpha> (pure, covariance
    /// S S^T / 2) with the actual output (same mean, covariance S S^T / 2 + N), which for a pure Gaussian
    /// state is 1 / sqrt(det(sigma_1 + sigma_2)) = 1 / sqrt(det(S S^T + N)) (hbar = 1; docs/noise.md cites it).
    /// It does not depend on the coherent amplitude.
    /// </summary>
    public static double CoherentStateFidelity(NoiseReport report, double r)
    {
        if (report.IsEmbedding)
            throw new InvalidOperationException("the coherent-state fidelity is defined only with as many outputs as inputs (docs/noise.md)");
        var n = AddedCovariance(report, r);
        int rows = report.Rows, cols = report.S.GetLength(1);
        var m = new double[rows, rows];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < rows; j++)
            {
                double sum = 0;
                for (int k = 0; k < cols; k++) sum += ToDouble(report.S[i, k]) * ToDouble(report.S[j, k]);
                m[i, j] = sum + n[i, j];
            }
        return 1 / Math.Sqrt(Determinant(m));
    }

    /// <summary>
    /// The least squeezing in dB at which every finite direction's added variance (with as many outputs as
    /// inputs: every output quadrature's) is at most <paramref name="vacuumUnits"/> (a multiple of the vacuum
    /// variance 1/2): 10 log10(max diag((D L)(D L)^T) / V), and 0 when no squeezing is needed. Null when the
    /// corrections fail (D K != 0: no level suffices for long).
    /// </summary>
    public static double? TargetDecibels(NoiseReport report, Rational vacuumUnits)
    {
        if (!report.Valid) return null;
        var worst = Rational.Zero;
        for (int j = 0; j < report.DirectionCount; j++)
            if (report.DirectionVariance(j).CompareTo(worst) > 0) worst = report.DirectionVariance(j);
        if (worst.IsZero) return 0;
        return Math.Max(0, 10 * Math.Log10(ToDouble(worst / vacuumUnits)));
    }

    /// <summary>A rational as the nearest double, also when numerator or denominator exceed the double range.</summary>
    public static double ToDouble(Rational x)
    {
        double d = (double)x.Numerator / (double)x.Denominator;
        if (double.IsFinite(d) && (d != 0 || x.IsZero)) return d;
        return x.Sign * Math.Exp(BigInteger.Log(BigInteger.Abs(x.Numerator)) - BigInteger.Log(x.Denominator));
    }

    // Gaussian elimination with partial pivoting (small symmetric positive definite matrices).
    private static double Determinant(double[,] a)
    {
        int n = a.GetLength(0);
        a = (double[,])a.Clone();
        double det = 1;
        for (int col = 0; col < n; col++)
        {
            int pivot = col;
            for (int i = col + 1; i < n; i++)
                if (Math.Abs(a[i, col]) > Math.Abs(a[pivot, col])) pivot = i;
            if (a[pivot, col] == 0) return 0;
            if (pivot != col)
            {
                det = -det;
                for (int j = 0; j < n; j++) (a[col, j], a[pivot, j]) = (a[pivot, j], a[col, j]);
            }
            det *= a[col, col];
            for (int i = col + 1; i < n; i++)
            {
                double f = a[i, col] / a[col, col];
                for (int j = col; j < n; j++) a[i, j] -= f * a[col, j];
            }
        }
        return det;
    }
}
