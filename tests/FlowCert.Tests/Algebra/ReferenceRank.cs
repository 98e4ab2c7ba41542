using System.Numerics;
using FlowCert.Algebra;
using Fractions;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// Independent ranks for checking the library's elimination: a tiny textbook Gaussian elimination over
/// the Fractions package's <see cref="Fraction"/> (Q), and over BigInteger residues (F_p). Neither
/// uses any FlowCert type beyond reading the entries.
/// </summary>
public static class ReferenceRank
{
    /// <summary>Rank over Q, by forward elimination on Fractions.</summary>
    public static int OverQ(Fraction[,] input)
    {
        var a = (Fraction[,])input.Clone();
        int rows = a.GetLength(0), cols = a.GetLength(1), rank = 0;
        for (int c = 0; c < cols && rank < rows; c++)
        {
            int p = rank;
            while (p < rows && a[p, c].IsZero) p++;
            if (p == rows) continue;
            for (int j = 0; j < cols; j++) (a[p, j], a[rank, j]) = (a[rank, j], a[p, j]);
            for (int i = rank + 1; i < rows; i++)
            {
                if (a[i, c].IsZero) continue;
                var factor = a[i, c] / a[rank, c];
                for (int j = c; j < cols; j++) a[i, j] = (a[i, j] - factor * a[rank, j]).Reduce();
            }
            rank++;
        }
        return rank;
    }

    /// <summary>Rank over F_p, by forward elimination on BigInteger residues (inverse by Fermat's little theorem).</summary>
    public static int ModP(BigInteger[,] input, BigInteger p)
    {
        int rows = input.GetLength(0), cols = input.GetLength(1), rank = 0;
        var a = new BigInteger[rows, cols];
        for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) a[i, j] = ((input[i, j] % p) + p) % p;
        for (int c = 0; c < cols && rank < rows; c++)
        {
            int q = rank;
            while (q < rows && a[q, c].IsZero) q++;
            if (q == rows) continue;
            for (int j = 0; j < cols; j++) (a[q, j], a[rank, j]) = (a[rank, j], a[q, j]);
            var inv = BigInteger.ModPow(a[rank, c], p - 2, p);
            for (int i = rank + 1; i < rows; i++)
            {
                if (a[i, c].IsZero) continue;
                var factor = a[i, c] * inv % p;
                for (int j = c; j < cols; j++) a[i, j] = ((a[i, j] - factor * a[rank, j]) % p + p) % p;
            }
            rank++;
        }
        return rank;
    }

    /// <summary>The reference rank of a table of library field elements (Q or F_p, by the field's type).</summary>
    public static int Of<T>(T[,] entries, ulong prime)
    {
        int rows = entries.GetLength(0), cols = entries.GetLength(1);
        if (entries is Rational[,] q)
        {
            var a = new Fraction[rows, cols];
            for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) a[i, j] = new Fraction(q[i, j].Numerator, q[i, j].Denominator);
            return OverQ(a);
        }
        if (entries is ulong[,] r)
        {
            var a = new BigInteger[rows, cols];
            for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) a[i, j] = r[i, j];
            return ModP(a, prime);
        }
        throw new ArgumentException($"no reference rank for {typeof(T)}");
    }
}
