using FlowCert.Algebra;

namespace FlowCert.Noise;

/// <summary>
/// The output directions that finite squeezing leaves finite (docs/noise.md, "More outputs than inputs"):
/// F = { f : f^T K lies in the row space of K_M }, K_M the anti-squeezed part of the measured outcomes. F does
/// not depend on the corrections; a valid flow has f^T K = 0 on all of it. The canonical basis is the reduced
/// row echelon form of [f^T S | f] (input columns first): logical directions (f^T S a unit row) come first,
/// then the nullifiers (f^T S = 0), each in reduced row echelon form on the output quadratures.
/// </summary>
internal static class FiniteDirections
{
    private static readonly RationalField Q = default;

    /// <summary>
    /// The basis D (one direction per row, over the 2|O| output quadratures) for K (2|O| x |N|), K_M (|M| x |N|)
    /// and S (2|O| x 2|I|).
    /// </summary>
    public static Rational[,] Basis(Rational[,] k, Rational[,] measuredK, Rational[,] s)
    {
        int rows = k.GetLength(0), measured = measuredK.GetLength(0), inputs = s.GetLength(1);
        // Left kernel of [K; K_M]: pairs (f, h) with f^T K + h^T K_M = 0; keep f.
        var stacked = new List<SparseVector<Rational>>();
        for (int i = 0; i < rows; i++) stacked.Add(Row(k, i));
        for (int i = 0; i < measured; i++) stacked.Add(Row(measuredK, i));
        var kernel = new SparseElimination<Rational, RationalField>(Q, stacked).LeftKernel();
        var projected = new List<SparseVector<Rational>>();
        foreach (var y in kernel)
        {
            var f = new Rational[rows];
            Array.Fill(f, Rational.Zero);
            for (int t = 0; t < y.Count; t++) if (y.Indices[t] < rows) f[y.Indices[t]] = y.Values[t];
            // [f^T S | f]: input columns 0 .. 2|I| - 1, output quadratures after them.
            var combined = new Rational[inputs + rows];
            for (int j = 0; j < inputs; j++)
            {
                var sum = Rational.Zero;
                for (int i = 0; i < rows; i++) if (!f[i].IsZero) sum += f[i] * s[i, j];
                combined[j] = sum;
            }
            for (int i = 0; i < rows; i++) combined[inputs + i] = f[i];
            projected.Add(Sparse(combined));
        }
        var reduced = new SparseElimination<Rational, RationalField>(Q, projected).ReducedRows();
        var d = new Rational[reduced.Count, rows];
        for (int r = 0; r < reduced.Count; r++)
        {
            for (int i = 0; i < rows; i++) d[r, i] = Rational.Zero;
            var v = reduced[r];
            for (int t = 0; t < v.Count; t++) if (v.Indices[t] >= inputs) d[r, v.Indices[t] - inputs] = v.Values[t];
        }
        return d;
    }

    /// <summary>D M for a direction basis D (d x 2|O|) and a matrix M with 2|O| rows.</summary>
    public static Rational[,] Times(Rational[,] d, Rational[,] m)
    {
        int n = d.GetLength(0), inner = d.GetLength(1), cols = m.GetLength(1);
        var p = new Rational[n, cols];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < cols; j++)
            {
                var sum = Rational.Zero;
                for (int t = 0; t < inner; t++) if (!d[i, t].IsZero) sum += d[i, t] * m[t, j];
                p[i, j] = sum;
            }
        return p;
    }

    /// <summary>The identity of size n: with as many outputs as inputs every output quadrature is a finite direction.</summary>
    public static Rational[,] Identity(int n)
    {
        var d = new Rational[n, n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++) d[i, j] = i == j ? Rational.One : Rational.Zero;
        return d;
    }

    private static SparseVector<Rational> Row(Rational[,] m, int i)
    {
        var row = new Rational[m.GetLength(1)];
        for (int j = 0; j < row.Length; j++) row[j] = m[i, j];
        return Sparse(row);
    }

    private static SparseVector<Rational> Sparse(Rational[] values)
    {
        var idx = new List<int>();
        var val = new List<Rational>();
        for (int j = 0; j < values.Length; j++)
            if (!values[j].IsZero) { idx.Add(j); val.Add(values[j]); }
        return new SparseVector<Rational>(idx.ToArray(), val.ToArray());
    }
}
