using System.Numerics;
using System.Text.RegularExpressions;

namespace FlowCheck;

/// <summary>An exact rational in lowest terms with a positive denominator.</summary>
public readonly record struct Rational
{
    static readonly Regex Weight = new(@"^(-?)([0-9]+)(?:/([0-9]+)|\.([0-9]+))?\z");

    public BigInteger Num { get; }
    public BigInteger Den { get; }

    public Rational(BigInteger num, BigInteger den)
    {
        // Stryker disable once Equality: a denominator is never 0 here (the readers refuse one, and only non-zero elements are inverted)
        if (den.Sign < 0) { num = -num; den = -den; }
        // Stryker disable once Conditional: an integer (a residue, say) needs no common divisor; the gcd would be 1 too
        var gcd = den.IsOne ? den : BigInteger.GreatestCommonDivisor(num, den);
        (Num, Den) = (num / gcd, den / gcd);
    }

    public static readonly Rational Zero = new(0, 1);
    public static readonly Rational One = new(1, 1);

    public static Rational operator +(Rational a, Rational b) => new(a.Num * b.Den + b.Num * a.Den, a.Den * b.Den);
    public static Rational operator *(Rational a, Rational b) => new(a.Num * b.Num, a.Den * b.Den);

    /// <summary>The canonical text: "a" when the denominator is 1, else "a/b".</summary>
    public override string ToString() => Den.IsOne ? Num.ToString() : $"{Num}/{Den}";

    /// <summary>The value for a message: at most 80 characters, and a long number by its size only (printing it is quadratic).</summary>
    public string Show() => Num.GetBitLength() + Den.GetBitLength() < 3000 ? Json.Cut(ToString()) : $"({Show(Num)})/({Show(Den)})";

    public static string Show(BigInteger n) => n.GetBitLength() < 3000 ? Json.Cut(n.ToString()) : $"a number of {n.GetBitLength()} bits";

    /// <summary>Reads a weight of the graph file grammar: "-3", "1/2", "0.25"; null when malformed.</summary>
    public static Rational? ParseWeight(string text)
    {
        if (Weight.Match(text) is not { Success: true } m) return null;
        var sign = m.Groups[1].Length == 1 ? BigInteger.MinusOne : BigInteger.One;
        var whole = sign * BigInteger.Parse(m.Groups[2].Value);
        if (m.Groups[3].Success) return BigInteger.Parse(m.Groups[3].Value) is var den && den.IsZero ? null : new Rational(whole, den);
        if (!m.Groups[4].Success) return new Rational(whole, 1);
        var scale = BigInteger.Pow(10, m.Groups[4].Length);
        return new Rational(whole * scale + sign * BigInteger.Parse(m.Groups[4].Value), scale);
    }

    /// <summary>Reads a rational only if the text is exactly its canonical form; null otherwise.</summary>
    /// <remarks>Checked by shape and by the reduced denominator, not by printing (printing a long number is quadratic).</remarks>
    public static Rational? ParseCanonical(string text)
    {
        if (!CanonicalShape.IsMatch(text) || ParseWeight(text) is not { } r) return null;
        var parts = text.Split('/');
        return parts.Length == 1 || (!r.Den.IsOne && r.Den == BigInteger.Parse(parts[1])) ? r : null;
    }

    static readonly Regex CanonicalShape = new(@"^(0|-?[1-9][0-9]*)(/[1-9][0-9]*)?\z");
}
