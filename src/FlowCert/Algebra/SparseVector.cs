namespace FlowCert.Algebra;

/// <summary>An immutable sparse vector: strictly increasing indices and their non-zero values.</summary>
internal readonly struct SparseVector<T> where T : struct
{
    /// <summary>The positions of the non-zero entries, strictly increasing.</summary>
    public readonly int[] Indices;
    /// <summary>The non-zero values, aligned with <see cref="Indices"/>.</summary>
    public readonly T[] Values;

    /// <summary>Wraps the arrays as given (no copy, no check); indices must be strictly increasing and values non-zero.</summary>
    public SparseVector(int[] indices, T[] values) { Indices = indices; Values = values; }
    /// <summary>The vector with <paramref name="one"/> at <paramref name="index"/> and zero elsewhere.</summary>
    public static SparseVector<T> Unit(int index, T one) => new([index], [one]);
    /// <summary>Number of non-zero entries.</summary>
    public int Count => Indices.Length;

    /// <summary>The entry at index, or zero.</summary>
    public T Get<TField>(TField f, int index) where TField : struct, IField<T>
    {
        int k = Array.BinarySearch(Indices, index);
        return k >= 0 ? Values[k] : f.Zero;
    }

    /// <summary>this + factor * other, dropping zeros.</summary>
    public SparseVector<T> AddScaled<TField>(TField f, T factor, SparseVector<T> other) where TField : struct, IField<T>
    {
        var idx = new int[Count + other.Count];
        var val = new T[idx.Length];
        int i = 0, j = 0, n = 0;
        while (i < Count || j < other.Count)
        {
            if (j >= other.Count || (i < Count && Indices[i] < other.Indices[j]))
            { idx[n] = Indices[i]; val[n++] = Values[i++]; }
            else if (i >= Count || other.Indices[j] < Indices[i])
            {
                var v = f.Multiply(factor, other.Values[j]);
                if (!f.IsZero(v)) { idx[n] = other.Indices[j]; val[n++] = v; }
                j++;
            }
            else
            {
                var v = f.Add(Values[i], f.Multiply(factor, other.Values[j]));
                if (!f.IsZero(v)) { idx[n] = Indices[i]; val[n++] = v; }
                i++; j++;
            }
        }
        Array.Resize(ref idx, n);
        Array.Resize(ref val, n);
        return new SparseVector<T>(idx, val);
    }

    /// <summary>factor * this; the caller passes a non-zero factor (no zeros are dropped).</summary>
    public SparseVector<T> Scale<TField>(TField f, T factor) where TField : struct, IField<T>
    {
        var val = new T[Count];
        for (int k = 0; k < Count; k++) val[k] = f.Multiply(factor, Values[k]);
        return new SparseVector<T>(Indices, val);
    }
}
