using FlowCert.Algebra;

namespace FlowCert.Graphs.Families;

/// <summary>How a generated graph's edges get their exact weights.</summary>
public abstract record WeightRule
{
    /// <summary>Every edge has the same weight.</summary>
    public sealed record Constant(Rational Weight) : WeightRule;

    /// <summary>A weight per lattice direction (the family lists its directions); unnamed directions weigh 1.</summary>
    public sealed record PerDirection(IReadOnlyDictionary<string, Rational> Weights) : WeightRule;

    /// <summary>Each edge, in canonical order, draws one of the values uniformly from the weight stream.</summary>
    public sealed record Choice(IReadOnlyList<Rational> Values) : WeightRule;

    /// <summary>Weight 1 on every edge.</summary>
    public static readonly WeightRule Unit = new Constant(Rational.One);

    /// <summary>Parses one weight (<c>-1/2</c>, <c>0.25</c>, <c>3</c>); zero is refused.</summary>
    public static Rational ParseWeight(string text, string what)
    {
        if (!Rational.TryParse(text.Trim(), out var w))
            throw new FamilyParameterException($"bad {what} '{text}': write an integer, a/b or a decimal such as 0.25");
        if (w.IsZero) throw new FamilyParameterException($"{what} is zero: an edge of weight zero is no edge");
        return w;
    }

    /// <summary>Parses <c>DIRECTION=W,DIRECTION=W</c>, such as <c>h=1,v=-1/2</c>.</summary>
    public static PerDirection ParsePerDirection(string text)
    {
        var weights = new SortedDictionary<string, Rational>(StringComparer.Ordinal);
        foreach (var item in text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var parts = item.Split('=', StringSplitOptions.TrimEntries);
            if (parts.Length != 2 || parts[0].Length == 0)
                throw new FamilyParameterException($"bad direction weight '{item}': write DIRECTION=WEIGHT, such as h=1/2");
            if (!weights.TryAdd(parts[0], ParseWeight(parts[1], $"weight of direction {parts[0]}")))
                throw new FamilyParameterException($"direction {parts[0]} is given two weights");
        }
        if (weights.Count == 0) throw new FamilyParameterException("no direction weights given: write DIRECTION=WEIGHT, such as h=1,v=2");
        return new PerDirection(weights);
    }

    /// <summary>Parses a comma-separated list of weights to draw from, such as <c>1,-1,1/2</c>.</summary>
    public static Choice ParseChoice(string text)
    {
        var values = text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Select(t => ParseWeight(t, "random weight")).ToList();
        if (values.Count == 0) throw new FamilyParameterException("no weights to draw from: write a list such as 1,-1,1/2");
        return new Choice(values);
    }
}
