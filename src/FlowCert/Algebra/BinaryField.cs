namespace FlowCert.Algebra;

/// <summary>
/// The field F_2 with elements 0 and 1 (the qubit case): the same elements, texts and results as
/// <c>new PrimeField(2)</c>, with XOR and AND for the operations and the packed elimination
/// (<see cref="BitElimination"/>) for dense blocks. <see cref="FieldSpec.Accept{TResult}"/> hands it out for p = 2.
/// </summary>
public readonly struct BinaryField : IField<ulong>
{
    private static readonly PrimeField Two = new(2);

    /// <inheritdoc/>
    public ulong Zero => 0;
    /// <inheritdoc/>
    public ulong One => 1;
    /// <inheritdoc/>
    public bool IsZero(ulong a) => a == 0;
    /// <inheritdoc/>
    public bool AreEqual(ulong a, ulong b) => a == b;
    /// <inheritdoc/>
    public ulong Add(ulong a, ulong b) => a ^ b;
    /// <inheritdoc/>
    public ulong Subtract(ulong a, ulong b) => a ^ b;
    /// <inheritdoc/>
    public ulong Negate(ulong a) => a;
    /// <inheritdoc/>
    public ulong Multiply(ulong a, ulong b) => a & b;
    /// <inheritdoc/>
    public ulong Inverse(ulong a) => a == 0 ? throw new DivideByZeroException("zero has no inverse in F_2") : 1UL;
    /// <inheritdoc/>
    public ulong FromRational(Rational r) => Two.FromRational(r);
    /// <inheritdoc/>
    public string Format(ulong a) => Two.Format(a);
    /// <inheritdoc/>
    public bool TryParse(string text, out ulong value) => Two.TryParse(text, out value);

    /// <inheritdoc/>
    IEliminationResult<ulong> IField<ulong>.Eliminate(IReadOnlyList<SparseVector<ulong>> rows)
        => BitElimination.PaysOff(rows) ? BitElimination.Run(rows) : new SparseElimination<ulong, BinaryField>(this, rows);
}
