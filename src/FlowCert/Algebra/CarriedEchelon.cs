using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace FlowCert.Algebra;

/// <summary>
/// The reduced row echelon form of [B | I] kept up to date while rows of B are deleted and columns are
/// inserted, instead of eliminating B afresh: R = X B with R reduced and X invertible. Rows and columns
/// are named by ids (graph nodes); a column's place in the greedy basis is its id. Because the reduced
/// form of B is unique, the canonical solutions read from it (<see cref="IEliminationResult{T}"/>) are the
/// ones a fresh elimination gives: carrying the form changes no answer, only the work, which is one pass
/// of row operations per deleted row or inserted column, O(m (m + c)), against O(m r (m + c)) for a new
/// elimination of an m x c block of rank r. Update rules (facts of linear algebra, common practice):
/// <list type="bullet">
/// <item>Deleting row s: a kernel row y of X (R part zero) with y_s != 0 absorbs s (R unchanged, the
/// kernel loses one dimension); otherwise e_s is in the column space, and the echelon row with X_s != 0
/// whose pivot id is largest absorbs s and leaves with its pivot (the rank drops by one; the other rows
/// keep their leading entries, since that row is zero before its pivot and on every other pivot).</item>
/// <item>Inserting column x: its reduced form is v = X b. A kernel row with v != 0 becomes x's pivot row (the
/// rank grows by one). Otherwise, if some echelon row with pivot id above x has v != 0, the one whose
/// pivot id is largest moves its pivot to x (that old pivot column becomes dependent); else x depends on
/// earlier columns and nothing changes. Then x is cleared from every other row.</item>
/// </list>
/// Dense rows: meant for blocks that are dense and not too large (the flow search decides when).
/// </summary>
internal sealed class CarriedEchelon<T, TField> where T : struct where TField : struct, IField<T>
{
    private sealed class Row(T[] r, T[] x)
    {
        public readonly T[] R = r; // over column slots
        public readonly T[] X = x; // over row slots
        public int Pivot = -1;     // the pivot's column id, or -1 for a row of the left kernel (R is zero)
    }

    private readonly TField f;
    private readonly ulong prime; // p when the field is F_p: the row passes then use ModularElimination's Shoup loops
    private readonly List<Row> rows = [];
    private readonly Dictionary<int, int> rowSlot = [];
    private readonly Dictionary<int, int> columnSlot = [];
    private readonly int rowCapacity, columnCapacity;
    // Slots 0..used-1 have been handed out; a deleted row's or removed column's slot is zero everywhere
    // and is handed out again first, so the row passes run over the largest number present at once.
    private int rowsUsed, columnsUsed;
    private readonly Stack<int> freeRows = new(), freeColumns = new();

    /// <summary>An empty form for at most <paramref name="rowCapacity"/> rows and <paramref name="columnCapacity"/> columns at once.</summary>
    public CarriedEchelon(TField field, int rowCapacity, int columnCapacity)
    {
        if (!field.IsZero(default)) throw new ArgumentException("dense rows start as default(T), which must be the field's zero");
        f = field;
        prime = field is PrimeField pf ? pf.P : 0;
        this.rowCapacity = rowCapacity;
        this.columnCapacity = columnCapacity;
    }

    /// <summary>Whether row <paramref name="id"/> is a row of B now.</summary>
    public bool HasRow(int id) => rowSlot.ContainsKey(id);

    /// <summary>Whether column <paramref name="id"/> is a column of B now.</summary>
    public bool HasColumn(int id) => columnSlot.ContainsKey(id);

    /// <summary>Adds a row of B that is zero on every column so far (it enters as a row of the left kernel).</summary>
    public void AddZeroRow(int id)
    {
        int s = freeRows.Count > 0 ? freeRows.Pop() : rowsUsed < rowCapacity ? rowsUsed++
            : throw new InvalidOperationException("more rows at once than the capacity given");
        rowSlot.Add(id, s);
        var x = new T[rowCapacity];
        x[s] = f.One;
        rows.Add(new Row(new T[columnCapacity], x));
    }

