namespace FlowCert.Algebra;

/// <summary>Deterministic primality for 64-bit integers and word-sized modular arithmetic.</summary>
internal static class Primality
{
    // Miller-Rabin with these seven bases is exact for every n < 2^64 (common practice; the base set
    // is the one published on the "Deterministic variants" of Miller-Rabin testing, from memory).
    private static readonly ulong[] Bases = [2, 325, 9375, 28178, 450775, 9780504, 1795265022];

    /// <summary>a * b mod m without overflow.</summary>
    public static ulong MulMod(ulong a, ulong b, ulong m) => (ulong)((UInt128)a * b % m);

    /// <summary>b^e mod m by square-and-multiply.</summary>
    public static ulong PowMod(ulong b, ulong e, ulong m)
    {
        ulong result = 1 % m;
        b %= m;
        while (e > 0)
        {
            if ((e & 1) != 0) result = MulMod(result, b, m);
            b = MulMod(b, b, m);
            e >>= 1;
        }
        return result;
    }

    /// <summary>True exactly when n is prime.</summary>
    public static bool IsPrime(ulong n)
    {
        if (n < 2) return false;
        foreach (var small in (ulong[])[2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37])
        {
            if (n == small) return true;
            if (n % small == 0) return false;
        }
        ulong d = n - 1; int s = 0;
        while ((d & 1) == 0) { d >>= 1; s++; }
        foreach (var a0 in Bases)
        {
            var a = a0 % n;
            if (a == 0) continue;
            var x = PowMod(a, d, n);
            if (x == 1 || x == n - 1) continue;
            bool composite = true;
            for (int r = 1; r < s && composite; r++)
            {
                x = MulMod(x, x, n);
                if (x == n - 1) composite = false;
            }
            if (composite) return false;
        }
        return true;
    }
}
