namespace FlowCert.Tests.Oracles;

/// <summary>
/// A tiny dense Gaussian elimination for the oracles (independent of src/FlowCert): which unit vectors
/// e_r lie in the column space of a matrix B. Reduces [B | I]; the rows whose B part vanishes span the
/// left kernel of B, and e_r is in the column space exactly when every left-kernel vector is zero at r.
/// </summary>
public static class ReferenceElimination
{
    /// <summary>For each row r of B (rows x cols, given row-major), whether B c = e_r has a solution.</summary>
    public static bool[] UnitRowsSolvable<T>(IReferenceArithmetic<T> f, T[][] b, int cols)
    {
        int m = b.Length;
        var a = new T[m][];
        for (int i = 0; i < m; i++)
        {
            a[i] = new T[cols + m];
            for (int j = 0; j < cols; j++) a[i][j] = b[i][j];
            for (int j = 0; j < m; j++) a[i][cols + j] = i == j ? f.One : f.Zero;
        }
        int row = 0;
        for (int col = 0; col < cols && row < m; col++)
        {
            int p = row;
            while (p < m && f.IsZero(a[p][col])) p++;
            if (p == m) continue;
            (a[p], a[row]) = (a[row], a[p]);
            var inv = f.Inverse(a[row][col]);
            for (int j = 0; j < cols + m; j++) a[row][j] = f.Multiply(inv, a[row][j]);
            for (int i = 0; i < m; i++)
            {
                if (i == row || f.IsZero(a[i][col])) continue;
                var factor = a[i][col];
                for (int j = 0; j < cols + m; j++) a[i][j] = f.Subtract(a[i][j], f.Multiply(factor, a[row][j]));
            }
            row++;
        }
        var solvable = new bool[m];
        Array.Fill(solvable, true);
        // rows row..m-1 have a zero B part: their identity part is a basis of the left kernel
        for (int i = row; i < m; i++)
            for (int r = 0; r < m; r++)
                if (!f.IsZero(a[i][cols + r])) solvable[r] = false;
        return solvable;
    }
}