    /// <summary>Deletes row <paramref name="id"/> of B.</summary>
    public void DeleteRow(int id)
    {
        int s = rowSlot[id];
        rowSlot.Remove(id);
        Row? k = null;
        foreach (var row in rows)
        {
            if (f.IsZero(row.X[s])) continue;
            if (row.Pivot < 0) { k = row; break; }
            if (k is null || row.Pivot > k.Pivot) k = row;
        }
        if (k is null) throw new InvalidOperationException("X is singular: the form was corrupted");
        var inverse = f.Inverse(k.X[s]);
        foreach (var row in rows)
            if (row != k && !f.IsZero(row.X[s])) SubtractMultiple(row, f.Multiply(row.X[s], inverse), k);
        rows.Remove(k);
        freeRows.Push(s);
    }

    /// <summary>Removes column <paramref name="id"/>, which must be zero on every row of B now (its reduced form is then zero too).</summary>
    public void RemoveZeroColumn(int id)
    {
        int c = columnSlot[id];
        if (rows.Any(r => !f.IsZero(r.R[c]))) throw new InvalidOperationException($"column {id} is not zero");
        columnSlot.Remove(id);
        freeColumns.Push(c);
    }

    /// <summary>Inserts column <paramref name="id"/> of B, given its non-zero entries by row id (every row id present).</summary>
    public void AddColumn(int id, ReadOnlySpan<int> rowIds, ReadOnlySpan<T> values)
    {
        int c = freeColumns.Count > 0 ? freeColumns.Pop() : columnsUsed < columnCapacity ? columnsUsed++
            : throw new InvalidOperationException("more columns at once than the capacity given");
        columnSlot.Add(id, c);
        var slots = new int[rowIds.Length];
        for (int e = 0; e < rowIds.Length; e++) slots[e] = rowSlot[rowIds[e]];
        var quotients = new ulong[prime != 0 ? rowIds.Length : 0]; // over F_p each entry of b multiplies with its Shoup quotient
        for (int e = 0; e < quotients.Length; e++) quotients[e] = Shoup.Quotient(Unsafe.As<T, ulong>(ref Unsafe.AsRef(in values[e])), prime);
        Row? k = null;
        foreach (var row in rows)
        {
            var v = f.Zero; // (X b) for this row
            if (typeof(T) == typeof(ulong) && prime != 0)
            {
                var x = MemoryMarshal.Cast<T, ulong>(row.X.AsSpan());
                var b = MemoryMarshal.Cast<T, ulong>(values);
                ulong sum = 0;
                for (int e = 0; e < slots.Length; e++)
                    if (x[slots[e]] is not 0 and var xs) { sum += Shoup.Multiply(b[e], quotients[e], xs, prime); sum = Math.Min(sum, sum - prime); }
                v = Unsafe.As<ulong, T>(ref sum);
            }
            else
                for (int e = 0; e < slots.Length; e++)
                    if (!f.IsZero(row.X[slots[e]])) v = f.Add(v, f.Multiply(row.X[slots[e]], values[e]));
            row.R[c] = v;
            if (f.IsZero(v) || k is { Pivot: < 0 }) continue;
            if (row.Pivot < 0 || (row.Pivot > id && (k is null || row.Pivot > k.Pivot))) k = row;
        }
        if (k is null) return; // x depends on the columns before it
        Scale(k, f.Inverse(k.R[c]));
        k.Pivot = id;
        foreach (var row in rows)
            if (row != k && !f.IsZero(row.R[c])) SubtractMultiple(row, row.R[c], k);
    }

