using FlowCert.Algebra;
using FlowCert.Flows;

namespace FlowCert.Noise;

/// <summary>
/// An anti-squeezed quadrature q_u^0 that reaches a finite direction of the outputs (with as many outputs as
/// inputs: any output quadrature): the corrections do not cancel it, so the certificate's pattern is not
/// deterministic and its noise grows as e^(2r).
/// </summary>
/// <param name="Node">The non-input u whose anti-squeezed q_u^0 appears.</param>
/// <param name="Row">The finite direction it reaches (a row of <see cref="NoiseReport.Directions"/>; with as many
/// outputs as inputs the directions are the output quadratures: 2k is q, 2k + 1 is p of the k-th output).</param>
/// <param name="Coefficient">Its exact coefficient there.</param>
public sealed record AntiSqueezedLeak(int Node, int Row, Rational Coefficient);

/// <summary>
/// The exact finite-squeezing model of a Gaussian flow pattern over Q (docs/noise.md). Every output
/// quadrature is x_out = S x_in + K q^0 + L delta, with x_in the inputs' quadratures (q, p per input),
/// q^0 the non-inputs' anti-squeezed and delta their squeezed quadratures. Rows: (q, p) of each output
/// in <see cref="Outputs"/> order. With as many outputs as inputs a valid flow has K = 0 and the added
/// covariance is (e^(-2r)/2) L L^T. With more outputs than inputs K is not zero: the noise is read on the
/// finite directions D (f^T K = 0 for every row f of D when the flow is valid), as (e^(-2r)/2) (D L)(D L)^T.
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
    /// <summary>Every non-zero entry of <see cref="DirectionK"/> (with as many outputs as inputs: of K), row by row.</summary>
    public required IReadOnlyList<AntiSqueezedLeak> Leaks { get; init; }
    /// <summary>The measured nodes in measurement order: rows of <see cref="MeasuredK"/>.</summary>
    public required IReadOnlyList<int> MeasuredNodes { get; init; }
    /// <summary>K_M: the coefficients of the anti-squeezed q_u^0 in each measured outcome M_v, |M| x |squeezed|.</summary>
    public required Rational[,] MeasuredK { get; init; }
    /// <summary>
    /// The finite directions D, one per row over the 2|O| output quadratures: the identity with as many outputs
    /// as inputs; otherwise the canonical basis of F = { f : f^T K in the row space of K_M } (logical directions
    /// first, then nullifiers; docs/noise.md). F does not depend on the corrections.
    /// </summary>
    public required Rational[,] Directions { get; init; }
    /// <summary>D S: the ideal value of each finite direction (a unit row for a logical direction, 0 for a nullifier).</summary>
    public required Rational[,] DirectionS { get; init; }
    /// <summary>D L: the squeezed noise of each finite direction.</summary>
    public required Rational[,] DirectionL { get; init; }
    /// <summary>D K: zero for a valid flow.</summary>
    public required Rational[,] DirectionK { get; init; }

    /// <summary>True when no anti-squeezed quadrature reaches a finite direction (the corrections work).</summary>
    public bool Valid => Leaks.Count == 0;

    /// <summary>True with more outputs than inputs: the ideal output embeds the inputs in more modes.</summary>
    public bool IsEmbedding => Outputs.Count > Inputs.Count;

    /// <summary>The number of finite directions (2|O| with as many outputs as inputs, |O| + |I| for a valid flow).</summary>
    public int DirectionCount => Directions.GetLength(0);

    /// <summary>True when direction j is a nullifier: its ideal value D S is 0.</summary>
    public bool IsNullifier(int j)
    {
        for (int c = 0; c < DirectionS.GetLength(1); c++) if (!DirectionS[j, c].IsZero) return false;
        return true;
    }

    /// <summary>The name of direction j: the output row's name ("out q") with as many outputs as inputs, else "f1", "f2", ...</summary>
    public string DirectionName(int j) => IsEmbedding ? $"f{j + 1}" : RowName(j);

    /// <summary>The added variance of direction j over e^(-2r)/2: |(D L)_j|^2 (exact).</summary>
    public Rational DirectionVariance(int j) => RowNorm(DirectionL, j);

    /// <summary>|(D K)_j|^2: the anti-squeezed variance of direction j over e^(2r)/2 (zero for a valid flow).</summary>
    public Rational DirectionAntiSqueezedVariance(int j) => RowNorm(DirectionK, j);

    /// <summary>(D L)(D L)^T: the added covariance of the finite directions over e^(-2r)/2.</summary>
    public Rational[,] DirectionCovariance => Gram(DirectionL);

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
