using System.Globalization;

namespace FlowCert.Algebra;

/// <summary>
/// One element of Q or of F_p, typed: a <see cref="Rational"/> over Q, a residue 0..p-1 over F_p. It is
/// what field-agnostic code (writers, schedules, pictures) holds; generic code works on the raw values
/// of <see cref="IField{T}"/> instead. Text is made only by <see cref="ToString"/>, for writers.
/// </summary>
public readonly struct FieldElement : IEquatable<FieldElement>
{
    private readonly Rational rational;
    private readonly ulong residue;

    /// <summary>0 for an element of Q, else the prime p of F_p.</summary>
    public ulong Prime { get; }

    private FieldElement(Rational rational, ulong residue, ulong prime)
    {
        this.rational = rational; this.residue = residue; Prime = prime;
    }

    /// <summary>The rational q as an element of Q.</summary>
    public static FieldElement OfRational(Rational q) => new(q, 0, 0);

    /// <summary>The residue r (0 &lt;= r &lt; p) as an element of F_p.</summary>
    public static FieldElement OfResidue(ulong r, ulong p)
        => r < p ? new(Rational.Zero, r, p) : throw new ArgumentOutOfRangeException(nameof(r), $"{r} is not a residue mod {p}");

    /// <summary>The element of type <typeparamref name="T"/> (Rational over Q, ulong over F_p) of the field <paramref name="field"/>.</summary>
    public static FieldElement Of<T>(FieldSpec field, T value) where T : struct => value switch
    {
        Rational q when field.IsRationals => OfRational(q),
        ulong r when !field.IsRationals => OfResidue(r, field.Prime),
        _ => throw new ArgumentException($"a {typeof(T).Name} is not an element of {field.Name}"),
    };

    /// <summary>True when the element is 0.</summary>
    public bool IsZero => Prime == 0 ? rational.IsZero : residue == 0;
    /// <summary>True when the element is 1.</summary>
    public bool IsOne => Prime == 0 ? rational == Rational.One : residue == 1;
    /// <summary>True for a negative rational; never for a residue (residues have no sign).</summary>
    public bool IsNegative => Prime == 0 && rational.Sign < 0;
    /// <summary>The additive inverse, in the same field.</summary>
    public FieldElement Negate() => Prime == 0 ? OfRational(-rational) : new(Rational.Zero, residue == 0 ? 0 : Prime - residue, Prime);

    /// <summary>The value over Q; throws for an element of F_p.</summary>
    public Rational AsRational => Prime == 0 ? rational : throw new InvalidOperationException($"an element of F{Prime} is not a rational");
    /// <summary>The residue over F_p; throws for an element of Q.</summary>
    public ulong AsResidue => Prime != 0 ? residue : throw new InvalidOperationException("an element of Q is not a residue");

    /// <summary>Canonical text (docs/formats.md): <c>a</c> or <c>a/b</c> over Q, the residue over F_p.</summary>
    public override string ToString() => Prime == 0 ? rational.ToString() : residue.ToString(CultureInfo.InvariantCulture);

    /// <summary>Same field and same value.</summary>
    public bool Equals(FieldElement other) => Prime == other.Prime && residue == other.residue && rational == other.rational;
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is FieldElement e && Equals(e);
    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Prime, residue, rational);
    /// <summary>Value equality.</summary>
    public static bool operator ==(FieldElement a, FieldElement b) => a.Equals(b);
    /// <summary>Value inequality.</summary>
    public static bool operator !=(FieldElement a, FieldElement b) => !a.Equals(b);
}
