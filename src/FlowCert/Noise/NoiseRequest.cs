using FlowCert.Algebra;

namespace FlowCert.Noise;

/// <summary>What a noise report should show besides the exact matrices: levels in dB and a target.</summary>
/// <param name="Decibels">One squeezing level in dB, or null.</param>
/// <param name="Sweep">Squeezing levels in dB for a table, or null.</param>
/// <param name="Target">The largest acceptable added variance in vacuum units, or null.</param>
public sealed record NoiseRequest(double? Decibels = null, IReadOnlyList<double>? Sweep = null, Rational? Target = null)
{
    /// <summary>The levels FROM, FROM + STEP, ... up to TO (inclusive, with a tolerance of STEP/10^6); at most 10 000.</summary>
    public static IReadOnlyList<double> SweepLevels(double from, double to, double step)
    {
        if (!(step > 0) || !double.IsFinite(from) || !double.IsFinite(to) || to < from)
            throw new NoiseInputException($"a sweep FROM:TO:STEP needs finite FROM <= TO and STEP > 0 (got {from}:{to}:{step})");
        var count = (long)Math.Floor((to - from) / step + 1e-6) + 1;
        if (count > 10_000) throw new NoiseInputException($"a sweep of {count} levels is too long: at most 10000");
        return Enumerable.Range(0, (int)count).Select(k => from + k * step).ToArray();
    }
}
