using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// The field axioms (common practice: any algebra text's definition of a field), checked on random
/// elements of Q, F_2, F_3 and F_(2^61-1) through the <see cref="IField{T}"/> interface the solver uses.
/// </summary>
public class FieldAxiomTests
{
    private const int Trials = 2000;

    private static void CheckAxioms<T, TField>(TField f, Func<Random, T> sample, int seed)
        where T : struct where TField : struct, IField<T>
    {
        var rng = new Random(seed);
        void Same(T expected, T actual, string law, T a, T b, T c)
            => Assert.True(f.AreEqual(expected, actual),
                $"{law} fails for a={f.Format(a)}, b={f.Format(b)}, c={f.Format(c)}: {f.Format(expected)} != {f.Format(actual)}");

        Assert.True(f.IsZero(f.Zero));
        Assert.False(f.IsZero(f.One));
        Assert.Throws<DivideByZeroException>(() => f.Inverse(f.Zero));
        for (int t = 0; t < Trials; t++)
        {
            T a = sample(rng), b = sample(rng), c = sample(rng);
            Same(f.Add(f.Add(a, b), c), f.Add(a, f.Add(b, c)), "associativity of +", a, b, c);
            Same(f.Multiply(f.Multiply(a, b), c), f.Multiply(a, f.Multiply(b, c)), "associativity of *", a, b, c);
            Same(f.Add(a, b), f.Add(b, a), "commutativity of +", a, b, c);
            Same(f.Multiply(a, b), f.Multiply(b, a), "commutativity of *", a, b, c);
            Same(f.Multiply(a, f.Add(b, c)), f.Add(f.Multiply(a, b), f.Multiply(a, c)), "distributivity", a, b, c);
            Same(a, f.Add(a, f.Zero), "additive identity", a, b, c);
            Same(a, f.Multiply(a, f.One), "multiplicative identity", a, b, c);
            Same(f.Zero, f.Multiply(a, f.Zero), "a * 0 = 0", a, b, c);
            Assert.True(f.IsZero(f.Add(a, f.Negate(a))), $"a + (-a) != 0 for a={f.Format(a)}");
            Same(f.Negate(f.Negate(a)), a, "-(-a) = a", a, b, c);
            Same(f.Subtract(a, b), f.Add(a, f.Negate(b)), "a - b = a + (-b)", a, b, c);
            Same(f.Negate(f.Multiply(a, b)), f.Multiply(f.Negate(a), b), "-(ab) = (-a)b", a, b, c);
            Assert.Equal(f.IsZero(a), f.AreEqual(a, f.Zero));
            if (!f.IsZero(a))
            {
                var inv = f.Inverse(a);
                Same(f.One, f.Multiply(a, inv), "a * a^-1 = 1", a, b, c);
                Same(a, f.Inverse(inv), "(a^-1)^-1 = a", a, b, c);
                if (!f.IsZero(b)) Same(f.Multiply(f.Inverse(a), f.Inverse(b)), f.Inverse(f.Multiply(a, b)), "(ab)^-1 = a^-1 b^-1", a, b, c);
            }
            if (!f.IsZero(a) && !f.IsZero(b)) Assert.False(f.IsZero(f.Multiply(a, b)), "no zero divisors");
            // Canonical text round trip (the certificate form of an element).
            Assert.True(f.TryParse(f.Format(a), out var back), $"TryParse refuses Format output '{f.Format(a)}'");
            Same(a, back, "TryParse(Format(a)) = a", a, b, c);
        }
    }

    [Fact]
    public void RationalsSatisfyTheFieldAxioms() => CheckAxioms<Rational, RationalField>(default, FieldSamples.Rational, 101);

    [Fact]
    public void F2SatisfiesTheFieldAxioms() => CheckAxioms<ulong, PrimeField>(new PrimeField(2), r => FieldSamples.Residue(r, 2), 102);

    [Fact]
    public void F3SatisfiesTheFieldAxioms() => CheckAxioms<ulong, PrimeField>(new PrimeField(3), r => FieldSamples.Residue(r, 3), 103);

    [Fact]
    public void FMersenne61SatisfiesTheFieldAxioms()
        => CheckAxioms<ulong, PrimeField>(new PrimeField(FieldSamples.Mersenne61), r => FieldSamples.Residue(r, FieldSamples.Mersenne61), 104);

    [Fact]
    public void TheLargestPrimeBelow2To62SatisfiesTheFieldAxioms()
    {
        // 2^62 - 57: the largest prime below 2^62 (from memory, "primes just less than a power of two"
        // tables; confirmed by coreutils factor in PrimalityTests). Sums of two residues reach 2^63.
        const ulong p = (1UL << 62) - 57;
        CheckAxioms<ulong, PrimeField>(new PrimeField(p), r => FieldSamples.Residue(r, p), 105);
    }
}
