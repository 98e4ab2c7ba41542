using System.Numerics;
using Fractions;

namespace FlowCert.Tests.Oracles;

/// <summary>
/// Field arithmetic for the test oracles, written independently of src/FlowCert/Algebra: Q through the
/// Fractions NuGet package, F_p through plain long arithmetic mod p.
/// </summary>
public interface IReferenceArithmetic<T>
{
    /// <summary>"Q" or "F" followed by p.</summary>
    string Name { get; }
    T Zero { get; }
    T One { get; }
    bool IsZero(T a);
    T Add(T a, T b);
    T Subtract(T a, T b);
    T Multiply(T a, T b);
    /// <summary>The multiplicative inverse of a non-zero element.</summary>
    T Inverse(T a);
    /// <summary>The image of num/den; false when den has no inverse (p divides it).</summary>
    bool TryFromRational(BigInteger numerator, BigInteger denominator, out T value);
}

/// <summary>Q, exact, through <see cref="Fraction"/> from the Fractions package.</summary>
public sealed class FractionArithmetic : IReferenceArithmetic<Fraction>
{
    public static readonly FractionArithmetic Instance = new();
    public string Name => "Q";
    public Fraction Zero => Fraction.Zero;
    public Fraction One => Fraction.One;
    public bool IsZero(Fraction a) => a.IsZero;
    public Fraction Add(Fraction a, Fraction b) => (a + b).Reduce();
    public Fraction Subtract(Fraction a, Fraction b) => (a - b).Reduce();
    public Fraction Multiply(Fraction a, Fraction b) => (a * b).Reduce();
    public Fraction Inverse(Fraction a) => (Fraction.One / a).Reduce();
    public bool TryFromRational(BigInteger numerator, BigInteger denominator, out Fraction value)
    {
        value = new Fraction(numerator, denominator);
        return true;
    }
}

/// <summary>F_p for a small prime p, residues 0..p-1 in a long.</summary>
public sealed class ModularArithmetic(long p) : IReferenceArithmetic<long>
{
    public long P { get; } = p;
    public string Name => "F" + P;
    public long Zero => 0;
    public long One => 1;
    public bool IsZero(long a) => a == 0;
    public long Add(long a, long b) => (a + b) % P;
    public long Subtract(long a, long b) => ((a - b) % P + P) % P;
    public long Multiply(long a, long b) => a * b % P;
    public long Inverse(long a)
    {
        if (a == 0) throw new DivideByZeroException("0 has no inverse mod " + P);
        return (long)BigInteger.ModPow(a, P - 2, P); // Fermat's little theorem (common practice)
    }
    public long Reduce(BigInteger n) => (long)(((n % P) + P) % P);
    public bool TryFromRational(BigInteger numerator, BigInteger denominator, out long value)
    {
        value = 0;
        var d = Reduce(denominator);
        if (d == 0) return false;
        value = Multiply(Reduce(numerator), Inverse(d));
        return true;
    }
}
