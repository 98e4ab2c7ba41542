namespace FlowCert.Algebra;

/// <summary>
/// The operations of a field whose elements are values of type <typeparamref name="T"/>.
/// Implementations are small readonly structs (a field descriptor, for example the prime of F_p), so
/// that generic code constrained on <c>TField : struct, IField&lt;T&gt;</c> is specialised by the JIT and
/// every operation has the same name over every field.
/// </summary>
public interface IField<T> where T : struct
{
    /// <summary>The additive identity.</summary>
    T Zero { get; }
    /// <summary>The multiplicative identity.</summary>
    T One { get; }
    /// <summary>True when a is zero.</summary>
    bool IsZero(T a);
    /// <summary>True when a and b are the same element.</summary>
    bool AreEqual(T a, T b);
    /// <summary>a + b.</summary>
    T Add(T a, T b);
    /// <summary>a - b.</summary>
    T Subtract(T a, T b);
    /// <summary>-a.</summary>
    T Negate(T a);
    /// <summary>a * b.</summary>
    T Multiply(T a, T b);
    /// <summary>The multiplicative inverse; throws on zero.</summary>
    T Inverse(T a);
    /// <summary>The image of a rational; throws <see cref="NotInFieldException"/> when the denominator is not invertible.</summary>
    T FromRational(Rational r);
    /// <summary>Canonical text of an element (certificate form).</summary>
    string Format(T a);
    /// <summary>Parses the canonical text of an element; false when it is not canonical.</summary>
    bool TryParse(string text, out T value);
    /// <summary>
    /// Eliminates a block B (one sparse row per entry) with this field's kernel: sparse rows for sparse
    /// blocks; for dense ones packed bits over F_2, word-sized residues over F_p, several primes over Q.
    /// Every kernel gives the same canonical solutions (<see cref="IEliminationResult{T}"/>). Internal:
    /// only the library's own fields implement it.
    /// </summary>
    internal IEliminationResult<T> Eliminate(IReadOnlyList<SparseVector<T>> rows);
}

/// <summary>A rational that has no image in the field (its denominator is divisible by p).</summary>
public sealed class NotInFieldException(string message) : Exception(message);
