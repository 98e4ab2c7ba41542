using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// The reference elimination of the tests: a dense matrix over any field with plain Gauss-Jordan
/// elimination, one entry at a time (checked itself against an independent rank in DenseMatrixTests).
/// The library's kernels (sparse, packed F_2, word-sized F_p, multi-modular Q) are checked against it.
/// </summary>
public sealed class DenseMatrix<T, TField> where T : struct where TField : struct, IField<T>
{
    private readonly TField f;
    private readonly T[,] a;
    /// <summary>Number of rows.</summary>
    public int Rows { get; }
    /// <summary>Number of columns.</summary>
    public int Columns { get; }

    /// <summary>A zero matrix of the given size over the field.</summary>
    public DenseMatrix(TField field, int rows, int columns)
    {
        f = field; Rows = rows; Columns = columns; a = new T[rows, columns];
        for (int i = 0; i < rows; i++) for (int j = 0; j < columns; j++) a[i, j] = f.Zero;
    }

    /// <summary>The entry in row i, column j.</summary>
    public T this[int i, int j] { get => a[i, j]; set => a[i, j] = value; }

    /// <summary>An independent copy.</summary>
    public DenseMatrix<T, TField> Clone()
    {
        var m = new DenseMatrix<T, TField>(f, Rows, Columns);
        Array.Copy(a, m.a, a.Length);
        return m;
    }

    /// <summary>Brings a copy to reduced row echelon form; returns it with its pivot columns.</summary>
    public (DenseMatrix<T, TField> Reduced, int[] PivotColumns) RowReduce()
    {
        var m = Clone();
        var pivots = new List<int>();
        int row = 0;
        for (int col = 0; col < Columns && row < Rows; col++)
        {
            int p = row;
            while (p < Rows && f.IsZero(m.a[p, col])) p++;
            if (p == Rows) continue;
            m.SwapRows(p, row);
            var inv = f.Inverse(m.a[row, col]);
            for (int j = 0; j < Columns; j++) m.a[row, j] = f.Multiply(inv, m.a[row, j]);
            for (int i = 0; i < Rows; i++)
            {
                if (i == row || f.IsZero(m.a[i, col])) continue;
                var factor = m.a[i, col];
                for (int j = 0; j < Columns; j++) m.a[i, j] = f.Subtract(m.a[i, j], f.Multiply(factor, m.a[row, j]));
            }
            pivots.Add(col);
            row++;
        }
        return (m, pivots.ToArray());
    }

    private void SwapRows(int i, int k)
    {
        if (i == k) return;
        for (int j = 0; j < Columns; j++) (a[i, j], a[k, j]) = (a[k, j], a[i, j]);
    }

    /// <summary>The rank over the field.</summary>
    public int Rank() => RowReduce().PivotColumns.Length;

    /// <summary>A solution x of A x = b (free variables zero), or null when there is none.</summary>
    public T[]? Solve(T[] b)
    {
        var aug = new DenseMatrix<T, TField>(f, Rows, Columns + 1);
        for (int i = 0; i < Rows; i++)
        {
            for (int j = 0; j < Columns; j++) aug.a[i, j] = a[i, j];
            aug.a[i, Columns] = b[i];
        }
        var (r, pivots) = aug.RowReduce();
        if (pivots.Length > 0 && pivots[^1] == Columns) return null;
        var x = new T[Columns];
        for (int j = 0; j < Columns; j++) x[j] = f.Zero;
        for (int k = 0; k < pivots.Length; k++) x[pivots[k]] = r.a[k, Columns];
        return x;
    }

    /// <summary>A basis of the left kernel {y : y^T A = 0}.</summary>
    public List<T[]> LeftKernel()
    {
        // Reduce [A | I]: rows whose A part vanishes carry left-kernel vectors in their I part.
        var aug = new DenseMatrix<T, TField>(f, Rows, Columns + Rows);
        for (int i = 0; i < Rows; i++)
        {
            for (int j = 0; j < Columns; j++) aug.a[i, j] = a[i, j];
            aug.a[i, Columns + i] = f.One;
        }
        var (r, _) = aug.RowReduce();
        var basis = new List<T[]>();
        for (int i = 0; i < Rows; i++)
        {
            bool zeroLeft = true;
            for (int j = 0; j < Columns && zeroLeft; j++) zeroLeft = f.IsZero(r.a[i, j]);
            if (!zeroLeft) continue;
            var y = new T[Rows];
            for (int k = 0; k < Rows; k++) y[k] = r.a[i, Columns + k];
            basis.Add(y);
        }
        return basis;
    }

    /// <summary>A times x.</summary>
    public T[] Multiply(T[] x)
    {
        var y = new T[Rows];
        for (int i = 0; i < Rows; i++)
        {
            var s = f.Zero;
            for (int j = 0; j < Columns; j++) s = f.Add(s, f.Multiply(a[i, j], x[j]));
            y[i] = s;
        }
        return y;
    }
}
