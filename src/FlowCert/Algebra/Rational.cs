using System.Numerics;

namespace FlowCert.Algebra;

/// <summary>An exact rational number, always stored reduced with a positive denominator.</summary>
public readonly struct Rational : IEquatable<Rational>, IComparable<Rational>
{
    /// <summary>The numerator; carries the sign.</summary>
    public BigInteger Numerator { get; }
    private readonly BigInteger denominatorMinusOne; // default(Rational) is 0/1

    /// <summary>The denominator, always positive.</summary>
    public BigInteger Denominator => denominatorMinusOne + 1;

    /// <summary>The rational 0.</summary>
    public static readonly Rational Zero = new(BigInteger.Zero, BigInteger.One, reduced: true);
    /// <summary>The rational 1.</summary>
    public static readonly Rational One = new(BigInteger.One, BigInteger.One, reduced: true);

    private Rational(BigInteger num, BigInteger den, bool reduced)
    {
        Numerator = num;
        denominatorMinusOne = den - 1;
    }

    /// <summary>Creates num/den in lowest terms. Throws on a zero denominator.</summary>
    public static Rational Create(BigInteger num, BigInteger den)
    {
        if (den.IsZero) throw new DivideByZeroException("rational with denominator zero");
        if (den.Sign < 0) { num = -num; den = -den; }
        if (num.IsZero) return Zero;
        if (den.IsOne) return new Rational(num, den, true);
        var g = BigInteger.GreatestCommonDivisor(num, den);
        return g.IsOne ? new Rational(num, den, true) : new Rational(num / g, den / g, true);
    }

    /// <summary>The integer n as a rational.</summary>
    public static implicit operator Rational(long n) => new(n, BigInteger.One, true);
    /// <summary>The integer n as a rational.</summary>
    public static Rational FromInteger(BigInteger n) => new(n, BigInteger.One, true);

    /// <summary>True when the value is 0.</summary>
    public bool IsZero => Numerator.IsZero;
    /// <summary>-1, 0 or 1 by the sign of the value.</summary>
    public int Sign => Numerator.Sign;

    /// <summary>Exact sum.</summary>
    public static Rational operator +(Rational a, Rational b)
    {
        if (a.Denominator.IsOne && b.Denominator.IsOne) return new Rational(a.Numerator + b.Numerator, BigInteger.One, true);
        return Create(a.Numerator * b.Denominator + b.Numerator * a.Denominator, a.Denominator * b.Denominator);
    }

    /// <summary>Exact difference.</summary>
    public static Rational operator -(Rational a, Rational b) => a + (-b);
    /// <summary>Negation.</summary>
    public static Rational operator -(Rational a) => new(-a.Numerator, a.Denominator, true);

    /// <summary>Exact product.</summary>
    public static Rational operator *(Rational a, Rational b)
    {
        if (a.Denominator.IsOne && b.Denominator.IsOne) return new Rational(a.Numerator * b.Numerator, BigInteger.One, true);
        return Create(a.Numerator * b.Numerator, a.Denominator * b.Denominator);
    }

    /// <summary>Exact quotient; throws <see cref="DivideByZeroException"/> when b is zero.</summary>
    public static Rational operator /(Rational a, Rational b)
    {
        if (b.IsZero) throw new DivideByZeroException("division by the rational zero");
        return Create(a.Numerator * b.Denominator, a.Denominator * b.Numerator);
    }

    /// <summary>1 / this; throws <see cref="DivideByZeroException"/> on zero.</summary>
    public Rational Reciprocal() => One / this;

    /// <summary>True when both are the same rational.</summary>
    public bool Equals(Rational other) => Numerator == other.Numerator && Denominator == other.Denominator;
    /// <summary>True when obj is a <see cref="Rational"/> with the same value.</summary>
    public override bool Equals(object? obj) => obj is Rational r && Equals(r);
    /// <summary>A hash consistent with <see cref="Equals(Rational)"/>.</summary>
    public override int GetHashCode() => HashCode.Combine(Numerator, Denominator);
    /// <summary>Compares by numeric value.</summary>
    public int CompareTo(Rational other) => (Numerator * other.Denominator).CompareTo(other.Numerator * Denominator);
    /// <summary>Value equality.</summary>
    public static bool operator ==(Rational a, Rational b) => a.Equals(b);
    /// <summary>Value inequality.</summary>
    public static bool operator !=(Rational a, Rational b) => !a.Equals(b);

    /// <summary>Canonical text: <c>a</c> or <c>a/b</c> with b &gt; 1.</summary>
    public override string ToString()
        => Denominator.IsOne ? DecimalText.Of(Numerator) : DecimalText.Of(Numerator) + "/" + DecimalText.Of(Denominator);

    private static readonly System.Globalization.CultureInfo Invariant = System.Globalization.CultureInfo.InvariantCulture;
    private static BigInteger ParseDigits(string digits) => BigInteger.Parse(digits, System.Globalization.NumberStyles.None, Invariant);

    /// <summary>
    /// Parses an exact weight: <c>-?digits</c>, <c>-?digits/digits</c> or <c>-?digits.digits</c>.
    /// Returns false on anything else or a zero denominator.
    /// </summary>
    public static bool TryParse(string text, out Rational value)
    {
        value = Zero;
        if (string.IsNullOrEmpty(text)) return false;
        int i = text[0] == '-' ? 1 : 0;
        bool negative = i == 1;
        int slash = text.IndexOf('/'), dot = text.IndexOf('.');
        if (slash >= 0 && dot >= 0) return false;
        if (slash >= 0)
        {
            var (n, d) = (text[i..slash], text[(slash + 1)..]);
            if (!AllDigits(n) || !AllDigits(d)) return false;
            var den = ParseDigits(d);
            if (den.IsZero) return false;
            value = Create(negative ? -ParseDigits(n) : ParseDigits(n), den);
            return true;
        }
        if (dot >= 0)
        {
            var (w, f) = (text[i..dot], text[(dot + 1)..]);
            if (!AllDigits(w) || !AllDigits(f)) return false;
            var num = ParseDigits(w + f);
            value = Create(negative ? -num : num, BigInteger.Pow(10, f.Length));
            return true;
        }
        var rest = text[i..];
        if (!AllDigits(rest)) return false;
        var whole = ParseDigits(rest);
        value = FromInteger(negative ? -whole : whole);
        return true;
    }

    private static bool AllDigits(string s)
    {
        if (s.Length == 0) return false;
        foreach (var c in s) if (c < '0' || c > '9') return false;
        return true;
    }
}
