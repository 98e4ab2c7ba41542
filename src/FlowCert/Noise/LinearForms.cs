using FlowCert.Algebra;

namespace FlowCert.Noise;

/// <summary>
/// The Heisenberg picture of a Gaussian pattern: every quadrature operator (q_v, p_v) of every node held as
/// an exact linear form in the initial quadratures (q_v^0, p_v^0). Variable 2v is q_v^0, 2v+1 is p_v^0.
/// A Gaussian unitary U acts by x -> U^dagger x U, a linear map on the operators; applying gates in time
/// order to the current forms composes them correctly (docs/noise.md).
/// </summary>
internal sealed class LinearForms
{
    private readonly Rational[][] forms;

    /// <summary>The identity: q_v = q_v^0 and p_v = p_v^0 for all <paramref name="nodes"/> nodes.</summary>
    public LinearForms(int nodes)
    {
        Nodes = nodes;
        forms = new Rational[2 * nodes][];
        for (int k = 0; k < 2 * nodes; k++)
        {
            forms[k] = new Rational[2 * nodes];
            Array.Fill(forms[k], Rational.Zero);
            forms[k][k] = Rational.One;
        }
    }

    /// <summary>The number of nodes.</summary>
    public int Nodes { get; }

    /// <summary>The form of q_v (index 2v) or p_v (index 2v + 1); do not modify.</summary>
    public Rational[] Form(int quadrature) => forms[quadrature];

    /// <summary>Index of q_v.</summary>
    public static int Q(int v) => 2 * v;
    /// <summary>Index of p_v.</summary>
    public static int P(int v) => 2 * v + 1;

    /// <summary>
    /// target += factor * source, where source is a form (copied first, so it may alias a current form).
    /// Every gate of the pattern is a sequence of such shears.
    /// </summary>
    public void AddTo(int target, Rational factor, Rational[] source)
    {
        if (factor.IsZero) return;
        var row = forms[target];
        for (int k = 0; k < row.Length; k++)
            if (!source[k].IsZero) row[k] += factor * source[k];
    }

    /// <summary>A copy of a form.</summary>
    public Rational[] Copy(int quadrature) => (Rational[])forms[quadrature].Clone();

    /// <summary>
    /// The edge gate exp(i a q_u q_v): p_u -> p_u + a q_v and p_v -> p_v + a q_u (q unchanged).
    /// </summary>
    public void Edge(int u, int v, Rational a)
    {
        AddTo(P(u), a, forms[Q(v)]);
        AddTo(P(v), a, forms[Q(u)]);
    }

    /// <summary>The Gaussian phase exp(i t q_v^2 / 2): p_v -> p_v + t q_v.</summary>
    public void Phase(int v, Rational t) => AddTo(P(v), t, forms[Q(v)]);
}
