namespace FlowCert.Algebra;

/// <summary>
/// What an elimination of a matrix B (rows 0..m-1, columns by id) tells the flow search: a basis of the
/// left kernel, and for every row r with e_r in the column space of B the canonical solution of
/// B c = e_r: the one that is zero off the greedy column basis taken in increasing column id. That
/// solution is unique, so every implementation returns the same solutions; the left-kernel basis may
/// differ between implementations (callers that publish it reduce it to echelon form first).
/// </summary>
internal interface IEliminationResult<T> where T : struct
{
    /// <summary>The rank of B.</summary>
    int Rank { get; }
    /// <summary>A basis of the left kernel {y : y^T B = 0}, as vectors over the rows.</summary>
    IReadOnlyList<SparseVector<T>> LeftKernel();
    /// <summary>For each row r whose unit vector e_r lies in the column space, the canonical solution c of B c = e_r, keyed by r.</summary>
    Dictionary<int, SparseVector<T>> SolveUnitVectors();
}

/// <summary>The entry point of block elimination: the field's own kernel (<see cref="IField{T}.Eliminate"/>).</summary>
internal static class Elimination
{
    /// <summary>Eliminates the matrix whose rows are <paramref name="rows"/> over <paramref name="field"/>.</summary>
    public static IEliminationResult<T> Run<T, TField>(TField field, IReadOnlyList<SparseVector<T>> rows)
        where T : struct where TField : struct, IField<T>
        => field.Eliminate(rows);
}
