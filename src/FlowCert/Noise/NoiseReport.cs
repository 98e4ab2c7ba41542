using FlowCert.Algebra;
using FlowCert.Flows;

namespace FlowCert.Noise;

/// <summary>
/// An anti-squeezed quadrature q_u^0 that reaches an output: the corrections do not cancel it, so the
/// certificate's pattern is not deterministic and its noise grows as e^(2r).
/// </summary>
/// <param name="Node">The non-input u whose anti-squeezed q_u^0 appears.</param>
/// <param name="Row">The output quadrature it reaches (row index: 2k is q, 2k + 1 is p of the k-th output).</param>
/// <param name="Coefficient">Its exact coefficient there.</param>
public sealed record AntiSqueezedLeak(int Node, int Row, Rational Coefficient);

/// <summary>
/// The exact finite-squeezing model of a Gaussian flow pattern over Q (docs/noise.md). Every output
/// quadrature is x_out = S x_in + K q^0 + L delta, with x_in the inputs' quadratures (q, p per input),
/// q^0 the non-inputs' anti-squeezed and delta their squeezed quadratures. Rows: (q, p) of each output
/// in <see cref="Outputs"/> order. A valid flow has K = 0; the added covariance is then (e^(-2r)/2) L L^T.
/// </summary>
public sealed record NoiseReport
{
    /// <summary>The certificate analysed.</summary>
    public required FlowResult Flow { get; init; }
    /// <summary>The Gaussian phase t_v of every measured node (0 when absent).</summary>
    public required IReadOnlyDictionary<int, Rational> Phases { get; init; }
    /// <summary>Inputs, sorted: columns (q_i, p_i) of <see cref="S"/>.</summary>
    public required IReadOnlyList<int> Inputs { get; init; }
    /// <summary>Outputs, sorted: rows (q_o, p_o) of every matrix.</summary>
    public required IReadOnlyList<int> Outputs { get; init; }
    /// <summary>Non-inputs (squeezed nodes), sorted: columns of <see cref="K"/> and <see cref="L"/>.</summary>
    public required IReadOnlyList<int> Squeezed { get; init; }
    /// <summary>The ideal symplectic map, 2|O| x 2|I|.</summary>
    public required Rational[,] S { get; init; }
    /// <summary>Coefficients of the anti-squeezed q_u^0, 2|O| x |squeezed|; zero for a valid flow.</summary>
    public required Rational[,] K { get; init; }
    /// <summary>Coefficients of the squeezed delta_u = p_u^0, 2|O| x |squeezed|.</summary>
    public required Rational[,] L { get; init; }
    /// <summary>Every non-zero entry of <see cref="K"/>, row by row.</summary>
    public required IReadOnlyList<AntiSqueezedLeak> Leaks { get; init; }

    /// <summary>True when no anti-squeezed quadrature reaches an output (the corrections work).</summary>
    public bool Valid => Leaks.Count == 0;

    /// <summary>The number of output quadratures, 2|O|.</summary>
    public int Rows => 2 * Outputs.Count;

    /// <summary>The name of a row: "out q" or "out p".</summary>
    public string RowName(int row) => $"{Flow.Graph.Names[Outputs[row / 2]]} {(row % 2 == 0 ? 'q' : 'p')}";

    /// <summary>L L^T: the added covariance as a multiple of e^(-2r)/2 (exact).</summary>
    public Rational[,] Covariance => Gram(L);

    /// <summary>K K^T: the anti-squeezed covariance as a multiple of e^(2r)/2 (exact; zero for a valid flow).</summary>
    public Rational[,] AntiSqueezedCovariance => Gram(K);

    /// <summary>The diagonal entry of L L^T for one output quadrature: its added variance over e^(-2r)/2.</summary>
    public Rational AddedVariance(int row) => RowNorm(L, row);

    /// <summary>The diagonal entry of K K^T for one output quadrature.</summary>
    public Rational AntiSqueezedVariance(int row) => RowNorm(K, row);

    private static Rational RowNorm(Rational[,] m, int row)
    {
        var sum = Rational.Zero;
        for (int k = 0; k < m.GetLength(1); k++) sum += m[row, k] * m[row, k];
        return sum;
    }

    private static Rational[,] Gram(Rational[,] m)
    {
        int rows = m.GetLength(0), cols = m.GetLength(1);
        var g = new Rational[rows, rows];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < rows; j++)
            {
                var sum = Rational.Zero;
                for (int k = 0; k < cols; k++) sum += m[i, k] * m[j, k];
                g[i, j] = sum;
            }
        return g;
    }
}
