using System.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Simulation;

/// <summary>
/// The map a pattern implements from its inputs to its outputs: a p^|O| x p^|I| matrix (rows: output
/// basis states, columns: input basis states, the first sorted node the most significant digit), the
/// all-zero branch's map times sqrt(p^|M|), so that it is an isometry when the pattern is deterministic.
/// Its global phase is fixed: the first entry (row by row) whose magnitude is at least half the largest
/// is real and positive.
/// </summary>
public sealed record ImplementedMap(int Dimension, IReadOnlyList<string> Inputs, IReadOnlyList<string> Outputs, Matrix<Complex> Matrix)
{
    /// <summary>The map of the pattern's all-zero branch, normalised and phase-fixed.</summary>
    public static ImplementedMap Of(QuditPattern pattern)
    {
        Matrix<Complex>? zero = null;
        OutcomeTreeSimulator.Explore(pattern, OutcomeBranches.Sample(0, 0), FrameFault.None, b => zero ??= b.OutputMap);
        var g = pattern.Graph;
        return new ImplementedMap(pattern.Dimension, g.SortedInputs.Select(v => g.Names[v]).ToArray(),
            g.SortedOutputs.Select(v => g.Names[v]).ToArray(), FixPhase(Normalise(pattern, zero!)));
    }

    /// <summary>A branch's map times sqrt(p^|M|): the isometry itself when the pattern is deterministic.</summary>
    public static Matrix<Complex> Normalise(QuditPattern pattern, Matrix<Complex> branchMap)
        => branchMap * new Complex(Math.Sqrt(Math.Pow(pattern.Dimension, pattern.Order.Count)), 0);

    /// <summary>Multiplies by the phase that makes the first entry of at least half the largest magnitude real and positive.</summary>
    public static Matrix<Complex> FixPhase(Matrix<Complex> m)
    {
        double largest = 0;
        for (int r = 0; r < m.RowCount; r++)
            for (int c = 0; c < m.ColumnCount; c++) largest = Math.Max(largest, m[r, c].Magnitude);
        if (largest == 0) return m;
        for (int r = 0; r < m.RowCount; r++)
            for (int c = 0; c < m.ColumnCount; c++)
                if (m[r, c].Magnitude >= largest / 2)
                    return m * (Complex.Conjugate(m[r, c]) / m[r, c].Magnitude);
        return m;
    }

    /// <summary>The label of basis state k over the given nodes: its digits, first node first (for example |0 2>).</summary>
    public static string BasisLabel(int p, int count, int k)
    {
        var digits = new int[count];
        for (int i = count - 1; i >= 0; i--) { digits[i] = k % p; k /= p; }
        return "|" + string.Join(p <= 10 ? "" : " ", digits) + ">";
    }
}

/// <summary>The largest disagreement between a claimed matrix and the branches simulated.</summary>
/// <param name="Agrees">Every entry of every compared branch is within the tolerance of the claim, after the best global phase.</param>
/// <param name="Largest">The largest |computed - e^(it) claimed| over entries and branches.</param>
/// <param name="Row">Row of that entry.</param>
/// <param name="Column">Column of that entry.</param>
/// <param name="Computed">The computed entry there.</param>
/// <param name="Claimed">The claimed entry there, times the phase e^(it) that best aligns the claim with that branch.</param>
/// <param name="Raw">The raw outcomes of that branch, indexed by node.</param>
/// <param name="Branches">How many branches were compared.</param>
public sealed record MapComparison(bool Agrees, double Largest, int Row, int Column, Complex Computed, Complex Claimed, int[] Raw, int Branches)
{
    /// <summary>Entries agree when they differ by at most this (absolute, after the best global phase).</summary>
    public const double Tolerance = 1e-6;

    /// <summary>
    /// Compares the claim with every selected branch's normalised map. The best phase for a branch is that
    /// of the overlap tr(claim^dagger M); a wrong scale, a wrong entry or an outcome-dependent branch all
    /// show as a difference. The claim must have the map's shape (check before).
    /// </summary>
    public static MapComparison Run(QuditPattern pattern, Matrix<Complex> claim, OutcomeBranches branches)
    {
        MapComparison? worst = null;
        int count = 0;
        OutcomeTreeSimulator.Explore(pattern, branches, FrameFault.None, b =>
        {
            count++;
            var m = ImplementedMap.Normalise(pattern, b.OutputMap);
            var overlap = Complex.Zero;
            for (int r = 0; r < m.RowCount; r++)
                for (int c = 0; c < m.ColumnCount; c++) overlap += Complex.Conjugate(claim[r, c]) * m[r, c];
            var phase = overlap.Magnitude > 0 ? overlap / overlap.Magnitude : Complex.One;
            for (int r = 0; r < m.RowCount; r++)
                for (int c = 0; c < m.ColumnCount; c++)
                {
                    double d = (m[r, c] - phase * claim[r, c]).Magnitude;
                    if (worst is null || d > worst.Largest) worst = new MapComparison(false, d, r, c, m[r, c], phase * claim[r, c], b.Raw, 0);
                }
        });
        return worst! with { Agrees = worst!.Largest <= Tolerance, Branches = count };
    }
}
