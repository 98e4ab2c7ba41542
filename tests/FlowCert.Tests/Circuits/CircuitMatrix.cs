using System.Numerics;
using FlowCert.Circuits;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Tests.Circuits;

/// <summary>
/// Multiplies a circuit out with MathNet.Numerics: every gate as a p^n x p^n matrix (Kronecker products
/// with identities; wire 0 the most significant digit), their product U, then V = P U E with E putting
/// the inputs on their wires and every other wire in |0>, and P reading the wires of the sorted outputs.
/// The gate matrices are written here from their definitions in docs/circuits.md, not taken from the library.
/// </summary>
public static class CircuitMatrix
{
    private static readonly MatrixBuilder<Complex> M = Matrix<Complex>.Build;

    public static Complex Root(int p, long k) => Complex.FromPolarCoordinates(1, 2 * Math.PI * (((k % p) + p) % p) / p);

    /// <summary>F_a[k][j] = w^(a j k) / sqrt p.</summary>
    public static Matrix<Complex> Fourier(int p, int a) => M.Dense(p, p, (k, j) => Root(p, (long)a * j * k) / Math.Sqrt(p));

    /// <summary>diag(e^(i theta_j)).</summary>
    public static Matrix<Complex> Diagonal(IReadOnlyList<double> theta) => M.DenseOfDiagonalArray(theta.Select(t => Complex.FromPolarCoordinates(1, t)).ToArray());

    /// <summary>A one-wire gate on wire k of n: I (x) ... (x) U (x) ... (x) I.</summary>
    public static Matrix<Complex> OnWire(int p, int n, int k, Matrix<Complex> u)
    {
        var result = M.DenseIdentity(1);
        for (int i = 0; i < n; i++) result = result.KroneckerProduct(i == k ? u : M.DenseIdentity(p));
        return result;
    }

    /// <summary>The digit of wire k (of n) in basis state x, wire 0 most significant.</summary>
    public static int Digit(int p, int n, int k, int x)
    {
        for (int i = n - 1; i > k; i--) x /= p;
        return x % p;
    }

    /// <summary>CZ^a between wires k and l of n, a diagonal matrix.</summary>
    public static Matrix<Complex> ControlledPhase(int p, int n, int k, int l, int a)
    {
        int size = (int)Math.Pow(p, n);
        return M.DenseOfDiagonalArray(Enumerable.Range(0, size).Select(x => Root(p, (long)a * Digit(p, n, k, x) * Digit(p, n, l, x))).ToArray());
    }

    /// <summary>The product of the gates, first gate rightmost.</summary>
    public static Matrix<Complex> Unitary(int p, int n, IEnumerable<(string Kind, int[] Wires, object Parameter)> gates)
    {
        var u = M.DenseIdentity((int)Math.Pow(p, n));
        foreach (var (kind, wires, parameter) in gates)
        {
            var g = kind switch
            {
                "fourier" => OnWire(p, n, wires[0], Fourier(p, (int)parameter)),
                "phase" => OnWire(p, n, wires[0], Diagonal((double[])parameter)),
                "cz" => ControlledPhase(p, n, wires[0], wires[1], (int)parameter),
                "matrix" => OnWire(p, n, wires[0], (Matrix<Complex>)parameter),
                _ => throw new ArgumentException(kind),
            };
            u = g * u;
        }
        return u;
    }

    /// <summary>V = P U E: columns the sorted inputs' basis states, rows the sorted outputs'.</summary>
    public static Matrix<Complex> Isometry(int p, int n, Matrix<Complex> u, IReadOnlyList<int> inputWires, IReadOnlyList<int> outputWires)
    {
        int size = (int)Math.Pow(p, n), columns = (int)Math.Pow(p, inputWires.Count), rows = (int)Math.Pow(p, outputWires.Count);
        int Place(int value, IReadOnlyList<int> wires)
        {
            // digits of value (first wire most significant) placed on the given wires, others 0
            var digits = new int[n];
            for (int i = wires.Count - 1; i >= 0; i--) { digits[wires[i]] = value % p; value /= p; }
            return digits.Aggregate(0, (acc, d) => acc * p + d);
        }
        var e = M.Dense(size, columns, (x, c) => x == Place(c, inputWires) ? Complex.One : Complex.Zero);
        var read = M.Dense(rows, size, (r, x) =>
        {
            for (int i = outputWires.Count - 1, v = r; i >= 0; i--, v /= p) if (Digit(p, n, outputWires[i], x) != v % p) return Complex.Zero;
            return Complex.One;
        });
        return read * u * e;
    }

    /// <summary>The matrix of an extracted circuit, multiplied out gate by gate.</summary>
    public static Matrix<Complex> Of(CausalCircuit c)
    {
        int p = c.Dimension, n = c.Wires.Count;
        var gates = c.Gates.Select(g => g switch
        {
            PreparePlus x => ("fourier", new[] { x.Wire }, (object)1),
            DiagonalPhase x => ("phase", new[] { x.Wire }, (object)x.Theta.ToArray()),
            FourierStep x => ("fourier", new[] { x.Wire }, (object)x.Weight),
            ControlledPhase x => ("cz", new[] { x.Wire1, x.Wire2 }, (object)x.Weight),
            _ => throw new ArgumentException("unknown gate"),
        });
        return Isometry(p, n, Unitary(p, n, gates), c.InputWires, c.OutputWires);
    }

    /// <summary>min over t of max-entry |a - e^(it) b|, with t the phase of tr(b^dagger a).</summary>
    public static double DistanceUpToPhase(Matrix<Complex> a, Matrix<Complex> b)
    {
        var overlap = Complex.Zero;
        for (int r = 0; r < a.RowCount; r++)
            for (int c = 0; c < a.ColumnCount; c++) overlap += Complex.Conjugate(b[r, c]) * a[r, c];
        var phase = overlap.Magnitude > 0 ? overlap / overlap.Magnitude : Complex.One;
        double largest = 0;
        for (int r = 0; r < a.RowCount; r++)
            for (int c = 0; c < a.ColumnCount; c++) largest = Math.Max(largest, (a[r, c] - phase * b[r, c]).Magnitude);
        return largest;
    }
}
