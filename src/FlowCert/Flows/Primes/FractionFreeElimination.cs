using System.Numerics;

namespace FlowCert.Flows.Primes;

/// <summary>
/// Fraction-free Gaussian elimination (the Bareiss algorithm, published as "Sylvester's identity and multistep integer-preserving
/// Gaussian elimination", Math. Comp. 22 (1968) 565-578, doi:10.2307/2004533) of an integer matrix B
/// augmented by the identity, [B | I]. After the step with pivots (r_1, c_1) .. (r_k, c_k), every entry of a
/// row i below them is the minor of [B | I] on rows r_1..r_k, i and columns c_1..c_k, j, so every division
/// is exact. At the end:
/// - <see cref="PivotMinor"/> is the r x r minor of B on the pivot rows and columns (r = rank, non-zero),
///   a multiple of d_r(B), the gcd of all r x r minors;
/// - each non-pivot row i yields y_i = its identity part: y_i^T B = 0 (every entry of y_i^T B is an
///   (r+1) x (r+1) minor of B), y_i(i) = +-PivotMinor, y_i is 0 off the pivot rows and i. These m - r
///   vectors are independent, so they are an integral basis of the left kernel of B over Q.
/// </summary>
internal sealed class FractionFreeElimination
{
    /// <summary>The rank of B over Q.</summary>
    public int Rank { get; }
    /// <summary>The pivot rows (indices into B), in pivot order.</summary>
    public IReadOnlyList<int> PivotRows { get; }
    /// <summary>The pivot columns, in pivot order.</summary>
    public IReadOnlyList<int> PivotColumns { get; }
    /// <summary>|det B[pivot rows, pivot columns]| (1 when the rank is 0).</summary>
    public BigInteger PivotMinor { get; }
    /// <summary>For each non-pivot row i (ascending): the left-kernel vector y_i over the rows of B.</summary>
    public IReadOnlyList<(int Row, BigInteger[] Vector)> LeftKernel { get; }

    public FractionFreeElimination(BigInteger[][] b, int columns)
    {
        int m = b.Length, width = columns + m;
        var a = new BigInteger[m][];
        var origin = new int[m];
        for (int i = 0; i < m; i++)
        {
            if (b[i].Length != columns) throw new ArgumentException("ragged matrix");
            a[i] = new BigInteger[width];
            Array.Copy(b[i], a[i], columns);
            a[i][columns + i] = BigInteger.One;
            origin[i] = i;
        }
        BigInteger previous = BigInteger.One;
        int rank = 0;
        var pivotColumns = new List<int>();
        for (int c = 0; c < columns && rank < m; c++)
        {
            int found = -1;
            for (int i = rank; i < m && found < 0; i++) if (!a[i][c].IsZero) found = i;
            if (found < 0) continue;
            (a[rank], a[found]) = (a[found], a[rank]);
            (origin[rank], origin[found]) = (origin[found], origin[rank]);
            var pivot = a[rank][c];
            for (int i = rank + 1; i < m; i++)
            {
                var factor = a[i][c];
                for (int j = c + 1; j < width; j++)
                {
                    var t = pivot * a[i][j] - factor * a[rank][j];
                    a[i][j] = previous.IsOne ? t : BigInteger.Divide(t, previous);
                }
                a[i][c] = BigInteger.Zero;
            }
            previous = pivot;
            pivotColumns.Add(c);
            rank++;
        }
        Rank = rank;
        PivotRows = origin.Take(rank).ToArray();
        PivotColumns = pivotColumns;
        PivotMinor = BigInteger.Abs(previous);
        var kernel = new List<(int, BigInteger[])>();
        for (int i = rank; i < m; i++)
        {
            var y = new BigInteger[m];
            for (int k = 0; k < m; k++) y[k] = a[i][columns + k];
            kernel.Add((origin[i], y));
        }
        kernel.Sort((x, y) => x.Item1.CompareTo(y.Item1));
        LeftKernel = kernel;
    }

    /// <summary>
    /// The rows of B that are unit vectors' targets over Q: row v is solvable (some c has B c = e_v) exactly
    /// when every left-kernel vector is 0 at v (Fredholm alternative).
    /// </summary>
    public bool IsSolvable(int row) => LeftKernel.All(k => k.Vector[row].IsZero);

    /// <summary>The gcd of the v-th coordinates of the kernel basis (0 when v is solvable).</summary>
    public BigInteger KernelCoordinateGcd(int row)
    {
        var g = BigInteger.Zero;
        foreach (var (_, y) in LeftKernel) g = BigInteger.GreatestCommonDivisor(g, y[row]);
        return g;
    }
}
