namespace FlowCert.Flows.Primes;

/// <summary>One prime where a direct solve and the survey's claim differ (there must be none).</summary>
/// <param name="Claim">What the survey claims.</param>
/// <param name="Direct">What a direct solve over F_p gives.</param>
public sealed record AuditDisagreement(PrimeClaim Claim, PrimeAnswer Direct);

/// <summary>The outcome of an audit: how many primes were solved directly, how many had no claim, every disagreement.</summary>
/// <param name="UpTo">The bound N.</param>
/// <param name="PrimesSolved">Primes p &lt;= N solved directly and compared.</param>
/// <param name="PrimesUnclassified">Primes p &lt;= N where the survey makes no claim (they divide an unclassified integer).</param>
/// <param name="Disagreements">Every prime where claim and direct answer differ.</param>
public sealed record AuditResult(ulong UpTo, int PrimesSolved, int PrimesUnclassified, IReadOnlyList<AuditDisagreement> Disagreements);

/// <summary>The built-in audit: solve every prime up to N directly and compare with the survey's claim.</summary>
public static class PrimeAudit
{
    /// <summary>The largest N accepted (a bit sieve of this size is about 12 MB).</summary>
    public const ulong MaxBound = 100_000_000;

    /// <summary>Compares the survey with a direct solve at every prime p &lt;= <paramref name="upTo"/>.</summary>
    public static AuditResult Run(PrimeSurvey survey, ulong upTo)
    {
        if (upTo > MaxBound) throw new ArgumentOutOfRangeException(nameof(upTo), $"the audit goes up to {MaxBound} at most");
        int solved = 0, unclassified = 0;
        var disagreements = new List<AuditDisagreement>();
        foreach (var p in Primes(upTo))
        {
            var claim = survey.ClaimAt(p);
            if (claim.Kind == PrimeClaimKind.Unclassified) { unclassified++; continue; }
            var direct = PrimeSurvey.SolveDirectly(survey.Graph, survey.Kind, p);
            solved++;
            if (!claim.AgreesWith(direct)) disagreements.Add(new AuditDisagreement(claim, direct));
        }
        return new AuditResult(upTo, solved, unclassified, disagreements);
    }

    /// <summary>The primes up to n, ascending (sieve of Eratosthenes on odd numbers).</summary>
    public static IEnumerable<ulong> Primes(ulong n)
    {
        if (n < 2) yield break;
        yield return 2;
        var composite = new System.Collections.BitArray((int)(n / 2 + 1));
        for (ulong i = 3; i <= n; i += 2)
        {
            if (composite[(int)(i / 2)]) continue;
            yield return i;
            for (ulong j = i * i; j <= n; j += 2 * i) composite[(int)(j / 2)] = true;
        }
    }
}
