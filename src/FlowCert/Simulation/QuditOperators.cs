using System.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace FlowCert.Simulation;

/// <summary>
/// The qudit operators of flows.md section 7 for prime dimension p, with w = exp(2 pi i / p):
/// X|j> = |j+1>, Z|j> = w^j |j>, and the XY-type measurement basis |b_k> = D^dagger Z^k |+>.
/// </summary>
public static class QuditOperators
{
    /// <summary>w^k for k taken mod p.</summary>
    public static Complex RootOfUnity(int p, long k)
    {
        long r = ((k % p) + p) % p;
        return Complex.FromPolarCoordinates(1.0, 2 * Math.PI * r / p);
    }

    /// <summary>X^a as a p x p matrix.</summary>
    public static Matrix<Complex> Shift(int p, int a)
        => Matrix<Complex>.Build.Dense(p, p, (y, x) => Mod(x + a, p) == y ? Complex.One : Complex.Zero);

    /// <summary>Z^b as a p x p matrix.</summary>
    public static Matrix<Complex> Clock(int p, int b)
        => Matrix<Complex>.Build.Dense(p, p, (y, x) => x == y ? RootOfUnity(p, (long)b * x) : Complex.Zero);

    /// <summary>The diagonal of X^a D X^-a: its j-th entry is D's (j - a)-th (the angle adapted to an X-frame a).</summary>
    public static Complex[] AdaptedAngle(IReadOnlyList<Complex> diagonal, int a)
    {
        int p = diagonal.Count;
        return Enumerable.Range(0, p).Select(j => diagonal[Mod(j - a, p)]).ToArray();
    }

    /// <summary>
    /// The bra of outcome k in the basis of a diagonal unitary D: coefficients of &lt;b_k| = &lt;+| Z^-k D,
    /// that is D_x w^(-k x) / sqrt(p) on |x&gt;.
    /// </summary>
    public static Complex[] OutcomeBra(IReadOnlyList<Complex> diagonal, int k)
    {
        int p = diagonal.Count;
        double norm = 1.0 / Math.Sqrt(p);
        return Enumerable.Range(0, p).Select(x => diagonal[x] * RootOfUnity(p, -(long)k * x) * norm).ToArray();
    }

    /// <summary>A diagonal unitary with independent uniformly random phases: a random XY-type angle.</summary>
    public static Complex[] RandomAngle(int p, SeededRandom random)
        => Enumerable.Range(0, p).Select(_ => Complex.FromPolarCoordinates(1.0, 2 * Math.PI * random.NextDouble())).ToArray();

    internal static int Mod(long x, int p) => (int)(((x % p) + p) % p);
}
