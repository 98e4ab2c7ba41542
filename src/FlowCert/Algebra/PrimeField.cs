using System.Numerics;

namespace FlowCert.Algebra;

/// <summary>The prime field F_p = Z/pZ for a prime p below 2^62, elements as residues 0..p-1.</summary>
public readonly struct PrimeField : IField<ulong>
{
    /// <summary>Every supported prime is below this bound, 2^62 (products of two residues fit in 128 bits with room for sums).</summary>
    public const ulong Bound = 1UL << 62;

    /// <summary>The characteristic.</summary>
    public ulong P { get; }

    /// <summary>Creates F_p; throws when p is not a prime below 2^62.</summary>
    public PrimeField(ulong p)
    {
        if (p >= Bound || !Primality.IsPrime(p)) throw new ArgumentException($"{p} is not a prime below 2^62");
        P = p;
    }

    /// <inheritdoc/>
    public ulong Zero => 0;
    /// <inheritdoc/>
    public ulong One => 1;
    /// <inheritdoc/>
    public bool IsZero(ulong a) => a == 0;
    /// <inheritdoc/>
    public bool AreEqual(ulong a, ulong b) => a == b;
    /// <inheritdoc/>
    public ulong Add(ulong a, ulong b) { var s = a + b; return s >= P ? s - P : s; }
    /// <inheritdoc/>
    public ulong Subtract(ulong a, ulong b) => a >= b ? a - b : a + P - b;
    /// <inheritdoc/>
    public ulong Negate(ulong a) => a == 0 ? 0 : P - a;
    /// <inheritdoc/>
    public ulong Multiply(ulong a, ulong b) => Primality.MulMod(a, b, P);

    /// <inheritdoc/>
    public ulong Inverse(ulong a)
    {
        if (a == 0) throw new DivideByZeroException("zero has no inverse in F_" + P);
        // Extended Euclid on signed 128-bit to stay exact for p < 2^62.
        Int128 t = 0, newT = 1, r = P, newR = a;
        while (newR != 0)
        {
            var q = r / newR;
            (t, newT) = (newT, t - q * newT);
            (r, newR) = (newR, r - q * newR);
        }
        if (t < 0) t += P;
        return (ulong)t;
    }

    /// <summary>Reduces an integer into 0..p-1.</summary>
    public ulong FromInteger(BigInteger n)
    {
        if (n.GetBitLength() < 63) // the usual small weight: long arithmetic (P < 2^62, so r + P cannot overflow)
        {
            long small = (long)n % (long)P;
            return (ulong)(small < 0 ? small + (long)P : small);
        }
        var r = BigInteger.Remainder(n, P);
        return (ulong)(r.Sign < 0 ? r + P : r);
    }

    /// <inheritdoc/>
    public ulong FromRational(Rational r)
    {
        if (r.Denominator.IsOne) return FromInteger(r.Numerator);
        var den = FromInteger(r.Denominator);
        if (den == 0) throw new NotInFieldException($"{r} has no value in F_{P}: {P} divides its denominator");
        return Multiply(FromInteger(r.Numerator), Inverse(den));
    }

    /// <inheritdoc/>
    public string Format(ulong a) => a.ToString(System.Globalization.CultureInfo.InvariantCulture);

    /// <inheritdoc/>
    public bool TryParse(string text, out ulong value)
    {
        value = 0;
        if (text.Length == 0 || text.Length > 20 || (text.Length > 1 && text[0] == '0')) return false;
        foreach (var c in text) if (c < '0' || c > '9') return false;
        return ulong.TryParse(text, out value) && value < P;
    }

    /// <inheritdoc/>
    IEliminationResult<ulong> IField<ulong>.Eliminate(IReadOnlyList<SparseVector<ulong>> rows)
        => ModularElimination.PaysOff(rows) ? ModularElimination.Run(P, rows) : new SparseElimination<ulong, PrimeField>(this, rows);
}
