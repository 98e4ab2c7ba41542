using System.Numerics;
using System.Text.RegularExpressions;

namespace FlowCheck;

/// <summary>Q (P = 0) or F_p. Elements are Rationals; in F_p they are integers 0..p-1.</summary>
public sealed class Field
{
    static readonly Regex PrimeField = new(@"^F([1-9][0-9]*)\z");

    public string Name { get; }
    public BigInteger P { get; }

    Field(string name, BigInteger p) { Name = name; P = p; }

    /// <summary>Reads "Q" or "F" followed by a prime in decimal; rejects anything else with a reason.</summary>
    public static Field Parse(string text)
    {
        if (text == "Q") return new Field(text, 0);
        if (PrimeField.Match(text) is not { Success: true } m) throw new InvalidCertificate($"unknown field \"{Json.Cut(text)}\" (expected \"Q\" or \"F\" and a prime)");
        var p = BigInteger.Parse(m.Groups[1].Value);
        if (p >= Prime.Limit) throw new InvalidCertificate($"field {Json.Cut(text)}: p is beyond the deterministic primality test (< {Prime.Limit})");
        if (!Prime.IsPrime(p)) throw new InvalidCertificate($"field {text}: {p} is not a prime");
        return new Field(text, p);
    }

    public Rational Add(Rational a, Rational b) => P.IsZero ? a + b : Residue(a.Num + b.Num);
    public Rational Mul(Rational a, Rational b) => P.IsZero ? a * b : Residue(a.Num * b.Num);
    public Rational Inverse(Rational a) => P.IsZero ? new Rational(a.Den, a.Num) : Residue(BigInteger.ModPow(a.Num, P - 2, P));

    /// <summary>The rational weight a/b read into the field (a * b^-1 mod p); null when p divides b.</summary>
    public Rational? Reduce(Rational r) => P.IsZero ? r : (r.Den % P).IsZero ? null : Residue(r.Num * BigInteger.ModPow(r.Den, P - 2, P));

    /// <summary>Reads a canonical non-zero element: a reduced rational over Q, a residue 1..p-1 over F_p.</summary>
    /// <remarks>The answers for up to 4096 distinct short texts are remembered (a certificate repeats few values).</remarks>
    public Rational? ParseNonZero(string text)
    {
        if (seen.TryGetValue(text, out var known)) return known;
        Rational? answer = Rational.ParseCanonical(text) is not { } r ? null
            : P.IsZero ? (r.Num.IsZero ? null : r) : r.Den.IsOne && r.Num.Sign > 0 && r.Num < P ? r : null;
        // Stryker disable once all: the bounds of the cache change only time and memory, not an answer
        if (seen.Count < 4096 && text.Length <= 40) seen[text] = answer;
        return answer;
    }

    readonly Dictionary<string, Rational?> seen = new(StringComparer.Ordinal);

    Rational Residue(BigInteger x) => new(((x % P) + P) % P, 1);
}
