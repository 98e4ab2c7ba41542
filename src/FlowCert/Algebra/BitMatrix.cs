using System.Numerics;

namespace FlowCert.Algebra;

/// <summary>
/// A dense matrix over F_2 with rows packed 64 entries to a word: the F_2 specialisation of
/// <see cref="DenseMatrix{T, TField}"/>, with the same operations under the same names.
/// </summary>
public sealed class BitMatrix
{
    private readonly ulong[][] rows;
    /// <summary>Number of rows.</summary>
    public int Rows { get; }
    /// <summary>Number of columns.</summary>
    public int Columns { get; }
    private int Words => (Columns + 63) >> 6;

    /// <summary>A zero matrix of the given size.</summary>
    public BitMatrix(int rows, int columns)
    {
        Rows = rows; Columns = columns;
        this.rows = new ulong[rows][];
        for (int i = 0; i < rows; i++) this.rows[i] = new ulong[Words];
    }

    /// <summary>The entry in row i, column j (true is 1).</summary>
    public bool this[int i, int j]
    {
        get => (rows[i][j >> 6] >> (j & 63) & 1) != 0;
        set { if (value) rows[i][j >> 6] |= 1UL << (j & 63); else rows[i][j >> 6] &= ~(1UL << (j & 63)); }
    }

    /// <summary>An independent copy.</summary>
    public BitMatrix Clone()
    {
        var m = new BitMatrix(Rows, Columns);
        for (int i = 0; i < Rows; i++) Array.Copy(rows[i], m.rows[i], Words);
        return m;
    }

    /// <summary>Brings a copy to reduced row echelon form; returns it with its pivot columns.</summary>
    public (BitMatrix Reduced, int[] PivotColumns) RowReduce()
    {
        var m = Clone();
        var pivots = new List<int>();
        int row = 0;
        for (int col = 0; col < Columns && row < Rows; col++)
        {
            int p = row;
            while (p < Rows && !m[p, col]) p++;
            if (p == Rows) continue;
            (m.rows[p], m.rows[row]) = (m.rows[row], m.rows[p]);
            var pivotRow = m.rows[row];
            for (int i = 0; i < Rows; i++)
            {
                if (i == row || !m[i, col]) continue;
                var target = m.rows[i];
                for (int w = col >> 6; w < Words; w++) target[w] ^= pivotRow[w];
            }
            pivots.Add(col);
            row++;
        }
        return (m, pivots.ToArray());
    }

    /// <summary>The rank over F_2.</summary>
    public int Rank() => RowReduce().PivotColumns.Length;

    /// <summary>A solution x of A x = b (free variables zero), or null when there is none.</summary>
    public bool[]? Solve(bool[] b)
    {
        var aug = new BitMatrix(Rows, Columns + 1);
        for (int i = 0; i < Rows; i++)
        {
            for (int j = 0; j < Columns; j++) aug[i, j] = this[i, j];
            aug[i, Columns] = b[i];
        }
        var (r, pivots) = aug.RowReduce();
        if (pivots.Length > 0 && pivots[^1] == Columns) return null;
        var x = new bool[Columns];
        for (int k = 0; k < pivots.Length; k++) x[pivots[k]] = r[k, Columns];
        return x;
    }

    /// <summary>A basis of the left kernel {y : y^T A = 0}.</summary>
    public List<bool[]> LeftKernel()
    {
        var aug = new BitMatrix(Rows, Columns + Rows);
        for (int i = 0; i < Rows; i++)
        {
            for (int j = 0; j < Columns; j++) aug[i, j] = this[i, j];
            aug[i, Columns + i] = true;
        }
        var (r, _) = aug.RowReduce();
        var basis = new List<bool[]>();
        for (int i = 0; i < Rows; i++)
        {
            bool zeroLeft = true;
            for (int j = 0; j < Columns && zeroLeft; j++) zeroLeft = !r[i, j];
            if (!zeroLeft) continue;
            var y = new bool[Rows];
            for (int k = 0; k < Rows; k++) y[k] = r[i, Columns + k];
            basis.Add(y);
        }
        return basis;
    }

    /// <summary>A times x.</summary>
    public bool[] Multiply(bool[] x)
    {
        var y = new bool[Rows];
        for (int i = 0; i < Rows; i++)
        {
            int parity = 0;
            for (int j = 0; j < Columns; j++) if (x[j] && this[i, j]) parity ^= 1;
            y[i] = parity == 1;
        }
        return y;
    }

    /// <summary>Number of ones in row i (population count of its words).</summary>
    public int RowWeight(int i) => rows[i].Sum(w => BitOperations.PopCount(w));
}
