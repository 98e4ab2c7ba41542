using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// The carried reduced form (<see cref="CarriedEchelon{T, TField}"/>) against a fresh elimination after
/// every operation of a seeded random sequence: zero rows added, any row deleted (rows in the column space
/// and rows that are not; their slots are used again), zero columns removed, columns inserted with ids below, between and above the pivots so far. After each
/// operation the answers must be those of the sparse elimination of the same matrix: the rank, which rows
/// are solvable, each canonical solution entry for entry, and the reduced echelon form of the left kernel
/// (unique, common practice); the reference rank of the plain Gauss-Jordan matrix must agree too.
/// </summary>
public class CarriedEchelonTests
{
    private static void Run<TField>(TField f, Func<Random, ulong> nonZero, int seed, int sequences)
        where TField : struct, IField<ulong>
    {
        var rng = new Random(seed);
        int checks = 0, solvedRows = 0, kernelRows = 0, moved = 0, removed = 0;
        for (int t = 0; t < sequences; t++)
        {
            int rowCap = rng.Next(2, 24), colCap = rng.Next(2, 30);
            var form = new CarriedEchelon<ulong, TField>(f, rowCap, colCap);
            var matrix = new SortedDictionary<int, SortedDictionary<int, ulong>>(); // row id -> column id -> entry
            var freeColumnIds = Enumerable.Range(0, 6 * colCap).OrderBy(_ => rng.Next()).Take(2 * colCap).ToList();
            var present = new List<int>();
            int nextRow = 0, columns = 0;
            double density = 0.2 + 0.6 * rng.NextDouble();
            for (int step = 0; step < 2 * (rowCap + colCap); step++)
            {
                int op = rng.Next(4);
                var zeroColumns = present.Where(c => matrix.Values.All(row => !row.ContainsKey(c))).ToList();
                if (op == 0 && matrix.Count < rowCap)
                {
                    int id = 5 * nextRow++ + 2;
                    form.AddZeroRow(id);
                    matrix[id] = [];
                }
                else if (op == 1 && matrix.Count > 0)
                {
                    int id = matrix.Keys.ElementAt(rng.Next(matrix.Count));
                    form.DeleteRow(id);
                    matrix.Remove(id);
                }
                else if (op == 3 && zeroColumns.Count > 0)
                {
                    int id = zeroColumns[rng.Next(zeroColumns.Count)];
                    form.RemoveZeroColumn(id); // its slot is handed out again
                    present.Remove(id);
                    removed++;
                }
                else if (present.Count < colCap && columns < freeColumnIds.Count && matrix.Count > 0)
                {
                    int id = freeColumnIds[columns++];
                    var entries = matrix.Keys.Where(_ => rng.NextDouble() < density).Select(r => (Row: r, Value: nonZero(rng))).ToArray();
                    if (entries.Length == 0) continue;
                    int pivotsAbove = form.Result(matrix.Keys.ToArray()).SolveUnitVectors().Values.SelectMany(s => s.Indices).Count(c => c > id);
                    if (pivotsAbove > 0) moved++;
                    foreach (var (r, v) in entries) matrix[r][id] = v;
                    present.Add(id);
                    form.AddColumn(id, entries.Select(e => e.Row).ToArray(), entries.Select(e => e.Value).ToArray());
                }
                else continue;
                Check(f, form, matrix, ref solvedRows, ref kernelRows);
                checks++;
            }
        }
        Assert.True(checks > 10 * sequences && solvedRows > checks / 2 && kernelRows > checks / 2 && moved > sequences / 2 && removed > sequences / 2,
            $"checks {checks}, solved rows {solvedRows}, kernel vectors {kernelRows}, columns inserted below a pivot {moved}, zero columns removed {removed}");
    }

    private static void Check<TField>(TField f, CarriedEchelon<ulong, TField> form, SortedDictionary<int, SortedDictionary<int, ulong>> matrix,
        ref int solvedRows, ref int kernelRows) where TField : struct, IField<ulong>
    {
        var rowIds = matrix.Keys.ToArray();
        var rows = rowIds.Select(r => new SparseVector<ulong>(matrix[r].Keys.ToArray(), matrix[r].Values.ToArray())).ToArray();
        var carried = form.Result(rowIds);
        var fresh = new SparseElimination<ulong, TField>(f, rows);
        Assert.Equal(fresh.Rank, carried.Rank);
        var columnIds = rows.SelectMany(r => r.Indices).Distinct().Order().ToArray();
        var reference = new DenseMatrix<ulong, TField>(f, rows.Length, columnIds.Length);
        for (int i = 0; i < rows.Length; i++)
            for (int k = 0; k < rows[i].Count; k++) reference[i, Array.IndexOf(columnIds, rows[i].Indices[k])] = rows[i].Values[k];
        var (_, referencePivots) = reference.RowReduce();
        Assert.Equal(referencePivots.Length, carried.Rank);

        var expected = fresh.SolveUnitVectors();
        var actual = carried.SolveUnitVectors();
        Assert.Equal(expected.Keys.Order(), actual.Keys.Order());
        foreach (var (r, c) in expected)
        {
            Assert.Equal(c.Indices, actual[r].Indices);
            Assert.Equal(c.Values, actual[r].Values);
        }
        solvedRows += expected.Count;

        var kernel = carried.LeftKernel();
        Assert.Equal(rows.Length - carried.Rank, kernel.Count);
        var mine = new SparseElimination<ulong, TField>(f, kernel).ReducedRows();
        var theirs = new SparseElimination<ulong, TField>(f, fresh.LeftKernel()).ReducedRows();
        Assert.Equal(theirs.Count, mine.Count);
        for (int k = 0; k < mine.Count; k++)
        {
            Assert.Equal(theirs[k].Indices, mine[k].Indices);
            Assert.Equal(theirs[k].Values, mine[k].Values);
        }
        kernelRows += kernel.Count;
    }

    [Fact]
    public void F3AgainstAFreshEliminationAfterEveryOperation() => Run(new PrimeField(3), r => (ulong)r.Next(1, 3), 301, 150);

    [Fact]
    public void F1000003AgainstAFreshEliminationAfterEveryOperation() => Run(new PrimeField(1000003), r => (ulong)r.Next(1, 1000003), 302, 150);

    [Fact]
    public void Mersenne61AgainstAFreshEliminationAfterEveryOperation()
        => Run(new PrimeField(FieldSamples.Mersenne61), r => (ulong)r.NextInt64(1, (long)FieldSamples.Mersenne61), 303, 100);

    [Fact]
    public void F2AgainstAFreshEliminationAfterEveryOperation() => Run(default(BinaryField), _ => 1UL, 304, 150);
}
