using FlowCert.Algebra;

namespace FlowCert.Flows;

/// <summary>
/// A sparse vector over the nodes of a graph with values in a field (a correction vector or a
/// left-kernel witness): node indices strictly increasing, values stored typed and compactly
/// (<see cref="Rational"/> over Q, <c>ulong</c> residues over F_p) until a writer formats them.
/// </summary>
public sealed class NodeVector
{
    private readonly int[] nodes;
    private readonly Array values;

    private NodeVector(FieldSpec field, int[] nodes, Array values)
    {
        Field = field; this.nodes = nodes; this.values = values;
    }

    /// <summary>The field of the values.</summary>
    public FieldSpec Field { get; }
    /// <summary>The nodes with an entry, strictly increasing.</summary>
    public IReadOnlyList<int> Nodes => nodes;
    /// <summary>The number of entries.</summary>
    public int Count => nodes.Length;
    /// <summary>The value at entry k (entry k belongs to node <c>Nodes[k]</c>).</summary>
    public FieldElement this[int k] => Field.IsRationals
        ? FieldElement.OfRational(((Rational[])values)[k])
        : FieldElement.OfResidue(((ulong[])values)[k], Field.Prime);

    /// <summary>The entries as (node, value) pairs, by node.</summary>
    public IEnumerable<(int Node, FieldElement Value)> Entries
    {
        get { for (int k = 0; k < nodes.Length; k++) yield return (nodes[k], this[k]); }
    }

    /// <summary>The raw values for generic code over <see cref="IField{T}"/>: T is Rational over Q, ulong over F_p.</summary>
    public ReadOnlySpan<T> Values<T>() where T : struct
        => values as T[] ?? throw new InvalidOperationException($"a vector over {Field.Name} does not hold {typeof(T).Name} values");

    /// <summary>
    /// The vector with the given entries (any order; sorted here). T must be the element type of
    /// <paramref name="field"/>; a node given twice is an error.
    /// </summary>
    public static NodeVector Create<T>(FieldSpec field, IReadOnlyList<int> nodes, IReadOnlyList<T> values) where T : struct
        => Take(field, nodes.ToArray(), values.ToArray());

    /// <summary>As <see cref="Create{T}"/>, but the vector takes the arrays over (sorting them in place when
    /// they are not sorted): for a caller that made them and does not touch them again.</summary>
    internal static NodeVector Take<T>(FieldSpec field, int[] n, T[] v) where T : struct
    {
        if (n.Length != v.Length) throw new ArgumentException("nodes and values differ in length");
        if (typeof(T) != (field.IsRationals ? typeof(Rational) : typeof(ulong)))
            throw new ArgumentException($"{typeof(T).Name} is not the element type of {field.Name}");
        bool sorted = true;
        for (int k = 1; k < n.Length; k++) if (n[k - 1] >= n[k]) { sorted = false; break; }
        if (!sorted)
        {
            Array.Sort(n, v);
            for (int k = 1; k < n.Length; k++)
                if (n[k - 1] == n[k]) throw new ArgumentException($"node {n[k]} has two entries");
        }
        return new NodeVector(field, n, v);
    }
}
