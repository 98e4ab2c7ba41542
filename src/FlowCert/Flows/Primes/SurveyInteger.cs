using System.Numerics;
using FlowCert.Algebra.Factoring;

namespace FlowCert.Flows.Primes;

/// <summary>Where an integer whose primes may be exceptional comes from (flows.md section 10, docs/primes.md).</summary>
public enum IntegerOrigin
{
    /// <summary>The numerator of a weight: at its primes the edge vanishes.</summary>
    WeightNumerator,
    /// <summary>The denominator of a weight: at its primes the weight is undefined.</summary>
    WeightDenominator,
    /// <summary>The gcd of two non-zero r x r minors of a layer's integer-scaled block (r its rank over Q): a multiple of d_r.</summary>
    PivotMinor,
    /// <summary>The gcd of a row's coordinates in two integral left-kernel bases of a step's block (the row is unsolvable over Q).</summary>
    KernelCoordinate,
}

/// <summary>One integer of the survey: what it is, where it comes from, and what its factoring found.</summary>
/// <param name="Origin">What the integer is.</param>
/// <param name="Layer">For block invariants: the layer of the Q run (1 = the first layer found, next to the outputs); 0 for weights.</param>
/// <param name="Where">A short description: the edge, or the layer and row.</param>
/// <param name="Value">The integer (positive).</param>
/// <param name="Factors">Its factorisation as far as the budget allowed.</param>
public sealed record SurveyInteger(IntegerOrigin Origin, int Layer, string Where, BigInteger Value, Factorisation Factors);
