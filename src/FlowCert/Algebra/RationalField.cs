namespace FlowCert.Algebra;

/// <summary>The field Q of exact rationals (the continuous-variable case).</summary>
public readonly struct RationalField : IField<Rational>
{
    /// <inheritdoc/>
    public Rational Zero => Rational.Zero;
    /// <inheritdoc/>
    public Rational One => Rational.One;
    /// <inheritdoc/>
    public bool IsZero(Rational a) => a.IsZero;
    /// <inheritdoc/>
    public bool AreEqual(Rational a, Rational b) => a == b;
    /// <inheritdoc/>
    public Rational Add(Rational a, Rational b) => a + b;
    /// <inheritdoc/>
    public Rational Subtract(Rational a, Rational b) => a - b;
    /// <inheritdoc/>
    public Rational Negate(Rational a) => -a;
    /// <inheritdoc/>
    public Rational Multiply(Rational a, Rational b) => a * b;
    /// <inheritdoc/>
    public Rational Inverse(Rational a) => a.Reciprocal();
    /// <inheritdoc/>
    public Rational FromRational(Rational r) => r;
    /// <inheritdoc/>
    public string Format(Rational a) => a.ToString();
    /// <inheritdoc/>
    public bool TryParse(string text, out Rational value)
        => Rational.TryParse(text, out value) && value.ToString() == text;

    /// <inheritdoc/>
    IEliminationResult<Rational> IField<Rational>.Eliminate(IReadOnlyList<SparseVector<Rational>> rows)
        => MultiModularElimination.PaysOff(rows) ? MultiModularElimination.Run(rows) : new SparseElimination<Rational, RationalField>(this, rows);
}
