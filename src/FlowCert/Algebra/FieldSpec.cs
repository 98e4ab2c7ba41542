using System.Globalization;

namespace FlowCert.Algebra;

/// <summary>Which field an analysis runs over: Q, or F_p for a prime p.</summary>
public sealed record FieldSpec
{
    /// <summary>0 for Q, else the prime p.</summary>
    public ulong Prime { get; }
    private FieldSpec(ulong prime) => Prime = prime;

    /// <summary>The field Q of rationals.</summary>
    public static readonly FieldSpec Rationals = new(0);
    /// <summary>True for Q, false for F_p.</summary>
    public bool IsRationals => Prime == 0;

    /// <summary>F_p; throws <see cref="ArgumentException"/> unless p is a prime below 2^62.</summary>
    public static FieldSpec PrimeField(ulong p)
    {
        _ = new PrimeField(p);
        return new FieldSpec(p);
    }

    /// <summary>The certificate name: <c>Q</c>, <c>F2</c>, <c>F3</c>, ...</summary>
    public string Name => IsRationals ? "Q" : "F" + Prime.ToString(CultureInfo.InvariantCulture);
    /// <summary>The certificate name (<see cref="Name"/>).</summary>
    public override string ToString() => Name;

    /// <summary>
    /// Parses a command-line field: <c>Q</c>, or a prime in decimal (<c>F7</c> is accepted too).
    /// Throws <see cref="FieldSpecException"/> with a one-sentence reason otherwise.
    /// </summary>
    public static FieldSpec Parse(string text)
    {
        if (text is "Q" or "q") return Rationals;
        var digits = text.StartsWith('F') ? text[1..] : text;
        if (digits.Length == 0 || !digits.All(char.IsAsciiDigit))
            throw new FieldSpecException($"'{text}' is not a field: write Q or a prime such as 2, 3 or 7.");
        // A decimal number too long for 64 bits is still a number: say it is too large, not "not a field".
        if (!ulong.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out var p) || p >= Algebra.PrimeField.Bound)
            throw new FieldSpecException($"{digits.TrimStart('0')} is too large: primes below 2^62 are supported.");
        if (p < 2) throw new FieldSpecException($"{p} is not a prime: write Q or a prime such as 2, 3 or 7.");
        if (!Primality.IsPrime(p))
            throw new FieldSpecException(
                $"{p} is composite: Z/{p}Z is a ring with zero divisors, not a field, so elimination and " +
                "the flow conditions break there (see the README section \"Composite dimensions\").");
        return new FieldSpec(p);
    }

    /// <summary>
    /// Calls the visitor with the concrete field type: the one place where Q, F_2 and the other F_p are
    /// told apart (each field type brings its own elimination kernel, <see cref="IField{T}.Eliminate"/>).
    /// </summary>
    public TResult Accept<TResult>(IFieldVisitor<TResult> visitor)
        => IsRationals ? visitor.Visit<Rational, RationalField>(default)
            : Prime == 2 ? visitor.Visit<ulong, BinaryField>(default)
            : visitor.Visit<ulong, PrimeField>(new PrimeField(Prime));
}

/// <summary>Generic code to run over whichever field a <see cref="FieldSpec"/> names.</summary>
public interface IFieldVisitor<out TResult>
{
    /// <summary>Runs over the field <paramref name="field"/> with element type <typeparamref name="T"/>.</summary>
    TResult Visit<T, TField>(TField field) where T : struct where TField : struct, IField<T>;
}

/// <summary>A field name that is not Q or a prime.</summary>
public sealed class FieldSpecException(string message) : Exception(message);
