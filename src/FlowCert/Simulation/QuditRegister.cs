using System.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Simulation;

/// <summary>
/// A state vector over labelled qudits of one prime dimension p. The qudit at position k has stride p^k.
/// Labels are node indices for graph qudits and negative numbers for reference qudits.
/// </summary>
public sealed class QuditRegister
{
    /// <summary>The qudit dimension p.</summary>
    public int Dimension { get; }
    /// <summary>The label of the qudit at each position (node index, or negative for a reference qudit).</summary>
    public IReadOnlyList<int> Labels { get; }
    /// <summary>The state vector; the qudit at position k has stride p^k.</summary>
    public Complex[] Amplitudes { get; }

    /// <summary>Wraps the amplitudes (no copy); throws when their count is not p to the number of labels.</summary>
    public QuditRegister(int dimension, IReadOnlyList<int> labels, Complex[] amplitudes)
    {
        long size = 1;
        foreach (var _ in labels) size *= dimension;
        if (amplitudes.Length != size) throw new ArgumentException($"{labels.Count} qudits of dimension {dimension} need {size} amplitudes, not {amplitudes.Length}");
        Dimension = dimension; Labels = labels; Amplitudes = amplitudes;
    }

    private int Position(int label)
    {
        for (int k = 0; k < Labels.Count; k++) if (Labels[k] == label) return k;
        throw new ArgumentException($"no qudit labelled {label} in the register");
    }

    private int Stride(int position)
    {
        int s = 1;
        for (int k = 0; k < position; k++) s *= Dimension;
        return s;
    }

    /// <summary>
    /// Contracts one qudit with a bra (sum_x bra[x] psi[.., x, ..]) and removes it: the unnormalized state
    /// of the other qudits after the outcome whose basis vector has coefficients conj(bra).
    /// </summary>
    public QuditRegister Project(int label, IReadOnlyList<Complex> bra)
    {
        int p = Dimension, k = Position(label), stride = Stride(k);
        int outer = Amplitudes.Length / (stride * p);
        var result = new Complex[Amplitudes.Length / p];
        for (int hi = 0; hi < outer; hi++)
        {
            int source = hi * stride * p, target = hi * stride;
            for (int x = 0; x < p; x++)
            {
                var coefficient = bra[x];
                int from = source + x * stride;
                for (int lo = 0; lo < stride; lo++) result[target + lo] += coefficient * Amplitudes[from + lo];
            }
        }
        var labels = Labels.Where((_, i) => i != k).ToArray();
        return new QuditRegister(p, labels, result);
    }

    /// <summary>
    /// A new register with one more qudit in the given state at the highest position (the tensor
    /// product state (x) this): the width-following simulator prepares each node this way.
    /// </summary>
    public QuditRegister Extend(int label, IReadOnlyList<Complex> state)
    {
        int p = Dimension, size = Amplitudes.Length;
        var result = new Complex[size * p];
        for (int x = 0; x < p; x++)
        {
            var c = state[x];
            if (c == Complex.Zero) continue;
            for (int i = 0; i < size; i++) result[x * size + i] = c * Amplitudes[i];
        }
        return new QuditRegister(p, Labels.Append(label).ToArray(), result);
    }

    /// <summary>
    /// A new register with two more qudits in the maximally entangled state sum_j |j>|j> / sqrt(p):
    /// an input node and its reference qudit.
    /// </summary>
    public QuditRegister ExtendEntangled(int firstLabel, int secondLabel)
    {
        int p = Dimension, size = Amplitudes.Length;
        var result = new Complex[size * p * p];
        double norm = 1 / Math.Sqrt(p);
        for (int j = 0; j < p; j++)
            for (int i = 0; i < size; i++) result[(j * p + j) * size + i] = norm * Amplitudes[i];
        return new QuditRegister(p, Labels.Append(firstLabel).Append(secondLabel).ToArray(), result);
    }

    /// <summary>Applies CZ^weight (|j, k> -> w^(weight j k) |j, k>) to two qudits, in place.</summary>
    public void ApplyControlledPhase(int first, int second, int weight)
    {
        int p = Dimension, s1 = Stride(Position(first)), s2 = Stride(Position(second));
        var phases = Enumerable.Range(0, p).Select(k => QuditOperators.RootOfUnity(p, (long)weight * k)).ToArray();
        for (int i = 0; i < Amplitudes.Length; i++)
        {
            int j = i / s1 % p, k = i / s2 % p;
            if (j == 0 || k == 0) continue;
            Amplitudes[i] *= phases[j * k % p];
        }
    }

    /// <summary>Applies a p x p matrix to one qudit, in place.</summary>
    public void Apply(int label, Matrix<Complex> gate)
    {
        int p = Dimension, stride = Stride(Position(label));
        int outer = Amplitudes.Length / (stride * p);
        var column = new Complex[p];
        for (int hi = 0; hi < outer; hi++)
            for (int lo = 0; lo < stride; lo++)
            {
                int start = hi * stride * p + lo;
                for (int x = 0; x < p; x++) column[x] = Amplitudes[start + x * stride];
                for (int y = 0; y < p; y++)
                {
                    Complex s = Complex.Zero;
                    for (int x = 0; x < p; x++) s += gate[y, x] * column[x];
                    Amplitudes[start + y * stride] = s;
                }
            }
    }

    /// <summary>
    /// The register as a matrix M[r, c] = amplitude with the row qudits in basis state r and the column
    /// qudits in c; r and c are read with the first listed qudit most significant. The two lists must
    /// together name every qudit once.
    /// </summary>
    public Matrix<Complex> ToMatrix(IReadOnlyList<int> rowLabels, IReadOnlyList<int> columnLabels)
    {
        if (rowLabels.Count + columnLabels.Count != Labels.Count || !rowLabels.Concat(columnLabels).All(Labels.Contains))
            throw new ArgumentException("rows and columns must name every qudit of the register once");
        int[] Offsets(IReadOnlyList<int> labels)
        {
            var offsets = new int[] { 0 };
            foreach (var label in labels)
            {
                int stride = Stride(Position(label));
                offsets = offsets.SelectMany(o => Enumerable.Range(0, Dimension).Select(x => o + x * stride)).ToArray();
            }
            return offsets;
        }
        var rows = Offsets(rowLabels);
        var columns = Offsets(columnLabels);
        return Matrix<Complex>.Build.Dense(rows.Length, columns.Length, (r, c) => Amplitudes[rows[r] + columns[c]]);
    }
}