    /// <summary>
    /// What the flow search reads, with the rows of B numbered by their place in <paramref name="rowIds"/>
    /// (every row id of B, increasing), as a fresh elimination of that block would number them.
    /// </summary>
    public IEliminationResult<T> Result(int[] rowIds)
    {
        if (rowIds.Length != rows.Count || !rowIds.All(rowSlot.ContainsKey))
            throw new InvalidOperationException("the rows asked for are not the rows of the form");
        return new Reading(this, rowIds.Select(id => rowSlot[id]).ToArray());
    }

    private sealed class Reading(CarriedEchelon<T, TField> form, int[] slots) : IEliminationResult<T>
    {
        private readonly TField f = form.f;

        public int Rank => form.rows.Count(r => r.Pivot >= 0);

        public Dictionary<int, SparseVector<T>> SolveUnitVectors()
        {
            var kernel = form.rows.Where(r => r.Pivot < 0).ToArray();
            var basis = form.rows.Where(r => r.Pivot >= 0).OrderBy(r => r.Pivot).ToArray();
            var solutions = new Dictionary<int, SparseVector<T>>();
            var (cols, vals) = (new int[basis.Length], new T[basis.Length]);
            for (int i = 0; i < slots.Length; i++)
            {
                int s = slots[i];
                if (kernel.Any(y => !f.IsZero(y.X[s]))) continue;
                int count = 0;
                foreach (var row in basis)
                    if (!f.IsZero(row.X[s])) (cols[count], vals[count++]) = (row.Pivot, row.X[s]);
                solutions[i] = new SparseVector<T>(cols[..count], vals[..count]);
            }
            return solutions;
        }

        public IReadOnlyList<SparseVector<T>> LeftKernel()
        {
            var basis = new List<SparseVector<T>>();
            foreach (var row in form.rows.Where(r => r.Pivot < 0))
            {
                var at = Enumerable.Range(0, slots.Length).Where(i => !f.IsZero(row.X[slots[i]])).ToArray();
                basis.Add(new SparseVector<T>(at, at.Select(i => row.X[slots[i]]).ToArray()));
            }
            return basis;
        }
    }

    private void Scale(Row row, T factor)
    {
        if (typeof(T) == typeof(ulong) && prime != 0)
        {
            var w = Unsafe.As<T, ulong>(ref factor);
            ModularElimination.ScaleShoup(MemoryMarshal.Cast<T, ulong>(row.R.AsSpan(0, columnsUsed)), w, prime);
            ModularElimination.ScaleShoup(MemoryMarshal.Cast<T, ulong>(row.X.AsSpan(0, rowsUsed)), w, prime);
            return;
        }
        for (int j = 0; j < columnsUsed; j++) row.R[j] = f.Multiply(row.R[j], factor);
        for (int j = 0; j < rowsUsed; j++) row.X[j] = f.Multiply(row.X[j], factor);
    }

    /// <summary>row -= factor * source, on both parts.</summary>
    private void SubtractMultiple(Row row, T factor, Row source)
    {
        if (typeof(T) == typeof(ulong) && prime != 0)
        {
            var w = prime - Unsafe.As<T, ulong>(ref factor); // factor is not zero
            ModularElimination.AddMulShoup(MemoryMarshal.Cast<T, ulong>(row.R.AsSpan(0, columnsUsed)), MemoryMarshal.Cast<T, ulong>(source.R.AsSpan(0, columnsUsed)), w, prime);
            ModularElimination.AddMulShoup(MemoryMarshal.Cast<T, ulong>(row.X.AsSpan(0, rowsUsed)), MemoryMarshal.Cast<T, ulong>(source.X.AsSpan(0, rowsUsed)), w, prime);
            return;
        }
        for (int j = 0; j < columnsUsed; j++)
            if (!f.IsZero(source.R[j])) row.R[j] = f.Subtract(row.R[j], f.Multiply(factor, source.R[j]));
        for (int j = 0; j < rowsUsed; j++)
            if (!f.IsZero(source.X[j])) row.X[j] = f.Subtract(row.X[j], f.Multiply(factor, source.X[j]));
    }
}
